"""``assay sandbox``: the Docker sandbox's resources (``clean`` removes containers left behind).
Images are built by ``assay runtimes build``."""

from __future__ import annotations

import json
from typing import Optional

import typer

from ..console import render
from ..sandbox import SandboxUnavailable
from .common import fail

sandbox_app = typer.Typer(no_args_is_help=True, help="Manage sandbox resources (Docker containers).")


def docker_client():
    """A client of the Docker daemon, or the error exit that says how to start one."""
    from ..sandbox.docker import connect

    try:
        return connect()
    except SandboxUnavailable as exc:
        fail(str(exc))


@sandbox_app.command("clean")
def sandbox_clean(
    orphans: bool = typer.Option(False, "--orphans", help="Only containers whose owning Assay process is gone "
                                 "(what every Docker run does at start)."),
    run: Optional[str] = typer.Option(None, "--run", help="Only the containers of this run (its assay.run label)."),
    as_json: bool = typer.Option(False, "--json", help="Print the removed container ids as JSON."),
) -> None:
    """Remove Assay's sandbox containers: by default all of them, runs still going included."""
    from ..sandbox.docker import LABEL_OWNER, LABEL_RUN, remove_containers

    client = docker_client()
    try:
        listed = {c["Id"]: c.get("Labels") or {}
                  for c in client.api.containers(all=True, filters={"label": LABEL_RUN})}
        removed = remove_containers(client, orphans_only=orphans, run_id=run)
    except Exception as exc:  # the daemon failed midway: say so, without a traceback
        fail(f"the Docker daemon failed while removing containers: {exc}", code=1)
    if as_json:
        typer.echo(json.dumps({"removed": removed}, indent=2))
        return
    if removed:
        typer.echo(render(["container", "run", "owner pid"],
                          [[cid[:12], listed.get(cid, {}).get(LABEL_RUN, "")[:12],
                            listed.get(cid, {}).get(LABEL_OWNER, "")] for cid in removed], align="lll"))
    typer.echo(f"removed {len(removed)} container(s)", err=True)


