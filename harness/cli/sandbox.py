"""``assay sandbox``: what enforces the sandboxes' limits on this host (``doctor``), and the Docker
sandbox's resources (``clean`` removes containers left behind). Images are built by ``assay
runtimes build``."""

from __future__ import annotations

import json
from typing import Optional

import typer

from ..console import paint, render, use_colour
from ..sandbox import SandboxUnavailable
from .common import fail

sandbox_app = typer.Typer(no_args_is_help=True, help="Check what enforces the sandboxes' limits here; manage "
                          "sandbox resources (Docker containers).")


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




@sandbox_app.command("doctor")
def sandbox_doctor(
    as_json: bool = typer.Option(False, "--json", help="Print the report as JSON."),
) -> None:
    """Say which limits are enforced by what on this host, for the bubblewrap and none sandboxes:
    cgroup version and controllers (or the rlimit fallback), swap, per-step peak memory, user
    namespaces, seccomp, and whether a bubblewrap sandbox starts."""
    from ..sandbox.hostlimits import doctor

    report = doctor()
    if as_json:
        typer.echo(json.dumps(report, indent=2))
        return
    cgroup, limits = report["cgroup"], report["limits"]
    version = f"v{cgroup['version']}" if cgroup["version"] else "none"
    mechanism = f"cgroup {version}" if limits["cgroup_limits"] else "rlimits"
    yes_no = {True: "yes", False: "NO"}
    rows = [
        ["cgroup hierarchy", version, f"{cgroup['mount']}: {' '.join(cgroup['controllers']) or 'no controllers'}"],
        ["Assay's groups", "usable" if cgroup["usable"] else "NONE", cgroup.get("where") or cgroup.get("problem", "")],
        ["memory limit", mechanism, limits["memory"]],
        ["memory kills", "counted" if limits["cgroup_limits"] else "not counted", limits["oom_kills"]],
        ["process limit", "cgroup" if limits["processes"].startswith("cgroup") else "rlimit", limits["processes"]],
        ["swap", "capped" if limits["swap"].startswith("capped") else "not capped", limits["swap"]],
        ["per-step peak", "whole group" if limits["cgroup_limits"] else "one process", limits["peak_memory"]],
        ["user namespaces", yes_no[report["user_namespaces"]["available"]], report["user_namespaces"]["detail"]],
        ["seccomp filter", yes_no[report["seccomp"]["available"]], report["seccomp"]["detail"]],
        ["bubblewrap", yes_no[report["bubblewrap"]["available"]], report["bubblewrap"]["detail"]],
    ]
    typer.echo(render(["check", "state", "detail"], rows, align="lll"))
    colour = use_colour()
    for warning in report["warnings"]:
        typer.echo(paint("warning: " + warning, "33", colour))
    if not report["warnings"]:
        typer.echo(f"memory and process limits are enforced by cgroup {version}")
