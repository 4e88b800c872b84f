"""The report as one self-contained HTML page (inline CSS and SVG, no scripts)."""

from __future__ import annotations

from pathlib import Path

from ..vocabulary import OUTCOMES
from ..analysis.report import trust_flag
from .cells import (OUTCOME_COLOURS, describe_settings, flag_footnote, notes_cell, pct, provenance_lines,
                    repeats_text, segments)


def render_html(report: dict) -> str:
    """One self-contained page (inline CSS and SVG, no scripts, no external requests)."""
    from jinja2 import Environment, FileSystemLoader, select_autoescape

    env = Environment(loader=FileSystemLoader(str(Path(__file__).parent / "templates")),
                      autoescape=select_autoescape(["html", "j2"]), trim_blocks=True, lstrip_blocks=True)
    env.filters["pct"] = pct
    ks = report["settings"]["ks"]
    groups_by_kind = {kind: [r for r in report["groups"] if r["kind"] == kind]
                      for kind in ("language", "overall", "kind", "difficulty", "tag")}
    bars = [{"name": name, "total": sum(c.values()),
             "segments": _svg_segments(c)} for name, c in report["outcomes"].items()]
    grid = [{"problem": p["problem"], "difficulty": p["difficulty"], "tags": p["tags"],
             "cells": [_grid_cell(p["cells"][lang]) for lang in report["grid"]["languages"]]}
            for p in report["grid"]["problems"]]
    return env.get_template("report.html.j2").render(
        report=report, ks=ks, describe=describe_settings(report["settings"]),
        main_rows=groups_by_kind["language"] + groups_by_kind["overall"],
        tag_sections=[(kind, groups_by_kind[kind]) for kind in ("kind", "difficulty", "tag") if groups_by_kind[kind]],
        bars=bars, outcomes=OUTCOMES, colours=OUTCOME_COLOURS, grid=grid, flag_footnote=flag_footnote,
        provenance=provenance_lines(report["provenance"]), notes_cell=notes_cell, trust_flag=trust_flag,
        repeats_text=repeats_text,
        interval_svg=_interval_svg,
    )


def _svg_segments(counts: dict[str, int]) -> list[dict]:
    x, result = 0.0, []
    for outcome, count, share in segments(counts):
        result.append({"outcome": outcome, "count": count, "x": round(1000 * x, 2),
                       "width": round(1000 * share, 2), "colour": OUTCOME_COLOURS[outcome],
                       "share": f"{100 * share:.1f}"})
        x += share
    return result


def _grid_cell(cell: dict | None) -> dict:
    if cell is None:
        return {"text": "-", "style": "", "title": "no samples"}
    hue = round(120 * cell["rate"])
    return {"text": f"{cell['c']}/{cell['n']}", "style": f"background: hsl({hue}, 55%, 82%)",
            "title": f"{cell['c']} of {cell['n']} samples passed"}


def _interval_svg(figure: dict | None) -> dict | None:
    """Positions (0-200 px wide) for a tiny interval sketch beside a figure."""
    if figure is None:
        return None
    return {"low": round(200 * figure["low"], 1), "high": round(200 * figure["high"], 1),
            "point": round(200 * figure["estimate"], 1)}
