"""Checkers of program problems: is a program's output the expected one?

The built-in checkers are pure functions of (expected, actual) text that return None for a right
answer, else a short detail naming the first difference (a line or a token, both sides
clipped). The custom checker is a set's own program; it runs in a sandbox of its own, so it
lives with the program execution path (``programs.py``), which calls :func:`check` for the rest.
"""

from __future__ import annotations

import re
from collections import Counter

from ..problems import CheckerSpec, FloatRule
from ..problems.types import float_equal

SHOWN_CHARS = 60
# Whitespace as contest outputs mean it: ASCII only (str.split() would also split on U+00A0
# and other Unicode spaces, which an exact answer must not contain in place of a space).
_TOKEN_SPLIT = re.compile(r"[ \t\n\r\f\v]+")
_TRAILING = " \t\r\f\v"
# A number as programs print one: optional sign, digits with an optional fraction (or a bare
# fraction), an optional exponent; or nan / inf / infinity in any letter case.
_NUMBER = re.compile(r"[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?|[+-]?(?:nan|inf|infinity)", re.IGNORECASE)
_INTEGER = re.compile(r"[+-]?\d+")


def check(spec: CheckerSpec, expected: str, actual: str) -> str | None:
    """None when ``actual`` is right by the built-in checker ``spec``, else the detail."""
    if spec.kind == "exact":
        return exact(expected, actual)
    if spec.kind == "tokens":
        return tokens(expected, actual)
    if spec.kind == "floats":
        return floats(expected, actual, spec.tolerance)
    if spec.kind == "unordered_lines":
        return unordered_lines(expected, actual)
    raise ValueError(f"{spec.kind!r} is not a built-in checker")


def normal_lines(text: str) -> list[str]:
    """The lines of ``text`` without trailing whitespace, trailing empty lines dropped (so the
    final newline, or its absence, and spaces at line ends never decide)."""
    lines = [line.rstrip(_TRAILING) for line in text.split("\n")]
    while lines and not lines[-1]:
        lines.pop()
    return lines


def exact(expected: str, actual: str) -> str | None:
    want, got = normal_lines(expected), normal_lines(actual)
    for number, (a, b) in enumerate(zip(want, got), start=1):
        if a != b:
            return f"line {number}: expected {shown(a)}, got {shown(b)}"
    if len(want) > len(got):
        return f"line {len(got) + 1}: expected {shown(want[len(got)])}, got the end of the output ({_count(len(got), 'line')})"
    if len(got) > len(want):
        return f"line {len(want) + 1}: expected the end of the output ({_count(len(want), 'line')}), got {shown(got[len(want)])}"
    return None


def token_list(text: str) -> list[tuple[str, int]]:
    """The whitespace-separated tokens of ``text``, each with its 1-based line number."""
    found = []
    for number, line in enumerate(text.split("\n"), start=1):
        found += [(token, number) for token in _TOKEN_SPLIT.split(line) if token]
    return found


def tokens(expected: str, actual: str) -> str | None:
    return _compare_tokens(expected, actual, lambda want, got: want == got)


def floats(expected: str, actual: str, rule: FloatRule) -> str | None:
    """Tokens, where an expected number is met by any number close to it by ``rule`` (PEP 485,
    as ``harness.problems.types.float_equal`` judges float results of function problems)."""
    def same(want: str, got: str) -> bool:
        value = number(want)
        if value is None:
            return want == got
        other = number(got)
        return other is not None and float_equal(value, other, rule)

    detail = _compare_tokens(expected, actual, same)
    if detail is not None and "expected" in detail and "got" in detail:
        detail += f" (tolerance rel {rule.rel:g}, abs {rule.abs:g})"
    return detail


def number(token: str) -> int | float | None:
    """The token as a number (an integer stays exact), or None if it is not one."""
    if not _NUMBER.fullmatch(token):
        return None
    if _INTEGER.fullmatch(token):
        return int(token)  # exact however long: float_equal compares integers in rationals
    return float(token)  # beyond a double's range it reads as an infinity, as C's strtod has it


def _compare_tokens(expected: str, actual: str, same) -> str | None:
    want, got = token_list(expected), token_list(actual)
    for index, ((a, _), (b, line_b)) in enumerate(zip(want, got), start=1):
        if not same(a, b):
            return f"token {index} (line {line_b}): expected {shown(a)}, got {shown(b)}"
    if len(want) > len(got):
        return f"token {len(got) + 1}: expected {shown(want[len(got)][0])}, got the end of the output " \
               f"({len(got)} of {len(want)} tokens)"
    if len(got) > len(want):
        return f"token {len(want) + 1} (line {got[len(want)][1]}): expected the end of the output " \
               f"({_count(len(want), 'token')}), got {shown(got[len(want)][0])}"
    return None


def unordered_lines(expected: str, actual: str) -> str | None:
    want, got = normal_lines(expected), normal_lines(actual)
    have, need = Counter(got), Counter(want)
    for line in want:  # the first expected line (in expected order) that is missing
        if have[line] < need[line]:
            return f"expected line {shown(line)} {_times(need[line])}, got it {_times(have[line])} (lines in any order)"
    for line in got:
        if have[line] > need[line]:
            return f"unexpected line {shown(line)}: expected {_times(need[line])}, got it {_times(have[line])} " \
                   "(lines in any order)"
    return None


def _count(count: int, noun: str) -> str:
    return f"{count} {noun}" + ("" if count == 1 else "s")


def _times(count: int) -> str:
    return "once" if count == 1 else f"{count} times"


def shown(text: str) -> str:
    """A line or token for a detail: quoted, escaped, clipped."""
    if len(text) > SHOWN_CHARS:
        return repr(text[:SHOWN_CHARS]) + "..."
    return repr(text)
