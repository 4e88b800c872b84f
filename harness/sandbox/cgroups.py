"""Per-candidate control groups: hard memory and process-count limits with OOM accounting.

Supports cgroup v2 (unified) and v1 (separate memory and pids hierarchies). Under v2 the groups
go below the root (as root) or below the harness's own group where it was delegated to the
invoking user (``systemd-run --user --scope -p Delegate=yes``); a delegated group that holds the
harness itself is split first (the harness moves into a leaf, ``assay-harness``), since v2 hands
controllers only to groups whose parent holds no process. When no cgroup is writable (an
unprivileged user without a delegated subtree) ``detect()`` returns None, ``find()`` says why,
and the sandbox falls back to rlimits, which are weaker: RLIMIT_DATA bounds each process's
heap, not the step's resident memory in all, and makes an allocation fail instead of killing
the step. ``assay sandbox doctor`` prints what applies on a host (``hostlimits.py``).
"""

from __future__ import annotations

import errno
import os
import signal
import threading
import time
import uuid
from dataclasses import dataclass, field
from pathlib import Path

CGROUP_ROOT = Path("/sys/fs/cgroup")
GROUP_NAME = "assay"
LEAF_NAME = "assay-harness"  # v2: where the harness moves itself out of a delegated group it shares
CONTROLLERS = ("memory", "pids")
# Per-step peak memory under cgroup v2 where memory.peak cannot be reset (kernels before 6.12):
# memory.current is sampled this often while the step runs, through a descriptor kept open. The
# alternative, a fresh child group per step with the supervisor moved in and out of it, gives an
# exact peak but costs two cgroup migrations per step. Measured, 50 rounds of mkdir, two
# migrations of a sleeping process, a read and rmdir: 6.2 ms of wall time (0.4 ms of CPU) per
# step on a 2-core host (kernel 6.18, cgroup v1, load average 12), 36 ms in the TCG test VM
# (kernel 6.1, cgroup v2), added to every step's latency; a sample by pread() took 15 us on the
# same host, about 0.2 ms of CPU over a 60 ms step and no latency. So sampling it is. A sample
# can miss a spike shorter than the interval; a step that sets a new high for the group is read
# exactly from memory.peak instead, and the largest process's peak (wait4) is a floor.
SAMPLE_SECONDS = 0.005


def _writable_dir(path: Path) -> bool:
    return path.is_dir() and os.access(path, os.W_OK)


@dataclass
class Cgroup:
    """One candidate's group. ``procs_files`` are written with "0" by the child before exec."""

    version: int
    dirs: tuple[Path, ...]
    _peak_fd: int | None = field(default=None, repr=False, compare=False)
    _peak_resettable: bool | None = field(default=None, repr=False, compare=False)
    _swappiness_set: bool = field(default=False, repr=False, compare=False)
    _paths: dict = field(default_factory=dict, repr=False, compare=False)

    @property
    def procs_files(self) -> tuple[str, ...]:
        return tuple(str(d / "cgroup.procs") for d in self.dirs)

    def _memory_dir(self) -> Path:
        return self.dirs[0]

    def _pids_dir(self) -> Path | None:
        return self.dirs[-1] if self.version == 2 or len(self.dirs) > 1 else None

    def _file(self, name: str, pids: bool = False) -> str:
        """A control file's path, made once: steps read and write these several times each."""
        path = self._paths.get((name, pids))
        if path is None:
            path = self._paths[name, pids] = str((self._pids_dir() if pids else self._memory_dir()) / name)
        return path

    @property
    def limits_processes(self) -> bool:
        """Whether the group caps the process count (else RLIMIT_NPROC must)."""
        return self._pids_dir() is not None

    def oom_kills(self) -> int:
        """How many processes the group's memory limit has killed so far."""
        name = "memory.events" if self.version == 2 else "memory.oom_control"
        return _read_keyed(self._file(name)).get("oom_kill", 0)

    def oom_killed(self) -> bool:
        return self.oom_kills() > 0

    def peak_bytes(self) -> int:
        name = "memory.peak" if self.version == 2 else "memory.max_usage_in_bytes"
        return _read_int(self._file(name))

    def usage_bytes(self) -> int:
        name = "memory.current" if self.version == 2 else "memory.usage_in_bytes"
        return _read_int(self._file(name))

    def reset_peak(self) -> bool:
        """Start a new peak reading on v1; False where the kernel cannot (v2: see ``step_peak``)."""
        if self.version == 2:
            return False
        try:
            _write(self._file("memory.max_usage_in_bytes"), "0")
        except OSError:
            return False
        return True

    def step_peak(self) -> "PeakMeter":
        """A meter started now for the peak memory of the step about to run, counted from the
        memory the group holds at this moment (the supervisor's own)."""
        if self.version == 1:
            return PeakMeter(self, "reset" if self.reset_peak() else "none")
        if self._peak_resettable is not False:
            try:
                if self._peak_fd is None:
                    self._peak_fd = os.open(self._memory_dir() / "memory.peak", os.O_RDWR | os.O_CLOEXEC)
                os.write(self._peak_fd, b"reset\n")  # this descriptor's peak restarts (Linux 6.12)
                self._peak_resettable = True
                return PeakMeter(self, "fd")
            except OSError:
                self._close_peak_fd()
                self._peak_resettable = False
        return PeakMeter(self, "sampled")

    def peak_method(self) -> str:
        """How ``step_peak`` measures on this group, in words (for describe() and the doctor)."""
        if self.version == 1:
            return "memory.max_usage_in_bytes, reset before each step"
        if self._peak_resettable is None:
            self.step_peak().stop()
        if self._peak_resettable:
            return "memory.peak, reset per step through its own descriptor"
        return (f"memory.current sampled every {SAMPLE_SECONDS * 1000:g} ms (this kernel cannot reset "
                "memory.peak), or memory.peak exactly when a step sets the group's high")

    def swap_capped(self) -> bool:
        """Whether swap is held at zero for the group, so swap cannot hide a memory bomb."""
        memory = self._memory_dir()
        if self.version == 2:
            return _read_text(memory / "memory.swap.max") == "0"
        limit = _read_text(memory / "memory.limit_in_bytes")
        return limit is not None and _read_text(memory / "memory.memsw.limit_in_bytes") == limit

    def set_limits(self, memory_bytes: int, max_processes: int, old_memory: int | None = None) -> None:
        """Hard memory limit (swap off) and process count. ``old_memory``: the limit in force,
        when it may be raised (cgroup v1 keeps memory <= memory+swap at every moment, so the
        order of the two writes depends on the direction). Without swap accounting (no
        memory.swap.max, no memory.memsw files) swap cannot be capped: the doctor says so."""
        memory = self._memory_dir()
        if self.version == 2:
            _write(self._file("memory.max"), str(memory_bytes))
            if (memory / "memory.swap.max").exists():
                _write(self._file("memory.swap.max"), "0")
        else:
            raising = old_memory is not None and memory_bytes > old_memory
            if raising:  # the memory+swap ceiling first
                _try_write(self._file("memory.memsw.limit_in_bytes"), str(memory_bytes))
            _write(self._file("memory.limit_in_bytes"), str(memory_bytes))
            if not raising:
                _try_write(self._file("memory.memsw.limit_in_bytes"), str(memory_bytes))
            if not self._swappiness_set:  # a setting of the group's own: once is enough
                _try_write(self._file("memory.swappiness"), "0")
                self._swappiness_set = True
        pids = self._pids_dir()
        if pids is not None:
            if self.version == 2:
                _try_write(self._file("pids.max", pids=True), str(max_processes))
            else:
                _write(self._file("pids.max", pids=True), str(max_processes))

    def members(self) -> set[int]:
        pids: set[int] = set()
        for directory in self.dirs:
            try:
                pids |= {int(p) for p in (directory / "cgroup.procs").read_text().split()}
            except OSError:
                pass
        return pids

    def kill_all(self) -> None:
        """SIGKILL every process still in the group (belt and braces beside the pid namespace).
        cgroup v2's cgroup.kill (Linux 5.14) kills them all at once, a process forking
        meanwhile included; otherwise they are killed by number, in rounds."""
        if self.version == 2 and (self.dirs[0] / "cgroup.kill").exists():
            try:
                (self.dirs[0] / "cgroup.kill").write_text("1")
                return
            except OSError:
                pass
        for _ in range(50):
            pids = self.members()
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
        self._close_peak_fd()
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

    def _close_peak_fd(self) -> None:
        fd, self._peak_fd = self._peak_fd, None
        if fd is not None:
            try:
                os.close(fd)
            except OSError:
                pass


class PeakMeter:
    """One step's peak memory in a group, above what the group held when the step began.
    ``mode``: "reset" (v1's maximum, reset), "fd" (v2's memory.peak reset through a descriptor
    of its own), "sampled" (v2 without that: memory.current read every SAMPLE_SECONDS on a
    thread, and memory.peak when the step set a new high for the group), "none" (unknown)."""

    def __init__(self, group: Cgroup, mode: str):
        self.group = group
        self.mode = mode
        self.exact = mode in ("reset", "fd")
        self.baseline = group.usage_bytes()
        self.high = self.baseline
        self._stop = threading.Event()
        self._thread = None
        if mode == "sampled":
            self.group_peak = group.peak_bytes()
            self._thread = threading.Thread(target=self._sample, name="assay-peak", daemon=True)
            self._thread.start()

    def _sample(self) -> None:
        try:
            fd = os.open(self.group._memory_dir() / "memory.current", os.O_RDONLY | os.O_CLOEXEC)
        except OSError:
            return
        try:
            while True:
                try:
                    self.high = max(self.high, int(os.pread(fd, 64, 0).split()[0]))
                except (OSError, ValueError, IndexError):
                    return
                if self._stop.wait(SAMPLE_SECONDS):
                    return
        finally:
            os.close(fd)

    def stop(self) -> int | None:
        """The step's peak in bytes (above the baseline), or None where it cannot be known.
        ``exact`` says afterwards whether it was read rather than sampled."""
        if self.mode == "none":
            return None
        if self._thread is not None:
            self._stop.set()
            self._thread.join()
        if self.mode == "reset":
            peak = self.group.peak_bytes()
        elif self.mode == "fd":
            try:
                peak = int(os.pread(self.group._peak_fd, 64, 0).split()[0])
            except (OSError, TypeError, ValueError, IndexError):
                return None
        else:
            after = self.group.peak_bytes()
            self.exact = after > self.group_peak  # a new high for the group: memory.peak is the step's
            peak = after if self.exact else self.high
        return max(0, peak - self.baseline)


class CgroupFactory:
    """Creates per-candidate groups under one parent made at start-up."""

    def __init__(self, version: int, parents: tuple[Path, ...]):
        self.version = version
        self.parents = parents
        self.facts: dict | None = None  # what hostlimits.enforcement() found, once

    def describe(self) -> str:
        return f"cgroup v{self.version} ({', '.join(str(p) for p in self.parents)})"

    def create(self, memory_bytes: int, max_processes: int) -> Cgroup:
        name = uuid.uuid4().hex[:16]
        dirs = tuple(parent / name for parent in self.parents)
        for directory in dirs:
            directory.mkdir()
        group = Cgroup(self.version, dirs)
        try:
            group.set_limits(memory_bytes, max_processes)
        except OSError:
            group.remove()
            raise
        return group


def detect(root: Path = CGROUP_ROOT) -> CgroupFactory | None:
    """The best usable cgroup setup on this machine, or None."""
    return find(root)[0]


def find(root: Path = CGROUP_ROOT) -> tuple[CgroupFactory | None, str]:
    """The best usable cgroup setup on this machine (or None), and in words where it is or why
    there is none."""
    if (root / "cgroup.controllers").exists():
        return _find_v2(root)
    memory_v1 = root / "memory"
    if not (memory_v1 / "memory.limit_in_bytes").exists():
        return None, f"no cgroup hierarchy with a memory controller is mounted at {root}"
    if not _writable_dir(memory_v1):
        return None, (f"cgroup v1: {memory_v1} is not writable by uid {os.geteuid()} (v1 has no delegation "
                      "to unprivileged users; run Assay as root for cgroup limits)")
    parents = [memory_v1 / GROUP_NAME]
    if _writable_dir(root / "pids"):
        parents.append(root / "pids" / GROUP_NAME)
    try:
        for parent in parents:
            parent.mkdir(exist_ok=True)
    except OSError as exc:
        return None, f"cgroup v1: cannot create {exc.filename}: {exc.strerror}"
    return CgroupFactory(1, tuple(parents)), f"cgroup v1: {', '.join(str(p) for p in parents)}"


def _find_v2(root: Path) -> tuple[CgroupFactory | None, str]:
    """Under v2 the groups go below the root (when it is writable: as root) or below the
    harness's own group (delegated to the user running it)."""
    own = _own_v2_group(root)
    if own is not None and own.name == LEAF_NAME:  # moved there by an earlier call
        own = own.parent
    problems = []
    for base in dict.fromkeys(b for b in (root, own) if b is not None):
        if not _writable_dir(base):
            problems.append(f"{base} is not writable by uid {os.geteuid()}")
            continue
        available = (_read_text(base / "cgroup.controllers") or "").split()
        if "memory" not in available:
            problems.append(f"{base} has no memory controller to hand on (available: {' '.join(available) or 'none'})")
            continue
        wanted = [c for c in CONTROLLERS if c in available]
        problem = _enable(base, wanted)
        if problem is None:
            parent = base / GROUP_NAME
            try:
                parent.mkdir(exist_ok=True)
                problem = _enable(parent, wanted)
            except OSError as exc:
                problem = f"cannot create {parent}: {exc.strerror}"
            if problem is None:
                return CgroupFactory(2, (parent,)), f"cgroup v2: {parent} ({' '.join(wanted)})"
        problems.append(problem)
    hint = ("" if os.geteuid() == 0 else "; as an unprivileged user, run Assay in a delegated group: "
            "systemd-run --user --scope -p Delegate=yes assay ...")
    return None, "cgroup v2: " + "; ".join(problems) + hint


def _enable(base: Path, wanted: list[str]) -> str | None:
    """Hand the controllers in ``wanted`` to ``base``'s children; what went wrong, or None. v2
    refuses that (EBUSY) for a group holding processes, the root excepted: when the only one is
    this process, it moves into a leaf group of its own first."""
    if set(wanted) <= set((_read_text(base / "cgroup.subtree_control") or "").split()):
        return None
    request = " ".join(f"+{c}" for c in wanted)
    try:
        (base / "cgroup.subtree_control").write_text(request)
        return None
    except OSError as exc:
        if exc.errno != errno.EBUSY:
            return f"cannot enable {' '.join(wanted)} in {base}: {exc.strerror}"
    members = {int(p) for p in (_read_text(base / "cgroup.procs") or "").split()}
    if members != {os.getpid()}:
        return (f"{base} holds {len(members - {os.getpid()})} process(es) besides Assay, so it cannot hand its "
                "controllers to child groups (cgroup v2 gives them only to groups whose parent holds no process)")
    leaf = base / LEAF_NAME
    try:
        leaf.mkdir(exist_ok=True)
        (leaf / "cgroup.procs").write_text(str(os.getpid()))
        (base / "cgroup.subtree_control").write_text(request)
    except OSError as exc:
        return f"cannot move Assay into {leaf} and enable {' '.join(wanted)} in {base}: {exc.strerror}"
    return None


def _own_v2_group(root: Path) -> Path | None:
    try:
        for line in Path("/proc/self/cgroup").read_text().splitlines():
            if line.startswith("0::"):
                return root / line[3:].lstrip("/")
    except OSError:
        pass
    return None


def _read(path: Path | str) -> str:
    """A control file's text, by plain system calls (pathlib's objects cost per step)."""
    fd = os.open(path, os.O_RDONLY | os.O_CLOEXEC)
    try:
        return os.read(fd, 1 << 16).decode()
    finally:
        os.close(fd)


def _write(path: Path | str, value: str) -> None:
    fd = os.open(path, os.O_WRONLY | os.O_CLOEXEC)
    try:
        os.write(fd, value.encode())
    finally:
        os.close(fd)


def _read_keyed(path: Path | str) -> dict[str, int]:
    try:
        pairs = (line.split() for line in _read(path).splitlines())
        return {p[0]: int(p[1]) for p in pairs if len(p) == 2 and p[1].isdigit()}
    except OSError:
        return {}


def _read_int(path: Path | str) -> int:
    try:
        return int(_read(path).split()[0])
    except (OSError, ValueError, IndexError):
        return 0


def _read_text(path: Path | str) -> str | None:
    try:
        return _read(path).strip()
    except OSError:
        return None


def _try_write(path: Path | str, value: str) -> None:
    try:
        _write(path, value)
    except OSError:
        pass
