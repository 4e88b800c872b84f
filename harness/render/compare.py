"""Two checkpoints compared, as a terminal table."""

from __future__ import annotations

from ..analysis.report import MARKS, TRUST_MARKS
from .cells import pct
from ..console import paint, render as render_columns


def _p(value: float | None) -> str:
    if value is None:
        return ""
    return "<0.0001" if value < 1e-4 else f"{value:.4f}" if value < 0.01 else f"{value:.3f}"


def _rows_table(rows: list[dict], k: int, first: str, greedy: bool) -> str:
    headers = [first, "problems", "A", "B", "B-A", "interval", "p"]
    if greedy:
        headers += ["A only", "B only", "McNemar p"]
    headers.append("notes")
    body = []
    for r in rows:
        f = r["pass_at_k"][str(k)]
        flag = "*" if set(TRUST_MARKS) & set(r["marks"]) else ""
        cells = [r["group"], str(r["problems"])]
        if f is None:
            cells += ["n/a"] * 4 + [""]
        else:
            cells += [pct(f["a"]), pct(f["b"]), pct(f["estimate"], signed=True) + flag,
                      f"[{pct(f['low'], signed=True)}, {pct(f['high'], signed=True)}]", _p(f["p_value"])]
        if greedy:
            m = r["mcnemar"]
            cells += [str(m["a_only"]), str(m["b_only"]), _p(m["p_value"])] if m else ["", "", ""]
        notes = []
        if "few_problems" in r["marks"]:
            notes.append(f"few problems ({r['problems']})")
        if "infra_errors" in r["marks"]:
            notes.append(f"{r['infra_errors']} infra error(s)")
        if "k_above_samples" in r["marks"] and f is None:
            notes.append(f"k > {r['min_samples']} samples" if r["min_samples"] else "no shared samples")
        body.append(cells + ["; ".join(notes)])
    return render_columns(headers, body, align="lr" + "r" * (len(headers) - 3) + "l")


def render_compare(result: dict, colour: bool = False, gate_result: dict | None = None) -> str:
    s = result["settings"]
    ks = s["ks"]
    out = [paint("A: ", "1", colour) + f"{result['a']['label']} ({result['a']['path']})",
           paint("B: ", "1", colour) + f"{result['b']['label']} ({result['b']['path']})",
           f"B - A in percentage points over {result['shared_pairs']} shared (problem, language) pair(s); "
           f"{100 * s['confidence']:g}% {s['method']} paired bootstrap over problems, {s['resamples']} resamples, "
           f"seed {s['seed']}; p: two-sided bootstrap p-value"
           + ("; McNemar: exact two-sided test on discordant pairs (greedy runs)" if result["greedy"] else "")]
    for warning in result["warnings"]:
        out.append(paint("warning: " + warning, "33", colour))
    main = [r for r in result["groups"] if r["kind"] in ("language", "overall")]
    for k in ks:
        out += ["", paint(f"pass@{k}", "1", colour), _rows_table(main, k, "language", result["greedy"])]
    for kind in ("kind", "difficulty", "tag"):
        rows = [r for r in result["groups"] if r["kind"] == kind]
        if rows:
            out += ["", paint(f"pass@{ks[0]} by {kind} (all languages)", "1", colour),
                    _rows_table(rows, ks[0], kind, result["greedy"])]
    if any(set(TRUST_MARKS) & set(r["marks"]) for r in result["groups"]):
        out.append("* " + "; ".join(MARKS[m] for m in ("few_problems", "infra_errors")
                                    if any(m in r["marks"] for r in result["groups"])))
    for key, title in (("passed_to_failed", "solved in A, not in B"), ("failed_to_passed", "solved in B, not in A")):
        flips = result["flips"][key]
        out += ["", paint(f"{title}: {len(flips)}", "1", colour)]
        if flips:
            out.append(render_columns(["problem", "language", "difficulty", "A", "B"],
                                      [[f["problem"], f["language"], f["difficulty"] or "?", f["a"]["text"],
                                        f["b"]["text"]] for f in flips], align="lllll"))
    if gate_result:
        verdict = paint("FAILED", "31", colour) if gate_result["failed"] else paint("passed", "32", colour)
        out += ["", f"gate --fail-if-worse {gate_result['delta_points']:g}: {verdict} (overall pass@{gate_result['k']} "
                    f"B - A = {gate_result['difference_points']:+.1f} points, upper bound "
                    f"{gate_result['upper_points']:+.1f}; {gate_result['rule']})"]
    return "\n".join(out)
