"""A link planted where the harness is about to write a candidate's file is never followed.

In a warm sandbox the work dir outlives candidates, and the harness writes the next source file
into it (as root, when Assay runs as root). A process that survived an earlier candidate could
plant a link there, to the file itself or to a folder on the way. The write must end in an
error (an infra_error verdict) and leave the host file as it was: content and owner."""

import contextlib
import os
import stat
from pathlib import Path

import pytest

from harness.vocabulary import Sample
from harness.engine.execution import Executor
from harness.problems import load_problem_set
from harness.runtimes import load_runtime
from harness.vocabulary import Limits, RuntimeSandboxNeeds
from harness.sandbox import make_sandbox
from tests.test_sandbox_cleanup import open_backend

NEEDS = RuntimeSandboxNeeds("python")
LIMITS = Limits(wall_seconds=10, cpu_seconds=10)
NOBODY = 65534


@pytest.fixture(params=["bubblewrap", "none"])
def local_backend(request):
    box = make_sandbox(request.param)
    box.check()
    yield box
    box.close()


@pytest.fixture
def victim(tmp_path):
    """A host file and a host folder the sandbox must never write to or hand out."""
    target = tmp_path / "host-file.txt"
    target.write_text("host file")
    os.chmod(target, 0o644)
    folder = tmp_path / "host-folder"
    folder.mkdir()
    return {"file": target, "folder": folder, "file_stat": target.stat(), "folder_stat": folder.stat()}


def plant_link(where: Path, target: Path) -> None:
    """What a surviving candidate process would do: a link of its own, owned by the sandbox user."""
    os.symlink(target, where)
    if os.geteuid() == 0:
        os.lchown(where, NOBODY, NOBODY)


def assert_untouched(victim: dict) -> None:
    after = victim["file"].stat()
    assert victim["file"].read_text() == "host file"
    assert (after.st_uid, after.st_gid, stat.S_IMODE(after.st_mode)) == (
        victim["file_stat"].st_uid, victim["file_stat"].st_gid, stat.S_IMODE(victim["file_stat"].st_mode))
    assert list(victim["folder"].iterdir()) == []
    assert victim["folder"].stat().st_uid == victim["folder_stat"].st_uid


def test_a_link_in_place_of_the_source_file_is_not_followed(local_backend, victim):
    with local_backend.workspace(NEEDS) as space:
        plant_link(space.path / "main.py", victim["file"])
        with pytest.raises(OSError, match="already there"):
            space.write("main.py", "print('mine')\n")
    assert_untouched(victim)


def test_a_link_in_place_of_a_folder_on_the_way_is_not_followed(local_backend, victim):
    with local_backend.workspace(NEEDS) as space:
        plant_link(space.path / "src", victim["folder"])
        with pytest.raises(OSError):  # ELOOP or ENOTDIR from O_NOFOLLOW | O_DIRECTORY
            space.write("src/main.py", "print('mine')\n")
    assert_untouched(victim)


def test_a_link_in_place_of_the_results_file_or_its_folder_is_not_read(local_backend, victim):
    with local_backend.workspace(NEEDS) as space:
        plant_link(space.path / "results.jsonl", victim["file"])
        (victim["folder"] / "results.jsonl").write_text("host data")
        plant_link(space.path / "out", victim["folder"])
        assert space.read("results.jsonl", 1024) is None
        assert space.read("out/results.jsonl", 1024) is None
    (victim["folder"] / "results.jsonl").unlink()
    assert_untouched(victim)


def test_the_source_file_belongs_to_the_sandbox_user_and_nothing_else_changes_hands(local_backend):
    with local_backend.workspace(NEEDS) as space:
        space.write("pkg/main.py", "print('mine')\n")
        made = (space.path / "pkg" / "main.py").stat()
        expected = space.owner if space.owner is not None else os.geteuid()
        assert made.st_uid == expected and (space.path / "pkg").stat().st_uid == expected
        result = space.run(["python3", "-I", "pkg/main.py"], LIMITS, {})
        assert result.stdout.strip() == "mine", result.stderr


def test_a_planted_link_makes_the_verdict_an_infra_error_and_retires_the_sandbox(
        local_backend, victim, tiny_set, monkeypatch):
    runtime = load_runtime("python")
    executor = Executor(local_backend, load_problem_set(str(tiny_set)), {"python": runtime}, infra_retries=0)
    real = local_backend.workspace
    seen = []

    @contextlib.contextmanager
    def planted(needs):
        with real(needs) as space:
            seen.append(getattr(space, "slot", None))
            plant_link(space.path / runtime.source_file, victim["file"])
            yield space

    monkeypatch.setattr(local_backend, "workspace", planted)
    verdict = executor.execute(Sample("add_pair", "python", 0, "    return a + b\n", "planted", 0))
    assert verdict.outcome == "infra_error" and "already there" in verdict.detail, verdict.detail
    assert_untouched(victim)
    monkeypatch.setattr(local_backend, "workspace", real)
    again = executor.execute(Sample("add_pair", "python", 1, "    return a + b\n", "planted", 1))
    assert again.outcome == "passed", again.detail
    if seen[0] is not None:  # bubblewrap: the sandbox where the link was found is not reused
        assert seen[0].spoiled and seen[0].process.wait(timeout=10) is not None


@pytest.fixture(scope="module")
def docker_box():
    box = open_backend("docker")
    yield box
    box.close()


@pytest.mark.parametrize("planted, name", [
    ("os.mkdir('real'); os.symlink('real/later.py', 'later.py')", "later.py"),
    ("os.mkdir('real'); os.symlink('real', 'sub')", "sub/later.py"),
], ids=["file", "folder-on-the-way"])
def test_docker_writes_as_the_sandbox_user_and_follows_no_link_either(docker_box, planted, name):
    # The Docker backend writes through the container's supervisor, never on the host; a link
    # the candidate planted ends the write in an error there too (retried on fresh containers,
    # where the same candidate plants it again, then reported as an infra error).
    with docker_box.workspace(NEEDS) as space:
        space.write("plant.py", f"import os\n{planted}\nprint('planted')\n")
        first = space.run(["python3", "-I", "plant.py"], LIMITS, {})
        assert first.stdout.strip() == "planted", first.stderr
        space.write(name, "print('written')\n")
        look = space.run(["ls", "-A", "real"], LIMITS, {})
        assert look.infra_error, f"the write went through the link: ls real -> {look.stdout!r}"
        assert name.split("/")[0] in look.infra_error
