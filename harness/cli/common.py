"""What every command shares: the one error exit, loading sets and runtimes with their errors
as messages, opening a sandbox, and the options several commands take."""

from __future__ import annotations

import sys
from pathlib import Path
from typing import List, Optional

import typer

from ..problems import ProblemError, ProblemSet, load_problem_set
from ..console import paint, use_colour
from ..runtimes import Runtime, RuntimeConfigError, load_runtime
from ..vocabulary import LimitOverrides

RuntimesDir = typer.Option(None, "--runtimes-dir", help="Extra folder of runtimes (searched first); "
                           "ASSAY_RUNTIMES_PATH works too.")


def fail(message: str, code: int = 2) -> None:
    """Print ``error: message`` on stderr and exit with ``code`` (2: bad input, 1: a failure)."""
    typer.echo(paint("error: ", "31", use_colour(sys.stderr)) + message, err=True)
    raise typer.Exit(code)


def load_set(name: str) -> ProblemSet:
    try:
        return load_problem_set(name)
    except ProblemError as exc:
        fail(str(exc))


def load_runtimes(names: list[str], extra: Optional[List[Path]]) -> dict[str, Runtime]:
    try:
        return {name: load_runtime(name, extra) for name in names}
    except RuntimeConfigError as exc:
        fail(str(exc))


def open_sandbox(name: str, work_root: Optional[Path] = None):
    """A checked sandbox of backend ``name``; the caller closes it (it is a context manager)."""
    from ..sandbox import SandboxUnavailable, make_sandbox

    try:
        sandbox = make_sandbox(name, work_root)
        sandbox.check()
    except SandboxUnavailable as exc:
        fail(str(exc))
    if name == "none":
        typer.echo(paint("warning: --sandbox none runs candidates with no isolation at all; "
                         "use it only with code you trust.", "33", use_colour(sys.stderr)), err=True)
    return sandbox


def check_mark(ok: bool, colour: bool) -> str:
    return paint("ok  ", "32", colour) if ok else paint("FAIL", "31", colour)


def limit_overrides(timeout: Optional[float], memory: Optional[int]) -> LimitOverrides:
    """``--timeout`` (wall and CPU seconds) and ``--memory`` (MB) as typed run-step overrides."""
    try:
        return LimitOverrides.parse({"wall_seconds": timeout, "cpu_seconds": timeout, "memory_mb": memory})
    except ValueError as exc:
        fail(str(exc))
