"""The embedded default sandbox: bubblewrap namespaces plus cgroup/rlimit resource limits.

Each worker keeps a warm sandbox: one bubblewrap launch (no network, own pid, IPC, UTS, cgroup
and user namespaces; the system bound read-only; only ``/work``, ``/tmp`` and ``/dev/shm``
writable; a clean environment; a seccomp filter of our own, ``seccomp.py``; as the
unprivileged ``nobody`` user when Assay runs as root) whose pid 1 is the step supervisor (``step_supervisor.py``, as in the Docker backend). Why warm:
building the namespaces and mounts costs about ten milliseconds per launch, as much as a whole
Python candidate; the supervisor starts a step with a plain fork/exec.

Between candidates the supervisor empties ``/work`` and after every step ``/tmp`` and
``/dev/shm``; ``/dev`` itself is read-only. The sandbox is thrown away (and a fresh one
started in the background) after a timeout, a memory kill, anything a candidate leaves
behind (processes, files that cannot be removed, IPC objects), and after
``ASSAY_BWRAP_MAX_RUNS`` candidates (default 50). The sandbox's cgroup takes each step's
memory and process limits (plus an allowance for the supervisor) just before the step runs.
"""

from __future__ import annotations

import atexit
import concurrent.futures as futures
import contextlib
import os
import shutil
import signal
import subprocess
import sys
import threading
import time
from dataclasses import dataclass
from pathlib import Path

from . import cgroups, seccomp
from ..vocabulary import Limits, RuntimeSandboxNeeds, StepResult
from .base import SandboxUnavailable
from .cgroups import Cgroup
from .local import BASE_PATH, LOG, LocalSandbox, LocalWorkspace, candidate_env, private_folder, remove_folder
from .process import join_and_drop, run_limited
from .supervised import (
    AGENT_SOURCE,
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

NOBODY = 65534
BASE_RO_BINDS = ("/usr", "/etc/ld.so.cache", "/etc/alternatives", "/etc/localtime")
TOP_LEVEL_LINKS = ("/bin", "/lib", "/lib64", "/lib32", "/sbin")
WORK_DIR = "/work"
MAX_RUNS_ENV = "ASSAY_BWRAP_MAX_RUNS"
# The supervisor (a Python process, ~10 MB) and bubblewrap's own process share the sandbox's
# cgroup with the step: the group gets this much memory and two processes on top of its limits.
SUPERVISOR_MB = 16
SUPERVISOR_PROCESSES = 2


@dataclass(kw_only=True)
class Slot(Member):
    """One warm bubblewrap sandbox: its process, the host folder behind ``/work``, its cgroup
    and the limits in force there."""

    process: subprocess.Popen
    folder: Path
    cgroup: Cgroup | None
    memory: int = 0
    processes: int = 0
    supervisor: int | None = None  # a pidfd for the supervisor, bubblewrap's child


class BubblewrapWorkspace(LocalWorkspace):
    """``/work`` of one checked-out warm sandbox: files go straight to its host folder; steps
    go to its supervisor."""

    def __init__(self, sandbox: "BubblewrapSandbox", slot: Slot, needs: RuntimeSandboxNeeds):
        super().__init__(slot.folder, sandbox.run_as)
        self.sandbox = sandbox
        self.slot = slot
        self.needs = needs

    def run(self, argv: list[str], limits: Limits, env: dict[str, str]) -> StepResult:
        # A runtime command missing from the system is the machine's fault, not the candidate's.
        # (Programs the compile step builds, like ./main, are looked up by the kernel.)
        merged = candidate_env(self.needs, env, home=WORK_DIR, tmp="/tmp")
        if "/" not in argv[0] and shutil.which(argv[0], path=merged["PATH"]) is None:
            return StepResult(exit_code=None,
                              infra_error=f"{argv[0]}: command not found in the sandbox (PATH={merged['PATH']})")
        slot, group = self.slot, self.slot.cgroup
        started = time.monotonic()
        oom_before = None
        try:
            oom_before, baseline = self.sandbox.fit_limits(slot, limits)
            reply = slot.channel.call(
                run_request(argv, merged, limits, rlimit_memory=group is None,
                            rlimit_processes=group is None or not group.limits_processes),
                limits.wall_seconds + STEP_GRACE_SECONDS)
        except (SupervisorTrouble, OSError) as exc:
            slot.spoiled = f"supervisor lost: {brief(exc)}"
            if group is not None and oom_before is not None and group.oom_kills() > oom_before:
                return memory_killed(started)  # the step took the supervisor down with it
            return StepResult(exit_code=None, wall_seconds=round(time.monotonic() - started, 4),
                              infra_error=f"bubblewrap sandbox: {exc}"[:500])
        if group is not None:
            reply["oom_kills"] = group.oom_kills() - oom_before
        result, spoiled = read_run_reply(reply, limits)
        slot.spoiled = slot.spoiled or spoiled
        if baseline is not None:
            result.extra["peak_memory_mb"] = round(max(0, group.peak_bytes() - baseline) / 2**20, 1)
        return result


class BubblewrapSandbox(LocalSandbox):
    name = "bubblewrap"

    def __init__(self, work_root: Path | None = None, *, max_runs: int | None = None):
        self.max_runs = max_runs if max_runs is not None else max_runs_from_env(MAX_RUNS_ENV)
        super().__init__(work_root, "assay-work-")
        os.chmod(self.work_root, 0o711)  # the sandbox user passes through to its own folder
        self.bwrap = shutil.which("bwrap")
        self.run_as = NOBODY if os.geteuid() == 0 else None
        self.cgroups = cgroups.detect()
        self.pools: dict[RuntimeSandboxNeeds, WarmPool] = {}
        self.closed = False
        self._lock = threading.Lock()
        self._executor = futures.ThreadPoolExecutor(max_workers=2, thread_name_prefix="assay-bwrap")
        # Every sandbox is launched from this one thread, which lives until close(): bubblewrap's
        # --die-with-parent ties a sandbox to the thread that started it, not to the process.
        self._launcher = futures.ThreadPoolExecutor(max_workers=1, thread_name_prefix="assay-bwrap-launch")
        atexit.register(self.close)

    # -- protocol --
    def check(self) -> None:
        if not self.bwrap:
            raise SandboxUnavailable(
                "bubblewrap (bwrap) is not installed; on Debian/Ubuntu: apt-get install bubblewrap"
            )
        filter_fd = seccomp.program_fd()
        try:
            probe = run_limited(
                self.bwrap_argv(self.work_root, RuntimeSandboxNeeds("probe"), {}, seccomp_fd=filter_fd)
                + ["--", "/bin/true"],
                cwd=str(self.work_root),
                env={"PATH": "/usr/bin:/bin"},
                limits=Limits(wall_seconds=20, cpu_seconds=20),
                cgroups=self.cgroups,
                user=self.run_as,
                pass_fds=(filter_fd,),
            )
        finally:
            os.close(filter_fd)
        if not probe.ok:
            raise SandboxUnavailable(
                "bubblewrap cannot create a sandbox here (user namespaces disabled, or a kernel without "
                "seccomp filters?): "
                + (probe.infra_error or probe.stderr.strip()[:300] or f"exit {probe.exit_code}")
            )
        try:
            self.discard(self.start_slot(RuntimeSandboxNeeds("probe")))
        except (SupervisorTrouble, OSError) as exc:
            raise SandboxUnavailable(
                "bubblewrap cannot start its step supervisor, which needs a python3 (3.8 or later) under "
                f"/usr, or a Python the sandbox user can read: {brief(exc)}"
            ) from None

    @contextlib.contextmanager
    def workspace(self, needs: RuntimeSandboxNeeds):
        pool = self.pool_for(needs)
        try:
            slot = pool.acquire()
        except (SupervisorTrouble, OSError) as exc:
            raise RuntimeError(f"cannot start a bubblewrap sandbox: {brief(exc)}") from None
        try:
            yield BubblewrapWorkspace(self, slot, needs)
        except BaseException:
            slot.spoiled = slot.spoiled or "the candidate's handling was interrupted"
            raise
        finally:
            pool.release(slot)

    def describe(self) -> dict:
        version = subprocess.run([self.bwrap, "--version"], capture_output=True, text=True).stdout.strip()
        return {
            "backend": self.name,
            "version": version,
            "memory_limit": self.cgroups.describe() if self.cgroups else "rlimit (RLIMIT_AS)",
            "user": "nobody" if self.run_as == NOBODY else "invoking user",
            "isolation": ("warm sandbox per worker: network, pid, IPC, UTS, cgroup and user namespaces; "
                          "read-only system; /work, /tmp and /dev/shm emptied between candidates"),
            "syscall_filter": seccomp.describe(),
            "supervisor": "pid-1 step supervisor (harness/sandbox/step_supervisor.py) on the host's python3",
            "max_runs_per_sandbox": self.max_runs,
        }

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
            LOG.warning("assay: bubblewrap sandbox: %s", problem)
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
        limits = Limits()
        memory, processes = self._group_limits(limits)
        group = None
        try:
            if self.cgroups is not None:
                group = self.cgroups.create(memory, processes)
            python, extra_binds = supervisor_python()
            filter_fd = seccomp.program_fd()
            try:
                argv = self.bwrap_argv(folder, needs, {}, extra_binds, seccomp_fd=filter_fd)
                argv += ["--as-pid-1", "--", python, "-I", "-S", "-B", "-c", AGENT_SOURCE]
                process = self._launcher.submit(
                    subprocess.Popen, argv, cwd=str(folder), env={"PATH": "/usr/bin:/bin"}, stdin=subprocess.PIPE,
                    stdout=subprocess.PIPE, stderr=subprocess.PIPE, start_new_session=True, close_fds=True,
                    pass_fds=(filter_fd,), preexec_fn=join_and_drop(group, self.run_as),
                ).result()
            finally:
                os.close(filter_fd)  # bubblewrap has read it by the time it runs the supervisor
        except BaseException:
            if group is not None:
                self.guarded("removing a cgroup", group.remove)
            self.note(remove_folder(folder))
            raise
        slot = Slot(channel=PipeChannel(process.stdin, process.stdout, process.stderr), process=process,
                    folder=folder, cgroup=group, memory=memory, processes=processes)
        try:
            hello = slot.channel.call({"op": "hello"}, HELLO_SECONDS)
            if hello["pid"] != 1:
                raise SupervisorTrouble(f"the supervisor runs as pid {hello['pid']}, not 1")
            slot.supervisor = child_pidfd(process.pid)
        except BaseException:
            self.discard(slot)
            raise
        return slot

    def fit_limits(self, slot: Slot, limits: Limits) -> tuple[int, int | None]:
        """Give the sandbox's cgroup the step's limits and restart its peak reading; returns
        the group's memory-kill count so far (0 without a cgroup) and the memory in use before
        the step, the supervisor's own (None where no per-step peak can be read: no cgroup,
        or cgroup v2, which restarts a peak only per open file)."""
        group = slot.cgroup
        if group is None:
            return 0, None
        memory, processes = self._group_limits(limits)
        if (memory, processes) != (slot.memory, slot.processes):
            group.set_limits(memory, processes, old_memory=slot.memory)
            slot.memory, slot.processes = memory, processes
        baseline = group.usage_bytes() if group.reset_peak() else None
        return group.oom_kills(), baseline

    @staticmethod
    def _group_limits(limits: Limits) -> tuple[int, int]:
        return (limits.memory_mb + SUPERVISOR_MB) * 2**20, limits.max_processes + SUPERVISOR_PROCESSES

    def discard(self, slot: Slot) -> None:
        """End a sandbox at once; its cgroup and folder go in the background. Never raises.

        The supervisor goes first: it is the sandbox's pid 1, so the kernel ends every process in
        the sandbox with it, and bubblewrap, its parent, reaps it and exits. Killing bubblewrap
        first would orphan the supervisor to the host's init, which may be slow to reap it (or
        never do), and its cgroup stays busy until then."""
        slot.channel.close()
        if not signal_pidfd(slot.supervisor, signal.SIGKILL):
            self._kill_bubblewrap(slot)

        def clean_up() -> None:
            try:
                slot.process.wait(timeout=10)
            except subprocess.TimeoutExpired:
                self._kill_bubblewrap(slot)
                with contextlib.suppress(subprocess.TimeoutExpired):
                    slot.process.wait(timeout=30)
            if slot.supervisor is not None:
                with contextlib.suppress(OSError):
                    os.close(slot.supervisor)
            if slot.cgroup is not None and not slot.cgroup.remove(wait_seconds=30):
                self.note(f"could not remove the cgroup {', '.join(map(str, slot.cgroup.dirs))}: still busy")
                LOG.warning("assay: bubblewrap sandbox: cgroup %s left behind (still busy)", slot.cgroup.dirs[0])
            self.note(remove_folder(slot.folder))  # however deep a tree the candidate left

        self.background(lambda: self.guarded("cleaning up after a sandbox", clean_up))

    @staticmethod
    def _kill_bubblewrap(slot: Slot) -> None:
        with contextlib.suppress(ProcessLookupError, PermissionError):
            os.killpg(slot.process.pid, signal.SIGKILL)

    def background(self, job) -> None:
        try:
            self._executor.submit(job)
        except RuntimeError:  # shutting down: do it now
            job()

    # -- the bubblewrap command --
    def bwrap_argv(self, work: Path, needs: RuntimeSandboxNeeds, env: dict[str, str],
                   extra_binds: tuple[str, ...] = (), *, seccomp_fd: int) -> list[str]:
        argv = [
            self.bwrap,
            "--seccomp", str(seccomp_fd),  # harness/sandbox/seccomp.py: keyring, namespaces, mounts...
            "--unshare-all",  # network, pid, ipc, uts, cgroup, user namespaces
            "--die-with-parent",  # and with bubblewrap's own process, everything in the sandbox
            "--new-session",
            "--clearenv",
            "--proc", "/proc",
            "--dev", "/dev",
            "--tmpfs", "/dev/shm",
            "--mqueue", "/dev/mqueue",  # so the supervisor sees POSIX message queues left behind
            "--remount-ro", "/dev",  # a warm sandbox outlives candidates: nothing may stay in /dev
            "--tmpfs", "/tmp",
            "--bind", str(work), WORK_DIR,
            "--chdir", WORK_DIR,
            "--hostname", "sandbox",
        ]
        for link in TOP_LEVEL_LINKS:
            if os.path.islink(link):
                argv += ["--symlink", os.readlink(link), link]
            elif os.path.isdir(link):
                argv += ["--ro-bind", link, link]
        for path in BASE_RO_BINDS + tuple(needs.ro_binds) + tuple(extra_binds):
            argv += ["--ro-bind-try", path, path]
        argv += ["--remount-ro", "/"]  # the sandbox's own root too: only /work and /tmp take writes
        for key, value in candidate_env(needs, env, home=WORK_DIR, tmp="/tmp").items():
            argv += ["--setenv", key, value]
        return argv


def child_pidfd(parent: int) -> int | None:
    """A pidfd for the one child of bubblewrap's process ``parent`` (the supervisor), or None
    where it cannot be had (no pidfds before Linux 5.3). A pidfd, unlike a pid, can never
    name another process that took the number over."""
    for pid in _children(parent):
        try:
            fd = os.pidfd_open(pid)
        except (AttributeError, OSError):
            continue
        if _parent_of(pid) == parent:  # still that child once the pidfd holds it
            return fd
        os.close(fd)
    return None


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


def _children(parent: int) -> list[int]:
    try:
        return [int(pid) for task in os.listdir(f"/proc/{parent}/task")
                for pid in Path(f"/proc/{parent}/task/{task}/children").read_text().split()]
    except OSError:  # a kernel without /proc/PID/task/TID/children: every process's parent
        return [int(name) for name in os.listdir("/proc") if name.isdigit() and _parent_of(int(name)) == parent]


def _parent_of(pid: int) -> int | None:
    try:
        for line in Path(f"/proc/{pid}/status").read_text().splitlines():
            if line.startswith("PPid:"):
                return int(line.split()[1])
    except (OSError, ValueError, IndexError):
        pass
    return None


def supervisor_python() -> tuple[str, tuple[str, ...]]:
    """The interpreter the supervisor runs on inside the sandbox (standard library only, any
    Python 3.8 or later), and any folder that must be bound for it: the system's python3 under
    /usr when there is one (the sandbox sees /usr anyway), else the harness's own Python."""
    system = shutil.which("python3", path=BASE_PATH)
    if system and system.startswith("/usr/"):
        return system, ()
    python = os.path.realpath(sys.executable)
    prefix = os.path.realpath(sys.base_prefix)
    binds = () if prefix.startswith("/usr/") else (prefix,)
    if binds and not python.startswith(prefix + "/"):
        binds += (os.path.dirname(python),)
    return python, binds
