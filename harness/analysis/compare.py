"""Two runs side by side: is checkpoint B better than A, by how much, and how sure are we?

Differences are B - A over the (problem, language) pairs both runs scored, with a paired
bootstrap over problems (``stats.paired_bootstrap``). For one-sample (greedy) runs the exact
McNemar test on discordant pairs is added. Problems whose solved status changed are listed
("solved" = at least one sample passed). Manifests are compared so that a difference caused
by a changed problem set, runtime, limit or sample count is not mistaken for progress.
"""

from __future__ import annotations

import json
from collections import Counter

from ..vocabulary import OUTCOMES
from ..store import Run
from .report import MARKS, Settings, by_problem, groups, marks, pair_values
from ..metrics.stats import mcnemar_exact, paired_bootstrap

GATE_RULE = ("fails when the upper bound of the interval for the overall pass@k difference (B - A), at the "
             "first --k, is below -DELTA percentage points: B is worse than A by more than DELTA points "
             "with the chosen confidence")


def compare_manifests(a: Run, b: Run) -> list[str]:
    """Differences in what was run that make B - A more than a model difference."""
    ma, mb = a.manifest, b.manifest
    warnings = []
    if not ma or not mb:
        return [f"{(a if not ma else b).path}: no manifest; cannot check that the runs are comparable"]
    sa, sb = ma.get("problem_set") or {}, mb.get("problem_set") or {}
    if sa.get("name") != sb.get("name"):
        warnings.append(f"problem set differs: {sa.get('name')} vs {sb.get('name')}")
    elif sa.get("digest") != sb.get("digest"):
        warnings.append(f"problem set {sa.get('name')} changed between the runs (digest "
                        f"{str(sa.get('digest'))[:12]} vs {str(sb.get('digest'))[:12]})")
    if ma.get("mode") != mb.get("mode"):
        warnings.append(f"mode differs: {ma.get('mode')} vs {mb.get('mode')}")
    # Runs made before extraction was recorded used the textual rules, what --extract strict keeps.
    ea, eb = (m.get("extraction", "textual (not recorded)") for m in (ma, mb))
    if ea != eb:
        warnings.append(f"extraction policy differs: {ea} vs {eb}; the same text can become a different program")
    ra, rb = ma.get("runtimes") or {}, mb.get("runtimes") or {}
    for name in sorted(set(ra) ^ set(rb)):
        warnings.append(f"runtime {name} is only in {'A' if name in ra else 'B'}")
    for name in sorted(set(ra) & set(rb)):
        if ra[name].get("digest") != rb[name].get("digest"):
            warnings.append(f"runtime {name} differs (digest {str(ra[name].get('digest'))[:12]} vs "
                            f"{str(rb[name].get('digest'))[:12]})")
        if ra[name].get("toolchain") != rb[name].get("toolchain"):
            warnings.append(f"runtime {name}: toolchain differs ({ra[name].get('toolchain')} vs "
                            f"{rb[name].get('toolchain')})")
        for step in ("compile", "run"):
            la = (ra[name].get("limits") or {}).get(step)
            lb = (rb[name].get("limits") or {}).get(step)
            if la != lb:
                la, lb = la or {}, lb or {}
                changed = ", ".join(f"{key} {la.get(key)} vs {lb.get(key)}" for key in sorted(set(la) | set(lb))
                                    if la.get(key) != lb.get(key))
                warnings.append(f"runtime {name}: {step} limits differ ({changed})")
    if (ma.get("limit_overrides") or {}) != (mb.get("limit_overrides") or {}):
        warnings.append(f"limit overrides differ: {json.dumps(ma.get('limit_overrides'))} vs "
                        f"{json.dumps(mb.get('limit_overrides'))}")
    if (ma.get("sandbox") or {}).get("backend") != (mb.get("sandbox") or {}).get("backend"):
        warnings.append(f"sandbox differs: {(ma.get('sandbox') or {}).get('backend')} vs "
                        f"{(mb.get('sandbox') or {}).get('backend')}")
    return warnings


def sample_warnings(a: Run, b: Run) -> list[str]:
    """Per language, whether the runs drew different numbers of samples per problem."""
    ca, cb = a.counts(), b.counts()
    warnings = []
    for language in sorted({lang for _, lang in ca} | {lang for _, lang in cb}):
        na = sorted({n for (_, lang), (n, _) in ca.items() if lang == language})
        nb = sorted({n for (_, lang), (n, _) in cb.items() if lang == language})
        if na and nb and na != nb:
            warnings.append(f"{language}: sample counts differ (A {_span(na)}, B {_span(nb)} per problem)")
    return warnings


def _span(values: list[int]) -> str:
    return str(values[0]) if len(values) == 1 else f"{values[0]}-{values[-1]}"


def describe_pair(outcomes: Counter) -> dict:
    n = sum(v for o, v in outcomes.items() if o != "infra_error")
    c = outcomes["passed"]
    failures = {o: outcomes[o] for o in OUTCOMES if o != "passed" and outcomes.get(o)}
    if n == 1 and not outcomes.get("infra_error"):
        text = next(o for o in OUTCOMES if outcomes.get(o))
    else:
        text = f"{c}/{n} passed" + (" (" + ", ".join(f"{o} {v}" for o, v in failures.items()) + ")" if failures else "")
    return {"n": n, "c": c, "outcomes": failures | ({"passed": c} if c else {}), "text": text}


def compare_runs(a: Run, b: Run, settings: Settings, tags: bool = True) -> dict:
    ca, cb = a.counts(), b.counts()
    shared = sorted(set(ca) & set(cb))
    greedy = bool(shared) and all(ca[p][0] == 1 and cb[p][0] == 1 for p in shared)
    problem_info = {**a.problems, **b.problems}
    rows = []
    for group in groups(problem_info, set(a.outcomes) | set(b.outcomes), tags):
        pairs = [p for p in group.pairs if p in ca and p in cb]
        problems = len({p for p, _ in pairs})
        infra = sum(run.outcomes.get(p, Counter())["infra_error"] for run in (a, b) for p in group.pairs)
        figures = {}
        for k in settings.ks:
            figures[str(k)] = None
            if not pairs:
                continue
            left = by_problem(pairs, pair_values({p: ca[p] for p in pairs}, k))
            right = by_problem(pairs, pair_values({p: cb[p] for p in pairs}, k))
            if left is None or right is None:
                continue
            figures[str(k)] = paired_bootstrap(left[1], right[1], left[2], confidence=settings.confidence,
                                               resamples=settings.resamples, seed=settings.seed,
                                               method=settings.method).as_dict()
        mcnemar = None
        if greedy and pairs:
            a_only = sum(ca[p][1] == 1 and cb[p][1] == 0 for p in pairs)
            b_only = sum(ca[p][1] == 0 and cb[p][1] == 1 for p in pairs)
            mcnemar = {"a_only": a_only, "b_only": b_only, "p_value": mcnemar_exact(a_only, b_only)}
        missing = [k for k in settings.ks if figures[str(k)] is None]
        rows.append({"group": group.name, "kind": group.kind, "problems": problems, "pairs": len(pairs),
                     "infra_errors": infra, "min_samples": min((min(ca[p][0], cb[p][0]) for p in pairs), default=0),
                     "pass_at_k": figures, "mcnemar": mcnemar, "marks": marks(problems, infra, missing)})
    flips = {"passed_to_failed": [], "failed_to_passed": []}
    for pair in shared:
        solved_a, solved_b = ca[pair][1] > 0, cb[pair][1] > 0
        if solved_a != solved_b:
            entry = {"problem": pair[0], "language": pair[1],
                     "difficulty": problem_info.get(pair[0], {}).get("difficulty"),
                     "a": describe_pair(a.outcomes[pair]), "b": describe_pair(b.outcomes[pair])}
            flips["passed_to_failed" if solved_a else "failed_to_passed"].append(entry)
    only_a, only_b = len(set(ca) - set(cb)), len(set(cb) - set(ca))
    warnings = compare_manifests(a, b) + sample_warnings(a, b)
    if only_a or only_b:
        warnings.append(f"{only_a} (problem, language) pair(s) only in A and {only_b} only in B: "
                        f"compared over the {len(shared)} shared pair(s)")
    warnings += [f"A: {w}" for w in a.warnings] + [f"B: {w}" for w in b.warnings]
    infra = sum(r["infra_errors"] for r in rows if r["kind"] == "overall")
    if infra:
        warnings.append(f"{infra} infra error(s) across the two runs are excluded from pass@k; rerun "
                        "'assay score' on the affected run(s) to retry them")
    return {"a": {"path": str(a.path), "label": a.label}, "b": {"path": str(b.path), "label": b.label},
            "settings": settings.as_dict(), "shared_pairs": len(shared), "only_a": only_a, "only_b": only_b,
            "greedy": greedy, "groups": rows, "flips": flips, "warnings": warnings, "marks": MARKS}


def gate(result: dict, delta_points: float) -> dict:
    """The --fail-if-worse check; raises ValueError when the figure it needs is not available."""
    k = result["settings"]["ks"][0]
    overall = next(r for r in result["groups"] if r["kind"] == "overall")
    figure = overall["pass_at_k"][str(k)]
    if figure is None:
        raise ValueError(f"--fail-if-worse needs the overall pass@{k} difference, which is n/a "
                         "(no shared problems, or k above the samples per problem)")
    return {"k": k, "delta_points": delta_points, "difference_points": 100 * figure["estimate"],
            "upper_points": 100 * figure["high"], "failed": 100 * figure["high"] < -delta_points, "rule": GATE_RULE}
