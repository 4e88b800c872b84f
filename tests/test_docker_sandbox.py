"""The Docker sandbox: same verdicts as bubblewrap, locked-down containers, limits per step,
containers recycled on any sign of trouble, nothing left behind, daemon failures kept apart
from the candidates' verdicts.

Needs a Docker daemon and the Python runtime's image (built here when missing); without them
these tests skip and say why. CI has both (.ci/docker-setup.sh)."""

from __future__ import annotations

import contextlib
import json
import os
import shutil
import signal
import subprocess
import sys
import threading
import time
from pathlib import Path

import pytest

from harness.engine.checks import check_runtime, load_wrong_candidates
from harness.vocabulary import Sample
from harness.engine.execution import Executor
from harness.runtimes import load_runtime
from harness.vocabulary import Limits
from harness.sandbox import SandboxUnavailable, make_sandbox
from harness.sandbox import docker as backend
from harness.sandbox import images

from .test_scoring import ASSAY, write_dump
from .test_step_launch import limits_table

ROOT = Path(__file__).resolve().parents[1]
STEP = Limits(wall_seconds=10, cpu_seconds=10)


def _client_or_reason():
    try:
        return backend.connect(timeout=30), None
    except SandboxUnavailable as exc:
        return None, f"no Docker daemon reachable: {exc}"


@pytest.fixture(scope="module")
def client():
    client, reason = _client_or_reason()
    if client is None:
        pytest.skip(reason)
    return client


@pytest.fixture(scope="module")
def python_image(client):
    """The Python runtime's image, built (on the offline base where debootstrap can make it)
    when this checkout's runtime files have none yet."""
    runtime = load_runtime("python")
    tag = images.image_tag(runtime.needs)
    if images.find_image(client, tag) is None:
        offline = images.find_image(client, images.OFFLINE_BASE) is not None or (
            os.geteuid() == 0 and shutil.which("debootstrap") is not None)
        try:
            base = images.ensure_base(client, None, offline, lambda message: None)
            images.build_runtime_image(client, runtime.needs, base, lambda message: None)
        except images.ImageError as exc:
            pytest.skip(f"the python image {tag} cannot be built here: {exc}")
    return tag


@pytest.fixture
def docker_box(python_image):
    box = backend.DockerSandbox()
    box.check()
    yield box
    box.close()


def containers_of(client, label: str) -> list[dict]:
    return client.api.containers(all=True, filters={"label": label})


def step(box, command: str, limits: Limits = STEP, needs=None):
    """Run one shell command as a candidate's step; the result and the container it ran in."""
    needs = needs or load_runtime("python").needs
    with box.workspace(needs) as space:
        return space.run(["sh", "-c", command], limits, {}), space.container_id


# --- verdicts ---------------------------------------------------------------------------------

def test_conformance_references_and_wrong_candidates_get_the_same_verdicts_as_bubblewrap(docker_box, sandbox,
                                                                                         conformance):
    runtime = load_runtime("python")
    overrides = {"wall_seconds": 5, "cpu_seconds": 5}  # as `assay runtimes check`
    under_docker = check_runtime(runtime, conformance, docker_box, 2, overrides)
    under_bubblewrap = check_runtime(runtime, conformance, sandbox, 2, overrides)
    docker_outcomes = {row["check"]: row["outcome"] for row in under_docker}
    assert docker_outcomes == {row["check"]: row["outcome"] for row in under_bubblewrap}
    # references + runtimes/python/checks.yaml (the forged out-of-memory error among them: the
    # per-step peak memory, not the message, decides it on both backends)
    assert len(docker_outcomes) == len(conformance) + len(load_wrong_candidates(runtime))
    assert all(row["ok"] for row in under_docker), [r for r in under_docker if not r["ok"]]


# --- the container ----------------------------------------------------------------------------

def test_a_container_is_locked_down_as_the_engine_api_reports_it(docker_box, client):
    result, container = step(docker_box, "id -u; grep -E '^(CapEff|NoNewPrivs)' /proc/self/status; "
                                         "touch /usr/x 2>&1; cat /proc/net/dev | tail -n +3 | cut -d: -f1")
    assert result.ok, result
    lines = [line.strip() for line in result.stdout.splitlines()]
    assert lines[0] == "10001"
    assert "CapEff:\t0000000000000000" in result.stdout and "NoNewPrivs:\t1" in result.stdout
    assert "Read-only file system" in result.stdout
    assert lines[-1] == "lo"  # the only network interface
    info = client.api.inspect_container(container)
    host = info["HostConfig"]
    assert host["NetworkMode"] == "none" and host["ReadonlyRootfs"] is True
    assert host["CapDrop"] == ["ALL"] and "no-new-privileges:true" in host["SecurityOpt"]
    assert host["Memory"] == host["MemorySwap"] > 0 and host["PidsLimit"] > 0 and host["NanoCpus"] == 10**9
    assert set(host["Tmpfs"]) == {"/work", "/tmp"}
    assert info["Config"]["User"] == "10001:10001"
    labels = info["Config"]["Labels"]
    assert labels[backend.LABEL_OWNER] == str(os.getpid()) and labels[backend.LABEL_RUN] == docker_box.run_id


def test_the_manifest_names_each_runtime_image_by_tag_and_id(docker_box, client, python_image):
    step(docker_box, "true")
    described = docker_box.describe()
    assert described["backend"] == "docker"
    assert described["images"]["python"] == {"tag": python_image,
                                             "id": client.api.inspect_image(python_image)["Id"]}
    assert described["max_runs_per_container"] == backend.DEFAULT_MAX_RUNS


def test_building_an_image_that_exists_for_the_current_files_is_a_no_op(python_image, client):
    from typer.testing import CliRunner

    from harness.cli import app

    result = CliRunner().invoke(app, ["runtimes", "build", "python", "--offline-base", "--json"])
    assert result.exit_code == 0, result.output
    (built,) = json.loads(result.stdout)["built"]
    assert built["tag"] == python_image and built["built"] is False
    assert built["id"] == client.api.inspect_image(python_image)["Id"]


def test_a_runtime_without_its_image_says_how_to_build_it(docker_box, tmp_path):
    copy = tmp_path / "runtimes" / "python"
    shutil.copytree(ROOT / "runtimes" / "python", copy)
    (copy / "Dockerfile").write_text((copy / "Dockerfile").read_text() + "# changed\n")
    box = backend.DockerSandbox()
    box.check()
    try:
        with pytest.raises(SandboxUnavailable, match="assay runtimes build python"):
            with box.workspace(load_runtime("python", [copy.parent]).needs):
                pass
    finally:
        box.close()


def test_a_runtime_kept_outside_the_project_is_built_and_scored_with_runtimes_dir(python_image, client, tmp_path,
                                                                                  tiny_set):
    outside = tmp_path / "team-runtimes"
    shutil.copytree(ROOT / "runtimes" / "python", outside / "snake")
    yaml_file = outside / "snake" / "runtime.yaml"
    yaml_file.write_text(yaml_file.read_text().replace("name: python", "name: snake", 1))
    tag = images.image_tag(load_runtime("snake", [outside]).needs)
    built = subprocess.run(ASSAY + ["runtimes", "build", "snake", "--runtimes-dir", str(outside), "--offline-base"],
                           capture_output=True, text=True, cwd=ROOT, timeout=900)
    try:
        assert built.returncode == 0, built.stderr
        dump = write_dump(tmp_path / "snake.jsonl", [{"problem": "add_pair", "language": "snake",
                                                      "completion": "    return a + b\n"}])
        scored = subprocess.run(ASSAY + ["score", str(dump), "--set", str(tiny_set), "--out", str(tmp_path / "out"),
                                         "--sandbox", "docker", "--runtimes-dir", str(outside), "--json"],
                                capture_output=True, text=True, cwd=ROOT, timeout=300)
        assert scored.returncode == 0, scored.stderr
        verdicts = [json.loads(line) for line in (tmp_path / "out" / "executions.jsonl").read_text().splitlines()]
        assert [v["outcome"] for v in verdicts] == ["passed"]
    finally:
        with contextlib.suppress(Exception):
            client.images.remove(tag)


# --- limits -----------------------------------------------------------------------------------

def test_a_step_in_a_container_starts_through_the_launcher_with_its_limits_and_default_signals(docker_box):
    """As under bubblewrap (tests/test_step_launch.py): read from the kernel's account of the
    step's own process (proc(5)), started by the image's /bin/sh."""
    limits = Limits(wall_seconds=10, cpu_seconds=3, max_file_mb=5)
    with docker_box.workspace(load_runtime("python").needs) as space:
        assert space.box.launcher == "/bin/sh"
        table, adj, status, argv = (space.run(command, limits, {}) for command in (
            ["cat", "/proc/self/limits"], ["cat", "/proc/self/oom_score_adj"], ["cat", "/proc/self/status"],
            ["cat", "/proc/self/cmdline", "two words", ""]))
    assert limits_table(table.stdout)["Max cpu time"] == ("3", "4")
    assert limits_table(table.stdout)["Max file size"] == (str(5 * 2**20),) * 2
    assert limits_table(table.stdout)["Max core file size"] == ("0", "0")
    assert adj.stdout.strip() == "1000"
    masks = dict(line.split(":\t", 1) for line in status.stdout.splitlines() if line.startswith("Sig"))
    assert int(masks["SigIgn"], 16) == 0 and int(masks["SigBlk"], 16) == 0, masks
    assert argv.stdout == "cat\0/proc/self/cmdline\0two words\0\0"


@pytest.mark.parametrize("command,limits,flag", [
    ("exec sleep 30", Limits(wall_seconds=1, cpu_seconds=1), "timed_out"),
    ("while :; do :; done", Limits(wall_seconds=10, cpu_seconds=1), "timed_out"),  # CPU, well before the wall
    ("exec python3 -c 'b = bytearray(200 << 20); b[::4096] = bytes(len(b[::4096]))'", Limits(memory_mb=64),
     "memory_exceeded"),
    ("exec yes flood", Limits(max_output_kb=64), "output_exceeded"),
    ("exec dd if=/dev/zero of=big bs=1M count=8", Limits(max_file_mb=1), "file_size_exceeded"),
])
def test_each_limit_ends_the_step_with_its_own_flag(docker_box, command, limits, flag):
    started = time.monotonic()
    result, _ = step(docker_box, command, limits)
    flags = {f for f in ("timed_out", "memory_exceeded", "output_exceeded", "file_size_exceeded") if getattr(result, f)}
    assert flags == {flag}, result
    assert time.monotonic() - started < limits.wall_seconds + 5


def test_the_process_limit_counts_threads(docker_box):
    code = ("import threading, time\nn = 0\ntry:\n    for _ in range(200):\n"
            "        threading.Thread(target=time.sleep, args=(3,), daemon=True).start(); n += 1\n"
            "except RuntimeError:\n    pass\nprint(n)")
    result, _ = step(docker_box, f"exec python3 -c '{code}'", Limits(max_processes=20))
    assert 10 <= int(result.stdout) < 20, result  # the interpreter's own thread counts too


def test_the_container_limits_follow_each_step(docker_box):
    needs = load_runtime("python").needs
    show = "cat /sys/fs/cgroup/memory/memory.limit_in_bytes /sys/fs/cgroup/pids/pids.max 2>/dev/null" \
           " || cat /sys/fs/cgroup/memory.max /sys/fs/cgroup/pids.max"
    with docker_box.workspace(needs) as space:
        small = space.run(["sh", "-c", show], Limits(memory_mb=64, max_processes=10), {})
        large = space.run(["sh", "-c", show], Limits(memory_mb=300, max_processes=99), {})
    allowance = backend.SUPERVISOR_MB
    assert small.stdout.split() == [str((64 + allowance) << 20), "11"]
    assert large.stdout.split() == [str((300 + allowance) << 20), "100"]


# --- reuse and recycling ----------------------------------------------------------------------

def test_a_clean_candidate_leaves_an_empty_work_dir_in_a_reused_container(docker_box):
    _, first = step(docker_box, "echo secret > notes; echo x > /tmp/x; echo y > /dev/shm/y")
    result, second = step(docker_box, "ls -A /work /tmp /dev/shm")
    assert second == first
    assert "notes" not in result.stdout and result.stdout.split() == ["/dev/shm:", "/tmp:", "/work:"]


def test_a_fifo_or_a_link_planted_in_place_of_a_file_reads_as_missing(docker_box):
    with docker_box.workspace(load_runtime("python").needs) as space:
        space.run(["sh", "-c", "mkfifo pipe && ln -s /etc/passwd link && echo fine > plain"], STEP, {})
        started = time.monotonic()
        found = [space.read(name, 100) for name in ("pipe", "link", "plain", "absent")]
    assert found == [None, None, b"fine\n", None]
    assert time.monotonic() - started < 5  # a FIFO without a writer must not block the read


def test_scratch_folders_are_emptied_between_steps_like_bubblewraps_fresh_tmp(docker_box):
    with docker_box.workspace(load_runtime("python").needs) as space:
        space.run(["sh", "-c", "echo x > /tmp/left"], STEP, {})
        result = space.run(["sh", "-c", "ls -A /tmp"], STEP, {})
    assert result.stdout == ""


@pytest.mark.parametrize("command,limits", [
    ("sleep 30", Limits(wall_seconds=1, cpu_seconds=1)),
    ("python3 -c 'b = bytearray(200 << 20); b[::4096] = bytes(len(b[::4096]))'", Limits(memory_mb=64)),
    ("setsid sleep 300 & true", STEP),
    ("python3 -c 'import os; os.setsid(); os.fork() or __import__(\"time\").sleep(300)' & true", STEP),
])
def test_a_container_is_replaced_after_a_timeout_a_memory_kill_or_a_process_left_running(docker_box, client,
                                                                                        command, limits):
    result, first = step(docker_box, command, limits)
    _, second = step(docker_box, "true")
    assert second != first, result
    deadline = time.monotonic() + 30
    while time.monotonic() < deadline and any(c["Id"] == first for c in containers_of(client, backend.LABEL_RUN)):
        time.sleep(0.2)
    assert not any(c["Id"] == first for c in containers_of(client, backend.LABEL_RUN))


def test_a_process_left_running_is_killed_when_its_step_ends(docker_box):
    with docker_box.workspace(load_runtime("python").needs) as space:
        left = space.run(["sh", "-c", "setsid sleep 300 & true"], STEP, {})
        after = space.run(["sh", "-c", "cat /proc/[0-9]*/comm"], STEP, {})
    assert left.extra["processes_left_running"] >= 1
    assert "sh" in after.stdout.split() and "sleep" not in after.stdout.split()


def test_a_step_ends_with_its_own_process_even_if_a_detached_child_holds_its_output(docker_box):
    # As under bubblewrap, whose pid namespace ends with the step's first process.
    started = time.monotonic()
    result, _ = step(docker_box, "(setsid sleep 30 &); echo parent done", Limits(wall_seconds=10, cpu_seconds=10))
    assert time.monotonic() - started < 5
    assert result.exit_code == 0 and not result.timed_out and result.stdout == "parent done\n"
    assert result.extra["processes_left_running"] >= 1


def test_ipc_objects_left_for_the_next_candidate_replace_the_container(docker_box):
    code = ("import ctypes; libc = ctypes.CDLL(None); "
            "print(libc.shmget(0, 4096, 0o1600))")  # IPC_PRIVATE segment, IPC_CREAT|0600 (shmget(2))
    result, first = step(docker_box, f'exec python3 -c "{code}"')
    assert int(result.stdout) >= 0, result
    _, second = step(docker_box, "true")
    assert second != first


def test_a_container_is_replaced_after_max_runs_candidates(python_image, monkeypatch):
    monkeypatch.setenv(backend.MAX_RUNS_ENV, "3")
    box = backend.DockerSandbox()
    box.check()
    try:
        used = [step(box, "true")[1] for _ in range(4)]
    finally:
        box.close()
    assert used[0] == used[1] == used[2] != used[3]


@pytest.mark.parametrize("value", ["0", "many", "-2"])
def test_a_bad_max_runs_value_is_refused_by_name(monkeypatch, value):
    monkeypatch.setenv(backend.MAX_RUNS_ENV, value)
    with pytest.raises(SandboxUnavailable, match=backend.MAX_RUNS_ENV):
        backend.DockerSandbox()


def test_the_supervisor_survives_a_candidate_that_signals_and_probes_it(docker_box):
    attack = ("kill -9 -1; kill -KILL 1; kill -STOP 1; kill -TERM 1; kill -INT 1; "
              "cat /proc/1/environ > /dev/null 2>&1 && echo ENVIRON; ls /proc/1/fd > /dev/null 2>&1 && echo FDS; "
              "head -c1 /proc/1/mem > /dev/null 2>&1 && echo MEM; true")
    with docker_box.workspace(load_runtime("python").needs) as space:
        probed = space.run(["sh", "-c", attack], STEP, {})
        after = space.run(["sh", "-c", "echo alive"], STEP, {})
    assert not {"ENVIRON", "FDS", "MEM"} & set(probed.stdout.split()), probed
    assert after.ok and after.stdout == "alive\n"


# --- nothing left behind ----------------------------------------------------------------------

def test_close_removes_every_container_of_the_run(python_image, client):
    box = backend.DockerSandbox()
    box.check()
    box.warm(load_runtime("python").needs, 2)
    step(box, "true")
    assert len(containers_of(client, f"{backend.LABEL_RUN}={box.run_id}")) >= 2
    box.close()
    assert containers_of(client, f"{backend.LABEL_RUN}={box.run_id}") == []


CRASHING_HARNESS = """
import os, signal, sys
from harness.runtimes import load_runtime
from harness.sandbox.docker import DockerSandbox
box = DockerSandbox()
box.check()
with box.workspace(load_runtime("python").needs) as space:
    print(box.run_id, flush=True)
    os.kill(os.getpid(), signal.SIGKILL)
"""


def test_containers_of_a_killed_harness_are_removed_when_the_next_backend_starts(python_image, client):
    done = subprocess.run([sys.executable, "-c", CRASHING_HARNESS], cwd=ROOT, capture_output=True, text=True,
                          timeout=120)
    assert done.returncode == -signal.SIGKILL, done.stderr
    orphan_run = done.stdout.strip()
    assert containers_of(client, f"{backend.LABEL_RUN}={orphan_run}"), "the crashed run left no container to test"
    alive = backend.DockerSandbox()
    alive.check()
    assert alive.orphans_removed >= 1
    assert containers_of(client, f"{backend.LABEL_RUN}={orphan_run}") == []
    alive.warm(load_runtime("python").needs, 1)
    try:
        later = backend.DockerSandbox()  # its sweep must spare a live owner's container
        later.check()
        later.close()
        assert len(containers_of(client, f"{backend.LABEL_RUN}={alive.run_id}")) == 1
    finally:
        alive.close()


def test_ctrl_c_during_scoring_leaves_no_container(python_image, client, tmp_path, tiny_set):
    slow = {"problem": "add_pair", "language": "python",
            "completion": "    import time\n    time.sleep(1)\n    return a + b\n"}
    dump = write_dump(tmp_path / "slow.jsonl", [dict(slow, completion=slow["completion"] + f"    # {i}\n")
                                                 for i in range(40)])
    process = subprocess.Popen(ASSAY + ["score", str(dump), "--set", str(tiny_set), "--out", str(tmp_path / "out"),
                                        "--sandbox", "docker", "-q"],
                               stdout=subprocess.PIPE, stderr=subprocess.PIPE, text=True, cwd=ROOT)
    mine = f"{backend.LABEL_OWNER}={process.pid}"
    deadline = time.monotonic() + 90
    while time.monotonic() < deadline and not containers_of(client, mine):
        time.sleep(0.2)
    assert containers_of(client, mine), "scoring never started a container"
    time.sleep(2)
    process.send_signal(signal.SIGINT)
    _, stderr = process.communicate(timeout=120)
    assert process.returncode == 130 and "Traceback" not in stderr, stderr
    assert containers_of(client, mine) == []


def test_sandbox_clean_removes_the_containers_of_a_run(python_image, client):
    from typer.testing import CliRunner

    from harness.cli import app

    box = backend.DockerSandbox()
    box.check()
    box.warm(load_runtime("python").needs, 2)
    try:
        result = CliRunner().invoke(app, ["sandbox", "clean", "--run", box.run_id, "--json"])
        assert result.exit_code == 0, result.output
        assert len(json.loads(result.stdout)["removed"]) == 2
        assert containers_of(client, f"{backend.LABEL_RUN}={box.run_id}") == []
    finally:
        box.close()


# --- daemon trouble ---------------------------------------------------------------------------

def test_an_unreachable_daemon_gives_one_clear_message(monkeypatch, tmp_path):
    from typer.testing import CliRunner

    from harness.cli import app

    monkeypatch.setenv("DOCKER_HOST", f"unix://{tmp_path}/no-daemon.sock")
    with pytest.raises(SandboxUnavailable, match="cannot reach the Docker daemon.*--sandbox bubblewrap"):
        make_sandbox("docker").check()
    dump = write_dump(tmp_path / "d.jsonl", [{"problem": "pass_int", "language": "python", "completion": "x"}])
    result = CliRunner().invoke(app, ["score", str(dump), "--set", "conformance", "--sandbox", "docker",
                                      "--out", str(tmp_path / "out")])
    assert result.exit_code == 2
    assert "cannot reach the Docker daemon" in result.output and "Traceback" not in result.output


def kill_container_soon(client, space, delay: float) -> threading.Thread:
    container = space.container_id
    thread = threading.Thread(target=lambda: (time.sleep(delay), client.api.kill(container)))
    thread.start()
    return thread


def test_a_container_lost_mid_step_is_replaced_and_the_candidate_carries_on(docker_box, client):
    with docker_box.workspace(load_runtime("python").needs) as space:
        space.write("input.txt", "42")
        compiled = space.run(["sh", "-c", "cp input.txt built.txt"], STEP, {})
        killer = kill_container_soon(client, space, 1.0)
        ran = space.run(["sh", "-c", "sleep 3; cat built.txt > out.txt"], STEP, {})
        killer.join()
        data = space.read("out.txt", 100)
    assert compiled.ok and ran.ok, ran
    assert ran.extra["sandbox_retries"] == 1
    assert data == b"42"  # the earlier file and step were replayed in the new container


def test_a_daemon_that_keeps_failing_gives_infra_error_never_a_failed_verdict(docker_box, client, monkeypatch,
                                                                              conformance):
    import docker

    monkeypatch.setattr(backend, "BACKOFF_SECONDS", (0.01, 0.01, 0.01))
    runtime = load_runtime("python")
    executor = Executor(docker_box, conformance, {"python": runtime}, infra_retries=0)
    slow = "    import time\n    time.sleep(4)\n    return value\n"
    original = docker_box.start_box

    def failing_start(*args):
        raise docker.errors.APIError("500 Server Error: daemon overloaded (simulated)")

    def kill_then_fail():
        deadline = time.monotonic() + 30
        while time.monotonic() < deadline:
            running = containers_of(client, f"{backend.LABEL_RUN}={docker_box.run_id}")
            if running:
                monkeypatch.setattr(docker_box, "start_box", failing_start)
                time.sleep(1.5)  # inside the candidate's run step
                client.api.kill(running[0]["Id"])
                return
            time.sleep(0.05)

    docker_box.warm(runtime.needs, 1)
    killer = threading.Thread(target=kill_then_fail)
    killer.start()
    verdict = executor.execute(Sample("pass_int", "python", 0, slow, "test", 0))
    killer.join()
    monkeypatch.setattr(docker_box, "start_box", original)
    assert verdict.outcome == "infra_error", verdict
    assert "daemon overloaded" in verdict.detail
