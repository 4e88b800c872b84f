"""What runtime templates may call besides jinja2's own: naming conventions, literals that
no two languages spell alike, and pieces for compilers that limit a literal's length."""

from __future__ import annotations

import math

NAMING_STYLES = ("snake", "camel", "pascal", "kebab")

def recase(snake_name: str, style: str) -> str:
    words = [w for w in snake_name.split("_") if w]
    if style == "snake":
        return snake_name
    if style == "kebab":
        return "-".join(words)
    if style == "camel":
        return words[0] + "".join(w.capitalize() for w in words[1:])
    if style == "pascal":
        return "".join(w.capitalize() for w in words)
    raise ValueError(f"unknown naming style {style!r}")


def indent_lines(text: str, prefix: str, first: bool = True) -> str:
    lines = text.splitlines()
    return "\n".join((prefix + line if (i or first) and line else line) for i, line in enumerate(lines))


def float_literal(value: float) -> str:
    """Shortest round-trip decimal text of a float, always with a '.' or an exponent."""
    text = repr(float(value))
    if not math.isfinite(value):
        raise ValueError("non-finite floats have no literal")
    return text if any(c in text for c in ".e") else text + ".0"


def float_class(value: float) -> str:
    """``nan``, ``inf``, ``-inf``, ``-0`` or ``finite``: templates spell the first four in
    each language's own way (no language shares one literal for them)."""
    value = float(value)
    if math.isnan(value):
        return "nan"
    if math.isinf(value):
        return "inf" if value > 0 else "-inf"
    if value == 0 and math.copysign(1.0, value) < 0:
        return "-0"
    return "finite"


def chunked(text: str, size: int) -> list[str]:
    """``text`` in pieces of at most ``size`` code points, never splitting one: templates
    concatenate them where a compiler limits the length of one literal (javac's 65,535-byte
    constants, for one)."""
    if size < 1:
        raise ValueError("chunk size must be positive")
    return [text[i:i + size] for i in range(0, len(text), size)] or [""]


def utf16_units(text: str) -> list[int]:
    """The UTF-16 code units of ``text`` (surrogate pairs for code points above U+FFFF)."""
    data = text.encode("utf-16-le", "surrogatepass")
    return [int.from_bytes(data[i:i + 2], "little") for i in range(0, len(data), 2)]
