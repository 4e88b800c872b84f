"""Whole-program problems (``kind: program``): a statement, stdin/stdout cases and a checker.

A program problem names no function and no types: the candidate is a whole program that reads
standard input and writes standard output, so the problem stays language-neutral by
construction. Cases are inline text, files beside the YAML, or made by a trusted generator of
the set (``cases.py``); the checker decides whether an output is right (``harness.engine.checkers``).
"""

from __future__ import annotations

from dataclasses import dataclass, field
from pathlib import Path
from typing import ClassVar

from ..vocabulary import LimitOverrides
from .cases import CaseError, generated_case, generator_digest, read_case_text
from .types import FloatRule

BUILTIN_CHECKERS = ("exact", "tokens", "floats", "unordered_lines")
CHECKERS = BUILTIN_CHECKERS + ("custom",)
# A custom checker is a trusted program run like a candidate's, in a runtime of its own; the
# format agreed for problem sets writes them in Python.
DEFAULT_CHECKER_LANGUAGE = "python"
CHECKER_LIMITS = LimitOverrides(wall_seconds=20, cpu_seconds=20, memory_mb=1024)
CASE_KEYS = {"input", "output", "input_file", "output_file", "generate", "args", "example"}


@dataclass(frozen=True)
class ProgramCase:
    """One stdin/stdout case: inline text, a pair of files, or a generator's output."""

    input: str | None = None
    output: str | None = None
    input_file: Path | None = None
    output_file: Path | None = None
    generator: Path | None = None
    args: tuple[str, ...] = ()
    example: bool = False

    @property
    def origin(self) -> str:
        """Where the case comes from, for messages."""
        if self.generator is not None:
            return " ".join([self.generator.name, *self.args])
        if self.input_file is not None:
            return self.input_file.name
        return "inline"

    def texts(self) -> tuple[str, str]:
        """(input, expected output); a generated case is made once and then read from the cache.
        Raises CaseError (naming the file or generator) when a file is unreadable or a
        generator fails."""
        if self.generator is not None:
            input_path, output_path = generated_case(self.generator, self.args)
            return read_case_text(input_path), read_case_text(output_path)
        if self.input_file is not None:
            return read_case_text(self.input_file), read_case_text(self.output_file)
        return self.input, self.output


@dataclass(frozen=True)
class CheckerSpec:
    """How an output is judged: one of ``BUILTIN_CHECKERS`` (``floats`` with ``tolerance``), or
    ``custom``: ``program`` run as ``PROGRAM INPUT EXPECTED ACTUAL`` in its own sandbox, in the
    runtime ``language``, under ``limits``."""

    kind: str
    tolerance: FloatRule = FloatRule()
    program: Path | None = None
    language: str = DEFAULT_CHECKER_LANGUAGE
    limits: LimitOverrides = CHECKER_LIMITS


@dataclass(frozen=True)
class CalibratedLimit:
    """A run-step time limit of one problem in one language, from ``calibrated_limits.yaml``."""

    wall_seconds: float
    cpu_seconds: float
    slowest_wall_seconds: float | None = None
    slowest_cpu_seconds: float | None = None

    def overrides(self) -> LimitOverrides:
        return LimitOverrides(wall_seconds=self.wall_seconds, cpu_seconds=self.cpu_seconds)


@dataclass(frozen=True)
class ProgramProblem:
    """A problem of kind ``program``. ``reference``, ``slow`` and ``wrong`` hold whole programs
    by language (``wrong`` by language, then by name); ``calibrated`` holds the set's
    calibrated time limits by language. The set loader fills these dictionaries."""

    kind: ClassVar[str] = "program"

    id: str
    title: str
    difficulty: str
    tags: tuple[str, ...]
    description: str
    cases: tuple[ProgramCase, ...]
    checker: CheckerSpec
    reference: dict[str, str] = field(hash=False)
    source: Path = field(hash=False, compare=False)
    limits: LimitOverrides = field(default_factory=LimitOverrides)  # the run step's, per case
    slow: dict[str, str] = field(default_factory=dict, hash=False, compare=False)
    wrong: dict[str, dict[str, str]] = field(default_factory=dict, hash=False, compare=False)
    calibrated: dict[str, CalibratedLimit] = field(default_factory=dict, hash=False, compare=False)

    @property
    def examples(self) -> tuple[ProgramCase, ...]:
        return tuple(c for c in self.cases if c.example)

    def run_limits(self, language: str) -> LimitOverrides:
        """The problem's own run limits with the calibrated time limit of ``language`` on top."""
        calibrated = self.calibrated.get(language)
        return self.limits.then(calibrated.overrides()) if calibrated else self.limits

    def limit_source(self, language: str) -> str:
        """Where the time limit of ``language`` comes from, for details and listings."""
        if language in self.calibrated:
            return "calibrated"
        if self.limits.wall_seconds is not None or self.limits.cpu_seconds is not None:
            return "problem default"
        return "engine default"


def parse_program_problem(data: dict, file: Path, fail, common: dict) -> ProgramProblem:
    """The fields a program problem adds to the ones every problem has (``common``: id,
    title, difficulty, tags, description, limits, reference). ``fail(field, message)`` builds
    the error naming the file and field."""
    for foreign in ("signature", "tolerance", "signed_zero"):
        if foreign in data:
            raise fail(foreign, "not used by problems of kind program (see checker)")
    root = file.parent
    checker = _checker(data.get("checker", "exact"), root, fail)
    raw_cases = data.get("cases")
    if not isinstance(raw_cases, list) or not raw_cases:
        raise fail("cases", "expected a non-empty list of cases")
    cases = tuple(_case(raw, root, fail, f"cases[{i}]") for i, raw in enumerate(raw_cases))
    return ProgramProblem(cases=cases, checker=checker, source=file, **common)


def _case(raw: object, root: Path, fail, where: str) -> ProgramCase:
    if not isinstance(raw, dict):
        raise fail(where, "expected a mapping: {input, output}, {input_file, output_file} or {generate, args}")
    unknown = set(raw) - CASE_KEYS
    if unknown:
        raise fail(where, f"unknown key(s) {', '.join(sorted(map(str, unknown)))}")
    example = raw.get("example", False)
    if not isinstance(example, bool):
        raise fail(where + ".example", f"expected true or false, got {example!r}")
    forms = [form for form, keys in (("inline", ("input", "output")), ("files", ("input_file", "output_file")),
                                     ("generate", ("generate",))) if any(k in raw for k in keys)]
    if len(forms) != 1:
        raise fail(where, "give exactly one of: input and output (inline), input_file and output_file, "
                          "or generate (with args)")
    if "args" in raw and forms != ["generate"]:
        raise fail(where + ".args", "only a generated case takes args")
    if forms == ["inline"]:
        for key in ("input", "output"):
            if not isinstance(raw.get(key), str):
                raise fail(f"{where}.{key}", "expected a string (write multi-line text as a YAML block, |)")
        return ProgramCase(input=raw["input"], output=raw["output"], example=example)
    if forms == ["files"]:
        paths = [_set_file(raw.get(key), root, fail, f"{where}.{key}") for key in ("input_file", "output_file")]
        return ProgramCase(input_file=paths[0], output_file=paths[1], example=example)
    if example:
        raise fail(where + ".example", "a generated case is hidden; examples are inline or file cases")
    generator = _set_file(raw["generate"], root, fail, where + ".generate")
    if generator.suffix != ".py":
        raise fail(where + ".generate", f"{raw['generate']!r}: a generator is a Python script (.py)")
    args = raw.get("args", [])
    if not isinstance(args, list) or not all(isinstance(a, (str, int, float)) and not isinstance(a, bool)
                                             for a in args):
        raise fail(where + ".args", "expected a list of numbers and strings")
    return ProgramCase(generator=generator, args=tuple(str(a) for a in args))


def _set_file(value: object, root: Path, fail, where: str) -> Path:
    """A file named relative to the set's folder, which must exist inside it."""
    if not isinstance(value, str) or not value:
        raise fail(where, "expected a path relative to the problem set's folder")
    path = (root / value).resolve()
    if not path.is_relative_to(root.resolve()):
        raise fail(where, f"{value!r} is outside the problem set's folder")
    if not path.is_file():
        raise fail(where, f"{value!r}: no such file in {root}")
    return path


def _checker(raw: object, root: Path, fail) -> CheckerSpec:
    from .sets import _float_rule  # the function kind's rule, read the same way

    if isinstance(raw, str):
        raw = {"kind": raw}
    if not isinstance(raw, dict):
        raise fail("checker", f"expected one of {', '.join(CHECKERS)}, or a mapping with 'kind'")
    kind = raw.get("kind")
    if kind not in CHECKERS:
        raise fail("checker.kind", f"{kind!r} is not one of {', '.join(CHECKERS)}")
    allowed = {"kind"} | {"floats": {"tolerance"}, "custom": {"program", "language", "limits"}}.get(kind, set())
    unknown = set(raw) - allowed
    if unknown:
        raise fail("checker", f"unknown key(s) for a {kind} checker: {', '.join(sorted(map(str, unknown)))}")
    if kind == "floats":
        return CheckerSpec(kind, tolerance=_float_rule(raw, lambda f, m: fail("checker." + f, m)))
    if kind != "custom":
        return CheckerSpec(kind)
    program = _set_file(raw.get("program"), root, fail, "checker.program")
    language = raw.get("language", DEFAULT_CHECKER_LANGUAGE)
    if not isinstance(language, str) or not language:
        raise fail("checker.language", "expected a runtime name such as python")
    try:
        limits = CHECKER_LIMITS.then(LimitOverrides.parse(raw.get("limits")))
    except ValueError as exc:
        raise fail("checker.limits", str(exc)) from None
    return CheckerSpec(kind, program=program, language=language, limits=limits)


def case_files(problem: ProgramProblem) -> list[Path]:
    """The files beside the YAML that decide a problem's cases and checks (for the set's
    digest): case files, generators with the modules beside them, a custom checker."""
    files: set[Path] = set()
    for case in problem.cases:
        if case.input_file is not None:
            files.update((case.input_file, case.output_file))
        if case.generator is not None:
            files.update(p for p in case.generator.parent.glob("*.py") if p.is_file())
    if problem.checker.program is not None:
        files.add(problem.checker.program)
    return sorted(files)


__all__ = ["BUILTIN_CHECKERS", "CHECKERS", "CaseError", "CalibratedLimit", "CheckerSpec", "ProgramCase",
           "ProgramProblem", "case_files", "generator_digest", "parse_program_problem"]
