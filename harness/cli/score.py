"""The main job: ``assay prompts`` (prompts out), ``assay score`` (dumps in, verdicts and
pass@k out) and ``assay demo`` (the same on a fictional lab's two checkpoints)."""

from __future__ import annotations

import json
from pathlib import Path
from typing import List, Optional

import typer

from ..engine.completions import MODES
from ..extraction import EXTRACTION_POLICIES
from ..metrics import parse_ks
from ..render.summary import pass_table
from ..console import use_colour
from ..runtimes import available_runtimes
from ..sandbox import backends
from ..store import StoreBusy, StoreMismatch, StoreWriteError
from .common import RuntimesDir, fail, limit_overrides, load_runtimes, load_set, open_sandbox


def register(app: typer.Typer) -> None:
    app.command()(prompts)
    app.command()(score)
    app.command()(demo)


def prompts(
    set_name: str = typer.Option("core", "--set", help="Bundled set name or path to a folder of problems."),
    lang: List[str] = typer.Option(..., "--lang", help="Runtime(s) to write prompts for; repeat for several."),
    output: Path = typer.Option(..., "-o", "--output", help="JSONL file to write (one row per problem and language)."),
    runtimes_dir: Optional[List[Path]] = RuntimesDir,
) -> None:
    """Write the prompts a generator job completes: one JSONL row per (problem, language)."""
    problem_set = load_set(set_name)
    runtimes = load_runtimes(lang, runtimes_dir)
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
                    "kind": problem.kind,  # function: complete the function; program: a whole stdin/stdout program
                    "prompt": runtime.render_prompt(problem),
                    "stop_sequences": list(runtime.program.stop_sequences if problem.kind == "program"
                                           else runtime.stop_sequences),
                    "whole_function_preamble": runtime.render_preamble(problem),
                }
                handle.write(json.dumps(row, ensure_ascii=False) + "\n")
                count += 1
    for reason in refused:
        typer.echo(f"skipped: {reason}", err=True)
    typer.echo(f"wrote {count} prompts ({len(problem_set)} problems x {len(runtimes)} language(s)"
               + (f", {len(refused)} skipped" if refused else "") + f") to {output}", err=True)


def score(
    dumps: List[Path] = typer.Argument(..., help="Completion dump(s), JSONL: problem, language, completion[, sample]."),
    set_name: str = typer.Option("core", "--set", help="Bundled set name or path to a folder of problems; "
                                 "several, comma-separated, score as one (core,dockside)."),
    out: Optional[Path] = typer.Option(None, "--out", help="Output folder (default: results/<first dump's name>)."),
    jobs: int = typer.Option(2, "--jobs", "-j", min=1, help="Candidates run at once."),
    timeout: Optional[float] = typer.Option(None, "--timeout", min=0.1, help="Run-step time limit in seconds "
                                            "(wall and CPU), overriding the runtimes' defaults."),
    memory: Optional[int] = typer.Option(None, "--memory", min=16, help="Memory limit in MB per candidate."),
    k: str = typer.Option("1,10,100", "--k", help="Comma-separated k values for pass@k."),
    mode: str = typer.Option("continue", "--mode", help="continue: program = prompt + completion, ending where "
                             "the function ends; whole: the completion holds the whole function (chat answers)."),
    extract_policy: str = typer.Option("syntax", "--extract", help="How the program is taken from the text: "
                                       "syntax (the runtime's grammar picks the function, its helpers and imports) "
                                       "or strict (first fenced block; stop sequences)."),
    program_mode: Optional[str] = typer.Option(None, "--program-mode", help="--mode for whole-program problems "
                                               "(kind: program) when it differs; continue: prompt + completion; "
                                               "whole: the completion is the program. Default: --mode."),
    all_cases: bool = typer.Option(False, "--all-cases", help="Whole-program problems: run every case even after "
                                   "one fails (default: stop at the first failing case)."),
    sandbox: str = typer.Option("bubblewrap", "--sandbox", help=f"Sandbox backend: {', '.join(backends())}."),
    require_cgroups: bool = typer.Option(False, "--require-cgroups", help="Refuse to start unless this host's "
                                         "sandboxes get real cgroup memory and process limits (not the rlimit "
                                         "fallback); see assay sandbox doctor."),
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
    from ..engine.engines import EngineError, EngineOptions, engine_factory
    from ..engine.scoring import ScoreOptions
    from ..engine.scoring import score as run_score

    from ..engine.programs import ProgramOptions

    if mode not in MODES:
        fail(f"--mode must be one of: {', '.join(MODES)}")
    if program_mode is not None and program_mode not in MODES:
        fail(f"--program-mode must be one of: {', '.join(MODES)}")
    if extract_policy not in EXTRACTION_POLICIES:
        fail(f"--extract must be one of: {', '.join(EXTRACTION_POLICIES)}")
    try:
        where = engine_factory(engine, EngineOptions(jobs=jobs, address=address))
    except EngineError as exc:
        fail(str(exc))
    for dump in dumps:
        if not dump.is_file():
            fail(f"{dump}: no such file")
    try:
        ks = parse_ks(k)
    except ValueError as exc:
        fail(str(exc))
    problem_set = load_set(set_name)
    runtimes = load_runtimes(_languages_in_use(dumps, extra=runtimes_dir), runtimes_dir)
    out = out or Path("results") / dumps[0].stem
    options = ScoreOptions(dumps=list(dumps), out=out, jobs=jobs, mode=mode, ks=ks,
                           limit_overrides=limit_overrides(timeout, memory), progress=not quiet, label=label,
                           repeat=repeat, cache_dir=cache, extract=extract_policy,
                           programs=ProgramOptions(mode=program_mode, all_cases=all_cases))
    with open_sandbox(sandbox) as box:
        if require_cgroups:
            from ..sandbox.hostlimits import refusal

            refused_because = refusal(box)
            if refused_because:
                fail(f"--require-cgroups: {refused_because}")
        try:
            outcome = run_score(options, problem_set, runtimes, box, engine_factory=where)
        except (StoreBusy, StoreMismatch, EngineError) as exc:
            fail(str(exc))
        except StoreWriteError as exc:
            fail(str(exc), code=3)
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


def demo(
    out: Path = typer.Option(Path("results/demo"), "--out", help="Folder for the demo's dumps and results."),
    jobs: int = typer.Option(2, "--jobs", "-j", min=1),
    sandbox: str = typer.Option("bubblewrap", "--sandbox", help=f"Sandbox backend: {', '.join(backends())}."),
    lang: Optional[List[str]] = typer.Option(None, "--lang", help="Languages to score, repeatable (default: "
                                              "python, javascript, cpp, java; any installed runtime works)."),
    as_json: bool = typer.Option(False, "--json", help="Print both summaries as JSON."),
) -> None:
    """Synthesize two checkpoints' dumps for a fictional lab, score both, print both tables."""
    from ..engine.demo import demo_runtimes, run_demo

    unknown = [name for name in lang or [] if name not in available_runtimes()]
    if unknown:
        fail(f"unknown runtime(s) {', '.join(unknown)}; known: {', '.join(available_runtimes())}")
    runtimes, skipped = demo_runtimes(lang)
    for note in skipped:
        typer.echo(f"skipped {note}", err=True)
    if not runtimes:
        fail("no language to score: install a toolchain (bash .ci/install installs all of them)")
    with open_sandbox(sandbox) as box:
        results = run_demo(out, box, jobs=jobs, progress=not as_json, languages=list(runtimes))
    if as_json:
        typer.echo(json.dumps({label: r.summary for label, r in results.items()}, indent=2))
        return
    for label, result in results.items():
        typer.echo(pass_table(result.summary, use_colour(), title=label))
        typer.echo("")


