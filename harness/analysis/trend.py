"""pass@k across a series of checkpoints, as a table and (optionally) a PNG plot.

Checkpoints are ordered by the trailing number of their label (``heron-coder-step12000`` ->
12000), the label coming from each run's manifest or from ``--labels``. Every point carries
its own bootstrap interval over problems (``stats.bootstrap_ratio``); points are independent
runs, so neighbouring intervals are not paired differences: use ``assay compare`` for those.
"""

from __future__ import annotations

import re

from .compare import compare_manifests, sample_warnings
from ..store import Run
from .report import MARKS, Settings, group_row, groups

TRAILING_NUMBER = re.compile(r"(\d+)\s*$")


def step_of(label: str) -> int | None:
    """The label's trailing number (``step12000`` -> 12000), or None when it has none."""
    match = TRAILING_NUMBER.search(label)
    return int(match.group(1)) if match else None


def order_runs(runs: list[Run], labels: list[str] | None = None) -> tuple[list[dict], list[str]]:
    """Checkpoints sorted by step when every label has one; else in the order given, with a warning."""
    if labels is not None and len(labels) != len(runs):
        raise ValueError(f"--labels has {len(labels)} label(s) for {len(runs)} run folder(s); give one per folder")
    entries = [{"run": run, "label": (labels[i] if labels else run.label)} for i, run in enumerate(runs)]
    for entry in entries:
        entry["step"] = step_of(entry["label"])
    warnings = []
    missing = [e["label"] for e in entries if e["step"] is None]
    if missing:
        warnings.append(f"label(s) without a trailing number ({', '.join(missing)}): checkpoints kept in the "
                        "order given")
        return entries, warnings
    entries.sort(key=lambda e: e["step"])  # stable: equal steps keep the order given
    steps = [e["step"] for e in entries]
    if len(set(steps)) != len(steps):
        warnings.append(f"several runs share a step ({', '.join(str(s) for s in sorted(set(steps)) if steps.count(s) > 1)})")
    return entries, warnings


def build_trend(runs: list[Run], settings: Settings, labels: list[str] | None = None) -> dict:
    entries, warnings = order_runs(runs, labels)
    first = entries[0]["run"]
    for entry in entries[1:]:
        found = compare_manifests(first, entry["run"]) + sample_warnings(first, entry["run"])
        warnings += [f"{entry['label']} vs {entries[0]['label']}: {w}" for w in found]
    for entry in entries:
        warnings += [f"{entry['label']}: {w}" for w in entry["run"].warnings]
    languages = sorted({lang for e in entries for lang in e["run"].languages})
    points = []
    for entry in entries:
        run = entry["run"]
        rows = {g.name: group_row(run, g, settings) for g in groups(run.problems, run.outcomes, tags=False)}
        points.append({"label": entry["label"], "step": entry["step"], "path": str(run.path), "groups": rows})
    # The kinds of problem (function, program) get a series each when a run has both.
    kinds = sorted({name for p in points for name, row in p["groups"].items() if row["kind"] == "kind"})
    return {"settings": settings.as_dict(), "languages": languages, "kinds": kinds, "points": points,
            "warnings": warnings,
            "marks": MARKS}
