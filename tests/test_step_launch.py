"""How the step supervisor starts a step, under every backend that runs it (bubblewrap, and
``--sandbox none`` with a cgroup and with rlimits): the step's process has its rlimits, the
memory killer's preference and default signal dispositions before its first instruction, and
sees its argv and environment exactly as asked, whether the supervisor starts it through its
shell launcher (vfork) or its fallback (fork with a ``preexec_fn``). A step that cannot start
is an infrastructure error either way, and a program cannot pass its own failure off as one.

The step's state is read from the kernel's own account of the process, as proc(5) documents
it: /proc/<pid>/limits (soft and hard limit per resource), /proc/<pid>/oom_score_adj and the
SigIgn/SigBlk masks of /proc/<pid>/status (hexadecimal, one bit per signal)."""

import resource

import pytest

from harness.sandbox import make_sandbox
from harness.sandbox.step_supervisor import ShellLauncher, step_rlimits
from harness.vocabulary import Limits, RuntimeSandboxNeeds
from tests.test_sandbox_cleanup import shm_root  # noqa: F401 - a fixture

NEEDS = RuntimeSandboxNeeds("python")
LIMITS = Limits(wall_seconds=20, cpu_seconds=3, max_file_mb=5, memory_mb=300, max_processes=40)
MiB = 1024 * 1024
# A PWD of the step's own is one of the things the launcher leaves to the fallback (the shell
# would set its own), so asking for one exercises the fallback through the same backend.
PATHS = {"launcher": {}, "fallback": {"PWD": "/assay-fallback"}}


@pytest.fixture(params=["bubblewrap", "none-cgroup", "none-rlimits"])
def box(request, sandbox, shm_root):  # noqa: F811 - the fixture imported above
    if request.param == "bubblewrap":
        yield sandbox
        return
    bare = make_sandbox("none", shm_root)
    if request.param == "none-cgroup" and bare.cgroups is None:
        bare.close()
        pytest.skip("no writable cgroup hierarchy here")
    if request.param == "none-rlimits":
        bare.cgroups = None  # as on a host without a writable cgroup: memory and processes by rlimits
    bare.check()
    yield bare
    bare.close()


def run_steps(box, commands, env=None, files=None):
    with box.workspace(NEEDS) as space:
        for name, text in (files or {}).items():
            space.write(name, text)
        return [space.run(command, LIMITS, dict(env or {})) for command in commands]


def limits_table(text: str) -> dict[str, tuple[str, str]]:
    """``Max cpu time  3  4  seconds`` -> {"Max cpu time": ("3", "4")} (proc(5), /proc/<pid>/limits)."""
    table = {}
    for line in text.splitlines()[1:]:
        title, fields = line[:26].strip(), line[26:].split()
        table[title] = (fields[0], fields[1])
    return table


@pytest.mark.parametrize("path", PATHS)
def test_a_step_starts_with_its_limits_the_killers_preference_and_default_signals(box, path):
    limits, adj, status = run_steps(box, [["cat", "/proc/self/limits"], ["cat", "/proc/self/oom_score_adj"],
                                          ["cat", "/proc/self/status"]], PATHS[path])
    for step in (limits, adj, status):
        assert step.exit_code == 0 and step.infra_error is None, (step.stderr, step.infra_error)
    table = limits_table(limits.stdout)
    assert table["Max cpu time"] == ("3", "4")  # soft at the limit (SIGXCPU), hard a second on (SIGKILL)
    assert table["Max file size"] == (str(5 * MiB),) * 2
    assert table["Max core file size"] == ("0", "0")
    if getattr(box, "cgroups", "none") is None:  # no cgroup: memory and processes by rlimits
        assert table["Max data size"] == (str(300 * MiB),) * 2
        assert table["Max processes"] == ("40", "40")
    assert adj.stdout.strip() == "1000"
    masks = dict(line.split(":\t", 1) for line in status.stdout.splitlines() if line.startswith("Sig"))
    assert int(masks["SigIgn"], 16) == 0, "no signal may start ignored: " + masks["SigIgn"]
    assert int(masks["SigBlk"], 16) == 0, "no signal may start blocked: " + masks["SigBlk"]


@pytest.mark.parametrize("path", PATHS)
def test_a_step_sees_its_argv_and_environment_exactly(box, path):
    asked = {"ASSAY_PROBE": "a b  'c' $HOME \\n", **PATHS[path]}
    argv, env = run_steps(box, [["cat", "/proc/self/cmdline", "--", "two words", "$0", ""], ["env", "-0"]], asked)
    assert argv.stdout == "cat\0/proc/self/cmdline\0--\0two words\0$0\0\0"
    seen = dict(item.split("=", 1) for item in env.stdout.split("\0") if item)
    assert seen["ASSAY_PROBE"] == asked["ASSAY_PROBE"]
    assert seen.get("PWD") == asked.get("PWD"), "the shell's own PWD must not reach the step"
    assert not any(key.startswith(("OLDPWD", "SHLVL", "_")) for key in seen), sorted(seen)


def test_both_ways_of_starting_give_one_environment_but_the_asked_pwd(box):
    launched, = run_steps(box, [["env", "-0"]])
    fallback, = run_steps(box, [["env", "-0"]], PATHS["fallback"])
    as_set = lambda text: {item for item in text.split("\0") if item and not item.startswith(("HOME=", "TMPDIR="))}  # noqa: E731 - per-workspace folders under none
    assert as_set(launched.stdout) == as_set(fallback.stdout) - {"PWD=/assay-fallback"}


@pytest.mark.parametrize("path", PATHS)
def test_a_program_that_cannot_start_is_an_infrastructure_error(box, path):
    files = {"orphan.sh": "#!/nonexistent/interpreter\necho never\n", "plain.txt": "echo never\n"}
    _, orphan, plain, missing = run_steps(box, [["chmod", "+x", "orphan.sh", "plain.txt"], ["./orphan.sh"],
                                                ["./plain.txt"], ["no-such-program-anywhere"]], PATHS[path], files)
    assert orphan.infra_error and orphan.infra_error.startswith("cannot start ./orphan.sh"), orphan
    # A file with neither an ELF header nor "#!" is refused by exec (ENOEXEC), never run as a script.
    assert plain.infra_error and "Exec format error" in plain.infra_error, plain
    assert "never" not in plain.stdout
    assert missing.infra_error and "no-such-program-anywhere" in missing.infra_error, missing


def test_steps_start_through_the_shell_launcher_where_the_shell_sets_limits_as_asked(box):
    """Else every step silently pays a fork of the supervisor: the fallback is for odd
    machines, and a POSIX /bin/sh (dash here) is not one."""
    with box.workspace(NEEDS) as space:
        assert space.slot.launcher == "/bin/sh"


def test_a_program_cannot_pass_its_own_failure_off_as_a_failure_to_start(box):
    fake = "assay-step-0123456789abcdef: 1: exec: x: not found"
    step, = run_steps(box, [["sh", "-c", f"echo '{fake}' >&2; exit 127"]])
    assert step.infra_error is None and step.exit_code == 127 and fake in step.stderr


def test_a_shell_whose_ulimit_means_otherwise_is_not_used_as_the_launcher(tmp_path):
    """bash outside POSIX mode counts ``ulimit -f`` in 1,024-byte blocks and reads ``-p`` as the
    pipe size (bash(1), "ulimit"): the probe must see that and decline it."""
    class Bash(ShellLauncher):
        SHELL = "/bin/bash"

    assert ShellLauncher.probe(str(tmp_path)) is not None
    assert Bash.probe(str(tmp_path)) is None


def test_a_limit_above_the_supervisors_own_takes_the_fallback(tmp_path):
    launcher = ShellLauncher.probe(str(tmp_path))
    rlimits = step_rlimits(LIMITS.as_dict(), False, False)
    assert launcher.command(["/bin/true"], {"PATH": "/usr/bin:/bin"}, str(tmp_path), rlimits) is not None
    launcher.hard[resource.RLIMIT_CPU] = 2  # below the step's hard CPU limit of 4 s
    assert launcher.command(["/bin/true"], {"PATH": "/usr/bin:/bin"}, str(tmp_path), rlimits) is None


def test_a_program_named_like_an_option_takes_the_fallback(tmp_path):
    """dash's exec takes no options, but other shells' may read "-x" as one of theirs."""
    program = tmp_path / "-probe"
    program.write_text("#!/bin/sh\n", encoding="utf-8")
    program.chmod(0o755)
    launcher = ShellLauncher.probe(str(tmp_path))
    rlimits = step_rlimits(LIMITS.as_dict(), False, False)
    assert launcher.command(["./-probe"], {"PATH": "/usr/bin:/bin"}, str(tmp_path), rlimits) is not None
    assert launcher.command(["-probe"], {"PATH": str(tmp_path)}, str(tmp_path), rlimits) is None
