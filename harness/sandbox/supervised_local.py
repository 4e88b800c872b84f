"""Warm sandboxes that are local child processes: one step supervisor (``step_supervisor.py``)
per worker, in a cgroup of its own where one is writable, checked out by one candidate at a
time through the pool in ``supervised.py``.

The bubblewrap backend starts the supervisor inside namespaces as their pid 1; the bare backend
(``--sandbox none``) starts the very same supervisor as a plain host process in its host mode.
Everything else is here, once: the cgroup sized to each step's limits (or, without a writable
cgroup, rlimits the supervisor sets per step), the reading of each step's reply, peak memory,
when a sandbox is retired, and how it is ended and cleaned up. So the two backends enforce
limits the same way and differ only in isolation.
"""

from __future__ import annotations

import abc
import atexit
import concurrent.futures as futures
import contextlib
import os
import shutil
import signal
import subprocess
import threading
import time
from dataclasses import dataclass
from pathlib import Path

from . import cgroups
from ..vocabulary import Limits, RuntimeSandboxNeeds, StepResult
from .cgroups import Cgroup
from .local import LOG, LocalSandbox, LocalWorkspace, private_folder, remove_folder
from .supervised import (
    HELLO_SECONDS,
    STEP_GRACE_SECONDS,
    Member,
    PipeChannel,
    SupervisorTrouble,
    WarmPool,
    brief,
    max_runs_from_env,
    memory_killed,
    read_run_reply,
    run_request,
)

# The supervisor (a Python process, ~10 MB) and, under bubblewrap, bubblewrap's own process
# share the sandbox's cgroup with the step: the group gets this much memory and these
# processes on top of the step's limits.
SUPERVISOR_MB = 16
SUPERVISOR_PROCESSES = 2


@dataclass(kw_only=True)
class Slot(Member):
    """One warm sandbox: the process started for it, the host folder that is its candidates'
    work dir, any other folders of its own, its cgroup and the limits in force there."""

    process: subprocess.Popen
    folder: Path
    cgroup: Cgroup | None
    scratch: tuple[Path, ...] = ()
    memory: int = 0
    processes: int = 0
    supervisor: int | None = None  # a pidfd for the supervisor


class SupervisedWorkspace(LocalWorkspace):
    """The work dir of one checked-out warm sandbox: files go straight to its host folder;
    steps go to its supervisor."""

    def __init__(self, sandbox: "SupervisedLocalSandbox", slot: Slot, needs: RuntimeSandboxNeeds):
        super().__init__(slot.folder, sandbox.run_as)
        self.sandbox = sandbox
        self.slot = slot
        self.needs = needs

    def run(self, argv: list[str], limits: Limits, env: dict[str, str], *, stdin: str | None = None,
            full_stdout: bool = False) -> StepResult:
        # A runtime command missing from the system is the machine's fault, not the candidate's.
        # (Programs the compile step builds, like ./main, are looked up by the kernel.)
        merged = self.sandbox.step_env(self.slot, self.needs, env)
        if "/" not in argv[0] and shutil.which(argv[0], path=merged["PATH"]) is None:
            return StepResult(exit_code=None,
                              infra_error=f"{argv[0]}: command not found in the sandbox (PATH={merged['PATH']})")
        slot, group = self.slot, self.slot.cgroup
        started = time.monotonic()
        oom_before = meter = None
        try:
            oom_before, meter = self.sandbox.fit_limits(slot, limits)
            try:
                reply = slot.channel.call(
                    run_request(argv, merged, limits, stdin, full_stdout, rlimit_memory=group is None,
                                rlimit_processes=group is None or not group.limits_processes),
                    limits.wall_seconds + STEP_GRACE_SECONDS)
            finally:
                peak = meter.stop() if meter is not None else None
        except (SupervisorTrouble, OSError) as exc:
            slot.spoiled = f"supervisor lost: {brief(exc)}"
            if group is not None and oom_before is not None and group.oom_kills() > oom_before:
                return memory_killed(started)  # the step took the supervisor down with it
            return StepResult(exit_code=None, wall_seconds=round(time.monotonic() - started, 4),
                              infra_error=f"{self.sandbox.label}: {exc}"[:500])
        if group is not None:
            reply["oom_kills"] = group.oom_kills() - oom_before
        else:
            # Under rlimits nothing here kills for memory (RLIMIT_DATA makes an allocation
            # fail instead), so a SIGKILL is not read as a memory kill; the runtime's own
            # out-of-memory message, backed by the step's peak, decides (the judge's rule).
            reply["oom_kills"] = 0
        result, spoiled = read_run_reply(reply, limits)
        slot.spoiled = slot.spoiled or spoiled
        if peak is not None:  # the group's peak; a sampled one at least the largest process's
            sampled = 0 if meter.exact else result.extra.get("peak_memory_mb", 0)
            result.extra["peak_memory_mb"] = max(round(peak / 2**20, 1), sampled)
        return result


class SupervisedLocalSandbox(LocalSandbox):
    """A backend whose warm sandboxes are local child processes running the step supervisor.

    Subclasses say how a sandbox starts (``launch``), what its hello must show
    (``check_hello``), which process is the supervisor (``supervisor_pid``), the steps'
    environment (``step_env``) and any scratch folders of its own (``scratch_folders``)."""

    label = "sandbox"  # names the backend in infra errors
    max_runs_env = ""
    supervisor_processes = SUPERVISOR_PROCESSES

    def __init__(self, work_root: Path | None, prefix: str, max_runs: int | None, run_as: int | None):
        self.max_runs = max_runs if max_runs is not None else max_runs_from_env(self.max_runs_env)
        super().__init__(work_root, prefix)
        self.run_as = run_as
        self.cgroups = cgroups.detect()
        self.pools: dict[RuntimeSandboxNeeds, WarmPool] = {}
        self.closed = False
        self._lock = threading.Lock()
        self._executor = futures.ThreadPoolExecutor(max_workers=2, thread_name_prefix="assay-warm")
        # Every sandbox is launched from this one thread, which lives until close(): bubblewrap's
        # --die-with-parent ties a sandbox to the thread that started it, not to the process.
        self._launcher = futures.ThreadPoolExecutor(max_workers=1, thread_name_prefix="assay-warm-launch")
        atexit.register(self.close)

    # -- what a subclass supplies --
    @abc.abstractmethod
    def launch(self, needs: RuntimeSandboxNeeds, folder: Path, scratch: tuple[Path, ...],
               group: Cgroup | None) -> subprocess.Popen:
        """Start a sandbox whose supervisor speaks on the process's stdin and stdout."""

    def check_hello(self, hello: dict, process: subprocess.Popen) -> None:
        """Raise SupervisorTrouble when the supervisor is not where it should be."""

    def supervisor_pidfd(self, process: subprocess.Popen) -> int | None:
        """A pidfd for the supervisor (by default the process started, a child of ours not yet
        reaped, so its number is still its own), or None where there can be none."""
        return pidfd_of(process.pid)

    @abc.abstractmethod
    def step_env(self, slot: Slot, needs: RuntimeSandboxNeeds, env: dict[str, str]) -> dict[str, str]:
        """The environment a step runs with in ``slot``: the runtime's, the caller's, and what
        the backend itself must set (paths, TMPDIR)."""

    def scratch_folders(self) -> tuple[Path, ...]:
        """Host folders a new sandbox needs besides its work dir (made here, removed with it)."""
        return ()

    def end_supervisor(self, slot: Slot) -> None:
        """Kill the sandbox's supervisor and what runs under it, at once. Never raises."""
        if not signal_pidfd(slot.supervisor, signal.SIGKILL):
            kill_process_group(slot.process)

    # -- protocol --
    @contextlib.contextmanager
    def workspace(self, needs: RuntimeSandboxNeeds):
        pool = self.pool_for(needs)
        try:
            slot = pool.acquire()
        except (SupervisorTrouble, OSError) as exc:
            raise RuntimeError(f"cannot start a {self.label}: {brief(exc)}") from None
        try:
            yield SupervisedWorkspace(self, slot, needs)
        except BaseException:
            slot.spoiled = slot.spoiled or "the candidate's handling was interrupted"
            raise
        finally:
            pool.release(slot)

    def memory_mechanism(self) -> str:
        """What enforces memory and process limits, for ``describe()``."""
        if self.cgroups is not None:
            return (f"{self.cgroups.describe()}: each step's limit plus {SUPERVISOR_MB} MB for the supervisor, "
                    "memory kills counted")
        return ("rlimits per step (RLIMIT_DATA for memory, RLIMIT_NPROC for processes): no cgroup is "
                "writable here; a step over its memory limit fails to allocate rather than being killed, so "
                "memory_limit is judged from the runtime's out-of-memory message")

    def warm(self, needs: RuntimeSandboxNeeds, count: int) -> None:
        """Start ``count`` sandboxes for a runtime ahead of its first candidates."""
        self.pool_for(needs).warm(count)

    def close(self) -> None:
        """End every warm sandbox and remove every folder. Never raises (it runs in the
        ``finally`` of a whole run): what fails is logged and noted in ``cleanup_problems``."""
        with self._lock:
            if self.closed:
                return
            self.closed = True
        for pool in list(self.pools.values()):
            for slot in pool.drain():
                self.guarded("ending a warm sandbox", lambda: self.discard(slot))
        self.guarded("waiting for the clean-up", lambda: self._executor.shutdown(wait=True))
        self.guarded("stopping the launcher", lambda: self._launcher.shutdown(wait=True))
        super().close()
        with contextlib.suppress(Exception):
            atexit.unregister(self.close)

    def guarded(self, what: str, job) -> None:
        try:
            job()
        except Exception as exc:  # noqa: BLE001 - logged and noted; the run goes on
            problem = f"{what}: {type(exc).__name__}: {exc}"[:500]
            LOG.warning("assay: %s: %s", self.label, problem)
            self.note(problem)

    # -- warm sandboxes --
    def pool_for(self, needs: RuntimeSandboxNeeds) -> WarmPool:
        with self._lock:
            pool = self.pools.get(needs)
            if pool is None:
                pool = self.pools[needs] = WarmPool(self, lambda: self.start_slot(needs))
            return pool

    def start_slot(self, needs: RuntimeSandboxNeeds) -> Slot:
        if self.closed:
            raise SupervisorTrouble("the sandbox was closed")
        folder = private_folder(self.work_root, self.run_as, prefix="slot-")
        scratch: tuple[Path, ...] = ()
        memory, processes = self._group_limits(Limits())
        group = None
        try:
            scratch = self.scratch_folders()
            if self.cgroups is not None:
                group = self.cgroups.create(memory, processes)
            process = self._launcher.submit(self.launch, needs, folder, scratch, group).result()
        except BaseException:
            if group is not None:
                self.guarded("removing a cgroup", group.remove)
            for path in (folder,) + scratch:
                self.note(remove_folder(path))
            raise
        slot = Slot(channel=PipeChannel(process.stdin, process.stdout, process.stderr), process=process,
                    folder=folder, scratch=scratch, cgroup=group, memory=memory, processes=processes)
        try:
            hello = slot.channel.call({"op": "hello"}, HELLO_SECONDS)
            self.check_hello(hello, process)
            slot.launcher = hello.get("launcher")
            slot.supervisor = self.supervisor_pidfd(process)
        except BaseException:
            self.discard(slot)
            raise
        return slot

    def fit_limits(self, slot: Slot, limits: Limits) -> tuple[int, cgroups.PeakMeter | None]:
        """Give the sandbox's cgroup the step's limits and start a reading of the step's peak
        memory (above what the supervisor holds); returns the group's memory-kill count so far
        (0 without a cgroup) and the started meter (None without a cgroup; the caller stops it)."""
        group = slot.cgroup
        if group is None:
            return 0, None
        memory, processes = self._group_limits(limits)
        if (memory, processes) != (slot.memory, slot.processes):
            group.set_limits(memory, processes, old_memory=slot.memory)
            slot.memory, slot.processes = memory, processes
        return group.oom_kills(), group.step_peak()

    def _group_limits(self, limits: Limits) -> tuple[int, int]:
        return (limits.memory_mb + SUPERVISOR_MB) * 2**20, limits.max_processes + self.supervisor_processes

    def discard(self, slot: Slot) -> None:
        """End a sandbox at once; its cgroup and folders go in the background. Never raises."""
        slot.channel.close()
        self.guarded("ending a supervisor", lambda: self.end_supervisor(slot))

        def clean_up() -> None:
            try:
                slot.process.wait(timeout=10)
            except subprocess.TimeoutExpired:
                kill_process_group(slot.process)
                with contextlib.suppress(subprocess.TimeoutExpired):
                    slot.process.wait(timeout=30)
            if slot.supervisor is not None:
                with contextlib.suppress(OSError):
                    os.close(slot.supervisor)
            if slot.cgroup is not None and not slot.cgroup.remove(wait_seconds=30):
                self.note(f"could not remove the cgroup {', '.join(map(str, slot.cgroup.dirs))}: still busy")
                LOG.warning("assay: %s: cgroup %s left behind (still busy)", self.label, slot.cgroup.dirs[0])
            for path in (slot.folder,) + slot.scratch:
                self.note(remove_folder(path))  # however deep a tree the candidate left

        self.background(lambda: self.guarded("cleaning up after a sandbox", clean_up))

    def background(self, job) -> None:
        try:
            self._executor.submit(job)
        except RuntimeError:  # shutting down: do it now
            job()


def kill_process_group(process: subprocess.Popen) -> None:
    """SIGKILL the group the sandbox's process leads (it was started in a session of its own),
    while that process is not yet reaped, so the group's number is still its own."""
    if process.returncode is not None:
        return
    with contextlib.suppress(ProcessLookupError, PermissionError):
        os.killpg(process.pid, signal.SIGKILL)


def pidfd_of(pid: int, parent: int | None = None) -> int | None:
    """A pidfd for ``pid`` (checked to still be ``parent``'s child once it is held, when a
    parent is given), or None where it cannot be had (no pidfds before Linux 5.3). A pidfd,
    unlike a pid, can never name another process that took the number over."""
    try:
        fd = os.pidfd_open(pid)
    except (AttributeError, OSError):
        return None
    if parent is not None and parent_of(pid) != parent:
        os.close(fd)
        return None
    return fd


def signal_pidfd(fd: int | None, sig: int) -> bool:
    """Send ``sig`` through a pidfd; False when there is none or it cannot be used."""
    if fd is None:
        return False
    try:
        signal.pidfd_send_signal(fd, sig)
    except ProcessLookupError:
        return True  # already gone
    except (AttributeError, OSError):
        return False
    return True


def children(parent: int) -> list[int]:
    try:
        return [int(pid) for task in os.listdir(f"/proc/{parent}/task")
                for pid in Path(f"/proc/{parent}/task/{task}/children").read_text().split()]
    except OSError:  # a kernel without /proc/PID/task/TID/children: every process's parent
        return [int(name) for name in os.listdir("/proc") if name.isdigit() and parent_of(int(name)) == parent]


def parent_of(pid: int) -> int | None:
    try:
        for line in Path(f"/proc/{pid}/status").read_text().splitlines():
            if line.startswith("PPid:"):
                return int(line.split()[1])
    except (OSError, ValueError, IndexError):
        pass
    return None
