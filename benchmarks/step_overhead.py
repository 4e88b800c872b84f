"""Where an interpreted candidate's overhead goes, per step (issue 15's interpreted target):
one step through a warm bubblewrap sandbox against the same command started directly, how much
of the step the harness's side takes (the round trip over the supervisor's own wall time), and
what starting a step with its rlimits costs the supervisor's two ways (its shell launcher, with
vfork, and its fallback, a preexec function, which makes subprocess fork) against a plain
start. Medians of ``--repeat`` runs, measured side by side in one run.

    python benchmarks/step_overhead.py
    python benchmarks/step_overhead.py --languages python,ruby --repeat 60
"""

from __future__ import annotations

import argparse
import shutil
import statistics
import subprocess
import sys
import tempfile
import time
from pathlib import Path

ROOT = Path(__file__).resolve().parents[1]
sys.path.insert(0, str(ROOT))

from harness.runtimes import load_runtime  # noqa: E402
from harness.sandbox import make_sandbox  # noqa: E402
from harness.sandbox.local import candidate_env  # noqa: E402
from harness.sandbox.step_supervisor import ShellLauncher, step_preexec, step_rlimits  # noqa: E402

ONE_LINERS = {"python": "print(1)\n", "ruby": "puts 1\n", "perl": "print 1;\n", "lua": "print(1)\n",
              "php": "<?php echo 1;\n", "javascript": "console.log(1)\n"}


def median_ms(samples: list[float]) -> float:
    return 1000 * statistics.median(samples)


def steps(box, runtime, repeat: int) -> None:
    name = runtime.source_file
    text = ONE_LINERS[runtime.name]
    folder = tempfile.mkdtemp(prefix="assay-step-")
    Path(folder, name).write_text(text, encoding="utf-8")
    env = candidate_env(runtime.needs, {}, home=folder, tmp=folder)
    limits = runtime.step_limits("run")
    commands = ([list(runtime.compile.command)] if runtime.compile else []) + [list(runtime.run.command)]
    try:
        measure(box, runtime, commands, folder, env, limits, name, text, repeat)
    finally:
        shutil.rmtree(folder, ignore_errors=True)


def measure(box, runtime, commands, folder, env, limits, name, text, repeat) -> None:
    for command in commands:
        inside, walls, direct = [], [], []
        with box.workspace(runtime.needs) as space:
            space.write(name, text)
            for _ in range(3):
                space.run(command, limits, {})
            for _ in range(repeat):  # the two take turns, so load changes hit both alike
                started = time.perf_counter()
                result = space.run(command, limits, {})
                inside.append(time.perf_counter() - started)
                walls.append(result.wall_seconds)
                started = time.perf_counter()
                subprocess.run(command, cwd=folder, env=env, capture_output=True, start_new_session=True)
                direct.append(time.perf_counter() - started)
        print(f"{runtime.name:<11} {' '.join(command).split(chr(10))[0][:40]:<40} sandboxed {median_ms(inside):6.1f} ms  "
              f"direct {median_ms(direct):6.1f} ms  over direct {median_ms(inside) - median_ms(direct):+5.1f} ms  "
              f"harness side {median_ms(inside) - median_ms(walls):4.1f} ms")


def spawns(repeat: int) -> None:
    """The ways the step supervisor can start a step with its limits, and a plain start without
    any, side by side: the fallback (a ``preexec_fn``, so subprocess forks) against the shell
    launcher (vfork, then /bin/sh sets the limits and execs the program)."""
    folder = tempfile.mkdtemp(prefix="assay-spawn-")
    launcher = ShellLauncher.probe(folder)
    rlimits = step_rlimits({"cpu_seconds": 10, "max_file_mb": 16, "memory_mb": 512, "max_processes": 64}, False, False)
    env = {"PATH": "/usr/bin:/bin"}
    ways = {"preexec_fn (fallback)": (["/bin/true"], {"preexec_fn": step_preexec(rlimits)}),
            "plain, no limits": (["/bin/true"], {})}
    if launcher is not None:
        ways["shell launcher"] = (launcher.command(["/bin/true"], env, folder, rlimits)[0], {})
    timings: dict[str, list[float]] = {label: [] for label in ways}
    try:
        for _ in range(repeat):
            for label, (command, extra) in ways.items():
                started = time.perf_counter()
                subprocess.run(command, cwd=folder, env=env, capture_output=True, start_new_session=True,
                               close_fds=True, **extra)
                timings[label].append(time.perf_counter() - started)
    finally:
        shutil.rmtree(folder, ignore_errors=True)
    plain = median_ms(timings["plain, no limits"])
    print("starting /bin/true with a step's limits (median ms, ratio to a plain start):")
    for label in ways:
        print(f"  {label:<22} {median_ms(timings[label]):5.2f} ms  {median_ms(timings[label]) / plain:4.1f}x")


def main() -> int:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--languages", default=",".join(ONE_LINERS), help="comma-separated interpreted runtimes")
    parser.add_argument("--repeat", type=int, default=40, help="steps per command and configuration")
    args = parser.parse_args()
    box = make_sandbox("bubblewrap")
    box.check()
    try:
        for name in [n for n in args.languages.split(",") if n]:
            runtime = load_runtime(name)
            if name not in ONE_LINERS or runtime.toolchain_version() is None:
                print(f"skipping {name}: not an installed interpreted runtime", file=sys.stderr)
                continue
            steps(box, runtime, args.repeat)
    finally:
        box.close()
    spawns(args.repeat * 3)
    return 0


if __name__ == "__main__":
    sys.exit(main())
