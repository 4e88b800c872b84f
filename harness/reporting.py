"""One run's report: pass@k with intervals, outcomes, tags, per-problem grid, provenance.

``load_run`` reads a folder written by ``assay score``; ``build_report`` turns it into one
JSON-able dict, and ``render`` writes that dict as a terminal table, markdown, HTML or JSON,
so every format shows the same numbers. ``compare`` and ``trend`` reuse the loading and the
grouping (languages, overall, difficulty, tags) defined here.
"""

from __future__ import annotations

import json
from collections import Counter, defaultdict
from fractions import Fraction
from dataclasses import dataclass, field
from pathlib import Path

from .execution import OUTCOMES
from .metrics import pass_at_k_exact
from .problems import ProblemError, load_problem_set
from .report import SHORT, pass_table
from .stats import DEFAULT_CONFIDENCE, DEFAULT_RESAMPLES, DEFAULT_SEED, bootstrap_ratio
from .store import EXECUTIONS, MANIFEST, SUMMARY
from .tables import paint, render as render_columns

FORMATS = ("table", "markdown", "html", "json")
MIN_PROBLEMS = 10  # below this, an interval over problems says little (a convention, not a theorem)
SLOWEST = 10
BAR_WIDTH = 40
BAR_CHARS = {"passed": "#", "wrong_answer": "=", "compile_error": "c", "runtime_error": "x", "timeout": "t",
             "memory_limit": "m", "output_limit": "o", "infra_error": "!"}
OUTCOME_COLOURS = {"passed": "#2e7d32", "wrong_answer": "#c62828", "compile_error": "#6a1b9a",
                   "runtime_error": "#ef6c00", "timeout": "#1565c0", "memory_limit": "#00838f",
                   "output_limit": "#795548", "infra_error": "#9e9e9e"}
MARKS = {
    "few_problems": f"fewer than {MIN_PROBLEMS} problems: the interval is too rough to rely on",
    "infra_errors": "infra errors present: those samples are excluded from pass@k; rerun to retry them",
    "k_above_samples": "n/a: k exceeds the fewest samples per problem",
}


class RunError(ValueError):
    """A run folder that cannot be read; the message names the file (and line)."""


@dataclass
class Settings:
    """How intervals are computed; recorded in every output so a figure can be reproduced."""

    ks: list[int]
    confidence: float = DEFAULT_CONFIDENCE
    method: str = "percentile"
    resamples: int = DEFAULT_RESAMPLES
    seed: int = DEFAULT_SEED

    def as_dict(self) -> dict:
        return {"ks": self.ks, "confidence": self.confidence, "method": self.method,
                "resamples": self.resamples, "seed": self.seed, "unit": "problem",
                "min_problems": MIN_PROBLEMS}


@dataclass
class Run:
    path: Path
    manifest: dict
    summary: dict | None
    rows: list[dict]
    problems: dict[str, dict]  # id -> {"difficulty", "tags", "title"}; empty when the set is unreadable
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
        return {p.id: {"difficulty": p.difficulty, "tags": list(p.tags), "title": p.title}
                for p in problem_set.problems.values()}
    if recorded:
        warnings.append(f"problem set {recorded.get('path') or recorded.get('name')} not found: "
                        "no breakdown by difficulty or tag")
    return {}


# -- groups: which (problem, language) pairs a figure averages over ---------------------------------

@dataclass(frozen=True)
class Group:
    name: str
    kind: str  # language | overall | difficulty | tag
    pairs: tuple[tuple[str, str], ...]


def groups(run_problems: dict[str, dict], pairs, tags: bool = True) -> list[Group]:
    """Languages, overall, then (when ``tags``) difficulty levels and topic tags."""
    pairs = sorted(pairs)
    result = [Group(lang, "language", tuple(p for p in pairs if p[1] == lang))
              for lang in sorted({lang for _, lang in pairs})]
    result.append(Group("overall", "overall", tuple(pairs)))
    if tags and run_problems:
        levels = ("easy", "medium", "hard")
        found = {run_problems[p]["difficulty"] for p, _ in pairs if p in run_problems}
        for level in [d for d in levels if d in found] + sorted(found - set(levels)):
            result.append(Group(level, "difficulty", tuple(
                p for p in pairs if run_problems.get(p[0], {}).get("difficulty") == level)))
        for tag in sorted({t for p, _ in pairs for t in run_problems.get(p, {}).get("tags", ())}):
            result.append(Group(tag, "tag", tuple(
                p for p in pairs if tag in run_problems.get(p[0], {}).get("tags", ()))))
    return result


def pair_values(counts: dict[tuple[str, str], tuple[int, int]], k: int) -> dict[tuple[str, str], float | None]:
    """pass@k per pair (Chen et al. 2021 estimator from ``metrics``); None where k > samples."""
    return {pair: (pass_at_k_exact(n, c, k) if k <= n else None) for pair, (n, c) in counts.items()}


def by_problem(pairs, values: dict) -> tuple[list[str], list[float], list[int]] | None:
    """Problems, each one's summed pass@k over its languages, and its number of pairs;
    None if any pair has no value (k above its samples)."""
    sums: dict[str, Fraction] = defaultdict(Fraction)
    weights: dict[str, int] = defaultdict(int)
    for pair in pairs:
        value = values[pair]
        if value is None:
            return None
        sums[pair[0]] += value
        weights[pair[0]] += 1
    problems = sorted(sums)
    return problems, [sums[p] for p in problems], [weights[p] for p in problems]


def marks(problems: int, infra: int, missing_ks: list[int]) -> list[str]:
    found = []
    if problems < MIN_PROBLEMS:
        found.append("few_problems")
    if infra:
        found.append("infra_errors")
    if missing_ks:
        found.append("k_above_samples")
    return found


def group_row(run: Run, group: Group, settings: Settings) -> dict:
    counts = run.counts()
    scored = [p for p in group.pairs if p in counts]
    problems = len({p for p, _ in scored})
    infra = sum(run.outcomes[p]["infra_error"] for p in group.pairs)
    figures: dict[str, dict | None] = {}
    for k in settings.ks:
        clustered = by_problem(scored, pair_values({p: counts[p] for p in scored}, k)) if scored else None
        if clustered is None:
            figures[str(k)] = None
            continue
        _, sums, weights = clustered
        figures[str(k)] = bootstrap_ratio(sums, weights, confidence=settings.confidence,
                                          resamples=settings.resamples, seed=settings.seed,
                                          method=settings.method).as_dict()
    missing = [k for k in settings.ks if figures[str(k)] is None]
    return {"group": group.name, "kind": group.kind, "problems": problems, "pairs": len(scored),
            "samples": sum(counts[p][0] for p in scored), "infra_errors": infra,
            "min_samples": min((counts[p][0] for p in scored), default=0),
            "pass_at_k": figures, "marks": marks(problems, infra, missing)}


# -- the report -------------------------------------------------------------------------------------

def build_report(run: Run, settings: Settings, tags: bool = True) -> dict:
    all_groups = groups(run.problems, run.outcomes, tags)
    rows = [group_row(run, g, settings) for g in all_groups]
    outcome_totals = {lang: Counter() for lang in run.languages}
    for (_, language), outcomes in run.outcomes.items():
        outcome_totals[language].update(outcomes)
    outcome_totals["overall"] = sum(outcome_totals.values(), Counter())
    counts = run.counts()
    grid = [{"problem": problem, "difficulty": run.problems.get(problem, {}).get("difficulty"),
             "tags": run.problems.get(problem, {}).get("tags", []),
             "cells": {lang: ({"n": counts[(problem, lang)][0], "c": counts[(problem, lang)][1],
                               "rate": counts[(problem, lang)][1] / counts[(problem, lang)][0]}
                              if (problem, lang) in counts else None) for lang in run.languages}}
            for problem in sorted({p for p, _ in run.outcomes})]
    timed = [r for r in run.rows if isinstance(r.get("seconds"), (int, float))]
    slowest = sorted(timed, key=lambda r: -r["seconds"])[:SLOWEST]
    flaky_recorded = any("flaky" in r for r in run.rows)
    flaky_rows = [_brief_row(r) for r in run.rows if r.get("flaky")]
    warnings = list(run.warnings)
    if flaky_rows:
        warnings.append(f"{len(flaky_rows)} flaky candidate(s): repeated runs disagreed, so their recorded "
                        "verdict (the first run's) may not reproduce")
    return {
        "run": {"path": str(run.path), "label": run.label},
        "settings": settings.as_dict(),
        "groups": rows,
        "outcomes": {name: {o: totals.get(o, 0) for o in OUTCOMES} for name, totals in outcome_totals.items()},
        "grid": {"languages": run.languages, "problems": grid},
        "slowest": [_brief_row(r) for r in slowest],
        "flaky": {"recorded": flaky_recorded, "rows": flaky_rows},
        "provenance": provenance(run),
        "warnings": warnings,
        "marks": MARKS,
    }


def _brief_row(row: dict) -> dict:
    keep = ("problem", "language", "sample", "outcome", "seconds", "peak_memory_mb", "flaky", "repeat_outcomes")
    brief = {k: row[k] for k in keep if k in row}
    brief["detail"] = str(row.get("detail", ""))[:160]
    return brief


def provenance(run: Run) -> dict:
    m = run.manifest
    keep = ("label", "harness_version", "problem_set", "mode", "limit_overrides", "sandbox", "inputs",
            "started_at", "finished_at", "resumed_at", "host")
    result = {k: m[k] for k in keep if k in m}
    result["runtimes"] = {name: {"digest": info.get("digest"), "toolchain": info.get("toolchain"),
                                 "limits": info.get("limits")} for name, info in (m.get("runtimes") or {}).items()}
    result["path"] = str(run.path)
    return result


def render(report: dict, fmt: str, colour: bool = False, summary: dict | None = None) -> str:
    if fmt == "json":
        return json.dumps(report, indent=2, ensure_ascii=False)
    if fmt == "html":
        return render_html(report)
    if fmt == "markdown":
        return render_markdown(report)
    if fmt == "table":
        return render_table(report, colour, summary)
    raise ValueError(f"format must be one of {', '.join(FORMATS)}, got {fmt!r}")


# -- shared cell formatting ---------------------------------------------------------------------------

def pct(value: float | None, signed: bool = False) -> str:
    if value is None:
        return "n/a"
    return f"{100 * value:+.1f}" if signed else f"{100 * value:.1f}"


def figure_cell(figure: dict | None, flagged: bool = False) -> str:
    """``55.6 [48.9, 62.2]``; a trailing ``*`` when the row carries a mark."""
    if figure is None:
        return "n/a"
    text = f"{pct(figure['estimate'])} [{pct(figure['low'])}, {pct(figure['high'])}]"
    return text + ("*" if flagged else "")


def notes_cell(row: dict) -> str:
    notes = []
    if "few_problems" in row["marks"]:
        notes.append(f"few problems ({row['problems']})")
    if "infra_errors" in row["marks"]:
        notes.append(f"{row['infra_errors']} infra error(s)")
    if "k_above_samples" in row["marks"]:
        notes.append(f"k > {row['min_samples']} samples" if row["min_samples"] else "no samples")
    return "; ".join(notes)


def _trust_flag(row: dict) -> bool:
    return bool({"few_problems", "infra_errors"} & set(row["marks"]))


def segments(counts: dict[str, int]) -> list[tuple[str, int, float]]:
    """(outcome, count, share) for outcomes that occurred, in the fixed outcome order."""
    total = sum(counts.values())
    return [(o, counts[o], counts[o] / total) for o in OUTCOMES if counts.get(o)] if total else []


def text_bar(counts: dict[str, int], width: int = BAR_WIDTH) -> str:
    """Stacked bar of characters; widths by largest remainder so they add up to ``width``."""
    parts = segments(counts)
    if not parts:
        return ""
    exact = [share * width for _, _, share in parts]
    sizes = [int(x) for x in exact]
    for i in sorted(range(len(parts)), key=lambda i: exact[i] - sizes[i], reverse=True)[:width - sum(sizes)]:
        sizes[i] += 1
    return "".join(BAR_CHARS[o] * size for (o, _, _), size in zip(parts, sizes))


# -- terminal table -----------------------------------------------------------------------------------

def render_table(report: dict, colour: bool = False, summary: dict | None = None) -> str:
    ks = report["settings"]["ks"]
    out = []
    if summary is not None:
        out += [pass_table(summary, colour, title=report["run"]["path"]), ""]
    else:
        out += [paint(report["run"]["label"], "1", colour), ""]
    for warning in report["warnings"]:
        out.append(paint("warning: " + warning, "33", colour))
    out.append(paint("pass@k with intervals", "1", colour) + f" ({_describe(report['settings'])})")
    out.append(_group_table([r for r in report["groups"] if r["kind"] in ("language", "overall")], ks, "language"))
    for kind in ("difficulty", "tag"):
        rows = [r for r in report["groups"] if r["kind"] == kind]
        if rows:
            out += ["", paint(f"by {kind} (all languages)", "1", colour), _group_table(rows, ks, kind)]
    out += ["", paint("outcomes", "1", colour)]
    legend = "  ".join(f"{BAR_CHARS[o]} {SHORT[o]}" for o in OUTCOMES)
    bars = [[name, str(sum(c.values())), text_bar(c)] for name, c in report["outcomes"].items()]
    out += [render_columns(["language", "samples", "bar"], bars, align="lrl"), legend]
    out += ["", paint("solve rate per problem (passed/samples)", "1", colour)]
    languages = report["grid"]["languages"]
    grid_rows = [[p["problem"], p["difficulty"] or "?"]
                 + [f"{c['c']}/{c['n']}" if c else "-" for c in (p["cells"][l] for l in languages)]
                 for p in report["grid"]["problems"]]
    out.append(render_columns(["problem", "difficulty"] + languages, grid_rows, align="ll" + "r" * len(languages)))
    out += ["", paint(f"slowest candidates (top {SLOWEST})", "1", colour)]
    out.append(render_columns(["problem", "language", "sample", "outcome", "seconds"],
                              [[r["problem"], r["language"], str(r.get("sample", "")), r["outcome"],
                                f"{r['seconds']:.3f}"] for r in report["slowest"]], align="llrlr"))
    out += ["", paint("flaky candidates", "1", colour)]
    out.append(_flaky_text(report["flaky"]))
    out += ["", paint("provenance", "1", colour)]
    out += [f"  {key}: {value}" for key, value in provenance_lines(report["provenance"])]
    return "\n".join(out)


def _describe(settings: dict) -> str:
    return (f"{100 * settings['confidence']:g}% {settings['method']} bootstrap over problems, "
            f"{settings['resamples']} resamples, seed {settings['seed']}")


def _group_table(rows: list[dict], ks: list[int], first: str) -> str:
    headers = [first, "problems", "samples"] + [f"pass@{k}" for k in ks] + ["notes"]
    body = [[r["group"], str(r["problems"]), str(r["samples"])]
            + [figure_cell(r["pass_at_k"][str(k)], _trust_flag(r)) for k in ks] + [notes_cell(r)]
            for r in rows]
    footnote = flag_footnote(rows)
    return render_columns(headers, body, align="lrr" + "r" * len(ks) + "l") + (f"\n* {footnote}" if footnote else "")


def flag_footnote(rows: list[dict]) -> str:
    """What the ``*`` beside figures of these rows means ('' when none is flagged)."""
    return "; ".join(sorted({MARKS[m] for r in rows if _trust_flag(r) for m in r["marks"] if m != "k_above_samples"}))


def _flaky_text(flaky: dict) -> str:
    if not flaky["recorded"]:
        return "  no flakiness data in this run (no row has a 'flaky' field)"
    if not flaky["rows"]:
        return "  none flagged"
    return render_columns(["problem", "language", "sample", "recorded", "repeated runs"],
                          [[r["problem"], r["language"], str(r.get("sample", "")), r["outcome"], repeats_text(r)]
                           for r in flaky["rows"]], align="llrll")


def repeats_text(row: dict) -> str:
    """The outcomes of the repeated runs (``--repeat``), or the raw flag when they are absent."""
    outcomes = row.get("repeat_outcomes")
    return ", ".join(map(str, outcomes)) if isinstance(outcomes, list) else str(row.get("flaky"))


def provenance_lines(prov: dict) -> list[tuple[str, str]]:
    lines = [("run", prov.get("path", "")), ("label", str(prov.get("label")))]
    if "harness_version" in prov:
        lines.append(("harness", prov["harness_version"]))
    problem_set = prov.get("problem_set")
    if problem_set:
        lines.append(("problem set", f"{problem_set.get('name')} ({problem_set.get('problems')} problems, "
                                     f"digest {str(problem_set.get('digest'))[:12]}) at {problem_set.get('path')}"))
    if "mode" in prov:
        lines.append(("mode", prov["mode"]))
    for name, info in prov.get("runtimes", {}).items():
        run_limits = (info.get("limits") or {}).get("run") or {}
        limits = ", ".join(f"{k}={v}" for k, v in run_limits.items())
        lines.append((f"runtime {name}", f"{info.get('toolchain')}, digest {str(info.get('digest'))[:12]}; "
                                         f"run limits: {limits}"))
    if "sandbox" in prov:
        lines.append(("sandbox", ", ".join(f"{k}={v}" for k, v in prov["sandbox"].items())))
    if prov.get("limit_overrides"):
        lines.append(("limit overrides", json.dumps(prov["limit_overrides"])))
    for item in prov.get("inputs", []):
        lines.append(("input", f"{item.get('path')} (sha256 {str(item.get('sha256'))[:12]})"))
    if "started_at" in prov:
        lines.append(("started", str(prov["started_at"])))
        lines.append(("finished", str(prov.get("finished_at"))))
    if prov.get("host"):
        lines.append(("host", ", ".join(f"{k}={v}" for k, v in prov["host"].items())))
    return lines


# -- markdown ----------------------------------------------------------------------------------------

def _md_table(headers: list[str], rows: list[list[str]], align: str) -> str:
    def cell(text: str) -> str:
        return str(text).replace("|", "\\|").replace("\n", " ")
    rule = ["---:" if a == "r" else ":---" for a in align]
    lines = ["| " + " | ".join(headers) + " |", "| " + " | ".join(rule) + " |"]
    lines += ["| " + " | ".join(cell(c) for c in row) + " |" for row in rows]
    return "\n".join(lines)


def render_markdown(report: dict) -> str:
    ks = report["settings"]["ks"]
    out = [f"# Assay report: {report['run']['label']}", ""]
    out += [f"> **warning:** {w}" for w in report["warnings"]]
    if report["warnings"]:
        out.append("")

    def group_md(rows, first):
        headers = [first, "problems", "samples"] + [f"pass@{k}" for k in ks] + ["notes"]
        body = [[r["group"], str(r["problems"]), str(r["samples"])]
                + [figure_cell(r["pass_at_k"][str(k)], _trust_flag(r)) for k in ks] + [notes_cell(r)]
                for r in rows]
        footnote = flag_footnote(rows)
        return _md_table(headers, body, "lrr" + "r" * len(ks) + "l") + (f"\n\n\\* {footnote}" if footnote else "")

    out += ["## pass@k", "", f"{_describe(report['settings'])}; cells are estimate [low, high] in percent.", ""]
    out += [group_md([r for r in report["groups"] if r["kind"] in ("language", "overall")], "language"), ""]
    for kind in ("difficulty", "tag"):
        rows = [r for r in report["groups"] if r["kind"] == kind]
        if rows:
            out += [f"## By {kind} (all languages)", "", group_md(rows, kind), ""]
    out += ["## Outcomes", "", "```"]
    out += [f"{name:<12} {text_bar(c)}" for name, c in report["outcomes"].items()]
    out += ["```", "", "Legend: " + ", ".join(f"`{BAR_CHARS[o]}` {o}" for o in OUTCOMES), ""]
    out += [_md_table(["language"] + list(OUTCOMES),
                      [[name] + [str(c.get(o, 0)) for o in OUTCOMES] for name, c in report["outcomes"].items()],
                      "l" + "r" * len(OUTCOMES)), ""]
    languages = report["grid"]["languages"]
    out += ["## Solve rate per problem", "", "Passed / samples per (problem, language).", ""]
    out += [_md_table(["problem", "difficulty"] + languages,
                      [[p["problem"], p["difficulty"] or "?"]
                       + [f"{c['c']}/{c['n']}" if c else "-" for c in (p["cells"][l] for l in languages)]
                       for p in report["grid"]["problems"]], "ll" + "r" * len(languages)), ""]
    out += [f"## Slowest candidates (top {SLOWEST})", ""]
    out += [_md_table(["problem", "language", "sample", "outcome", "seconds"],
                      [[r["problem"], r["language"], str(r.get("sample", "")), r["outcome"], f"{r['seconds']:.3f}"]
                       for r in report["slowest"]], "llrlr"), ""]
    out += ["## Flaky candidates", ""]
    flaky = report["flaky"]
    if not flaky["recorded"] or not flaky["rows"]:
        out += [_flaky_text(flaky).strip(), ""]
    else:
        out += [_md_table(["problem", "language", "sample", "recorded", "repeated runs"],
                          [[r["problem"], r["language"], str(r.get("sample", "")), r["outcome"], repeats_text(r)]
                           for r in flaky["rows"]], "llrll"), ""]
    out += ["## Provenance", ""]
    out += [f"- **{key}:** {value}" for key, value in provenance_lines(report["provenance"])]
    return "\n".join(out) + "\n"


# -- HTML --------------------------------------------------------------------------------------------

def render_html(report: dict) -> str:
    """One self-contained page (inline CSS and SVG, no scripts, no external requests)."""
    from jinja2 import Environment, FileSystemLoader, select_autoescape

    env = Environment(loader=FileSystemLoader(str(Path(__file__).parent / "templates")),
                      autoescape=select_autoescape(["html", "j2"]), trim_blocks=True, lstrip_blocks=True)
    env.filters["pct"] = pct
    ks = report["settings"]["ks"]
    groups_by_kind = {kind: [r for r in report["groups"] if r["kind"] == kind]
                      for kind in ("language", "overall", "difficulty", "tag")}
    bars = [{"name": name, "total": sum(c.values()),
             "segments": _svg_segments(c)} for name, c in report["outcomes"].items()]
    grid = [{"problem": p["problem"], "difficulty": p["difficulty"], "tags": p["tags"],
             "cells": [_grid_cell(p["cells"][lang]) for lang in report["grid"]["languages"]]}
            for p in report["grid"]["problems"]]
    return env.get_template("report.html.j2").render(
        report=report, ks=ks, describe=_describe(report["settings"]),
        main_rows=groups_by_kind["language"] + groups_by_kind["overall"],
        tag_sections=[(kind, groups_by_kind[kind]) for kind in ("difficulty", "tag") if groups_by_kind[kind]],
        bars=bars, outcomes=OUTCOMES, colours=OUTCOME_COLOURS, grid=grid, flag_footnote=flag_footnote,
        provenance=provenance_lines(report["provenance"]), notes_cell=notes_cell, trust_flag=_trust_flag,
        repeats_text=repeats_text,
        interval_svg=_interval_svg,
    )


def _svg_segments(counts: dict[str, int]) -> list[dict]:
    x, result = 0.0, []
    for outcome, count, share in segments(counts):
        result.append({"outcome": outcome, "count": count, "x": round(1000 * x, 2),
                       "width": round(1000 * share, 2), "colour": OUTCOME_COLOURS[outcome],
                       "share": f"{100 * share:.1f}"})
        x += share
    return result


def _grid_cell(cell: dict | None) -> dict:
    if cell is None:
        return {"text": "-", "style": "", "title": "no samples"}
    hue = round(120 * cell["rate"])
    return {"text": f"{cell['c']}/{cell['n']}", "style": f"background: hsl({hue}, 55%, 82%)",
            "title": f"{cell['c']} of {cell['n']} samples passed"}


def _interval_svg(figure: dict | None) -> dict | None:
    """Positions (0-200 px wide) for a tiny interval sketch beside a figure."""
    if figure is None:
        return None
    return {"low": round(200 * figure["low"], 1), "high": round(200 * figure["high"], 1),
            "point": round(200 * figure["estimate"], 1)}

