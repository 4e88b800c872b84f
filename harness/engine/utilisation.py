"""How busy a local run keeps the cores it may use: CPU seconds spent by the harness and every
process it started (warm sandboxes and their steps, compile servers), over the wall time
times the cores its workers can occupy (``min(jobs, cores)``). An idle core in an overnight
run is time lost.

Counted from /proc: this process's own and reaped children's times (``os.times``), plus the
user and system time of every living descendant and of the children it has reaped (proc(5),
fields 14 to 17 of /proc/PID/stat). Processes that the Docker daemon starts are not
descendants of the harness, so under ``--sandbox docker`` the share leaves out the steps.
"""

from __future__ import annotations

import os
import threading
import time
from pathlib import Path

REFRESH_SECONDS = 1.0


def tree_cpu_seconds(root: int | None = None) -> float:
    """CPU seconds used so far by this process, its reaped children and its living descendants."""
    own = os.times()
    total = own.user + own.system + own.children_user + own.children_system
    ticks = os.sysconf("SC_CLK_TCK")
    seen: set[int] = set()
    frontier = _children(root or os.getpid())
    while frontier:
        pid = frontier.pop()
        if pid in seen:
            continue
        seen.add(pid)
        try:
            fields = Path(f"/proc/{pid}/stat").read_text().rpartition(")")[2].split()
            total += sum(int(value) for value in fields[11:15]) / ticks  # utime stime cutime cstime
        except (OSError, ValueError, IndexError):
            continue  # ended meanwhile: its times are now its parent's
        frontier += _children(pid)
    return total


def _children(pid: int) -> list[int]:
    try:
        return [int(child) for task in os.listdir(f"/proc/{pid}/task")
                for child in Path(f"/proc/{pid}/task/{task}/children").read_text().split()]
    except (OSError, ValueError):
        return []


class CpuMeter:
    """The share of ``min(jobs, cores)`` cores a run has used since it started; readings are
    refreshed at most once a second, so a progress line may ask as often as it draws."""

    def __init__(self, jobs: int):
        self.cores = max(1, min(jobs, os.cpu_count() or 1))
        self.started = time.monotonic()
        self.base = tree_cpu_seconds()
        self._lock = threading.Lock()
        self._last: tuple[float, float | None] = (0.0, None)

    def share(self) -> float | None:
        """Used CPU over available CPU since the start, 0.0 to about 1.0; None before any time passed."""
        now = time.monotonic()
        with self._lock:
            read_at, value = self._last
            if value is not None and now - read_at < REFRESH_SECONDS:
                return value
            elapsed = now - self.started
            if elapsed <= 0:
                return None
            value = max(0.0, tree_cpu_seconds() - self.base) / (elapsed * self.cores)
            self._last = (now, value)
            return value
