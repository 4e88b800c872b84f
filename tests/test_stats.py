"""Bootstrap intervals, paired differences and McNemar's test, checked against scipy.

The reference for the intervals is ``scipy.stats.bootstrap`` (same method name, same data);
its random draws differ from ours, so the two agree only up to Monte-Carlo error. With
20,000 resamples a tail quantile of the bootstrap distribution wanders by a few hundredths
of the distribution's standard error, so the tolerance below (0.2 standard errors) is loose
enough to be stable and still far tighter than an interval's width (about 4 standard errors).
The reference for McNemar's exact test is ``scipy.stats.binomtest`` with p = 1/2.
"""

from __future__ import annotations

import inspect
import math
from fractions import Fraction

import numpy as np
import pytest
import scipy.stats

from harness.metrics import pass_at_k
from harness.metrics.stats import bootstrap_p_value, bootstrap_ratio, mcnemar_exact, paired_bootstrap

RESAMPLES = 20_000


def skewed_pass_rates(seed: int, problems: int, samples: int = 10, k: int = 1) -> np.ndarray:
    """Per-problem pass@k of a model that finds most problems hard: a right-skewed sample."""
    rng = np.random.default_rng(seed)
    chances = rng.beta(0.5, 2.0, size=problems)
    passes = rng.binomial(samples, chances)
    return np.array([pass_at_k(samples, int(c), k) for c in passes])


# scipy 1.15 renamed bootstrap's ``random_state`` to ``rng``; the project allows scipy >= 1.10.
SEED_ARGUMENT = "rng" if "rng" in inspect.signature(scipy.stats.bootstrap).parameters else "random_state"


def scipy_interval(data, statistic, method, paired=False):
    # Reference: scipy.stats.bootstrap, two-sided, 95%.
    return scipy.stats.bootstrap(data, statistic, method=method, n_resamples=RESAMPLES, paired=paired,
                                 vectorized=True, confidence_level=0.95,
                                 **{SEED_ARGUMENT: np.random.default_rng(12345)})


def tolerance(reference) -> float:
    return 0.2 * reference.standard_error


@pytest.mark.parametrize("method", ["percentile", "bca"])
def test_interval_of_a_mean_matches_scipy_bootstrap(method):
    values = skewed_pass_rates(seed=3, problems=40, k=1)
    ours = bootstrap_ratio(values, method=method, resamples=RESAMPLES, seed=1)
    reference = scipy_interval((values,), np.mean, method)
    assert ours.estimate == pytest.approx(values.mean())
    assert ours.low == pytest.approx(reference.confidence_interval.low, abs=tolerance(reference))
    assert ours.high == pytest.approx(reference.confidence_interval.high, abs=tolerance(reference))
    assert ours.low < ours.estimate < ours.high


def test_bca_and_percentile_differ_on_skewed_data_as_scipy_says():
    # The two methods must not be interchangeable: on right-skewed data BCa shifts both ends
    # upwards relative to the percentile interval (scipy.stats.bootstrap shows the same shift).
    values = skewed_pass_rates(seed=11, problems=25, samples=20, k=5)
    percentile = bootstrap_ratio(values, method="percentile", resamples=RESAMPLES, seed=4)
    bca = bootstrap_ratio(values, method="bca", resamples=RESAMPLES, seed=4)
    ref_percentile = scipy_interval((values,), np.mean, "percentile").confidence_interval
    ref_bca = scipy_interval((values,), np.mean, "bca").confidence_interval
    assert np.sign(bca.low - percentile.low) == np.sign(ref_bca.low - ref_percentile.low)
    assert np.sign(bca.high - percentile.high) == np.sign(ref_bca.high - ref_percentile.high)


@pytest.mark.parametrize("method", ["percentile", "bca"])
def test_overall_interval_resamples_whole_problems_like_scipy_paired_bootstrap(method):
    # Overall pass@k is sum(pass@k over pairs) / number of pairs, and a problem carries all of
    # its languages. scipy.stats.bootstrap with paired=True resamples the same indices in
    # every array: the reference for this cluster (ratio-of-sums) bootstrap.
    rng = np.random.default_rng(5)
    languages = rng.integers(1, 4, size=35)
    sums = np.array([skewed_pass_rates(int(seed), int(n)).sum() for seed, n in zip(rng.integers(0, 10**6, 35), languages)])
    ours = bootstrap_ratio(sums, languages, method=method, resamples=RESAMPLES, seed=2)

    def ratio(s, w, axis=-1):
        return s.sum(axis=axis) / w.sum(axis=axis)

    reference = scipy_interval((sums, languages.astype(float)), ratio, method, paired=True)
    assert ours.estimate == pytest.approx(sums.sum() / languages.sum())
    assert ours.low == pytest.approx(reference.confidence_interval.low, abs=tolerance(reference))
    assert ours.high == pytest.approx(reference.confidence_interval.high, abs=tolerance(reference))


@pytest.mark.parametrize("method", ["percentile", "bca"])
def test_paired_difference_interval_matches_scipy_paired_bootstrap(method):
    a = skewed_pass_rates(seed=21, problems=50)
    b = np.clip(a + np.random.default_rng(22).normal(0.05, 0.15, size=50), 0, 1)
    ours = paired_bootstrap(a, b, method=method, resamples=RESAMPLES, seed=3)

    def difference(x, y, axis=-1):
        return y.mean(axis=axis) - x.mean(axis=axis)

    reference = scipy_interval((a, b), difference, method, paired=True)
    assert ours.estimate == pytest.approx(b.mean() - a.mean())
    assert (ours.a, ours.b) == (pytest.approx(a.mean()), pytest.approx(b.mean()))
    assert ours.low == pytest.approx(reference.confidence_interval.low, abs=tolerance(reference))
    assert ours.high == pytest.approx(reference.confidence_interval.high, abs=tolerance(reference))


def test_paired_p_value_matches_the_tail_share_of_scipys_bootstrap_distribution():
    # Reference: twice the smaller share of scipy's bootstrap replicates on either side of 0
    # (percentile-interval inversion, Efron & Tibshirani 1993 ch. 15/16, from memory).
    a = skewed_pass_rates(seed=31, problems=40)
    b = a + np.random.default_rng(32).normal(0.02, 0.12, size=40)  # a modest, noisy gain
    ours = paired_bootstrap(a, b, resamples=RESAMPLES, seed=8)
    reference = scipy_interval((a, b), lambda x, y, axis=-1: y.mean(axis=axis) - x.mean(axis=axis),
                               "percentile", paired=True)
    replicates = reference.bootstrap_distribution
    expected = min(1.0, 2 * min(np.mean(replicates <= 0), np.mean(replicates >= 0)))
    assert 0.01 < expected < 0.5  # the data give a p-value worth comparing
    assert ours.p_value == pytest.approx(expected, abs=0.015)  # ~4 Monte-Carlo standard deviations


def test_p_value_is_below_alpha_exactly_when_the_percentile_interval_excludes_zero():
    for seed in range(12):
        a = skewed_pass_rates(seed=100 + seed, problems=30)
        shift = 0.01 * seed
        b = np.clip(a + np.random.default_rng(seed).normal(shift, 0.1, size=30), 0, 1)
        result = paired_bootstrap(a, b, resamples=4000, seed=seed, confidence=0.9)
        excludes_zero = result.low > 0 or result.high < 0
        if excludes_zero:
            assert result.p_value <= 0.1 + 2 / 4001
        else:
            assert result.p_value >= 0.1 - 2 / 4001


def test_bootstrap_p_value_counts_both_tails_with_the_plus_one_correction():
    # Davison & Hinkley (1997) sec. 4.2: Monte-Carlo p-values (count + 1) / (B + 1).
    assert bootstrap_p_value([0.1] * 99) == pytest.approx(2 * 1 / 100)
    assert bootstrap_p_value([-0.1] * 24 + [0.1] * 75) == pytest.approx(2 * 25 / 100)
    assert bootstrap_p_value([0.0] * 10) == 1.0


def test_identical_runs_give_zero_difference_and_p_value_one():
    a = skewed_pass_rates(seed=41, problems=20)
    result = paired_bootstrap(a, a.copy(), resamples=2000, seed=0)
    assert (result.estimate, result.low, result.high) == (0.0, 0.0, 0.0)
    assert result.p_value == 1.0


def test_same_seed_gives_the_same_interval_and_another_seed_a_different_one():
    values = skewed_pass_rates(seed=51, problems=30, samples=10, k=3)
    first = bootstrap_ratio(values, resamples=3000, seed=9)
    again = bootstrap_ratio(values, resamples=3000, seed=9)
    other = bootstrap_ratio(values, resamples=3000, seed=10, method="percentile")
    assert first == again
    assert (first.low, first.high) != (other.low, other.high)


def test_all_problems_equal_gives_a_point_interval_not_nan():
    # scipy.stats.bootstrap returns NaN (DegenerateDataWarning) for BCa here; a report needs a
    # number, and every resample equals the estimate, so the interval is that point.
    for method in ("percentile", "bca"):
        result = bootstrap_ratio(np.ones(12), method=method, resamples=500)
        assert (result.low, result.estimate, result.high) == (1.0, 1.0, 1.0)
        assert result.degenerate


def test_single_problem_difference_has_no_p_value():
    result = paired_bootstrap([0.2], [0.8], resamples=500)
    assert result.estimate == pytest.approx(0.6)
    assert result.p_value is None


def test_bad_inputs_are_rejected_with_a_reason():
    with pytest.raises(ValueError, match="non-empty"):
        bootstrap_ratio([])
    with pytest.raises(ValueError, match="confidence"):
        bootstrap_ratio([0.5, 0.5], confidence=1.5)
    with pytest.raises(ValueError, match="method"):
        bootstrap_ratio([0.5, 0.5], method="studentized")
    with pytest.raises(ValueError, match="one entry per problem"):
        paired_bootstrap([0.1, 0.2], [0.3])
    with pytest.raises(ValueError, match="positive weight"):
        bootstrap_ratio([0.5, 0.5], [1, 0])
    with pytest.raises(ValueError, match="non-negative"):
        mcnemar_exact(-1, 3)


def test_mcnemar_exact_matches_scipy_binomtest_two_sided():
    # Reference: scipy.stats.binomtest(b, b + c, p=0.5, alternative="two-sided").
    pairs = [(b, c) for b in range(13) for c in range(13) if b + c] + [(3, 40), (100, 130), (57, 57)]
    for a_only, b_only in pairs:
        expected = scipy.stats.binomtest(a_only, a_only + b_only, 0.5, alternative="two-sided").pvalue
        assert mcnemar_exact(a_only, b_only) == pytest.approx(expected, rel=1e-12, abs=1e-300)


def test_mcnemar_exact_small_cases_by_hand():
    # Binomial(n, 1/2) tails computed with fractions.Fraction and math.comb.
    assert mcnemar_exact(0, 5) == float(2 * Fraction(1, 32))
    assert mcnemar_exact(1, 6) == float(2 * Fraction(1 + math.comb(7, 1), 2 ** 7))
    assert mcnemar_exact(4, 4) == 1.0
    assert mcnemar_exact(0, 0) == 1.0


def test_point_estimates_are_exact_means_rounded_once():
    # Source: fractions.Fraction gives the exact sum of the doubles; float(Fraction) rounds once.
    from fractions import Fraction

    values = [0.1, 0.2, 0.3, 0.7, 0.9]
    exact = float(sum(map(Fraction, values)) / len(values))
    assert bootstrap_ratio(values, resamples=200).estimate == exact
    assert bootstrap_ratio(list(reversed(values)), resamples=200).estimate == exact
    third = [Fraction(1, 3)] * 3
    assert bootstrap_ratio(third, resamples=200).estimate == float(Fraction(1, 3))
    diff = paired_bootstrap(values, list(reversed(values)), resamples=200)
    assert diff.estimate == float((sum(map(Fraction, reversed(values))) - sum(map(Fraction, values))) / 5)
