"""The report as a terminal table (colour when the output is a terminal)."""

from __future__ import annotations

from ..analysis.report import SLOWEST, trust_flag
from ..vocabulary import OUTCOMES
from .cells import (BAR_CHARS, describe_settings, figure_cell, flag_footnote, flaky_text, notes_cell, provenance_lines,
                    text_bar, timing_cells)
from .summary import SHORT, pass_table
from ..console import paint, render as render_columns


def render_table(report: dict, colour: bool = False, summary: dict | None = None) -> str:
    ks = report["settings"]["ks"]
    out = []
    if summary is not None:
        out += [pass_table(summary, colour, title=report["run"]["path"]), ""]
    else:
        out += [paint(report["run"]["label"], "1", colour), ""]
    for warning in report["warnings"]:
        out.append(paint("warning: " + warning, "33", colour))
    out.append(paint("pass@k with intervals", "1", colour) + f" ({describe_settings(report['settings'])})")
    out.append(_group_table([r for r in report["groups"] if r["kind"] in ("language", "overall")], ks, "language"))
    for kind in ("kind", "difficulty", "tag"):
        rows = [r for r in report["groups"] if r["kind"] == kind]
        if rows:
            out += ["", paint(f"by {kind} (all languages)", "1", colour), _group_table(rows, ks, kind)]
    out += ["", paint("outcomes", "1", colour)]
    legend = "  ".join(f"{BAR_CHARS[o]} {SHORT[o]}" for o in OUTCOMES)
    bars = [[name, str(sum(c.values())), text_bar(c)] for name, c in report["outcomes"].items()]
    out += [render_columns(["language", "samples", "bar"], bars, align="lrl"), legend]
    out += ["", paint("solve rate per problem (passed/samples)", "1", colour)]
    languages = report["grid"]["languages"]
    grid_rows = [[p["problem"], p["difficulty"] or "?"]
                 + [f"{c['c']}/{c['n']}" if c else "-" for c in (p["cells"][l] for l in languages)]
                 for p in report["grid"]["problems"]]
    out.append(render_columns(["problem", "difficulty"] + languages, grid_rows, align="ll" + "r" * len(languages)))
    out += ["", paint(f"slowest candidates (top {SLOWEST})", "1", colour)]
    out.append(render_columns(["problem", "language", "sample", "outcome", "run s", "compile s"],
                              [[r["problem"], r["language"], str(r.get("sample", ""))] + timing_cells(r)
                               for r in report["slowest"]], align="llrlrr"))
    out += ["", paint("flaky candidates", "1", colour)]
    out.append(flaky_text(report["flaky"]))
    out += ["", paint("provenance", "1", colour)]
    out += [f"  {key}: {value}" for key, value in provenance_lines(report["provenance"])]
    return "\n".join(out)


def _group_table(rows: list[dict], ks: list[int], first: str) -> str:
    headers = [first, "problems", "samples"] + [f"pass@{k}" for k in ks] + ["notes"]
    body = [[r["group"], str(r["problems"]), str(r["samples"])]
            + [figure_cell(r["pass_at_k"][str(k)], trust_flag(r)) for k in ks] + [notes_cell(r)]
            for r in rows]
    footnote = flag_footnote(rows)
    return render_columns(headers, body, align="lrr" + "r" * len(ks) + "l") + (f"\n* {footnote}" if footnote else "")
