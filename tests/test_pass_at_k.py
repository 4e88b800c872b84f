"""The pass@k estimator against exact arithmetic and scipy.

Source of the formula: Chen et al. (2021), "Evaluating Large Language Models Trained on Code",
the unbiased estimator pass@k = E[1 - C(n-c, k) / C(n, k)] over problems.
"""

from fractions import Fraction
from math import comb

import pytest
from hypothesis import given
from hypothesis import strategies as st
from scipy.special import comb as scipy_comb

from harness.metrics import parse_ks, pass_at_k, summarize


def exact_pass_at_k(n: int, c: int, k: int) -> Fraction:
    """1 - C(n-c, k) / C(n, k) in exact rationals (Python's fractions and math.comb)."""
    return 1 - Fraction(comb(n - c, k), comb(n, k))


@given(st.integers(1, 200).flatmap(lambda n: st.tuples(st.just(n), st.integers(0, n), st.integers(1, n))))
def test_pass_at_k_matches_exact_rational_formula(nck):
    n, c, k = nck
    assert pass_at_k(n, c, k) == pytest.approx(float(exact_pass_at_k(n, c, k)), abs=1e-12)


@pytest.mark.parametrize("n,c,k", [(10, 3, 1), (10, 3, 5), (100, 7, 10), (200, 1, 100), (50, 0, 10), (20, 20, 5)])
def test_pass_at_k_matches_scipy_exact_binomials(n, c, k):
    # scipy.special.comb(..., exact=True) as an independent binomial implementation.
    expected = 1 - scipy_comb(n - c, k, exact=True) / scipy_comb(n, k, exact=True)
    assert pass_at_k(n, c, k) == pytest.approx(expected, abs=1e-12)


def test_pass_at_1_is_the_fraction_of_passing_samples():
    # With k = 1 the estimator reduces to c / n (follows from the formula).
    assert pass_at_k(8, 3, 1) == pytest.approx(3 / 8)


def test_product_form_stays_finite_where_binomials_overflow_floats():
    # C(2000, 1000) is far beyond float range; the product form must still give a probability.
    value = pass_at_k(2000, 5, 1000)
    assert value == pytest.approx(float(exact_pass_at_k(2000, 5, 1000)), abs=1e-12)


def test_k_above_sample_count_is_refused():
    with pytest.raises(ValueError, match="not available"):
        pass_at_k(5, 2, 10)


def rows(pairs):
    for problem, language, outcomes in pairs:
        for i, outcome in enumerate(outcomes):
            yield {"problem": problem, "language": language, "sample": i, "outcome": outcome}


def test_summary_averages_per_language_and_over_all_pairs():
    data = [
        ("p1", "python", ["passed", "wrong_answer"]),
        ("p2", "python", ["passed", "passed"]),
        ("p1", "lua", ["timeout", "timeout"]),
    ]
    summary = summarize(rows(data), [1, 2])
    assert summary["pass_at_k"]["by_language"]["python"]["1"] == pytest.approx((0.5 + 1.0) / 2)
    assert summary["pass_at_k"]["by_language"]["lua"]["1"] == 0.0
    assert summary["pass_at_k"]["overall"]["1"] == pytest.approx((0.5 + 1.0 + 0.0) / 3)
    assert summary["pass_at_k"]["overall"]["2"] == pytest.approx((1.0 + 1.0 + 0.0) / 3)
    assert summary["outcomes"]["lua"]["timeout"] == 2


def test_summary_reports_k_beyond_samples_as_not_available():
    summary = summarize(rows([("p1", "python", ["passed", "passed", "wrong_answer"])]), [1, 5])
    assert summary["pass_at_k"]["by_language"]["python"]["5"] is None
    assert summary["pass_at_k"]["overall"]["5"] is None


def test_infra_errors_count_neither_as_samples_nor_failures():
    summary = summarize(rows([("p1", "python", ["passed", "infra_error"])]), [1])
    assert summary["pass_at_k"]["overall"]["1"] == 1.0
    assert summary["samples"] == 1
    assert summary["infra_errors"] == 1


@pytest.mark.parametrize("text,expected", [("1,10,100", [1, 10, 100]), ("5, 1", [1, 5]), ("3,3", [3])])
def test_k_list_parsing(text, expected):
    assert parse_ks(text) == expected


@pytest.mark.parametrize("text", ["", "0", "a,b", "-1"])
def test_k_list_parsing_rejects_nonsense(text):
    with pytest.raises(ValueError):
        parse_ks(text)


@given(st.integers(1, 300).flatmap(lambda n: st.tuples(st.just(n), st.integers(0, n), st.integers(1, n))))
def test_pass_at_k_is_the_nearest_double_to_the_exact_value(nck):
    # Source: fractions.Fraction -> float conversion is correctly rounded (Python docs), so two
    # correct tools agree to the last bit, not merely within 1e-12.
    n, c, k = nck
    assert pass_at_k(n, c, k) == float(exact_pass_at_k(n, c, k))


def test_three_eighths_is_printed_as_three_eighths():
    # 1 - C(5, 2) / C(8, 2) = 1 - 10/28 = 9/14; 1 - C(5, 1)/C(8, 1) = 3/8 = 0.375 exactly.
    assert pass_at_k(8, 3, 1) == 0.375
    rows = [{"problem": "p", "language": "x", "outcome": "passed" if i < 3 else "wrong_answer"} for i in range(8)]
    assert summarize(rows, [1])["pass_at_k"]["overall"]["1"] == 0.375


@given(st.lists(st.tuples(st.integers(1, 12), st.integers(0, 12)), min_size=1, max_size=25), st.randoms())
def test_summary_means_are_exact_and_independent_of_row_order(pairs, rng):
    rows = []
    for index, (n, c) in enumerate(pairs):
        c = min(c, n)
        rows += [{"problem": f"p{index}", "language": "x", "outcome": "passed" if i < c else "wrong_answer"}
                 for i in range(n)]
    expected = float(sum(exact_pass_at_k(min(n, 12), min(c, n), 1) for n, c in pairs) / len(pairs))
    assert summarize(rows, [1])["pass_at_k"]["overall"]["1"] == expected
    rng.shuffle(rows)
    assert summarize(rows, [1])["pass_at_k"]["overall"]["1"] == expected
