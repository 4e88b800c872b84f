"""Commands for the Docker sandbox's resources: ``assay runtimes build`` makes the images,
``assay sandbox clean`` removes containers left behind."""

from __future__ import annotations

import json
import sys
from pathlib import Path
from typing import List, Optional

import typer

from .runtimes import RuntimeConfigError, available_runtimes, load_runtime
from .sandbox.base import SandboxUnavailable
from .tables import paint, render, use_colour

sandbox_app = typer.Typer(no_args_is_help=True, help="Manage sandbox resources (Docker containers).")


def _fail(message: str, code: int = 2) -> None:
    typer.echo(paint("error: ", "31", use_colour(sys.stderr)) + message, err=True)
    raise typer.Exit(code)


def _client():
    from .sandbox.docker import connect

    try:
        return connect()
    except SandboxUnavailable as exc:
        _fail(str(exc))


def runtimes_build(
    lang: Optional[List[str]] = typer.Argument(None, help="Runtimes to build (default: every runtime with a "
                                                         "Dockerfile)."),
    base: Optional[str] = typer.Option(None, "--base", help="Base image passed as BASE to each Dockerfile "
                                       "(default debian:bookworm-slim, pulled when missing)."),
    offline_base: bool = typer.Option(False, "--offline-base", help="Build on a local Debian made with "
                                      "debootstrap (assay-base:bookworm, reused when present); needs no registry."),
    rebuild: bool = typer.Option(False, "--rebuild", help="Build even when the image for the runtime's "
                                 "current files exists."),
    runtimes_dir: Optional[List[Path]] = typer.Option(None, "--runtimes-dir", help="Extra folder of runtimes."),
    as_json: bool = typer.Option(False, "--json", help="Print the built images as JSON."),
) -> None:
    """Build the Docker sandbox's image of each runtime, tagged with the runtime's content hash."""
    from .sandbox.images import (OFFLINE_BASE, ImageError, build_runtime_image, dockerfile_path, ensure_base,
                                 find_image, image_tag)

    if offline_base and base:
        _fail(f"--base and --offline-base exclude each other: the offline base is always {OFFLINE_BASE}")
    names = list(lang or [])
    if not names:
        for name in available_runtimes(runtimes_dir):
            try:
                if dockerfile_path(load_runtime(name, runtimes_dir)).is_file():
                    names.append(name)
            except RuntimeConfigError:
                continue
    try:
        runtimes = [load_runtime(name, runtimes_dir) for name in names]
    except RuntimeConfigError as exc:
        _fail(str(exc))
    for runtime in runtimes:
        if not dockerfile_path(runtime).is_file():
            _fail(f"{dockerfile_path(runtime)}: missing; the Docker sandbox needs one per runtime "
                  "(ARG BASE, FROM ${BASE}, install the toolchain, create user runner with uid 10001)")
    if not runtimes:
        _fail("no runtime has a Dockerfile")
    client = _client()
    log = (lambda message: None) if as_json else (lambda message: typer.echo(message, err=True))
    base_image = None
    if rebuild or any(find_image(client, image_tag(r)) is None for r in runtimes):
        try:
            base_image = ensure_base(client, base, offline_base, log)
        except ImageError as exc:
            _fail(str(exc), code=1)
    built, failed = [], {}
    for runtime in runtimes:  # one at a time: a build takes every core it can get
        try:
            image = build_runtime_image(client, runtime, base_image, log, rebuild=rebuild)
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
        _fail(f"{len(failed)} image(s) failed to build: {', '.join(failed)}", code=1)


@sandbox_app.command("clean")
def sandbox_clean(
    orphans: bool = typer.Option(False, "--orphans", help="Only containers whose owning Assay process is gone "
                                 "(what every Docker run does at start)."),
    run: Optional[str] = typer.Option(None, "--run", help="Only the containers of this run (its assay.run label)."),
    as_json: bool = typer.Option(False, "--json", help="Print the removed container ids as JSON."),
) -> None:
    """Remove Assay's sandbox containers: by default all of them, runs still going included."""
    from .sandbox.docker import LABEL_OWNER, LABEL_RUN, remove_containers

    client = _client()
    try:
        listed = {c["Id"]: c.get("Labels") or {}
                  for c in client.api.containers(all=True, filters={"label": LABEL_RUN})}
        removed = remove_containers(client, orphans_only=orphans, run_id=run)
    except Exception as exc:  # the daemon failed midway: say so, without a traceback
        _fail(f"the Docker daemon failed while removing containers: {exc}", code=1)
    if as_json:
        typer.echo(json.dumps({"removed": removed}, indent=2))
        return
    if removed:
        typer.echo(render(["container", "run", "owner pid"],
                          [[cid[:12], listed.get(cid, {}).get(LABEL_RUN, "")[:12],
                            listed.get(cid, {}).get(LABEL_OWNER, "")] for cid in removed], align="lll"))
    typer.echo(f"removed {len(removed)} container(s)", err=True)


def register(app: typer.Typer) -> None:
    """Add ``sandbox clean`` and ``runtimes build`` to the main command line."""
    app.add_typer(sandbox_app, name="sandbox")
    for group in app.registered_groups:
        if group.name == "runtimes":
            group.typer_instance.command("build")(runtimes_build)
            return
    runtimes_app = typer.Typer(no_args_is_help=True, help="Inspect language runtimes.")
    runtimes_app.command("build")(runtimes_build)
    app.add_typer(runtimes_app, name="runtimes")
