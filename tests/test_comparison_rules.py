"""The judge's comparison rules, checked against sources outside the project: PEP 485 as
implemented by ``math.isclose``, ``numpy.isclose``, IEEE 754 zero signs and NaN, exact rational
arithmetic (``fractions``), and the JSON grammar of RFC 8259 (with the NaN/Infinity tokens
that Python's ``json`` module reads). Whatever a candidate reports, the judge answers
True or False and never raises."""

from __future__ import annotations

import json
import math

import numpy as np
import pytest
from hypothesis import HealthCheck, given, settings
from hypothesis import strategies as st

from harness.problems.types import FloatRule, JsonObject, LongInteger, check_value, float_equal, loads_reported, parse_type, show, values_equal

finite = st.floats(allow_nan=False, allow_infinity=False)
tolerances = st.sampled_from([0.0, 1e-15, 1e-12, 1e-9, 1e-6, 1e-3, 0.5])


@settings(max_examples=2000, deadline=None)
@given(finite, finite, tolerances, tolerances)
def test_float_rule_is_pep_485_as_math_isclose_computes_it(expected, actual, rel, abs_):
    # Source: PEP 485 / math.isclose: |a - b| <= max(rel_tol * max(|a|, |b|), abs_tol).
    rule = FloatRule(rel=rel, abs=abs_)
    assert float_equal(expected, actual, rule) == math.isclose(actual, expected, rel_tol=rel, abs_tol=abs_)


@settings(max_examples=1000, deadline=None)
@given(finite.filter(lambda x: abs(x) < 1e300), finite.filter(lambda x: abs(x) < 1e300), tolerances)
def test_absolute_tolerance_alone_agrees_with_numpy_isclose(expected, actual, abs_):
    # Source: numpy.isclose(a, b, rtol, atol) tests |a - b| <= atol + rtol * |b|; with rtol = 0
    # that is the PEP 485 rule with rel_tol = 0.
    rule = FloatRule(rel=0.0, abs=abs_)
    assert float_equal(expected, actual, rule) == bool(np.isclose(actual, expected, rtol=0.0, atol=abs_))


def test_tiny_expected_values_are_checked_by_default():
    # PEP 485's default abs_tol is 0.0: a 1e-12 expectation is not met by 0.0.
    rule = FloatRule()
    assert not float_equal(1e-12, 0.0, rule)
    assert float_equal(1e-12, 1e-12 * (1 + 1e-12), rule)
    assert not values_equal(1e-12, 0.0, parse_type("float"), rule)


def test_legacy_scalar_tolerance_sets_both_rel_and_abs():
    assert FloatRule.of(1e-6) == FloatRule(rel=1e-6, abs=1e-6)
    assert values_equal(0.0, 5e-7, parse_type("float"), 1e-6)


def test_sign_of_zero_counts_only_when_the_problem_says_so():
    # IEEE 754: -0.0 == +0.0 compares equal; copysign tells them apart.
    assert float_equal(-0.0, 0.0, FloatRule(rel=0.0))
    strict = FloatRule(rel=0.0, signed_zero=True)
    assert not float_equal(-0.0, 0.0, strict)
    assert not float_equal(0.0, -0.0, strict)
    assert float_equal(-0.0, -0.0, strict)
    assert not float_equal(-0.0, 0, strict)  # an integral 0 has no sign: it is +0
    assert float_equal(1.5, 1.5, strict)


def test_nan_matches_nan_and_infinities_only_themselves():
    rule = FloatRule(rel=0.5, abs=0.5)
    nan, inf = float("nan"), float("inf")
    assert float_equal(nan, nan, rule)
    assert not float_equal(nan, 0.0, rule)
    assert not float_equal(1.0, nan, rule)
    assert float_equal(inf, inf, rule) and float_equal(-inf, -inf, rule)
    assert not float_equal(inf, -inf, rule)
    assert not float_equal(inf, 1.7976931348623157e308, rule)
    assert not float_equal(1e308, inf, rule)
    assert not float_equal(inf, 10**400, rule)


def test_huge_integers_where_a_float_is_expected_are_judged_exactly():
    # Exact rationals (fractions.Fraction) stand in for float(10**400), which raises OverflowError.
    rule = FloatRule()
    assert not float_equal(1.5, 10**400, rule)
    assert not float_equal(1e308, 10**400, rule)
    assert float_equal(1e20, 10**20, rule)
    assert float_equal(2.0, 2, FloatRule(rel=0.0))
    assert not values_equal(1.0, 10**4000, parse_type("float"), rule)


def test_integers_are_exact_and_never_bools_or_floats():
    assert not values_equal(1, True, parse_type("int"), 0.0)
    assert not values_equal(1, 1.0, parse_type("int"), 0.0)
    assert not values_equal(2**63, 2**63, parse_type("int"), 0.0)  # outside int64: not an int result
    assert values_equal(2**200, 2**200, parse_type("bigint"), 0.0)
    assert not values_equal(2**200, 2**200 + 1, parse_type("bigint"), 0.0)


def test_sets_ignore_order_and_refuse_duplicates_and_wrong_types():
    typ = parse_type("set[int]")
    assert values_equal([3, 1, 2], loads_reported('{"$set": [1, 2, 3]}'), typ, 0.0)
    assert values_equal([3, 1, 2], [2, 3, 1], typ, 0.0)  # a language without sets reports a list
    assert not values_equal([1, 2], [1, 2, 2], typ, 0.0)
    assert not values_equal([1, 2], [1, True], typ, 0.0)
    assert not values_equal([1, 2], [1], typ, 0.0)
    assert not values_equal([1, 2], loads_reported('{"$map": [[1, 2]]}'), typ, 0.0)
    # A set where a list is expected is not that list.
    assert not values_equal([1, 2], loads_reported('{"$set": [1, 2]}'), parse_type("list[int]"), 0.0)


def test_maps_keep_key_types_and_refuse_duplicate_keys():
    typ = parse_type("dict[int, str]")
    assert values_equal({1: "a", -2: "b"}, loads_reported('{"$map": [[-2, "b"], [1, "a"]]}'), typ, 0.0)
    assert not values_equal({1: "a"}, loads_reported('{"1": "a"}'), typ, 0.0)  # string keys are not ints
    assert not values_equal({1: "a"}, loads_reported('{"$map": [[1, "a"], [1, "a"]]}'), typ, 0.0)
    assert not values_equal({1: "a"}, loads_reported('{"$map": [[true, "a"]]}'), typ, 0.0)
    text_keys = parse_type("dict[str, int]")
    assert values_equal({"a": 1}, loads_reported('{"a": 1}'), text_keys, 0.0)
    assert values_equal({"a": 1}, loads_reported('{"$map": [["a", 1]]}'), text_keys, 0.0)
    assert not values_equal({"1": 1}, loads_reported('{"$map": [[1, 1]]}'), text_keys, 0.0)
    # RFC 8259 leaves duplicate names undefined; the judge refuses them rather than pick one.
    assert not values_equal({"a": 1}, loads_reported('{"a": 2, "a": 1}'), text_keys, 0.0)


def test_wire_reading_keeps_nonfinite_tokens_and_every_digit():
    value = loads_reported('[NaN, Infinity, -Infinity, -0.0, 123456789012345678901234567890]')
    assert math.isnan(value[0]) and value[1] == math.inf and value[2] == -math.inf
    assert math.copysign(1.0, value[3]) == -1.0
    assert value[4] == 123456789012345678901234567890
    big = loads_reported("7" * 5000)
    assert isinstance(big, int) and big % 10 == 7
    assert isinstance(loads_reported("9" * 30000), LongInteger)


def test_lone_surrogates_are_reported_and_judged_wrong_not_crashing():
    value = loads_reported('"\\ud800"')
    assert not values_equal("a", value, parse_type("str"), 0.0)
    assert "\\ud800" in show(value)


json_values = st.recursive(
    st.none() | st.booleans() | st.integers() | st.integers(min_value=-10**500, max_value=10**500)
    | st.floats() | st.text(),
    lambda children: st.lists(children, max_size=4)
    | st.dictionaries(st.text(max_size=3), children, max_size=3).map(lambda d: JsonObject(d.items()))
    | st.lists(children, max_size=3).map(lambda items: JsonObject([("$set", items)]))
    | st.lists(st.tuples(children, children).map(list), max_size=3).map(lambda p: JsonObject([("$map", p)])),
    max_leaves=12,
)
TYPES = ["int", "bigint", "float", "bool", "str", "list[int]", "list[float]", "set[int]", "set[str]",
         "set[bigint]", "dict[str, int]", "dict[int, list[float]]", "optional[float]",
         "tuple[int, str, float]", "list[tuple[bigint, optional[str]]]", "dict[int, set[bool]]"]
EXPECTED = {"int": 3, "bigint": 10**30, "float": 0.25, "bool": True, "str": "a", "list[int]": [1, 2],
            "list[float]": [float("nan"), -0.0], "set[int]": [1, 2], "set[str]": ["x"], "set[bigint]": [2**70],
            "dict[str, int]": {"a": 1}, "dict[int, list[float]]": {1: [0.5]}, "optional[float]": None,
            "tuple[int, str, float]": [1, "b", 1e300], "list[tuple[bigint, optional[str]]]": [[5, None]],
            "dict[int, set[bool]]": {-1: [True, False]}}


@settings(max_examples=600, deadline=None, suppress_health_check=[HealthCheck.too_slow])
@given(json_values, st.sampled_from(TYPES), st.booleans())
def test_the_judge_answers_for_any_reported_value_against_every_type(actual, text, signed_zero):
    typ = parse_type(text)
    check_value(EXPECTED[text], typ)
    result = values_equal(EXPECTED[text], actual, typ, FloatRule(rel=1e-9, abs=1e-12, signed_zero=signed_zero))
    assert result in (True, False)
    assert isinstance(show(actual), str)


@settings(max_examples=300, deadline=None)
@given(json_values)
def test_reported_values_survive_a_json_round_trip_through_the_wire_reader(value):
    def plain(v):
        if isinstance(v, JsonObject):
            return {"__pairs__": [[k, plain(x)] for k, x in v]}
        if isinstance(v, list):
            return [plain(x) for x in v]
        return v

    def encode(v):
        if isinstance(v, JsonObject):
            return "{" + ",".join(json.dumps(k) + ":" + encode(x) for k, x in v) + "}"
        if isinstance(v, list):
            return "[" + ",".join(encode(x) for x in v) + "]"
        if isinstance(v, int) and not isinstance(v, bool):
            return str(v) if v.bit_length() < 10_000 else "0"
        return json.dumps(v)

    text = encode(value)
    again = loads_reported(text)
    assert encode(again) == text or "NaN" in text


@pytest.mark.parametrize("text,value", [
    ("set[int]", [1, 1]), ("set[str]", "ab"), ("dict[int, str]", {"1": "a"}), ("dict[int, str]", {2**63: "a"}),
    ("float", 10**400), ("str", "\udfff"),
])
def test_problem_files_cannot_declare_values_outside_their_type(text, value):
    with pytest.raises(ValueError):
        check_value(value, parse_type(text))


def test_problem_files_may_declare_non_finite_floats_big_integers_sets_and_int_keyed_maps():
    check_value([float("nan"), float("inf"), -float("inf"), -0.0], parse_type("list[float]"))
    check_value(-(10**40), parse_type("bigint"))
    check_value(["b", "a"], parse_type("set[str]"))
    check_value({-3: [1.5]}, parse_type("dict[int, list[float]]"))
