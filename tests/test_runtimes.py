"""Runtimes are data: every bundled one passes its checks; new ones need no Python change."""

import json
import os
import shutil
import subprocess
import sys

import pytest

from harness.engine.checks import CONFORMANCE_SET, check_runtime
from harness.problems import load_problem_set
from harness.runtimes import RuntimeConfigError, available_runtimes, load_runtime

from .conftest import ROOT

BUNDLED = available_runtimes()


def test_at_least_twelve_languages_are_bundled():
    assert len(BUNDLED) >= 12, BUNDLED


@pytest.mark.parametrize("name", BUNDLED)
def test_bundled_runtime_passes_its_conformance_and_wrong_program_checks(name, sandbox):
    runtime = load_runtime(name)
    if runtime.toolchain_version() is None:
        if os.environ.get("CI"):
            pytest.fail(f"{name}: toolchain missing in CI; .ci/install must install it")
        pytest.skip(f"{name}: toolchain not installed here (bash .ci/install installs it)")
    rows = check_runtime(runtime, load_problem_set(CONFORMANCE_SET), sandbox, jobs=2,
                         limit_overrides={"wall_seconds": 8, "cpu_seconds": 8})
    failed = [f"{r['check']}: got {r['outcome']}, expected {r['expect']}: {r['detail'][:200]}"
              for r in rows if not r["ok"]]
    assert not failed, "\n".join(failed)
    expected_kinds = {r["expect"] for r in rows}
    assert {"passed", "wrong_answer", "runtime_error", "timeout", "memory_limit"} <= expected_kinds


def test_a_runtime_from_a_folder_outside_the_project_scores_without_code_changes(tmp_path, tiny_set):
    outside = tmp_path / "my_runtimes"
    shutil.copytree(ROOT / "runtimes" / "python", outside / "snakelet")
    config = outside / "snakelet" / "runtime.yaml"
    config.write_text(config.read_text().replace("name: python", "name: snakelet"))
    dump = tmp_path / "dump.jsonl"
    dump.write_text(json.dumps({"problem": "add_pair", "language": "snakelet", "completion": "    return a + b\n"}) + "\n")
    env = {**os.environ, "ASSAY_RUNTIMES_PATH": str(outside)}
    done = subprocess.run([sys.executable, "-m", "harness", "score", str(dump), "--set", str(tiny_set),
                           "--out", str(tmp_path / "out"), "-q", "--k", "1", "--json"],
                          capture_output=True, text=True, env=env)
    assert done.returncode == 0, done.stderr
    assert json.loads(done.stdout)["pass_at_k"]["by_language"]["snakelet"]["1"] == 1.0


def test_runtimes_new_writes_a_skeleton_that_loads(tmp_path):
    done = subprocess.run([sys.executable, "-m", "harness", "runtimes", "new", "zeta", "--into", str(tmp_path)],
                          capture_output=True, text=True)
    assert done.returncode == 0, done.stderr
    runtime = load_runtime("zeta", [tmp_path])
    assert runtime.name == "zeta" and runtime.compile is not None
    assert "# " in (tmp_path / "zeta" / "runtime.yaml").read_text()
    problem = load_problem_set(CONFORMANCE_SET).problems["pass_int"]
    assert "pass_int" in runtime.render_prompt(problem)


def test_runtimes_new_refuses_to_overwrite(tmp_path):
    (tmp_path / "zeta").mkdir()
    done = subprocess.run([sys.executable, "-m", "harness", "runtimes", "new", "zeta", "--into", str(tmp_path)],
                          capture_output=True, text=True)
    assert done.returncode == 2 and "already exists" in done.stderr


def test_a_malformed_runtime_names_file_and_field(tmp_path):
    folder = tmp_path / "broken"
    shutil.copytree(ROOT / "runtimes" / "python", folder)
    config = folder / "runtime.yaml"
    config.write_text(config.read_text().replace("name: python", "name: broken")
                      .replace("limits: {}", "limits: {wall_clock: 3}"))
    with pytest.raises(RuntimeConfigError, match=r"runtime\.yaml: field 'limits': unknown limit\(s\): wall_clock"):
        load_runtime("broken", [tmp_path])


def test_runtimes_list_reports_toolchains():
    done = subprocess.run([sys.executable, "-m", "harness", "runtimes", "list", "--json"], capture_output=True, text=True)
    rows = {r["name"]: r for r in json.loads(done.stdout)}
    assert rows["python"]["toolchain"].startswith("Python 3")


def test_prompts_for_every_language_are_exactly_what_scoring_continues(tmp_path):
    """`assay prompts` rows must be the text the executor prepends in continue mode, so the
    conformance references (which the checks above score in continue mode) pass from them."""
    from harness.vocabulary import Sample
    from harness.engine.execution import Executor

    prompts = tmp_path / "prompts.jsonl"
    args = [sys.executable, "-m", "harness", "prompts", "--set", CONFORMANCE_SET, "-o", str(prompts)]
    for name in BUNDLED:
        args += ["--lang", name]
    assert subprocess.run(args, capture_output=True).returncode == 0
    rows = [json.loads(line) for line in prompts.read_text(encoding="utf-8").splitlines()]
    conformance = load_problem_set(CONFORMANCE_SET)
    runtimes = {name: load_runtime(name) for name in BUNDLED}
    # Every problem a runtime can pose, and none it refuses (a type it has no counterpart for).
    posed = {(p.id, name) for name, r in runtimes.items() for p in conformance.problems.values() if not r.refusal(p)}
    assert {(row["problem"], row["language"]) for row in rows} == posed and len(rows) == len(posed)
    assert len(posed) < len(BUNDLED) * len(conformance)  # bigint is refused somewhere
    executor = Executor(None, conformance, runtimes)
    for row in rows:
        runtime = runtimes[row["language"]]
        problem = conformance.problems[row["problem"]]
        reference = runtime.reference_completion(problem)
        sample = Sample(row["problem"], row["language"], 0, reference, "prompts", 0)
        assert executor.code(sample) == row["prompt"] + reference
        assert row["stop_sequences"] == list(runtime.stop_sequences)
