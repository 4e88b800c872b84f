"""``assay runtimes``: list, scaffold, check and build (Docker images of) language runtimes."""

from __future__ import annotations

import json
import sys
from pathlib import Path
from typing import List, Optional

import typer

from ..console import paint, render, use_colour
from ..runtimes import RuntimeConfigError, available_runtimes, load_runtime
from ..vocabulary import LimitOverrides
from .common import RuntimesDir, check_mark, fail, load_runtimes, load_set, open_sandbox
from .sandbox import docker_client

# `assay runtimes check` runs short programs: a tight limit finds a hung reference quickly.
CHECK_LIMITS = LimitOverrides(wall_seconds=5, cpu_seconds=5)

runtimes_app = typer.Typer(no_args_is_help=True, help="Inspect, scaffold, check and build language runtimes.")


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
    from ..locations import bundled_dir
    from ..runtimes import write_skeleton

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
    from ..engine.checks import CONFORMANCE_SET, check_runtime

    problem_set = load_set(CONFORMANCE_SET)
    runtimes = load_runtimes(lang, runtimes_dir)
    report_rows = {}
    with open_sandbox(sandbox) as box:
        for name, runtime in runtimes.items():
            try:
                report_rows[name] = check_runtime(runtime, problem_set, box, jobs, CHECK_LIMITS)
            except ValueError as exc:
                fail(str(exc))
    failed = sum(not r["ok"] for rows in report_rows.values() for r in rows)
    if as_json:
        typer.echo(json.dumps({"results": report_rows, "failed": failed}, indent=2))
    else:
        colour = use_colour()
        for name, rows in report_rows.items():
            for r in rows:
                mark = check_mark(r["ok"], colour)
                line = f"{mark} {name}: {r['check']} -> {r['outcome']}"
                if not r["ok"]:
                    line += f" (expected {r['expect']}): {r['detail']}"
                typer.echo(line)
            typer.echo(f"{name}: {sum(r['ok'] for r in rows)}/{len(rows)} checks passed")
    if failed:
        raise typer.Exit(1)


@runtimes_app.command("build")
def runtimes_build(
    lang: Optional[List[str]] = typer.Argument(None, help="Runtimes to build (default: every runtime with a "
                                                         "Dockerfile)."),
    base: Optional[str] = typer.Option(None, "--base", help="Base image passed as BASE to each Dockerfile "
                                       "(default debian:bookworm-slim, pulled when missing)."),
    offline_base: bool = typer.Option(False, "--offline-base", help="Build on a local Debian made with "
                                      "debootstrap (assay-base:bookworm, reused when present); needs no registry."),
    rebuild: bool = typer.Option(False, "--rebuild", help="Build even when the image for the runtime's "
                                 "current files exists."),
    runtimes_dir: Optional[List[Path]] = RuntimesDir,
    as_json: bool = typer.Option(False, "--json", help="Print the built images as JSON."),
) -> None:
    """Build the Docker sandbox's image of each runtime, tagged with the runtime's content hash."""
    from ..sandbox.images import (OFFLINE_BASE, ImageError, build_runtime_image, dockerfile_path, ensure_base,
                                 find_image, image_tag)

    if offline_base and base:
        fail(f"--base and --offline-base exclude each other: the offline base is always {OFFLINE_BASE}")
    names = list(lang or [])
    if not names:
        for name in available_runtimes(runtimes_dir):
            try:
                if dockerfile_path(load_runtime(name, runtimes_dir).needs).is_file():
                    names.append(name)
            except RuntimeConfigError:
                continue
    try:
        runtimes = [load_runtime(name, runtimes_dir) for name in names]
    except RuntimeConfigError as exc:
        fail(str(exc))
    for runtime in runtimes:
        if not dockerfile_path(runtime.needs).is_file():
            fail(f"{dockerfile_path(runtime.needs)}: missing; the Docker sandbox needs one per runtime "
                  "(ARG BASE, FROM ${BASE}, install the toolchain, create user runner with uid 10001)")
    if not runtimes:
        fail("no runtime has a Dockerfile")
    client = docker_client()
    log = (lambda message: None) if as_json else (lambda message: typer.echo(message, err=True))
    base_image = None
    if rebuild or any(find_image(client, image_tag(r.needs)) is None for r in runtimes):
        try:
            base_image = ensure_base(client, base, offline_base, log)
        except ImageError as exc:
            fail(str(exc), code=1)
    built, failed = [], {}
    for runtime in runtimes:  # one at a time: a build takes every core it can get
        try:
            image = build_runtime_image(client, runtime.needs, base_image, log, rebuild=rebuild)
        except ImageError as exc:
            failed[runtime.name] = str(exc)
            log(paint("error: ", "31", use_colour(sys.stderr)) + str(exc))
            continue
        built.append(image)
        if not as_json:
            state = f"built in {image.seconds:.0f}s" if image.built else "up to date"
            typer.echo(f"{runtime.name}: {image.tag} ({image.id[:19]}) {state}", err=True)
    if as_json:
        typer.echo(json.dumps({"built": [vars(b) for b in built], "failed": failed}, indent=2))
    if failed:
        fail(f"{len(failed)} image(s) failed to build: {', '.join(failed)}", code=1)
