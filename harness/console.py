"""The terminal: plain-text tables, colour only when writing to one, and the live progress
line of a scoring run. Imports nothing of the project, so every layer may write to a terminal."""

from __future__ import annotations

import os
import sys
import time


def use_colour(stream=None) -> bool:
    stream = stream or sys.stdout
    return stream.isatty() and "NO_COLOR" not in os.environ


def paint(text: str, code: str, colour: bool) -> str:
    return f"\033[{code}m{text}\033[0m" if colour else text


def render(headers: list[str], rows: list[list[str]], align: str | None = None) -> str:
    """Columns padded to the widest cell; ``align`` is one of l/r per column (default: first
    left, rest right). Cells may carry colour codes; widths ignore them."""
    align = align or "l" + "r" * (len(headers) - 1)
    widths = [max(_visible_len(str(r[i])) for r in [headers] + rows) for i in range(len(headers))]

    def line(cells: list[str]) -> str:
        out = []
        for cell, width, side in zip(cells, widths, align):
            pad = " " * (width - _visible_len(cell))
            out.append(cell + pad if side == "l" else pad + cell)
        return "  ".join(out).rstrip()

    rule = "  ".join("-" * w for w in widths)
    return "\n".join([line(headers), rule] + [line([str(c) for c in r]) for r in rows])


def _visible_len(text: str) -> int:
    length, skipping = 0, False
    for char in text:
        if char == "\033":
            skipping = True
        elif skipping and char == "m":
            skipping = False
        elif not skipping:
            length += 1
    return length


def format_duration(seconds: float) -> str:
    seconds = int(max(0, seconds))
    hours, rest = divmod(seconds, 3600)
    minutes, secs = divmod(rest, 60)
    return f"{hours}h{minutes:02d}m" if hours else f"{minutes}m{secs:02d}s" if minutes else f"{secs}s"


class Progress:
    """Redraws one line on a terminal; elsewhere prints a line every ``every`` seconds."""

    def __init__(self, total: int, label: str = "scoring", stream=None, enabled: bool = True, every: float = 15.0,
                 cpu_share=None):
        self.total = max(total, 1)
        self.cpu_share = cpu_share  # () -> share of the workers' cores in use so far, or None
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
        cpu = self.cpu_share() if self.cpu_share is not None else None
        width = 28
        filled = int(width * min(share, 1.0))
        bar = "#" * filled + "." * (width - filled)
        text = (
            f"{self.label} [{bar}] {self.done}/{self.total} {100 * share:5.1f}%  "
            f"{rate:.1f} cand/s  passed {pass_share}  "
            + (f"CPU {100 * cpu:.0f}%  " if cpu is not None else "")
            + (f"took {format_duration(elapsed)}" if final else f"ETA {format_duration(remaining)}")
        )
        if self.tty:
            self.stream.write("\r\033[K" + text + ("\n" if final else ""))
        else:
            self.stream.write(text + "\n")
        self.stream.flush()

    def finish(self) -> None:
        self._draw(time.monotonic(), final=True)
