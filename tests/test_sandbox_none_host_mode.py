"""``--sandbox none`` runs the same step supervisor as the sandboxes, as a plain host process:
its sweep ends the candidate's processes and nothing else on the host, its scratch folder is a
private one (nothing lands in the host's /tmp or /dev/shm), and it scores every runtime's
conformance checks as the sandboxes do. Each test runs under both of its ways of enforcing
memory and processes: its own cgroup (where one is writable) and rlimits."""

import glob
import os
import subprocess
import time
from pathlib import Path

import pytest

from harness.engine.checks import CONFORMANCE_SET, check_runtime
from harness.problems import load_problem_set
from harness.runtimes import available_runtimes, load_runtime
from harness.sandbox import make_sandbox
from harness.vocabulary import Limits, RuntimeSandboxNeeds
from tests.test_sandbox_cleanup import files_under, shm_root  # noqa: F401 - a fixture

NEEDS = RuntimeSandboxNeeds("python")
LIMITS = Limits(wall_seconds=20, cpu_seconds=20)


@pytest.fixture(params=["cgroup", "rlimits"])
def bare(request, shm_root):  # noqa: F811 - the fixture imported above
    box = make_sandbox("none", shm_root)
    if request.param == "cgroup" and box.cgroups is None:
        box.close()
        pytest.skip("no writable cgroup hierarchy here")
    if request.param == "rlimits":
        box.cgroups = None  # as on a host without a writable cgroup
    box.check()
    yield box
    box.close()


def run_python(box, code: str, limits: Limits = LIMITS):
    with box.workspace(NEEDS) as space:
        space.write("probe.py", code)
        return space.run(["python3", "-I", "probe.py"], limits, {}), space


def alive(pid: int) -> bool:
    """Running (a zombie, finished and waiting to be reaped, is not)."""
    try:
        state = Path(f"/proc/{pid}/stat").read_text().rsplit(")", 1)[1].split()[0]
    except (OSError, IndexError):
        return False
    return state not in ("Z", "X")


def test_the_sweep_ends_the_candidates_processes_and_spares_the_hosts(bare):
    tag = f"assay-bare-{os.getpid()}-{time.time_ns()}"
    # A process of the same user outside the candidate's tree, started before the candidate and
    # a sibling of its supervisor: the sweep of a pid-1 supervisor ("every process but me") and
    # a kill of a reused group number would both reach it.
    outside = subprocess.Popen(["sleep", "300"], start_new_session=True)
    try:
        code = (
            "import os, subprocess\n"
            f"child = subprocess.Popen(['bash', '-c', 'exec -a {tag}-child sleep 60'], start_new_session=True)\n"
            "middle = os.fork()\n"  # a daemon: double fork, new session, the middle process exits
            "if middle == 0:\n"
            "    os.setsid()\n"
            "    if os.fork() == 0:\n"
            f"        os.execvp('bash', ['bash', '-c', 'exec -a {tag}-daemon sleep 60'])\n"
            "    os._exit(0)\n"
            "os.waitpid(middle, 0)\n"
            "print(child.pid)\n"
        )
        result, space = run_python(bare, code)
        assert result.exit_code == 0, result.stderr
        child = int(result.stdout.split()[0])
        # Both were running when the step ended (the step's own process had exited).
        assert result.extra.get("processes_left_running") == 2, result.extra
        assert space.slot.spoiled, "a sandbox whose step left processes is retired"
        time.sleep(0.2)
        assert not alive(child)
        assert subprocess.run(["pgrep", "-f", tag], capture_output=True, text=True).stdout.split() == []
        assert outside.poll() is None, "a host process outside the candidate's tree was killed"
        # The next candidate (a fresh supervisor) and closing the backend spare it as well.
        again, _ = run_python(bare, "print('ok')")
        assert again.stdout.strip() == "ok"
        bare.close()
        assert outside.poll() is None, "closing the bare backend killed a host process"
    finally:
        outside.kill()
        outside.wait()


def test_a_candidate_leaves_nothing_in_the_hosts_tmp_and_shm(bare, shm_root):  # noqa: F811
    tag = f"assay-bare-tmp-{os.getpid()}-{time.time_ns()}"
    code = (
        "import os, tempfile\n"
        f"fd, name = tempfile.mkstemp(prefix='{tag}-file-'); os.write(fd, b'x' * 4096)\n"
        f"folder = tempfile.mkdtemp(prefix='{tag}-dir-')\n"
        "open(os.path.join(folder, 'inside'), 'w').write('y')\n"
        f"tempfile.NamedTemporaryFile(prefix='{tag}-named-', delete=False).write(b'z')\n"
        "print(tempfile.gettempdir())\n"
    )
    result, _ = run_python(bare, code)
    assert result.exit_code == 0, result.stderr
    scratch = result.stdout.strip()
    # Python's tempfile takes TMPDIR first (its documentation): a private folder of the backend's.
    assert scratch not in ("/tmp", "/var/tmp", "/dev/shm") and scratch.startswith(str(shm_root)), scratch
    planted = [path for folder in ("/tmp", "/var/tmp", "/dev/shm") for path in glob.glob(f"{folder}/*{tag}*")]
    assert planted == []
    # Emptied after the step, as the sandboxes' /tmp is: the next step finds nothing there.
    look, _ = run_python(bare, "import os, tempfile; print(os.listdir(tempfile.gettempdir()))")
    assert look.stdout.strip() == "[]", look.stdout + look.stderr
    bare.close()
    assert files_under(shm_root) == []
    assert bare.cleanup_problems == []


def test_a_deep_tree_in_the_scratch_folder_is_gone_by_the_next_step(bare):
    from tests.test_sandbox_cleanup import DEEP_TREE_CODE

    built, first = run_python(bare, DEEP_TREE_CODE.replace("sys.argv[1] if len(sys.argv) > 1 else '.'",
                                                           "os.environ['TMPDIR']"))
    assert built.exit_code == 0 and built.stdout.strip() == "built", built.stderr[-2000:]
    look, second = run_python(bare, "import os; print(os.listdir(os.environ['TMPDIR']))")
    assert look.stdout.strip() == "[]", look.stdout + look.stderr
    assert second.slot is first.slot  # emptied, the same supervisor serves on


def test_limits_are_the_supervisors_under_both_mechanisms(bare):
    # Limits the kernel enforces the same way everywhere (setrlimit(2)): CPU time by SIGXCPU /
    # SIGKILL, file size by SIGXFSZ (CPython ignores it and gets EFBIG, errno 27, instead).
    spin, _ = run_python(bare, "while True: pass", Limits(wall_seconds=30, cpu_seconds=1))
    assert spin.timed_out and spin.signal is not None
    big, _ = run_python(bare, "open('f', 'wb').write(b'x' * (3 << 20))", Limits(max_file_mb=1))
    assert "File too large" in big.stderr
    flood, _ = run_python(bare, "print('x' * (4 << 20))", Limits(max_output_kb=64))
    assert flood.output_exceeded
    # Memory: the cgroup kills the step and counts it; under RLIMIT_DATA the allocation fails
    # and Python raises MemoryError (its documentation: "an operation runs out of memory").
    hog, _ = run_python(bare, "blocks = []\nwhile True:\n    blocks.append(bytearray(1 << 20))\n",
                        Limits(wall_seconds=30, cpu_seconds=30, memory_mb=128))
    if bare.cgroups is not None:
        assert hog.memory_exceeded, (hog.exit_code, hog.signal, hog.stderr[-300:])
    else:
        assert not hog.memory_exceeded and "MemoryError" in hog.stderr, hog.stderr[-300:]
        assert hog.extra["peak_memory_mb"] > 64  # the judge believes the message with this peak


def test_describe_says_what_enforces_memory(bare):
    described = bare.describe()
    assert described["backend"] == "none" and described["isolation"].startswith("none")
    expected = "cgroup v" if bare.cgroups is not None else "RLIMIT_DATA"
    assert expected in described["memory_limit"]


INSTALLED = [name for name in available_runtimes() if load_runtime(name).toolchain_version() is not None]
# Under rlimits nothing kills a step for memory: RLIMIT_DATA makes its allocation fail, and the
# verdict rests on the runtime's out-of-memory message (the judge's error_patterns, read from the
# end of stderr). Where a runtime declares no such message (Go, Rust), or prints it above a long
# native stack (Node's "FATAL ERROR: ... out of memory" and the V8 frames after it), a memory
# blow-up reads as a runtime_error. Measured here; the cgroup mechanism scores them all.
RLIMIT_DIFFERENCES = {
    "go": {"memory blow-up"},
    "rust": {"memory blow-up"},
    "javascript": {"memory blow-up outside the JavaScript heap", "memory blow-up on the JavaScript heap"},
    "typescript": {"memory blow-up"},
}


# Every runtime's checks run under bubblewrap (tests/test_runtimes.py); here, what is particular to
# `none` is its limits mechanism, scored on runtimes of each kind of process: a plain interpreter,
# a native program, the JVM and Go's runtime under a cgroup; under rlimits the runtimes whose
# VMs reserve address space at start (RLIMIT_AS killed these: V8, the JVM, Go's runtime; Mono
# and TypeScript's Node behave as the JVM and JavaScript's). This keeps the suite's time in bounds.
CGROUP_SUBJECTS = {"python", "cpp", "java", "go"}
RLIMIT_SUBJECTS = {"javascript", "java", "go"}


@pytest.mark.slow
@pytest.mark.parametrize("name", INSTALLED)
def test_none_scores_a_runtimes_checks_as_the_sandboxes_do(name, bare):
    # The same checks and limits as tests/test_runtimes.py runs under bubblewrap, where every
    # check gets its stated verdict: here too under a cgroup, and under rlimits all but the
    # memory blow-ups listed above, which must then be runtime errors.
    subjects = CGROUP_SUBJECTS if bare.cgroups is not None else RLIMIT_SUBJECTS
    if name not in subjects:
        pytest.skip(f"this mechanism is scored on {', '.join(sorted(subjects))}; "
                    f"tests/test_runtimes.py scores {name}'s checks under bubblewrap")
    rows = check_runtime(load_runtime(name), load_problem_set(CONFORMANCE_SET), bare, jobs=2,
                         limit_overrides={"wall_seconds": 8, "cpu_seconds": 8})
    failed = {r["check"]: f"{r['check']}: got {r['outcome']}, expected {r['expect']}: {r['detail'][:200]}"
              for r in rows if not r["ok"]}
    expected = set() if bare.cgroups is not None else RLIMIT_DIFFERENCES.get(name, set())
    assert set(failed) == expected, "\n".join(failed.values()) or f"now scored as expected: {sorted(expected)}"
    assert all(r["outcome"] == "runtime_error" for r in rows if r["check"] in expected)
    assert {"passed", "wrong_answer", "runtime_error", "timeout", "memory_limit"} <= {r["expect"] for r in rows}
