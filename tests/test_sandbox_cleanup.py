"""What a candidate leaves behind is removed, however it is shaped, and cleaning up never stops
a run: deep trees in the work dir and scratch folders, a sandbox retired with one inside, and a
removal that fails at close."""

import json
import logging
import os
import subprocess
import tempfile
import time
from pathlib import Path

import pytest
from typer.testing import CliRunner

from harness.cli import app
from harness.vocabulary import Limits, RuntimeSandboxNeeds
from harness.sandbox import SandboxUnavailable, make_sandbox

NEEDS = RuntimeSandboxNeeds("python")
LIMITS = Limits(wall_seconds=30, cpu_seconds=30, memory_mb=512)
LEVELS = 3000
# 3,000 levels holding about 90 MB. Python's shutil.rmtree (3.11) recurses once per level and
# gives up with RecursionError past about a thousand (sys.getrecursionlimit() is 1000 by default).
DEEP_TREE_CODE = """
import os, sys
os.chdir(sys.argv[1] if len(sys.argv) > 1 else '.')
os.mkdir('deep'); os.chdir('deep')
blob = b'x' * int(sys.argv[2] if len(sys.argv) > 2 else 30000)
for _ in range(%d):
    os.mkdir('d'); os.chdir('d')
    with open('f', 'wb') as handle:
        handle.write(blob)
os.chmod('.', 0o500)  # and a folder its owner may not write into, at the bottom
print('built')
""" % LEVELS


@pytest.fixture
def shm_root():
    """A parent for the sandbox's work root that this test alone uses (so what is left in it is
    this test's), searchable by the sandbox user like /dev/shm itself."""
    base = "/dev/shm" if os.access("/dev/shm", os.W_OK) else None
    root = Path(tempfile.mkdtemp(prefix="assay-cleanup-test-", dir=base))
    os.chmod(root, 0o711)
    yield root
    subprocess.run(["rm", "-rf", "--one-file-system", str(root)], check=False)  # whatever a failed test left


def open_backend(name: str, root: Path | None = None):
    """A backend ready for Python candidates (NEEDS), or a skip saying why it cannot be."""
    box = make_sandbox(name, root)
    try:
        box.check()
        if name == "docker":
            python_image_for_tests(box)
    except SandboxUnavailable as exc:
        box.close()
        pytest.skip(f"{name} backend unavailable here: {exc}")
    return box


def python_image_for_tests(box) -> None:
    """Sandbox tests need only a python3 in the container: when the python runtime's own image
    is not built for its current files (someone is editing them), any built assay-python image
    serves, and the pool for NEEDS is made from it."""
    try:
        box.pool_for(NEEDS)
        return
    except SandboxUnavailable:
        images = [tag for image in box.client.images.list("assay-python") for tag in image.tags
                  if not tag.endswith("-toolchain")]
        if not images:
            raise
    from harness.sandbox.supervised import WarmPool

    image = sorted(images)[0]
    box.images[NEEDS.name] = {"tag": image}
    box.pools[NEEDS.name] = WarmPool(box, lambda: box.start_box(image, NEEDS.name))


@pytest.fixture(params=["bubblewrap", "docker", "none"])
def backend(request, shm_root):
    box = open_backend(request.param, shm_root)
    yield box
    box.close()


def run_python(box, code: str, *args: str):
    with box.workspace(NEEDS) as space:
        space.write("probe.py", code)
        result = space.run(["python3", "-I", "probe.py", *args], LIMITS, {})
        return result, space


def files_under(root: Path) -> list[str]:
    return sorted(str(p) for p in root.rglob("*"))


def served_by(space):
    """Which warm sandbox served a workspace (None for the bare backend)."""
    if hasattr(space, "slot"):
        return space.slot
    if hasattr(space, "box"):
        return space.box.id
    return None


def test_a_tree_thousands_of_levels_deep_is_removed_and_the_sandbox_serves_on(backend, shm_root):
    built, first = run_python(backend, DEEP_TREE_CODE)
    assert built.exit_code == 0 and built.stdout.strip() == "built", built.stderr[-2000:]
    look, second = run_python(backend, "import os; print(sorted(os.listdir('.')))")
    assert look.stdout.strip() == "['probe.py']", look.stdout + look.stderr
    # A warm sandbox emptied it and serves on: nothing about the tree is a reason to retire it.
    assert served_by(second) == served_by(first)
    backend.close()  # must not raise
    assert files_under(shm_root) == []
    assert getattr(backend, "cleanup_problems", []) == []


@pytest.mark.parametrize("scratch", ["/tmp", "/dev/shm"])
def test_a_deep_tree_in_a_scratch_folder_is_gone_by_the_next_step(backend, scratch):
    if backend.name == "none":
        pytest.skip("the bare backend has no scratch folders of its own")
    # Smaller files (15 MB): Docker's /tmp and /dev/shm hold 64 MB; the depth is what matters.
    built, first = run_python(backend, DEEP_TREE_CODE, scratch, "5000")
    assert built.exit_code == 0, built.stderr[-2000:]
    look, second = run_python(backend, f"import os; print(os.listdir({scratch!r}))")
    assert look.stdout.strip() == "[]", look.stdout + look.stderr
    assert served_by(second) == served_by(first)


def test_a_retired_sandbox_holding_a_deep_tree_leaves_nothing_on_the_host(shm_root):
    # A process outliving the step retires the sandbox before its supervisor empties /work: the
    # host removes the folder behind it, tree and all.
    box = open_backend("bubblewrap", shm_root)
    try:
        code = DEEP_TREE_CODE + "import subprocess\nsubprocess.Popen(['sleep', '30'], start_new_session=True)\n"
        built, first = run_python(box, code)
        assert built.exit_code == 0, built.stderr[-2000:]
        assert built.extra.get("processes_left_running")
        after, second = run_python(box, "print('ok')")
        assert second.slot is not first.slot and after.stdout.strip() == "ok"
        first.slot.process.wait(timeout=30)
    finally:
        box.close()
    assert files_under(shm_root) == []
    assert box.cleanup_problems == []


def test_a_retired_sandbox_leaves_no_orphan_and_no_cgroup(shm_root):
    # The supervisor (the sandbox's pid 1) is ended before bubblewrap, which reaps it: killed the
    # other way round, it became a zombie of the host's init, and its cgroup, busy until init
    # reaped it (seconds here), was left behind.
    from harness.sandbox.supervised_local import children as _children

    box = open_backend("bubblewrap", shm_root)
    try:
        if box.cgroups is None:
            pytest.skip("no writable cgroup hierarchy here")
        with box.workspace(NEEDS) as space:
            slot = space.slot
            supervisor = _children(slot.process.pid)
            space.write("probe.py", "import subprocess\nsubprocess.Popen(['sleep', '30'], start_new_session=True)\n")
            space.run(["python3", "-I", "probe.py"], LIMITS, {})
        assert slot.spoiled and len(supervisor) == 1
        slot.process.wait(timeout=10)
        assert not os.path.exists(f"/proc/{supervisor[0]}"), "the supervisor outlived bubblewrap unreaped"
        deadline = time.monotonic() + 15
        while any(d.exists() for d in slot.cgroup.dirs) and time.monotonic() < deadline:
            time.sleep(0.05)
        assert [str(d) for d in slot.cgroup.dirs if d.exists()] == []
    finally:
        box.close()
    assert box.cleanup_problems == []


@pytest.mark.parametrize("name", ["bubblewrap", "none"])
def test_close_never_raises_when_a_folder_cannot_be_removed(name, shm_root, monkeypatch, caplog):
    box = open_backend(name, shm_root)
    run_python(box, "print(1)")

    def refuse(path):
        raise OSError(f"refused by the test: {path}")

    import harness.sandbox.local as local

    real = local.remove_tree
    monkeypatch.setattr(local, "remove_tree", refuse)
    with caplog.at_level(logging.WARNING, logger="assay.sandbox"):
        box.close()  # logged and noted, not raised
    assert any("refused by the test" in problem for problem in box.cleanup_problems)
    assert "refused by the test" in caplog.text
    real(str(box.work_root))


def test_docker_close_never_raises_when_containers_cannot_be_removed(monkeypatch, caplog):
    import harness.sandbox.docker as docker_backend

    box = open_backend("docker")
    run_python(box, "print(1)")
    real = docker_backend.remove_containers

    def refuse(*args, **kwargs):
        raise RuntimeError("refused by the test")

    monkeypatch.setattr(docker_backend, "remove_containers", refuse)
    with caplog.at_level(logging.WARNING, logger="assay.sandbox"):
        box.close()  # logged, not raised
    assert "could not remove this run's containers" in caplog.text and "refused by the test" in caplog.text
    real(box.client, run_id=box.run_id)


def test_assay_score_survives_a_deep_tree_and_leaves_nothing(shm_root, tiny_set, tmp_path, monkeypatch):
    # The candidate passes, so nothing retires its sandbox early: the supervisor empties /work
    # between candidates and the whole work root goes at close.
    import harness.sandbox.local as local

    monkeypatch.setattr(local, "default_work_root", lambda: str(shm_root))
    completion = (
        "    import os\n"
        "    if not os.path.exists('/work/deep'):\n"
        "        here = os.getcwd()\n"
        "        os.mkdir('/work/deep'); os.chdir('/work/deep')\n"
        f"        for _ in range({LEVELS}):\n"
        "            os.mkdir('d'); os.chdir('d')\n"
        "            with open('f', 'wb') as handle:\n"
        "                handle.write(b'x' * 30000)\n"
        "        os.chdir(here)\n"
        "    return a + b\n"
    )
    dump = tmp_path / "dump.jsonl"
    rows = [{"problem": "add_pair", "language": "python", "sample": i,
             "completion": f"    sample_marker = {i}\n" + completion} for i in range(2)]  # two distinct programs
    dump.write_text("".join(json.dumps(row) + "\n" for row in rows))
    out = tmp_path / "out"
    result = CliRunner().invoke(app, ["score", str(dump), "--set", str(tiny_set), "--out", str(out), "-j", "1",
                                      "--k", "1", "--quiet", "--sandbox", "bubblewrap"])
    assert result.exception is None or isinstance(result.exception, SystemExit), repr(result.exception)
    assert result.exit_code == 0, result.output
    outcomes = [json.loads(line)["outcome"] for line in (out / "executions.jsonl").read_text().splitlines()]
    assert outcomes == ["passed", "passed"]
    assert files_under(shm_root) == []
