"""``assay problems``: inspect and validate problem sets."""

from __future__ import annotations

import json
from pathlib import Path
from typing import List, Optional

import typer

from ..console import render, use_colour
from ..runtimes import available_runtimes
from .common import RuntimesDir, check_mark, fail, load_runtimes, load_set, open_sandbox

problems_app = typer.Typer(no_args_is_help=True, help="Inspect and validate problem sets.")


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
    """Validate a set: the schema of every file, and every reference solution against every case
    (program problems: also every slow program must time out and every wrong one must fail)."""
    from ..engine.checks import check_references, problem_warnings

    problem_set = load_set(set_name)
    every = load_runtimes(available_runtimes(runtimes_dir), runtimes_dir)
    if lang:
        runtimes = load_runtimes(lang, runtimes_dir)
    else:  # references live in the set or in the runtimes' own folders
        runtimes = {name: r for name, r in every.items() if reference_languages(problem_set, {name: r})}
    warnings = problem_warnings(problem_set, every)
    with open_sandbox(sandbox) as box:
        results = check_references(problem_set, runtimes, box, jobs)
    failures = [r for r in results if not r["ok"]]
    if as_json:
        typer.echo(json.dumps({"set": problem_set.name, "results": results, "failed": len(failures),
                               "warnings": warnings}, indent=2))
    else:
        colour = use_colour()
        for warning in warnings:
            typer.echo(f"warning: {warning}", err=True)
        for r in results:
            mark = check_mark(r["ok"], colour)
            what = "" if r["check"] == "reference" else f" {r['check']} (expects {r['expect']})"
            typer.echo(f"{mark} {r['problem']} [{r['language']}]{what}" + (f": {r['outcome']}: {r['detail']}"
                                                                            if r["outcome"] != "passed" else ""))
        typer.echo(f"{problem_set.name}: {len(problem_set)} problems, {len(results)} checks, "
                   f"{len(failures)} failed")
    if failures:
        raise typer.Exit(1)


@problems_app.command("calibrate")
def problems_calibrate(
    set_name: str = typer.Argument(..., help="Bundled set name or path to a folder of problems."),
    lang: Optional[List[str]] = typer.Option(None, "--lang", help="Only these runtimes (default: every "
                                              "installed runtime; those without a reference keep the default)."),
    runs: int = typer.Option(3, "--runs", min=1, help="Runs of every reference; the slowest case of all counts."),
    multiple: float = typer.Option(3.0, "--multiple", min=1.0, help="Limit = multiple x slowest run + floor."),
    floor: float = typer.Option(1.0, "--floor", min=0.0, help="Seconds added to every limit."),
    sandbox: str = typer.Option("bubblewrap", "--sandbox"),
    runtimes_dir: Optional[List[Path]] = RuntimesDir,
    dry_run: bool = typer.Option(False, "--dry-run", help="Measure and report; write nothing."),
    as_json: bool = typer.Option(False, "--json"),
) -> None:
    """Measure program problems' references and write per-language time limits to the set's
    calibrated_limits.yaml (multiple x slowest reference run + floor); slow programs must then time out."""
    from ..engine.calibrate import CalibrationSettings, calibrate, write_limits
    from ..problems import ProblemError

    problem_set = load_set(set_name)
    if problem_set.parts:
        fail("calibrate one set at a time: the limits are written into the set's own folder")
    if not any(p.kind == "program" for p in problem_set.problems.values()):
        fail(f"{problem_set.path}: no program problems to calibrate")
    names = lang or [name for name in available_runtimes(runtimes_dir)]
    runtimes = load_runtimes(names, runtimes_dir)
    if not lang:  # a runtime without its toolchain cannot be measured: its problems keep the default
        runtimes = {name: r for name, r in runtimes.items() if r.toolchain_version() is not None}
    settings = CalibrationSettings(multiple=multiple, floor_seconds=floor, runs=runs)
    colour = use_colour()

    def show(row) -> None:
        if as_json:
            return
        limit = f"{row.limit.wall_seconds:g}s wall, {row.limit.cpu_seconds:g}s CPU (slowest case " \
                f"{row.limit.slowest_wall_seconds:g}s)" if row.limit else "default"
        slow = f"; slow program: {row.slow}" + (f" ({row.slow_detail})" if row.slow != "timeout" else "") \
            if row.slow else ""
        note = "" if row.note in ("calibrated", "") or row.limit else f" [{row.note}]"
        typer.echo(f"{check_mark(row.ok, colour)} {row.problem} [{row.language}]: {limit}{slow}{note}")

    with open_sandbox(sandbox) as box:
        header, limits, rows = calibrate(problem_set, runtimes, box, settings, progress=show)
    failed = [row for row in rows if not row.ok]
    written = None
    if not dry_run:
        try:
            written = write_limits(problem_set, header, limits, ProblemError)
        except ProblemError as exc:
            fail(str(exc))
    if as_json:
        typer.echo(json.dumps({"set": problem_set.name, "calibration": header, "rows": [r.as_dict() for r in rows],
                               "written": str(written) if written else None, "failed": len(failed)}, indent=2))
    else:
        typer.echo(f"{problem_set.name}: {len(rows)} (problem, language) pairs, {len(failed)} failed"
                   + (f"; wrote {written}" if written else "; nothing written (--dry-run)"))
    if failed:
        raise typer.Exit(1)


def reference_languages(problem_set, runtimes: dict) -> set[str]:
    """The runtimes that hold a reference for at least one of the set's problems."""
    return {name for name, r in runtimes.items() if any(r.reference(p) is not None
                                                         for p in problem_set.problems.values())}


@problems_app.command("list")
def problems_list(
    set_name: str = typer.Argument("core"),
    runtimes_dir: Optional[List[Path]] = RuntimesDir,
    as_json: bool = typer.Option(False, "--json"),
) -> None:
    """List a set's problems with kind, difficulty, tags, case counts and the languages with references."""
    problem_set = load_set(set_name)
    runtimes = load_runtimes(available_runtimes(runtimes_dir), runtimes_dir)
    rows = [{"id": p.id, "kind": p.kind, "difficulty": p.difficulty, "tags": list(p.tags), "cases": len(p.cases),
             "languages": sorted(name for name, r in runtimes.items() if r.reference(p) is not None)}
            for p in problem_set.problems.values()]
    if as_json:
        typer.echo(json.dumps(rows, indent=2))
        return
    typer.echo(render(["problem", "kind", "difficulty", "cases", "tags", "references"],
                      [[r["id"], r["kind"], r["difficulty"], str(r["cases"]), ",".join(r["tags"]),
                        ",".join(r["languages"])] for r in rows], align="lllrll"))


