"""Plain-text tables for the terminal, with colour only when writing to one."""

from __future__ import annotations

import os
import sys


def use_colour(stream=None) -> bool:
    stream = stream or sys.stdout
    return stream.isatty() and "NO_COLOR" not in os.environ


def paint(text: str, code: str, colour: bool) -> str:
    return f"\033[{code}m{text}\033[0m" if colour else text


def render(headers: list[str], rows: list[list[str]], align: str | None = None) -> str:
    """Columns padded to the widest cell; ``align`` is one of l/r per column (default: first
    left, rest right). Cells may carry colour codes; widths ignore them."""
    align = align or "l" + "r" * (len(headers) - 1)
    widths = [max(_visible_len(str(r[i])) for r in [headers] + rows) for i in range(len(headers))]

    def line(cells: list[str]) -> str:
        out = []
        for cell, width, side in zip(cells, widths, align):
            pad = " " * (width - _visible_len(cell))
            out.append(cell + pad if side == "l" else pad + cell)
        return "  ".join(out).rstrip()

    rule = "  ".join("-" * w for w in widths)
    return "\n".join([line(headers), rule] + [line([str(c) for c in r]) for r in rows])


def _visible_len(text: str) -> int:
    length, skipping = 0, False
    for char in text:
        if char == "\033":
            skipping = True
        elif skipping and char == "m":
            skipping = False
        elif not skipping:
            length += 1
    return length
