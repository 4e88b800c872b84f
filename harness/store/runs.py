"""Loading a finished results folder for analysis: its manifest, summary, every verdict row,
and the problems' difficulty and tags from the set the manifest names."""

from __future__ import annotations

import json
from collections import Counter, defaultdict
from dataclasses import dataclass, field
from pathlib import Path

from ..problems import ProblemError, load_problem_set
from ..vocabulary import OUTCOMES
from .results import EXECUTIONS, MANIFEST, SUMMARY


class RunError(ValueError):
    """A run folder that cannot be read; the message names the file (and line)."""


@dataclass
class Run:
    path: Path
    manifest: dict
    summary: dict | None
    rows: list[dict]
    problems: dict[str, dict]  # id -> {"difficulty", "tags", "title", "kind"}; empty when the set is unreadable
    warnings: list[str] = field(default_factory=list)
    outcomes: dict[tuple[str, str], Counter] = field(default_factory=dict)

    @property
    def label(self) -> str:
        return self.manifest.get("label") or self.path.name

    @property
    def ks(self) -> list[int]:
        return list((self.summary or {}).get("ks") or [1])

    def counts(self) -> dict[tuple[str, str], tuple[int, int]]:
        """(problem, language) -> (samples, passes), infra errors excluded as in ``summarize``."""
        result = {}
        for pair, outcomes in self.outcomes.items():
            n = sum(v for o, v in outcomes.items() if o != "infra_error")
            if n:
                result[pair] = (n, outcomes["passed"])
        return result

    @property
    def languages(self) -> list[str]:
        return sorted({language for _, language in self.outcomes})


def load_run(path: Path) -> Run:
    path = Path(path)
    manifest_path, executions_path = path / MANIFEST, path / EXECUTIONS
    if not path.is_dir():
        raise RunError(f"{path}: not a folder")
    if not executions_path.is_file():
        raise RunError(f"{executions_path}: no verdicts; run 'assay score ... --out {path}' first")
    manifest = _read_json(manifest_path) if manifest_path.is_file() else {}
    summary = _read_json(path / SUMMARY) if (path / SUMMARY).is_file() else None
    rows = []
    outcomes: dict[tuple[str, str], Counter] = defaultdict(Counter)
    with open(executions_path, encoding="utf-8") as handle:
        for number, line in enumerate(handle, 1):
            if not line.strip():
                continue
            try:
                row = json.loads(line)
            except ValueError as exc:
                raise RunError(f"{executions_path}:{number}: not JSON ({exc.msg})") from None
            if not isinstance(row, dict):
                raise RunError(f"{executions_path}:{number}: expected a JSON object")
            for key in ("problem", "language", "outcome"):
                if not isinstance(row.get(key), str):
                    raise RunError(f"{executions_path}:{number}: field '{key}' missing or not a string")
            if row["outcome"] not in OUTCOMES:
                raise RunError(f"{executions_path}:{number}: field 'outcome': unknown value {row['outcome']!r}")
            rows.append(row)
            outcomes[(row["problem"], row["language"])][row["outcome"]] += 1
    run = Run(path, manifest, summary, rows, {}, outcomes=dict(outcomes))
    if not manifest:
        run.warnings.append(f"{manifest_path}: missing; provenance and tags are unknown")
    elif manifest.get("finished_at") is None:
        run.warnings.append(f"{path}: the run did not finish (interrupted?); rerun 'assay score' to complete it")
    run.problems = _problem_info(manifest, run.warnings)
    return run


def _read_json(path: Path) -> dict:
    try:
        data = json.loads(path.read_text(encoding="utf-8"))
    except ValueError as exc:
        raise RunError(f"{path}: not JSON ({exc})") from None
    if not isinstance(data, dict):
        raise RunError(f"{path}: expected a JSON object")
    return data


def _problem_info(manifest: dict, warnings: list[str]) -> dict[str, dict]:
    """Difficulty and tags from the problem set the manifest names (its path, else its name)."""
    recorded = manifest.get("problem_set") or {}
    for where in (recorded.get("path"), recorded.get("name")):
        if not where:
            continue
        try:
            problem_set = load_problem_set(str(where))
        except (ProblemError, OSError):
            continue
        if recorded.get("digest") and problem_set.digest != recorded["digest"]:
            warnings.append(f"problem set {where} changed since the run (digest differs): tags read from "
                            "the current files")
        return {p.id: {"difficulty": p.difficulty, "tags": list(p.tags), "title": p.title, "kind": p.kind}
                for p in problem_set.problems.values()}
    if recorded:
        warnings.append(f"problem set {recorded.get('path') or recorded.get('name')} not found: "
                        "no breakdown by difficulty or tag")
    return {}
