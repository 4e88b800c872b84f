"""Program problems as data: loading, schema errors naming file and field, generated cases and
their cache, calibrated limits, slow and wrong programs, merged sets, and every runtime's prompt."""

from __future__ import annotations

import ast
import shutil
from pathlib import Path

import pytest

from harness.problems import CALIBRATED_FILE, CaseError, ProblemError, load_problem_set
from harness.problems.calibration import write_calibrated_limits
from harness.problems.programs import CalibratedLimit
from harness.runtimes import RuntimeConfigError, available_runtimes, load_runtime
from harness.runtimes.runtime import parse_runtime

from .conftest import ADD_PAIR, write_set

FIXTURE = Path(__file__).parent / "program_fixture"

SUMS = """\
id: sums
kind: program
title: Sums
description: Print the sum of the numbers on the line.
checker: tokens
cases:
  - {input: "1 2\\n", output: "3\\n", example: true}
  - {input_file: cases/big.in, output_file: cases/big.out}
  - {generate: gen/make.py, args: [5, 9]}
"""

GENERATOR = """\
import sys
n, seed, given, expected = int(sys.argv[1]), int(sys.argv[2]), sys.argv[3], sys.argv[4]
with open("calls.log", "a") as log:
    log.write("called\\n")
numbers = [seed * i for i in range(n)]
open(given, "w").write(" ".join(map(str, numbers)) + "\\n")
open(expected, "w").write(f"{sum(numbers)}\\n")
"""


@pytest.fixture
def sums_set(tmp_path, monkeypatch):
    monkeypatch.setenv("ASSAY_CASE_CACHE", str(tmp_path / "cache"))
    folder = write_set(tmp_path / "sums", {"sums.yaml": SUMS})
    (folder / "cases").mkdir()
    (folder / "cases" / "big.in").write_text("4 5 6\n")
    (folder / "cases" / "big.out").write_text("15\n")
    (folder / "gen").mkdir()
    (folder / "gen" / "make.py").write_text(GENERATOR)
    return folder


def test_a_program_problem_loads_with_its_three_kinds_of_case(sums_set):
    problem = load_problem_set(str(sums_set)).problems["sums"]
    assert problem.kind == "program" and problem.checker.kind == "tokens"
    assert [c.example for c in problem.cases] == [True, False, False]
    texts = [c.texts() for c in problem.cases]
    # The generated case: 0 + 9 + 18 + 27 + 36 = 90, worked by hand.
    assert texts == [("1 2\n", "3\n"), ("4 5 6\n", "15\n"), ("0 9 18 27 36\n", "90\n")]


def test_a_generated_case_is_made_once_then_read_from_the_cache(sums_set):
    problem = load_problem_set(str(sums_set)).problems["sums"]
    for _ in range(3):
        problem.cases[2].texts()
    assert (sums_set / "gen" / "calls.log").read_text() == "called\n"
    # Other arguments are another case; a changed generator is too.
    (sums_set / "sums.yaml").write_text(SUMS.replace("args: [5, 9]", "args: [5, 10]"))
    assert load_problem_set(str(sums_set)).problems["sums"].cases[2].texts()[1] == "100\n"
    (sums_set / "gen" / "make.py").write_text(GENERATOR.replace("sum(numbers)", "sum(numbers) + 1"))
    assert load_problem_set(str(sums_set)).problems["sums"].cases[2].texts()[1] == "101\n"
    assert (sums_set / "gen" / "calls.log").read_text().count("called") == 3


def test_a_failing_generator_is_a_case_error_naming_it(sums_set):
    (sums_set / "gen" / "make.py").write_text("import sys\nsys.exit('no seed given')\n")
    problem = load_problem_set(str(sums_set)).problems["sums"]
    with pytest.raises(CaseError, match=r"make\.py 5 9: the generator exited with status 1: no seed given"):
        problem.cases[2].texts()


def test_case_files_and_generators_are_part_of_the_sets_digest(sums_set):
    before = load_problem_set(str(sums_set)).digest
    (sums_set / "cases" / "big.out").write_text("16\n")
    middle = load_problem_set(str(sums_set)).digest
    (sums_set / "gen" / "make.py").write_text(GENERATOR + "\n# changed\n")
    assert len({before, middle, load_problem_set(str(sums_set)).digest}) == 3


@pytest.mark.parametrize("edit,field", [
    (("checker: tokens", "checker: fuzzy"), "checker.kind"),
    (("checker: tokens", "checker: {kind: floats, tolerance: {rel: 2}}"), "checker.tolerance.rel"),
    (("checker: tokens", "checker: {kind: custom}"), "checker.program"),
    (("checker: tokens", "checker: {kind: tokens, tolerance: {rel: 0.1}}"), "checker"),
    (("{input: \"1 2\\n\", output: \"3\\n\", example: true}", "{input: \"1 2\\n\"}"), "cases[0].output"),
    (("{input: \"1 2\\n\", output: \"3\\n\", example: true}", "{input: 12, output: \"3\\n\"}"), "cases[0].input"),
    (("output_file: cases/big.out", "output_file: cases/none.out"), "cases[1].output_file"),
    (("input_file: cases/big.in", "input_file: ../outside.in"), "cases[1].input_file"),
    (("args: [5, 9]", "args: [5, 9], example: true"), "cases[2].example"),
    (("args: [5, 9]", "args: [[5]]"), "cases[2].args"),
    (("kind: program", "kind: script"), "kind"),
    (("checker: tokens", "checker: tokens\nsignature: {name: f, params: [], returns: int}"), "signature"),
    (("checker: tokens", "checker: tokens\nlimits: {wall_seconds: -1}"), "limits"),
])
def test_schema_errors_name_the_file_and_the_field(sums_set, edit, field):
    (sums_set.parent / "outside.in").write_text("1\n")
    (sums_set / "sums.yaml").write_text(SUMS.replace(*edit))
    with pytest.raises(ProblemError) as error:
        load_problem_set(str(sums_set))
    assert "sums.yaml" in str(error.value) and f"'{field}'" in str(error.value)


def test_a_function_problem_refuses_a_checker(tmp_path):
    folder = write_set(tmp_path / "bad", {"add_pair.yaml": ADD_PAIR + "checker: exact\n"})
    with pytest.raises(ProblemError, match=r"add_pair\.yaml: field 'checker'"):
        load_problem_set(str(folder))


def test_slow_and_wrong_programs_are_found_beside_the_problems():
    problem = load_problem_set(str(FIXTURE)).problems["berth_sums"]
    assert set(problem.slow) == {"python", "cpp"}
    assert set(problem.wrong["python"]) == {"at_least"} and set(problem.wrong["cpp"]) == {"int_overflow"}


def test_a_wrong_program_for_an_unknown_problem_is_an_error(tmp_path):
    folder = shutil.copytree(FIXTURE, tmp_path / "set")
    (folder / "wrong" / "python" / "quay_walk-off.py").write_text("print(1)\n")
    with pytest.raises(ProblemError, match=r"quay_walk-off\.py: wrong program for 'quay_walk'"):
        load_problem_set(str(folder))


def test_calibrated_limits_apply_per_language_and_the_rest_keep_the_default(tmp_path):
    folder = shutil.copytree(FIXTURE, tmp_path / "set")
    write_calibrated_limits(folder / CALIBRATED_FILE, {"multiple": 3.0},
                            {"berth_sums": {"python": CalibratedLimit(2.4, 1.9, 0.46, 0.3), "lua": "default"}})
    problem_set = load_problem_set(str(folder))
    problem = problem_set.problems["berth_sums"]
    assert problem.run_limits("python").wall_seconds == 2.4 and problem.run_limits("python").cpu_seconds == 1.9
    assert problem.limit_source("python") == "calibrated"
    assert problem.run_limits("lua").wall_seconds is None and problem.limit_source("lua") == "engine default"
    assert problem_set.calibration == {"multiple": 3.0}
    assert problem_set.digest != load_problem_set(str(FIXTURE)).digest
    # The runtime's layers then apply it: the engine default 10 s becomes 2.4 s for Python.
    python = load_runtime("python")
    assert python.step_limits("run", problem.run_limits("python"), program=True).wall_seconds == 2.4


@pytest.mark.parametrize("text,field", [
    ("limits:\n  no_such_problem: {python: {wall_seconds: 1, cpu_seconds: 1}}\n", "limits.no_such_problem"),
    ("limits:\n  berth_sums: {python: {wall_seconds: 0, cpu_seconds: 1}}\n", "limits.berth_sums.python"),
    ("limits:\n  berth_sums: {python: fast}\n", "limits.berth_sums.python"),
    ("limits: [1]\n", "limits"),
])
def test_a_malformed_calibrated_limits_file_names_the_field(tmp_path, text, field):
    folder = shutil.copytree(FIXTURE, tmp_path / "set")
    (folder / CALIBRATED_FILE).write_text(text)
    with pytest.raises(ProblemError) as error:
        load_problem_set(str(folder))
    assert CALIBRATED_FILE in str(error.value) and f"'{field}'" in str(error.value)


def test_sets_merge_into_one_and_read_back_from_the_recorded_path():
    merged = load_problem_set(f"core,{FIXTURE}")
    assert {p.kind for p in merged.problems.values()} == {"function", "program"}
    assert len(merged) == len(load_problem_set("core")) + len(load_problem_set(str(FIXTURE)))
    again = load_problem_set(str(merged.path))
    assert again.digest == merged.digest and set(again.problems) == set(merged.problems)


def test_merged_sets_refuse_a_repeated_problem_id():
    with pytest.raises(ProblemError, match="also"):
        load_problem_set(f"{FIXTURE},{FIXTURE}")


def test_program_section_errors_name_the_field(tmp_path):
    folder = shutil.copytree(Path(load_runtime("python").path), tmp_path / "python")
    data = {"name": "python", "source_file": "main.py", "run": {"command": ["python3", "main.py"]},
            "program": {"source_file": "a/b.py"}}
    with pytest.raises(RuntimeConfigError, match=r"'program\.source_file'"):
        parse_runtime(data, folder, folder / "runtime.yaml")
    data["program"] = {"stop_sequence": []}
    with pytest.raises(RuntimeConfigError, match=r"'program': unknown field\(s\) stop_sequence"):
        parse_runtime(data, folder, folder / "runtime.yaml")


@pytest.mark.parametrize("language", available_runtimes())
def test_every_runtime_poses_program_problems_with_the_statement_as_comments(language):
    runtime = load_runtime(language)
    problem = load_problem_set(str(FIXTURE)).problems["berth_sums"]
    assert runtime.refusal(problem) is None
    prompt = runtime.render_prompt(problem)
    assert "Overloaded berth ranges" in prompt and "5 3 10" in prompt and "harbour master asks q" in prompt
    assert runtime.render_preamble(problem) == ""
    assert runtime.program.stop_sequences == ("\n```",)


def test_the_python_program_prompt_is_a_valid_start_of_a_program():
    # Source of truth: Python's own parser (ast) reads the prompt plus the reference program.
    runtime = load_runtime("python")
    problem = load_problem_set(str(FIXTURE)).problems["berth_sums"]
    ast.parse(runtime.render_prompt(problem) + runtime.reference(problem))


def test_a_runtime_without_the_program_template_refuses_program_problems(tmp_path):
    folder = shutil.copytree(Path(load_runtime("lua").path), tmp_path / "lua")
    (folder / "program_main.j2").unlink()
    from harness.runtimes import load_runtime_folder

    runtime = load_runtime_folder(folder)
    problem = load_problem_set(str(FIXTURE)).problems["berth_sums"]
    assert "program_main.j2" in runtime.refusal(problem)
