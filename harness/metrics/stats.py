"""Uncertainty for pass@k: bootstrap intervals over problems, paired differences, McNemar.

Every figure here is a *ratio of sums over problems*: a problem contributes the sum of its
per-(problem, language) pass@k values and the number of such pairs. For one language each
problem has one pair, so the ratio is the plain mean that ``metrics.summarize`` reports; for
"overall" a problem solved in three languages weighs three pairs, exactly as the summary's
mean over all pairs does. Resampling whole problems (a cluster bootstrap) keeps a problem's
languages together, because they share the problem's difficulty and are not independent.

Methods (Efron & Tibshirani, "An Introduction to the Bootstrap", 1993):
- percentile interval: the alpha/2 and 1 - alpha/2 quantiles of the bootstrap distribution
  (ch. 13), quantiles by linear interpolation (numpy's default);
- BCa interval: bias-corrected and accelerated (ch. 14, eq. 14.9-14.15; Efron 1987, JASA 82),
  bias z0 from the mid-rank of the estimate among the replicates (ties count half, as
  ``scipy.stats.bootstrap`` does) and acceleration from the leave-one-problem-out jackknife;
- paired difference: both runs resampled with the same problem indices; two-sided p-value
  from inverting the percentile interval, with the +1 Monte-Carlo correction (Davison &
  Hinkley, "Bootstrap Methods and their Application", 1997, sec. 4.2; from memory);
- McNemar's test (McNemar 1947, Psychometrika 12), exact form: under the null each discordant
  pair is equally likely either way, so the count is Binomial(b + c, 1/2).
"""

from __future__ import annotations

import math
from dataclasses import asdict, dataclass
from fractions import Fraction
from statistics import NormalDist

import numpy as np

METHODS = ("percentile", "bca")
DEFAULT_RESAMPLES = 10_000
DEFAULT_CONFIDENCE = 0.95
DEFAULT_SEED = 0
BATCH = 2_000  # resamples drawn at once: bounds memory at BATCH x problems indices


@dataclass(frozen=True)
class Interval:
    """A point estimate with its bootstrap interval; ``degenerate`` when every resample gave
    the same value (the interval is then the point itself)."""

    estimate: float
    low: float
    high: float
    method: str
    confidence: float
    resamples: int
    units: int
    degenerate: bool = False

    def as_dict(self) -> dict:
        return asdict(self)


@dataclass(frozen=True)
class Difference:
    """B - A over shared problems, with a paired bootstrap interval and two-sided p-value."""

    a: float
    b: float
    estimate: float
    low: float
    high: float
    p_value: float | None  # None with a single problem: one unit says nothing about spread
    method: str
    confidence: float
    resamples: int
    units: int

    def as_dict(self) -> dict:
        return asdict(self)


def _check(confidence: float, resamples: int, method: str) -> None:
    if not 0 < confidence < 1:
        raise ValueError(f"confidence must be in (0, 1), got {confidence}")
    if resamples < 1:
        raise ValueError(f"resamples must be at least 1, got {resamples}")
    if method not in METHODS:
        raise ValueError(f"method must be one of {', '.join(METHODS)}, got {method!r}")


def _exact_ratio(numerator, weight) -> float:
    """sum(numerator) / sum(weight) in exact rationals, rounded once to the nearest double, so
    that a point estimate never depends on summation order or accumulated rounding. Empty
    input is left to ``_arrays`` to refuse."""
    total = sum((Fraction(w) for w in weight), Fraction(0))
    if not total:
        return float("nan")
    return float(sum((Fraction(x) for x in numerator), Fraction(0)) / total)


def _arrays(*columns) -> list[np.ndarray]:
    arrays = [np.asarray(c, dtype=float) for c in columns]
    size = arrays[0].shape
    if len(size) != 1 or size[0] == 0:
        raise ValueError("need a non-empty one-dimensional array per column (one entry per problem)")
    if any(a.shape != size for a in arrays):
        raise ValueError("columns must have one entry per problem each")
    if np.any(arrays[-1] <= 0):
        raise ValueError("every problem needs a positive weight (its number of (problem, language) pairs)")
    return arrays


def _replicates(columns: list[np.ndarray], statistic, resamples: int, seed: int) -> np.ndarray:
    """The statistic on ``resamples`` resamples of problems drawn with replacement."""
    rng = np.random.default_rng(seed)
    units = columns[0].shape[0]
    out = np.empty(resamples)
    for start in range(0, resamples, BATCH):
        count = min(BATCH, resamples - start)
        index = rng.integers(0, units, size=(count, units))
        out[start:start + count] = statistic(*(c[index] for c in columns))
    return out


def _ratio(numerator: np.ndarray, weight: np.ndarray) -> np.ndarray:
    return numerator.sum(axis=-1) / weight.sum(axis=-1)


def _jackknife_ratio(numerator: np.ndarray, weight: np.ndarray) -> np.ndarray:
    """Leave-one-problem-out values of sum(numerator) / sum(weight)."""
    return (numerator.sum() - numerator) / (weight.sum() - weight)


def _interval(replicates: np.ndarray, estimate: float, jackknife: np.ndarray | None,
              confidence: float, method: str) -> tuple[float, float]:
    alpha = (1 - confidence) / 2
    levels = np.array([alpha, 1 - alpha])
    if method == "bca":
        normal = NormalDist()
        below = np.count_nonzero(replicates < estimate) + np.count_nonzero(replicates <= estimate)
        share = below / (2 * len(replicates))
        z0 = _inverse_cdf(normal, share)
        spread = jackknife.mean() - jackknife
        denominator = 6 * float(np.sum(spread ** 2)) ** 1.5
        accel = float(np.sum(spread ** 3)) / denominator if denominator > 0 else 0.0
        levels = np.array([_bca_level(normal, z0, accel, normal.inv_cdf(level)) for level in levels])
    low, high = np.quantile(replicates, levels)
    return float(low), float(high)


def _inverse_cdf(normal: NormalDist, p: float) -> float:
    if p <= 0:
        return -math.inf
    if p >= 1:
        return math.inf
    return normal.inv_cdf(p)


def _bca_level(normal: NormalDist, z0: float, accel: float, z: float) -> float:
    if math.isinf(z0):
        return 0.0 if z0 < 0 else 1.0
    shifted = z0 + z
    return normal.cdf(z0 + shifted / (1 - accel * shifted))


def bootstrap_ratio(numerator, weight=None, *, confidence: float = DEFAULT_CONFIDENCE,
                    resamples: int = DEFAULT_RESAMPLES, seed: int = DEFAULT_SEED,
                    method: str = "percentile") -> Interval:
    """Interval for sum(numerator) / sum(weight) with problems as the resampled units.

    ``numerator[i]`` is problem i's summed pass@k over its languages, ``weight[i]`` its number
    of languages (default 1: a plain mean). Same seed, same data -> same interval.
    """
    _check(confidence, resamples, method)
    if weight is None:
        weight = [1] * len(numerator)
    estimate = _exact_ratio(numerator, weight)
    numerator, weight = _arrays(numerator, weight)
    replicates = _replicates([numerator, weight], _ratio, resamples, seed)
    if np.ptp(replicates) == 0 or len(numerator) < 2:
        return Interval(estimate, estimate, estimate, method, confidence, resamples, len(numerator), True)
    jackknife = _jackknife_ratio(numerator, weight) if method == "bca" else None
    low, high = _interval(replicates, estimate, jackknife, confidence, method)
    return Interval(estimate, low, high, method, confidence, resamples, len(numerator))


def paired_bootstrap(numerator_a, numerator_b, weight=None, *, confidence: float = DEFAULT_CONFIDENCE,
                     resamples: int = DEFAULT_RESAMPLES, seed: int = DEFAULT_SEED,
                     method: str = "percentile") -> Difference:
    """B - A for two runs over the same problems (same order), resampling problems jointly.

    p-value (two-sided, H0: no difference): twice the smaller tail share of replicates at or
    beyond zero, (count + 1) / (resamples + 1), capped at 1. It is below 1 - confidence
    roughly when the percentile interval excludes zero.
    """
    _check(confidence, resamples, method)
    if weight is None:
        weight = [1] * len(numerator_a)
    a_value = _exact_ratio(numerator_a, weight)
    b_value = _exact_ratio(numerator_b, weight)
    estimate = _exact_ratio([Fraction(b) - Fraction(a) for a, b in zip(numerator_a, numerator_b)], weight)
    numerator_a, numerator_b, weight = _arrays(numerator_a, numerator_b, weight)

    def difference(a, b, w):
        return (b.sum(axis=-1) - a.sum(axis=-1)) / w.sum(axis=-1)

    replicates = _replicates([numerator_a, numerator_b, weight], difference, resamples, seed)
    units = len(weight)
    p_value = bootstrap_p_value(replicates) if units >= 2 else None
    if np.ptp(replicates) == 0 or units < 2:
        return Difference(a_value, b_value, estimate, estimate, estimate, p_value, method, confidence,
                          resamples, units)
    jackknife = None
    if method == "bca":
        jackknife = _jackknife_ratio(numerator_b - numerator_a, weight)
    low, high = _interval(replicates, estimate, jackknife, confidence, method)
    return Difference(a_value, b_value, estimate, low, high, p_value, method, confidence, resamples, units)


def bootstrap_p_value(replicates) -> float:
    """Two-sided p-value for "the difference is zero" from bootstrap replicates of it."""
    replicates = np.asarray(replicates, dtype=float)
    at_or_below = np.count_nonzero(replicates <= 0)
    at_or_above = np.count_nonzero(replicates >= 0)
    tail = (min(at_or_below, at_or_above) + 1) / (len(replicates) + 1)
    return float(min(1.0, 2 * tail))


def mcnemar_exact(a_only: int, b_only: int) -> float:
    """Exact two-sided McNemar p-value from the discordant pairs: ``a_only`` units passed in A
    and failed in B, ``b_only`` the reverse. Computed in exact rational arithmetic:
    p = min(1, 2 * P(X <= min(a_only, b_only))) for X ~ Binomial(a_only + b_only, 1/2).
    """
    if a_only < 0 or b_only < 0:
        raise ValueError(f"discordant counts must be non-negative, got {a_only} and {b_only}")
    total = a_only + b_only
    if total == 0:
        return 1.0
    smaller = min(a_only, b_only)
    tail = Fraction(sum(math.comb(total, i) for i in range(smaller + 1)), 2 ** total)
    return float(min(Fraction(1), 2 * tail))
