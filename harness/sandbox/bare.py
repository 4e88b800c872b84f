"""No isolation at all: the candidate runs as a plain child process with rlimits.

Exists as the baseline that benchmarks compare the real sandboxes against, and for debugging a
runtime. It protects nothing: never point it at untrusted code.
"""

from __future__ import annotations

from pathlib import Path

from ..vocabulary import Limits, RuntimeSandboxNeeds, StepResult
from .local import LocalSandbox, LocalWorkspace, candidate_env, private_folder
from .process import run_limited


class BareWorkspace(LocalWorkspace):
    def __init__(self, sandbox: "BareSandbox", needs: RuntimeSandboxNeeds):
        super().__init__(private_folder(sandbox.work_root, None), owner=None)
        self.needs = needs

    def run(self, argv: list[str], limits: Limits, env: dict[str, str]) -> StepResult:
        merged = candidate_env(self.needs, env, home=str(self.path), tmp=str(self.path))
        return run_limited(argv, cwd=str(self.path), env=merged, limits=limits, cgroups=None)


class BareSandbox(LocalSandbox):
    name = "none"
    workspace_class = BareWorkspace

    def __init__(self, work_root: Path | None = None):
        super().__init__(work_root, "assay-bare-")

    def check(self) -> None:
        """Nothing to check: no isolation is always available."""

    def describe(self) -> dict:
        return {"backend": self.name, "isolation": "none (unsafe baseline)"}
