"""The embedded default sandbox: bubblewrap namespaces plus cgroup/rlimit resource limits.

Each step runs in fresh namespaces (no network, own pid namespace so nothing outlives it,
own IPC/UTS), with the system bound read-only, only the candidate's work dir writable, a clean
environment, and, when Assay runs as root, as the unprivileged ``nobody`` user.
"""

from __future__ import annotations

import os
import shutil
import subprocess
from pathlib import Path

from . import cgroups
from .base import Limits, RuntimeSandboxNeeds, SandboxUnavailable, StepResult
from .local import LocalSandbox, LocalWorkspace, candidate_env
from .process import run_limited

NOBODY = 65534
BASE_RO_BINDS = ("/usr", "/etc/ld.so.cache", "/etc/alternatives", "/etc/localtime")
TOP_LEVEL_LINKS = ("/bin", "/lib", "/lib64", "/lib32", "/sbin")
WORK_DIR = "/work"
STATUS_FD = "{status-fd}"


class BubblewrapWorkspace(LocalWorkspace):
    def __init__(self, sandbox: "BubblewrapSandbox", needs: RuntimeSandboxNeeds):
        super().__init__(sandbox.work_root, sandbox.run_as)
        self.sandbox = sandbox
        self.needs = needs

    def run(self, argv: list[str], limits: Limits, env: dict[str, str]) -> StepResult:
        # A runtime command missing from the system is the machine's fault, not the candidate's.
        # (Programs the compile step builds, like ./main, are looked up by the kernel.)
        path = candidate_env(self.needs, env, home=WORK_DIR, tmp="/tmp")["PATH"]
        if "/" not in argv[0] and shutil.which(argv[0], path=path) is None:
            return StepResult(exit_code=None, infra_error=f"{argv[0]}: command not found in the sandbox (PATH={path})")
        command = self.sandbox.bwrap_argv(self.path, self.needs, env)
        command += ["--json-status-fd", STATUS_FD, "--"] + argv
        result = run_limited(
            command,
            cwd=str(self.path),
            env={"PATH": "/usr/bin:/bin"},
            limits=limits,
            cgroups=self.sandbox.cgroups,
            user=self.sandbox.run_as,
            status_fd_placeholder=STATUS_FD,
            exit_codes_encode_signals=True,
        )
        # bubblewrap reports the child's pid once the sandbox is up; without it, the sandbox
        # itself failed and the candidate never ran.
        if "child-pid" not in result.extra.pop("wrapper_status", "") and not result.timed_out:
            reason = result.stderr.strip()[-300:] or f"exit status {result.exit_code}"
            result.infra_error = f"bubblewrap could not start the sandbox: {reason}"
        return result


class BubblewrapSandbox(LocalSandbox):
    name = "bubblewrap"
    workspace_class = BubblewrapWorkspace

    def __init__(self, work_root: Path | None = None):
        super().__init__(work_root, "assay-work-")
        self.bwrap = shutil.which("bwrap")
        self.run_as = NOBODY if os.geteuid() == 0 else None
        self.cgroups = cgroups.detect()

    def check(self) -> None:
        if not self.bwrap:
            raise SandboxUnavailable(
                "bubblewrap (bwrap) is not installed; on Debian/Ubuntu: apt-get install bubblewrap"
            )
        os.chmod(self.work_root, 0o711)
        probe = run_limited(
            self.bwrap_argv(self.work_root, RuntimeSandboxNeeds("probe"), {}) + ["--", "/bin/true"],
            cwd=str(self.work_root),
            env={"PATH": "/usr/bin:/bin"},
            limits=Limits(wall_seconds=20, cpu_seconds=20),
            cgroups=self.cgroups,
            user=self.run_as,
        )
        if not probe.ok:
            raise SandboxUnavailable(
                "bubblewrap cannot create a sandbox here (user namespaces disabled?): "
                + (probe.infra_error or probe.stderr.strip()[:300] or f"exit {probe.exit_code}")
            )

    def describe(self) -> dict:
        version = subprocess.run([self.bwrap, "--version"], capture_output=True, text=True).stdout.strip()
        return {
            "backend": self.name,
            "version": version,
            "memory_limit": self.cgroups.describe() if self.cgroups else "rlimit (RLIMIT_AS)",
            "user": "nobody" if self.run_as == NOBODY else "invoking user",
        }

    def bwrap_argv(self, work: Path, needs: RuntimeSandboxNeeds, env: dict[str, str]) -> list[str]:
        argv = [
            self.bwrap,
            "--unshare-all",  # network, pid, ipc, uts, cgroup, user namespaces
            "--die-with-parent",
            "--new-session",
            "--clearenv",
            "--proc", "/proc",
            "--dev", "/dev",
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
        for path in BASE_RO_BINDS + tuple(needs.ro_binds):
            argv += ["--ro-bind-try", path, path]
        argv += ["--remount-ro", "/"]  # the sandbox's own root too: only /work and /tmp take writes
        for key, value in candidate_env(needs, env, home=WORK_DIR, tmp="/tmp").items():
            argv += ["--setenv", key, value]
        return argv
