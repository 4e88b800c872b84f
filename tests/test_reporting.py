"""``assay report``: the same numbers as table, markdown, HTML and JSON, with trust marks.

The HTML page is opened in headless Chromium (Debian package ``chromium``), which must load
it without a single console message and show the pass@k table.
"""

from __future__ import annotations

import json
import re
import shutil
import subprocess
from html.parser import HTMLParser
from pathlib import Path

import pytest
from typer.testing import CliRunner

from harness.cli import app
from harness.metrics import summarize
from harness.problems import load_problem_set
from harness.render.summary import pass_table
from harness.render.cells import BAR_WIDTH, text_bar
from harness.analysis.report import Settings, build_report
from harness.store import load_run
from harness.render.formats import render

runner = CliRunner()
FAST = ["--resamples", "1000"]
CHROMIUM = shutil.which("chromium") or shutil.which("chromium-browser")
# Chromium logs page console messages as "...:INFO:CONSOLE:12] ..." (older: "CONSOLE(12)").
CONSOLE_LINE = re.compile(r":CONSOLE[:(]\d+")


def write_problem_set(root: Path, problems: dict[str, tuple[str, list[str]]]) -> Path:
    root.mkdir(parents=True, exist_ok=True)
    for pid, (difficulty, tags) in problems.items():
        (root / f"{pid}.yaml").write_text(
            f"id: {pid}\ndifficulty: {difficulty}\ntags: [{', '.join(tags)}]\ndescription: Return x.\n"
            "signature:\n  name: echo\n  params: [{name: x, type: int}]\n  returns: int\n"
            "cases:\n  - {args: [1], expected: 1}\n")
    return root


def write_run(folder: Path, rows: list[dict], *, problem_set: Path | None = None, ks=(1,), label="demo-step5") -> Path:
    folder.mkdir(parents=True, exist_ok=True)
    full = [{"sample": 0, "cases_passed": 0, "cases_total": 1, "seconds": 0.1, "detail": "", **r} for r in rows]
    (folder / "executions.jsonl").write_text("".join(json.dumps(r) + "\n" for r in full))
    manifest = {"harness_version": "0.1.0", "label": label, "mode": "continue", "inputs": [
                    {"path": "dumps/demo.jsonl", "sha256": "ab" * 32}],
                "problem_set": ({"name": "tiny", "path": str(problem_set), "problems": 12,
                                 "digest": load_problem_set(str(problem_set)).digest} if problem_set else {}),
                "runtimes": {"python": {"digest": "cd" * 32, "toolchain": "Python 3.11",
                                        "limits": {"compile": None, "run": {"wall_seconds": 2.0}}}},
                "sandbox": {"backend": "bubblewrap"}, "limit_overrides": {},
                "started_at": "2026-01-01T00:00:00+00:00", "finished_at": "2026-01-01T00:01:00+00:00"}
    (folder / "manifest.json").write_text(json.dumps(manifest))
    summary = summarize(full, list(ks))
    summary["rejected"] = 0
    (folder / "summary.json").write_text(json.dumps(summary))
    return folder


def standard_run(tmp_path: Path, extra_rows: list[dict] = ()) -> Path:
    """12 problems x 2 samples in python (p00-p05 easy, rest hard; odd ids tagged graphs) and
    5 problems x 1 sample in go. python: p00-p07 pass both samples, p08 one sample."""
    tiny = write_problem_set(tmp_path / "set", {f"p{i:02d}": ("easy" if i < 6 else "hard",
                                                             ["arrays"] + (["graphs"] if i % 2 else []))
                                               for i in range(12)})
    rows = []
    for i in range(12):
        for sample in range(2):
            passed = i < 8 or (i == 8 and sample == 0)
            rows.append({"problem": f"p{i:02d}", "language": "python", "sample": sample,
                         "outcome": "passed" if passed else ("timeout" if i == 11 else "wrong_answer"),
                         "seconds": 2.0 + i / 100 if i == 11 else 0.05 + i / 1000})
    for i in range(5):
        rows.append({"problem": f"p{i:02d}", "language": "go", "outcome": "passed" if i < 2 else "compile_error"})
    return write_run(tmp_path / "run", rows + list(extra_rows), problem_set=tiny, ks=(1, 2))


def report_json(folder: Path, *extra: str) -> dict:
    result = runner.invoke(app, ["report", str(folder), "--format", "json", *FAST, *extra])
    assert result.exit_code == 0, result.output
    return json.loads(result.stdout)


def group(report: dict, name: str) -> dict:
    return next(g for g in report["groups"] if g["group"] == name)


def test_json_flag_still_prints_summary_json_unchanged(tmp_path):
    run = standard_run(tmp_path)
    result = runner.invoke(app, ["report", str(run), "--json"])
    assert result.exit_code == 0
    assert json.loads(result.stdout) == json.loads((run / "summary.json").read_text())


def test_json_flag_without_summary_fails_naming_the_file(tmp_path):
    result = runner.invoke(app, ["report", str(tmp_path), "--json"])
    assert result.exit_code == 2
    assert f"{tmp_path / 'summary.json'}: no summary" in result.output


def test_default_table_starts_with_the_classic_pass_table_then_intervals(tmp_path):
    run = standard_run(tmp_path)
    result = runner.invoke(app, ["report", str(run), *FAST])
    assert result.exit_code == 0, result.output
    summary = json.loads((run / "summary.json").read_text())
    assert result.stdout.startswith(pass_table(summary, False, title=str(run)))
    assert "pass@k with intervals (95% percentile bootstrap over problems, 1000 resamples, seed 0)" in result.stdout
    python_line = next(l for l in result.stdout.splitlines() if l.startswith("python") and "[" in l)
    assert python_line.split()[3] == "70.8"  # (8 + 0.5) / 12, the unbiased pass@1 per problem averaged


def test_report_figures_match_the_run_summary_and_carry_intervals(tmp_path):
    run = standard_run(tmp_path)
    report = report_json(run)
    summary = json.loads((run / "summary.json").read_text())
    for name in ("python", "go"):
        for k in ("1", "2"):
            figure = group(report, name)["pass_at_k"][k]
            expected = summary["pass_at_k"]["by_language"][name][k]
            if expected is None:
                assert figure is None
            else:
                assert figure["estimate"] == pytest.approx(expected)
                assert figure["low"] <= figure["estimate"] <= figure["high"]
    assert group(report, "overall")["pass_at_k"]["1"]["estimate"] == pytest.approx(summary["pass_at_k"]["overall"]["1"])
    assert report["settings"] == {"ks": [1, 2], "confidence": 0.95, "method": "percentile", "resamples": 1000,
                                  "seed": 0, "unit": "problem", "min_problems": 10}


def test_untrustworthy_figures_are_marked_not_hidden(tmp_path):
    run = standard_run(tmp_path, [{"problem": "p00", "language": "go", "sample": 1, "outcome": "infra_error"}])
    report = report_json(run, "--allow-infra-errors")
    go = group(report, "go")
    assert set(go["marks"]) == {"few_problems", "infra_errors", "k_above_samples"}  # 5 problems, 1 sample each
    assert go["pass_at_k"]["1"] is not None and go["pass_at_k"]["2"] is None
    assert group(report, "python")["marks"] == []
    assert "infra_errors" in group(report, "overall")["marks"]
    text = runner.invoke(app, ["report", str(run), *FAST, "--allow-infra-errors"]).stdout
    go_line = next(l for l in text.splitlines() if l.startswith("go") and "[" in l)
    assert "40.0 [" in go_line and "]*" in go_line and "n/a" in go_line
    assert "few problems (5); 1 infra error(s); k > 1 samples" in go_line


def test_breakdown_by_difficulty_and_tag(tmp_path):
    report = report_json(standard_run(tmp_path))
    easy, hard, graphs = group(report, "easy"), group(report, "hard"), group(report, "graphs")
    assert (easy["kind"], hard["kind"], graphs["kind"]) == ("difficulty", "difficulty", "tag")
    # easy: python p00-p05 (all pass) + go p00-p04 (two pass) = 11 pairs over 6 problems.
    assert easy["pass_at_k"]["1"]["estimate"] == pytest.approx((6 + 2) / 11)
    # hard: python p06, p07 pass, p08 half, others fail; no go = 6 pairs.
    assert hard["pass_at_k"]["1"]["estimate"] == pytest.approx(2.5 / 6)
    assert graphs["problems"] == 6 and "few_problems" in graphs["marks"]
    no_tags = report_json(standard_run(tmp_path / "again"), "--no-tags")
    assert {g["kind"] for g in no_tags["groups"]} == {"language", "overall"}


def test_missing_problem_set_gives_a_warning_and_no_tag_breakdown(tmp_path):
    run = write_run(tmp_path / "run", [{"problem": "p00", "language": "python", "outcome": "passed"}])
    manifest = json.loads((run / "manifest.json").read_text())
    manifest["problem_set"] = {"name": "gone", "path": str(tmp_path / "gone"), "digest": "x"}
    (run / "manifest.json").write_text(json.dumps(manifest))
    report = report_json(run)
    assert any("problem set" in w and "not found" in w for w in report["warnings"])
    assert {g["kind"] for g in report["groups"]} == {"language", "overall"}


def test_grid_slowest_and_outcomes(tmp_path):
    report = report_json(standard_run(tmp_path))
    grid = {row["problem"]: row["cells"] for row in report["grid"]["problems"]}
    assert grid["p08"]["python"] == {"n": 2, "c": 1, "rate": 0.5}
    assert grid["p09"]["go"] is None
    seconds = [r["seconds"] for r in report["slowest"]]
    assert seconds == sorted(seconds, reverse=True) and len(seconds) == 10
    assert report["slowest"][0]["problem"] == "p11" and report["slowest"][0]["outcome"] == "timeout"
    assert report["outcomes"]["python"]["passed"] == 17
    assert report["outcomes"]["overall"]["compile_error"] == 3


def test_text_bar_widths_add_up_and_follow_the_shares():
    # Largest-remainder apportionment: 40 x (1/3, 1/3, 1/3) -> 14, 13, 13 (sum 40).
    bar = text_bar({"passed": 1, "wrong_answer": 1, "timeout": 1})
    assert len(bar) == BAR_WIDTH
    assert (bar.count("#"), bar.count("="), bar.count("t")) == (14, 13, 13)
    assert text_bar({"passed": 3, "timeout": 1}) == "#" * 30 + "t" * 10
    assert text_bar({}) == ""


def test_flaky_rows_are_listed_when_the_run_records_them(tmp_path):
    plain = report_json(standard_run(tmp_path))
    assert plain["flaky"] == {"recorded": False, "rows": []}
    run = write_run(tmp_path / "flaky", [
        {"problem": "p00", "language": "python", "outcome": "passed", "flaky": False},
        {"problem": "p01", "language": "python", "outcome": "timeout", "flaky": True,
         "repeat_outcomes": ["timeout", "passed", "timeout"]},
    ])
    report = report_json(run)
    assert report["flaky"]["recorded"] is True
    assert [(r["problem"], r["outcome"]) for r in report["flaky"]["rows"]] == [("p01", "timeout")]
    assert any(w.startswith("1 flaky candidate(s)") for w in report["warnings"])
    text = runner.invoke(app, ["report", str(run), *FAST]).stdout
    flaky_section = text.split("flaky candidates")[1]
    assert "p01" in flaky_section and "timeout, passed, timeout" in flaky_section
    html = runner.invoke(app, ["report", str(run), "--format", "html", *FAST]).stdout
    assert "<td class=\"name\">timeout, passed, timeout</td>" in html


def test_markdown_has_tables_for_figures_grid_and_provenance(tmp_path):
    result = runner.invoke(app, ["report", str(standard_run(tmp_path)), "--format", "markdown", *FAST])
    assert result.exit_code == 0, result.output
    md = result.stdout
    assert md.startswith("# Assay report: demo-step5")
    assert "| language | problems | samples | pass@1 | pass@2 | notes |" in md
    assert re.search(r"^\| python \| 12 \| 24 \| 70\.8 \[[\d.]+, [\d.]+\] \|", md, re.M)
    assert "| problem | difficulty | go | python |" in md and "| p08 | hard | - | 1/2 |" in md
    assert "## By difficulty (all languages)" in md and "## By tag (all languages)" in md
    assert "- **runtime python:** Python 3.11" in md


def test_output_option_writes_the_file(tmp_path):
    target = tmp_path / "out" / "report.md"
    result = runner.invoke(app, ["report", str(standard_run(tmp_path)), "-f", "markdown", "-o", str(target), *FAST])
    assert result.exit_code == 0
    assert target.read_text().startswith("# Assay report")


def test_bad_format_and_bad_rows_are_errors_naming_the_problem(tmp_path):
    run = standard_run(tmp_path)
    result = runner.invoke(app, ["report", str(run), "--format", "pdf"])
    assert result.exit_code == 2 and "--format must be one of" in result.output
    with open(run / "executions.jsonl", "a") as handle:
        handle.write("{not json\n")
    lines = len((run / "executions.jsonl").read_text().splitlines())
    result = runner.invoke(app, ["report", str(run)])
    assert result.exit_code == 2
    assert f"{run / 'executions.jsonl'}:{lines}: not JSON" in result.output


def test_html_escapes_run_content_and_needs_nothing_external(tmp_path):
    run = write_run(tmp_path / "run", [
        {"problem": "p00", "language": "python", "outcome": "wrong_answer", "seconds": 9.0,
         "detail": "<script>alert(1)</script>"},
    ], label="<b>ckpt</b>")
    html = render(build_report(load_run(run), Settings([1], resamples=200)), "html")
    assert "<script" not in html
    assert "&lt;script&gt;alert(1)&lt;/script&gt;" in html and "&lt;b&gt;ckpt&lt;/b&gt;" in html
    assert not re.search(r"""(src|href)\s*=\s*["']?(https?:)?//""", html)
    assert "default-src 'none'" in html


class TableText(HTMLParser):
    """Rows of <table class="groups"> as lists of cell texts (stdlib html.parser)."""

    def __init__(self):
        super().__init__()
        self.rows, self._depth, self._row, self._cell = [], 0, None, None

    def handle_starttag(self, tag, attrs):
        if tag == "table":
            self._depth += 1 if self._depth or ("class", "groups") in attrs else 0
        elif self._depth and tag == "tr":
            self._row = []
        elif self._depth and tag in ("td", "th") and self._row is not None:
            self._cell = []

    def handle_endtag(self, tag):
        if tag == "table" and self._depth:
            self._depth -= 1
        elif tag in ("td", "th") and self._cell is not None:
            self._row.append(" ".join("".join(self._cell).split()))
            self._cell = None
        elif tag == "tr" and self._row is not None:
            self.rows.append(self._row)
            self._row = None

    def handle_data(self, data):
        if self._cell is not None:
            self._cell.append(data)


def load_in_chromium(page: Path, profile: Path) -> tuple[str, list[str]]:
    """The DOM after load, and every console message the page produced."""
    command = [CHROMIUM, "--headless", "--no-sandbox", "--disable-gpu", "--no-first-run",
               "--disable-background-networking", "--disable-component-update", "--disable-sync",
               f"--user-data-dir={profile}", "--enable-logging=stderr", "--v=0", "--dump-dom", page.as_uri()]
    done = subprocess.run(command, capture_output=True, text=True, timeout=120)
    return done.stdout, [line for line in done.stderr.splitlines() if CONSOLE_LINE.search(line)]


@pytest.mark.skipif(CHROMIUM is None, reason="chromium is not installed (Debian: apt-get install chromium)")
def test_chromium_console_check_catches_a_broken_page(tmp_path):
    # Guards the next test: a page that logs and throws must be seen as failing.
    page = tmp_path / "broken.html"
    page.write_text("<!DOCTYPE html><p>x</p><script>console.error('planted'); missingFunction();</script>")
    _, console = load_in_chromium(page, tmp_path / "profile")
    assert any("planted" in line for line in console)
    assert any("missingFunction" in line for line in console)


@pytest.mark.skipif(CHROMIUM is None, reason="chromium is not installed (Debian: apt-get install chromium)")
def test_html_report_loads_in_headless_chromium_without_console_messages(tmp_path):
    run = standard_run(tmp_path)
    page = tmp_path / "report.html"
    result = runner.invoke(app, ["report", str(run), "--format", "html", "-o", str(page), *FAST])
    assert result.exit_code == 0, result.output
    dom, console = load_in_chromium(page, tmp_path / "profile")
    assert console == []
    parser = TableText()
    parser.feed(dom)
    header, *body = parser.rows
    assert header[:5] == ["language", "problems", "samples", "pass@1", "pass@2"]
    by_name = {row[0]: row for row in body}
    assert set(by_name) >= {"python", "go", "overall"}
    assert by_name["python"][3].startswith("70.8 [")
    assert "<h2 id=\"grid\">" in dom and "<svg class=\"bar\"" in dom


@pytest.mark.slow
def test_real_demo_runs_report_and_compare(tmp_path):
    # Two real checkpoints scored in the sandbox (the demo on the small conformance set).
    from harness.engine.demo import run_demo
    from harness.sandbox import SandboxUnavailable, make_sandbox

    try:
        box = make_sandbox("bubblewrap")
        box.check()
    except SandboxUnavailable as exc:
        pytest.skip(f"bubblewrap sandbox unavailable: {exc}")
    try:
        results = run_demo(tmp_path, box, jobs=2, progress=False, set_name="conformance", languages=["python"])
    finally:
        box.close()
    a, b = (tmp_path / label for label in results)
    report = report_json(a)
    assert group(report, "python")["pass_at_k"]["1"]["estimate"] == pytest.approx(
        results[a.name].summary["pass_at_k"]["by_language"]["python"]["1"])
    assert report["provenance"]["sandbox"]["backend"] == "bubblewrap"
    compared = runner.invoke(app, ["compare", str(a), str(b), "--json", *FAST])
    assert compared.exit_code == 0, compared.output
    overall = next(g for g in json.loads(compared.stdout)["groups"] if g["group"] == "overall")
    summaries = [results[p.name].summary["pass_at_k"]["overall"]["1"] for p in (a, b)]
    assert overall["pass_at_k"]["1"]["estimate"] == pytest.approx(summaries[1] - summaries[0])
    html = runner.invoke(app, ["report", str(b), "--format", "html", *FAST])
    assert html.exit_code == 0 and "heron-coder-step18000" in html.stdout
