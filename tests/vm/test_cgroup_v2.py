"""Limits under cgroup v2, on a host where Assay can use a v2 group (the CI's test VM booted by
tests/test_cgroup_v2_vm.py, or any v2 machine run as root or in a delegated group): memory
kills are memory_limit even with swap present, fork bombs stop at pids.max, peak memory is
reported per step in a warm sandbox, and a long series of hostile candidates leaves no group,
no process behind. Skipped elsewhere (this project's own hosts run cgroup v1)."""

import concurrent.futures as futures
import os
import shutil
import subprocess
import tempfile
import textwrap
import time
from pathlib import Path

import pytest

from harness.engine.execution import Executor
from harness.problems import load_problem_set
from harness.runtimes import load_runtime
from harness.sandbox import cgroups, hostlimits
from harness.sandbox.bubblewrap import BubblewrapSandbox
from harness.vocabulary import Limits, RuntimeSandboxNeeds, Sample
from tests.conftest import ADD_PAIR, write_set

FACTORY, WHERE = cgroups.find()
pytestmark = [
    pytest.mark.slow,
    pytest.mark.skipif(FACTORY is None or FACTORY.version != 2, reason="needs a cgroup v2 group Assay can use "
                       f"(tests/test_cgroup_v2_vm.py boots a VM with one); here: {WHERE}"),
]

PYTHON = RuntimeSandboxNeeds("python")
# Generous wall limits: the test VM emulates its CPU (TCG) and runs a few times slower than a host.
LIMITS = Limits(wall_seconds=30, cpu_seconds=30, memory_mb=64, max_processes=24, max_file_mb=16)
MiB = 2**20


@pytest.fixture
def box():
    sandbox = BubblewrapSandbox(max_runs=1000)  # retired only for what the candidates do
    sandbox.check()
    yield sandbox
    sandbox.close()


def run_python(box, code: str, limits: Limits = LIMITS):
    with box.workspace(PYTHON) as space:
        space.write("probe.py", textwrap.dedent(code))
        return space.run(["python3", "-I", "-S", "probe.py"], limits, {})


def live_group(box) -> Path:
    slots = [slot for pool in box.pools.values() for slot in pool.idle]
    assert slots and slots[0].cgroup is not None
    return slots[0].cgroup.dirs[0]


def test_each_sandbox_gets_a_v2_group_with_the_steps_limits_and_no_swap(box):
    result = run_python(box, "print('ok')")
    assert result.stdout == "ok\n"
    group = live_group(box)
    # The group's files (Documentation/admin-guide/cgroup-v2.rst, from memory): memory.max in
    # bytes, memory.swap.max, pids.max. Limits: the step's plus the supervisor's allowance.
    assert int((group / "memory.max").read_text()) == (LIMITS.memory_mb + 16) * MiB
    assert (group / "memory.swap.max").read_text().strip() == "0"
    assert int((group / "pids.max").read_text()) == LIMITS.max_processes + 2
    facts = box.describe()["enforcement"]
    assert facts["cgroup_limits"] is True and facts["cgroup"].startswith("v2: ")
    assert facts["processes"] == "cgroup v2 pids.max"
    assert facts["swap"].startswith("capped at 0")


def test_a_memory_bomb_is_killed_and_counted_even_with_swap_on_the_host(box):
    if not hostlimits.swap_in_use():
        pytest.skip("no swap on this host (the test VM adds a swap file)")
    result = run_python(box, """
        hoard = []
        while True:
            hoard.append(b'x' * (4 << 20))
    """)
    assert result.memory_exceeded, result
    assert result.signal == 9 and result.infra_error is None


def test_a_memory_bomb_candidate_is_judged_memory_limit(box, tmp_path):
    runtime = load_runtime("python")
    problems = load_problem_set(str(write_set(tmp_path / "set", {"add_pair.yaml": ADD_PAIR})))
    executor = Executor(box, problems, {"python": runtime}, limit_overrides={"wall_seconds": 30, "cpu_seconds": 30,
                                                                           "memory_mb": 64}, infra_retries=0)
    bomb = "    hoard = []\n    while True:\n        hoard.append(b'x' * (4 << 20))\n"
    verdict = executor.execute(Sample("add_pair", "python", 0, bomb, "vm", 0))
    assert verdict.outcome == "memory_limit", verdict.detail
    control = executor.execute(Sample("add_pair", "python", 0, "    return a + b\n", "vm", 1))
    assert control.outcome == "passed", control.detail


def test_a_fork_bomb_stops_at_the_process_cap_and_leaves_nothing(box):
    tag = f"assay-forkbomb-{os.getpid()}-{time.time_ns()}"
    result = run_python(box, f"""
        import os, time
        made = 0
        try:
            while True:
                if os.fork() == 0:
                    os.execvp('sleep', ['{tag}', '600'])
                made += 1
        except OSError as exc:
            print('stopped after', made, exc.errno)  # EAGAIN is 11 (asm-generic/errno-base.h)
    """)
    words = result.stdout.split()
    assert words[:2] == ["stopped", "after"] and words[3] == "11", result
    # pids.max counts every process in the group: the supervisor (and bubblewrap's own) and the
    # step's interpreter too, so fewer children than the cap were made.
    assert 0 < int(words[2]) < LIMITS.max_processes
    assert result.extra.get("processes_left_running", 0) > 0  # the supervisor found and killed them
    time.sleep(0.5)
    assert subprocess.run(["pgrep", "-f", tag], capture_output=True).stdout == b""


def test_peak_memory_is_reported_per_step_in_one_warm_sandbox(box):
    # Each step holds a bytes object of its size, every page written. The reported peak is the
    # group's, above what the supervisor held before the step, so it includes the interpreter
    # (a few MB) on top of the object; a step after a bigger one must not report the bigger one.
    limits = Limits(wall_seconds=30, cpu_seconds=30, memory_mb=160, max_processes=24)
    peaks = {}
    with box.workspace(PYTHON) as space:
        for size in (96, 24, 48):
            space.write(f"hold{size}.py", f"blob = b'x' * ({size} << 20)\nprint(len(blob))\n")
            result = space.run(["python3", "-I", "-S", f"hold{size}.py"], limits, {})
            assert result.stdout == f"{size * MiB}\n", result
            peaks[size] = result.extra["peak_memory_mb"]
    for size, peak in peaks.items():
        assert size <= peak < size + 24, peaks


def test_a_hundred_hostile_candidates_leave_no_group_and_no_process(tmp_path):
    """Memory bombs, fork bombs, daemons, file and output floods, kills of everything in sight
    and one plain candidate in turn, through two warm sandboxes at a time; afterwards no group of
    theirs is left under Assay's parent and no process of theirs runs. Three in ten retire their
    sandbox (so 30 groups come and go); the others must leave it fit to serve on. The hostile
    programs are one small C program (cheap to start under an emulated CPU) and, for every
    other memory bomb, Python."""
    gcc = shutil.which("gcc")
    if gcc is None:
        pytest.skip("gcc is needed to build the hostile program")
    tag = f"assay-hostile-{os.getpid()}-{time.time_ns()}"
    folder = Path(tempfile.mkdtemp(prefix="assay-hostile-", dir="/var/tmp"))
    os.chmod(folder, 0o755)
    source = folder / "hostile.c"
    source.write_text(HOSTILE_C.replace("TAG", tag))
    subprocess.run([gcc, "-O1", "-o", str(folder / "hostile"), str(source)], check=True)
    needs = RuntimeSandboxNeeds("hostile", ro_binds=(str(folder),))
    limits = Limits(wall_seconds=20, cpu_seconds=20, memory_mb=32, max_processes=16, max_file_mb=8,
                    max_output_kb=64)
    modes = ["memory", "fork", "daemon", "files", "kill", "flood", "files", "kill", "flood", "benign"]

    # A parent group of the test's own, so that what it finds there afterwards is this test's.
    parent = FACTORY.parents[0] / f"hostile-{os.getpid()}"
    parent.mkdir()
    (parent / "cgroup.subtree_control").write_text("+memory +pids")
    box = BubblewrapSandbox(max_runs=1000)
    box.cgroups = cgroups.CgroupFactory(2, (parent,))
    box.check()
    groups = []
    real_start = box.start_slot

    def start_slot(wanted):
        slot = real_start(wanted)
        if slot.cgroup is not None:
            groups.append(slot.cgroup)
        return slot

    box.start_slot = start_slot

    def candidate(index: int):
        mode = modes[index % len(modes)]
        with box.workspace(needs) as space:
            if mode == "memory" and index % 20 == 0:
                space.write("bomb.py", "hoard = []\nwhile True:\n    hoard.append(b'x' * (2 << 20))\n")
                return mode, space.run(["python3", "-I", "-S", "bomb.py"], limits, {})
            return mode, space.run([str(folder / "hostile"), mode], limits, {})

    started = time.monotonic()
    try:
        with futures.ThreadPoolExecutor(2) as pool:
            outcomes = list(pool.map(candidate, range(100)))
    finally:
        box.close()
    print(f"100 hostile candidates in {time.monotonic() - started:.0f}s, {len(groups)} sandboxes")

    assert [(mode, r.infra_error) for mode, r in outcomes if r.infra_error] == []
    for mode, result in outcomes:
        if mode == "memory":
            assert result.memory_exceeded, result
        elif mode == "flood":
            assert result.output_exceeded and not result.timed_out, result
        else:
            assert result.exit_code == 0 and not result.timed_out, (mode, result)
    assert box.cleanup_problems == []
    assert len(groups) >= 30  # every memory bomb, fork bomb and daemon retires its sandbox
    assert [str(d) for group in groups for d in group.dirs if d.exists()] == []
    assert [p.name for p in parent.iterdir() if p.is_dir()] == []
    parent.rmdir()
    time.sleep(0.5)
    assert subprocess.run(["pgrep", "-f", tag], capture_output=True).stdout == b""
    shutil.rmtree(folder)


# argv[1] picks the attack. Every process it leaves carries TAG in its command line (argv[0]).
HOSTILE_C = r"""
#include <errno.h>
#include <fcntl.h>
#include <signal.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include <unistd.h>

static void linger(void) {
    execlp("sleep", "TAG", "600", (char *)NULL);
    _exit(1);
}

int main(int argc, char **argv) {
    const char *mode = argc > 1 ? argv[1] : "benign";
    if (!strcmp(mode, "memory")) {          /* until the group's OOM killer ends it */
        for (;;) {
            char *block = malloc(1 << 20);
            if (block) memset(block, 1, 1 << 20);
        }
    }
    if (!strcmp(mode, "fork")) {            /* until pids.max refuses */
        int made = 0;
        for (;;) {
            pid_t pid = fork();
            if (pid == 0) linger();
            if (pid < 0) break;
            made++;
        }
        printf("forked %d, then errno %d\n", made, errno);
        return 0;
    }
    if (!strcmp(mode, "daemon")) {          /* a session of its own, reparented to the supervisor */
        if (fork() == 0) {
            setsid();
            if (fork() == 0) linger();
            _exit(0);
        }
        printf("daemon\n");
        return 0;
    }
    if (!strcmp(mode, "kill")) {            /* every process it can signal: none but its own */
        printf("kill: %d\n", kill(-1, SIGKILL));
        return 0;
    }
    if (!strcmp(mode, "flood")) {           /* far more output than the step may keep */
        static char line[4096];
        memset(line, 'y', sizeof line - 1);
        line[sizeof line - 1] = '\n';
        for (int i = 0; i < 1024; i++) fwrite(line, 1, sizeof line, stdout);
        return 0;
    }
    if (!strcmp(mode, "files")) {           /* files in every writable place */
        static char block[1 << 16];
        const char *paths[] = {"/tmp/TAG", "/dev/shm/TAG", "/work/TAG"};
        memset(block, 'x', sizeof block);
        for (int i = 0; i < 3; i++) {
            int fd = open(paths[i], O_CREAT | O_WRONLY, 0600);
            for (int j = 0; fd >= 0 && j < 32; j++) write(fd, block, sizeof block);
            if (fd >= 0) close(fd);
        }
        printf("files\n");
        return 0;
    }
    printf("ok\n");
    return 0;
}
"""
