"""``assay sandbox doctor`` says which limits are enforced by what on this host, the manifest
records it, ``assay report`` marks a run whose memory limit was only an rlimit, and
``assay score --require-cgroups`` refuses a sandbox without cgroup limits. The facts are checked
against the kernel's own tables (/proc/self/mounts, the cgroup files)."""

import json
import subprocess
import sys
from pathlib import Path

import pytest

from harness.analysis.report import limit_warnings
from harness.sandbox import cgroups, hostlimits, make_sandbox

ASSAY = [sys.executable, "-m", "harness"]


def assay(*args) -> subprocess.CompletedProcess:
    return subprocess.run(ASSAY + [str(a) for a in args], capture_output=True, text=True, timeout=300)


def mounted_cgroup_version() -> int | None:
    """From the kernel's mount table (proc(5): /proc/self/mounts): cgroup2 at /sys/fs/cgroup is
    v2; a v1 memory hierarchy below it is v1."""
    mounts = [line.split() for line in Path("/proc/self/mounts").read_text().splitlines()]
    if any(m[1] == "/sys/fs/cgroup" and m[2] == "cgroup2" for m in mounts):
        return 2
    if any(m[2] == "cgroup" and "memory" in m[3].split(",") for m in mounts):
        return 1
    return None


@pytest.fixture(scope="module")
def report():
    return hostlimits.doctor()  # what `assay sandbox doctor --json` prints (tests/test_rootless.py runs it)


def test_doctor_names_the_cgroup_version_the_kernel_mounted(report):
    assert report["cgroup"]["version"] == mounted_cgroup_version()
    factory, where = cgroups.find()
    assert report["cgroup"]["usable"] is (factory is not None)
    assert report["limits"]["cgroup_limits"] is (factory is not None)


def test_doctor_reports_swap_and_peak_as_the_cgroup_files_allow(report):
    factory, _ = cgroups.find()
    if factory is None:
        assert report["limits"]["memory"].startswith("RLIMIT_DATA")
        return
    group = factory.parents[0]
    # Swap can be capped only where the kernel accounts it: memory.swap.max (v2) or
    # memory.memsw.limit_in_bytes (v1), Documentation/admin-guide/cgroup-v{1,2} (from memory).
    accounted = (group / ("memory.swap.max" if factory.version == 2 else "memory.memsw.limit_in_bytes")).exists()
    assert report["limits"]["swap"].startswith("capped at 0") is accounted
    expected = "memory.max_usage_in_bytes" if factory.version == 1 else "memory."
    assert report["limits"]["peak_memory"].startswith(expected)


def test_doctor_says_whether_seccomp_filters_and_user_namespaces_are_there(report):
    # The kernel lists the seccomp return actions it supports only with filter support (seccomp(2)).
    assert report["seccomp"]["available"] is Path("/proc/sys/kernel/seccomp/actions_avail").exists()
    assert report["user_namespaces"]["available"] is True or report["user_namespaces"]["detail"]
    assert set(report["bubblewrap"]) == {"available", "detail"}


def test_doctor_prints_a_table_with_every_check():
    done = assay("sandbox", "doctor")
    assert done.returncode == 0, done.stderr
    for row in ("cgroup hierarchy", "memory limit", "process limit", "swap", "per-step peak", "user namespaces",
                "seccomp filter", "bubblewrap"):
        assert row in done.stdout


def test_require_cgroups_refuses_a_sandbox_without_a_cgroup():
    box = make_sandbox("none")
    try:
        box.cgroups = None  # as on a host where no cgroup is writable
        assert hostlimits.refusal(box).startswith("no cgroup limits on this host, only rlimits")
        assert box.describe()["enforcement"]["cgroup_limits"] is False
    finally:
        box.close()


def test_require_cgroups_lets_a_run_with_cgroup_limits_start(tmp_path, tiny_set):
    if cgroups.detect() is None:
        pytest.skip("no writable cgroup here: tests/test_rootless.py covers the refusal end to end")
    dump = tmp_path / "dump.jsonl"
    row = {"problem": "add_pair", "language": "python", "completion": "    return a + b\n"}
    dump.write_text(json.dumps(row) + "\n")
    out = tmp_path / "out"
    done = assay("score", dump, "--set", tiny_set, "--out", out, "--require-cgroups", "-q")
    assert done.returncode == 0, done.stderr
    manifest = json.loads((out / "manifest.json").read_text())
    assert manifest["sandbox"]["enforcement"]["cgroup_limits"] is True


def test_report_marks_runs_whose_memory_limit_was_an_rlimit():
    degraded = {"sandbox": {"enforcement": {"cgroup_limits": False}}}
    assert "only an address-space limit" in limit_warnings(degraded)[0]
    assert limit_warnings({"sandbox": {"enforcement": {"cgroup_limits": True}}}) == []
    # Runs recorded before the manifest carried "enforcement": the memory description says it.
    older = {"sandbox": {"memory_limit": "rlimits per step (RLIMIT_DATA for memory, RLIMIT_NPROC for processes)"}}
    assert limit_warnings(older) != []
    assert limit_warnings({"sandbox": {"memory_limit": "cgroup v1 (/sys/fs/cgroup/memory/assay)"}}) == []
    assert limit_warnings({"sandbox": {"backend": "docker"}}) == [] and limit_warnings(None) == []
