"""The language-neutral type system: parsing type strings, checking values, judging results.

Problems declare types once (``list[int]``, ``dict[str, optional[float]]``, ...). Runtimes
render them per language; the harness alone decides whether a reported result equals the
expected value, so no candidate can change the verdict by overriding equality in its language.
"""

from __future__ import annotations

import math
from dataclasses import dataclass

INT64_MIN = -(2**63)
INT64_MAX = 2**63 - 1

SCALARS = ("int", "float", "bool", "str")
GENERICS = {"list": 1, "dict": 2, "optional": 1, "tuple": None}


class TypeSyntaxError(ValueError):
    pass


@dataclass(frozen=True)
class Type:
    """A parsed type: ``kind`` is a scalar name or a generic name with ``args``."""

    kind: str
    args: tuple["Type", ...] = ()

    def __str__(self) -> str:
        if not self.args:
            return self.kind
        return f"{self.kind}[{', '.join(str(a) for a in self.args)}]"

    @property
    def elem(self) -> "Type":
        """The element type of a list/optional, or the value type of a dict."""
        return self.args[-1]


def parse_type(text: str) -> Type:
    parser = _Parser(text)
    result = parser.parse()
    if parser.pos != len(parser.text):
        raise TypeSyntaxError(f"unexpected {parser.text[parser.pos:]!r} in type {text!r}")
    return result


class _Parser:
    def __init__(self, text: str):
        self.text = text.replace(" ", "")
        self.pos = 0

    def parse(self) -> Type:
        start = self.pos
        while self.pos < len(self.text) and (self.text[self.pos].isalnum() or self.text[self.pos] == "_"):
            self.pos += 1
        name = self.text[start:self.pos]
        if name in SCALARS:
            return Type(name)
        if name not in GENERICS:
            raise TypeSyntaxError(f"unknown type name {name!r} in {self.text!r}")
        if not self.text.startswith("[", self.pos):
            raise TypeSyntaxError(f"{name} needs type arguments in brackets, as in {name}[int]")
        self.pos += 1
        args = [self.parse()]
        while self.text.startswith(",", self.pos):
            self.pos += 1
            args.append(self.parse())
        if not self.text.startswith("]", self.pos):
            raise TypeSyntaxError(f"missing ']' in {self.text!r}")
        self.pos += 1
        arity = GENERICS[name]
        if arity is not None and len(args) != arity:
            raise TypeSyntaxError(f"{name} takes {arity} type argument(s), got {len(args)}")
        if name == "dict" and args[0] != Type("str"):
            raise TypeSyntaxError("dict keys must be str")
        return Type(name, tuple(args))


def check_value(value: object, typ: Type, path: str = "value") -> None:
    """Raise ValueError naming ``path`` if ``value`` (plain JSON/YAML data) does not fit ``typ``."""
    kind = typ.kind
    if kind == "optional":
        if value is not None:
            check_value(value, typ.elem, path)
        return
    if value is None:
        raise ValueError(f"{path}: null is only allowed for optional types, expected {typ}")
    if kind == "int":
        if isinstance(value, bool) or not isinstance(value, int):
            raise ValueError(f"{path}: expected int, got {value!r}")
        if not INT64_MIN <= value <= INT64_MAX:
            raise ValueError(f"{path}: {value} does not fit in a signed 64-bit int")
    elif kind == "float":
        if isinstance(value, bool) or not isinstance(value, (int, float)):
            raise ValueError(f"{path}: expected float, got {value!r}")
        if not math.isfinite(value):
            raise ValueError(f"{path}: floats must be finite, got {value!r}")
    elif kind == "bool":
        if not isinstance(value, bool):
            raise ValueError(f"{path}: expected bool, got {value!r}")
    elif kind == "str":
        if not isinstance(value, str):
            raise ValueError(f"{path}: expected str, got {value!r}")
    elif kind == "list":
        if not isinstance(value, list):
            raise ValueError(f"{path}: expected a list, got {value!r}")
        for i, item in enumerate(value):
            check_value(item, typ.elem, f"{path}[{i}]")
    elif kind == "tuple":
        if not isinstance(value, list) or len(value) != len(typ.args):
            raise ValueError(f"{path}: expected a list of {len(typ.args)} items for {typ}, got {value!r}")
        for i, (item, item_type) in enumerate(zip(value, typ.args)):
            check_value(item, item_type, f"{path}[{i}]")
    elif kind == "dict":
        if not isinstance(value, dict):
            raise ValueError(f"{path}: expected a mapping, got {value!r}")
        for key, item in value.items():
            if not isinstance(key, str):
                raise ValueError(f"{path}: dict keys must be strings, got {key!r}")
            check_value(item, typ.elem, f"{path}[{key!r}]")


def values_equal(expected: object, actual: object, typ: Type, tolerance: float) -> bool:
    """Deep equality of a reported result against the expected value, guided by the type.

    Floats match within ``tolerance``, absolute or relative (common practice: ``math.isclose``
    with both tolerances set). A float result may be reported as an integral JSON number.
    """
    kind = typ.kind
    if kind == "optional":
        if expected is None or actual is None:
            return expected is None and actual is None
        return values_equal(expected, actual, typ.elem, tolerance)
    if kind == "int":
        return type(actual) is int and actual == expected
    if kind == "float":
        if isinstance(actual, bool) or not isinstance(actual, (int, float)):
            return False
        return math.isclose(float(actual), float(expected), rel_tol=tolerance, abs_tol=tolerance)
    if kind in ("bool", "str"):
        return type(actual) is type(expected) and actual == expected
    if kind == "list":
        return (
            isinstance(actual, list)
            and len(actual) == len(expected)
            and all(values_equal(e, a, typ.elem, tolerance) for e, a in zip(expected, actual))
        )
    if kind == "tuple":
        return (
            isinstance(actual, list)
            and len(actual) == len(typ.args)
            and all(values_equal(e, a, t, tolerance) for e, a, t in zip(expected, actual, typ.args))
        )
    if kind == "dict":
        return (
            isinstance(actual, dict)
            and actual.keys() == expected.keys()
            and all(values_equal(expected[k], actual[k], typ.elem, tolerance) for k in expected)
        )
    raise AssertionError(f"unhandled type {typ}")
