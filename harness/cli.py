"""The ``assay`` command line. Human-readable by default, ``--json`` for scripts."""

from __future__ import annotations

import json
import sys
from pathlib import Path
from typing import List, Optional

import typer

from . import __version__
from .completions import MODES
from .metrics import parse_ks
from .problems import ProblemError, ProblemSet, load_problem_set
from .report import pass_table
from .runtimes import RuntimeConfigError, Runtime, available_runtimes, load_runtime
from .sandbox import BACKENDS, SandboxUnavailable, make_sandbox
from .store import StoreBusy, StoreMismatch, StoreWriteError
from .tables import paint, render, use_colour

app = typer.Typer(add_completion=False, no_args_is_help=True, help=(
    "Assay scores model-written code: prompts out, completion dumps in, every candidate run in a "
    "sandbox against hidden tests, pass@k out. It runs untrusted code: see the README's safety notes."
))
problems_app = typer.Typer(no_args_is_help=True, help="Inspect and validate problem sets.")
runtimes_app = typer.Typer(no_args_is_help=True, help="Inspect language runtimes.")
app.add_typer(problems_app, name="problems")
app.add_typer(runtimes_app, name="runtimes")

RuntimesDir = typer.Option(None, "--runtimes-dir", help="Extra folder of runtimes (searched first); "
                           "ASSAY_RUNTIMES_PATH works too.")


def fail(message: str, code: int = 2) -> None:
    typer.echo(paint("error: ", "31", use_colour(sys.stderr)) + message, err=True)
    raise typer.Exit(code)


def _load_set(name: str) -> ProblemSet:
    try:
        return load_problem_set(name)
    except ProblemError as exc:
        fail(str(exc))


def _load_runtimes(names: list[str], extra: Optional[List[Path]]) -> dict[str, Runtime]:
    try:
        return {name: load_runtime(name, extra) for name in names}
    except RuntimeConfigError as exc:
        fail(str(exc))


def _make_sandbox(name: str, work_root: Optional[Path] = None):
    try:
        sandbox = make_sandbox(name, work_root)
        sandbox.check()
    except SandboxUnavailable as exc:
        fail(str(exc))
    if name == "none":
        typer.echo(paint("warning: --sandbox none runs candidates with no isolation at all; "
                         "use it only with code you trust.", "33", use_colour(sys.stderr)), err=True)
    return sandbox


def _check_mark(ok: bool, colour: bool) -> str:
    return paint("ok  ", "32", colour) if ok else paint("FAIL", "31", colour)


def _limits(timeout: Optional[float], memory: Optional[int]) -> dict:
    overrides = {}
    if timeout is not None:
        overrides.update(wall_seconds=timeout, cpu_seconds=timeout)
    if memory is not None:
        overrides["memory_mb"] = memory
    return overrides


@app.command()
def version() -> None:
    """Print the harness version."""
    typer.echo(__version__)


@app.command()
def prompts(
    set_name: str = typer.Option("core", "--set", help="Bundled set name or path to a folder of problems."),
    lang: List[str] = typer.Option(..., "--lang", help="Runtime(s) to write prompts for; repeat for several."),
    output: Path = typer.Option(..., "-o", "--output", help="JSONL file to write (one row per problem and language)."),
    runtimes_dir: Optional[List[Path]] = RuntimesDir,
) -> None:
    """Write the prompts a generator job completes: one JSONL row per (problem, language)."""
    problem_set = _load_set(set_name)
    runtimes = _load_runtimes(lang, runtimes_dir)
    output.parent.mkdir(parents=True, exist_ok=True)
    count = 0
    refused = []
    with open(output, "w", encoding="utf-8") as handle:
        for runtime in runtimes.values():
            for problem in problem_set.problems.values():
                reason = runtime.refusal(problem)
                if reason:
                    refused.append(reason)
                    continue
                row = {
                    "problem": problem.id,
                    "language": runtime.name,
                    "prompt": runtime.render_prompt(problem),
                    "stop_sequences": list(runtime.stop_sequences),
                    "whole_function_preamble": runtime.render_preamble(problem),
                }
                handle.write(json.dumps(row, ensure_ascii=False) + "\n")
                count += 1
    for reason in refused:
        typer.echo(f"skipped: {reason}", err=True)
    typer.echo(f"wrote {count} prompts ({len(problem_set)} problems x {len(runtimes)} language(s)"
               + (f", {len(refused)} skipped" if refused else "") + f") to {output}", err=True)


@app.command()
def score(
    dumps: List[Path] = typer.Argument(..., help="Completion dump(s), JSONL: problem, language, completion[, sample]."),
    set_name: str = typer.Option("core", "--set", help="Bundled set name or path to a folder of problems."),
    out: Optional[Path] = typer.Option(None, "--out", help="Output folder (default: results/<first dump's name>)."),
    jobs: int = typer.Option(2, "--jobs", "-j", min=1, help="Candidates run at once."),
    timeout: Optional[float] = typer.Option(None, "--timeout", min=0.1, help="Run-step time limit in seconds "
                                            "(wall and CPU), overriding the runtimes' defaults."),
    memory: Optional[int] = typer.Option(None, "--memory", min=16, help="Memory limit in MB per candidate."),
    k: str = typer.Option("1,10,100", "--k", help="Comma-separated k values for pass@k."),
    mode: str = typer.Option("continue", "--mode", help="continue: program = prompt + completion cut at stop "
                             "sequences; whole: the completion is the whole function (fences stripped)."),
    sandbox: str = typer.Option("bubblewrap", "--sandbox", help=f"Sandbox backend: {', '.join(BACKENDS)}."),
    label: Optional[str] = typer.Option(None, "--label", help="Checkpoint label recorded in the manifest."),
    repeat: int = typer.Option(1, "--repeat", min=1, help="Run each candidate N times; disagreeing "
                               "verdicts mark it flaky (the first run's verdict is recorded)."),
    cache: Optional[Path] = typer.Option(None, "--cache", help="Folder of verdicts shared across runs and "
                                         "checkpoints: identical programs are executed once."),
    engine: str = typer.Option("local", "--engine", help="Where candidates run: local (a pool of --jobs "
                               "workers) or ray (a Ray cluster's nodes; see docs/scale.md)."),
    address: Optional[str] = typer.Option(None, "--address", help="Ray cluster address (host:port) for "
                                          "--engine ray; default: RAY_ADDRESS, else the cluster last started here, "
                                          "else a new Ray instance here."),
    runtimes_dir: Optional[List[Path]] = RuntimesDir,
    as_json: bool = typer.Option(False, "--json", help="Print the summary as JSON."),
    quiet: bool = typer.Option(False, "--quiet", "-q", help="No progress line."),
) -> None:
    """Run every completion against the hidden tests; resumable (rerun to finish a stopped run)."""
    from .scoring import ScoreOptions
    from .scoring import score as run_score
    from .engines_ray import RayEngineError, ray_engine_factory

    if mode not in MODES:
        fail(f"--mode must be one of: {', '.join(MODES)}")
    if engine not in ("local", "ray"):
        fail(f"--engine must be one of: local, ray (got {engine!r})")
    if address and engine != "ray":
        fail("--address is for --engine ray")
    engine_factory = None
    if engine == "ray":
        try:
            engine_factory = ray_engine_factory(address)
        except RayEngineError as exc:
            fail(str(exc))
    for dump in dumps:
        if not dump.is_file():
            fail(f"{dump}: no such file")
    try:
        ks = parse_ks(k)
    except ValueError as exc:
        fail(str(exc))
    problem_set = _load_set(set_name)
    runtimes = _load_runtimes(_languages_in_use(dumps, extra=runtimes_dir), runtimes_dir)
    box = _make_sandbox(sandbox)
    out = out or Path("results") / dumps[0].stem
    options = ScoreOptions(dumps=list(dumps), out=out, jobs=jobs, mode=mode, ks=ks,
                           limit_overrides=_limits(timeout, memory), progress=not quiet, label=label,
                           repeat=repeat, cache_dir=cache)
    try:
        outcome = run_score(options, problem_set, runtimes, box, engine_factory=engine_factory)
    except (StoreBusy, StoreMismatch, RayEngineError) as exc:
        fail(str(exc))
    except StoreWriteError as exc:
        fail(str(exc), code=3)
    finally:
        box.close()
    if as_json:
        typer.echo(json.dumps(outcome.summary, indent=2))
    else:
        typer.echo(pass_table(outcome.summary, use_colour(), title=f"{label or out.name}: {out}"))
    if outcome.interrupted:
        typer.echo(f"interrupted: {outcome.executed} candidate(s) judged this time. Run the same command "
                   "again to resume where it stopped.", err=True)
        raise typer.Exit(130)
    typer.echo(f"judged {outcome.executed}, shared {outcome.shared}, resumed {outcome.resumed}, "
               f"rejected {outcome.rejected}; results in {out}", err=True)


def _languages_in_use(dumps: list[Path], extra) -> list[str]:
    """Runtimes to load: every known runtime whose name the dumps mention (cheap substring
    scan, exact per-row checks happen while scoring)."""
    known = available_runtimes(extra)
    wanted: set[str] = set()
    for dump in dumps:
        with open(dump, "rb") as handle:
            for raw in handle:
                try:
                    language = json.loads(raw).get("language")
                except (ValueError, AttributeError, RecursionError):
                    continue
                if language in known:
                    wanted.add(language)
    return sorted(wanted)


@app.command()
def demo(
    out: Path = typer.Option(Path("results/demo"), "--out", help="Folder for the demo's dumps and results."),
    jobs: int = typer.Option(2, "--jobs", "-j", min=1),
    sandbox: str = typer.Option("bubblewrap", "--sandbox", help=f"Sandbox backend: {', '.join(BACKENDS)}."),
    lang: Optional[List[str]] = typer.Option(None, "--lang", help="Languages to score, repeatable (default: "
                                              "python, javascript, cpp, java; any installed runtime works)."),
    as_json: bool = typer.Option(False, "--json", help="Print both summaries as JSON."),
) -> None:
    """Synthesize two checkpoints' dumps for a fictional lab, score both, print both tables."""
    from .demo import demo_runtimes, run_demo

    unknown = [name for name in lang or [] if name not in available_runtimes()]
    if unknown:
        fail(f"unknown runtime(s) {', '.join(unknown)}; known: {', '.join(available_runtimes())}")
    runtimes, skipped = demo_runtimes(lang)
    for note in skipped:
        typer.echo(f"skipped {note}", err=True)
    if not runtimes:
        fail("no language to score: install a toolchain (bash .ci/install installs all of them)")
    box = _make_sandbox(sandbox)
    try:
        results = run_demo(out, box, jobs=jobs, progress=not as_json, languages=list(runtimes))
    finally:
        box.close()
    if as_json:
        typer.echo(json.dumps({label: r.summary for label, r in results.items()}, indent=2))
        return
    for label, result in results.items():
        typer.echo(pass_table(result.summary, use_colour(), title=label))
        typer.echo("")


@problems_app.command("check")
def problems_check(
    set_name: str = typer.Argument("core", help="Bundled set name or path to a folder of problems."),
    lang: Optional[List[str]] = typer.Option(None, "--lang", help="Only these runtimes (default: every "
                                              "runtime that has references in the set)."),
    jobs: int = typer.Option(2, "--jobs", "-j", min=1),
    sandbox: str = typer.Option("bubblewrap", "--sandbox"),
    runtimes_dir: Optional[List[Path]] = RuntimesDir,
    as_json: bool = typer.Option(False, "--json"),
) -> None:
    """Validate a set: the schema of every file, and every reference solution against every case."""
    from .checks import check_references, problem_warnings

    problem_set = _load_set(set_name)
    languages = lang or sorted({l for p in problem_set.problems.values() for l in p.reference}
                               & set(available_runtimes(runtimes_dir)))
    runtimes = _load_runtimes(languages, runtimes_dir)
    warnings = problem_warnings(problem_set, _load_runtimes(available_runtimes(runtimes_dir), runtimes_dir))
    box = _make_sandbox(sandbox)
    try:
        results = check_references(problem_set, runtimes, box, jobs)
    finally:
        box.close()
    failures = [r for r in results if r["outcome"] not in ("passed", "unsupported")]
    if as_json:
        typer.echo(json.dumps({"set": problem_set.name, "results": results, "failed": len(failures),
                               "warnings": warnings}, indent=2))
    else:
        colour = use_colour()
        for warning in warnings:
            typer.echo(f"warning: {warning}", err=True)
        for r in results:
            mark = _check_mark(r["outcome"] in ("passed", "unsupported"), colour)
            typer.echo(f"{mark} {r['problem']} [{r['language']}]" + (f": {r['outcome']}: {r['detail']}"
                                                                     if r["outcome"] != "passed" else ""))
        typer.echo(f"{problem_set.name}: {len(problem_set)} problems, {len(results)} reference checks, "
                   f"{len(failures)} failed")
    if failures:
        raise typer.Exit(1)


@problems_app.command("list")
def problems_list(
    set_name: str = typer.Argument("core"),
    as_json: bool = typer.Option(False, "--json"),
) -> None:
    """List a set's problems with difficulty, tags and case counts."""
    problem_set = _load_set(set_name)
    rows = [{"id": p.id, "difficulty": p.difficulty, "tags": list(p.tags), "cases": len(p.cases),
             "languages": sorted(p.reference)} for p in problem_set.problems.values()]
    if as_json:
        typer.echo(json.dumps(rows, indent=2))
        return
    typer.echo(render(["problem", "difficulty", "cases", "tags", "references"],
                      [[r["id"], r["difficulty"], str(r["cases"]), ",".join(r["tags"]), ",".join(r["languages"])]
                       for r in rows], align="llrll"))


@runtimes_app.command("list")
def runtimes_list(
    runtimes_dir: Optional[List[Path]] = RuntimesDir,
    as_json: bool = typer.Option(False, "--json"),
) -> None:
    """Show each runtime, where it lives, and whether its toolchain is installed on this host."""
    rows = []
    for name in available_runtimes(runtimes_dir):
        try:
            runtime = load_runtime(name, runtimes_dir)
        except RuntimeConfigError as exc:
            rows.append({"name": name, "error": str(exc)})
            continue
        rows.append({"name": name, "display_name": runtime.display_name, "path": str(runtime.path),
                     "compiled": runtime.compile is not None, "toolchain": runtime.toolchain_version()})
    if as_json:
        typer.echo(json.dumps(rows, indent=2))
        return
    colour = use_colour()
    table = []
    for r in rows:
        if "error" in r:
            table.append([r["name"], paint("invalid", "31", colour), r["error"], ""])
        else:
            found = r["toolchain"] or paint("missing", "33", colour)
            table.append([r["name"], r["display_name"], found, r["path"]])
    typer.echo(render(["runtime", "language", "toolchain", "folder"], table, align="llll"))


@runtimes_app.command("new")
def runtimes_new(
    name: str = typer.Argument(..., help="The new runtime's name (the language), e.g. kotlin."),
    into: Optional[Path] = typer.Option(None, "--into", help="Parent folder (default: the bundled runtimes/). "
                                        "Use a folder of your own with --runtimes-dir or ASSAY_RUNTIMES_PATH."),
) -> None:
    """Write a commented skeleton runtime folder to fill in."""
    from .locations import bundled_dir
    from .runtimes import write_skeleton

    target = (into or bundled_dir("runtimes")) / name
    try:
        write_skeleton(name, target)
    except (ValueError, FileExistsError) as exc:
        fail(str(exc))
    typer.echo(f"wrote {target}: fill in runtime.yaml and the templates (see docs/runtime-format.md), "
               f"then run 'assay runtimes check {name}'")


@runtimes_app.command("check")
def runtimes_check(
    lang: List[str] = typer.Argument(..., help="Runtime name(s) to check."),
    jobs: int = typer.Option(2, "--jobs", "-j", min=1),
    sandbox: str = typer.Option("bubblewrap", "--sandbox"),
    runtimes_dir: Optional[List[Path]] = RuntimesDir,
    as_json: bool = typer.Option(False, "--json"),
) -> None:
    """Run the conformance set's references and the runtime's deliberately wrong candidates."""
    from .checks import CONFORMANCE_SET, check_runtime

    problem_set = _load_set(CONFORMANCE_SET)
    runtimes = _load_runtimes(lang, runtimes_dir)
    box = _make_sandbox(sandbox)
    report_rows = {}
    try:
        for name, runtime in runtimes.items():
            try:
                report_rows[name] = check_runtime(runtime, problem_set, box, jobs, {"wall_seconds": 5, "cpu_seconds": 5})
            except ValueError as exc:
                fail(str(exc))
    finally:
        box.close()
    failed = sum(not r["ok"] for rows in report_rows.values() for r in rows)
    if as_json:
        typer.echo(json.dumps({"results": report_rows, "failed": failed}, indent=2))
    else:
        colour = use_colour()
        for name, rows in report_rows.items():
            for r in rows:
                mark = _check_mark(r["ok"], colour)
                line = f"{mark} {name}: {r['check']} -> {r['outcome']}"
                if not r["ok"]:
                    line += f" (expected {r['expect']}): {r['detail']}"
                typer.echo(line)
            typer.echo(f"{name}: {sum(r['ok'] for r in rows)}/{len(rows)} checks passed")
    if failed:
        raise typer.Exit(1)


from .cli_analysis import register  # noqa: E402  (analysis commands: report, compare, trend)

register(app)

from .cli_sandbox import register as register_sandbox  # noqa: E402  (sandbox clean, runtimes build)

register_sandbox(app)


def main() -> None:
    app()
