"""Cells and lines every report format shares, so a figure reads the same in each."""

from __future__ import annotations

import json

from ..analysis.report import MARKS, trust_flag
from ..vocabulary import OUTCOMES
from ..console import render as render_columns

BAR_WIDTH = 40
BAR_CHARS = {"passed": "#", "wrong_answer": "=", "compile_error": "c", "runtime_error": "x", "timeout": "t",
             "memory_limit": "m", "output_limit": "o", "infra_error": "!"}
OUTCOME_COLOURS = {"passed": "#2e7d32", "wrong_answer": "#c62828", "compile_error": "#6a1b9a",
                   "runtime_error": "#ef6c00", "timeout": "#1565c0", "memory_limit": "#00838f",
                   "output_limit": "#795548", "infra_error": "#9e9e9e"}


def pct(value: float | None, signed: bool = False) -> str:
    if value is None:
        return "n/a"
    return f"{100 * value:+.1f}" if signed else f"{100 * value:.1f}"


def figure_cell(figure: dict | None, flagged: bool = False) -> str:
    """``55.6 [48.9, 62.2]``; a trailing ``*`` when the row carries a mark."""
    if figure is None:
        return "n/a"
    text = f"{pct(figure['estimate'])} [{pct(figure['low'])}, {pct(figure['high'])}]"
    return text + ("*" if flagged else "")


def notes_cell(row: dict) -> str:
    notes = []
    if "few_problems" in row["marks"]:
        notes.append(f"few problems ({row['problems']})")
    if "infra_errors" in row["marks"]:
        notes.append(f"{row['infra_errors']} infra error(s)")
    if "k_above_samples" in row["marks"]:
        notes.append(f"k > {row['min_samples']} samples" if row["min_samples"] else "no samples")
    return "; ".join(notes)


def segments(counts: dict[str, int]) -> list[tuple[str, int, float]]:
    """(outcome, count, share) for outcomes that occurred, in the fixed outcome order."""
    total = sum(counts.values())
    return [(o, counts[o], counts[o] / total) for o in OUTCOMES if counts.get(o)] if total else []


def text_bar(counts: dict[str, int], width: int = BAR_WIDTH) -> str:
    """Stacked bar of characters; widths by largest remainder so they add up to ``width``."""
    parts = segments(counts)
    if not parts:
        return ""
    exact = [share * width for _, _, share in parts]
    sizes = [int(x) for x in exact]
    for i in sorted(range(len(parts)), key=lambda i: exact[i] - sizes[i], reverse=True)[:width - sum(sizes)]:
        sizes[i] += 1
    return "".join(BAR_CHARS[o] * size for (o, _, _), size in zip(parts, sizes))


def describe_settings(settings: dict) -> str:
    return (f"{100 * settings['confidence']:g}% {settings['method']} bootstrap over problems, "
            f"{settings['resamples']} resamples, seed {settings['seed']}")


def flag_footnote(rows: list[dict]) -> str:
    """What the ``*`` beside figures of these rows means ('' when none is flagged)."""
    return "; ".join(sorted({MARKS[m] for r in rows if trust_flag(r) for m in r["marks"] if m != "k_above_samples"}))


def flaky_text(flaky: dict) -> str:
    if not flaky["recorded"]:
        return "  no flakiness data in this run (no row has a 'flaky' field)"
    if not flaky["rows"]:
        return "  none flagged"
    return render_columns(["problem", "language", "sample", "recorded", "repeated runs"],
                          [[r["problem"], r["language"], str(r.get("sample", "")), r["outcome"], repeats_text(r)]
                           for r in flaky["rows"]], align="llrll")


def repeats_text(row: dict) -> str:
    """The outcomes of the repeated runs (``--repeat``), or the raw flag when they are absent."""
    outcomes = row.get("repeat_outcomes")
    return ", ".join(map(str, outcomes)) if isinstance(outcomes, list) else str(row.get("flaky"))


def provenance_lines(prov: dict) -> list[tuple[str, str]]:
    lines = [("run", prov.get("path", "")), ("label", str(prov.get("label")))]
    if "harness_version" in prov:
        lines.append(("harness", prov["harness_version"]))
    problem_set = prov.get("problem_set")
    if problem_set:
        lines.append(("problem set", f"{problem_set.get('name')} ({problem_set.get('problems')} problems, "
                                     f"digest {str(problem_set.get('digest'))[:12]}) at {problem_set.get('path')}"))
    if "mode" in prov:
        lines.append(("mode", prov["mode"]))
    if "extraction" in prov:
        lines.append(("extraction", prov["extraction"]))
    for name, info in prov.get("runtimes", {}).items():
        run_limits = (info.get("limits") or {}).get("run") or {}
        limits = ", ".join(f"{k}={v}" for k, v in run_limits.items())
        lines.append((f"runtime {name}", f"{info.get('toolchain')}, digest {str(info.get('digest'))[:12]}; "
                                         f"run limits: {limits}"))
    if "sandbox" in prov:
        lines.append(("sandbox", ", ".join(f"{k}={v}" for k, v in prov["sandbox"].items())))
    if prov.get("limit_overrides"):
        lines.append(("limit overrides", json.dumps(prov["limit_overrides"])))
    for item in prov.get("inputs", []):
        lines.append(("input", f"{item.get('path')} (sha256 {str(item.get('sha256'))[:12]})"))
    if "started_at" in prov:
        lines.append(("started", str(prov["started_at"])))
        lines.append(("finished", str(prov.get("finished_at"))))
    if prov.get("host"):
        lines.append(("host", ", ".join(f"{k}={v}" for k, v in prov["host"].items())))
    return lines


def timing_cells(row: dict) -> list[str]:
    """Outcome, run seconds and compile seconds of a slow candidate (older runs: the total)."""
    if "run_seconds" not in row:
        return [row["outcome"], f"{row['seconds']:.3f}", "-"]
    return [row["outcome"], f"{row['run_seconds']:.3f}", f"{row.get('compile_seconds', 0.0):.3f}"]
