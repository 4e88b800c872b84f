"""The language-neutral type system: parsing, validating values, judging results."""

import pytest

from harness.problems.types import Type, TypeSyntaxError, check_value, parse_type, values_equal


@pytest.mark.parametrize("text", ["int", "list[int]", "dict[str, list[optional[float]]]", "tuple[str, bool]",
                                  "optional[tuple[int, int]]"])
def test_type_strings_round_trip(text):
    assert str(parse_type(text)) == text


@pytest.mark.parametrize("text", ["integer", "list", "dict[float, str]", "set[float]", "list[int", "tuple[]", "optional[int, str]"])
def test_malformed_types_are_refused(text):
    with pytest.raises(TypeSyntaxError):
        parse_type(text)


@pytest.mark.parametrize("value,text", [(True, "int"), (2**63, "int"), (-(2**63) - 1, "int"), (1, "str"),
                                        ([1, 1], "set[int]"), ("\ud800", "str"), ({True: 1}, "dict[int, int]"), (None, "int"), ([1, "a"], "list[int]"),
                                        ({1: 2}, "dict[str, int]"), ([1], "tuple[int, int]")])
def test_values_that_do_not_fit_their_type_are_refused(value, text):
    with pytest.raises(ValueError):
        check_value(value, parse_type(text))


def test_64_bit_extremes_fit_an_int():
    # Signed 64-bit range per two's complement: [-2**63, 2**63 - 1].
    check_value(2**63 - 1, Type("int"))
    check_value(-(2**63), Type("int"))


def test_floats_match_within_tolerance_and_ints_do_not_match_bools():
    assert values_equal(0.3, 0.30000000000000004, Type("float"), 1e-9)
    assert not values_equal(0.3, 0.31, Type("float"), 1e-9)
    assert values_equal(2.0, 2, Type("float"), 0.0)
    assert not values_equal(1, True, Type("int"), 0.0)
    assert not values_equal(1, 1.0, Type("int"), 0.0)


def test_deep_comparison_follows_the_declared_type():
    typ = parse_type("dict[str, list[optional[tuple[int, float]]]]")
    expected = {"a": [None, [1, 2.5]]}
    assert values_equal(expected, {"a": [None, [1, 2.5000000001]]}, typ, 1e-6)
    assert not values_equal(expected, {"a": [None, [1, 2.5]], "b": []}, typ, 1e-6)
    assert not values_equal(expected, {"a": [[0, 0.0], [1, 2.5]]}, typ, 1e-6)
    assert not values_equal(expected, {"a": [None]}, typ, 1e-6)


def test_non_finite_reports_never_equal_a_finite_expectation():
    assert not values_equal(1.0, "nan", Type("float"), 1e-9)
    assert not values_equal(1.0, float("nan"), Type("float"), 1e-9)
