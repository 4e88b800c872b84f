"""What isolation costs per candidate: the bare backend vs bubblewrap vs the warm Docker pool.

The baseline, ``--sandbox none``, runs the same step supervisor as the sandboxes (one warm
supervisor per worker, the same limits through a cgroup or rlimits), as a plain host process:
so the ratios measure isolation alone, not two different ways of enforcing limits.

One run, one workload: the Python conformance set's references, repeated to ``--candidates``
(at least 500), each judged end to end by the real Executor (render, compile, run, read the
results, judge). The backends take turns in rounds, so a load change on a shared machine
hits all of them alike; each starts with a warm-up (the warm supervisors and the Docker pool's
containers started, caches filled) that is not timed. Prints time per candidate, the ratio to
the bare backend, and what enforces memory in each. Targets: Docker within 1.5x of bare,
bubblewrap within 1.15x.

    python benchmarks/sandbox_overhead.py
    python benchmarks/sandbox_overhead.py --candidates 1000 --jobs 2 --rounds 10
"""

from __future__ import annotations

import argparse
import concurrent.futures as futures
import sys
import time
from collections import Counter
from pathlib import Path

ROOT = Path(__file__).resolve().parents[1]
sys.path.insert(0, str(ROOT))

from harness.vocabulary import Sample  # noqa: E402
from harness.engine.execution import Executor  # noqa: E402
from harness.problems import load_problem_set  # noqa: E402
from harness.runtimes import load_runtime  # noqa: E402
from harness.sandbox import SandboxUnavailable, make_sandbox  # noqa: E402
from harness.console import render  # noqa: E402

TARGETS = {"bubblewrap": 1.15, "docker": 1.5}
BACKENDS = ("none", "bubblewrap", "docker")
MIN_CANDIDATES = 500


def workload(count: int) -> list[Sample]:
    problems = load_problem_set("conformance")
    runtime = load_runtime("python")
    references = [(p.id, runtime.reference_completion(p)) for p in problems.problems.values()
                  if runtime.reference(p) is not None]
    return [Sample(pid, "python", i, completion, "benchmark", i)
            for i, (pid, completion) in enumerate(references[i % len(references)] for i in range(count))]


def main() -> int:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--candidates", type=int, default=520, help=f"candidates per backend (>= {MIN_CANDIDATES})")
    parser.add_argument("--jobs", type=int, default=2, help="candidates run at once (assay score's default: 2)")
    parser.add_argument("--rounds", type=int, default=8, help="turns the backends take")
    parser.add_argument("--backends", default=",".join(BACKENDS), help="comma-separated; 'none' is the baseline")
    args = parser.parse_args()
    if args.candidates < MIN_CANDIDATES:
        parser.error(f"--candidates must be at least {MIN_CANDIDATES}")
    names = [n for n in args.backends.split(",") if n]
    if "none" not in names:
        parser.error("the bare backend ('none') is the baseline and must be measured")

    problems = load_problem_set("conformance")
    runtime = load_runtime("python")
    samples = workload(args.candidates)
    executors, sandboxes, mechanisms = {}, {}, {}
    for name in names:
        try:
            box = make_sandbox(name)
            box.check()
        except SandboxUnavailable as exc:
            print(f"skipping {name}: {exc}", file=sys.stderr)
            continue
        sandboxes[name] = box
        executors[name] = Executor(box, problems, {"python": runtime}, infra_retries=0)
        described = box.describe()
        mechanisms[name] = described.get("memory_limit") or described.get("limits", "-")
    seconds = Counter()
    outcomes = {name: Counter() for name in executors}
    try:
        with futures.ThreadPoolExecutor(max_workers=args.jobs) as pool:
            for name, executor in executors.items():  # warm-up, untimed
                if hasattr(sandboxes[name], "warm"):
                    sandboxes[name].warm(runtime.needs, args.jobs)
                list(pool.map(executor.execute, samples[: 4 * args.jobs]))
            chunk = -(-len(samples) // args.rounds)
            for start in range(0, len(samples), chunk):
                part = samples[start:start + chunk]
                for name, executor in executors.items():
                    began = time.perf_counter()
                    verdicts = list(pool.map(executor.execute, part))
                    seconds[name] += time.perf_counter() - began
                    outcomes[name].update(v.outcome for v in verdicts)
    finally:
        for box in sandboxes.values():
            box.close()

    bare = seconds["none"] / len(samples)
    rows = []
    for name in executors:
        per = seconds[name] / len(samples)
        ratio = per / bare
        target = TARGETS.get(name)
        verdict = "" if target is None else ("met" if ratio <= target else f"missed by {ratio - target:.2f}x")
        not_passed = sum(c for o, c in outcomes[name].items() if o != "passed")
        rows.append([name, str(len(samples)), f"{seconds[name]:.1f}", f"{per * 1000:.1f}", f"{ratio:.2f}x",
                     f"{target:.2f}x" if target else "-", verdict, str(not_passed)])
    print(f"sandbox overhead: {len(samples)} Python conformance references per backend, --jobs {args.jobs}, "
          f"{args.rounds} rounds")
    print(render(["backend", "candidates", "seconds", "ms/candidate", "vs bare", "target", "", "not passed"],
                 rows, align="lrrrrrll"))
    for name, described in mechanisms.items():
        print(f"{name} limits: {described}")
    return 0 if all(o.keys() <= {"passed"} for o in outcomes.values()) else 1


if __name__ == "__main__":
    sys.exit(main())
