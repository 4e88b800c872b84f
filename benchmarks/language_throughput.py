"""Milliseconds per candidate for every installed language: the bare toolchain, each sandbox
backend with cold compilers, and each with warm ones (compile.warm in runtime.yaml).

(a) ``bare``: the toolchain alone, no sandbox and no harness: the rendered program is written
to a fresh folder in RAM beforehand, and the runtime's compile and run commands run there as
plain processes (each candidate with empty caches, as in a sandbox); only those are timed, the
rendering and judging are not. (b) ``<backend> cold``: the real Executor
(render, compile, run, read the results, judge) with ``warm=False``. (c) ``<backend> warm``:
the same with the runtime's warm compiler (for a runtime that declares none it is the cold
path again, and the table says so).

One run, one workload per language: the conformance references, cycled to ``--candidates``.
No two candidates share a verdict or a compiled program: every execution renders a fresh
nonce into the test driver, so every source differs, and nothing is cached by program. The
configurations take turns in rounds, so a load change on a shared machine hits all of them
alike; a language's rounds run one after another, so its compile servers stay warm (an idle
one ends after two minutes); each configuration starts with an untimed warm-up (sandboxes
and compile servers started and warmed up, the precompiled header built). Prints ms per candidate and the ratio to the bare toolchain, and for
the interpreted languages the overhead in ms over bare. Targets (issue 15): warm Java and
TypeScript <= 0.25x bare, C++ <= 0.5x, Rust, Go and C# <= 0.8x; interpreted languages under
bubblewrap within 5 ms of bare.

    python benchmarks/language_throughput.py
    python benchmarks/language_throughput.py --languages java,typescript,cpp --candidates 48 --jobs 2
"""

from __future__ import annotations

import argparse
import concurrent.futures as futures
import secrets
import shutil
import subprocess
import sys
import tempfile
import time
from collections import Counter
from pathlib import Path

ROOT = Path(__file__).resolve().parents[1]
sys.path.insert(0, str(ROOT))

from harness.console import render  # noqa: E402
from harness.engine.execution import Executor, judge  # noqa: E402
from harness.problems import load_problem_set  # noqa: E402
from harness.runtimes import available_runtimes, load_runtime  # noqa: E402
from harness.sandbox import SandboxUnavailable, make_sandbox  # noqa: E402
from harness.sandbox.local import candidate_env, default_work_root  # noqa: E402
from harness.vocabulary import Sample, StepResult  # noqa: E402

TARGETS = {"java": 0.25, "typescript": 0.25, "cpp": 0.5, "rust": 0.8, "go": 0.8, "csharp": 0.8}
INTERPRETED_MS = 5.0


def workload(runtime, problems, count: int) -> list[Sample]:
    references = [(p.id, runtime.reference_completion(p)) for p in problems.problems.values()
                  if runtime.reference(p) is not None and runtime.refusal(p) is None]
    return [Sample(pid, runtime.name, i, completion, "benchmark", i)
            for i, (pid, completion) in enumerate(references[i % len(references)] for i in range(count))]


class BareCandidate:
    """One candidate for the bare toolchain: its program rendered into a fresh folder in RAM
    beforehand, so that only the toolchain's own work is timed (``toolchain``), and judged
    afterwards (``passed``)."""

    def __init__(self, executor: Executor, runtime, sample: Sample, scratch: Path):
        self.runtime, self.sample, self.executor = runtime, sample, executor
        self.folder = Path(tempfile.mkdtemp(prefix="bare-", dir=scratch))
        self.nonce = secrets.token_hex(16)
        self.results_file = f".results-{self.nonce[:12]}.jsonl"
        (self.folder / runtime.source_file).write_text(executor.program(sample, self.nonce, self.results_file),
                                                       encoding="utf-8")
        tmp = self.folder / ".tmp"
        tmp.mkdir()
        self.env = candidate_env(runtime.needs, {}, home=str(self.folder), tmp=str(tmp))
        for key, value in self.env.items():  # the runtime's private caches, fresh for each candidate
            if value.startswith("/tmp/"):
                self.env[key] = str(tmp / value[len("/tmp/"):])
        self.ran: subprocess.CompletedProcess | None = None

    def toolchain(self) -> None:
        """Compile and run, plain processes, nothing else. Each in a session of its own, as every
        sandboxed step is: with the kernel's autogroup scheduling (sched_autogroup_enabled) a
        loaded machine shares CPU between sessions, so steps left in the harness's session
        would get a smaller share than sandboxed ones and make the baseline look slow."""
        if self.runtime.compile:
            built = subprocess.run(list(self.runtime.compile.command), cwd=self.folder, env=self.env,
                                   capture_output=True, start_new_session=True)
            if built.returncode != 0:
                return
        self.ran = subprocess.run(list(self.runtime.run.command), cwd=self.folder, env=self.env, capture_output=True,
                                  start_new_session=True)

    def passed(self) -> bool:
        try:
            if self.ran is None:
                return False
            step = StepResult(exit_code=self.ran.returncode, stdout=self.ran.stdout.decode("utf-8", "replace"),
                              stderr=self.ran.stderr.decode("utf-8", "replace"))
            path = self.folder / self.results_file
            results = path.read_bytes() if path.exists() else b""
            problem = self.executor.problems.problems[self.sample.problem]
            verdict = judge(problem, self.runtime, step, results, self.nonce,
                            self.runtime.step_limits("run", problem.limits))
            return verdict.outcome == "passed"
        finally:
            shutil.rmtree(self.folder, ignore_errors=True)


def main() -> int:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--candidates", type=int, default=24, help="candidates per language and configuration")
    parser.add_argument("--jobs", type=int, default=2, help="candidates run at once (assay score's default: 2)")
    parser.add_argument("--rounds", type=int, default=3, help="turns the configurations take")
    parser.add_argument("--backends", default="none,bubblewrap", help="comma-separated sandbox backends")
    parser.add_argument("--languages", default="", help="comma-separated (default: every installed runtime)")
    args = parser.parse_args()

    problems = load_problem_set("conformance")
    names = [n for n in args.languages.split(",") if n] or available_runtimes()
    runtimes = {}
    for name in names:
        runtime = load_runtime(name)
        if runtime.toolchain_version() is None:
            print(f"skipping {name}: its toolchain is not installed", file=sys.stderr)
            continue
        runtimes[name] = runtime
    boxes = {}
    for name in [n for n in args.backends.split(",") if n]:
        try:
            box = make_sandbox(name)
            box.check()
            boxes[name] = box
        except SandboxUnavailable as exc:
            print(f"skipping {name}: {exc}", file=sys.stderr)

    # configuration -> language -> executor (None: the bare toolchain)
    configs: dict[str, dict[str, Executor | None]] = {"bare": {}}
    for backend, box in boxes.items():
        for warm in (False, True):
            configs[f"{backend} {'warm' if warm else 'cold'}"] = {
                name: Executor(box, problems, {name: runtime}, warm=warm, infra_retries=0)
                for name, runtime in runtimes.items()}
    plain = {name: Executor(None, problems, {name: runtime}) for name, runtime in runtimes.items()}
    samples = {name: workload(runtime, problems, args.candidates) for name, runtime in runtimes.items()}
    seconds: dict[tuple[str, str], float] = Counter()
    failed: dict[tuple[str, str], int] = Counter()
    how: dict[tuple[str, str], str] = {}
    scratch = Path(tempfile.mkdtemp(prefix="assay-throughput-", dir=default_work_root()))  # in RAM, as sandboxes' are

    def run(config: str, language: str, part: list[Sample], pool) -> tuple[float, int]:
        executor = configs[config].get(language)
        if executor is None:  # the toolchain alone: rendering before, judging after the clock
            bare = [BareCandidate(plain[language], runtimes[language], sample, scratch) for sample in part]
            began = time.perf_counter()
            list(pool.map(BareCandidate.toolchain, bare))
            spent = time.perf_counter() - began
            return spent, sum(not candidate.passed() for candidate in bare)
        began = time.perf_counter()
        results = [v.outcome == "passed" for v in pool.map(executor.execute, part)]
        return time.perf_counter() - began, sum(not ok for ok in results)

    try:
        with futures.ThreadPoolExecutor(max_workers=args.jobs) as pool:
            chunk = -(-args.candidates // args.rounds)
            for language, runtime in runtimes.items():  # a language's configurations close in time
                for config in configs:  # warm-up, untimed
                    executor = configs[config].get(language)
                    if executor is not None:
                        if hasattr(executor.sandbox, "warm"):
                            executor.sandbox.warm(runtime.needs, args.jobs)
                        if runtime.compile is not None:
                            # Servers started and warmed up on a program of this workload.
                            example = {runtime.source_file: executor.program(samples[language][0], "0" * 32,
                                                                              ".results-warmup.jsonl").encode()}
                            compiler = (executor.compilers.prepare(runtime, runtime.step_limits("compile"),
                                                                   servers=args.jobs, example=example)
                                        if executor.compilers is not None else executor.compiler_for(runtime, None))
                            how[config, language] = compiler.describe()
                    run(config, language, samples[language][: 2 * args.jobs], pool)
                for start in range(0, args.candidates, chunk):
                    for config in configs:
                        spent, bad = run(config, language, samples[language][start:start + chunk], pool)
                        seconds[config, language] += spent
                        failed[config, language] += bad
    finally:
        for box in boxes.values():
            box.close()
        shutil.rmtree(scratch, ignore_errors=True)

    rows = []
    for language, runtime in runtimes.items():
        bare = seconds["bare", language] / args.candidates
        row = [language, f"{bare * 1000:.0f}"]
        for config in list(configs)[1:]:
            per = seconds[config, language] / args.candidates
            cold_again = config.endswith("warm") and not how.get((config, language), "cold").startswith(("warm", "pre"))
            if cold_again:
                row.append("=")
            elif language not in TARGETS:  # interpreted: the overhead in ms is the figure that matters
                row.append(f"{per * 1000:.0f} ({(per - bare) * 1000:+.1f} ms)")
            else:
                row.append(f"{per * 1000:.0f} ({per / bare:.2f}x)")
        target = TARGETS.get(language)
        if target is not None:
            best = min(seconds[c, language] for c in configs if c.endswith("warm")) / args.candidates if boxes else bare
            row.append(f"<= {target:.2f}x: {'met' if best / bare <= target else 'missed'} ({best / bare:.2f}x)")
        elif "bubblewrap cold" in configs:
            extra = (seconds["bubblewrap cold", language] / args.candidates - bare) * 1000
            row.append(f"bubblewrap <= +{INTERPRETED_MS:g} ms: {'met' if extra <= INTERPRETED_MS else 'missed'}")
        else:
            row.append("-")
        row.append(str(sum(failed[c, language] for c in configs)))
        rows.append(row)
    print(f"language throughput: {args.candidates} conformance candidates per language and configuration, "
          f"--jobs {args.jobs}, {args.rounds} rounds; ms per candidate (ratio to the bare toolchain)")
    headers = ["language", "bare"] + list(configs)[1:] + ["target (best warm)", "not passed"]
    print(render(headers, rows, align="l" + "r" * (len(headers) - 3) + "lr"))
    for (config, language), text in sorted(how.items()):
        if config.endswith("warm") and text != "cold":
            print(f"{config} {language}: {text}")
    return 0 if not any(failed.values()) else 1


if __name__ == "__main__":
    sys.exit(main())
