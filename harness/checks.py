"""Self-checks of data: every reference solution of a problem set must pass all its cases."""

from __future__ import annotations

import concurrent.futures as futures

from .completions import Sample
from .execution import Executor
from .problems import ProblemSet
from .runtimes import Runtime
from .sandbox import Sandbox


def check_references(problem_set: ProblemSet, runtimes: dict[str, Runtime], sandbox: Sandbox, jobs: int) -> list[dict]:
    """Score each (problem, language) reference as a continuation of its prompt. A problem
    without a reference in a requested language is reported as ``missing``."""
    executor = Executor(sandbox, problem_set, runtimes, mode="continue")
    samples, results = [], []
    for problem in problem_set.problems.values():
        for language in runtimes:
            if language in problem.reference:
                completion = runtimes[language].reference_completion(problem)
                samples.append(Sample(problem.id, language, 0, completion, str(problem.source), 0))
            else:
                results.append({"problem": problem.id, "language": language, "outcome": "missing",
                                "detail": f"no reference.{language} in {problem.source}"})
    with futures.ThreadPoolExecutor(max_workers=jobs) as pool:
        for sample, verdict in zip(samples, pool.map(executor.execute, samples)):
            results.append({"problem": sample.problem, "language": sample.language, "outcome": verdict.outcome,
                            "detail": verdict.detail, "seconds": verdict.seconds})
    return sorted(results, key=lambda r: (r["problem"], r["language"]))
