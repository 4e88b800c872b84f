"""``assay extract``: the text a model wrote beside the program that will run, so a failing
sample can be read before the model is blamed."""

from __future__ import annotations

import json
import shutil
import sys
from pathlib import Path
from typing import List, Optional

import typer

from ..console import paint, use_colour
from ..engine.completions import MODES, read_dumps
from ..engine.execution import Executor
from ..extraction import EXTRACTION_POLICIES, policy_label
from ..vocabulary import Reject
from .common import RuntimesDir, fail, load_runtimes, load_set

SIDE_BY_SIDE_MIN_WIDTH = 100


def register(app: typer.Typer) -> None:
    app.command()(extract)


def extract(
    dump: Path = typer.Argument(..., help="Completion dump, JSONL: problem, language, completion[, sample]."),
    set_name: str = typer.Option("core", "--set", help="Bundled set name or path to a folder of problems."),
    lang: List[str] = typer.Option(..., "--lang", help="Runtime(s) whose rows to show; repeat for several."),
    problem: Optional[str] = typer.Option(None, "--problem", help="Only this problem's rows."),
    sample: Optional[int] = typer.Option(None, "--sample", min=0, help="Only this sample index."),
    mode: str = typer.Option("continue", "--mode", help="continue or whole, as given to assay score."),
    extract_policy: str = typer.Option("syntax", "--extract", help="syntax or strict, as given to assay score."),
    limit: int = typer.Option(5, "--limit", min=1, help="Show at most this many rows."),
    width: Optional[int] = typer.Option(None, "--width", min=40, help="Columns to lay out in (default: the "
                                        "terminal's); side by side from 100 columns, else one above the other."),
    runtimes_dir: Optional[List[Path]] = RuntimesDir,
    as_json: bool = typer.Option(False, "--json", help="One JSON object per row: text, program, record."),
) -> None:
    """Show, for samples of a dump, the model's text beside the program that will run."""
    if mode not in MODES:
        fail(f"--mode must be one of: {', '.join(MODES)}")
    if extract_policy not in EXTRACTION_POLICIES:
        fail(f"--extract must be one of: {', '.join(EXTRACTION_POLICIES)}")
    if not dump.is_file():
        fail(f"{dump}: no such file")
    problems = load_set(set_name)
    if problem is not None and problem not in problems.problems:
        fail(f"unknown problem {problem!r} in set {problems.name}")
    runtimes = load_runtimes(sorted(set(lang)), runtimes_dir)
    executor = Executor(None, problems, runtimes, mode=mode, extract_policy=extract_policy)
    colour = use_colour()
    columns = width or shutil.get_terminal_size((120, 40)).columns
    shown = 0

    def refusal(problem_id: str, language: str) -> str | None:
        return runtimes[language].refusal(problems.problems[problem_id])

    for item in read_dumps([dump], set(problems.problems), set(runtimes), refusal=refusal):
        if isinstance(item, Reject):
            continue
        if (problem is not None and item.problem != problem) or (sample is not None and item.sample != sample):
            continue
        done = executor.extraction(item)
        program = executor.code(item)
        if as_json:
            typer.echo(json.dumps({"problem": item.problem, "language": item.language, "sample": item.sample,
                                   "line": item.line, "policy": policy_label(extract_policy), "text": item.completion,
                                   "program": program, "record": done.record}, ensure_ascii=False))
        else:
            title = f"{item.problem} · {item.language} · sample {item.sample} ({dump}:{item.line})"
            typer.echo(paint(title, "1", colour))
            for key, value in done.record.items():
                typer.echo(f"  {key}: {', '.join(value) if isinstance(value, list) else value}")
            typer.echo(_layout(item.completion, program, columns, colour))
        shown += 1
        if shown >= limit:
            break
    if shown == 0:
        fail(f"no row of {dump} matches (--lang {', '.join(lang)}"
             + (f", --problem {problem}" if problem else "") + (f", --sample {sample}" if sample is not None else "")
             + "); rejected rows are listed by assay score", code=1)


def _layout(text: str, program: str, columns: int, colour: bool) -> str:
    left_title, right_title = "what the model wrote", "what will run (before the test driver)"
    if columns < SIDE_BY_SIDE_MIN_WIDTH:
        rule = "─" * min(columns, 60)
        return "\n".join([paint(left_title, "36", colour), rule, text.rstrip("\n"),
                          paint(right_title, "36", colour), rule, program.rstrip("\n"), ""])
    half = (columns - 3) // 2
    left = _wrap(text.expandtabs(4).split("\n"), half)
    right = _wrap(program.expandtabs(4).split("\n"), half)
    lines = [paint(left_title.ljust(half), "36", colour) + " │ " + paint(right_title, "36", colour),
             "─" * half + "─┼─" + "─" * half]
    for index in range(max(len(left), len(right))):
        a = left[index] if index < len(left) else ""
        b = right[index] if index < len(right) else ""
        lines.append(a.ljust(half) + " │ " + b)
    return "\n".join(lines) + "\n"


def _wrap(lines: list[str], width: int) -> list[str]:
    """Long lines are folded, marked with ↪, never cut."""
    out = []
    for line in lines:
        line = line.encode("utf-8", "backslashreplace").decode("utf-8")
        while len(line) > width:
            out.append(line[: width - 1] + "↪")
            line = line[width - 1:]
        out.append(line)
    return out
