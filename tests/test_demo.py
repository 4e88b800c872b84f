"""The demo: deterministic dumps for two checkpoints, scored end to end."""

import json
import subprocess
import sys

from harness.engine.demo import CHECKPOINTS, write_dump
from harness.problems import load_problem_set
from harness.runtimes import load_runtime


def test_demo_dumps_are_deterministic_and_cover_every_fault_kind(tmp_path):
    core = load_problem_set("core")
    runtimes = {"python": load_runtime("python")}
    label = next(iter(CHECKPOINTS))
    write_dump(tmp_path / "a.jsonl", label, CHECKPOINTS[label], core, runtimes)
    write_dump(tmp_path / "b.jsonl", label, CHECKPOINTS[label], core, runtimes)
    assert (tmp_path / "a.jsonl").read_bytes() == (tmp_path / "b.jsonl").read_bytes()
    rows = [json.loads(line) for line in (tmp_path / "a.jsonl").read_text().splitlines()]
    assert any("while True" in r["completion"] for r in rows)
    assert any("os._exit(0)" in r["completion"] for r in rows)


def test_assay_demo_scores_both_checkpoints_and_prints_both_tables(tmp_path):
    done = subprocess.run([sys.executable, "-m", "harness", "demo", "--out", str(tmp_path / "demo"), "--json"],
                          capture_output=True, text=True, timeout=600)
    assert done.returncode == 0, done.stderr
    summaries = json.loads(done.stdout)
    assert list(summaries) == list(CHECKPOINTS)
    early, late = (summaries[label] for label in CHECKPOINTS)
    assert {"python"} <= set(late["pass_at_k"]["by_language"])
    # The later checkpoint is the better one by construction of the scenario.
    assert late["pass_at_k"]["overall"]["1"] > early["pass_at_k"]["overall"]["1"]
    outcomes = {o for s in summaries.values() for lang in s["outcomes"].values() for o, n in lang.items() if n}
    assert {"passed", "wrong_answer", "compile_error", "runtime_error", "timeout", "memory_limit"} <= outcomes


def test_assay_demo_scores_any_installed_language_it_is_asked_for(tmp_path):
    done = subprocess.run([sys.executable, "-m", "harness", "demo", "--out", str(tmp_path / "demo"), "--json",
                           "--lang", "lua"], capture_output=True, text=True, timeout=600)
    assert done.returncode == 0, done.stderr
    summaries = json.loads(done.stdout)
    assert all(set(s["pass_at_k"]["by_language"]) == {"lua"} for s in summaries.values())
    assert all(s["samples"] > 0 for s in summaries.values())


def test_assay_demo_refuses_an_unknown_language_by_name(tmp_path):
    done = subprocess.run([sys.executable, "-m", "harness", "demo", "--out", str(tmp_path / "demo"),
                           "--lang", "cobol"], capture_output=True, text=True, timeout=60)
    assert done.returncode == 2 and "cobol" in done.stderr and "Traceback" not in done.stderr
