"""Self-checks of data: reference solutions must pass, deliberately wrong ones must not."""

from __future__ import annotations

import concurrent.futures as futures


from ..vocabulary import LimitOverrides, Sample
from .execution import Executor
from ..problems import ProblemSet
from ..runtimes import Runtime, indent_lines
from ..yamlfiles import read_yaml
from ..sandbox import Sandbox


def check_references(problem_set: ProblemSet, runtimes: dict[str, Runtime], sandbox: Sandbox, jobs: int) -> list[dict]:
    """Score each (problem, language) reference as a continuation of its prompt. A problem
    without a reference in a requested language is reported as ``missing``."""
    executor = Executor(sandbox, problem_set, runtimes, mode="continue")
    samples, results = [], []
    for problem in problem_set.problems.values():
        for language in runtimes:
            reason = runtimes[language].refusal(problem)
            if reason:
                results.append({"problem": problem.id, "language": language, "outcome": "unsupported",
                                "detail": reason})
            elif runtimes[language].reference(problem) is not None:
                completion = runtimes[language].reference_completion(problem)
                samples.append(Sample(problem.id, language, 0, completion, str(problem.source), 0))
            else:
                results.append({"problem": problem.id, "language": language, "outcome": "missing",
                                "detail": f"no reference.{language} in {problem.source}, nor in "
                                          f"{runtimes[language].path / 'references' / problem.source.parent.name}"})
    with futures.ThreadPoolExecutor(max_workers=jobs) as pool:
        for sample, verdict in zip(samples, pool.map(executor.execute, samples)):
            results.append({"problem": sample.problem, "language": sample.language, "outcome": verdict.outcome,
                            "detail": verdict.detail, "seconds": verdict.seconds})
    return sorted(results, key=lambda r: (r["problem"], r["language"]))


def problem_warnings(problem_set: ProblemSet, runtimes: dict[str, Runtime]) -> list[str]:
    """What a set's author should know before scoring: names that some runtime must rename
    because they are reserved words there, and zero float expectations that only an exact zero
    meets (PEP 485's default absolute tolerance is 0)."""
    warnings = []
    for problem in problem_set.problems.values():
        for runtime in runtimes.values():
            for snake, shown in runtime.renamed(problem):
                warnings.append(f"{problem.source}: {snake!r} is reserved in {runtime.name}; its prompt says {shown!r}")
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
