"""The corpus of answer shapes in tests/extraction_corpus/ (its README describes the format)."""

from __future__ import annotations

import re
from dataclasses import dataclass
from pathlib import Path

import yaml

CORPUS = Path(__file__).resolve().parent / "extraction_corpus"
_SLOT = re.compile(r"^([ \t]*)<<(SOLUTION|BODY)>>[ \t]*$", re.MULTILINE)


@dataclass(frozen=True)
class Shape:
    language: str
    name: str
    mode: str
    problem: str
    correct: str
    wrong: str
    known_failure: str | None


def fill(template: str, slots: dict[str, str]) -> str:
    """Put code where its placeholder line stands, indented as that line is."""
    def put(match: re.Match) -> str:
        indent, code = match.group(1), slots[match.group(2)].rstrip("\n")
        return "\n".join(indent + line if line.strip() else line for line in code.split("\n"))
    return _SLOT.sub(put, template)


def corpus_languages() -> list[str]:
    return sorted(p.stem for p in CORPUS.glob("*.yaml"))


def load_shapes(language: str, reference_body=None) -> list[Shape]:
    data = yaml.safe_load((CORPUS / f"{language}.yaml").read_text(encoding="utf-8"))
    problem = data["problem"]
    body = data.get("body")
    if body is None and reference_body is not None:
        body = reference_body(problem)
    slots = {"SOLUTION": data["solution"], "BODY": body or ""}
    wrong_slots = {"SOLUTION": data["wrong_solution"], "BODY": data.get("wrong_body") or ""}
    shapes = []
    for entry in data["shapes"]:
        text = entry["text"]
        wrong = entry.get("wrong_text", text)
        shapes.append(Shape(language, entry["name"], entry["mode"], entry.get("problem", problem),
                            fill(text, slots), fill(wrong, wrong_slots), entry.get("known_failure")))
    return shapes
