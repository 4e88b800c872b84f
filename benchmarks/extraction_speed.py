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


def assemble_all(rows, core, runtimes, policy: str, prompts: dict, spent: dict) -> None:
    """Assemble every row's program; add the seconds to ``spent[language]``."""
    for row in rows:
        started = time.perf_counter()
        runtime, problem = runtimes[row["language"]], core.problems[row["problem"]]
        prompt, preamble = prompts[(row["language"], row["problem"])]
        request = extraction_request(row["mode"], runtime, problem, prompt, preamble, row["completion"], policy)
        assemble_code(runtime, problem, row["mode"], extract(request), preamble)
        spent[row["language"]] = spent.get(row["language"], 0.0) + time.perf_counter() - started


def judge_ms(box, core, runtimes, rows, jobs: int) -> float:
    """Wall milliseconds per row for ``jobs`` workers judging ``rows`` end to end."""
    executors = {mode: Executor(box, core, runtimes, mode=mode) for mode in MODES}
    samples = [(executors[r["mode"]], Sample(r["problem"], r["language"], n, r["completion"], "corpus", n))
               for n, r in enumerate(rows)]
    with futures.ThreadPoolExecutor(jobs) as pool:
        list(pool.map(lambda pair: pair[0].execute(pair[1]), samples[:jobs]))  # warm-up, not timed
        started = time.perf_counter()
        list(pool.map(lambda pair: pair[0].execute(pair[1]), samples))
        return 1000 * (time.perf_counter() - started) / len(samples)


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.split("\n\n")[0])
    parser.add_argument("--rows", type=int, default=100_000)
    parser.add_argument("--score", type=int, default=8, help="samples judged end to end per language")
    parser.add_argument("--jobs", type=int, default=2)
    args = parser.parse_args()

    core = load_problem_set("core")
    corpus = corpus_rows(core)
    runtimes = {language: load_runtime(language) for language in {r["language"] for r in corpus}}
    prompts = {(r["language"], r["problem"]): (runtimes[r["language"]].render_prompt(core.problems[r["problem"]]),
                                               runtimes[r["language"]].render_preamble(core.problems[r["problem"]]))
               for r in corpus}
    rows = list(itertools.islice(itertools.cycle(corpus), args.rows))
    assemble_all(corpus, core, runtimes, "syntax", prompts, {})  # grammars loaded, parsers made: not timed
    spent = {"strict": {}, "syntax": {}}
    for start in range(0, len(rows), CHUNK):
        for policy in ("strict", "syntax"):
            assemble_all(rows[start:start + CHUNK], core, runtimes, policy, prompts, spent[policy])
    counts = {language: sum(r["language"] == language for r in rows) for language in runtimes}
    added = {language: 1000 * (spent["syntax"][language] - spent["strict"][language]) / counts[language]
             for language in runtimes}
    overall = 1000 * (sum(spent["syntax"].values()) - sum(spent["strict"].values())) / len(rows)

    table, shares = [], []
    with make_sandbox("bubblewrap") as box:
        box.check()
        for language in sorted(runtimes):
            if not runtimes[language].toolchain_version():
                table.append([language, f"{added[language]:.3f}", "not installed", ""])
                continue
            pool = [r for r in corpus if r["language"] == language]
            chosen = pool[:: max(1, len(pool) // args.score)][: args.score]
            judged = judge_ms(box, core, {language: runtimes[language]}, chosen, args.jobs)
            shares.append(added[language] / judged)
            table.append([language, f"{added[language]:.3f}", f"{judged:.1f}", f"{100 * shares[-1]:.2f}%"])
    print(render(["language", "extraction added, ms per row", "judging, ms per row", "share"], table, align="lrrr"))
    worst = max(shares) if shares else 0.0
    print(f"\n{len(rows):,} rows: extraction adds {overall:.3f} ms per row on average "
          f"(syntax-aware minus textual rules); judged with bubblewrap, {args.jobs} workers, "
          f"{args.score} rows per language")
    print(f"largest share of scoring time: {100 * worst:.2f}% (target under {100 * TARGET_SHARE:.0f}%): "
          f"{'met' if worst < TARGET_SHARE else 'NOT met'}")

if __name__ == "__main__":
    main()
