"""What syntax-aware extraction costs per sample, against what scoring a sample costs.

One run. First, a dump of ``--rows`` rows (default 100,000) is built from the answer-shape
corpus (tests/extraction_corpus/: chat answers and base-model continuations in every runtime
that has one, around correct and wrong code), and every row's program is assembled twice: with
the textual rules (``--extract strict``) and with the grammar (``--extract syntax``), taking
turns in chunks so that load changes hit both alike. Nothing is cached between rows.

Second, ``--score`` samples of the same corpus, spread over its languages, are judged end to end
under bubblewrap by ``--jobs`` workers (render, compile, run, judge; no verdict shared), to give
the time per sample that extraction is a share of: extraction runs in the scheduling thread, once
per row, while judging is spread over the workers, so the share compares extraction time per row
with wall time per judged row. Target: extraction adds under 5% to scoring time.

    python benchmarks/extraction_speed.py
    python benchmarks/extraction_speed.py --rows 100000 --score 48 --jobs 2
"""

from __future__ import annotations

import argparse
import concurrent.futures as futures
import itertools
import sys
import time
from pathlib import Path

ROOT = Path(__file__).resolve().parents[1]
sys.path.insert(0, str(ROOT))

from harness.console import render  # noqa: E402
from harness.engine.completions import MODES, assemble_code, extraction_request  # noqa: E402
from harness.engine.execution import Executor  # noqa: E402
from harness.extraction import extract  # noqa: E402
from harness.problems import load_problem_set  # noqa: E402
from harness.runtimes import load_runtime  # noqa: E402
from harness.sandbox import make_sandbox  # noqa: E402
from harness.vocabulary import Sample  # noqa: E402
from tests.extraction_shapes import corpus_languages, load_shapes  # noqa: E402

TARGET_SHARE = 0.05
CHUNK = 2000


def corpus_rows(core) -> list[dict]:
    rows = []
    for language in corpus_languages():
        runtime = load_runtime(language)
        for shape in load_shapes(language, lambda p: runtime.reference_completion(core.problems[p])):
            for text in (shape.correct, shape.wrong):
                rows.append({"problem": shape.problem, "language": language, "mode": shape.mode, "completion": text})
    return rows


def assemble_all(rows, core, runtimes, policy: str, prompts: dict) -> float:
    started = time.perf_counter()
    for row in rows:
        runtime, problem = runtimes[row["language"]], core.problems[row["problem"]]
        prompt, preamble = prompts[(row["language"], row["problem"])]
        request = extraction_request(row["mode"], runtime, problem, prompt, preamble, row["completion"], policy)
        assemble_code(runtime, problem, row["mode"], extract(request), preamble)
    return time.perf_counter() - started


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.split("\n\n")[0])
    parser.add_argument("--rows", type=int, default=100_000)
    parser.add_argument("--score", type=int, default=48, help="distinct samples scored end to end per policy")
    parser.add_argument("--jobs", type=int, default=2)
    args = parser.parse_args()

    core = load_problem_set("core")
    corpus = corpus_rows(core)
    runtimes = {language: load_runtime(language) for language in {r["language"] for r in corpus}}
    prompts = {(r["language"], r["problem"]): (runtimes[r["language"]].render_prompt(core.problems[r["problem"]]),
                                               runtimes[r["language"]].render_preamble(core.problems[r["problem"]]))
               for r in corpus}
    rows = list(itertools.islice(itertools.cycle(corpus), args.rows))
    assemble_all(corpus, core, runtimes, "syntax", prompts)  # grammars loaded, parsers made: not timed
    seconds = {"strict": 0.0, "syntax": 0.0}
    for start in range(0, len(rows), CHUNK):
        for policy in ("strict", "syntax"):
            seconds[policy] += assemble_all(rows[start:start + CHUNK], core, runtimes, policy, prompts)
    per_row = {policy: 1000 * s / len(rows) for policy, s in seconds.items()}
    added = per_row["syntax"] - per_row["strict"]

    installed = [l for l in sorted(runtimes) if runtimes[l].toolchain_version()]
    pool = [r for r in corpus if r["language"] in installed]
    chosen = pool[:: max(1, len(pool) // args.score)][: args.score]
    with make_sandbox("bubblewrap") as box:
        box.check()
        executors = {mode: Executor(box, core, {l: runtimes[l] for l in installed}, mode=mode) for mode in MODES}
        samples = [(executors[r["mode"]], Sample(r["problem"], r["language"], n, r["completion"], "corpus", n))
                   for n, r in enumerate(chosen)]
        with futures.ThreadPoolExecutor(args.jobs) as pool_:
            list(pool_.map(lambda pair: pair[0].execute(pair[1]), samples[: args.jobs]))  # warm-up, not timed
            started = time.perf_counter()
            list(pool_.map(lambda pair: pair[0].execute(pair[1]), samples))
            judged_ms = 1000 * (time.perf_counter() - started) / len(samples)

    share = added / judged_ms
    print(render(["measure", "ms per sample"], [
        [f"assemble, textual rules ({len(rows):,} rows)", f"{per_row['strict']:.3f}"],
        [f"assemble, syntax-aware ({len(rows):,} rows)", f"{per_row['syntax']:.3f}"],
        ["extraction added", f"{added:.3f}"],
        [f"judging a candidate ({len(chosen)} samples, bubblewrap, {args.jobs} workers, wall)", f"{judged_ms:.1f}"],
    ], align="lr"))
    print(f"\nextraction adds {100 * share:.2f}% to scoring time per sample (target under {100 * TARGET_SHARE:.0f}%): "
          f"{'met' if share < TARGET_SHARE else 'NOT met'}")
    print(f"languages scored: {', '.join(installed)}")


if __name__ == "__main__":
    main()
