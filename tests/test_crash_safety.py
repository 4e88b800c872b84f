"""Nothing that goes wrong in the machinery changes the score or loses a sample."""

import errno
import json
import signal
import subprocess
import time

import pytest

from harness.problems import load_problem_set
from harness.runtimes import load_runtime
from harness.engine.scoring import ScoreOptions, score
from harness.store import ResultStore, StoreWriteError

from .test_scoring import ASSAY, assay, mixed_rows, read_rows, verdict_set, write_dump


def test_a_full_output_disk_stops_the_run_cleanly_and_the_rerun_completes_it(tmp_path, tiny_set, sandbox,
                                                                               monkeypatch):
    dump = write_dump(tmp_path / "ckpt.jsonl", mixed_rows(12))
    problems, runtimes = load_problem_set(str(tiny_set)), {"python": load_runtime("python")}
    out = tmp_path / "out"
    real_start = ResultStore.start_writing

    class FillingDisk:
        """Injected fault: the verdict file's disk fills after three rows."""

        def __init__(self, handle):
            self.handle, self.name, self.rows = handle, handle.name, 0

        def write(self, text):
            self.rows += 1
            if self.rows > 3:
                raise OSError(errno.ENOSPC, "No space left on device")
            return self.handle.write(text)

        def __getattr__(self, name):
            return getattr(self.handle, name)

    def start_writing(self):
        real_start(self)
        self._executions = FillingDisk(self._executions)

    monkeypatch.setattr(ResultStore, "start_writing", start_writing)
    with pytest.raises(StoreWriteError, match="No space left on device.*run the same command again"):
        score(ScoreOptions(dumps=[dump], out=out, progress=False), problems, runtimes, sandbox)
    monkeypatch.setattr(ResultStore, "start_writing", real_start)
    assert len(read_rows(out)) == 3

    score(ScoreOptions(dumps=[dump], out=out, progress=False), problems, runtimes, sandbox)
    rows = read_rows(out)
    assert len(rows) == 12 and len({r["sample"] for r in rows}) == 12
    assert not any(r["outcome"] == "infra_error" for r in rows)


@pytest.mark.slow
def test_ctrl_c_stops_cleanly_and_says_how_to_resume(tmp_path, tiny_set):
    slow = {"problem": "add_pair", "language": "python",
            "completion": "    import time\n    time.sleep(0.3)\n    return a + b\n"}
    rows = [dict(slow, completion=slow["completion"] + f"    # variant {i}\n") for i in range(30)]
    dump = write_dump(tmp_path / "ckpt.jsonl", rows)
    out = tmp_path / "out"
    process = subprocess.Popen(ASSAY + ["score", str(dump), "--set", str(tiny_set), "--out", str(out), "-q"],
                               stdout=subprocess.PIPE, stderr=subprocess.PIPE, text=True)
    executions = out / "executions.jsonl"
    deadline = time.monotonic() + 60
    while time.monotonic() < deadline and (not executions.exists() or executions.read_text().count("\n") < 3):
        time.sleep(0.05)
    process.send_signal(signal.SIGINT)
    _, stderr = process.communicate(timeout=60)
    assert process.returncode == 130
    assert "interrupted" in stderr and "same command" in stderr and "Traceback" not in stderr
    partial = read_rows(out)
    assert 3 <= len(partial) < 30

    assay("score", dump, "--set", tiny_set, "--out", out, "-q")
    final = read_rows(out)
    assert len(final) == 30 and len({r["sample"] for r in final}) == 30
    assert {r["outcome"] for r in final} == {"passed"}


def test_scoring_the_same_dump_twice_gives_identical_verdicts(tmp_path, tiny_set):
    dump = write_dump(tmp_path / "ckpt.jsonl", mixed_rows(8))
    assay("score", dump, "--set", tiny_set, "--out", tmp_path / "a", "-q")
    assay("score", dump, "--set", tiny_set, "--out", tmp_path / "b", "-q")
    assert verdict_set(tmp_path / "a") == verdict_set(tmp_path / "b")
    details = lambda out: {(r["sample"], r["cases_passed"], r["detail"]) for r in read_rows(out)}  # noqa: E731
    assert details(tmp_path / "a") == details(tmp_path / "b")


def test_report_refuses_headline_figures_while_infra_errors_remain(tmp_path, tiny_set):
    out = tmp_path / "out"
    assay("score", write_dump(tmp_path / "a.jsonl", mixed_rows(4)), "--set", tiny_set, "--out", out, "-q")
    summary = json.loads((out / "summary.json").read_text())
    summary["infra_errors"] = 1
    (out / "summary.json").write_text(json.dumps(summary))
    refused = assay("report", out, check=False)
    assert refused.returncode == 2 and "infra_error" in refused.stderr and "Rerun" in refused.stderr
    assert "pass@1" not in refused.stdout
    allowed = assay("report", out, "--allow-infra-errors")
    assert "pass@1" in allowed.stdout
