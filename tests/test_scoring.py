"""End to end through the CLI: scoring, rejects, resume after a crash, locking, reports."""

import json
import signal
import subprocess
import sys
import time
from pathlib import Path

import pytest

ASSAY = [sys.executable, "-m", "harness"]
CANDIDATES = {
    "passed": "    return a + b\n",
    "wrong": "    return a * b\n",
    "slow_pass": "    import time\n    time.sleep(0.2)\n    return a + b\n",
    "crash": "    return None + 1\n",
}


def write_dump(path: Path, rows: list[dict]) -> Path:
    path.write_text("".join(json.dumps(r) + "\n" for r in rows), encoding="utf-8")
    return path


def mixed_rows(count: int) -> list[dict]:
    kinds = list(CANDIDATES)
    return [{"problem": "add_pair", "language": "python", "completion": CANDIDATES[kinds[i % len(kinds)]]}
            for i in range(count)]


def assay(*args, check=True, **kwargs) -> subprocess.CompletedProcess:
    done = subprocess.run(ASSAY + [str(a) for a in args], capture_output=True, text=True, **kwargs)
    if check and done.returncode != 0:
        raise AssertionError(f"assay {' '.join(map(str, args))} failed ({done.returncode}):\n{done.stderr}")
    return done


def read_rows(out: Path) -> list[dict]:
    return [json.loads(line) for line in (out / "executions.jsonl").read_text().splitlines()]


def verdict_set(out: Path) -> set:
    return {(r["problem"], r["language"], r["sample"], r["outcome"]) for r in read_rows(out)}


def test_score_writes_one_row_per_sample_a_manifest_and_a_summary(tmp_path, tiny_set):
    dump = write_dump(tmp_path / "ckpt.jsonl", mixed_rows(8))
    out = tmp_path / "out"
    done = assay("score", dump, "--set", tiny_set, "--out", out, "--k", "1,2,20", "-q")
    rows = read_rows(out)
    assert len(rows) == 8 and len({r["sample"] for r in rows}) == 8
    assert {r["outcome"] for r in rows} == {"passed", "wrong_answer", "runtime_error"}
    summary = json.loads((out / "summary.json").read_text())
    assert summary["pass_at_k"]["by_language"]["python"]["1"] == pytest.approx(0.5)
    assert summary["pass_at_k"]["overall"]["20"] is None
    manifest = json.loads((out / "manifest.json").read_text())
    assert manifest["inputs"][0]["sha256"] and manifest["problem_set"]["digest"]
    assert manifest["runtimes"]["python"]["limits"]["run"]["wall_seconds"] > 0
    assert manifest["finished_at"] and manifest["harness_version"]
    assert "pass@1" in done.stdout and "n/a" in done.stdout


def test_malformed_lines_go_to_rejects_and_the_rest_is_scored(tmp_path, tiny_set):
    dump = tmp_path / "dump.jsonl"
    good = json.dumps({"problem": "add_pair", "language": "python", "completion": "    return a + b\n"})
    dump.write_bytes(b"\n".join([good.encode(), b"{oops", b"\xff\xfe", good.replace("add_pair", "zzz").encode(),
                                 good.replace('"python"', '"cobol"').encode(),
                                 json.dumps({"problem": "add_pair"}).encode(), good.encode()]) + b"\n")
    out = tmp_path / "out"
    assay("score", dump, "--set", tiny_set, "--out", out, "-q")
    rejects = [json.loads(line) for line in (out / "rejects.jsonl").read_text().splitlines()]
    assert [r["line"] for r in rejects] == [2, 3, 4, 5, 6]
    assert all(r["source"] == str(dump) and r["reason"] for r in rejects)
    assert [r["outcome"] for r in read_rows(out)] == ["passed", "passed"]


@pytest.mark.slow
def test_a_killed_run_resumed_gives_the_same_verdicts_without_loss_or_duplicates(tmp_path, tiny_set):
    # Distinct programs (an indented comment each), so verdicts arrive one by one rather than in
    # bursts of shared rows, and the kill lands part-way.
    rows = [dict(r, completion=r["completion"] + f"    # variant {i}\n") for i, r in enumerate(mixed_rows(40))]
    dump = write_dump(tmp_path / "ckpt.jsonl", rows)
    reference = tmp_path / "uninterrupted"
    assay("score", dump, "--set", tiny_set, "--out", reference, "-q", "-j", "2")

    out = tmp_path / "killed"
    process = subprocess.Popen(ASSAY + ["score", str(dump), "--set", str(tiny_set), "--out", str(out), "-q", "-j", "2"],
                               stdout=subprocess.DEVNULL, stderr=subprocess.DEVNULL)
    executions = out / "executions.jsonl"
    deadline = time.monotonic() + 60
    while time.monotonic() < deadline and (not executions.exists() or executions.read_text().count("\n") < 5):
        time.sleep(0.05)
    process.send_signal(signal.SIGKILL)
    process.wait()
    partial = executions.read_text().count("\n")
    assert 5 <= partial < 40, "the run should have been killed part-way"

    resumed = assay("score", dump, "--set", tiny_set, "--out", out, "-q", "-j", "2")
    rows = read_rows(out)
    keys = [(r["problem"], r["language"], r["sample"]) for r in rows]
    assert len(keys) == len(set(keys)) == 40
    assert verdict_set(out) == verdict_set(reference)
    assert "resumed" in resumed.stderr


def test_a_torn_last_line_is_repaired_on_resume(tmp_path, tiny_set):
    dump = write_dump(tmp_path / "ckpt.jsonl", mixed_rows(6))
    out = tmp_path / "out"
    assay("score", dump, "--set", tiny_set, "--out", out, "-q")
    executions = out / "executions.jsonl"
    lines = executions.read_text().splitlines(keepends=True)
    executions.write_text("".join(lines[:3]) + lines[3][: len(lines[3]) // 2])  # crash mid-write
    assay("score", dump, "--set", tiny_set, "--out", out, "-q")
    assert len(read_rows(out)) == 6
    assert len({r["sample"] for r in read_rows(out)}) == 6


def test_rerunning_a_finished_run_executes_nothing(tmp_path, tiny_set):
    dump = write_dump(tmp_path / "ckpt.jsonl", mixed_rows(4))
    out = tmp_path / "out"
    assay("score", dump, "--set", tiny_set, "--out", out, "-q")
    again = assay("score", dump, "--set", tiny_set, "--out", out, "-q")
    assert "judged 0, shared 0, resumed 4" in again.stderr


def test_infra_errors_are_retried_by_the_next_run(tmp_path, tiny_set):
    dump = write_dump(tmp_path / "ckpt.jsonl", mixed_rows(4))
    out = tmp_path / "out"
    assay("score", dump, "--set", tiny_set, "--out", out, "-q")
    rows = read_rows(out)
    rows[0]["outcome"] = "infra_error"
    (out / "executions.jsonl").write_text("".join(json.dumps(r) + "\n" for r in rows))
    again = assay("score", dump, "--set", tiny_set, "--out", out, "-q")
    assert "judged 1, shared 0, resumed 3" in again.stderr
    assert sum(r["outcome"] == "infra_error" for r in read_rows(out)) == 0
    assert len(read_rows(out)) == 4


def test_a_folder_in_use_is_refused(tmp_path, tiny_set):
    from filelock import FileLock

    dump = write_dump(tmp_path / "ckpt.jsonl", mixed_rows(2))
    out = tmp_path / "out"
    out.mkdir()
    with FileLock(str(out / ".assay.lock")):
        done = assay("score", dump, "--set", tiny_set, "--out", out, "-q", check=False)
    assert done.returncode == 2 and "in use" in done.stderr


def test_resuming_with_different_inputs_is_refused(tmp_path, tiny_set):
    out = tmp_path / "out"
    assay("score", write_dump(tmp_path / "a.jsonl", mixed_rows(2)), "--set", tiny_set, "--out", out, "-q")
    done = assay("score", write_dump(tmp_path / "a.jsonl", mixed_rows(3)), "--set", tiny_set, "--out", out,
                 "-q", check=False)
    assert done.returncode == 2 and "different run" in done.stderr and "inputs" in done.stderr


def test_report_prints_the_table_and_json(tmp_path, tiny_set):
    out = tmp_path / "out"
    assay("score", write_dump(tmp_path / "a.jsonl", mixed_rows(4)), "--set", tiny_set, "--out", out, "-q",
          "--k", "1")
    table = assay("report", out).stdout
    assert "python" in table and "50.0" in table and "overall" in table
    data = json.loads(assay("report", out, "--json").stdout)
    assert data["pass_at_k"]["overall"]["1"] == pytest.approx(0.5)


def test_prompts_writes_one_row_per_problem_and_language(tmp_path):
    out = tmp_path / "prompts.jsonl"
    assay("prompts", "--set", "core", "--lang", "python", "-o", out)
    rows = [json.loads(line) for line in out.read_text().splitlines()]
    assert len(rows) >= 60
    first = rows[0]
    assert first["language"] == "python" and first["prompt"].startswith("def ")
    assert "\ndef " in first["stop_sequences"]


@pytest.mark.slow
def test_reference_completions_of_the_prompts_pass_in_continue_mode(tmp_path):
    from harness.problems import load_problem_set

    prompts = tmp_path / "prompts.jsonl"
    assay("prompts", "--set", "core", "--lang", "python", "-o", prompts)
    core = load_problem_set("core")
    dump = tmp_path / "refs.jsonl"
    rows = [json.loads(line) for line in prompts.read_text().splitlines()]
    write_dump(dump, [{"problem": r["problem"], "language": "python",
                       "completion": "".join("    " + line if line.strip() else line
                                             for line in core.problems[r["problem"]].reference["python"]
                                             .splitlines(keepends=True))} for r in rows])
    out = tmp_path / "out"
    assay("score", dump, "--set", "core", "--out", out, "-q", "--k", "1")
    summary = json.loads((out / "summary.json").read_text())
    assert summary["pass_at_k"]["overall"]["1"] == 1.0


def test_bad_options_give_one_clear_line(tmp_path, tiny_set):
    dump = write_dump(tmp_path / "a.jsonl", mixed_rows(1))
    for args, message in [(["--k", "0"], "--k"), (["--mode", "sideways"], "--mode"),
                          (["--set", "/nonexistent/set"], "no problem set"),
                          (["--sandbox", "chroot"], "unknown sandbox")]:
        done = assay("score", dump, "--out", tmp_path / "o", *args, check=False)
        assert done.returncode == 2 and message in done.stderr and "Traceback" not in done.stderr


def test_identical_programs_run_once_and_share_their_verdict(tmp_path, tiny_set):
    rows = [{"problem": "add_pair", "language": "python", "completion": CANDIDATES["passed"]}] * 5
    rows += [{"problem": "add_pair", "language": "python", "completion": CANDIDATES["passed"] + "\n\nprint(1)\n"}]
    out = tmp_path / "out"
    done = assay("score", write_dump(tmp_path / "a.jsonl", rows), "--set", tiny_set, "--out", out, "-q")
    assert "judged 1, shared 5" in done.stderr  # the trailing text is cut by a stop sequence
    saved = read_rows(out)
    assert len(saved) == 6 and sum(bool(r.get("shared")) for r in saved) == 5
    assert json.loads((out / "summary.json").read_text())["executions"]["saved_share"] == pytest.approx(5 / 6)


def test_a_cache_folder_carries_verdicts_to_the_next_checkpoint(tmp_path, tiny_set):
    cache = tmp_path / "cache"
    first = write_dump(tmp_path / "a.jsonl", mixed_rows(4))
    assay("score", first, "--set", tiny_set, "--out", tmp_path / "a", "-q", "--cache", cache)
    second = write_dump(tmp_path / "b.jsonl", mixed_rows(4)[::-1])
    done = assay("score", second, "--set", tiny_set, "--out", tmp_path / "b", "-q", "--cache", cache)
    assert "judged 0, shared 4" in done.stderr
    assert verdict_set(tmp_path / "b") == {(p, l, 3 - s, o) for p, l, s, o in verdict_set(tmp_path / "a")}


def test_repeat_marks_candidates_whose_verdicts_disagree_as_flaky(tmp_path, tiny_set):
    # Right or wrong by one coin flip per run (kept for the run's later cases): 24 runs all
    # agreeing has probability 2 / 2**24.
    flaky = ("    import os\n    if not hasattr(add_pair, 'coin'):\n        add_pair.coin = os.urandom(1)[0] % 2\n"
             "    return a + b if add_pair.coin else a + b + 1\n")
    rows = [{"problem": "add_pair", "language": "python", "completion": CANDIDATES["passed"]},
            {"problem": "add_pair", "language": "python", "completion": flaky}]
    out = tmp_path / "out"
    assay("score", write_dump(tmp_path / "a.jsonl", rows), "--set", tiny_set, "--out", out, "-q", "--repeat", "24")
    saved = {r["sample"]: r for r in read_rows(out)}
    assert saved[0]["flaky"] is False and saved[0]["repeat_outcomes"] == ["passed"] * 24
    assert saved[1]["flaky"] is True and set(saved[1]["repeat_outcomes"]) == {"passed", "wrong_answer"}
    assert json.loads((out / "summary.json").read_text())["flaky"] == {"python": 1}


def test_two_runs_writing_one_cache_folder_at_once_both_finish_with_the_same_verdicts(tmp_path, tiny_set):
    cache = tmp_path / "cache"
    rows = [{"problem": "add_pair", "language": "python", "completion": f"    return a + b + {i % 3} - {i % 3}\n"}
            for i in range(12)]
    dumps = [write_dump(tmp_path / f"{name}.jsonl", rows) for name in ("a", "b")]
    runs = [subprocess.Popen(ASSAY + ["score", str(dump), "--set", str(tiny_set), "--out", str(tmp_path / dump.stem),
                                      "-q", "--cache", str(cache)], stderr=subprocess.PIPE, text=True)
            for dump in dumps]
    for run in runs:
        _, stderr = run.communicate(timeout=300)
        assert run.returncode == 0, stderr
    assert verdict_set(tmp_path / "a") == verdict_set(tmp_path / "b")
    assert {r["outcome"] for r in read_rows(tmp_path / "a")} == {"passed"}
