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
What it shares with the bare backend (the pool, cgroups, limits, clean-up) is in
``supervised_local.py``; this module adds the namespaces.
"""

from __future__ import annotations

import os
import shutil
import subprocess
import sys
from pathlib import Path

from . import hostlimits, seccomp
from ..vocabulary import RuntimeSandboxNeeds
from .base import SandboxUnavailable
from .cgroups import Cgroup
from .local import BASE_PATH, candidate_env
from .process import join_and_drop
from .supervised import AGENT_SOURCE, SupervisorTrouble, brief
from .supervised_local import Slot, SupervisedLocalSandbox, children, pidfd_of

NOBODY = 65534
BASE_RO_BINDS = ("/usr", "/etc/ld.so.cache", "/etc/alternatives", "/etc/localtime")
TOP_LEVEL_LINKS = ("/bin", "/lib", "/lib64", "/lib32", "/sbin")
WORK_DIR = "/work"
MAX_RUNS_ENV = "ASSAY_BWRAP_MAX_RUNS"
PROBE_SECONDS = 20


class BubblewrapSandbox(SupervisedLocalSandbox):
    name = "bubblewrap"
    label = "bubblewrap sandbox"
    max_runs_env = MAX_RUNS_ENV

    def __init__(self, work_root: Path | None = None, *, max_runs: int | None = None):
        super().__init__(work_root, "assay-work-", max_runs, run_as=NOBODY if os.geteuid() == 0 else None)
        os.chmod(self.work_root, 0o711)  # the sandbox user passes through to its own folder
        self.bwrap = shutil.which("bwrap")

    # -- protocol --
    def check(self) -> None:
        if not self.bwrap:
            raise SandboxUnavailable(
                "bubblewrap (bwrap) is not installed; on Debian/Ubuntu: apt-get install bubblewrap"
            )
        problem = self._probe()
        if problem:
            raise SandboxUnavailable(
                "bubblewrap cannot create a sandbox here (user namespaces disabled, or a kernel without "
                f"seccomp filters?): {problem}"
            )
        try:
            self.discard(self.start_slot(RuntimeSandboxNeeds("probe")))
        except (SupervisorTrouble, OSError) as exc:
            raise SandboxUnavailable(
                "bubblewrap cannot start its step supervisor, which needs a python3 (3.9 or later) under "
                f"/usr, or a Python the sandbox user can read: {brief(exc)}"
            ) from None

    def _probe(self) -> str | None:
        """Run /bin/true in a bare sandbox once; what went wrong, or None. Its own error
        message says more than a supervisor that never answers."""
        filter_fd = seccomp.program_fd()
        try:
            argv = self.bwrap_argv(self.work_root, RuntimeSandboxNeeds("probe"), {}, seccomp_fd=filter_fd)
            done = subprocess.run(argv + ["--", "/bin/true"], cwd=str(self.work_root), env={"PATH": "/usr/bin:/bin"},
                                  stdin=subprocess.DEVNULL, capture_output=True, timeout=PROBE_SECONDS,
                                  start_new_session=True, pass_fds=(filter_fd,),
                                  preexec_fn=join_and_drop(None, self.run_as))
        except subprocess.TimeoutExpired:
            return f"a sandbox running /bin/true did not end within {PROBE_SECONDS} s"
        except OSError as exc:
            return f"cannot start {self.bwrap}: {exc}"
        finally:
            os.close(filter_fd)
        if done.returncode != 0:
            return done.stderr.decode("utf-8", "replace").strip()[:300] or f"exit {done.returncode}"
        return None

    def describe(self) -> dict:
        version = subprocess.run([self.bwrap, "--version"], capture_output=True, text=True).stdout.strip()
        return {
            "backend": self.name,
            "version": version,
            "memory_limit": self.memory_mechanism(),
            "enforcement": hostlimits.enforcement(self.cgroups),  # what `assay sandbox doctor` prints
            "user": "nobody" if self.run_as == NOBODY else "invoking user",
            "isolation": ("warm sandbox per worker: network, pid, IPC, UTS, cgroup and user namespaces; "
                          "read-only system; /work, /tmp and /dev/shm emptied between candidates"),
            "syscall_filter": seccomp.describe(),
            "supervisor": "pid-1 step supervisor (harness/sandbox/step_supervisor.py) on the host's python3",
            "max_runs_per_sandbox": self.max_runs,
        }

    # -- a warm sandbox --
    def launch(self, needs: RuntimeSandboxNeeds, folder: Path, scratch: tuple[Path, ...],
               group: Cgroup | None) -> subprocess.Popen:
        python, extra_binds = supervisor_python()
        filter_fd = seccomp.program_fd()
        try:
            argv = self.bwrap_argv(folder, needs, {}, extra_binds, seccomp_fd=filter_fd)
            argv += ["--as-pid-1", "--", python, "-I", "-S", "-B", "-c", AGENT_SOURCE]
            return subprocess.Popen(
                argv, cwd=str(folder), env={"PATH": "/usr/bin:/bin"}, stdin=subprocess.PIPE,
                stdout=subprocess.PIPE, stderr=subprocess.PIPE, start_new_session=True, close_fds=True,
                pass_fds=(filter_fd,), preexec_fn=join_and_drop(group, self.run_as),
            )
        finally:
            os.close(filter_fd)  # bubblewrap has read it by the time it runs the supervisor

    def check_hello(self, hello: dict, process: subprocess.Popen) -> None:
        if hello["pid"] != 1:
            raise SupervisorTrouble(f"the supervisor runs as pid {hello['pid']}, not 1")

    def supervisor_pidfd(self, process: subprocess.Popen) -> int | None:
        return child_pidfd(process.pid)

    def step_env(self, slot: Slot, needs: RuntimeSandboxNeeds, env: dict[str, str]) -> dict[str, str]:
        return candidate_env(needs, env, home=WORK_DIR, tmp="/tmp")

    # The supervisor goes first when a sandbox is discarded (the base class's end_supervisor,
    # through its pidfd): it is the sandbox's pid 1, so the kernel ends every process in the
    # sandbox with it, and bubblewrap, its parent, reaps it and exits. Killing bubblewrap first
    # would orphan the supervisor to the host's init, which may be slow to reap it (or never
    # do), and its cgroup stays busy until then.

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
    where it cannot be had."""
    for pid in children(parent):
        fd = pidfd_of(pid, parent=parent)  # still that child once the pidfd holds it
        if fd is not None:
            return fd
    return None


def supervisor_python() -> tuple[str, tuple[str, ...]]:
    """The interpreter the supervisor runs on inside the sandbox (standard library only, any
    Python 3.9 or later, for os.waitstatus_to_exitcode), and any folder that must be bound for
    it: the system's python3 under /usr when there is one (the sandbox sees /usr anyway), else
    the harness's own Python."""
    system = shutil.which("python3", path=BASE_PATH)
    if system and system.startswith("/usr/"):
        return system, ()
    python = os.path.realpath(sys.executable)
    prefix = os.path.realpath(sys.base_prefix)
    binds = () if prefix.startswith("/usr/") else (prefix,)
    if binds and not python.startswith(prefix + "/"):
        binds += (os.path.dirname(python),)
    return python, binds
