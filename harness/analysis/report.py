"""One run's report as plain data: pass@k with intervals by language, difficulty and tag,
outcomes, the per-problem grid, the slowest and flaky candidates, provenance. ``compare`` and
``trend`` reuse the grouping (languages, overall, difficulty, tags) defined here; every format
in ``harness.render`` shows the same numbers because they all render this dict.
"""

from __future__ import annotations

from collections import Counter, defaultdict
from dataclasses import dataclass
from fractions import Fraction

from ..metrics import pass_at_k_exact
from ..metrics.stats import DEFAULT_CONFIDENCE, DEFAULT_RESAMPLES, DEFAULT_SEED, bootstrap_ratio
from ..store import Run
from ..vocabulary import OUTCOMES

MIN_PROBLEMS = 10  # below this, an interval over problems says little (a convention, not a theorem)
SLOWEST = 10
MARKS = {
    "few_problems": f"fewer than {MIN_PROBLEMS} problems: the interval is too rough to rely on",
    "infra_errors": "infra errors present: those samples are excluded from pass@k; rerun to retry them",
    "k_above_samples": "n/a: k exceeds the fewest samples per problem",
}
TRUST_MARKS = ("few_problems", "infra_errors")


@dataclass
class Settings:
    """How intervals are computed; recorded in every output so a figure can be reproduced."""

    ks: list[int]
    confidence: float = DEFAULT_CONFIDENCE
    method: str = "percentile"
    resamples: int = DEFAULT_RESAMPLES
    seed: int = DEFAULT_SEED

    def as_dict(self) -> dict:
        return {"ks": self.ks, "confidence": self.confidence, "method": self.method,
                "resamples": self.resamples, "seed": self.seed, "unit": "problem",
                "min_problems": MIN_PROBLEMS}


# -- groups: which (problem, language) pairs a figure averages over ---------------------------------

@dataclass(frozen=True)
class Group:
    name: str
    kind: str  # language | overall | kind (of problem: function, program) | difficulty | tag
    pairs: tuple[tuple[str, str], ...]


def groups(run_problems: dict[str, dict], pairs, tags: bool = True) -> list[Group]:
    """Languages, overall, the kinds of problem when the run has both (function, program), then
    (when ``tags``) difficulty levels and topic tags."""
    pairs = sorted(pairs)
    result = [Group(lang, "language", tuple(p for p in pairs if p[1] == lang))
              for lang in sorted({lang for _, lang in pairs})]
    result.append(Group("overall", "overall", tuple(pairs)))
    kind_of = {p: run_problems.get(p[0], {}).get("kind", "function") for p in pairs}
    if len(set(kind_of.values())) > 1:
        for kind in sorted(set(kind_of.values())):
            result.append(Group(kind, "kind", tuple(p for p in pairs if kind_of[p] == kind)))
    if tags and run_problems:
        levels = ("easy", "medium", "hard")
        found = {run_problems[p]["difficulty"] for p, _ in pairs if p in run_problems}
        for level in [d for d in levels if d in found] + sorted(found - set(levels)):
            result.append(Group(level, "difficulty", tuple(
                p for p in pairs if run_problems.get(p[0], {}).get("difficulty") == level)))
        for tag in sorted({t for p, _ in pairs for t in run_problems.get(p, {}).get("tags", ())}):
            result.append(Group(tag, "tag", tuple(
                p for p in pairs if tag in run_problems.get(p[0], {}).get("tags", ()))))
    return result


def pair_values(counts: dict[tuple[str, str], tuple[int, int]], k: int) -> dict[tuple[str, str], float | None]:
    """pass@k per pair (Chen et al. 2021 estimator from ``metrics``); None where k > samples."""
    return {pair: (pass_at_k_exact(n, c, k) if k <= n else None) for pair, (n, c) in counts.items()}


def by_problem(pairs, values: dict) -> tuple[list[str], list[float], list[int]] | None:
    """Problems, each one's summed pass@k over its languages, and its number of pairs;
    None if any pair has no value (k above its samples)."""
    sums: dict[str, Fraction] = defaultdict(Fraction)
    weights: dict[str, int] = defaultdict(int)
    for pair in pairs:
        value = values[pair]
        if value is None:
            return None
        sums[pair[0]] += value
        weights[pair[0]] += 1
    problems = sorted(sums)
    return problems, [sums[p] for p in problems], [weights[p] for p in problems]


def marks(problems: int, infra: int, missing_ks: list[int]) -> list[str]:
    found = []
    if problems < MIN_PROBLEMS:
        found.append("few_problems")
    if infra:
        found.append("infra_errors")
    if missing_ks:
        found.append("k_above_samples")
    return found


def group_row(run: Run, group: Group, settings: Settings) -> dict:
    counts = run.counts()
    scored = [p for p in group.pairs if p in counts]
    problems = len({p for p, _ in scored})
    infra = sum(run.outcomes[p]["infra_error"] for p in group.pairs)
    figures: dict[str, dict | None] = {}
    for k in settings.ks:
        clustered = by_problem(scored, pair_values({p: counts[p] for p in scored}, k)) if scored else None
        if clustered is None:
            figures[str(k)] = None
            continue
        _, sums, weights = clustered
        figures[str(k)] = bootstrap_ratio(sums, weights, confidence=settings.confidence,
                                          resamples=settings.resamples, seed=settings.seed,
                                          method=settings.method).as_dict()
    missing = [k for k in settings.ks if figures[str(k)] is None]
    return {"group": group.name, "kind": group.kind, "problems": problems, "pairs": len(scored),
            "samples": sum(counts[p][0] for p in scored), "infra_errors": infra,
            "min_samples": min((counts[p][0] for p in scored), default=0),
            "pass_at_k": figures, "marks": marks(problems, infra, missing)}


# -- the report -------------------------------------------------------------------------------------

def build_report(run: Run, settings: Settings, tags: bool = True) -> dict:
    all_groups = groups(run.problems, run.outcomes, tags)
    rows = [group_row(run, g, settings) for g in all_groups]
    outcome_totals = {lang: Counter() for lang in run.languages}
    for (_, language), outcomes in run.outcomes.items():
        outcome_totals[language].update(outcomes)
    outcome_totals["overall"] = sum(outcome_totals.values(), Counter())
    counts = run.counts()
    grid = [{"problem": problem, "difficulty": run.problems.get(problem, {}).get("difficulty"),
             "tags": run.problems.get(problem, {}).get("tags", []),
             "cells": {lang: ({"n": counts[(problem, lang)][0], "c": counts[(problem, lang)][1],
                               "rate": counts[(problem, lang)][1] / counts[(problem, lang)][0]}
                              if (problem, lang) in counts else None) for lang in run.languages}}
            for problem in sorted({p for p, _ in run.outcomes})]
    # Slowest by run time, what the run limit bounds (older runs recorded only the total).
    timed = [r for r in run.rows if isinstance(r.get("run_seconds", r.get("seconds")), (int, float))]
    slowest = sorted(timed, key=lambda r: -r.get("run_seconds", r["seconds"]))[:SLOWEST]
    flaky_recorded = any("flaky" in r for r in run.rows)
    flaky_rows = [_brief_row(r) for r in run.rows if r.get("flaky")]
    warnings = list(run.warnings) + limit_warnings(run.manifest)
    if flaky_rows:
        warnings.append(f"{len(flaky_rows)} flaky candidate(s): repeated runs disagreed, so their recorded "
                        "verdict (the first run's) may not reproduce")
    return {
        "run": {"path": str(run.path), "label": run.label},
        "settings": settings.as_dict(),
        "groups": rows,
        "outcomes": {name: {o: totals.get(o, 0) for o in OUTCOMES} for name, totals in outcome_totals.items()},
        "grid": {"languages": run.languages, "problems": grid},
        "slowest": [_brief_row(r) for r in slowest],
        "flaky": {"recorded": flaky_recorded, "rows": flaky_rows},
        "provenance": provenance(run),
        "warnings": warnings,
        "marks": MARKS,
    }


def limit_warnings(manifest: dict | None) -> list[str]:
    """A run whose memory limit was only a per-process rlimit (no writable cgroup on the scoring
    host: see ``assay sandbox doctor``) says so: its memory_limit verdicts and its peaks are weaker.
    Manifests before the sandbox recorded ``enforcement`` are read from its memory description."""
    sandbox = (manifest or {}).get("sandbox") or {}
    enforcement = sandbox.get("enforcement")
    if isinstance(enforcement, dict):
        rlimits_only = enforcement.get("cgroup_limits") is False
    else:
        rlimits_only = str(sandbox.get("memory_limit", "")).startswith("rlimits per step")
    if not rlimits_only:
        return []
    return ["memory limit was only an address-space limit on each process (RLIMIT_DATA; no cgroup on the scoring "
            "host): a candidate with several processes could use more, and memory_limit verdicts were read from "
            "out-of-memory messages. Rerun with --require-cgroups on a host with cgroup limits to be sure."]


def _brief_row(row: dict) -> dict:
    keep = ("problem", "language", "sample", "outcome", "seconds", "compile_seconds", "run_seconds", "peak_memory_mb",
            "flaky", "repeat_outcomes")
    brief = {k: row[k] for k in keep if k in row}
    brief["detail"] = str(row.get("detail", ""))[:160]
    return brief


def provenance(run: Run) -> dict:
    m = run.manifest
    keep = ("label", "harness_version", "problem_set", "mode", "extraction", "limit_overrides", "sandbox", "inputs",
            "started_at", "finished_at", "resumed_at", "host")
    result = {k: m[k] for k in keep if k in m}
    result["runtimes"] = {name: {"digest": info.get("digest"), "toolchain": info.get("toolchain"),
                                 "limits": info.get("limits")} for name, info in (m.get("runtimes") or {}).items()}
    result["path"] = str(run.path)
    return result


def trust_flag(row: dict) -> bool:
    """Whether a row's figures carry a mark that says not to rely on them."""
    return bool(set(TRUST_MARKS) & set(row["marks"]))
