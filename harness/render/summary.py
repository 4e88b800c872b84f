"""The pass@k table of a scored run, for people (a table) and for scripts (JSON)."""

from __future__ import annotations

from ..vocabulary import OUTCOMES
from ..console import paint, render

SHORT = {
    "passed": "pass", "wrong_answer": "wrong", "compile_error": "compile", "runtime_error": "crash",
    "timeout": "time", "memory_limit": "mem", "output_limit": "output", "infra_error": "infra",
}


def percent(value: float | None) -> str:
    return "n/a" if value is None else f"{100 * value:.1f}"


def pass_table(summary: dict, colour: bool = False, title: str | None = None) -> str:
    ks = summary["ks"]
    headers = ["language", "problems", "samples"] + [f"pass@{k}" for k in ks] + [SHORT[o] for o in OUTCOMES]
    rows = []
    for language, values in summary["pass_at_k"]["by_language"].items():
        outcomes = summary["outcomes"].get(language, {})
        samples = sum(v for o, v in outcomes.items() if o != "infra_error")
        rows.append(
            [language, str(summary["problems"].get(language, 0)), str(samples)]
            + [percent(values[str(k)]) for k in ks]
            + [str(outcomes.get(o, 0)) for o in OUTCOMES]
        )
    kinds = summary.get("kinds") or {}
    if len(kinds) > 1:  # both kinds of problem in the run: each kind over every language
        for kind, figures in kinds.items():
            rows.append([f"{kind} problems", str(figures["problems"]), str(figures["samples"])]
                        + [percent(figures["pass_at_k"][str(k)]) for k in ks]
                        + [str(figures["outcomes"].get(o, 0)) for o in OUTCOMES])
    overall = summary["pass_at_k"]["overall"]
    total_outcomes = {o: sum(summary["outcomes"][lang].get(o, 0) for lang in summary["outcomes"]) for o in OUTCOMES}
    rows.append(
        # Distinct problems, as in the report's overall row (not the sum over languages: that
        # counts (problem, language) pairs, which the summary's "pairs" holds).
        [paint("overall", "1", colour), str(summary.get("problems_overall", sum(summary["problems"].values()))),
         str(summary["samples"])]
        + [paint(percent(overall[str(k)]), "1", colour) for k in ks]
        + [str(total_outcomes[o]) for o in OUTCOMES]
    )
    lines = []
    if title:
        lines.append(paint(title, "1", colour))
    lines.append(render(headers, rows))
    notes = []
    unavailable = [f"pass@{k}" for k in ks if overall[str(k)] is None]
    if unavailable:
        smallest = min(summary["min_samples_per_problem"].values(), default=0)
        notes.append(f"n/a: {', '.join(unavailable)} need more samples per problem than the run has "
                     f"(fewest: {smallest}); pass@k needs k <= samples.")
    if summary.get("infra_errors"):
        notes.append(paint(f"{summary['infra_errors']} infra error(s) are excluded from pass@k; "
                           "rerun the same 'assay score' command to retry them.", "33", colour))
    if summary.get("rejected"):
        notes.append(f"{summary['rejected']} input line(s) rejected: see rejects.jsonl.")
    lines += notes
    return "\n".join(lines)
