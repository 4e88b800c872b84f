"""The analysis commands: ``assay report``, ``assay compare`` and ``assay trend``.

They only read run folders written by ``assay score``; nothing here executes candidates.
``register(app)`` adds them to the main typer app (see ``app.py``).
"""

from __future__ import annotations

import json
from pathlib import Path
from typing import List, Optional

import typer

from ..metrics import parse_ks
from ..metrics.stats import DEFAULT_CONFIDENCE, DEFAULT_RESAMPLES, DEFAULT_SEED, METHODS
from ..store import SUMMARY
from ..console import use_colour
from .common import fail

KOption = typer.Option(None, "--k", help="Comma-separated k values (default: the k values the run(s) were scored with).")
SeedOption = typer.Option(DEFAULT_SEED, "--seed", help="Seed of the bootstrap's random draws; same seed, same intervals.")
ResamplesOption = typer.Option(DEFAULT_RESAMPLES, "--resamples", min=100, help="Bootstrap resamples.")
ConfidenceOption = typer.Option(DEFAULT_CONFIDENCE, "--confidence", min=0.5, max=0.9999,
                                help="Two-sided confidence level of the intervals.")
MethodOption = typer.Option("percentile", "--method", help=f"Bootstrap interval: {' or '.join(METHODS)}.")
NoTagsOption = typer.Option(False, "--no-tags", help="Leave out the breakdown by difficulty and tag.")


def _settings(k: Optional[str], default_ks: list[int], seed: int, resamples: int, confidence: float, method: str):
    from ..analysis.report import Settings

    if method not in METHODS:
        fail(f"--method must be one of: {', '.join(METHODS)}")
    try:
        ks = parse_ks(k) if k else sorted(set(default_ks))
    except ValueError as exc:
        fail(str(exc))
    return Settings(ks=ks, confidence=confidence, method=method, resamples=resamples, seed=seed)


def _load(path: Path):
    from ..store import RunError, load_run

    try:
        return load_run(path)
    except RunError as exc:
        fail(str(exc))


def _write(text: str, output: Optional[Path]) -> None:
    if output is None:
        typer.echo(text)
        return
    output.parent.mkdir(parents=True, exist_ok=True)
    output.write_text(text if text.endswith("\n") else text + "\n", encoding="utf-8")
    typer.echo(f"wrote {output}", err=True)


AllowInfraOption = typer.Option(False, "--allow-infra-errors", help="Print figures even though some "
                                "candidates could not be judged (sandbox or daemon failures).")


def _refuse_infra_errors(folder: Path, summary: dict, allowed: bool) -> None:
    """Headline figures with unjudged candidates would mislead: say how to finish the run."""
    count = summary.get("infra_errors", 0)
    if count and not allowed:
        fail(f"{folder}: {count} candidate(s) ended in infra_error (the sandbox failed, not the code). "
              "Rerun the same 'assay score' command to retry them, or pass --allow-infra-errors.")


def register(app: typer.Typer) -> None:
    """Add ``report``, ``compare`` and ``trend`` to ``app``."""

    @app.command()
    def report(
        out: Path = typer.Argument(..., help="A folder written by 'assay score'."),
        fmt: str = typer.Option("table", "--format", "-f", help="table, markdown, html or json."),
        as_json: bool = typer.Option(False, "--json", help="Print summary.json's content (as before; "
                                     "--format json gives the full report)."),
        output: Optional[Path] = typer.Option(None, "-o", "--output", help="Write to this file instead of stdout."),
        k: Optional[str] = KOption,
        seed: int = SeedOption,
        resamples: int = ResamplesOption,
        confidence: float = ConfidenceOption,
        method: str = MethodOption,
        no_tags: bool = NoTagsOption,
        allow_infra_errors: bool = AllowInfraOption,
    ) -> None:
        """Report a scored run: pass@k with intervals, outcomes, tags, per-problem grid, provenance."""
        from ..analysis.report import build_report
        from ..render.formats import formats, render

        if as_json:
            path = out / SUMMARY
            if not path.is_file():
                fail(f"{path}: no summary; run 'assay score ... --out {out}' first")
            _refuse_infra_errors(out, json.loads(path.read_text(encoding="utf-8")), allow_infra_errors)
            _write(json.dumps(json.loads(path.read_text(encoding="utf-8")), indent=2), output)
            return
        if fmt not in formats():
            fail(f"--format must be one of: {', '.join(formats())}")
        run = _load(out)
        _refuse_infra_errors(out, run.summary, allow_infra_errors)
        settings = _settings(k, run.ks, seed, resamples, confidence, method)
        built = build_report(run, settings, tags=not no_tags)
        colour = output is None and fmt == "table" and use_colour()
        _write(render(built, fmt, colour, summary=run.summary), output)

    @app.command()
    def compare(
        a: Path = typer.Argument(..., help="Run folder of the baseline checkpoint (A)."),
        b: Path = typer.Argument(..., help="Run folder of the candidate checkpoint (B)."),
        k: Optional[str] = KOption,
        seed: int = SeedOption,
        resamples: int = ResamplesOption,
        confidence: float = ConfidenceOption,
        method: str = MethodOption,
        fail_if_worse: Optional[float] = typer.Option(
            None, "--fail-if-worse", min=0.0, metavar="DELTA",
            help="Exit 1 when B is worse than A by more than DELTA percentage points with the chosen confidence: "
                 "the upper bound of the interval for the overall pass@k difference (B - A) at the first --k "
                 "is below -DELTA."),
        as_json: bool = typer.Option(False, "--json", help="Print the comparison as JSON."),
        no_tags: bool = NoTagsOption,
        allow_infra_errors: bool = AllowInfraOption,
    ) -> None:
        """B - A per language and overall, with paired bootstrap intervals, p-values, flipped problems."""
        from ..analysis.compare import compare_runs, gate
        from ..render.compare import render_compare

        run_a, run_b = _load(a), _load(b)
        for folder, run in ((a, run_a), (b, run_b)):
            _refuse_infra_errors(folder, run.summary, allow_infra_errors)
        settings = _settings(k, run_a.ks + run_b.ks, seed, resamples, confidence, method)
        result = compare_runs(run_a, run_b, settings, tags=not no_tags)
        gate_result = None
        if fail_if_worse is not None:
            try:
                gate_result = gate(result, fail_if_worse)
            except ValueError as exc:
                fail(str(exc))
            result["gate"] = gate_result
        if as_json:
            typer.echo(json.dumps(result, indent=2, ensure_ascii=False))
        else:
            typer.echo(render_compare(result, use_colour(), gate_result))
        if gate_result and gate_result["failed"]:
            raise typer.Exit(1)

    @app.command()
    def trend(
        dirs: List[Path] = typer.Argument(..., help="Run folders, one per checkpoint, in any order."),
        labels: Optional[str] = typer.Option(None, "--labels", help="Comma-separated labels, one per folder in the "
                                             "order given (default: each manifest's label)."),
        k: Optional[str] = KOption,
        plot: Optional[Path] = typer.Option(None, "--plot", help="Also write a PNG plot here (needs matplotlib)."),
        seed: int = SeedOption,
        resamples: int = ResamplesOption,
        confidence: float = ConfidenceOption,
        method: str = MethodOption,
        as_json: bool = typer.Option(False, "--json", help="Print the series as JSON."),
    ) -> None:
        """pass@k per language over checkpoints ordered by the step number ending their labels."""
        from ..analysis.trend import build_trend
        from ..render.trend import plot_trend, render_trend

        runs = [_load(d) for d in dirs]
        settings = _settings(k, [x for r in runs for x in r.ks], seed, resamples, confidence, method)
        names = [part.strip() for part in labels.split(",")] if labels is not None else None
        try:
            series = build_trend(runs, settings, names)
        except ValueError as exc:
            fail(str(exc))
        if plot is not None:
            try:
                plot_trend(series, plot)
            except RuntimeError as exc:
                fail(str(exc))
            series["plot"] = str(plot)
        if as_json:
            typer.echo(json.dumps(series, indent=2, ensure_ascii=False))
        else:
            typer.echo(render_trend(series, use_colour()))
            if plot is not None:
                typer.echo(f"wrote {plot}", err=True)
