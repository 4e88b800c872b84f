"""Scoring a million-row dump in bounded memory, and summarizing a million verdicts quickly.

Writes a dump of ``--rows`` rows over the core set's problems in Python, with the repetition of
low-temperature sampling: each problem has 20 distinct completions (its reference, copies of it
that differ only in trailing text the stop sequences or whitespace remove, commented variants,
and faulty drafts), about 17 distinct programs, so sharing keeps executions near a thousand.

It then runs the real ``assay score`` in a subprocess and reads that process's peak resident
memory from the kernel (its VmHWM, and wait4's rusage), and times ``metrics.summarize`` over the
rows written, in a fresh process as well. Targets: 300 MB peak, 10 s to summarize.

    python benchmarks/million_rows.py                      # bubblewrap, 1,000,000 rows
    python benchmarks/million_rows.py --sandbox none --rows 200000
    python benchmarks/million_rows.py --engine ray         # a private Ray instance on this machine
"""

from __future__ import annotations

import argparse
import json
import os
import random
import shutil
import subprocess
import sys
import tempfile
import threading
import time
from dataclasses import dataclass
from pathlib import Path

ROOT = Path(__file__).resolve().parents[1]
sys.path.insert(0, str(ROOT))

from harness.problems import load_problem_set  # noqa: E402
from harness.runtimes import load_runtime  # noqa: E402

PEAK_MEMORY_TARGET_MB = 300
SUMMARY_SECONDS_TARGET = 10.0
COMPLETIONS_PER_PROBLEM = 20


def completions_for(reference: str) -> list[tuple[str, float]]:
    """(completion, weight) for one problem: 20 completions, 17 distinct programs."""
    variants = [
        (reference, 30.0),                                        # the model's favourite answer
        (reference + "   \n\n", 10.0),                            # same program: trailing whitespace
        (reference + "\n\ndef unused():\n    return 0\n", 8.0),   # same program: cut at "\ndef "
        (reference + "\n# end of answer\n", 4.0),                # same program: cut at "\n#"
    ]
    variants += [(reference + f"    # checked {j}\n", 3.0) for j in range(8)]          # passing, distinct
    variants += [(f"    return None  # draft {j}\n" + reference, 2.0) for j in range(4)]
    variants += [(f"    raise ValueError('draft {j}')\n" + reference, 1.5) for j in range(3)]
    variants += [("    return (\n", 1.0)]                                                 # a syntax error
    assert len(variants) == COMPLETIONS_PER_PROBLEM
    return variants


def write_dump(path: Path, rows: int, seed: int) -> dict:
    core = load_problem_set("core")
    python = load_runtime("python")
    problems = sorted((p for p in core.problems.values() if "python" in p.reference), key=lambda p: p.id)
    rng = random.Random(seed)
    pools = {}
    for problem in problems:
        variants = completions_for(python.reference_completion(problem))
        lines = [json.dumps({"problem": problem.id, "language": "python", "completion": text}) + "\n"
                 for text, _ in variants]
        pools[problem.id] = (lines, [w for _, w in variants])
    ids = [p.id for p in problems]
    with open(path, "w", encoding="utf-8") as handle:
        for start in range(0, rows, 10_000):
            count = min(10_000, rows - start)
            chosen = rng.choices(ids, k=count)
            handle.write("".join(rng.choices(pools[pid][0], weights=pools[pid][1])[0] for pid in chosen))
    return {"problems": len(problems), "bytes": path.stat().st_size}


@dataclass
class Measured:
    wall: float          # seconds
    peak_kb: int         # peak resident set from wait4: the child, or its largest waited-for descendant
    polled_peak_kb: int  # the child's own VmHWM, read from /proc while it ran
    cpu: float           # user + system seconds of the child and its waited-for descendants
    stdout: str
    stderr: str


def run_measured(argv: list[str], env: dict | None = None) -> Measured:
    """Run a child to completion and take its figures from the kernel: wait4 reports this
    child's own rusage, so other work on the machine never blurs the memory figure."""
    started = time.monotonic()
    stdout_file, stderr_file = tempfile.TemporaryFile(mode="w+"), tempfile.TemporaryFile(mode="w+")
    process = subprocess.Popen(argv, stdout=stdout_file, stderr=stderr_file, env=env)
    polled = [0]

    def poll():
        while process.returncode is None:
            try:
                for line in Path(f"/proc/{process.pid}/status").read_text().splitlines():
                    if line.startswith("VmHWM:"):
                        polled[0] = max(polled[0], int(line.split()[1]))
            except OSError:
                return
            time.sleep(0.2)

    watcher = threading.Thread(target=poll, daemon=True)
    watcher.start()
    _, status, usage = os.wait4(process.pid, 0)
    process.returncode = os.waitstatus_to_exitcode(status)
    wall = time.monotonic() - started
    watcher.join(timeout=1)
    stdout_file.seek(0)
    stderr_file.seek(0)
    stderr = stderr_file.read()
    if process.returncode != 0:
        raise SystemExit(f"{' '.join(argv[:4])} ... failed ({process.returncode}):\n{stderr[-3000:]}")
    return Measured(wall, usage.ru_maxrss, polled[0], usage.ru_utime + usage.ru_stime, stdout_file.read(), stderr)


SUMMARIZE = """
import json, sys, time
from harness.store import read_rows
from harness.metrics import summarize
started, cpu = time.monotonic(), time.process_time()
summary = summarize(read_rows(sys.argv[1]), [1, 10, 100])
print(json.dumps({"seconds": time.monotonic() - started, "cpu": time.process_time() - cpu,
                  "samples": summary["samples"]}))
"""


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.split("\n\n")[0])
    parser.add_argument("--rows", type=int, default=1_000_000)
    parser.add_argument("--sandbox", choices=["bubblewrap", "none"], default="bubblewrap")
    parser.add_argument("--jobs", type=int, default=2)
    parser.add_argument("--engine", choices=["local", "ray"], default="local")
    parser.add_argument("--address", default=None, help="Ray cluster address for --engine ray.")
    parser.add_argument("--seed", type=int, default=7)
    parser.add_argument("--workdir", type=Path, default=None, help="Where the dump and results go (default: a "
                        "temporary folder, removed afterwards).")
    args = parser.parse_args()

    workdir = args.workdir or Path(tempfile.mkdtemp(prefix="assay-million-"))
    workdir.mkdir(parents=True, exist_ok=True)
    try:
        dump, out = workdir / "million.jsonl", workdir / "out"
        shutil.rmtree(out, ignore_errors=True)
        started = time.monotonic()
        info = write_dump(dump, args.rows, args.seed)
        print(f"wrote {args.rows:,} rows over {info['problems']} problems ({info['bytes'] / 1e6:.0f} MB) "
              f"in {time.monotonic() - started:.1f}s", flush=True)

        env = dict(os.environ, PYTHONPATH=str(ROOT) + os.pathsep + os.environ.get("PYTHONPATH", ""))
        engine = ["--engine", args.engine] + (["--address", args.address] if args.address else [])
        scored = run_measured([sys.executable, "-m", "harness", "score", str(dump), "--set", "core", "--out", str(out),
                               "-q", "--sandbox", args.sandbox, "-j", str(args.jobs), *engine], env)
        summary = json.loads((out / "summary.json").read_text())
        executions = summary["executions"]
        print(scored.stderr.strip().splitlines()[-1], flush=True)

        summarized = run_measured([sys.executable, "-c", SUMMARIZE, str(out / "executions.jsonl")], env)
        timing = json.loads(summarized.stdout)
        rows_written = sum(1 for _ in open(out / "executions.jsonl", "rb"))

        # The harness process's own high-water mark; wait4's figure also covers its descendants
        # (with a private Ray instance: Ray's own servers), so it is only printed beside it.
        peak_mb = (scored.polled_peak_kb or scored.peak_kb) / 1024
        table = [
            ("score: peak resident memory", f"{peak_mb:.0f} MB", f"{PEAK_MEMORY_TARGET_MB} MB",
             peak_mb / PEAK_MEMORY_TARGET_MB),
            ("score: wall time", f"{scored.wall:.1f} s", "", None),
            ("score: CPU time (driver and candidates)", f"{scored.cpu:.1f} s", "", None),
            ("score: rows per second", f"{args.rows / scored.wall:,.0f}", "", None),
            ("score: executions run / rows", f"{executions['run']:,} / {rows_written:,}", "", None),
            ("score: share of executions saved", f"{executions['saved_share']:.2%}", "", None),
            (f"summarize {rows_written:,} rows: wall time", f"{timing['seconds']:.2f} s",
             f"{SUMMARY_SECONDS_TARGET:g} s", timing["seconds"] / SUMMARY_SECONDS_TARGET),
            ("summarize: CPU time (load-independent)", f"{timing['cpu']:.2f} s", f"{SUMMARY_SECONDS_TARGET:g} s",
             timing["cpu"] / SUMMARY_SECONDS_TARGET),
            ("summarize: peak resident memory", f"{summarized.peak_kb / 1024:.0f} MB", "", None),
        ]
        print(f"\nengine {args.engine}, sandbox {args.sandbox}, -j {args.jobs}, {os.cpu_count()} CPUs, load average "
              f"{os.getloadavg()[0]:.1f}; score's own VmHWM {scored.polled_peak_kb / 1024:.0f} MB, "
              f"wait4 peak {scored.peak_kb / 1024:.0f} MB")
        print(f"{'measure':42}  {'value':>18}  {'target':>8}  {'ratio':>6}")
        for name, value, target, ratio in table:
            print(f"{name:42}  {value:>18}  {target:>8}  {'' if ratio is None else f'{ratio:.2f}':>6}")
        assert summary["samples"] + summary["infra_errors"] == rows_written == args.rows
    finally:
        if args.workdir is None:
            shutil.rmtree(workdir, ignore_errors=True)


if __name__ == "__main__":
    main()
