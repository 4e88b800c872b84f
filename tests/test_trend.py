"""``assay trend``: checkpoints ordered by the step ending their labels, table, JSON and PNG."""

from __future__ import annotations

import json
from pathlib import Path

import pytest
from typer.testing import CliRunner

from harness.cli import app
from harness.metrics import summarize
from harness.analysis.report import Settings
from harness.store import load_run
from harness.analysis.trend import build_trend, step_of
from harness.render.trend import plot_trend

runner = CliRunner()
FAST = ["--resamples", "500"]
PNG_SIGNATURE = b"\x89PNG\r\n\x1a\n"  # PNG specification (ISO/IEC 15948), section 5.2


def write_run(folder: Path, passing: dict[str, int], *, label: str | None, problems: int = 12,
              set_digest: str = "d1") -> Path:
    """Greedy run: in each language, problems p00..p(passing-1) pass and the rest fail."""
    folder.mkdir(parents=True, exist_ok=True)
    rows = [{"problem": f"p{i:02d}", "language": lang, "sample": 0, "seconds": 0.1, "cases_passed": 0,
             "cases_total": 1, "detail": "", "outcome": "passed" if i < count else "wrong_answer"}
            for lang, count in passing.items() for i in range(problems)]
    (folder / "executions.jsonl").write_text("".join(json.dumps(r) + "\n" for r in rows))
    manifest = {"label": label, "mode": "continue", "problem_set": {"name": "tiny", "digest": set_digest},
                "runtimes": {lang: {"digest": "r", "limits": {}} for lang in passing},
                "sandbox": {"backend": "bubblewrap"}, "limit_overrides": {}, "finished_at": "2026-01-01"}
    (folder / "manifest.json").write_text(json.dumps(manifest))
    (folder / "summary.json").write_text(json.dumps(summarize(rows, [1])))
    return folder


def test_step_is_the_labels_trailing_number():
    assert step_of("heron-coder-step12000") == 12000
    assert step_of("ckpt_0042") == 42
    assert step_of("7") == 7
    assert step_of("release-candidate") is None
    assert step_of("v2-final") is None


def test_checkpoints_are_ordered_by_step_whatever_the_argument_order(tmp_path):
    late = write_run(tmp_path / "x", {"python": 9, "go": 6}, label="m-step3000")
    early = write_run(tmp_path / "y", {"python": 3, "go": 3}, label="m-step500")
    middle = write_run(tmp_path / "z", {"python": 6, "go": 3}, label="m-step1000")
    result = runner.invoke(app, ["trend", str(late), str(early), str(middle), "--json", *FAST])
    assert result.exit_code == 0, result.output
    series = json.loads(result.stdout)
    assert [p["step"] for p in series["points"]] == [500, 1000, 3000]
    assert series["languages"] == ["go", "python"]
    python = [p["groups"]["python"]["pass_at_k"]["1"]["estimate"] for p in series["points"]]
    overall = [p["groups"]["overall"]["pass_at_k"]["1"]["estimate"] for p in series["points"]]
    assert python == [pytest.approx(3 / 12), pytest.approx(6 / 12), pytest.approx(9 / 12)]
    assert overall == [pytest.approx(6 / 24), pytest.approx(9 / 24), pytest.approx(15 / 24)]
    low = series["points"][2]["groups"]["python"]["pass_at_k"]["1"]
    assert low["low"] < low["estimate"] < low["high"]


def test_table_shows_one_row_per_checkpoint_in_step_order(tmp_path):
    a = write_run(tmp_path / "a", {"python": 9}, label="run-step20")
    b = write_run(tmp_path / "b", {"python": 3}, label="run-step10")
    result = runner.invoke(app, ["trend", str(a), str(b), *FAST])
    assert result.exit_code == 0, result.output
    lines = result.stdout.splitlines()
    rows = [line for line in lines if line.lstrip().startswith(("10 ", "20 "))]
    assert [r.split()[0] for r in rows] == ["10", "20"]
    assert rows[0].split()[2] == "25.0" and rows[1].split()[2] == "75.0"


def test_labels_option_overrides_manifest_labels(tmp_path):
    a = write_run(tmp_path / "a", {"python": 2}, label="zzz")
    b = write_run(tmp_path / "b", {"python": 4}, label=None)
    result = runner.invoke(app, ["trend", str(a), str(b), "--labels", "s-200,s-100", "--json", *FAST])
    assert result.exit_code == 0, result.output
    points = json.loads(result.stdout)["points"]
    assert [(p["label"], p["step"]) for p in points] == [("s-100", 100), ("s-200", 200)]
    assert points[0]["path"] == str(b)


def test_label_count_must_match_the_folders(tmp_path):
    a = write_run(tmp_path / "a", {"python": 2}, label="s1")
    result = runner.invoke(app, ["trend", str(a), "--labels", "s1,s2", *FAST])
    assert result.exit_code == 2
    assert "--labels has 2 label(s) for 1 run folder(s)" in result.output


def test_labels_without_numbers_keep_the_given_order_and_say_so(tmp_path):
    a = write_run(tmp_path / "a", {"python": 2}, label="beta")
    b = write_run(tmp_path / "b", {"python": 4}, label="alpha")
    series = build_trend([load_run(a), load_run(b)], Settings([1], resamples=200))
    assert [p["label"] for p in series["points"]] == ["beta", "alpha"]
    assert any("kept in the order given" in w for w in series["warnings"])


def test_trend_warns_when_checkpoints_used_different_problem_sets(tmp_path):
    a = write_run(tmp_path / "a", {"python": 2}, label="s1")
    b = write_run(tmp_path / "b", {"python": 4}, label="s2", set_digest="d2")
    series = build_trend([load_run(a), load_run(b)], Settings([1], resamples=200))
    assert any(w.startswith("s2 vs s1: problem set tiny changed") for w in series["warnings"])


def test_few_problems_are_marked_in_the_series(tmp_path):
    a = write_run(tmp_path / "a", {"python": 2}, label="s1", problems=5)
    series = build_trend([load_run(a)], Settings([1], resamples=200))
    assert "few_problems" in series["points"][0]["groups"]["python"]["marks"]


def test_plot_writes_a_png_whose_lines_carry_the_series(tmp_path):
    runs = [load_run(write_run(tmp_path / f"r{i}", {"python": 3 * i, "go": 2 * i}, label=f"s{100 * i}"))
            for i in (1, 2, 3)]
    series = build_trend(runs, Settings([1], resamples=300))
    target = tmp_path / "plots" / "trend.png"
    figure = plot_trend(series, target)
    assert target.read_bytes()[:8] == PNG_SIGNATURE
    lines = {line.get_label(): line for line in figure.axes[0].get_lines() if not line.get_label().startswith("_")}
    assert set(lines) == {"go", "python", "overall"}
    assert list(lines["python"].get_xdata()) == [100, 200, 300]
    assert list(lines["python"].get_ydata()) == pytest.approx([25.0, 50.0, 75.0])
    assert list(lines["overall"].get_ydata()) == pytest.approx([100 * 5 / 24, 100 * 10 / 24, 100 * 15 / 24])


def test_plot_option_of_the_command_writes_the_file(tmp_path):
    a = write_run(tmp_path / "a", {"python": 2}, label="s1")
    b = write_run(tmp_path / "b", {"python": 5}, label="s2")
    target = tmp_path / "out.png"
    result = runner.invoke(app, ["trend", str(a), str(b), "--plot", str(target), *FAST])
    assert result.exit_code == 0, result.output
    assert target.read_bytes()[:8] == PNG_SIGNATURE
