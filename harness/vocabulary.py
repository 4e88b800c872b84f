"""The words every stage shares: a sample in, limits for a step, what a step did, a verdict out.

This module imports nothing of the project, so reading a results folder, judging a value and
rendering a report can all speak these words without loading runtimes or sandboxes.
"""

from __future__ import annotations

from dataclasses import asdict, dataclass, field, fields, replace
from typing import Mapping

OUTCOMES = (
    "passed",
    "wrong_answer",
    "compile_error",
    "runtime_error",
    "timeout",
    "memory_limit",
    "output_limit",
    "infra_error",
)


@dataclass(frozen=True)
class Sample:
    """One completion from a dump: which problem and language, its index, where it was read."""

    problem: str
    language: str
    sample: int
    completion: str
    source: str
    line: int

    @property
    def key(self) -> tuple[str, str, int]:
        return (self.problem, self.language, self.sample)


@dataclass(frozen=True)
class Reject:
    """An input line that cannot be scored, with the reason: rejects are recorded, never dropped."""

    source: str
    line: int
    reason: str

    def as_dict(self) -> dict:
        return {"source": self.source, "line": self.line, "reason": self.reason}


@dataclass(frozen=True)
class Limits:
    """Resource limits for one step (a compile or a run) of one candidate.

    Every layer that sets limits (engine defaults, a runtime's ``limits``, a step's own, a
    problem's, the command line) speaks :class:`LimitOverrides`; ``Limits.merged`` applies them in
    that order (see ``harness.runtimes.runtime.Runtime.step_limits``)."""

    wall_seconds: float = 10.0
    cpu_seconds: float = 10.0
    memory_mb: int = 512
    max_processes: int = 64
    max_file_mb: int = 16
    max_output_kb: int = 1024

    def merged(self, overrides: "LimitOverrides | Mapping") -> "Limits":
        patch = overrides if isinstance(overrides, LimitOverrides) else LimitOverrides.parse(overrides)
        return replace(self, **patch.set_fields())

    def as_dict(self) -> dict:
        return {name: getattr(self, name) for name in LIMIT_NAMES}  # asdict's deep copies cost per step


LIMIT_NAMES = tuple(f.name for f in fields(Limits))
# The engine's defaults, the bottom layer of every step's limits. Compilers get more of
# everything: g++ on a template-heavy driver or javac's JVM needs it, and a compile step never
# runs candidate code.
STEP_DEFAULTS = {
    "compile": Limits(wall_seconds=60, cpu_seconds=60, memory_mb=2048, max_processes=128, max_file_mb=256),
    "run": Limits(),
}


@dataclass(frozen=True)
class LimitOverrides:
    """Some limits changed, the rest left to the layer below; the typed form of ``--timeout``,
    ``--memory``, runtime.yaml's ``limits`` and a problem's ``limits``."""

    wall_seconds: float | None = None
    cpu_seconds: float | None = None
    memory_mb: int | None = None
    max_processes: int | None = None
    max_file_mb: int | None = None
    max_output_kb: int | None = None

    @classmethod
    def parse(cls, data: "Mapping | LimitOverrides | None") -> "LimitOverrides":
        """From a mapping (a YAML ``limits:`` block, a manifest); ValueError names what is wrong."""
        if data is None:
            return cls()
        if isinstance(data, LimitOverrides):
            return data
        if not isinstance(data, Mapping):
            raise ValueError("expected a mapping of limit names to numbers")
        unknown = set(data) - set(LIMIT_NAMES)
        if unknown:
            raise ValueError(f"unknown limit(s): {', '.join(sorted(map(str, unknown)))}"
                             f" (known: {', '.join(LIMIT_NAMES)})")
        values = {}
        for name, value in data.items():
            if value is None:
                continue
            if isinstance(value, bool) or not isinstance(value, (int, float)) or value <= 0:
                raise ValueError(f"limit {name} must be a positive number, got {value!r}")
            if name in ("memory_mb", "max_processes", "max_file_mb", "max_output_kb"):
                if value != int(value):
                    raise ValueError(f"limit {name} must be a whole number, got {value!r}")
                value = int(value)
            values[name] = value
        return cls(**values)

    def set_fields(self) -> dict:
        return {name: value for name in LIMIT_NAMES if (value := getattr(self, name)) is not None}

    def then(self, later: "LimitOverrides") -> "LimitOverrides":
        """These overrides with ``later``'s on top."""
        return replace(self, **later.set_fields())

    def __bool__(self) -> bool:
        return bool(self.set_fields())


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


@dataclass(frozen=True)
class WarmFiles:
    """What a runtime's warm compiler (runtime.yaml's ``compile.warm``) needs built into a
    Docker image, as plain data for the sandbox layer: for ``server``, ``path`` is the folder of
    the runtime with the compile server's own files (empty: none); for ``prepared``, ``path`` is the file of
    the runtime that ``build`` turns (``{file}`` standing for it) into the files the compile
    command reads. Paths are relative to the runtime folder."""

    kind: str
    path: str
    build: tuple[str, ...] = ()


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
    digest: str | None = None  # the runtime folder's content hash: it names the Docker image
    warm_files: WarmFiles | None = None  # built into the Docker image (compile.warm)


@dataclass
class Verdict:
    """The judgement of one sample. ``compile_seconds`` and ``run_seconds`` are the wall time
    of the compile step (0 without one) and of the run step; ``seconds`` is the whole
    execution, rendering and judging included."""

    outcome: str
    cases_passed: int
    cases_total: int
    seconds: float
    detail: str = ""
    extra: dict = field(default_factory=dict)
    compile_seconds: float = 0.0
    run_seconds: float = 0.0

    def row(self, sample_key: tuple[str, str, int]) -> dict:
        """The executions.jsonl row for the sample with this (problem, language, index) key."""
        problem, language, index = sample_key
        data = {"problem": problem, "language": language, "sample": index}
        data.update(asdict(self))
        extra = data.pop("extra")
        data.update(extra)
        return data
