"""The report formats by name. A new format is one module with a ``render_*`` function and
one ``register_format`` call here; nothing else names formats."""

from __future__ import annotations

import json
from typing import Callable

Renderer = Callable[..., str]
_FORMATS: dict[str, Callable[[], Renderer]] = {}


def register_format(name: str, loader: Callable[[], Renderer]) -> None:
    """``loader`` returns the renderer ``(report, colour, summary) -> str``; it is called on
    first use, so a format's dependencies (jinja2 for HTML) load only when it is chosen."""
    _FORMATS[name] = loader


def formats() -> tuple[str, ...]:
    return tuple(_FORMATS)


def render(report: dict, fmt: str, colour: bool = False, summary: dict | None = None) -> str:
    if fmt not in _FORMATS:
        raise ValueError(f"format must be one of {', '.join(_FORMATS)}, got {fmt!r}")
    return _FORMATS[fmt]()(report, colour, summary)


def _table() -> Renderer:
    from .table import render_table

    return render_table


def _markdown() -> Renderer:
    from .markdown import render_markdown

    return lambda report, colour, summary: render_markdown(report)


def _html() -> Renderer:
    from .html import render_html

    return lambda report, colour, summary: render_html(report)


def _json() -> Renderer:
    return lambda report, colour, summary: json.dumps(report, indent=2, ensure_ascii=False)


register_format("table", _table)
register_format("markdown", _markdown)
register_format("html", _html)
register_format("json", _json)
