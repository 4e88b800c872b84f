"""Program problems in every runtime, a compiled language scored end to end, and calibration
(slow: many compiles and a naive program that must run into its time limit)."""

from __future__ import annotations

import json
import shutil
from pathlib import Path

import pytest

from harness.engine.calibrate import CalibrationSettings, calibrate, write_limits
from harness.engine.demo import render_form
from harness.engine.execution import Executor
from harness.engine.programs import ProgramOptions
from harness.engine.scoring import ScoreOptions, score
from harness.problems import CALIBRATED_FILE, ProblemError, load_problem_set
from harness.runtimes import available_runtimes, load_runtime
from harness.vocabulary import LimitOverrides, Sample

pytestmark = pytest.mark.slow

FIXTURE = Path(__file__).parent / "program_fixture"


@pytest.fixture(autouse=True)
def case_cache(tmp_path_factory, monkeypatch):
    monkeypatch.setenv("ASSAY_CASE_CACHE", str(tmp_path_factory.getbasetemp() / "case-cache"))


@pytest.mark.parametrize("language", available_runtimes())
def test_every_runtime_builds_runs_and_judges_a_whole_program(sandbox, language):
    runtime = load_runtime(language)
    if runtime.toolchain_version() is None:
        pytest.skip(f"{language}'s toolchain is not installed")
    problem_set = load_problem_set(str(FIXTURE))
    problem = problem_set.problems["quay_tally"]
    executor = Executor(sandbox, problem_set, {language: runtime}, mode="whole", programs=ProgramOptions())
    # The reference bare and in a chat answer's fence; a program printing 0; one that fails
    # before reading (runtimes/<language>/demo/program_*.j2).
    expected = {"reference": "passed", "program_fenced": "passed", "program_wrong_output": "wrong_answer",
                "program_crash": "runtime_error"}
    got = {form: executor.execute(Sample(problem.id, language, 0, render_form(runtime, problem, form), "test", 1))
           for form in expected}
    assert {form: v.outcome for form, v in got.items()} == expected, {f: v.detail for f, v in got.items()}
    assert got["reference"].cases_passed == 4
    assert got["program_wrong_output"].detail.startswith("case 0: line 1: expected '135 70', got '0'")


def test_a_compiled_language_scores_end_to_end_with_a_python_checker(sandbox, tmp_path):
    cpp = load_runtime("cpp")
    problem_set = load_problem_set(str(FIXTURE))
    berth = problem_set.problems["berth_sums"]
    rows = [
        ("berth_sums", cpp.reference(berth)),
        ("berth_sums", berth.slow["cpp"]),
        ("berth_sums", berth.wrong["cpp"]["int_overflow"]),
        ("berth_sums", "int main() { return }\n"),
        ("crane_order", cpp.reference(problem_set.problems["crane_order"])),
    ]
    dump = tmp_path / "cpp.jsonl"
    dump.write_text("".join(json.dumps({"problem": p, "language": "cpp", "completion": c}) + "\n" for p, c in rows))
    options = ScoreOptions(dumps=[dump], out=tmp_path / "out", jobs=2, ks=[1], progress=False, mode="whole",
                           limit_overrides=LimitOverrides(wall_seconds=2, cpu_seconds=2))
    outcome = score(options, problem_set, {"cpp": cpp}, sandbox)
    verdicts = [json.loads(line) for line in (tmp_path / "out" / "executions.jsonl").read_text().splitlines()]
    by_sample = {(v["problem"], v["sample"]): v for v in verdicts}
    assert [by_sample[("berth_sums", i)]["outcome"] for i in range(4)] == [
        "passed", "timeout", "wrong_answer", "compile_error"]
    assert by_sample[("berth_sums", 1)]["cases_passed"] == 2  # the naive program passes the small cases
    assert by_sample[("crane_order", 0)]["outcome"] == "passed"  # judged by the set's Python checker
    # pass@1 per (problem, language) pair, averaged: berth_sums 1 of 4, crane_order 1 of 1.
    assert outcome.summary["kinds"]["program"]["pass_at_k"]["1"] == (1 / 4 + 1 / 1) / 2


def test_calibration_separates_the_quadratic_and_the_intended_solution(sandbox, python_runtime, tmp_path):
    folder = shutil.copytree(FIXTURE, tmp_path / "set")
    problem_set = load_problem_set(str(folder))
    header, limits, rows = calibrate(problem_set, {"python": python_runtime}, sandbox,
                                     CalibrationSettings(multiple=3.0, floor_seconds=1.0, runs=1))
    berth = next(r for r in rows if r.problem == "berth_sums")
    assert berth.ok and berth.slow == "timeout", berth.slow_detail
    # The rule: 3 x the slowest case + 1 s, rounded up to a tenth (worked from the measured time).
    slowest = berth.limit.slowest_wall_seconds
    assert berth.limit.wall_seconds == pytest.approx(-(-round((3 * slowest + 1) * 10, 6) // 1) / 10)
    assert header["multiple"] == 3.0 and header["toolchains"]["python"].startswith("Python 3")
    written = write_limits(problem_set, header, limits, ProblemError)
    assert written == folder / CALIBRATED_FILE
    reloaded_set = load_problem_set(str(folder))
    reloaded = reloaded_set.problems["berth_sums"]
    assert reloaded.limit_source("python") == "calibrated"
    assert reloaded.run_limits("python").wall_seconds == berth.limit.wall_seconds
    # Scoring reads the written limits: the naive program times out under its calibrated limit.
    executor = Executor(sandbox, reloaded_set, {"python": python_runtime}, mode="whole")
    slow = executor.execute(Sample("berth_sums", "python", 0, reloaded.slow["python"], "test", 1))
    assert slow.outcome == "timeout" and "calibrated for python" in slow.detail
