"""Sandboxes: where one candidate's steps run, under limits, behind one protocol (``base``).

Backends register here by name; ``make_sandbox`` is the only place that turns a name into a
backend, so adding one is a module plus a ``register_backend`` call, never an if-chain. Every
backend is a context manager whose ``close()`` ends what it started.
"""

from __future__ import annotations

from pathlib import Path
from typing import Callable

from ..vocabulary import Limits, RuntimeSandboxNeeds, StepResult
from .base import Sandbox, SandboxError, SandboxUnavailable, Workspace

_BACKENDS: dict[str, Callable[[Path | None], Sandbox]] = {}


def register_backend(name: str, factory: Callable[[Path | None], Sandbox]) -> None:
    """``factory(work_root)`` builds the backend; it should import its module lazily, so an
    unused backend's dependencies (the Docker client) are never loaded."""
    _BACKENDS[name] = factory


def backends() -> tuple[str, ...]:
    return tuple(_BACKENDS)


def make_sandbox(name: str, work_root: Path | None = None) -> Sandbox:
    if name not in _BACKENDS:
        raise SandboxUnavailable(f"unknown sandbox {name!r}; choose one of: {', '.join(_BACKENDS)}")
    return _BACKENDS[name](work_root)


def _bubblewrap(work_root):
    from .bubblewrap import BubblewrapSandbox

    return BubblewrapSandbox(work_root)


def _docker(work_root):
    from .docker import DockerSandbox

    return DockerSandbox(work_root)


def _bare(work_root):
    from .bare import BareSandbox

    return BareSandbox(work_root)


register_backend("bubblewrap", _bubblewrap)
register_backend("docker", _docker)
register_backend("none", _bare)

__all__ = ["Limits", "RuntimeSandboxNeeds", "Sandbox", "SandboxError", "SandboxUnavailable", "StepResult",
           "Workspace", "backends", "make_sandbox", "register_backend"]
