"""What the bubblewrap sandbox protects: host files, network, processes, identity."""

import os
import socket
import subprocess
import time

import pytest

from harness.sandbox import Limits, RuntimeSandboxNeeds

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


def test_the_work_dir_is_removed_after_the_candidate(sandbox):
    result, space = run_python(sandbox, "open('left.txt', 'w').write('x')")
    assert result.exit_code == 0
    assert not space.path.exists()


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
