"""pass@k and the run summary.

pass@k is the unbiased estimator of Chen et al. (2021), "Evaluating Large Language Models
Trained on Code": for a problem with n samples of which c pass,
    pass@k = 1 - C(n - c, k) / C(n, k),
computed exactly in rational arithmetic (``math.comb``, ``fractions``) and rounded once, so
that two correct tools print the same double.
"""

from __future__ import annotations

import math
from collections import defaultdict
from fractions import Fraction
from typing import Iterable


from ..vocabulary import OUTCOMES


def pass_at_k_exact(n: int, c: int, k: int) -> Fraction:
    """pass@k as an exact rational, 1 - C(n - c, k) / C(n, k) with ``math.comb``."""
    if not 0 <= c <= n:
        raise ValueError(f"need 0 <= c <= n, got n={n}, c={c}")
    if k < 1 or k > n:
        raise ValueError(f"k={k} is outside 1..n (n={n}): pass@{k} is not available")
    if n - c < k:
        return Fraction(1)
    return 1 - Fraction(math.comb(n - c, k), math.comb(n, k))


def pass_at_k(n: int, c: int, k: int) -> float:
    """Probability that at least one of k samples drawn without replacement from n passes:
    the exact value rounded once to the nearest double."""
    return float(pass_at_k_exact(n, c, k))


def exact_mean(values: list[Fraction]) -> float:
    """The mean in exact rationals, rounded once: the same figure in any order of rows."""
    return float(sum(values, Fraction(0)) / len(values))


def parse_ks(text: str) -> list[int]:
    try:
        ks = sorted({int(part) for part in text.split(",") if part.strip()})
    except ValueError:
        raise ValueError(f"--k expects comma-separated positive integers, got {text!r}") from None
    if not ks or ks[0] < 1:
        raise ValueError(f"--k expects comma-separated positive integers, got {text!r}")
    return ks


def summarize(rows: Iterable[dict], ks: list[int], kinds: dict[str, str] | None = None) -> dict:
    """Per (problem, language) counts, then pass@k averaged per language and overall; with
    ``kinds`` (problem id -> function or program) also per kind of problem, over every language.

    Infra errors are not the candidate's doing, so they count neither as samples nor passes.
    A k above any problem's sample count makes that aggregate ``None`` (not available).
    """
    samples: dict[tuple[str, str], list[int]] = defaultdict(lambda: [0, 0])
    outcomes: dict[str, dict[str, int]] = defaultdict(lambda: dict.fromkeys(OUTCOMES, 0))
    flaky: dict[str, int] = defaultdict(int)
    pair_outcomes: dict[tuple[str, str], dict[str, int]] = defaultdict(lambda: dict.fromkeys(OUTCOMES, 0))
    for row in rows:
        language = row["language"]
        outcomes[language][row["outcome"]] += 1
        pair_outcomes[(row["problem"], language)][row["outcome"]] += 1
        flaky[language] += bool(row.get("flaky"))
        if row["outcome"] == "infra_error":
            continue
        counts = samples[(row["problem"], language)]
        counts[0] += 1
        counts[1] += row["outcome"] == "passed"

    exact: dict[tuple[str, str], dict[str, Fraction | None]] = {}
    for (problem, language), (n, c) in samples.items():
        exact[(problem, language)] = {str(k): (pass_at_k_exact(n, c, k) if k <= n else None) for k in ks}
    per_pair = {pair: {k: (None if v is None else float(v)) for k, v in values.items()}
                for pair, values in exact.items()}

    def mean_over(pairs: list[tuple[str, str]]) -> dict[str, float | None]:
        result: dict[str, float | None] = {}
        for k in ks:
            values = [exact[p][str(k)] for p in pairs]
            result[str(k)] = None if not values or any(v is None for v in values) else exact_mean(values)
        return result

    languages = sorted({language for _, language in samples} | set(outcomes))
    by_language = {lang: mean_over([p for p in per_pair if p[1] == lang]) for lang in languages}
    kind_of = {pair: (kinds or {}).get(pair[0], "function") for pair in per_pair}
    by_kind = {kind: mean_over([p for p in per_pair if kind_of[p] == kind]) for kind in sorted(set(kind_of.values()))}
    problems_per_language = {lang: sum(1 for p in per_pair if p[1] == lang) for lang in languages}
    min_samples = {
        lang: min((samples[p][0] for p in per_pair if p[1] == lang), default=0) for lang in languages
    }
    return {
        "ks": ks,
        "pass_at_k": {"overall": mean_over(list(per_pair)), "by_language": by_language},
        "outcomes": {lang: outcomes[lang] for lang in languages},
        "problems": problems_per_language,  # problems scored in each language
        "kinds": {kind: {"pass_at_k": by_kind[kind],
                         "problems": len({p[0] for p in per_pair if kind_of[p] == kind}),
                         "pairs": sum(1 for p in per_pair if kind_of[p] == kind),
                         "samples": sum(samples[p][0] for p in per_pair if kind_of[p] == kind),
                         "outcomes": {o: sum(counts[o] for pair, counts in pair_outcomes.items()
                                             if (kinds or {}).get(pair[0], "function") == kind) for o in OUTCOMES}}
                  for kind in by_kind} if kinds is not None else {},
        "problems_overall": len({problem for problem, _ in per_pair}),  # distinct problems, any language
        "pairs": len(per_pair),  # (problem, language) pairs: what the overall figure averages over
        "min_samples_per_problem": min_samples,
        "samples": sum(n for n, _ in samples.values()),
        "infra_errors": sum(o["infra_error"] for o in outcomes.values()),
        "flaky": {lang: flaky[lang] for lang in languages if flaky[lang]},
        "per_problem": {
            f"{problem}/{language}": {"n": samples[(problem, language)][0], "c": samples[(problem, language)][1],
                                      "pass_at_k": values}
            for (problem, language), values in sorted(per_pair.items())
        },
    }
