"""Self-checks of data: reference solutions must pass, deliberately wrong ones must not."""

from __future__ import annotations

import concurrent.futures as futures


from ..vocabulary import LimitOverrides, Sample
from .execution import Executor
from .programs import ProgramOptions
from ..problems import ProblemSet
from ..runtimes import Runtime, indent_lines
from ..yamlfiles import read_yaml
from ..sandbox import Sandbox


def check_references(problem_set: ProblemSet, runtimes: dict[str, Runtime], sandbox: Sandbox, jobs: int) -> list[dict]:
    """Score each (problem, language) reference as a continuation of its prompt (a program
    problem's as the whole program it is). A problem without a reference in a requested
    language is reported as ``missing``. Program problems' ``slow`` programs must time out and
    their ``wrong`` ones must fail; every row says what was expected and whether it was ``ok``."""
    executor = Executor(sandbox, problem_set, runtimes, mode="continue", programs=ProgramOptions(mode="whole"))
    samples, results = [], []
    expected: list[tuple[str, str]] = []  # (check, expect) per sample
    for problem in problem_set.problems.values():
        for language in runtimes:
            reason = runtimes[language].refusal(problem)
            if reason:
                results.append({"problem": problem.id, "language": language, "outcome": "unsupported",
                                "detail": reason})
                continue
            if runtimes[language].reference(problem) is None:
                results.append({"problem": problem.id, "language": language, "outcome": "missing",
                                "detail": f"no reference.{language} in {problem.source}, nor in "
                                          f"{runtimes[language].path / 'references' / problem.source.parent.name}"})
            elif problem.kind != "program":
                completion = runtimes[language].reference_completion(problem)
                samples.append(Sample(problem.id, language, 0, completion, str(problem.source), 0))
                expected.append(("reference", "passed"))
            if problem.kind == "program":
                for check, expect, text in _program_checks(problem, runtimes[language]):
                    samples.append(Sample(problem.id, language, 0, text, str(problem.source), 0))
                    expected.append((check, expect))
    for row in results:
        row.update(check="reference", expect="passed", ok=row["outcome"] == "unsupported")
    with futures.ThreadPoolExecutor(max_workers=jobs) as pool:
        for sample, (check, expect), verdict in zip(samples, expected, pool.map(executor.execute, samples)):
            results.append({"problem": sample.problem, "language": sample.language, "outcome": verdict.outcome,
                            "detail": verdict.detail, "seconds": verdict.seconds, "check": check,
                            "expect": expect, "ok": _as_expected(verdict.outcome, expect)})
    return sorted(results, key=lambda r: (r["problem"], r["language"], r["check"] != "reference", r["check"]))


# What a program problem's extra programs must get: a slow one the time limit, a wrong one any
# failure the candidate is to blame for (the checker's, usually).
FAILS = "a failing verdict"


def _program_checks(problem, runtime: Runtime):
    """(check, expected outcome, program) for a program problem in ``runtime``: its reference,
    its slow program, its wrong programs; those it has."""
    if runtime.reference(problem) is not None:
        yield "reference", "passed", runtime.reference_completion(problem)
    if runtime.name in problem.slow:
        yield "slow", "timeout", problem.slow[runtime.name]
    for name, text in sorted(problem.wrong.get(runtime.name, {}).items()):
        yield f"wrong {name}", FAILS, text


def _as_expected(outcome: str, expect: str) -> bool:
    if expect == FAILS:
        return outcome not in ("passed", "infra_error")
    return outcome == expect


def problem_warnings(problem_set: ProblemSet, runtimes: dict[str, Runtime]) -> list[str]:
    """What a set's author should know before scoring: names that some runtime must rename
    because they are reserved words there, and zero float expectations that only an exact zero
    meets (PEP 485's default absolute tolerance is 0); calibrated time limits measured with
    another toolchain than the one installed now."""
    warnings = []
    recorded = (problem_set.calibration or {}).get("toolchains") or {}
    for name, runtime in runtimes.items():
        if name in recorded and recorded[name] != runtime.toolchain_version():
            warnings.append(f"{problem_set.path}: time limits were calibrated with {recorded[name]!r} for {name}, "
                            f"but {runtime.toolchain_version()!r} is installed: rerun assay problems calibrate")
    for problem in problem_set.problems.values():
        for runtime in runtimes.values():
            for snake, shown in runtime.renamed(problem):
                warnings.append(f"{problem.source}: {snake!r} is reserved in {runtime.name}; its prompt says {shown!r}")
        if problem.kind == "program":
            continue
        if problem.tolerance.abs == 0 and any(_zero_floats(c.expected, problem.returns) for c in problem.cases):
            warnings.append(f"{problem.source}: a float result of 0 is expected with tolerance.abs 0, so rounding"
                            " noise such as 1e-17 fails; declare tolerance: {abs: ...} if that is not meant")
    return warnings


def _zero_floats(value, typ) -> bool:
    if value is None:
        return False
    if typ.kind == "float":
        return value == 0
    if typ.kind in ("list", "optional"):
        return any(_zero_floats(v, typ.elem) for v in (value if typ.kind == "list" else [value]))
    if typ.kind == "tuple":
        return any(_zero_floats(v, t) for v, t in zip(value, typ.args))
    if typ.kind == "dict":
        return any(_zero_floats(v, typ.elem) for v in value.values())
    return False


CONFORMANCE_SET = "conformance"
CHECKS_FILE = "checks.yaml"


def load_wrong_candidates(runtime: Runtime) -> list[dict]:
    """The runtime's ``checks.yaml``: named wrong completions with the verdict each must get."""
    path = runtime.path / CHECKS_FILE
    if not path.is_file():
        return []
    entries = read_yaml(path, ValueError) or []
    if not isinstance(entries, list):
        raise ValueError(f"{path}: expected a list of checks")
    for i, entry in enumerate(entries):
        if not isinstance(entry, dict) or not all(isinstance(entry.get(k), str)
                                                  for k in ("name", "problem", "expect", "completion")):
            raise ValueError(f"{path}: entry {i} needs string fields name, problem, expect, completion")
    return entries


def check_runtime(runtime: Runtime, problem_set: ProblemSet, sandbox: Sandbox, jobs: int,
                  limit_overrides: LimitOverrides = LimitOverrides()) -> list[dict]:
    """Run the conformance references (each must pass) and the runtime's wrong candidates (each
    must get its stated verdict). Returns one row per check with ``ok``."""
    executor = Executor(sandbox, problem_set, {runtime.name: runtime}, mode="continue",
                        limit_overrides=limit_overrides)
    jobs_list: list[tuple[str, str, Sample]] = []
    rows: list[dict] = []
    for problem in problem_set.problems.values():
        reason = runtime.refusal(problem)
        if reason:
            rows.append({"check": f"reference {problem.id}", "expect": "unsupported", "outcome": "unsupported",
                         "detail": reason, "ok": True})
            continue
        if runtime.reference(problem) is None:
            rows.append({"check": f"reference {problem.id}", "expect": "passed", "outcome": "missing",
                         "detail": f"no {runtime.name} reference", "ok": False})
            continue
        sample = Sample(problem.id, runtime.name, 0, runtime.reference_completion(problem), "reference", 0)
        jobs_list.append((f"reference {problem.id}", "passed", sample))
    for entry in load_wrong_candidates(runtime):
        if entry["problem"] not in problem_set.problems:
            rows.append({"check": entry["name"], "expect": entry["expect"], "outcome": "missing",
                         "detail": f"unknown problem {entry['problem']!r}", "ok": False})
            continue
        completion = indent_lines(entry["completion"], runtime.reference_indent) + "\n"
        jobs_list.append((entry["name"], entry["expect"], Sample(entry["problem"], runtime.name, 0, completion,
                                                                 CHECKS_FILE, 0)))
    with futures.ThreadPoolExecutor(max_workers=jobs) as pool:
        verdicts = pool.map(executor.execute, [sample for _, _, sample in jobs_list])
        for (name, expect, sample), verdict in zip(jobs_list, verdicts):
            rows.append({"check": name, "problem": sample.problem, "expect": expect, "outcome": verdict.outcome,
                         "detail": verdict.detail, "seconds": verdict.seconds, "ok": verdict.outcome == expect})
    return rows
