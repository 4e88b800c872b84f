"""Completion dumps: JSONL rows in, validated samples or rejects out, read as a stream.

Every line of every dump ends up as exactly one Sample or one Reject, so nothing is dropped.
"""

from __future__ import annotations

import json
import re
from pathlib import Path
from typing import Callable, Iterable, Iterator

from ..extraction import Extraction, ExtractionRequest
from ..problems import Problem
from ..runtimes import Runtime
from ..store.keys import SampleKeySet
from ..vocabulary import Reject, Sample

MODES = ("continue", "whole")
MAX_COMPLETION_BYTES = 1_000_000


def read_dumps(
    paths: Iterable[Path],
    known_problems: set[str],
    known_languages: set[str],
    max_completion_bytes: int = MAX_COMPLETION_BYTES,
    refusal: Callable[[str, str], str | None] | None = None,
) -> Iterator[Sample | Reject]:
    """Yield one Sample or Reject per line, in file order. A row without ``sample`` takes the
    index after the highest seen so far for its (problem, language) pair; a key seen before is
    rejected as a duplicate. ``refusal(problem, language)`` names why a runtime cannot pose a
    problem (a type it has no counterpart for); such rows are rejected with that reason."""
    seen = SampleKeySet()
    next_index: dict[tuple[str, str], int] = {}
    for path in paths:
        source = str(path)
        with open(path, "rb") as handle:
            for number, raw in enumerate(handle, start=1):
                item = _parse_line(raw, source, number, known_problems, known_languages, max_completion_bytes)
                if not isinstance(item, Reject) and refusal is not None:
                    reason = refusal(item[0], item[1])
                    if reason:
                        item = Reject(source, number, reason)
                if isinstance(item, Reject):
                    yield item
                    continue
                problem, language, sample, completion = item
                pair = (problem, language)
                if sample is None:
                    sample = next_index.get(pair, 0)
                    while (problem, language, sample) in seen:
                        sample += 1
                next_index[pair] = max(next_index.get(pair, 0), sample + 1)
                if (problem, language, sample) in seen:
                    yield Reject(source, number, f"duplicate sample {sample} for problem {problem!r} in {language}")
                    continue
                seen.add((problem, language, sample))
                yield Sample(problem, language, sample, completion, source, number)


def _parse_line(raw: bytes, source: str, number: int, problems: set[str], languages: set[str], limit: int):
    def reject(reason: str) -> Reject:
        return Reject(source, number, reason)

    if not raw.strip():
        return reject("empty line")
    try:
        text = raw.decode("utf-8")
    except UnicodeDecodeError as exc:
        return reject(f"not valid UTF-8 ({exc.reason} at byte {exc.start})")
    try:
        row = json.loads(text)
    except json.JSONDecodeError as exc:
        return reject(f"invalid JSON: {exc.msg} at column {exc.colno}")
    except RecursionError:
        return reject("invalid JSON: nested too deeply")
    if not isinstance(row, dict):
        return reject(f"expected a JSON object, got {type(row).__name__}")
    missing = [f for f in ("problem", "language", "completion") if f not in row]
    if missing:
        return reject(f"missing field(s): {', '.join(missing)}")
    problem, language, completion = row["problem"], row["language"], row["completion"]
    for name, value in (("problem", problem), ("language", language), ("completion", completion)):
        if not isinstance(value, str):
            return reject(f"field '{name}' must be a string, got {type(value).__name__}")
    if problem not in problems:
        return reject(f"unknown problem {problem!r} (not in the problem set)")
    if language not in languages:
        return reject(f"unknown language {language!r} (no such runtime)")
    try:
        size = len(completion.encode("utf-8"))
    except UnicodeEncodeError:
        return reject("completion contains an unpaired surrogate escape")
    if size > limit:
        return reject(f"completion larger than {limit} bytes ({size})")
    sample = row.get("sample")
    if sample is not None and (isinstance(sample, bool) or not isinstance(sample, int) or sample < 0):
        return reject(f"field 'sample' must be a non-negative integer, got {sample!r}")
    if "\0" in completion:
        return reject("completion contains a NUL character")
    return problem, language, sample, completion


def extraction_request(mode: str, runtime: Runtime, problem: Problem, prompt: str, preamble: str,
                       completion: str, policy: str = "syntax") -> ExtractionRequest:
    """Everything extraction needs to know about one completion of ``problem`` in ``runtime``."""
    if mode not in MODES:
        raise ValueError(f"unknown mode {mode!r}; choose one of: {', '.join(MODES)}")
    return ExtractionRequest(mode=mode, completion=completion, prompt=prompt, preamble=preamble,
                             function=runtime.name_of("function", problem.function),
                             param_count=len(problem.params), stops=runtime.stop_sequences,
                             spec=runtime.extraction, policy=policy)


def assemble_code(runtime: Runtime, problem: Problem, mode: str, extraction: Extraction, preamble: str) -> str:
    """The candidate's source before the test driver is appended."""
    if mode == "continue":
        return extraction.code
    if not extraction.imports and not extraction.types:
        return preamble + extraction.code
    return runtime.assemble_whole(problem, extraction.code, extraction.imports, extraction.types)
