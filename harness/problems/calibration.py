"""``calibrated_limits.yaml``: a set's per-language time limits for its program problems.

``assay problems calibrate`` writes the file (``harness.engine.calibrate`` measures); the set
loader reads it, and a program problem's run step then takes the calibrated wall and CPU
limit of the candidate's language over the problem's own default. A language the file marks
``default`` (no reference to measure) or does not name keeps the problem's default limit.
"""

from __future__ import annotations

from pathlib import Path

import yaml

from ..yamlfiles import read_yaml
from .programs import CalibratedLimit

CALIBRATED_FILE = "calibrated_limits.yaml"
DEFAULT_MARK = "default"
HEADER_COMMENT = """\
# Written by `assay problems calibrate`; edit by rerunning it, not by hand.
# Per problem and language: the run step's time limit for each case, wall and CPU seconds,
# = multiple x the slowest reference run of any case + floor (see docs/problem-format.md).
# A language marked `default` has no reference to measure: the problem's default limit applies.
"""


def read_calibrated_limits(file: Path, problem_ids: set[str], error: type[Exception]) -> tuple[dict, dict]:
    """(header, {problem id: {language: CalibratedLimit or DEFAULT_MARK}}). ``error`` is raised
    with a message naming the file and the field."""
    data = read_yaml(file, error)

    def fail(where: str, message: str) -> Exception:
        return error(f"{file}: field '{where}': {message}")

    if not isinstance(data, dict):
        raise error(f"{file}: expected a mapping with 'calibration' and 'limits'")
    header = data.get("calibration", {})
    if not isinstance(header, dict):
        raise fail("calibration", "expected a mapping")
    raw = data.get("limits", {}) or {}
    if not isinstance(raw, dict):
        raise fail("limits", "expected a mapping of problem id to languages")
    limits: dict[str, dict] = {}
    for problem_id, languages in raw.items():
        where = f"limits.{problem_id}"
        if problem_id not in problem_ids:
            raise fail(where, f"no program problem {problem_id!r} in the set; rerun assay problems calibrate")
        if not isinstance(languages, dict):
            raise fail(where, "expected a mapping of language to limits")
        limits[problem_id] = {}
        for language, entry in languages.items():
            limits[problem_id][str(language)] = _entry(entry, lambda m, w=f"{where}.{language}": fail(w, m))
    return header, limits


def _entry(entry: object, fail) -> CalibratedLimit | str:
    if entry == DEFAULT_MARK:
        return DEFAULT_MARK
    if not isinstance(entry, dict):
        raise fail(f"expected {DEFAULT_MARK!r} or a mapping with wall_seconds and cpu_seconds")
    values = {}
    for key in ("wall_seconds", "cpu_seconds", "slowest_wall_seconds", "slowest_cpu_seconds"):
        value = entry.get(key)
        required = key in ("wall_seconds", "cpu_seconds")
        if value is None and not required:
            continue
        if isinstance(value, bool) or not isinstance(value, (int, float)) or value <= 0 and required or value < 0:
            raise fail(f"{key}: expected a positive number of seconds, got {value!r}")
        values[key] = float(value)
    unknown = set(entry) - {"wall_seconds", "cpu_seconds", "slowest_wall_seconds", "slowest_cpu_seconds"}
    if unknown:
        raise fail(f"unknown key(s) {', '.join(sorted(map(str, unknown)))}")
    return CalibratedLimit(**values)


def write_calibrated_limits(file: Path, header: dict, limits: dict[str, dict]) -> None:
    """Write the file atomically; ``limits`` as ``read_calibrated_limits`` returns them."""
    body = {"calibration": header, "limits": {
        problem_id: {language: (entry if entry == DEFAULT_MARK else _entry_dict(entry))
                     for language, entry in sorted(languages.items())}
        for problem_id, languages in sorted(limits.items())}}
    text = HEADER_COMMENT + yaml.safe_dump(body, sort_keys=False, allow_unicode=True, width=100)
    partial = file.with_name(file.name + ".partial")
    partial.write_text(text, encoding="utf-8")
    partial.replace(file)


def _entry_dict(entry: CalibratedLimit) -> dict:
    data = {"wall_seconds": entry.wall_seconds, "cpu_seconds": entry.cpu_seconds}
    if entry.slowest_wall_seconds is not None:
        data["slowest_wall_seconds"] = entry.slowest_wall_seconds
    if entry.slowest_cpu_seconds is not None:
        data["slowest_cpu_seconds"] = entry.slowest_cpu_seconds
    return data
