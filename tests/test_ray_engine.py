"""The Ray engine on a local two-node cluster: the same verdicts as the local thread pool, each
sample recorded once, even when a worker node dies while it is judging candidates."""

from __future__ import annotations

import importlib.util
import json
import os
import shutil
import subprocess
import sys
import tempfile
import time
from pathlib import Path

import pytest

from harness.engine.engines import ExecutorSpec
from harness.engine.ray import Identity, NodeMismatch, RayEngineError, identity_of, mismatches, spec_for
from harness.engine.execution import Executor
from harness.problems import load_problem_set
from harness.runtimes import load_runtime

from .conftest import ADD_PAIR, write_set
from .test_scoring import ASSAY, assay, read_rows, write_dump

needs_ray = pytest.mark.skipif(importlib.util.find_spec("ray") is None,
                               reason="Ray is not installed (pip install -e '.[ray]'); the Ray engine is untested")
NODE_ARGS = {"num_cpus": 1, "object_store_memory": 100_000_000}
# The head declares a silent node dead after 3 missed half-second checks, not Ray's default ~30 s.
FAST_DEATH = {"health_check_initial_delay_ms": 0, "health_check_period_ms": 500, "health_check_failure_threshold": 3}

# Each kind: (body after a short sleep, the outcome and cases passed it must get on add_pair).
KINDS = {
    "passed": ("return a + b", "passed", 3),
    "wrong": ("return a * b", "wrong_answer", 0),
    "partial": ("return a + b if a < 10 else 0", "wrong_answer", 2),
    "crash": ("return None + 1", "runtime_error", 0),
}


def candidate(kind: str, variant: int) -> str:
    """Distinct programs (the comment differs), so each one is really executed."""
    body = KINDS[kind][0]
    return f"    import time\n    time.sleep(0.2)\n    {body}  # variant {variant}\n"


def cluster_dump_rows() -> list[dict]:
    """16 distinct programs, then 8 repeats of earlier ones, which share their verdicts."""
    kinds = list(KINDS)
    rows = [{"problem": "add_pair", "language": "python", "completion": candidate(kinds[i % 4], i)}
            for i in range(16)]
    rows += [dict(rows[i]) for i in range(0, 16, 2)]
    return rows


def verdicts(out: Path) -> dict:
    """Everything about a row that must not depend on where it ran (not its timing)."""
    return {(r["problem"], r["language"], r["sample"]): (r["outcome"], r["cases_passed"], r["cases_total"],
                                                         r.get("shared", False), r["detail"])
            for r in read_rows(out)}


@pytest.fixture(scope="module")
def tiny_module_set(tmp_path_factory):
    return write_set(tmp_path_factory.mktemp("tiny"), {"add_pair.yaml": ADD_PAIR})


@pytest.fixture(scope="module")
def local_reference(tmp_path_factory, tiny_module_set):
    """The dump and the verdicts the local thread pool gives it."""
    folder = tmp_path_factory.mktemp("reference")
    dump = write_dump(folder / "ckpt.jsonl", cluster_dump_rows())
    assay("score", dump, "--set", tiny_module_set, "--out", folder / "local", "-q", "-j", "2")
    reference = verdicts(folder / "local")
    # The construction's intent (each kind gets its outcome) holds, so equality below means something.
    for (_, _, sample), (outcome, passed, total, _, _) in reference.items():
        completion = cluster_dump_rows()[sample]["completion"]
        kind = next(k for k, (body, _, _) in KINDS.items() if f"{body}  #" in completion)
        assert (outcome, passed, total) == (KINDS[kind][1], KINDS[kind][2], 3)
    return dump, reference


@pytest.fixture(scope="module")
def cluster():
    """A head node and one worker node, one CPU each, as separate raylets on this machine."""
    from ray.cluster_utils import Cluster

    os.makedirs("/tmp/ray", exist_ok=True)  # Ray writes the current cluster's address there
    temp = tempfile.mkdtemp(prefix="rt-", dir="/tmp")  # short: Ray's socket paths are length-limited
    cluster = Cluster(initialize_head=True, head_node_args={**NODE_ARGS, "temp_dir": temp, "include_dashboard": False,
                                                         "_system_config": FAST_DEATH})
    try:
        cluster.add_node(**NODE_ARGS)
        yield cluster
    finally:
        cluster.shutdown()
        shutil.rmtree(temp, ignore_errors=True)


@pytest.fixture(scope="module")
def connected(cluster):
    """This test process as a Ray driver of the cluster (the engine then leaves the connection be);
    one connection for the module, so its worker processes and their executors are reused."""
    import ray

    ray.init(address=cluster.address, logging_level="WARNING", log_to_driver=False)
    try:
        yield ray
    finally:
        ray.shutdown()


def executor_for(problem_set: Path | str, sandbox) -> Executor:
    return Executor(sandbox, load_problem_set(str(problem_set)), {"python": load_runtime("python")})


@needs_ray
def test_a_ray_run_gives_the_local_verdicts_and_resumes_like_one(cluster, local_reference, tiny_module_set, tmp_path):
    dump, reference = local_reference
    out = tmp_path / "ray"
    assay("score", dump, "--set", tiny_module_set, "--out", out, "-q", "--engine", "ray", "--address", cluster.address)
    assert verdicts(out) == reference
    manifest = json.loads((out / "manifest.json").read_text())
    assert manifest["engine"]["engine"] == "ray" and manifest["engine"]["nodes"] == 2
    assert manifest["engine"]["in_flight"] == 4  # twice the cluster's two CPUs
    # The sandbox candidates ran in is a worker's, described by the worker itself.
    assert manifest["sandbox"]["described_by"].startswith("a worker on")
    assert manifest["sandbox"]["backend"] == "bubblewrap"

    # A crash after half the rows: the rerun through Ray judges only the rest.
    executions = out / "executions.jsonl"
    lines = executions.read_text().splitlines(keepends=True)
    executions.write_text("".join(lines[:12]))
    again = assay("score", dump, "--set", tiny_module_set, "--out", out, "-q", "--engine", "ray",
                  "--address", cluster.address)
    assert "resumed 12" in again.stderr
    rows = read_rows(out)
    assert len(rows) == 24 and len({r["sample"] for r in rows}) == 24
    assert {k: v[:3] for k, v in verdicts(out).items()} == {k: v[:3] for k, v in reference.items()}


@needs_ray
def test_the_engine_reads_jobs_lazily_and_keeps_twice_the_cpus_in_flight(connected, tiny_module_set, sandbox):
    from harness.engine.ray import RayEngine

    executor = executor_for(tiny_module_set, sandbox)
    engine = RayEngine(spec_for(executor), identity_of(executor))
    samples = list(_samples(executor, 12))
    consumed, seen = [], []

    def jobs():
        for sample in samples:
            consumed.append(sample.sample)
            yield executor.program_key(sample), sample

    window = 2 * int(connected.cluster_resources()["CPU"])  # two jobs per CPU of the cluster
    try:
        for key, sample, verdict in engine.run(jobs()):
            assert len(consumed) - len(seen) <= window
            seen.append(sample.sample)
            assert verdict.outcome == KINDS[["passed", "wrong", "partial", "crash"][sample.sample % 4]][1]
    finally:
        engine.close()
    assert sorted(seen) == list(range(12))


@needs_ray
def test_draining_after_an_interrupt_reads_no_more_jobs_and_reports_each_job_once(connected, tiny_module_set,
                                                                                 sandbox):
    from harness.engine.ray import RayEngine

    executor = executor_for(tiny_module_set, sandbox)
    engine = RayEngine(spec_for(executor), identity_of(executor))
    samples = iter(_samples(executor, 20))
    jobs = ((executor.program_key(s), s) for s in samples)
    try:
        stream = engine.run(jobs)
        first = [next(stream)[1].sample for _ in range(3)]
        in_flight = {sample.sample for _, sample in engine.pending.values()}
        drained = [sample.sample for _, sample, _ in engine.drain()]
        left = list(samples)
    finally:
        engine.close()
    assert set(drained) <= in_flight and len(drained) == len(set(drained))
    assert not set(first) & set(drained)
    assert len(first) + len(in_flight) + len(left) == 20  # draining read no further job
    assert not engine.pending


def _samples(executor: Executor, count: int):
    from harness.vocabulary import Sample

    kinds = ["passed", "wrong", "partial", "crash"]
    for i in range(count):
        yield Sample("add_pair", "python", i, candidate(kinds[i % 4], i), "inline", i + 1)


@needs_ray
def test_a_node_that_sees_other_problem_files_is_refused_with_the_difference(connected, tmp_path, sandbox):
    from harness.engine.ray import RayEngine

    problems = write_set(tmp_path / "tiny", {"add_pair.yaml": ADD_PAIR})
    executor = executor_for(problems, sandbox)
    engine = RayEngine(spec_for(executor), identity_of(executor))
    # The driver loaded the set; what the workers will read is now different (a stale copy).
    (problems / "add_pair.yaml").write_text(ADD_PAIR.replace("expected: 42", "expected: 43"))
    sample = next(_samples(executor, 1))
    try:
        with pytest.raises(RayEngineError, match="set up unlike the driver: problem set at .*tiny has digest"):
            list(engine.run(iter([(executor.program_key(sample), sample)])))
    finally:
        engine.close()


def descendants(root: int) -> list[tuple[int, int, str]]:
    """(pid, depth, command name) of every process below ``root``, read from /proc."""
    children: dict[int, list[int]] = {}
    names: dict[int, str] = {}
    for entry in os.listdir("/proc"):
        if not entry.isdigit():
            continue
        try:
            stat = Path(f"/proc/{entry}/stat").read_text()
        except OSError:
            continue
        name = stat[stat.index("(") + 1: stat.rindex(")")]
        parent = int(stat[stat.rindex(")") + 2:].split()[1])
        children.setdefault(parent, []).append(int(entry))
        names[int(entry)] = name
    found, frontier = [], [(root, 0)]
    while frontier:
        pid, depth = frontier.pop()
        for child in children.get(pid, []):
            found.append((child, depth + 1, names[child]))
            frontier.append((child, depth + 1))
    return found


@needs_ray
def test_a_worker_node_killed_while_judging_loses_nothing_and_counts_nothing_twice(
        cluster, local_reference, tiny_module_set, tmp_path):
    dump, reference = local_reference
    doomed = cluster.add_node(**NODE_ARGS)
    raylet = doomed.all_processes["raylet"][0].process.pid
    out = tmp_path / "ray"
    process = subprocess.Popen(ASSAY + ["score", str(dump), "--set", str(tiny_module_set), "--out", str(out), "-q",
                                        "--engine", "ray", "--address", cluster.address],
                               stdout=subprocess.PIPE, stderr=subprocess.PIPE, text=True)
    # Wait until the doomed node runs a candidate (its worker's sandbox child), then kill the node.
    deadline, judging = time.monotonic() + 60, False
    while time.monotonic() < deadline and process.poll() is None and not judging:
        judging = any(depth >= 2 for _, depth, _ in descendants(raylet))
        time.sleep(0.02)
    assert judging, "no candidate ever ran on the extra worker node"
    cluster.remove_node(doomed, allow_graceful=False)
    stdout, stderr = process.communicate(timeout=120)
    assert process.returncode == 0, stderr
    rows = read_rows(out)
    keys = [(r["problem"], r["language"], r["sample"]) for r in rows]
    assert len(keys) == len(set(keys)) == 24
    assert verdicts(out) == reference


def test_the_recipe_names_bundled_sets_and_paths_others_and_rebuilds_the_same_executor(tiny_set, sandbox):
    bundled = spec_for(executor_for("core", sandbox))
    assert bundled.problem_set == "core" and bundled.runtime_dirs == ()
    executor = executor_for(tiny_set, sandbox)
    spec = spec_for(executor)
    assert spec.problem_set == str(tiny_set.resolve()) and spec.runtimes == ("python",)
    rebuilt, box = spec.build()
    try:
        assert mismatches(rebuilt, identity_of(executor)) == []
        assert rebuilt.program_key(next(_samples(rebuilt, 1))) == executor.program_key(next(_samples(executor, 1)))
    finally:
        box.close()


def test_a_worker_lists_every_difference_from_the_driver(tiny_set, sandbox):
    executor = executor_for(tiny_set, sandbox)
    driver = identity_of(executor)
    other = Identity("0.0.0", driver.problem_set, "f" * 64, (("python", "e" * 64),))
    found = mismatches(executor, other)
    assert len(found) == 3
    assert "harness version" in found[0] and "problem set" in found[1] and "runtime 'python'" in found[2]


def test_a_worker_that_cannot_build_the_executor_names_the_cause(tmp_path):
    from harness.engine.ray import worker_executor

    spec = ExecutorSpec(problem_set=str(tmp_path / "gone"), runtimes=("python",), sandbox="none")
    with pytest.raises(NodeMismatch, match="cannot build the executor: no problem set"):
        worker_executor(spec, Identity("x", "x", "x", ()))


def test_without_ray_installed_the_ray_engine_is_refused_in_one_clear_line(tmp_path, tiny_set):
    dump = write_dump(tmp_path / "a.jsonl", cluster_dump_rows()[:2])
    # Python's import system treats a None entry in sys.modules as "cannot be imported".
    code = "import sys; sys.modules['ray'] = None; from harness.cli import main; main()"
    done = subprocess.run([sys.executable, "-c", code, "score", str(dump), "--set", str(tiny_set), "--out",
                           str(tmp_path / "out"), "--engine", "ray"], capture_output=True, text=True)
    assert done.returncode == 2, done.stderr
    assert done.stderr.count("\n") == 1 and "pip install" in done.stderr and "Traceback" not in done.stderr
    assert not (tmp_path / "out").exists()


@needs_ray
def test_an_address_nobody_answers_at_is_refused_at_once(tmp_path, tiny_set):
    import socket

    with socket.socket() as probe:  # a port that was free a moment ago: nothing listens there
        probe.bind(("127.0.0.1", 0))
        port = probe.getsockname()[1]
    dump = write_dump(tmp_path / "a.jsonl", cluster_dump_rows()[:1])
    started = time.monotonic()
    done = assay("score", dump, "--set", tiny_set, "--out", tmp_path / "o", "--engine", "ray",
                 "--address", f"127.0.0.1:{port}", check=False)
    assert done.returncode == 2 and f"cannot reach the Ray cluster at 127.0.0.1:{port}" in done.stderr
    assert time.monotonic() - started < 30 and not (tmp_path / "o").exists()


def test_an_unknown_engine_or_an_address_without_ray_is_refused(tmp_path, tiny_set):
    dump = write_dump(tmp_path / "a.jsonl", cluster_dump_rows()[:1])
    for args, message in [(["--engine", "spark"], "--engine must be one of"),
                          (["--address", "10.0.0.1:6379"], "--address is for --engine ray")]:
        done = assay("score", dump, "--set", tiny_set, "--out", tmp_path / "o", *args, check=False)
        assert done.returncode == 2 and message in done.stderr and "Traceback" not in done.stderr


def test_the_recipe_carries_the_extraction_policy_to_the_workers(tiny_set, sandbox):
    """A worker reading text by other rules than the driver would run other programs."""
    executor = executor_for(tiny_set, sandbox)
    executor.extract_policy = "strict"
    spec = spec_for(executor)
    assert spec.extract_policy == "strict"
    rebuilt, box = spec.build()
    try:
        assert rebuilt.extract_policy == "strict"
    finally:
        box.close()
