"""What the bubblewrap sandbox protects: host files, network, processes, identity."""

import os
import socket
import subprocess
import time

import pytest

from harness.vocabulary import Limits, RuntimeSandboxNeeds
from harness.sandbox import SandboxUnavailable, make_sandbox

NEEDS = RuntimeSandboxNeeds("python")
LIMITS = Limits(wall_seconds=10, cpu_seconds=10)


def run_python(sandbox, code: str, limits: Limits = LIMITS):
    with sandbox.workspace(NEEDS) as space:
        space.write("probe.py", code)
        result = space.run(["python3", "-I", "probe.py"], limits, {})
        return result, space




def test_no_network_reaches_a_host_listener(sandbox):
    listener = socket.socket()
    listener.bind(("127.0.0.1", 0))
    listener.listen(1)
    listener.settimeout(1.0)
    port = listener.getsockname()[1]
    code = (
        "import socket\n"
        f"s = socket.socket(); s.settimeout(2)\n"
        f"try:\n    s.connect(('127.0.0.1', {port})); print('CONNECTED')\n"
        "except OSError as e:\n    print('refused', e)\n"
    )
    result, _ = run_python(sandbox, code)
    with pytest.raises(socket.timeout):
        listener.accept()
    listener.close()
    assert "CONNECTED" not in result.stdout and "refused" in result.stdout


def test_host_files_outside_the_sandbox_are_neither_readable_nor_writable(sandbox, tmp_path):
    marker = tmp_path / "marker.txt"
    marker.write_text("secret")
    before = marker.stat()
    code = (
        f"for path in [{str(marker)!r}, '/root/.bashrc', '/etc/shadow']:\n"
        "    try:\n        print('READ', open(path).read()[:10])\n    except OSError as e:\n        print('no', e)\n"
        f"for path in [{str(tmp_path / 'new.txt')!r}, '/usr/evil', '/etc/evil']:\n"
        "    try:\n        open(path, 'w').write('x'); print('WROTE', path)\n    except OSError as e:\n        print('no', e)\n"
    )
    result, _ = run_python(sandbox, code)
    assert "READ" not in result.stdout and "WROTE" not in result.stdout
    assert marker.stat().st_atime == before.st_atime  # unread (the file was never opened)
    assert marker.read_text() == "secret"
    assert not (tmp_path / "new.txt").exists()
    assert not os.path.exists("/etc/evil") and not os.path.exists("/usr/evil")


@pytest.mark.skipif(os.geteuid() != 0, reason="identity switch happens only when Assay runs as root")
def test_candidates_do_not_run_as_root(sandbox):
    result, _ = run_python(sandbox, "import os; print(os.getuid(), os.geteuid())")
    assert result.stdout.split() != ["0", "0"]


def test_background_children_do_not_outlive_the_candidate(sandbox):
    tag = f"assay-orphan-{os.getpid()}-{time.time_ns()}"
    code = (
        "import subprocess, sys\n"
        f"subprocess.Popen(['bash', '-c', 'exec -a {tag} sleep 30'], start_new_session=True)\n"
        "print('spawned')\n"
    )
    result, _ = run_python(sandbox, code)
    assert "spawned" in result.stdout
    time.sleep(0.3)
    survivors = subprocess.run(["pgrep", "-f", tag], capture_output=True, text=True).stdout.split()
    assert survivors == []


def test_the_environment_is_clean(sandbox, monkeypatch):
    monkeypatch.setenv("ASSAY_TEST_SECRET", "hunter2")
    result, _ = run_python(sandbox, "import os; print(sorted(os.environ))")
    assert "ASSAY_TEST_SECRET" not in result.stdout


def test_fork_bombs_hit_the_process_cap(sandbox):
    code = "import os\nfor _ in range(10000):\n    try:\n        os.fork()\n    except OSError:\n        break\n"
    result, _ = run_python(sandbox, code, Limits(wall_seconds=10, cpu_seconds=10, max_processes=32))
    assert not result.timed_out


# --- the warm sandbox: one bubblewrap launch serves many candidates, one at a time ---------

@pytest.fixture
def one_slot():
    """A sandbox of its own, so the tests below know which warm sandbox a candidate gets."""
    box = make_sandbox("bubblewrap")
    box.check()
    yield box
    box.close()


def slot_of(sandbox, code: str, limits: Limits = LIMITS):
    result, space = run_python(sandbox, code, limits)
    return result, space.slot


def test_the_next_candidate_finds_work_tmp_and_shm_empty(one_slot):
    leave = ("import os\nfor d in ('.', '/tmp', '/dev/shm'):\n"
             "    open(os.path.join(d, 'left.txt'), 'w').write('x')\n"
             "os.mkdir('sub'); os.chmod('sub', 0)\n")
    first, slot = slot_of(one_slot, leave)
    assert first.exit_code == 0, first.stderr
    look = "import os\nprint([sorted(os.listdir(d)) for d in ('.', '/tmp', '/dev/shm')])"
    second, again = slot_of(one_slot, look)
    assert again is slot  # the same warm sandbox served both
    assert second.stdout.strip() == "[['probe.py'], [], []]"


def test_dev_is_read_only(one_slot):
    result, _ = run_python(one_slot, "open('/dev/planted', 'w')")
    assert "Read-only file system" in result.stderr


def test_the_supervisor_cannot_be_killed_or_traced_by_the_candidate(one_slot):
    # Every signal that ends or stops a process by default, many times over: the supervisor
    # catches and drops the catchable ones, the kernel drops SIGKILL and SIGSTOP.
    code = ("import os, signal\n"
            "for sig in [signal.SIGKILL, signal.SIGSTOP, signal.SIGTERM, signal.SIGINT, signal.SIGHUP, signal.SIGQUIT,\n"
            "            signal.SIGUSR1, signal.SIGUSR2, signal.SIGALRM, signal.SIGTSTP, signal.SIGTTIN, signal.SIGTTOU] * 50:\n"
            "    os.kill(1, sig)\n"
            "for name in ('environ', 'mem', 'fd'):\n"
            "    try:\n        os.listdir('/proc/1/fd') if name == 'fd' else open('/proc/1/' + name, 'rb').read(1)\n"
            "        print('OPENED', name)\n"
            "    except OSError as e:\n        print('no', name)\n")
    first, slot = slot_of(one_slot, code)
    assert "OPENED" not in first.stdout and first.stdout.count("no") == 3, first.stdout + first.stderr
    second, again = slot_of(one_slot, "print('alive')")
    assert again is slot and second.stdout.strip() == "alive"


@pytest.mark.parametrize("code, limits", [
    ("while True: pass", Limits(wall_seconds=1, cpu_seconds=1)),
    ("x = bytearray(600 * 1024 * 1024)", Limits(memory_mb=128)),
    ("import subprocess\nsubprocess.Popen(['sleep', '30'], start_new_session=True)", LIMITS),
    ("import ctypes\nprint(ctypes.CDLL(None).shmget(0, 4096, 0o1600))", LIMITS),  # key IPC_PRIVATE (0), flags IPC_CREAT (0o1000) | 0o600, per <bits/ipc.h> (values from memory)
    ("import ctypes, os\nrt = ctypes.CDLL('librt.so.1')\nprint(rt.mq_open(b'/left', os.O_CREAT | os.O_RDWR, 0o600, None))",
     LIMITS),
], ids=["timeout", "memory", "process-left-running", "sysv-shared-memory", "posix-message-queue"])
def test_a_sandbox_is_retired_after_a_candidate_that_spoils_it(one_slot, code, limits):
    _, slot = slot_of(one_slot, code, limits)
    result, fresh = slot_of(one_slot, "print('ok')")
    assert fresh is not slot and result.stdout.strip() == "ok"
    assert slot.process.wait(timeout=10) is not None  # the old sandbox is gone


def test_a_sandbox_is_retired_after_its_run_allowance_from_the_environment(monkeypatch):
    monkeypatch.setenv("ASSAY_BWRAP_MAX_RUNS", "2")
    box = make_sandbox("bubblewrap")
    try:
        slots = [slot_of(box, "print(1)")[1] for _ in range(3)]
    finally:
        box.close()
    assert slots[0] is slots[1] and slots[2] is not slots[0]


@pytest.mark.parametrize("value", ["0", "many"])
def test_a_bad_run_allowance_is_refused_by_name(monkeypatch, value):
    monkeypatch.setenv("ASSAY_BWRAP_MAX_RUNS", value)
    with pytest.raises(SandboxUnavailable, match="ASSAY_BWRAP_MAX_RUNS"):
        make_sandbox("bubblewrap")


def test_closing_the_sandbox_ends_every_warm_sandbox_and_removes_its_folders():
    box = make_sandbox("bubblewrap")
    box.check()
    box.warm(NEEDS, 3)
    processes = [slot.process for pool in box.pools.values() for slot in pool.idle]
    assert len(processes) == 3
    box.close()
    assert all(p.wait(timeout=10) is not None for p in processes)
    assert not box.work_root.exists()


def test_a_lost_supervisor_is_an_infra_error_and_the_sandbox_is_replaced(one_slot):
    with one_slot.workspace(NEEDS) as space:
        os.killpg(space.slot.process.pid, 9)  # from the host: the candidate cannot
        space.slot.process.wait(timeout=10)
        result = space.run(["python3", "-c", "print(1)"], LIMITS, {})
        assert result.infra_error and "bubblewrap sandbox" in result.infra_error
        lost = space.slot
    after, fresh = slot_of(one_slot, "print('ok')")
    assert fresh is not lost and after.stdout.strip() == "ok"


def test_a_cpu_limit_kill_is_a_timeout_and_a_file_size_kill_an_output_limit(sandbox):
    # Killed by SIGXCPU before the wall clock runs out: bubblewrap reports it as status 128 + n.
    with sandbox.workspace(NEEDS) as space:
        busy = space.run(["sh", "-c", "while :; do :; done"], Limits(wall_seconds=20, cpu_seconds=1), {})
        assert busy.timed_out and busy.wall_seconds < 15
        big = space.run(["dd", "if=/dev/zero", "of=big", "bs=1M", "count=64"], Limits(max_file_mb=4), {})
        assert big.file_size_exceeded


def test_a_fifo_in_place_of_the_results_file_does_not_hang_the_harness(sandbox):
    with sandbox.workspace(NEEDS) as space:
        space.run(["mkfifo", "results.jsonl"], LIMITS, {})
        assert space.read("results.jsonl", 1024) is None


def test_a_runtime_command_missing_from_the_system_is_an_infra_error(sandbox):
    with sandbox.workspace(NEEDS) as space:
        result = space.run(["no-such-compiler-xyz", "main.c"], LIMITS, {})
        assert result.infra_error and "not found" in result.infra_error
