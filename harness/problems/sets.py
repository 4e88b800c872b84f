"""Problem sets: folders of YAML files, loaded and validated into immutable records."""

from __future__ import annotations

import hashlib
import re
from dataclasses import dataclass, field
from pathlib import Path
from typing import ClassVar

from ..locations import bundled_dir
from ..vocabulary import LimitOverrides
from ..yamlfiles import read_yaml
from .calibration import CALIBRATED_FILE, DEFAULT_MARK, read_calibrated_limits
from .programs import ProgramProblem, case_files, parse_program_problem
from .types import FloatRule, Type, TypeSyntaxError, check_value, parse_type

DIFFICULTIES = ("easy", "medium", "hard")
KINDS = ("function", "program")
IDENTIFIER = re.compile(r"^[a-z][a-z0-9_]*$")
# PEP 485's defaults (math.isclose): relative 1e-9, absolute 0, so a tiny expected value is
# checked rather than swallowed by an absolute tolerance larger than itself.
DEFAULT_REL_TOL = 1e-9
DEFAULT_ABS_TOL = 0.0


class ProblemError(ValueError):
    """A problem file that does not follow the schema; the message names file and field."""


@dataclass(frozen=True)
class Param:
    name: str
    type: Type


@dataclass(frozen=True)
class Case:
    args: tuple
    expected: object
    example: bool


@dataclass(frozen=True)
class Problem:
    kind: ClassVar[str] = "function"

    id: str
    title: str
    difficulty: str
    tags: tuple[str, ...]
    description: str
    function: str
    params: tuple[Param, ...]
    returns: Type
    tolerance: FloatRule
    cases: tuple[Case, ...]
    reference: dict[str, str] = field(hash=False)
    source: Path = field(hash=False, compare=False)
    limits: LimitOverrides = field(default_factory=LimitOverrides)  # the run step's, over the runtime's

    @property
    def examples(self) -> tuple[Case, ...]:
        return tuple(c for c in self.cases if c.example)


@dataclass(frozen=True)
class ProblemSet:
    name: str
    description: str
    path: Path
    problems: dict[str, "Problem | ProgramProblem"]
    digest: str
    calibration: dict = field(default_factory=dict)  # calibrated_limits.yaml's header, if any
    parts: tuple = ()  # the sets merged into this one (``--set a,b``), else empty

    @property
    def kinds(self) -> dict[str, str]:
        """Problem id -> kind (function or program)."""
        return {pid: p.kind for pid, p in self.problems.items()}

    def __len__(self) -> int:
        return len(self.problems)


def resolve_set_path(name_or_path: str) -> Path:
    """A bundled set's name (``core``) or a path to any folder of problem files."""
    candidate = Path(name_or_path).expanduser()
    if candidate.is_dir():
        return candidate.resolve()
    bundled = bundled_dir("problem_sets") / name_or_path
    if "/" not in name_or_path and bundled.is_dir():
        return bundled
    known = sorted(p.name for p in bundled_dir("problem_sets").iterdir() if p.is_dir())
    raise ProblemError(f"no problem set {name_or_path!r}: not a folder, nor a bundled set ({', '.join(known)})")


# Several sets scored as one (``--set core,dockside``): both kinds of problem in one run.
SET_SEPARATOR = ","


def load_problem_set(name_or_path: str) -> ProblemSet:
    if SET_SEPARATOR in name_or_path and not Path(name_or_path).expanduser().is_dir():
        return merge_problem_sets([load_problem_set(part) for part in name_or_path.split(SET_SEPARATOR) if part])
    path = resolve_set_path(name_or_path)
    meta = {}
    meta_file = path / "set.yaml"
    if meta_file.exists():
        meta = _read_yaml(meta_file) or {}
    problems: dict[str, Problem | ProgramProblem] = {}
    hasher = hashlib.sha256()
    for file in sorted(path.glob("*.yaml")):
        if file.name in ("set.yaml", CALIBRATED_FILE):
            continue
        hasher.update(file.name.encode() + b"\0" + file.read_bytes() + b"\0")
        problem = parse_problem(_read_yaml(file), file)
        problems[problem.id] = problem
    # What decides a program problem's cases and checks lives beside the YAML: in the digest too.
    for file in sorted({f for p in problems.values() if p.kind == "program" for f in case_files(p)}):
        hasher.update(str(file.relative_to(path)).encode() + b"\0" + file.read_bytes() + b"\0")
    for language, problem_id, file in _sidecar_references(path):
        hasher.update(str(file.relative_to(path)).encode() + b"\0" + file.read_bytes() + b"\0")
        if problem_id not in problems:
            raise ProblemError(f"{file}: reference for unknown problem {problem_id!r}")
        if language in problems[problem_id].reference:
            raise ProblemError(f"{file}: problem {problem_id!r} already has reference.{language} in its YAML file")
        problems[problem_id].reference[language] = file.read_text(encoding="utf-8")
    if not problems:
        raise ProblemError(f"{path}: no problem files (*.yaml) found")
    for folder, language, problem_id, name, file in _program_variants(path):
        problem = problems.get(problem_id)
        if problem is None or problem.kind != "program":
            raise ProblemError(f"{file}: {folder} program for {problem_id!r}, which is not a program problem of the set")
        hasher.update(str(file.relative_to(path)).encode() + b"\0" + file.read_bytes() + b"\0")
        text = file.read_text(encoding="utf-8")
        if folder == "slow":
            problem.slow[language] = text
        else:
            problem.wrong.setdefault(language, {})[name] = text
    calibration = {}
    calibrated_file = path / CALIBRATED_FILE
    if calibrated_file.is_file():
        hasher.update(CALIBRATED_FILE.encode() + b"\0" + calibrated_file.read_bytes() + b"\0")
        program_ids = {pid for pid, p in problems.items() if p.kind == "program"}
        calibration, limits = read_calibrated_limits(calibrated_file, program_ids, ProblemError)
        for problem_id, languages in limits.items():
            problems[problem_id].calibrated.update(
                {language: entry for language, entry in languages.items() if entry != DEFAULT_MARK})
    return ProblemSet(
        name=str(meta.get("name", path.name)),
        description=str(meta.get("description", "")),
        path=path,
        problems=problems,
        digest=hasher.hexdigest(),
        calibration=calibration,
    )


def merge_problem_sets(parts: list[ProblemSet]) -> ProblemSet:
    """Sets loaded one by one, as one set: their problems (ids must not repeat), a digest of
    their digests, and a path that names every folder (``load_problem_set`` reads it back)."""
    if len(parts) == 1:
        return parts[0]
    problems: dict = {}
    for part in parts:
        for pid, problem in part.problems.items():
            if pid in problems:
                raise ProblemError(f"{problem.source}: problem id {pid!r} is also {problems[pid].source}; "
                                   "sets scored together need distinct ids")
            problems[pid] = problem
    hasher = hashlib.sha256()
    for part in parts:
        hasher.update(part.name.encode() + b"\0" + part.digest.encode() + b"\0")
    return ProblemSet(name=SET_SEPARATOR.join(p.name for p in parts),
                      description="; ".join(p.description for p in parts if p.description),
                      path=Path(SET_SEPARATOR.join(str(p.path) for p in parts)), problems=problems,
                      digest=hasher.hexdigest(), parts=tuple(parts))


def _program_variants(path: Path):
    """Programs that must fail, kept beside a set's program problems: ``slow/<language>/<id>.<ext>``
    (a naive solution the time limit must stop) and ``wrong/<language>/<id>-<what>.<ext>`` (a
    wrong answer the checker must catch). Yields (folder, language, problem id, name, file)."""
    for folder in ("slow", "wrong"):
        root = path / folder
        if not root.is_dir():
            continue
        for language_dir in sorted(p for p in root.iterdir() if p.is_dir()):
            for file in sorted(p for p in language_dir.iterdir() if p.is_file()):
                problem_id, _, what = file.stem.partition("-")
                if folder == "wrong" and not what:
                    raise ProblemError(f"{file}: a wrong program is named <problem id>-<what>.<ext>")
                yield folder, language_dir.name, problem_id, what or file.stem, file


def _sidecar_references(path: Path):
    """References kept as source files, ``references/<language>/<problem id>.<ext>``: easier to
    write and review in a language's own syntax than inside YAML."""
    root = path / "references"
    if not root.is_dir():
        return
    for language_dir in sorted(p for p in root.iterdir() if p.is_dir()):
        for file in sorted(p for p in language_dir.iterdir() if p.is_file()):
            yield language_dir.name, file.stem, file


def _read_yaml(file: Path):
    return read_yaml(file, ProblemError)


def parse_problem(data: object, file: Path) -> Problem | ProgramProblem:
    def fail(field_name: str, message: str) -> ProblemError:
        return ProblemError(f"{file}: field '{field_name}': {message}")

    if not isinstance(data, dict):
        raise ProblemError(f"{file}: expected a mapping at the top level")

    def require(key: str, kind: type, where: dict = data, prefix: str = ""):
        if key not in where:
            raise fail(prefix + key, "missing")
        if not isinstance(where[key], kind) or isinstance(where[key], bool) and kind is not bool:
            raise fail(prefix + key, f"expected {kind.__name__}, got {type(where[key]).__name__}")
        return where[key]

    pid = require("id", str)
    if not IDENTIFIER.match(pid):
        raise fail("id", f"{pid!r} is not a snake_case identifier")
    if pid != file.stem:
        raise fail("id", f"{pid!r} must equal the file name stem {file.stem!r}")
    description = require("description", str).strip()
    difficulty = data.get("difficulty", "medium")
    if difficulty not in DIFFICULTIES:
        raise fail("difficulty", f"{difficulty!r} is not one of {', '.join(DIFFICULTIES)}")
    tags = data.get("tags", [])
    if not isinstance(tags, list) or not all(isinstance(t, str) for t in tags):
        raise fail("tags", "expected a list of strings")
    kind = data.get("kind", "function")
    if kind not in KINDS:
        raise fail("kind", f"{kind!r} is not one of {', '.join(KINDS)}")
    if kind == "program":
        try:
            limits = LimitOverrides.parse(data.get("limits"))
        except ValueError as exc:
            raise fail("limits", str(exc)) from None
        reference = data.get("reference", {})
        if not isinstance(reference, dict) or not all(isinstance(v, str) for v in reference.values()):
            raise fail("reference", "expected a mapping of language name to a whole program's source text")
        common = dict(id=pid, title=str(data.get("title", pid.replace("_", " ").capitalize())),
                      difficulty=difficulty, tags=tuple(tags), description=description, limits=limits,
                      reference=dict(reference))
        return parse_program_problem(data, file, fail, common)
    for foreign in ("checker",):
        if foreign in data:
            raise fail(foreign, "only problems of kind program take a checker (add kind: program?)")

    signature = require("signature", dict)
    function = require("name", str, signature, "signature.")
    if not IDENTIFIER.match(function):
        raise fail("signature.name", f"{function!r} is not a snake_case identifier")
    params = []
    raw_params = require("params", list, signature, "signature.")
    for i, raw in enumerate(raw_params):
        where = f"signature.params[{i}]"
        if not isinstance(raw, dict) or not isinstance(raw.get("name"), str) or not isinstance(raw.get("type"), str):
            raise fail(where, "expected a mapping with 'name' and 'type' strings")
        if not IDENTIFIER.match(raw["name"]):
            raise fail(where + ".name", f"{raw['name']!r} is not a snake_case identifier")
        params.append(Param(raw["name"], _type(raw["type"], fail, where + ".type")))
    if len({p.name for p in params}) != len(params):
        raise fail("signature.params", "parameter names must be distinct")
    returns = _type(require("returns", str, signature, "signature."), fail, "signature.returns")

    tolerance = _float_rule(data, fail)

    cases = []
    for i, raw in enumerate(require("cases", list)):
        where = f"cases[{i}]"
        if not isinstance(raw, dict) or "args" not in raw or "expected" not in raw:
            raise fail(where, "expected a mapping with 'args' and 'expected'")
        args = raw["args"]
        if not isinstance(args, list) or len(args) != len(params):
            raise fail(where + ".args", f"expected a list of {len(params)} value(s), one per parameter")
        try:
            for param, value in zip(params, args):
                check_value(value, param.type, f"{param.name}")
            check_value(raw["expected"], returns, "expected")
        except ValueError as exc:
            raise fail(where, str(exc)) from None
        cases.append(Case(tuple(args), raw["expected"], bool(raw.get("example", False))))
    if not cases:
        raise fail("cases", "a problem needs at least one case")

    try:
        limits = LimitOverrides.parse(data.get("limits"))
    except ValueError as exc:
        raise fail("limits", str(exc)) from None

    reference = data.get("reference", {})
    if not isinstance(reference, dict) or not all(isinstance(v, str) for v in reference.values()):
        raise fail("reference", "expected a mapping of language name to source text")

    return Problem(
        id=pid,
        title=str(data.get("title", pid.replace("_", " ").capitalize())),
        difficulty=difficulty,
        tags=tuple(tags),
        description=description,
        function=function,
        params=tuple(params),
        returns=returns,
        tolerance=tolerance,
        cases=tuple(cases),
        reference=dict(reference),
        source=file,
        limits=limits,
    )


def _float_rule(data: dict, fail) -> FloatRule:
    """``tolerance`` as ``{rel, abs}`` (PEP 485's two tolerances), or the legacy scalar, which
    sets both to the same number; ``signed_zero: true`` makes the sign of an expected zero count."""
    raw = data.get("tolerance", {})
    signed_zero = data.get("signed_zero", False)
    if not isinstance(signed_zero, bool):
        raise fail("signed_zero", f"expected true or false, got {signed_zero!r}")

    def number(value, where):
        if isinstance(value, bool) or not isinstance(value, (int, float)) or not 0 <= value < 1:
            raise fail(where, f"expected a number in [0, 1), got {value!r}")
        return float(value)

    if isinstance(raw, dict):
        unknown = set(raw) - {"rel", "abs"}
        if unknown:
            raise fail("tolerance", f"unknown key(s) {', '.join(sorted(map(str, unknown)))}; expected rel and/or abs")
        return FloatRule(rel=number(raw.get("rel", DEFAULT_REL_TOL), "tolerance.rel"),
                         abs=number(raw.get("abs", DEFAULT_ABS_TOL), "tolerance.abs"), signed_zero=signed_zero)
    value = number(raw, "tolerance")
    return FloatRule(rel=value, abs=value, signed_zero=signed_zero)


def _type(text: str, fail, where: str) -> Type:
    try:
        return parse_type(text)
    except TypeSyntaxError as exc:
        raise fail(where, str(exc)) from None
