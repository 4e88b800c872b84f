"""Warm compilers under the Docker backend (harness/sandbox/docker_compilers.py, images.py):
prepared files built into the runtime's image, compile servers in containers of their own.

The reference for every verdict is the runtime's cold compile.command run as a step in the same
backend (tests/test_warm_compilers.py's ``compare``). Needs a Docker daemon and the images of
the runtimes (CI builds cpp, java and go: .ci/docker-setup.sh); without them a test skips and
says which image to build. An image built before images carried warm compiler files gets them
added here, as ``assay runtimes build`` would (a layer, seconds).
"""

from __future__ import annotations

import contextlib
import dataclasses
import shutil
import tempfile
import time
from pathlib import Path

import pytest

from harness.engine.execution import Executor
from harness.problems import load_problem_set
from harness.runtimes import load_runtime
from harness.runtimes.runtime import load_runtime_folder
from harness.sandbox import SandboxUnavailable
from harness.sandbox import docker as backend
from harness.sandbox import images
from harness.sandbox.docker_compilers import ContainerServer, DockerLauncher
from harness.sandbox.warm_compilers import frame
from harness.vocabulary import LimitOverrides, Limits

from .test_warm_compilers import compare, installed, references, shown, wrong_programs


@pytest.fixture(scope="module")
def box():
    try:
        sandbox = backend.DockerSandbox()
        sandbox.check()
    except SandboxUnavailable as exc:
        pytest.skip(f"no Docker daemon reachable: {exc}")
    yield sandbox
    sandbox.close()


@pytest.fixture
def own_box(box):
    """A sandbox of the test's own, so that no other test's compile servers are in its pool."""
    sandbox = backend.DockerSandbox()
    sandbox.check()
    yield sandbox
    sandbox.close()


def gone(box, container: str, seconds: float = 30) -> bool:
    """Whether the container is removed within ``seconds`` (retired servers go in the background)."""
    deadline = time.monotonic() + seconds
    while box.client.api.containers(all=True, filters={"id": container}):
        if time.monotonic() > deadline:
            return False
        time.sleep(0.2)
    return True


def runtime_with_image(box, language: str):
    """The runtime, once its image for these files exists and carries its warm compiler files."""
    runtime = installed(language)
    tag = images.image_tag(runtime.needs)
    facts = images.inspect_image(box.client, tag)
    if facts is None:
        pytest.skip(f"no Docker image {tag} for these {language} runtime files: assay runtimes build {language}")
    if images.image_warm_files(facts) is None:
        try:
            images.build_runtime_image(box.client, runtime.needs, None, lambda message: None)
        except images.ImageError as exc:
            pytest.skip(f"{tag} lacks its warm compiler files and cannot get them here: {exc}")
    return runtime


@pytest.mark.parametrize("language", ["cpp", "go", "java"])
def test_warm_verdicts_under_docker_equal_cold_ones(box, language):
    runtime = runtime_with_image(box, language)
    # A reference, and a wrong program that fails to compile: its message must match too.
    samples = references(runtime, "conformance")[:1] + wrong_programs(runtime, "compile_error")[:1]
    compare(box, runtime, "conformance", samples)
    executor = Executor(box, load_problem_set("conformance"), {language: runtime}, warm=True)
    assert "cold" not in executor.compilers.describe()[language]


# Run as a compile server's command: what the container lets it see, as protocol fields.
PROBE = r"""
import errno, os, socket, sys
host_file = sys.argv[1]
lines = open("/proc/net/dev").read().splitlines()[2:]  # proc(5): two header lines, then one per interface
interfaces = sorted(line.split(":")[0].strip() for line in lines)
try:
    socket.socket(socket.AF_INET, socket.SOCK_DGRAM).connect(("192.0.2.1", 53))  # TEST-NET-1, RFC 5737
    reach = "connected"
except OSError as exc:
    reach = errno.errorcode.get(exc.errno, str(exc.errno))
try:
    open("/probe", "w")
    root = "writable"
except OSError as exc:
    root = errno.errorcode.get(exc.errno, str(exc.errno))
answers = [",".join(interfaces), reach, str(os.path.exists(host_file)), root, str(os.getuid())]
out = sys.stdout.buffer
for answer in answers:
    data = answer.encode()
    out.write(str(len(data)).encode() + b"\n" + data)
out.flush()
sys.stdin.read()
"""


def test_a_compile_server_container_has_no_network_and_sees_no_host_files(box):
    runtime = runtime_with_image(box, "java")
    folder = Path(tempfile.mkdtemp(prefix="assay-host-only-", dir="/var/tmp"))
    launcher = DockerLauncher(box)
    try:
        (folder / "secret").write_text("host only\n", encoding="utf-8")
        server = launcher.start(runtime.needs, ("python3", "-I", "-S", "-c", PROBE, str(folder / "secret")), None,
                                Limits(memory_mb=256, max_processes=16))
        try:
            deadline = time.monotonic() + 60
            answers = [server.reader.field(deadline).decode() for _ in range(5)]
            labels = box.client.api.inspect_container(server.container)["Config"]["Labels"]
        finally:
            launcher.end(server)
        assert not box.client.api.containers(all=True, filters={"id": server.container})  # removed
    finally:
        shutil.rmtree(folder, ignore_errors=True)
    interfaces, reach, sees_host_file, root, uid = answers
    assert interfaces == "lo"  # network none: a loopback device only (Docker's network documentation)
    assert reach == "ENETUNREACH"  # no route anywhere (connect(2) on Linux, from memory)
    assert (sees_host_file, root, uid) == ("False", "EROFS", "10001")  # open(2): EROFS on a read-only file system
    # The labels the backend's close and orphan clean-up remove containers by (docker.py).
    assert labels[backend.LABEL_RUN] == box.run_id and labels[backend.LABEL_ROLE] == "compile-server"
    assert not backend.owner_gone(labels)


def test_a_crashed_compile_server_is_retired_and_the_candidate_compiles_cold(own_box):
    box = own_box
    runtime = runtime_with_image(box, "java")
    problems = load_problem_set("conformance")
    samples = references(runtime, "conformance")[:1] + wrong_programs(runtime, "compile_error")[:1]
    cold = [Executor(box, problems, {"java": runtime}, warm=False).execute(s) for s in samples]
    executor = Executor(box, problems, {"java": runtime}, warm=True)
    compiler = executor.compilers.prepare(runtime, runtime.step_limits("compile"), servers=1)
    [crashed] = compiler.idle
    assert isinstance(crashed, ContainerServer)
    box.client.api.kill(crashed.container)  # SIGKILL to its pid 1, the server
    warm = [executor.execute(s) for s in samples]
    assert crashed not in compiler.idle
    assert [shown(v) for v in warm] == [shown(v) for v in cold]
    assert compiler.warm_compiles == 0  # the first compiled cold after the crash, the second while one started
    assert gone(box, crashed.container)


def test_a_compile_over_its_time_limit_under_docker_times_out_and_retires_the_server(own_box):
    box = own_box
    runtime = runtime_with_image(box, "java")
    # 10 ms: javac, warm or cold, takes longer than that for a conformance program.
    quick = dataclasses.replace(runtime, compile=dataclasses.replace(
        runtime.compile, limits=runtime.compile.limits.then(LimitOverrides.parse({"wall_seconds": 0.01}))))
    problems = load_problem_set("conformance")
    sample = references(quick, "conformance")[0]
    cold = Executor(box, problems, {"java": quick}, warm=False, infra_retries=0).execute(sample)
    executor = Executor(box, problems, {"java": quick}, warm=True, infra_retries=0)
    compiler = executor.compilers.prepare(quick, quick.step_limits("compile"), servers=1)
    [server] = compiler.idle
    warm = executor.execute(sample)
    assert server not in compiler.idle and gone(box, server.container)  # retired: its container removed
    # The cold command under the same limit is the reference (javac run as a step).
    assert shown(warm) == shown(cold)
    assert (warm.outcome, warm.detail) == ("compile_error", "compilation exceeded its time limit (0.01s)")


def test_editing_a_prepared_file_or_its_build_names_a_new_image(tmp_path):
    # The image tag comes from the runtime folder's content hash, which covers the prepared file
    # and runtime.yaml's build command: an image with stale prepared files is never used.
    folder = tmp_path / "cpp"
    shutil.copytree(load_runtime("cpp").path, folder)
    tags = [images.image_tag(load_runtime_folder(folder).needs)]
    with open(folder / "headers.j2", "a", encoding="utf-8") as handle:
        handle.write("#include <array>\n")
    tags.append(images.image_tag(load_runtime_folder(folder).needs))
    yaml = folder / "runtime.yaml"
    yaml.write_text(yaml.read_text(encoding="utf-8").replace("c++-header, -o", "c++-header, -w, -o"), encoding="utf-8")
    runtime = load_runtime_folder(folder)
    assert "-w" in runtime.needs.warm_files.build
    tags.append(images.image_tag(runtime.needs))
    assert len(set(tags)) == 3, tags


def test_an_image_whose_prepared_build_failed_is_labelled_so_and_compiles_cold(box, tmp_path):
    runtime = runtime_with_image(box, "go")  # its toolchain layers are in the build cache then
    folder = tmp_path / "go"
    shutil.copytree(runtime.path, folder)
    (folder / runtime.compile.warm.file).write_text("echo 'no standard library here' >&2\nexit 1\n", encoding="utf-8")
    broken = load_runtime_folder(folder)
    tag = images.image_tag(broken.needs)
    offline = images.find_image(box.client, images.OFFLINE_BASE) is not None
    try:
        try:
            base = images.ensure_base(box.client, None, offline, lambda message: None)
            images.build_runtime_image(box.client, broken.needs, base, lambda message: None)
        except images.ImageError as exc:
            pytest.skip(f"cannot build {tag} here: {exc}")
        assert images.image_warm_files(images.inspect_image(box.client, tag)) == ""
        sandbox = backend.DockerSandbox()
        try:
            sandbox.check()
            executor = Executor(sandbox, load_problem_set("conformance"), {"go": broken}, warm=True)
            verdict = executor.execute(references(broken, "conformance")[0])
            described = executor.compilers.describe()["go"]
        finally:
            sandbox.close()
        assert verdict.outcome == "passed", verdict.detail
        assert described.startswith("cold") and "failed to build" in described
    finally:
        for ref in (tag, f"{tag}-toolchain"):
            with contextlib.suppress(Exception):
                box.client.api.remove_image(ref, force=True)
