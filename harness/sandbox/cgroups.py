"""Per-candidate control groups: hard memory and process-count limits with OOM accounting.

Supports cgroup v2 (unified) and v1 (separate memory and pids hierarchies). When neither is
writable (an unprivileged user without a delegated subtree) ``detect()`` returns None and the
sandbox falls back to rlimits, which are weaker: RLIMIT_DATA bounds each process's heap, not the
step's resident memory in all, and makes an allocation fail instead of killing the step.
"""

from __future__ import annotations

import os
import signal
import time
import uuid
from dataclasses import dataclass
from pathlib import Path

CGROUP_ROOT = Path("/sys/fs/cgroup")
GROUP_NAME = "assay"


def _writable_dir(path: Path) -> bool:
    return path.is_dir() and os.access(path, os.W_OK)


@dataclass
class Cgroup:
    """One candidate's group. ``procs_files`` are written with "0" by the child before exec."""

    version: int
    dirs: tuple[Path, ...]

    @property
    def procs_files(self) -> tuple[str, ...]:
        return tuple(str(d / "cgroup.procs") for d in self.dirs)

    def _memory_dir(self) -> Path:
        return self.dirs[0]

    def _pids_dir(self) -> Path | None:
        return self.dirs[-1] if self.version == 2 or len(self.dirs) > 1 else None

    @property
    def limits_processes(self) -> bool:
        """Whether the group caps the process count (else RLIMIT_NPROC must)."""
        return self._pids_dir() is not None

    def oom_kills(self) -> int:
        """How many processes the group's memory limit has killed so far."""
        name = "memory.events" if self.version == 2 else "memory.oom_control"
        return _read_keyed(self._memory_dir() / name).get("oom_kill", 0)

    def oom_killed(self) -> bool:
        return self.oom_kills() > 0

    def peak_bytes(self) -> int:
        name = "memory.peak" if self.version == 2 else "memory.max_usage_in_bytes"
        return _read_int(self._memory_dir() / name)

    def usage_bytes(self) -> int:
        name = "memory.current" if self.version == 2 else "memory.usage_in_bytes"
        return _read_int(self._memory_dir() / name)

    def reset_peak(self) -> bool:
        """Start a new peak reading; False where the kernel cannot (v2 resets only per open file)."""
        if self.version == 2:
            return False
        try:
            (self._memory_dir() / "memory.max_usage_in_bytes").write_text("0")
        except OSError:
            return False
        return True

    def set_limits(self, memory_bytes: int, max_processes: int, old_memory: int | None = None) -> None:
        """Hard memory limit (swap off) and process count. ``old_memory``: the limit in force,
        when it may be raised (cgroup v1 keeps memory <= memory+swap at every moment, so the
        order of the two writes depends on the direction)."""
        memory = self._memory_dir()
        if self.version == 2:
            (memory / "memory.max").write_text(str(memory_bytes))
            _try_write(memory / "memory.swap.max", "0")
        else:
            raising = old_memory is not None and memory_bytes > old_memory
            if raising:  # the memory+swap ceiling first
                _try_write(memory / "memory.memsw.limit_in_bytes", str(memory_bytes))
            (memory / "memory.limit_in_bytes").write_text(str(memory_bytes))
            if not raising:
                _try_write(memory / "memory.memsw.limit_in_bytes", str(memory_bytes))
            _try_write(memory / "memory.swappiness", "0")
        pids = self._pids_dir()
        if pids is not None:
            if self.version == 2:
                _try_write(pids / "pids.max", str(max_processes))
            else:
                (pids / "pids.max").write_text(str(max_processes))

    def kill_all(self) -> None:
        """SIGKILL every process still in the group (belt and braces beside the pid namespace)."""
        for _ in range(50):
            pids = set()
            for directory in self.dirs:
                try:
                    pids |= {int(p) for p in (directory / "cgroup.procs").read_text().split()}
                except OSError:
                    pass
            if not pids:
                return
            for pid in pids:
                try:
                    os.kill(pid, signal.SIGKILL)
                except ProcessLookupError:
                    pass

    def remove(self, wait_seconds: float = 0.0) -> bool:
        """Kill what is left in the group and remove its directories; True once they are gone.
        A directory stays busy while a killed process has not finished exiting: a background
        clean-up can afford to wait ``wait_seconds`` for that, killing again meanwhile."""
        self.kill_all()
        deadline = time.monotonic() + wait_seconds
        for directory in self.dirs:
            attempt = 0
            while True:
                try:
                    directory.rmdir()
                    break
                except FileNotFoundError:
                    break
                except OSError:
                    attempt += 1
                    if attempt < 100:
                        os.sched_yield()
                    elif time.monotonic() < deadline:
                        self.kill_all()
                        time.sleep(0.02)
                    else:
                        break
        return not any(directory.exists() for directory in self.dirs)


class CgroupFactory:
    """Creates per-candidate groups under one parent made at start-up."""

    def __init__(self, version: int, parents: tuple[Path, ...]):
        self.version = version
        self.parents = parents

    def describe(self) -> str:
        return f"cgroup v{self.version} ({', '.join(str(p) for p in self.parents)})"

    def create(self, memory_bytes: int, max_processes: int) -> Cgroup:
        name = uuid.uuid4().hex[:16]
        dirs = tuple(parent / name for parent in self.parents)
        for directory in dirs:
            directory.mkdir()
        group = Cgroup(self.version, dirs)
        group.set_limits(memory_bytes, max_processes)
        return group


def detect(root: Path = CGROUP_ROOT) -> CgroupFactory | None:
    """The best usable cgroup setup on this machine, or None."""
    if (root / "cgroup.controllers").exists():
        return _detect_v2(root)
    memory_v1 = root / "memory"
    if _writable_dir(memory_v1) and (memory_v1 / "memory.limit_in_bytes").exists():
        parents = [memory_v1 / GROUP_NAME]
        if _writable_dir(root / "pids"):
            parents.append(root / "pids" / GROUP_NAME)
        try:
            for parent in parents:
                parent.mkdir(exist_ok=True)
        except OSError:
            return None
        return CgroupFactory(1, tuple(parents))
    return None


def _detect_v2(root: Path) -> CgroupFactory | None:
    """Under v2 the group goes below the harness's own group (delegated to us, or root's)."""
    own = _own_v2_group(root)
    for base in (root, own):
        if base is None or not _writable_dir(base):
            continue
        parent = base / GROUP_NAME
        try:
            parent.mkdir(exist_ok=True)
            controllers = (base / "cgroup.controllers").read_text().split()
            if "memory" not in controllers:
                continue
            wanted = " ".join(f"+{c}" for c in ("memory", "pids") if c in controllers)
            _try_write(base / "cgroup.subtree_control", wanted)
            _try_write(parent / "cgroup.subtree_control", wanted)
            if "memory" in (parent / "cgroup.controllers").read_text().split():
                return CgroupFactory(2, (parent,))
        except OSError:
            continue
    return None


def _own_v2_group(root: Path) -> Path | None:
    try:
        for line in Path("/proc/self/cgroup").read_text().splitlines():
            if line.startswith("0::"):
                return root / line[3:].lstrip("/")
    except OSError:
        pass
    return None


def _read_keyed(path: Path) -> dict[str, int]:
    try:
        pairs = (line.split() for line in path.read_text().splitlines())
        return {p[0]: int(p[1]) for p in pairs if len(p) == 2 and p[1].isdigit()}
    except OSError:
        return {}


def _read_int(path: Path) -> int:
    try:
        return int(path.read_text().split()[0])
    except (OSError, ValueError, IndexError):
        return 0


def _try_write(path: Path, value: str) -> None:
    try:
        path.write_text(value)
    except OSError:
        pass
