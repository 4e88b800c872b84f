"""Sandbox backends behind one protocol (see ``base``); pick one by name."""

from __future__ import annotations

from pathlib import Path

from .base import Limits, RuntimeSandboxNeeds, Sandbox, SandboxUnavailable, StepResult, Workspace

BACKENDS = ("bubblewrap", "docker", "none")


def make_sandbox(name: str, work_root: Path | None = None) -> Sandbox:
    if name == "bubblewrap":
        from .bubblewrap import BubblewrapSandbox

        return BubblewrapSandbox(work_root)
    if name == "docker":
        from .docker import DockerSandbox

        return DockerSandbox(work_root)
    if name == "none":
        from .bare import BareSandbox

        return BareSandbox(work_root)
    raise SandboxUnavailable(f"unknown sandbox {name!r}; choose one of: {', '.join(BACKENDS)}")


__all__ = ["BACKENDS", "Limits", "RuntimeSandboxNeeds", "Sandbox", "SandboxUnavailable", "StepResult",
           "Workspace", "make_sandbox"]
