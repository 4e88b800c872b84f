"""The report as markdown (GitHub-flavoured tables), for pull requests and wikis."""

from __future__ import annotations

from ..analysis.report import SLOWEST, trust_flag
from ..vocabulary import OUTCOMES
from .cells import (BAR_CHARS, describe_settings, figure_cell, flag_footnote, flaky_text, notes_cell, provenance_lines,
                    repeats_text, text_bar, timing_cells)


def _md_table(headers: list[str], rows: list[list[str]], align: str) -> str:
    def cell(text: str) -> str:
        return str(text).replace("|", "\\|").replace("\n", " ")
    rule = ["---:" if a == "r" else ":---" for a in align]
    lines = ["| " + " | ".join(headers) + " |", "| " + " | ".join(rule) + " |"]
    lines += ["| " + " | ".join(cell(c) for c in row) + " |" for row in rows]
    return "\n".join(lines)


def render_markdown(report: dict) -> str:
    ks = report["settings"]["ks"]
    out = [f"# Assay report: {report['run']['label']}", ""]
    out += [f"> **warning:** {w}" for w in report["warnings"]]
    if report["warnings"]:
        out.append("")

    def group_md(rows, first):
        headers = [first, "problems", "samples"] + [f"pass@{k}" for k in ks] + ["notes"]
        body = [[r["group"], str(r["problems"]), str(r["samples"])]
                + [figure_cell(r["pass_at_k"][str(k)], trust_flag(r)) for k in ks] + [notes_cell(r)]
                for r in rows]
        footnote = flag_footnote(rows)
        return _md_table(headers, body, "lrr" + "r" * len(ks) + "l") + (f"\n\n\\* {footnote}" if footnote else "")

    out += ["## pass@k", "", f"{describe_settings(report['settings'])}; cells are estimate [low, high] in percent.", ""]
    out += [group_md([r for r in report["groups"] if r["kind"] in ("language", "overall")], "language"), ""]
    for kind in ("kind", "difficulty", "tag"):
        rows = [r for r in report["groups"] if r["kind"] == kind]
        if rows:
            out += [f"## By {kind} (all languages)", "", group_md(rows, kind), ""]
    out += ["## Outcomes", "", "```"]
    out += [f"{name:<12} {text_bar(c)}" for name, c in report["outcomes"].items()]
    out += ["```", "", "Legend: " + ", ".join(f"`{BAR_CHARS[o]}` {o}" for o in OUTCOMES), ""]
    out += [_md_table(["language"] + list(OUTCOMES),
                      [[name] + [str(c.get(o, 0)) for o in OUTCOMES] for name, c in report["outcomes"].items()],
                      "l" + "r" * len(OUTCOMES)), ""]
    languages = report["grid"]["languages"]
    out += ["## Solve rate per problem", "", "Passed / samples per (problem, language).", ""]
    out += [_md_table(["problem", "difficulty"] + languages,
                      [[p["problem"], p["difficulty"] or "?"]
                       + [f"{c['c']}/{c['n']}" if c else "-" for c in (p["cells"][l] for l in languages)]
                       for p in report["grid"]["problems"]], "ll" + "r" * len(languages)), ""]
    out += [f"## Slowest candidates (top {SLOWEST})", ""]
    out += [_md_table(["problem", "language", "sample", "outcome", "run s", "compile s"],
                      [[r["problem"], r["language"], str(r.get("sample", ""))] + timing_cells(r)
                       for r in report["slowest"]], "llrlrr"), ""]
    out += ["## Flaky candidates", ""]
    flaky = report["flaky"]
    if not flaky["recorded"] or not flaky["rows"]:
        out += [flaky_text(flaky).strip(), ""]
    else:
        out += [_md_table(["problem", "language", "sample", "recorded", "repeated runs"],
                          [[r["problem"], r["language"], str(r.get("sample", "")), r["outcome"], repeats_text(r)]
                           for r in flaky["rows"]], "llrll"), ""]
    out += ["## Provenance", ""]
    out += [f"- **{key}:** {value}" for key, value in provenance_lines(report["provenance"])]
    return "\n".join(out) + "\n"
