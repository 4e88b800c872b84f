"""Hostile candidates: each must get a non-passed verdict of the right kind, within the limits,
with the host untouched and the next candidate unaffected. Corpora: tests/adversarial/<runtime>.yaml.

An attack's optional ``problem`` names the problem it answers (default ``add_pair``, int result):
``mean_draught`` has a float result and ``berth_label`` a string one, for results no type can
hold. The control runs next in the same warm sandbox and must pass; a corpus's control may look
for state an attack planted there (files, IPC objects, keys) and fail if it finds any."""

import errno
import glob
import os
import secrets
import socket
import subprocess
import time
from pathlib import Path

import pytest
import yaml

from harness.vocabulary import Sample
from harness.engine.execution import Executor
from harness.problems import load_problem_set
from harness.runtimes import indent_lines, load_runtime
from harness.sandbox import images, make_sandbox
from tests.conftest import ADD_PAIR, write_set

CORPUS_DIR = Path(__file__).parent / "adversarial"
LIMITS = {"wall_seconds": 4, "cpu_seconds": 4, "memory_mb": 192, "max_processes": 48}
SECRET_NAME = "ASSAY_ADVERSARIAL_SECRET"  # set in the harness's environment while the tests run

MEAN_DRAUGHT = """\
id: mean_draught
title: Mean draught
difficulty: easy
tags: [math]
description: A hull's draught is read at the bow and at the stern, in centimetres. Return the mean of the two readings.
signature:
  name: mean_draught
  params: [{name: bow, type: int}, {name: stern, type: int}]
  returns: float
cases:
  - {args: [610, 640], expected: 625.0, example: true}
  - {args: [0, 1], expected: 0.5}
  - {args: [455, 455], expected: 455.0}
"""

BERTH_LABEL = """\
id: berth_label
title: Berth label
difficulty: easy
tags: [strings]
description: Return the label painted on a berth, `berth ` followed by the berth's `name`.
signature:
  name: berth_label
  params: [{name: name, type: str}]
  returns: str
cases:
  - {args: [north], expected: berth north, example: true}
  - {args: [K7], expected: berth K7}
"""

# Attacks that currently get through or get the wrong verdict, by (runtime, attack name) and
# backend: each is marked as an expected failure (strict, so the mark must go once the sandbox
# or the runtime stops it).
# None at present (the last, Perl's check step waiting on a BEGIN block's child, is fixed).
KNOWN_ESCAPES: dict[tuple[str, str], dict[str, str]] = {}


def corpus_entries():
    for path in sorted(CORPUS_DIR.glob("*.yaml")):
        data = yaml.safe_load(path.read_text(encoding="utf-8"))
        for attack in data["attacks"]:
            yield pytest.param(path.stem, data["control"], attack, id=f"{path.stem}: {attack['name']}")


@pytest.fixture
def hostile_set(tmp_path):
    return write_set(tmp_path / "hostile", {"add_pair.yaml": ADD_PAIR, "mean_draught.yaml": MEAN_DRAUGHT,
                                            "berth_label.yaml": BERTH_LABEL})


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
def backend(request, host):  # after host: the sandboxes start with the secret in the environment
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
    secret = secrets.token_hex(16)
    saved = os.environ.get(SECRET_NAME)
    os.environ[SECRET_NAME] = secret
    yield {"marker": marker, "outside": outside, "listener": listener, "atime": marker.stat().st_atime,
           "secret": secret}
    listener.close()
    if saved is None:
        os.environ.pop(SECRET_NAME, None)
    else:
        os.environ[SECRET_NAME] = saved


def fill(text: str, host: dict, tag: str) -> str:
    return text.format(
        marker=host["marker"], outside=host["outside"], port=host["listener"].getsockname()[1],
        harness_pid=os.getpid(), tag=tag, secret_name=SECRET_NAME, deep_nesting="(" * 5000 + "1" + ")" * 5000,
        huge_source="filler = [" + "1, " * 250_000 + "]",
    )


def leftover_files(backend) -> list[Path]:
    """What is under the sandbox's work root once the candidate has gone: a warm sandbox's
    folder, emptied for the next candidate, holds nothing; any other folder is removed (a
    retired sandbox's in the background, hence the wait). The warm ones are looked up again
    while waiting: the replacement for a retired sandbox joins them once it has started, which
    on a loaded machine can take many seconds."""
    deadline = time.monotonic() + 30
    while True:
        idle = [slot for pool in getattr(backend, "pools", {}).values() for slot in pool.idle]
        for slot in idle:
            slot.settle()  # reads the supervisor's report on emptying it
        warm = {slot.folder for slot in idle if slot.spoiled is None}
        retiring = {slot.folder for slot in idle} - warm  # discarded at their next checkout
        found = [path for path in Path(backend.work_root).iterdir() if path not in warm | retiring]
        if not found or time.monotonic() > deadline:
            break
        time.sleep(0.05)
    return found + [path for folder in warm for path in folder.iterdir()]


def planted_on_host(tag: str) -> list[str]:
    """Files named after the attack's tag in the host's temporary and shared-memory folders."""
    return [path for folder in ("/tmp", "/var/tmp", "/dev/shm") for path in glob.glob(f"{folder}/*{tag}*")]


# Under Docker, the corpora of an interpreter, a JIT-compiled language and two native ones: what
# contains a candidate there (the container, its user, capabilities, limits) is the same for every
# language, and every corpus runs under bubblewrap. ASSAY_DOCKER_CORPORA=all runs every corpus
# under Docker too (about 10 more minutes on 2 cores, given the images).
DOCKER_CORPORA = {"python", "javascript", "cpp", "go"}


@pytest.mark.parametrize("language,control,attack", list(corpus_entries()))
def test_hostile_candidate_is_contained(language, control, attack, backend, host, hostile_set, request):
    runtime = load_runtime(language)
    if runtime.toolchain_version() is None and not os.environ.get("CI"):
        pytest.skip(f"{language} toolchain not installed here")
    if backend.name == "docker" and language not in DOCKER_CORPORA and os.environ.get("ASSAY_DOCKER_CORPORA") != "all":
        pytest.skip(f"the {language} corpus runs under bubblewrap; under Docker with ASSAY_DOCKER_CORPORA=all")
    if backend.name == "docker":
        tag = images.image_tag(runtime.needs)
        if images.find_image(backend.client, tag) is None:
            pytest.skip(f"no Docker image {tag} for these {language} runtime files: assay runtimes build {language}")
    known = KNOWN_ESCAPES.get((language, attack["name"]), {}).get(backend.name)
    if known:
        request.node.add_marker(pytest.mark.xfail(reason=known, strict=True))
    executor = Executor(backend, load_problem_set(str(hostile_set)), {language: runtime}, limit_overrides=LIMITS,
                        infra_retries=0)
    tag = f"assay-orphan-{os.getpid()}-{time.time_ns()}"

    def run(completion: str, problem: str = "add_pair"):
        text = indent_lines(fill(completion, host, tag), runtime.reference_indent) + "\n"
        return executor.execute(Sample(problem, language, 0, text, "corpus", 0))

    started = time.monotonic()
    verdict = run(attack["completion"], attack.get("problem", "add_pair"))
    assert verdict.outcome in attack["expect"], f"{verdict.outcome}: {verdict.detail}"
    assert host["secret"] not in verdict.detail, "the harness's secret reached the verdict"
    assert time.monotonic() - started < 60 + 2 * LIMITS["wall_seconds"]

    # The host is untouched.
    marker = host["marker"]
    assert marker.stat().st_atime == host["atime"], "the marker was read"
    assert marker.stat().st_size == len("do not read"), "the marker was changed"
    assert list(host["outside"].iterdir()) == []
    assert planted_on_host(tag) == [], "files planted in the host's temporary folders"
    with pytest.raises(OSError) as no_connection:
        host["listener"].accept()
    assert no_connection.value.errno in (errno.EAGAIN, errno.EWOULDBLOCK)
    time.sleep(0.2)
    assert subprocess.run(["pgrep", "-f", tag], capture_output=True).stdout == b""
    if getattr(backend, "work_root", None) is not None:
        assert leftover_files(backend) == [], "a candidate's files were left behind"

    # The next candidate is unaffected, and a sandbox retired when it was checked out is gone.
    after = run(control)
    assert after.outcome == "passed", f"the next candidate: {after.outcome}: {after.detail}"
    if getattr(backend, "work_root", None) is not None:
        assert leftover_files(backend) == [], "a retired sandbox's files were left behind"
