"""The ``assay`` command line: the top-level app, with each command group registered from
its own module."""

from __future__ import annotations

import typer

from .. import __version__
from . import analysis, extract, problems, runtimes, sandbox, score

app = typer.Typer(add_completion=False, no_args_is_help=True, help=(
    "Assay scores model-written code: prompts out, completion dumps in, every candidate run in a "
    "sandbox against hidden tests, pass@k out. It runs untrusted code: see the README's safety notes."
))


@app.command()
def version() -> None:
    """Print Assay's version."""
    typer.echo(__version__)


score.register(app)
extract.register(app)
analysis.register(app)
app.add_typer(problems.problems_app, name="problems")
app.add_typer(runtimes.runtimes_app, name="runtimes")
app.add_typer(sandbox.sandbox_app, name="sandbox")


def main() -> None:
    app()
