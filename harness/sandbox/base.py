"""The sandbox protocol: a backend opens a fresh workspace per candidate and runs steps in it.

Everything a backend must offer is here, so the engine never knows which backend it drives:
bubblewrap on a laptop, Docker containers in production, a bare process for benchmarks.
"""

from __future__ import annotations

import abc
from typing import ContextManager, Protocol

from ..vocabulary import Limits, RuntimeSandboxNeeds, StepResult


class SandboxError(RuntimeError):
    """Base of every error a backend raises at its boundary; the engine maps any of them to
    an ``infra_error`` verdict (the sandbox failed, not the candidate)."""


class SandboxUnavailable(SandboxError):
    """The backend cannot work on this machine; the message says what to install or start."""


class Workspace(Protocol):
    """A private, empty, writable folder that lives for one candidate (its compile and run)."""

    def write(self, name: str, content: str) -> None: ...

    def write_bytes(self, name: str, data: bytes) -> None:
        """A new file of these bytes (what a warm compiler made, say); ``write`` is its text form."""

    def read(self, name: str, max_bytes: int) -> bytes | None:
        """The file's first ``max_bytes`` bytes, or None if the candidate left no such file."""

    def run(self, argv: list[str], limits: Limits, env: dict[str, str], *, stdin: str | None = None,
            full_stdout: bool = False) -> StepResult:
        """Run one step. ``stdin`` names a file of this workspace to feed it (default: nothing,
        /dev/null); ``full_stdout`` keeps its whole standard output, up to the output cap,
        where by default only a diagnostic tail comes back. ``extra`` may carry
        ``cpu_seconds`` and ``peak_memory_mb``."""


class Sandbox(Protocol):
    """A backend. Use it as a context manager (or call ``close()``): closing ends every warm
    sandbox, container and process it started and removes its folders."""

    name: str

    def check(self) -> None:
        """Raise SandboxUnavailable with a clear message if this backend cannot run here."""

    def workspace(self, runtime: RuntimeSandboxNeeds) -> ContextManager[Workspace]: ...

    def describe(self) -> dict:
        """Facts recorded in the manifest (versions, isolation mechanisms in use)."""

    def close(self) -> None:
        """End everything this backend started; safe to call twice; never raises."""

    def __enter__(self) -> "Sandbox": ...

    def __exit__(self, *exc) -> None: ...


class ClosingSandbox(abc.ABC):
    """The context-manager half of the protocol, shared by every backend."""

    @abc.abstractmethod
    def close(self) -> None:
        """End everything this backend started; safe to call twice; never raises."""

    def __enter__(self):
        return self

    def __exit__(self, *exc) -> None:
        self.close()
