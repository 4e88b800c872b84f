"""The embedded default sandbox: bubblewrap namespaces plus cgroup/rlimit resource limits.

Each step runs in fresh namespaces (no network, own pid namespace so nothing outlives it,
own IPC/UTS), with the system bound read-only, only the candidate's work dir writable, a clean
environment, and, when Assay runs as root, as the unprivileged ``nobody`` user.
"""

from __future__ import annotations

import contextlib
import os
import shutil
import subprocess
import tempfile
from pathlib import Path

from . import cgroups
from .base import Limits, RuntimeSandboxNeeds, SandboxUnavailable, StepResult
from .process import run_limited

NOBODY = 65534
BASE_RO_BINDS = ("/usr", "/etc/ld.so.cache", "/etc/alternatives", "/etc/localtime")
TOP_LEVEL_LINKS = ("/bin", "/lib", "/lib64", "/lib32", "/sbin")
WORK_DIR = "/work"
STATUS_FD = "{status-fd}"


def default_work_root() -> str:
    """Work dirs live in RAM (/dev/shm) when possible: pages a candidate writes there are
    charged to its memory cgroup, so filling the disk is bounded by the memory limit."""
    shm = "/dev/shm"
    if os.path.isdir(shm) and os.access(shm, os.W_OK):
        return shm
    return tempfile.gettempdir()


class LocalWorkspace:
    """A host temp folder for one candidate; subclasses decide how a step is wrapped."""

    def __init__(self, root: Path, owner: int | None):
        self.path = Path(tempfile.mkdtemp(prefix="cand-", dir=root))
        self.owner = owner
        if owner is not None:
            os.chown(self.path, owner, owner)
        os.chmod(self.path, 0o700)

    def write(self, name: str, content: str) -> None:
        target = self.path / name
        target.parent.mkdir(parents=True, exist_ok=True)
        target.write_text(content, encoding="utf-8")
        if self.owner is not None:
            os.chown(target, self.owner, self.owner)

    def read(self, name: str, max_bytes: int) -> bytes | None:
        target = self.path / name
        try:
            # O_NOFOLLOW: a candidate could replace the file with a link to a host file.
            fd = os.open(target, os.O_RDONLY | os.O_NOFOLLOW)
        except OSError:
            return None
        with os.fdopen(fd, "rb") as handle:
            return handle.read(max_bytes)

    def remove(self) -> None:
        shutil.rmtree(self.path, ignore_errors=True)


class BubblewrapWorkspace(LocalWorkspace):
    def __init__(self, sandbox: "BubblewrapSandbox", needs: RuntimeSandboxNeeds):
        super().__init__(sandbox.work_root, sandbox.run_as)
        self.sandbox = sandbox
        self.needs = needs

    def run(self, argv: list[str], limits: Limits, env: dict[str, str]) -> StepResult:
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
        )
        # bubblewrap reports the child's pid once the sandbox is up; without it, the sandbox
        # itself failed and the candidate never ran.
        if "child-pid" not in result.extra.pop("wrapper_status", "") and not result.timed_out:
            reason = result.stderr.strip()[-300:] or f"exit status {result.exit_code}"
            result.infra_error = f"bubblewrap could not start the sandbox: {reason}"
        return result


class BubblewrapSandbox:
    name = "bubblewrap"

    def __init__(self, work_root: Path | None = None):
        self.bwrap = shutil.which("bwrap")
        self.run_as = NOBODY if os.geteuid() == 0 else None
        self.cgroups = cgroups.detect()
        # One folder per sandbox object, so two sandboxes in one process never share it.
        self.work_root = Path(tempfile.mkdtemp(prefix="assay-work-", dir=work_root or default_work_root()))

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

    @contextlib.contextmanager
    def workspace(self, needs: RuntimeSandboxNeeds):
        space = BubblewrapWorkspace(self, needs)
        try:
            yield space
        finally:
            space.remove()

    def close(self) -> None:
        shutil.rmtree(self.work_root, ignore_errors=True)

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
        merged = {"HOME": WORK_DIR, "TMPDIR": "/tmp", "LANG": "C.UTF-8", "PATH": "/usr/local/bin:/usr/bin:/bin"}
        merged.update(dict(needs.env))
        merged.update(env)
        for key, value in merged.items():
            argv += ["--setenv", key, value]
        return argv
