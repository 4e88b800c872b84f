"""Calibrated time limits for program problems (``assay problems calibrate``).

Every program problem's reference runs under the sandbox, all cases, several times; the slowest
run of any case sets the limit of that problem in that language:

    limit = multiple x slowest reference run + floor     (wall and CPU seconds alike)

rounded up to a tenth of a second. A multiple of a reference solution's time plus a constant is
common practice in contest judging; no single source fixes the numbers, and ours are set in
``CalibrationSettings``. Then every ``slow/`` program of the problem runs under the new limit,
and the report says whether it times out: the limit must separate the naive solution from the
intended one.
"""

from __future__ import annotations

import datetime as dt
import math
import os
import platform
from dataclasses import dataclass
from pathlib import Path
from typing import Callable

from .. import __version__
from ..problems import CALIBRATED_FILE, CalibratedLimit, ProblemSet, ProgramProblem, read_calibrated_limits, \
    write_calibrated_limits
from ..problems.calibration import DEFAULT_MARK
from ..runtimes import Runtime
from ..sandbox import Sandbox
from ..vocabulary import LimitOverrides
from .programs import checker_runtime_for, program_verdict, run_program

# A reference is measured with time limits this generous: it must finish to be measured.
MEASURE_SECONDS = 120.0


@dataclass(frozen=True)
class CalibrationSettings:
    multiple: float = 3.0
    floor_seconds: float = 1.0
    runs: int = 3

    def limit(self, slowest: float) -> float:
        return math.ceil((self.multiple * slowest + self.floor_seconds) * 10 - 1e-9) / 10


@dataclass
class Measured:
    """One problem in one language: the limit written (None: the problem's default), what was
    measured, and how the slow program fared under the new limit."""

    problem: str
    language: str
    limit: CalibratedLimit | None
    note: str = ""
    slow: str | None = None  # the slow program's outcome under the new limit, if it has one
    slow_detail: str = ""
    ok: bool = True

    def as_dict(self) -> dict:
        return {"problem": self.problem, "language": self.language, "ok": self.ok, "note": self.note,
                "wall_seconds": self.limit.wall_seconds if self.limit else None,
                "cpu_seconds": self.limit.cpu_seconds if self.limit else None,
                "slowest_wall_seconds": self.limit.slowest_wall_seconds if self.limit else None,
                "slowest_cpu_seconds": self.limit.slowest_cpu_seconds if self.limit else None,
                "slow": self.slow, "slow_detail": self.slow_detail}


def calibrate(problem_set: ProblemSet, runtimes: dict[str, Runtime], sandbox: Sandbox,
              settings: CalibrationSettings = CalibrationSettings(),
              progress: Callable[[Measured], None] | None = None) -> tuple[dict, dict, list[Measured]]:
    """Measure every program problem of the set in every runtime given; returns the file's
    header, its limits (``{problem: {language: CalibratedLimit or "default"}}``) and one
    Measured row per (problem, language). Candidates run one at a time, so none slows another."""
    checkers: dict[str, Runtime] = {}
    limits: dict[str, dict] = {}
    rows: list[Measured] = []
    for problem in problem_set.problems.values():
        if problem.kind != "program":
            continue
        for name, runtime in runtimes.items():
            row = _measure(problem, runtime, sandbox, settings, checker_runtime_for(problem, runtimes, checkers))
            if row.ok:
                limits.setdefault(problem.id, {})[name] = row.limit or DEFAULT_MARK
            if row.limit is not None and name in problem.slow:
                _try_slow(problem, runtime, sandbox, row, checker_runtime_for(problem, runtimes, checkers))
            rows.append(row)
            if progress:
                progress(row)
    header = {
        "multiple": settings.multiple,
        "floor_seconds": settings.floor_seconds,
        "runs": settings.runs,
        "rule": "limit = multiple x slowest reference run of any case + floor, rounded up to 0.1 s",
        "sandbox": _sandbox_facts(sandbox),
        "toolchains": {name: runtime.toolchain_version() for name, runtime in sorted(runtimes.items())},
        "machine": machine(),
        "harness_version": __version__,
        "written_at": dt.datetime.now(dt.timezone.utc).isoformat(timespec="seconds"),
    }
    return header, limits, rows


def _measure(problem: ProgramProblem, runtime: Runtime, sandbox: Sandbox, settings: CalibrationSettings,
             checker: Runtime | None) -> Measured:
    reference = runtime.reference(problem)
    if reference is None:
        return Measured(problem.id, runtime.name, None, note="no reference: the problem's default limit")
    if runtime.refusal(problem):
        return Measured(problem.id, runtime.name, None, note=runtime.refusal(problem), ok=False)
    generous = LimitOverrides(wall_seconds=MEASURE_SECONDS, cpu_seconds=MEASURE_SECONDS)
    limits = (runtime.step_limits("compile", program=True),
              runtime.step_limits("run", problem.limits.then(generous), program=True))
    walls, cpus = [], []
    for _ in range(settings.runs):
        ran = run_program(sandbox, runtime, problem, reference, limits, True, checker, "calibration")
        verdict = program_verdict(ran, len(problem.cases))
        if verdict.outcome != "passed":
            return Measured(problem.id, runtime.name, None, ok=False,
                            note=f"the reference did not pass: {verdict.outcome}: {verdict.detail}"[:300])
        walls += [case.wall_seconds for case in ran.cases]
        cpus += [case.cpu_seconds if case.cpu_seconds is not None else case.wall_seconds for case in ran.cases]
    slowest_wall, slowest_cpu = max(walls), max(cpus)
    limit = CalibratedLimit(wall_seconds=settings.limit(slowest_wall), cpu_seconds=settings.limit(slowest_cpu),
                            slowest_wall_seconds=round(slowest_wall, 4), slowest_cpu_seconds=round(slowest_cpu, 4))
    return Measured(problem.id, runtime.name, limit, note="calibrated")


def _try_slow(problem: ProgramProblem, runtime: Runtime, sandbox: Sandbox, row: Measured,
              checker: Runtime | None) -> None:
    """Run the problem's slow program under the new limit; it must time out."""
    limits = (runtime.step_limits("compile", program=True),
              runtime.step_limits("run", problem.limits.then(row.limit.overrides()), program=True))
    ran = run_program(sandbox, runtime, problem, problem.slow[runtime.name], limits, False, checker, "calibrated")
    verdict = program_verdict(ran, len(problem.cases))
    row.slow, row.slow_detail = verdict.outcome, verdict.detail
    if verdict.outcome != "timeout":
        row.ok = False


def merged_limits(path: Path, problem_ids: set[str], new: dict[str, dict], error: type[Exception]) -> dict:
    """The new limits over those already in the set's file: entries not measured this time
    (other languages, say) stay."""
    file = path / CALIBRATED_FILE
    if not file.is_file():
        return new
    _, old = read_calibrated_limits(file, problem_ids, error)
    merged = {pid: dict(languages) for pid, languages in old.items()}
    for pid, languages in new.items():
        merged.setdefault(pid, {}).update(languages)
    return merged


def write_limits(problem_set: ProblemSet, header: dict, limits: dict, error: type[Exception]) -> Path:
    file = problem_set.path / CALIBRATED_FILE
    program_ids = {pid for pid, p in problem_set.problems.items() if p.kind == "program"}
    merged = merged_limits(problem_set.path, program_ids, limits, error)
    if file.is_file():
        toolchains = dict((read_calibrated_limits(file, program_ids, error)[0] or {}).get("toolchains") or {})
        toolchains.update(header["toolchains"])
        header = dict(header, toolchains=toolchains)
    write_calibrated_limits(file, header, merged)
    return file


def machine() -> dict:
    """What the timings depend on: the processor and how many of them."""
    model = None
    try:
        for line in Path("/proc/cpuinfo").read_text().splitlines():
            if line.startswith("model name"):
                model = line.split(":", 1)[1].strip()
                break
    except OSError:
        pass
    return {"cpu": model or platform.processor() or platform.machine(), "cpus": os.cpu_count(),
            "platform": platform.platform()}


def _sandbox_facts(sandbox: Sandbox) -> dict:
    described = sandbox.describe()
    return {key: described[key] for key in ("backend", "version", "memory_limit") if key in described}
