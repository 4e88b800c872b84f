"""The sandbox protocol: a backend opens a fresh workspace per candidate and runs steps in it.

Everything a backend must offer is here, so the engine never knows which backend it drives:
bubblewrap on a laptop, Docker containers in production, a bare process for benchmarks.
"""

from __future__ import annotations

from dataclasses import asdict, dataclass, field, replace
from typing import ContextManager, Protocol


@dataclass(frozen=True)
class Limits:
    """Resource limits for one step (a compile or a run) of one candidate."""

    wall_seconds: float = 10.0
    cpu_seconds: float = 10.0
    memory_mb: int = 512
    max_processes: int = 64
    max_file_mb: int = 16
    max_output_kb: int = 1024

    def merged(self, overrides: dict) -> "Limits":
        known = {k: v for k, v in overrides.items() if v is not None and k in asdict(self)}
        unknown = set(overrides) - set(asdict(self))
        if unknown:
            raise ValueError(f"unknown limit(s): {', '.join(sorted(unknown))}")
        return replace(self, **known)

    def as_dict(self) -> dict:
        return asdict(self)


@dataclass
class StepResult:
    """What happened when one step ran. Exactly one of the ``*_exceeded``/``timed_out`` flags
    explains an abnormal end; ``infra_error`` means the sandbox itself failed, not the code."""

    exit_code: int | None
    signal: int | None = None
    wall_seconds: float = 0.0
    stdout: str = ""
    stderr: str = ""
    timed_out: bool = False
    memory_exceeded: bool = False
    output_exceeded: bool = False
    file_size_exceeded: bool = False
    infra_error: str | None = None
    extra: dict = field(default_factory=dict)

    @property
    def ok(self) -> bool:
        return (
            self.exit_code == 0
            and not (self.timed_out or self.memory_exceeded or self.output_exceeded or self.file_size_exceeded)
            and self.infra_error is None
        )


class SandboxUnavailable(RuntimeError):
    """The backend cannot work on this machine; the message says what to install or start."""


class Workspace(Protocol):
    """A private, empty, writable folder that lives for one candidate (its compile and run)."""

    def write(self, name: str, content: str) -> None: ...

    def read(self, name: str, max_bytes: int) -> bytes | None:
        """The file's first ``max_bytes`` bytes, or None if the candidate left no such file."""

    def run(self, argv: list[str], limits: Limits, env: dict[str, str]) -> StepResult: ...


class Sandbox(Protocol):
    name: str

    def check(self) -> None:
        """Raise SandboxUnavailable with a clear message if this backend cannot run here."""

    def workspace(self, runtime: "RuntimeSandboxNeeds") -> ContextManager[Workspace]: ...

    def describe(self) -> dict:
        """Facts recorded in the manifest (versions, isolation mechanisms in use)."""


@dataclass(frozen=True)
class RuntimeSandboxNeeds:
    """What a runtime asks of a sandbox: read-only paths to expose and its environment; for
    Docker, an image named in runtime.yaml, else the runtime's folder (its image is built from
    the folder's files, wherever it was found)."""

    name: str
    ro_binds: tuple[str, ...] = ()
    env: tuple[tuple[str, str], ...] = ()
    image: str | None = None
    folder: str | None = None
