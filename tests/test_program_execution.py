"""Program problems end to end in the bubblewrap sandbox (Python candidates): cases as separate
processes fed from files, outcomes and details, --all-cases, the custom checker's isolation, and
a scoring run with both kinds of problem. Calibration and the other runtimes are in the slow
test_program_runtimes.py."""

from __future__ import annotations

import hashlib
import json
import shutil
import textwrap
from pathlib import Path

import pytest

from harness.analysis.report import Settings, build_report
from harness.engine.execution import Executor
from harness.engine.programs import ProgramOptions
from harness.engine.scoring import ScoreOptions, score
from harness.problems import load_problem_set
from harness.render.summary import pass_table
from harness.sandbox import make_sandbox
from harness.store import load_run
from harness.vocabulary import LimitOverrides, Sample, Verdict

FIXTURE = Path(__file__).parent / "program_fixture"


@pytest.fixture(autouse=True)
def case_cache(tmp_path_factory, monkeypatch):
    monkeypatch.setenv("ASSAY_CASE_CACHE", str(tmp_path_factory.getbasetemp() / "case-cache"))


@pytest.fixture(scope="module")
def fixture_set():
    return load_problem_set(str(FIXTURE))


def run(sandbox, python_runtime, problem_set, problem: str, program: str, **options) -> Verdict:
    limits = options.pop("limits", LimitOverrides())
    executor = Executor(sandbox, problem_set, {"python": python_runtime}, mode="whole", limit_overrides=limits,
                        programs=ProgramOptions(**options))
    return executor.execute(Sample(problem, "python", 0, textwrap.dedent(program), "test", 1))


# quay_tally's cases, worked by hand: n = 3, 1, 4, 5; answers "135 70", "1000000000 1000000000",
# "28 7", "3000000000 1000000000". This candidate is wrong exactly when n == 1.
WRONG_WHEN_ONE = """\
    import sys
    numbers = [int(x) for x in sys.stdin.read().split()]
    weights = numbers[1:]
    print(sum(weights), max(weights) if numbers[0] > 1 else 0)
"""


def test_each_case_reads_its_own_input_and_the_first_failure_decides(sandbox, python_runtime, fixture_set):
    verdict = run(sandbox, python_runtime, fixture_set, "quay_tally", WRONG_WHEN_ONE)
    assert (verdict.outcome, verdict.cases_passed, verdict.cases_total) == ("wrong_answer", 1, 4)
    assert verdict.detail == "case 1: line 1: expected '1000000000 1000000000', got '1000000000 0'"
    assert verdict.extra["cases_run"] == 2  # stopped at the first failing case


def test_all_cases_runs_every_case_and_counts_the_passes(sandbox, python_runtime, fixture_set):
    verdict = run(sandbox, python_runtime, fixture_set, "quay_tally", WRONG_WHEN_ONE, all_cases=True)
    assert (verdict.outcome, verdict.cases_passed, verdict.extra["cases_run"]) == ("wrong_answer", 3, 4)
    assert verdict.detail.startswith("case 1:")


def test_a_right_program_passes_whatever_its_trailing_whitespace(sandbox, python_runtime, fixture_set):
    program = """\
        import sys
        numbers = [int(x) for x in sys.stdin.read().split()]
        sys.stdout.write(f"{sum(numbers[1:])} {max(numbers[1:])}   ")  # no newline, trailing spaces
    """
    verdict = run(sandbox, python_runtime, fixture_set, "quay_tally", program)
    assert (verdict.outcome, verdict.cases_passed) == ("passed", 4)
    assert verdict.run_seconds > 0 and verdict.extra["slowest_case_seconds"] > 0


@pytest.mark.parametrize("program,outcome,detail", [
    ("while True:\n    pass\n", "timeout", "case 0: exceeded the time limit (1s wall, 1s CPU; set on the command line)"),
    ("import sys\nwhile True:\n    sys.stdout.write('x' * 4096)\n", "output_limit", "case 0: printed more than"),
    ("raise SystemExit('no crates')\n", "runtime_error", "case 0: exited with status 1: no crates"),
    ("print(\n", "compile_error", "SyntaxError"),
    ("import os\nos.kill(os.getpid(), 9)\n", "runtime_error", "case 0: killed by signal SIGKILL"),
])
def test_limits_and_failures_have_their_outcome_and_detail(sandbox, python_runtime, fixture_set, program, outcome,
                                                           detail):
    verdict = run(sandbox, python_runtime, fixture_set, "quay_tally", program,
                  limits=LimitOverrides(wall_seconds=1, cpu_seconds=1, max_output_kb=64))
    assert verdict.outcome == outcome and detail in verdict.detail and verdict.cases_passed == 0


def test_a_program_gets_nothing_but_its_input_on_stdin(sandbox, python_runtime, fixture_set):
    # The program echoes its input's length and what /work holds besides its own files: the
    # next case's input is not there yet, and no expected output ever is.
    program = """\
        import os, sys
        data = sys.stdin.read()
        others = sorted(n for n in os.listdir('.') if not n.startswith('.stdin-') and n != 'main.py')
        stdins = [n for n in os.listdir('.') if n.startswith('.stdin-')]
        print(len(data), others, len(stdins))
    """
    verdict = run(sandbox, python_runtime, fixture_set, "quay_tally", program)
    # Case 0's input "3\\n40\\n25\\n70\\n" has 11 characters (2 + 3 + 3 + 3); its own input file is
    # the only one so far.
    assert verdict.detail == "case 0: line 1: expected '135 70', got '11 [] 1'"


HOSTILE = """\
    import os, sys
    found = []
    try:  # the checker's own file, by the path it has outside the sandbox
        with open({checker!r}, "a") as handle:
            handle.write("import sys; sys.exit(0)\\n")
        found.append("wrote " + {checker!r})
    except OSError:
        pass
    marks = ("crane_order", "checker", ".out", "expected")
    for top in ("/", "/work", "/tmp") if not found else ():
        for root, dirs, files in os.walk(top):
            dirs[:] = [d for d in dirs if os.path.join(root, d) not in ("/proc", "/sys", "/dev", "/usr")]
            for name in files:
                path = os.path.join(root, name)
                if any(m in name for m in marks) and not path.endswith("main.py"):
                    found.append(path)
                    try:
                        with open(path, "a") as handle:
                            handle.write("import sys; sys.exit(0)\\n")
                    except OSError:
                        pass
    data = sys.stdin.read().split()
    n, weights = int(data[0]), [int(x) for x in data[1:]]
    if found:
        print("FOUND", *found)
    else:
        print(" ".join(str(i + 1) for i in sorted(range(n), key=lambda i: weights[i])))
"""


def test_a_candidate_can_neither_reach_nor_alter_the_custom_checker(sandbox, python_runtime, tmp_path):
    folder = shutil.copytree(FIXTURE, tmp_path / "set")
    problem_set = load_problem_set(str(folder))
    checker = folder / "checkers" / "crane_order.py"
    before = hashlib.sha256(checker.read_bytes()).hexdigest()
    hostile = HOSTILE.replace("{checker!r}", repr(str(checker)))
    verdict = run(sandbox, python_runtime, problem_set, "crane_order", hostile)
    # Had it found or written anything, it would have printed FOUND, which the checker rejects.
    assert verdict.outcome == "passed", verdict.detail
    assert hashlib.sha256(checker.read_bytes()).hexdigest() == before
    # The probe works: with no isolation (--sandbox none) the same candidate alters the file.
    with make_sandbox("none") as bare:
        bare.check()
        exposed = run(bare, python_runtime, problem_set, "crane_order", hostile)
    assert exposed.outcome == "wrong_answer" and exposed.detail == "case 0: a crate number is not an integer"
    assert hashlib.sha256(checker.read_bytes()).hexdigest() != before
    checker.write_bytes((FIXTURE / "checkers" / "crane_order.py").read_bytes())
    # The checker still judges: a wrong order is caught, with the checker's own message.
    wrong = "import sys\nn = int(sys.stdin.readline())\nprint(' '.join(map(str, range(n, 0, -1))))\n"
    verdict = run(sandbox, python_runtime, problem_set, "crane_order", wrong)
    assert verdict.outcome == "wrong_answer"
    assert verdict.detail == "case 0: crate 3 (weight 5) is lifted before the lighter crate 2"


def test_a_broken_custom_checker_is_an_infra_error_not_the_candidates_fault(sandbox, python_runtime, tmp_path):
    folder = shutil.copytree(FIXTURE, tmp_path / "set")
    (folder / "checkers" / "crane_order.py").write_text("import sys\nsys.exit(3)\n")
    problem_set = load_problem_set(str(folder))
    reference = (FIXTURE / "references" / "python" / "crane_order.py").read_text()
    verdict = run(sandbox, python_runtime, problem_set, "crane_order", reference)
    assert verdict.outcome == "infra_error" and "the checker failed (status 3)" in verdict.detail


def test_both_kinds_score_in_one_run_and_split_by_kind(sandbox, python_runtime, tmp_path):
    problem_set = load_problem_set(f"core,{FIXTURE}")
    function = problem_set.problems["add_fractions"]
    rows = [
        {"problem": "add_fractions", "language": "python", "completion": python_runtime.reference_completion(function)},
        {"problem": "add_fractions", "language": "python", "completion": "    return None\n"},
        {"problem": "quay_tally", "language": "python",
         "completion": "```python\n" + (FIXTURE / "references/python/quay_tally.py").read_text() + "```\n"},
        {"problem": "quay_tally", "language": "python", "completion": "print(0)\n"},
    ]
    dump = tmp_path / "dump.jsonl"
    dump.write_text("".join(json.dumps(r) + "\n" for r in rows))
    options = ScoreOptions(dumps=[dump], out=tmp_path / "out", jobs=2, ks=[1], progress=False,
                           programs=ProgramOptions(mode="whole", all_cases=True))
    outcome = score(options, problem_set, {"python": python_runtime}, sandbox)
    kinds = outcome.summary["kinds"]
    assert kinds["function"]["pass_at_k"]["1"] == 0.5 and kinds["program"]["pass_at_k"]["1"] == 0.5
    assert kinds["program"]["outcomes"]["wrong_answer"] == 1
    assert "program problems" in pass_table(outcome.summary)
    manifest = json.loads((tmp_path / "out" / "manifest.json").read_text())
    assert manifest["programs"]["mode"] == "whole" and manifest["programs"]["all_cases"] is True
    report = build_report(load_run(tmp_path / "out"), Settings(ks=[1], resamples=200))
    assert {(g["group"], g["kind"]) for g in report["groups"] if g["kind"] == "kind"} == {
        ("function", "kind"), ("program", "kind")}
