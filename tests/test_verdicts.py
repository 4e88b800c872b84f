"""Every verdict kind, produced by real candidates in the bubblewrap sandbox."""

import pytest

from harness.vocabulary import Sample
from harness.engine.execution import Executor, parse_results
from harness.problems import load_problem_set
from harness.sandbox import make_sandbox

FAST = {"wall_seconds": 3, "cpu_seconds": 3, "memory_mb": 128}


@pytest.fixture
def execute(tiny_set, sandbox, python_runtime):
    executor = Executor(sandbox, load_problem_set(str(tiny_set)), {"python": python_runtime},
                        limit_overrides=FAST)

    def run(completion: str, mode: str = "continue"):
        executor.mode = mode
        return executor.execute(Sample("add_pair", "python", 0, completion, "test", 1))

    return run


@pytest.mark.parametrize("completion,outcome", [
    ("    return a + b\n", "passed"),
    ("    return a - b\n", "wrong_answer"),
    ("    return a +\n", "compile_error"),
    ("    return [a][b]\n", "runtime_error"),
    ("    while True:\n        pass\n", "timeout"),
    ("    import time\n    time.sleep(60)\n", "timeout"),
    ("    hoard = []\n    while True:\n        hoard.append(bytearray(1 << 20))\n", "memory_limit"),
    ("    while True:\n        print('x' * 4096)\n", "output_limit"),
    ("    open('big', 'wb').write(b'0' * (64 << 20))\n", "output_limit"),
])
def test_real_candidates_get_each_verdict(execute, completion, outcome):
    verdict = execute(completion)
    assert verdict.outcome == outcome, verdict.detail
    assert verdict.cases_total == 3


def test_partial_credit_counts_the_cases_that_passed(execute):
    verdict = execute("    return 3 if a == 1 else a * b\n")
    assert (verdict.outcome, verdict.cases_passed) == ("wrong_answer", 1)
    assert "case 1: expected 0, got -25" in verdict.detail


def test_exit_status_zero_before_the_driver_finishes_is_not_a_pass(execute):
    verdict = execute("    import os\n    os._exit(0)\n")
    assert verdict.outcome == "runtime_error"
    assert "exited with status 0 before case 0 reported" in verdict.detail


def test_printing_text_that_looks_like_driver_output_is_not_a_pass(execute):
    fake = '{"case": 0, "value": 3}\\n{"case": 1, "value": 0}\\n{"case": 2, "value": 42}\\n{"done": true}'
    verdict = execute(f"    import sys\n    print('{fake}')\n    sys.stdout.flush()\n    import os\n    os._exit(0)\n")
    assert verdict.outcome == "runtime_error"


def test_writing_fake_records_into_the_results_file_without_the_nonce_is_not_a_pass(execute):
    completion = (
        "    import glob, json\n"
        "    for name in glob.glob('.results-*'):\n"
        "        with open(name, 'a') as f:\n"
        "            for i in range(3):\n"
        "                f.write(json.dumps({'case': i, 'value': a + b}) + '\\n')\n"
        "            f.write(json.dumps({'done': True}) + '\\n')\n"
        "    import os\n    os._exit(0)\n"
    )
    assert execute(completion).outcome == "runtime_error"


def test_whole_mode_strips_a_fence_around_the_function(execute):
    answer = "Sure:\n```python\ndef add_pair(a, b):\n    return a + b\n```\n"
    assert execute(answer, mode="whole").outcome == "passed"


def test_continue_mode_cuts_what_follows_the_function(execute):
    assert execute("    return a + b\n\n\nprint(add_pair(1, 2))\nraise SystemExit(3)\n").outcome == "passed"


def test_a_broken_sandbox_is_an_infra_error_not_a_failure(tiny_set, python_runtime):
    box = make_sandbox("bubblewrap")
    box.bwrap = "/bin/false"  # injected fault: the sandbox binary fails before the candidate runs
    try:
        executor = Executor(box, load_problem_set(str(tiny_set)), {"python": python_runtime})
        verdict = executor.execute(Sample("add_pair", "python", 0, "    return a + b\n", "test", 1))
    finally:
        box.close()
    assert verdict.outcome == "infra_error"


def test_results_without_this_runs_nonce_are_ignored():
    data = b'{"case": 0, "value": 1, "nonce": "other"}\n{"case": 0, "value": 2, "nonce": "n"}\n{"done": true}\n'
    records, done = parse_results(data, "n")
    assert records[0]["value"] == 2 and not done


def test_a_fatal_limit_message_on_stderr_is_judged_as_that_limit(tiny_set, python_runtime):
    from harness.engine.execution import judge
    from harness.vocabulary import Limits, StepResult

    problem = load_problem_set(str(tiny_set)).problems["add_pair"]
    died = StepResult(exit_code=1, stderr="Traceback ...\nMemoryError\n")
    assert judge(problem, python_runtime, died, b"", "n", Limits()).outcome == "memory_limit"
    crashed = StepResult(exit_code=1, stderr="Traceback ...\nKeyError: 'x'\n")
    assert judge(problem, python_runtime, crashed, b"", "n", Limits()).outcome == "runtime_error"


def test_a_malformed_checks_file_names_file_and_line(tmp_path, python_runtime):
    import shutil

    from harness.engine.checks import load_wrong_candidates
    from harness.runtimes import load_runtime

    shutil.copytree(python_runtime.path, tmp_path / "python")
    (tmp_path / "python" / "checks.yaml").write_text("- name: x\n  problem: [oops\n")
    with pytest.raises(ValueError, match=r"checks\.yaml:\d+: invalid YAML"):
        load_wrong_candidates(load_runtime("python", [tmp_path]))
