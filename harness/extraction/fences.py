"""Fenced code blocks in a chat answer, read the way Markdown renderers read them.

A fence is a line of three or more backticks or tildes, indented by any amount (answers put
blocks inside list items), optionally followed by an info string (a language tag). The block
ends at a line of the same character, at least as long, indented by any amount; an unclosed
block runs to the end of the text (the generator stopped). Triple backticks inside a line of
prose are not fences. Content lines lose the opening fence's indentation.
"""

from __future__ import annotations

import re
from dataclasses import dataclass

_OPEN = re.compile(r"^(?P<indent>[ \t]*)(?P<fence>`{3,}|~{3,})(?P<info>[^\n]*)$")


@dataclass(frozen=True)
class Block:
    """One fenced block: its language tag (may be empty), content, and 1-based line span."""

    tag: str
    text: str
    first_line: int
    last_line: int
    closed: bool


def fenced_blocks(text: str) -> list[Block]:
    lines = text.split("\n")
    blocks: list[Block] = []
    index = 0
    while index < len(lines):
        match = _OPEN.match(lines[index])
        if not match or (match["fence"][0] == "`" and "`" in match["info"]):
            index += 1
            continue
        indent, fence = match["indent"], match["fence"]
        closing = re.compile(r"^[ \t]*" + re.escape(fence[0]) + "{" + str(len(fence)) + r",}[ \t]*$")
        body: list[str] = []
        end = index + 1
        while end < len(lines) and not closing.match(lines[end]):
            body.append(_strip_indent(lines[end], indent))
            end += 1
        closed = end < len(lines)
        tag = match["info"].strip().split()[0].lower() if match["info"].strip() else ""
        blocks.append(Block(tag, "\n".join(body), index + 1, min(end + 1, len(lines)), closed))
        index = end + 1
    return blocks


def _strip_indent(line: str, indent: str) -> str:
    """Remove up to the fence's own indentation, never a non-blank character."""
    strip = 0
    while strip < len(indent) and strip < len(line) and line[strip] in " \t":
        strip += 1
    return line[strip:]
