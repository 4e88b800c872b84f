"""Verdicts a team can bet a checkpoint on: what a candidate returns or a problem declares may
make one sample wrong, never the run. End to end through ``assay score`` and the data checks."""

from __future__ import annotations

import json
import textwrap
from pathlib import Path

import pytest

from harness.problems import ProblemError, load_problem_set
from harness.runtimes import RuntimeConfigError, load_runtime, load_runtime_folder
from tests.conftest import write_set
from tests.test_scoring import assay, read_rows, write_dump

FLOAT_SET = {
    "mean_of.yaml": textwrap.dedent("""\
        id: mean_of
        title: Mean
        description: Return the mean of `values`.
        signature:
          name: mean_of
          params: [{name: values, type: "list[float]"}]
          returns: float
        cases:
          - {args: [[1.0, 2.0]], expected: 1.5, example: true}
          - {args: [[1.0e-12]], expected: 1.0e-12}
        reference:
          python: |
            return sum(values) / len(values)
        """),
}

RUN_STOPPERS = {
    "a 400-digit integer for a float": "    return 10 ** 400\n",
    "a 5000-digit integer for a float": "    return 10 ** 5000\n",
    "a lone surrogate for a float": "    return '\\ud800'\n",
    "a map whose only key looks like a tag": "    return {'$map': [[1, 2]]}\n",
    "a deeply nested list": "    v = []\n    for _ in range(100000):\n        v = [v]\n    return v\n",
    "an exception with a surrogate message": "    raise ValueError('\\udcff')\n",
    "zero for a tiny value": "    return 0.0 if values[0] < 1e-9 else sum(values) / len(values)\n",
    "correct": "    return sum(values) / len(values)\n",
}


def test_no_returned_value_stops_a_scoring_run(tmp_path):
    problems = write_set(tmp_path / "set", FLOAT_SET)
    rows = [{"problem": "mean_of", "language": "python", "completion": text} for text in RUN_STOPPERS.values()]
    dump = write_dump(tmp_path / "dump.jsonl", rows)
    out = tmp_path / "out"
    assay("score", dump, "--set", problems, "--out", out, "-q")
    verdicts = {r["sample"]: r for r in read_rows(out)}
    assert len(verdicts) == len(RUN_STOPPERS)
    by_name = {name: verdicts[i] for i, name in enumerate(RUN_STOPPERS)}
    assert by_name["correct"]["outcome"] == "passed"
    for name in ("a 400-digit integer for a float", "a 5000-digit integer for a float",
                 "a lone surrogate for a float", "a map whose only key looks like a tag", "zero for a tiny value"):
        assert by_name[name]["outcome"] == "wrong_answer", (name, by_name[name])
    assert by_name["an exception with a surrogate message"]["outcome"] == "runtime_error"
    assert by_name["a deeply nested list"]["outcome"] in ("wrong_answer", "runtime_error")
    # Rerunning over the finished folder resumes without crashing either.
    assay("score", dump, "--set", problems, "--out", out, "-q")
    assert json.loads((out / "summary.json").read_text())["samples"] == len(RUN_STOPPERS)


def test_a_runtime_without_a_type_refuses_its_problems_by_name(tmp_path, conformance):
    runtime_dir = tmp_path / "runtimes" / "python"
    source = load_runtime("python").path
    runtime_dir.mkdir(parents=True)
    for file in source.iterdir():
        (runtime_dir / file.name).write_bytes(file.read_bytes()) if file.is_file() else None
    yaml_file = runtime_dir / "runtime.yaml"
    yaml_file.write_text(yaml_file.read_text() + '\nunsupported_types: {bigint: "pretend there is none"}\n')
    runtime = load_runtime_folder(runtime_dir)
    assert "pretend there is none" in runtime.refusal(conformance.problems["hull_product"])
    assert runtime.refusal(conformance.problems["pass_int"]) is None

    dump = write_dump(tmp_path / "dump.jsonl", [
        {"problem": "hull_product", "language": "python", "completion": "    return 1\n"},
        {"problem": "pass_int", "language": "python", "completion": "    return value\n"},
    ])
    out = tmp_path / "out"
    assay("score", dump, "--set", "conformance", "--out", out, "-q", "--runtimes-dir", tmp_path / "runtimes")
    rejects = [json.loads(line) for line in (out / "rejects.jsonl").read_text().splitlines()]
    assert len(rejects) == 1 and "bigint" in rejects[0]["reason"] and rejects[0]["line"] == 1
    assert [r["outcome"] for r in read_rows(out)] == ["passed"]


def test_unknown_refused_type_names_are_refused_with_the_field(tmp_path):
    folder = tmp_path / "odd"
    folder.mkdir()
    source = load_runtime("python").path
    for file in source.iterdir():
        if file.is_file():
            (folder / file.name).write_bytes(file.read_bytes())
    (folder / "runtime.yaml").write_text((source / "runtime.yaml").read_text().replace("name: python", "name: odd")
                                         + "\nunsupported_types: {hugeint: x}\n")
    with pytest.raises(RuntimeConfigError, match="unsupported_types"):
        load_runtime_folder(folder)


def test_reserved_words_are_renamed_in_the_language_convention(conformance):
    problem = conformance.problems["leg_length"]
    python = load_runtime("python")
    assert python.name_of("param", "from") == "from_" and python.name_of("param", "end") == "end"
    assert ("in", "in_") in python.renamed(problem)
    prompt = python.render_prompt(problem)
    compile(prompt + "    return 0\n", "prompt.py", "exec")  # Python's own grammar accepts it


@pytest.mark.parametrize("field,text,message", [
    ("tolerance", "tolerance: {rel: 1.0e-9, absolute: 0.1}", "unknown key"),
    ("tolerance", "tolerance: {rel: 2}", "tolerance.rel"),
    ("tolerance", "tolerance: -1", "tolerance"),
    ("signed_zero", "signed_zero: sometimes", "signed_zero"),
])
def test_float_rules_in_problem_files_are_validated_by_field(tmp_path, field, text, message):
    body = FLOAT_SET["mean_of.yaml"] + text + "\n"
    folder = write_set(tmp_path / "set", {"mean_of.yaml": body})
    with pytest.raises(ProblemError, match=message) as caught:
        load_problem_set(str(folder))
    assert "mean_of.yaml" in str(caught.value) and field in str(caught.value)


def test_problem_check_warns_about_renamed_names_and_zero_expectations(tmp_path):
    zero = FLOAT_SET["mean_of.yaml"].replace("expected: 1.0e-12}", "expected: 0.0}").replace(
        "[[1.0e-12]]", "[[0.0]]")
    folder = write_set(tmp_path / "set", {"mean_of.yaml": zero})
    done = assay("problems", "check", folder, "--lang", "python", "--json")
    warnings = json.loads(done.stdout)["warnings"]
    assert any("tolerance.abs" in w for w in warnings)
    done = assay("problems", "check", "conformance", "--lang", "python", "--json")
    report = json.loads(done.stdout)
    assert any("'from' is reserved in python" in w for w in report["warnings"])


def test_a_candidate_raising_an_out_of_memory_error_does_not_choose_its_label(tmp_path, sandbox, python_runtime,
                                                                             conformance):
    from harness.vocabulary import Sample
    from harness.engine.execution import Executor

    executor = Executor(sandbox, conformance, {"python": python_runtime})
    forged = executor.execute(Sample("pass_int", "python", 0, "    raise MemoryError('out of memory')\n", "t", 1))
    assert forged.outcome == "runtime_error" and "peak" in forged.detail
    real = executor.execute(Sample("pass_int", "python", 0,
                                   "    hoard = []\n    while True:\n        hoard.append(bytearray(1 << 24))\n",
                                   "t", 2))
    assert real.outcome == "memory_limit"


def test_compile_errors_start_with_the_first_error(tmp_path, sandbox, conformance):
    from harness.vocabulary import Sample
    from harness.engine.execution import Executor

    cpp = load_runtime("cpp")
    if cpp.toolchain_version() is None:
        pytest.skip("g++ is not installed")
    executor = Executor(sandbox, conformance, {"cpp": cpp})
    verdict = executor.execute(Sample("pass_int", "cpp", 0, "    return undeclared_name + value;\n}\n", "t", 1))
    assert verdict.outcome == "compile_error"
    assert "error" in verdict.detail.splitlines()[0] and "undeclared_name" in verdict.detail.splitlines()[0]
