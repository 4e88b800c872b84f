"""No isolation at all: the candidate runs as a plain child process with rlimits.

Exists as the baseline that benchmarks compare the real sandboxes against, and for debugging a
runtime. It protects nothing: never point it at untrusted code.
"""

from __future__ import annotations

import contextlib
import shutil
import tempfile
from pathlib import Path

from .base import Limits, RuntimeSandboxNeeds, StepResult
from .bubblewrap import LocalWorkspace, default_work_root
from .process import run_limited


class BareWorkspace(LocalWorkspace):
    def __init__(self, root: Path, needs: RuntimeSandboxNeeds):
        super().__init__(root, owner=None)
        self.needs = needs

    def run(self, argv: list[str], limits: Limits, env: dict[str, str]) -> StepResult:
        merged = {"HOME": str(self.path), "TMPDIR": str(self.path), "LANG": "C.UTF-8",
                  "PATH": "/usr/local/bin:/usr/bin:/bin"}
        merged.update(dict(self.needs.env))
        merged.update(env)
        return run_limited(argv, cwd=str(self.path), env=merged, limits=limits, cgroups=None)


class BareSandbox:
    name = "none"

    def __init__(self, work_root: Path | None = None):
        self.work_root = Path(tempfile.mkdtemp(prefix="assay-bare-", dir=work_root or default_work_root()))

    def check(self) -> None:
        pass

    @contextlib.contextmanager
    def workspace(self, needs: RuntimeSandboxNeeds):
        space = BareWorkspace(self.work_root, needs)
        try:
            yield space
        finally:
            space.remove()

    def close(self) -> None:
        shutil.rmtree(self.work_root, ignore_errors=True)

    def describe(self) -> dict:
        return {"backend": self.name, "isolation": "none (unsafe baseline)"}
