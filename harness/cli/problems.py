"""``assay problems``: inspect and validate problem sets."""

from __future__ import annotations

import json
from pathlib import Path
from typing import List, Optional

import typer

from ..console import render, use_colour
from ..runtimes import available_runtimes
from .common import RuntimesDir, check_mark, load_runtimes, load_set, open_sandbox

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
    """Validate a set: the schema of every file, and every reference solution against every case."""
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
    failures = [r for r in results if r["outcome"] not in ("passed", "unsupported")]
    if as_json:
        typer.echo(json.dumps({"set": problem_set.name, "results": results, "failed": len(failures),
                               "warnings": warnings}, indent=2))
    else:
        colour = use_colour()
        for warning in warnings:
            typer.echo(f"warning: {warning}", err=True)
        for r in results:
            mark = check_mark(r["outcome"] in ("passed", "unsupported"), colour)
            typer.echo(f"{mark} {r['problem']} [{r['language']}]" + (f": {r['outcome']}: {r['detail']}"
                                                                     if r["outcome"] != "passed" else ""))
        typer.echo(f"{problem_set.name}: {len(problem_set)} problems, {len(results)} reference checks, "
                   f"{len(failures)} failed")
    if failures:
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
    """List a set's problems with difficulty, tags, case counts and the languages with references."""
    problem_set = load_set(set_name)
    runtimes = load_runtimes(available_runtimes(runtimes_dir), runtimes_dir)
    rows = [{"id": p.id, "difficulty": p.difficulty, "tags": list(p.tags), "cases": len(p.cases),
             "languages": sorted(name for name, r in runtimes.items() if r.reference(p) is not None)}
            for p in problem_set.problems.values()]
    if as_json:
        typer.echo(json.dumps(rows, indent=2))
        return
    typer.echo(render(["problem", "difficulty", "cases", "tags", "references"],
                      [[r["id"], r["difficulty"], str(r["cases"]), ",".join(r["tags"]), ",".join(r["languages"])]
                       for r in rows], align="llrll"))


