"""``assay score`` as an unprivileged user, with bubblewrap in user namespaces: on a host where
no cgroup is writable by that user (cgroup v1 always; v2 without delegation) the limits fall back
to rlimits, and the run says so (manifest, report, doctor) or refuses to start with
--require-cgroups; in a delegated cgroup v2 group (the test VM) the same user gets real cgroup
limits. The user, ``assay-scorer``, is created here when missing (root only)."""

import json
import os
import pwd
import shutil
import subprocess
import sys
import tempfile
from pathlib import Path

import pytest

from harness.sandbox import cgroups
from tests.conftest import ADD_PAIR, ROOT, write_set

pytestmark = pytest.mark.slow

USER = "assay-scorer"
COMPLETIONS = {
    "passed": "    return a + b\n",
    "wrong_answer": "    return a - b\n",
    # Every page written: bytearray() alone could take zero pages the kernel never backs.
    "memory_limit": "    hoard = []\n    while True:\n        hoard.append(b'x' * (1 << 20))\n",
}


class Scorer:
    """Runs ``python -m harness`` as the unprivileged user, optionally in a cgroup of its own."""

    def __init__(self, uid: int, python: str, pythonpath: str, home: Path):
        self.uid, self.python, self.pythonpath, self.home = uid, python, pythonpath, home

    def assay(self, *args, cgroup: Path | None = None) -> subprocess.CompletedProcess:
        command = ["setpriv", f"--reuid={self.uid}", f"--regid={self.uid}", "--clear-groups", "--",
                   self.python, "-m", "harness", *map(str, args)]
        if cgroup is not None:  # root moves the shell into the group, then it becomes the user
            command = ["sh", "-c", 'echo $$ > "$0/cgroup.procs" && exec "$@"', str(cgroup), *command]
        env = {"PATH": "/usr/local/bin:/usr/bin:/bin", "HOME": str(self.home), "LANG": "C.UTF-8",
               "PYTHONPATH": self.pythonpath, "PYTHONDONTWRITEBYTECODE": "1", "NO_COLOR": "1"}
        return subprocess.run(command, cwd=str(self.home), env=env, capture_output=True, text=True, timeout=600)


def user_id() -> int:
    try:
        return pwd.getpwnam(USER).pw_uid
    except KeyError:
        subprocess.run(["useradd", "--system", "--no-create-home", "--shell", "/usr/sbin/nologin", USER],
                       check=True, capture_output=True)
        return pwd.getpwnam(USER).pw_uid


def reachable(uid: int, python: str, pythonpath: str) -> bool:
    probe = subprocess.run(["setpriv", f"--reuid={uid}", f"--regid={uid}", "--clear-groups", "--", python, "-c",
                            "import harness.cli, yaml, typer, numpy"], cwd="/", capture_output=True,
                           env={"PATH": "/usr/bin:/bin", "PYTHONPATH": pythonpath, "PYTHONDONTWRITEBYTECODE": "1"})
    return probe.returncode == 0


@pytest.fixture(scope="module")
def scorer(tmp_path_factory):
    if os.geteuid() != 0:
        pytest.skip("creates and becomes an unprivileged user: run as root")
    for tool in ("setpriv", "bwrap", "useradd"):
        if shutil.which(tool) is None:
            pytest.skip(f"{tool} is not installed")
    uid = user_id()
    shared = Path(tempfile.mkdtemp(prefix="assay-rootless-"))
    os.chmod(shared, 0o755)
    home = shared / "home"
    home.mkdir()
    os.chown(home, uid, uid)
    # This interpreter when the user can reach it (a system Python: CI); else the system's
    # python3 of the same version, with this installation's libraries copied where the user
    # can read them (an interpreter under /root, as on a developer's machine).
    pythonpath = os.pathsep.join([str(ROOT)] + [p for p in os.environ.get("PYTHONPATH", "").split(os.pathsep) if p])
    python = sys.executable
    if not reachable(uid, python, pythonpath):
        python = "/usr/bin/python3"
        version = subprocess.run([python, "-c", "import sys; print(sys.version_info[:2])"], capture_output=True,
                                 text=True).stdout.strip() if os.path.exists(python) else ""
        if version != str(sys.version_info[:2]):
            pytest.skip(f"the user cannot run {sys.executable}, and there is no system python3 of its version")
        subprocess.run([sys.executable, str(ROOT / ".ci" / "stage-python.py"), str(shared)], check=True)
        pythonpath = f"{ROOT}{os.pathsep}{shared / 'deps'}"
        if not reachable(uid, python, pythonpath):
            pytest.skip(f"user {USER} cannot import the harness with {python}")
    problems = write_set(shared / "set", {"add_pair.yaml": ADD_PAIR})
    dump = shared / "dump.jsonl"
    dump.write_text("".join(json.dumps({"problem": "add_pair", "language": "python", "completion": text}) + "\n"
                            for text in COMPLETIONS.values()))
    yield Scorer(uid, python, pythonpath, home), problems, dump
    shutil.rmtree(shared, ignore_errors=True)


def outcomes(out: Path) -> list[str]:
    return [json.loads(line)["outcome"] for line in (out / "executions.jsonl").read_text().splitlines()]


def test_an_unprivileged_user_scores_under_rlimits_and_every_output_says_so(scorer):
    user, problems, dump = scorer
    doctor = user.assay("sandbox", "doctor", "--json")
    assert doctor.returncode == 0, doctor.stderr
    report = json.loads(doctor.stdout)
    if report["cgroup"]["usable"]:
        pytest.skip(f"{USER} can use a cgroup here: {report['cgroup']['where']}")
    assert report["uid"] == user.uid
    assert report["user_namespaces"]["available"] and report["bubblewrap"]["available"], report
    assert report["limits"]["cgroup_limits"] is False and report["limits"]["memory"].startswith("RLIMIT_DATA")
    assert any("no writable cgroup" in warning for warning in report["warnings"])

    out = user.home / "rlimits"
    done = user.assay("score", dump, "--set", problems, "--out", out, "--memory", "64", "-q")
    assert done.returncode == 0, done.stderr
    assert sorted(outcomes(out)) == sorted(COMPLETIONS)
    sandbox = json.loads((out / "manifest.json").read_text())["sandbox"]
    assert sandbox["user"] == "invoking user" and sandbox["enforcement"]["cgroup_limits"] is False
    shown = user.assay("report", out)
    assert shown.returncode == 0, shown.stderr
    assert "memory limit was only an address-space limit" in shown.stdout

    refused = user.assay("score", dump, "--set", problems, "--out", user.home / "refused", "--require-cgroups", "-q")
    assert refused.returncode == 2
    assert "--require-cgroups: no cgroup limits on this host" in refused.stderr
    assert not (user.home / "refused").exists()


class Delegated:
    """Fresh cgroup v2 groups delegated to the user as systemd does it (Delegate=yes): the user
    owns the group and the files that let it make and fill child groups
    (Documentation/admin-guide/cgroup-v2.rst, "Delegation"). One per command, as each
    ``systemd-run --user --scope`` makes a scope of its own: a group whose controllers were
    handed on takes no new process."""

    def __init__(self, uid: int):
        self.uid = uid
        self.made: list[Path] = []

    def __call__(self) -> Path:
        group = cgroups.CGROUP_ROOT / f"{USER}-{os.getpid()}-{len(self.made)}"
        group.mkdir()
        self.made.append(group)
        for path in (group, group / "cgroup.procs", group / "cgroup.subtree_control", group / "cgroup.threads"):
            os.chown(path, self.uid, self.uid)
        return group

    def remove(self) -> None:
        for group in self.made:
            for directory in sorted((p for p in group.rglob("*") if p.is_dir()), key=lambda p: -len(p.parts)):
                directory.rmdir()
            group.rmdir()


def test_an_unprivileged_user_in_a_delegated_v2_group_gets_cgroup_limits(scorer):
    user, problems, dump = scorer
    root = cgroups.CGROUP_ROOT
    if not (root / "cgroup.controllers").exists():
        pytest.skip("cgroup v1 here: it has no delegation to unprivileged users")
    if not {"memory", "pids"} <= set((root / "cgroup.subtree_control").read_text().split()):
        pytest.skip("the root group hands no memory and pids controllers to its children")
    delegated = Delegated(user.uid)
    try:
        doctor = user.assay("sandbox", "doctor", "--json", cgroup=delegated())
        assert doctor.returncode == 0, doctor.stderr
        report = json.loads(doctor.stdout)
        assert report["cgroup"]["usable"], report["cgroup"]
        assert report["limits"]["memory"].startswith("cgroup v2 memory.max"), report["limits"]
        assert report["limits"]["processes"] == "cgroup v2 pids.max"

        out = user.home / "delegated"
        group = delegated()
        done = user.assay("score", dump, "--set", problems, "--out", out, "--memory", "64", "--require-cgroups", "-q",
                          cgroup=group)
        assert done.returncode == 0, done.stderr
        assert sorted(outcomes(out)) == sorted(COMPLETIONS)
        enforcement = json.loads((out / "manifest.json").read_text())["sandbox"]["enforcement"]
        assert enforcement["cgroup_limits"] is True
        assert enforcement["cgroup"] == f"v2: {group / cgroups.GROUP_NAME}"
        # Assay moved itself into a leaf of the group to hand the controllers on, and every
        # sandbox's group below it is gone.
        assert (group / cgroups.LEAF_NAME).is_dir()
        assert [p.name for p in (group / cgroups.GROUP_NAME).iterdir() if p.is_dir()] == []
    finally:
        delegated.remove()
