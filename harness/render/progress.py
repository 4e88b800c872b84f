"""A live progress line on stderr: done/total, rate, ETA and the pass share so far."""

from __future__ import annotations

import sys
import time


def format_duration(seconds: float) -> str:
    seconds = int(max(0, seconds))
    hours, rest = divmod(seconds, 3600)
    minutes, secs = divmod(rest, 60)
    return f"{hours}h{minutes:02d}m" if hours else f"{minutes}m{secs:02d}s" if minutes else f"{secs}s"


class Progress:
    """Redraws one line on a terminal; elsewhere prints a line every ``every`` seconds."""

    def __init__(self, total: int, label: str = "scoring", stream=None, enabled: bool = True, every: float = 15.0):
        self.total = max(total, 1)
        self.label = label
        self.stream = stream or sys.stderr
        self.enabled = enabled
        self.tty = self.stream.isatty()
        self.every = every
        self.done = self.executed = self.passed = 0
        self.started = time.monotonic()
        self._last_draw = 0.0

    def advance(self, executed: bool = False, passed: bool = False) -> None:
        self.done += 1
        self.executed += executed
        self.passed += passed
        now = time.monotonic()
        if now - self._last_draw >= (0.1 if self.tty else self.every):
            self._draw(now)

    def _draw(self, now: float, final: bool = False) -> None:
        if not self.enabled:
            return
        self._last_draw = now
        elapsed = now - self.started
        rate = self.executed / elapsed if elapsed > 0 else 0.0
        share = self.done / self.total
        remaining = (self.total - self.done) / (self.done / elapsed) if self.done and elapsed > 0 else 0
        pass_share = f"{100 * self.passed / self.executed:.0f}%" if self.executed else "-"
        width = 28
        filled = int(width * min(share, 1.0))
        bar = "#" * filled + "." * (width - filled)
        text = (
            f"{self.label} [{bar}] {self.done}/{self.total} {100 * share:5.1f}%  "
            f"{rate:.1f} cand/s  passed {pass_share}  "
            + (f"took {format_duration(elapsed)}" if final else f"ETA {format_duration(remaining)}")
        )
        if self.tty:
            self.stream.write("\r\033[K" + text + ("\n" if final else ""))
        else:
            self.stream.write(text + "\n")
        self.stream.flush()

    def finish(self) -> None:
        self._draw(time.monotonic(), final=True)
