"""The built-in checkers of program problems, against hand-worked cases (and the float checker
against the standard library's math.isclose, which defines the rule it applies)."""

from __future__ import annotations

import math
import random

import pytest

from harness.engine.checkers import check, exact, floats, normal_lines, number, tokens, unordered_lines
from harness.problems import CheckerSpec, FloatRule


# --- exact: equal after trailing whitespace and trailing empty lines are dropped ---------------------

@pytest.mark.parametrize("expected,actual", [
    ("6\n", "6"),                      # no final newline
    ("6\n", "6\n\n\n"),                # extra blank lines at the end
    ("1 2\n3\n", "1 2   \n3\t\n"),     # trailing spaces and tabs on a line
    ("1 2\n3\n", "1 2\r\n3\r\n"),      # Windows line ends
    ("", ""),
    ("", "\n\n"),
])
def test_exact_accepts_what_differs_only_in_trailing_whitespace(expected, actual):
    assert exact(expected, actual) is None


@pytest.mark.parametrize("expected,actual,detail", [
    ("6\n", "7\n", "line 1: expected '6', got '7'"),
    ("1\n2\n", "1\n", "line 2: expected '2', got the end of the output (1 line)"),
    ("1\n", "1\n2\n", "line 2: expected the end of the output (1 line), got '2'"),
    ("1 2\n", " 1 2\n", "line 1: expected '1 2', got ' 1 2'"),        # leading space counts
    ("1 2\n", "1  2\n", "line 1: expected '1 2', got '1  2'"),        # inner spacing counts
    ("a\n", "\na\n", "line 1: expected 'a', got ''"),                 # a leading blank line counts
])
def test_exact_names_the_first_differing_line(expected, actual, detail):
    assert exact(expected, actual) == detail


def test_a_long_line_is_clipped_in_the_detail():
    detail = exact("x\n", "y" * 5000 + "\n")
    assert detail.startswith("line 1: expected 'x', got 'yyyy") and detail.endswith("...") and len(detail) < 120


def test_normal_lines_keeps_inner_blank_lines():
    assert normal_lines("a\n\nb  \n\n") == ["a", "", "b"]


# --- tokens ------------------------------------------------------------------------------------------

def test_tokens_ignore_how_whitespace_is_laid_out():
    assert tokens("1 2 3\n4\n", "1\n2\t3    4") is None


@pytest.mark.parametrize("expected,actual,detail", [
    ("1 2 3", "1 5 3", "token 2 (line 1): expected '2', got '5'"),
    ("1 2 3", "1 2", "token 3: expected '3', got the end of the output (2 of 3 tokens)"),
    ("1 2", "1\n2 3", "token 3 (line 2): expected the end of the output (2 tokens), got '3'"),
    ("3", "3.0", "token 1 (line 1): expected '3', got '3.0'"),  # tokens compare as text
])
def test_tokens_name_the_first_differing_token(expected, actual, detail):
    assert tokens(expected, actual) == detail


def test_a_no_break_space_is_not_whitespace_between_tokens():
    # U+00A0 is whitespace to Python's str.split(), but not to a contest checker (ASCII only).
    assert tokens("1 2", "1\u00a02") is not None


# --- floats: PEP 485 closeness per numeric token -----------------------------------------------------

def test_floats_accept_a_number_within_the_tolerance():
    rule = FloatRule(rel=1e-6, abs=1e-9)
    assert floats("0.333333 ok\n", "0.33333331 ok", rule) is None
    assert floats("3", "3.0000000001", rule) is None  # an integer token is a number too
    assert floats("2.5e3", "2500", rule) is None


def test_floats_name_the_token_and_the_tolerance():
    detail = floats("0.5 1.5", "0.5 1.6", FloatRule(rel=1e-6, abs=1e-9))
    assert detail == "token 2 (line 1): expected '1.5', got '1.6' (tolerance rel 1e-06, abs 1e-09)"


def test_floats_compare_words_exactly_and_refuse_a_word_for_a_number():
    rule = FloatRule(rel=1e-3, abs=0.0)
    assert floats("YES 1.0", "YES 1.0", rule) is None
    assert floats("YES 1.0", "yes 1.0", rule) is not None
    assert floats("1.0", "one", rule) is not None


def test_floats_nan_and_infinities_follow_the_function_kinds_rule():
    rule = FloatRule()
    assert floats("nan", "NaN", rule) is None                   # NaN meets NaN
    assert floats("inf", "Infinity", rule) is None
    assert floats("inf", "-inf", rule) is not None
    assert floats("1e308", "inf", rule) is not None              # no finite value meets an infinity


def test_floats_agree_with_math_isclose_on_random_pairs():
    # Source of truth: Python's math.isclose (PEP 485), the rule FloatRule names; the checker
    # reads both tokens from their printed form, so the pairs are printed with repr().
    rng = random.Random(17)
    for _ in range(2000):
        expected = rng.uniform(-1e6, 1e6) * 10 ** rng.randint(-12, 6)
        actual = expected * (1 + rng.choice([-1, 1]) * 10 ** rng.uniform(-12, -2)) + rng.uniform(-1e-6, 1e-6)
        rel, abs_ = 10 ** rng.uniform(-9, -3), rng.choice([0.0, 1e-9, 1e-6])
        verdict = floats(repr(expected), repr(actual), FloatRule(rel=rel, abs=abs_)) is None
        assert verdict == math.isclose(actual, expected, rel_tol=rel, abs_tol=abs_), (expected, actual, rel, abs_)


def test_number_reads_what_programs_print():
    assert number("42") == 42 and isinstance(number("42"), int)
    assert number("-0.5") == -0.5 and number("+.5") == 0.5 and number("1e-3") == 0.001
    assert math.isnan(number("nan")) and number("-Infinity") == -math.inf
    # Not numbers: Python's float() would take "1_000" and " 1", a contest checker does not.
    assert number("1_000") is None and number("0x10") is None and number("1.2.3") is None


# --- unordered lines ---------------------------------------------------------------------------------

def test_unordered_lines_accept_any_order_with_the_same_counts():
    assert unordered_lines("a 1\nb 2\nb 2\n", "b 2\na 1  \nb 2") is None


@pytest.mark.parametrize("expected,actual,detail", [
    ("a\nb\nb\n", "b\na\n", "expected line 'b' 2 times, got it once (lines in any order)"),
    ("a\n", "a\nc\n", "unexpected line 'c': expected 0 times, got it once (lines in any order)"),
    ("a\nb\n", "a\na\n", "expected line 'b' once, got it 0 times (lines in any order)"),
])
def test_unordered_lines_name_the_first_line_whose_count_differs(expected, actual, detail):
    assert unordered_lines(expected, actual) == detail


def test_check_dispatches_on_the_declared_checker():
    assert check(CheckerSpec("exact"), "1 2\n", "1  2\n") is not None
    assert check(CheckerSpec("tokens"), "1 2\n", "1  2\n") is None
    assert check(CheckerSpec("floats", tolerance=FloatRule(rel=1e-2)), "1.00", "1.001") is None
    assert check(CheckerSpec("unordered_lines"), "x\ny\n", "y\nx\n") is None
    with pytest.raises(ValueError):
        check(CheckerSpec("custom"), "", "")
