"""Hostile candidates: each must get a non-passed verdict of the right kind, within the limits,
with the host untouched and the next candidate unaffected. Corpora: tests/adversarial/<runtime>.yaml."""

import errno
import os
import socket
import subprocess
import time
from pathlib import Path

import pytest
import yaml

from harness.completions import Sample
from harness.execution import Executor
from harness.problems import load_problem_set
from harness.runtimes import indent_lines, load_runtime
from harness.sandbox import make_sandbox

CORPUS_DIR = Path(__file__).parent / "adversarial"
LIMITS = {"wall_seconds": 4, "cpu_seconds": 4, "memory_mb": 192, "max_processes": 48}


def corpus_entries():
    for path in sorted(CORPUS_DIR.glob("*.yaml")):
        data = yaml.safe_load(path.read_text(encoding="utf-8"))
        for attack in data["attacks"]:
            yield pytest.param(path.stem, data["control"], attack, id=f"{path.stem}: {attack['name']}")


def backends():
    names = ["bubblewrap"]
    try:
        box = make_sandbox("docker")
        box.check()
        box.close()
        names.append("docker")
    except Exception:  # no Docker backend or daemon here: bubblewrap alone
        pass
    return names


@pytest.fixture(scope="module", params=backends())
def backend(request):
    box = make_sandbox(request.param)
    box.check()
    yield box
    box.close()


@pytest.fixture(scope="module")
def host(tmp_path_factory):
    """Things on the host the candidates must not touch."""
    root = tmp_path_factory.mktemp("host")
    marker = root / "marker.txt"
    marker.write_text("do not read")
    outside = root / "outside"
    outside.mkdir(mode=0o777)
    os.chmod(outside, 0o777)  # writable by anyone: only the sandbox stands in the way
    listener = socket.socket()
    listener.bind(("127.0.0.1", 0))
    listener.listen(8)
    listener.setblocking(False)
    yield {"marker": marker, "outside": outside, "listener": listener, "atime": marker.stat().st_atime}
    listener.close()


def fill(text: str, host: dict, tag: str) -> str:
    return text.format(
        marker=host["marker"], outside=host["outside"], port=host["listener"].getsockname()[1],
        harness_pid=os.getpid(), tag=tag, deep_nesting="(" * 5000 + "1" + ")" * 5000,
        huge_source="filler = [" + "1, " * 250_000 + "]",
    )


def leftover_files(backend) -> list[Path]:
    """What is under the sandbox's work root once the candidate has gone: a warm sandbox's
    folder, emptied for the next candidate, holds nothing; any other folder is removed (a
    retired sandbox's in the background, hence the wait)."""
    idle = [slot for pool in getattr(backend, "pools", {}).values() for slot in pool.idle]
    for slot in idle:
        slot.settle()  # reads the supervisor's report on emptying it
    warm = {slot.folder for slot in idle if slot.spoiled is None}
    retiring = {slot.folder for slot in idle} - warm  # discarded at their next checkout
    deadline = time.monotonic() + 10
    while True:
        found = [path for path in Path(backend.work_root).iterdir() if path not in warm | retiring]
        if not found or time.monotonic() > deadline:
            break
        time.sleep(0.05)
    return found + [path for folder in warm for path in folder.iterdir()]


@pytest.mark.parametrize("language,control,attack", list(corpus_entries()))
def test_hostile_candidate_is_contained(language, control, attack, backend, host, tiny_set):
    runtime = load_runtime(language)
    if runtime.toolchain_version() is None and not os.environ.get("CI"):
        pytest.skip(f"{language} toolchain not installed here")
    executor = Executor(backend, load_problem_set(str(tiny_set)), {language: runtime}, limit_overrides=LIMITS,
                        infra_retries=0)
    tag = f"assay-orphan-{os.getpid()}-{time.time_ns()}"

    def run(completion: str):
        text = indent_lines(fill(completion, host, tag), runtime.reference_indent) + "\n"
        return executor.execute(Sample("add_pair", language, 0, text, "corpus", 0))

    started = time.monotonic()
    verdict = run(attack["completion"])
    assert verdict.outcome in attack["expect"], f"{verdict.outcome}: {verdict.detail}"
    assert time.monotonic() - started < 60 + 2 * LIMITS["wall_seconds"]

    # The host is untouched.
    marker = host["marker"]
    assert marker.stat().st_atime == host["atime"], "the marker was read"
    assert marker.stat().st_size == len("do not read"), "the marker was changed"
    assert list(host["outside"].iterdir()) == []
    with pytest.raises(OSError) as no_connection:
        host["listener"].accept()
    assert no_connection.value.errno in (errno.EAGAIN, errno.EWOULDBLOCK)
    time.sleep(0.2)
    assert subprocess.run(["pgrep", "-f", tag], capture_output=True).stdout == b""
    if getattr(backend, "work_root", None) is not None:
        assert leftover_files(backend) == [], "a candidate's files were left behind"

    # The next candidate is unaffected.
    assert run(control).outcome == "passed"
