"""The language-neutral type system: parsing type strings, checking values, judging results.

Problems declare types once (``list[int]``, ``dict[int, optional[float]]``, ``set[str]``, ...).
Runtimes render them per language; the harness alone decides whether a reported result equals
the expected value, so no candidate can change the verdict by overriding equality in its
language. Drivers report what the candidate returned (see ``docs/problem-format.md``, "The
result wire format"); nothing here trusts a driver to have trimmed a value to its type.
"""

from __future__ import annotations

import decimal
import json
import math
from dataclasses import dataclass
from fractions import Fraction

INT64_MIN = -(2**63)
INT64_MAX = 2**63 - 1

SCALARS = ("int", "bigint", "float", "bool", "str")
GENERICS = {"list": 1, "set": 1, "dict": 2, "optional": 1, "tuple": None}
# Set elements and map keys are compared exactly, so only exactly comparable scalars qualify.
SET_ELEMENTS = ("int", "bigint", "str", "bool")
DICT_KEYS = ("str", "int")
# Tags of the wire format: a JSON object whose only key is one of these is a tagged value.
MAP_TAG = "$map"
SET_TAG = "$set"


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
        """The element type of a list/set/optional, or the value type of a dict."""
        return self.args[-1]

    @property
    def key(self) -> "Type":
        """The key type of a dict."""
        return self.args[0]

    def walk(self):
        """This type and every type nested in it."""
        yield self
        for arg in self.args:
            yield from arg.walk()


@dataclass(frozen=True)
class FloatRule:
    """How a float result is compared: PEP 485 (``math.isclose``) with separate relative and
    absolute tolerances, NaN equal to NaN, infinities only to themselves, and, when
    ``signed_zero`` is set, an expected zero matched only by a zero of the same sign."""

    rel: float = 1e-9
    abs: float = 0.0
    signed_zero: bool = False

    @classmethod
    def of(cls, tolerance: "FloatRule | float") -> "FloatRule":
        """The rule itself, or a legacy scalar tolerance (both relative and absolute)."""
        if isinstance(tolerance, FloatRule):
            return tolerance
        return cls(rel=float(tolerance), abs=float(tolerance))


def parse_type(text: str) -> Type:
    parser = _Parser(text)
    result = parser.parse()
    if parser.pos != len(parser.text):
        raise TypeSyntaxError(f"unexpected {parser.text[parser.pos:]!r} in type {text!r}")
    return result


class _Parser:
    MAX_DEPTH = 32

    def __init__(self, text: str):
        self.text = text.replace(" ", "")
        self.pos = 0

    def parse(self, depth: int = 0) -> Type:
        if depth > self.MAX_DEPTH:
            raise TypeSyntaxError(f"type {self.text!r} nests deeper than {self.MAX_DEPTH} levels")
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
        args = [self.parse(depth + 1)]
        while self.text.startswith(",", self.pos):
            self.pos += 1
            args.append(self.parse(depth + 1))
        if not self.text.startswith("]", self.pos):
            raise TypeSyntaxError(f"missing ']' in {self.text!r}")
        self.pos += 1
        arity = GENERICS[name]
        if arity is not None and len(args) != arity:
            raise TypeSyntaxError(f"{name} takes {arity} type argument(s), got {len(args)}")
        if name == "dict" and args[0].kind not in DICT_KEYS:
            raise TypeSyntaxError(f"dict keys must be one of {', '.join(DICT_KEYS)}, got {args[0]}")
        if name == "set" and args[0].kind not in SET_ELEMENTS:
            raise TypeSyntaxError(f"set elements must be one of {', '.join(SET_ELEMENTS)}, got {args[0]}"
                                  " (elements are compared exactly)")
        return Type(name, tuple(args))


def check_value(value: object, typ: Type, path: str = "value") -> None:
    """Raise ValueError naming ``path`` if ``value`` (plain YAML data) does not fit ``typ``.

    Problem files hold sets as lists of distinct items and maps as mappings."""
    kind = typ.kind
    if kind == "optional":
        if value is not None:
            check_value(value, typ.elem, path)
        return
    if value is None:
        raise ValueError(f"{path}: null is only allowed for optional types, expected {typ}")
    if kind in ("int", "bigint"):
        if isinstance(value, bool) or not isinstance(value, int):
            raise ValueError(f"{path}: expected {kind}, got {value!r}")
        if kind == "int" and not INT64_MIN <= value <= INT64_MAX:
            raise ValueError(f"{path}: {value} does not fit in a signed 64-bit int (declare bigint)")
    elif kind == "float":
        if isinstance(value, bool) or not isinstance(value, (int, float)):
            raise ValueError(f"{path}: expected float, got {value!r}")
        if isinstance(value, int) and not INT64_MIN <= value <= INT64_MAX:
            raise ValueError(f"{path}: write large floats with an exponent, got the integer {value}")
    elif kind == "bool":
        if not isinstance(value, bool):
            raise ValueError(f"{path}: expected bool, got {value!r}")
    elif kind == "str":
        if not isinstance(value, str):
            raise ValueError(f"{path}: expected str, got {value!r}")
        if any(0xD800 <= ord(c) <= 0xDFFF for c in value):
            raise ValueError(f"{path}: strings may not hold lone surrogates")
    elif kind in ("list", "set"):
        if not isinstance(value, list):
            raise ValueError(f"{path}: expected a list, got {value!r}")
        for i, item in enumerate(value):
            check_value(item, typ.elem, f"{path}[{i}]")
        if kind == "set" and len({_exact_key(item) for item in value}) != len(value):
            raise ValueError(f"{path}: a set's items must be distinct")
    elif kind == "tuple":
        if not isinstance(value, list) or len(value) != len(typ.args):
            raise ValueError(f"{path}: expected a list of {len(typ.args)} items for {typ}, got {value!r}")
        for i, (item, item_type) in enumerate(zip(value, typ.args)):
            check_value(item, item_type, f"{path}[{i}]")
    elif kind == "dict":
        if not isinstance(value, dict):
            raise ValueError(f"{path}: expected a mapping, got {value!r}")
        for key, item in value.items():
            check_value(key, typ.key, f"{path} key {key!r}")
            check_value(item, typ.elem, f"{path}[{key!r}]")


class JsonObject(tuple):
    """A JSON object as its (key, value) pairs in order, duplicates kept: a reported map must
    not lose a duplicate key or a key order before the judge has seen it."""

    def get(self, key, default=None):
        for name, value in self:
            if name == key:
                return value
        return default


class LongInteger:
    """A reported integer too long to convert in bounded time: never equal to anything."""

    def __init__(self, digits: int):
        self.digits = digits

    def __repr__(self) -> str:
        return f"<integer of {self.digits} digits>"


# Python refuses str -> int beyond 4,300 digits by default (CVE-2020-10735); the decimal route
# below stays fast up to here, and no problem declares results this long.
MAX_REPORTED_DIGITS = 20_000


def _reported_int(text: str):
    digits = len(text.lstrip("-"))
    if digits <= 4000:
        return int(text)
    if digits <= MAX_REPORTED_DIGITS:
        return int(decimal.Decimal(text))
    return LongInteger(digits)


def loads_reported(text: str | bytes):
    """Parse one results line of the wire format. Objects become :class:`JsonObject`;
    ``NaN``/``Infinity``/``-Infinity`` tokens are floats; integers keep every digit up to
    ``MAX_REPORTED_DIGITS`` and become :class:`LongInteger` beyond."""
    return json.loads(text, object_pairs_hook=JsonObject, parse_int=_reported_int)


def _map_pairs(actual) -> list | None:
    """The (key, value) pairs of a reported map, or None when ``actual`` is not a map."""
    if isinstance(actual, dict):
        return list(actual.items())
    if not isinstance(actual, JsonObject):
        return None
    if len(actual) == 1 and actual[0][0] == MAP_TAG:
        pairs = actual[0][1]
        if not isinstance(pairs, list) or not all(isinstance(p, list) and len(p) == 2 for p in pairs):
            return None
        return [tuple(p) for p in pairs]
    if len(actual) == 1 and actual[0][0] == SET_TAG:
        return None
    return list(actual)


def _set_items(actual) -> list | None:
    """The items of a reported set (tagged, or a plain list from a language without sets)."""
    if isinstance(actual, list):
        return actual
    if isinstance(actual, (set, frozenset)):
        return list(actual)
    if isinstance(actual, JsonObject) and len(actual) == 1 and actual[0][0] == SET_TAG:
        items = actual[0][1]
        return items if isinstance(items, list) else None
    return None


def _exact_key(value: object, kind: str | None = None):
    """A hashable key that tells ``True`` from ``1`` and only equal scalars apart as equal;
    None when ``value`` is not a scalar of ``kind`` (any exact scalar when kind is None)."""
    if kind in ("int", "bigint") or kind is None and isinstance(value, int) and not isinstance(value, bool):
        if isinstance(value, bool) or not isinstance(value, int):
            return None
        if kind == "int" and not INT64_MIN <= value <= INT64_MAX:
            return None
        return ("int", value)
    if kind == "bool" or kind is None and isinstance(value, bool):
        return ("bool", value) if isinstance(value, bool) else None
    if kind == "str" or kind is None and isinstance(value, str):
        return ("str", value) if isinstance(value, str) else None
    return None


def float_equal(expected: float | int, actual: object, rule: FloatRule) -> bool:
    """PEP 485 closeness, exact for integers of any size (no overflow to float)."""
    if isinstance(actual, bool) or not isinstance(actual, (int, float)):
        return False
    if isinstance(expected, float) and math.isnan(expected):
        return isinstance(actual, float) and math.isnan(actual)
    if isinstance(expected, float) and math.isinf(expected):
        return isinstance(actual, float) and actual == expected
    if isinstance(actual, float) and not math.isfinite(actual):
        return False
    if rule.signed_zero and expected == 0:
        return actual == 0 and math.copysign(1.0, float(actual)) == math.copysign(1.0, float(expected))
    if isinstance(actual, float) and isinstance(expected, float):
        return math.isclose(actual, expected, rel_tol=rule.rel, abs_tol=rule.abs)
    # An integer on either side: the same formula in exact rationals, so 10**400 cannot overflow.
    a, e = Fraction(actual), Fraction(expected)
    diff = abs(a - e)
    return diff <= Fraction(rule.rel) * max(abs(a), abs(e)) or diff <= Fraction(rule.abs)


def values_equal(expected: object, actual: object, typ: Type, tolerance: FloatRule | float) -> bool:
    """Deep equality of a reported result against the expected value, guided by the type.

    ``actual`` is anything a driver can report (see :func:`loads_reported`); any value that is
    not of the declared shape and type is simply unequal, never an exception. A float result
    may be reported as an integral JSON number; an int result may not be reported as a float.
    """
    rule = FloatRule.of(tolerance)
    kind = typ.kind
    if kind == "optional":
        if expected is None or actual is None:
            return expected is None and actual is None
        return values_equal(expected, actual, typ.elem, rule)
    if kind in ("int", "bigint"):
        return type(actual) is int and actual == expected and (kind == "bigint" or INT64_MIN <= actual <= INT64_MAX)
    if kind == "float":
        return float_equal(expected, actual, rule)
    if kind in ("bool", "str"):
        return type(actual) is type(expected) and actual == expected
    if kind == "list":
        return (
            isinstance(actual, list)
            and len(actual) == len(expected)
            and all(values_equal(e, a, typ.elem, rule) for e, a in zip(expected, actual))
        )
    if kind == "tuple":
        return (
            isinstance(actual, list)
            and len(actual) == len(typ.args)
            and all(values_equal(e, a, t, rule) for e, a, t in zip(expected, actual, typ.args))
        )
    if kind == "set":
        items = _set_items(actual)
        if items is None:
            return False
        keys = [_exact_key(item, typ.elem.kind) for item in items]
        if any(key is None for key in keys) or len(set(keys)) != len(keys):
            return False  # an item of the wrong type, or a duplicate: not a set of this type
        return set(keys) == {_exact_key(item, typ.elem.kind) for item in expected}
    if kind == "dict":
        pairs = _map_pairs(actual)
        if pairs is None:
            return False
        found = {}
        for key, value in pairs:
            exact = _exact_key(key, typ.key.kind)
            if exact is None or exact in found:
                return False  # a key of the wrong type, or the same key twice
            found[exact] = value
        wanted = {_exact_key(key, typ.key.kind): value for key, value in expected.items()}
        return found.keys() == wanted.keys() and all(
            values_equal(wanted[k], found[k], typ.elem, rule) for k in wanted)
    raise AssertionError(f"unhandled type {typ}")


def show(value: object, limit: int = 200) -> str:
    """A reported or expected value as JSON-like text for a verdict's detail, clipped; never
    raises, whatever the value's size or depth."""

    def plain(v, depth=0):
        if depth > 50:
            return "..."
        if isinstance(v, JsonObject):
            return {str(k): plain(x, depth + 1) for k, x in v}
        if isinstance(v, dict):
            return {str(k): plain(x, depth + 1) for k, x in v.items()}
        if isinstance(v, list):
            return [plain(x, depth + 1) for x in v[:100]] + (["..."] if len(v) > 100 else [])
        if isinstance(v, int) and not isinstance(v, bool) and v.bit_length() > 200:
            return f"<integer of about {int(v.bit_length() * math.log10(2)) + 1} digits>"
        if isinstance(v, LongInteger):
            return repr(v)
        return v

    try:
        text = json.dumps(plain(value), ensure_ascii=False)
    except (TypeError, ValueError, RecursionError):
        text = f"<{type(value).__name__}>"
    text = text.encode("utf-8", "backslashreplace").decode("utf-8")  # lone surrogates shown escaped
    return text if len(text) <= limit else text[: limit - 3] + "..."
