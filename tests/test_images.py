"""Docker image naming, Dockerfile checks, the Debian mirror lookup and the supervisor's needs:
everything about images that needs no Docker daemon."""

from __future__ import annotations

import ast
import hashlib
import re
import shutil
from pathlib import Path

import pytest

from harness.runtimes import load_runtime
from harness.sandbox import docker as docker_backend
from harness.sandbox import images

ROOT = Path(__file__).resolve().parents[1]

# The Docker distribution reference grammar (docker/distribution, reference/regexp.go; from
# memory): a path component is lowercase alphanumerics joined by '.', '_', '__' or '-'
# separators, a tag is [A-Za-z0-9_][A-Za-z0-9_.-]{0,127}.
REPOSITORY = re.compile(r"[a-z0-9]+(?:(?:\.|_|__|-+)[a-z0-9]+)*")
TAG = re.compile(r"[A-Za-z0-9_][A-Za-z0-9_.-]{0,127}")


def folder_sha256(folder: Path) -> str:
    """The runtime folder's content hash as docs/runtime-format.md describes it, recomputed
    with hashlib: every file by relative path, in sorted order."""
    hasher = hashlib.sha256()
    for file in sorted(p for p in folder.rglob("*") if p.is_file()):
        hasher.update(str(file.relative_to(folder)).encode() + b"\0" + file.read_bytes() + b"\0")
    return hasher.hexdigest()


@pytest.fixture
def python_copy(tmp_path):
    target = tmp_path / "runtimes" / "python"
    shutil.copytree(ROOT / "runtimes" / "python", target)
    return target


def test_image_tag_is_the_runtime_name_and_the_first_12_hex_of_its_folder_hash(python_copy):
    runtime = load_runtime("python", [python_copy.parent])
    tag = images.image_tag(runtime.needs)
    repository, _, version = tag.partition(":")
    assert repository == "assay-python"
    assert version == folder_sha256(python_copy)[:12]
    assert REPOSITORY.fullmatch(repository) and TAG.fullmatch(version)


def test_editing_the_dockerfile_or_any_template_names_a_new_image(python_copy):
    before = images.image_tag(load_runtime("python", [python_copy.parent]).needs)
    assert images.image_tag(load_runtime("python", [python_copy.parent]).needs) == before
    dockerfile = python_copy / "Dockerfile"
    dockerfile.write_text(dockerfile.read_text() + "RUN true\n")
    after_dockerfile = images.image_tag(load_runtime("python", [python_copy.parent]).needs)
    (python_copy / "program.j2").write_text((python_copy / "program.j2").read_text() + "\n")
    after_template = images.image_tag(load_runtime("python", [python_copy.parent]).needs)
    assert len({before, after_dockerfile, after_template}) == 3


@pytest.mark.parametrize("text,problem", [
    ("ARG BASE\nFROM ${BASE}\nRUN true\n", None),
    ("# comment\nARG BASE=debian:bookworm-slim\n\nFROM $BASE\n", None),
    ("FROM debian:bookworm\n", ":1: the first FROM must be 'FROM ${BASE}'"),
    ("FROM ${BASE}\nARG BASE\n", ":1: 'ARG BASE' must come before"),
    ("ARG BASE\nARG OTHER\nFROM ${OTHER}\n", ":3: the first FROM must be"),
    ("ARG BASE\nRUN true\n", ": no FROM line"),
])
def test_dockerfile_problems_name_the_file_and_line(tmp_path, text, problem):
    path = tmp_path / "Dockerfile"
    path.write_text(text)
    found = images.dockerfile_problems(path)
    if problem is None:
        assert found == []
    else:
        assert len(found) == 1 and found[0].startswith(str(path)) and problem in found[0]


def test_a_missing_dockerfile_is_reported_by_path(tmp_path):
    assert images.dockerfile_problems(tmp_path / "Dockerfile") == [
        f"{tmp_path / 'Dockerfile'}: missing (a runtime needs a Dockerfile for the Docker sandbox)"]


def test_every_bundled_dockerfile_takes_the_base_the_engine_passes():
    found = sorted((ROOT / "runtimes").glob("*/Dockerfile"))
    assert ROOT / "runtimes" / "python" / "Dockerfile" in found
    for path in found:
        assert images.dockerfile_problems(path) == [], path


DEB822 = """\
Types: deb
# http://snapshot.debian.org/archive/debian/20250520T000000Z
URIs: http://mirror.example/debian
Suites: bookworm bookworm-updates
Components: main
Signed-By: /usr/share/keyrings/debian-archive-keyring.gpg

Types: deb
URIs: http://mirror.example/debian-security
Suites: bookworm-security
Components: main
"""


def test_the_mirror_comes_from_a_deb822_sources_file(tmp_path, monkeypatch):
    # deb822 format: sources.list(5), "DEB822-STYLE FORMAT".
    monkeypatch.delenv(images.MIRROR_ENV, raising=False)
    (tmp_path / "debian.sources").write_text(DEB822)
    assert images.debian_mirror((tmp_path / "absent.list", tmp_path)) == "http://mirror.example/debian"


def test_the_mirror_comes_from_a_one_line_sources_list(tmp_path, monkeypatch):
    # One-line format: sources.list(5), "deb [ option1=value1 ] uri suite [component1] ...".
    monkeypatch.delenv(images.MIRROR_ENV, raising=False)
    listing = tmp_path / "sources.list"
    listing.write_text("# local\ndeb-src http://src.example/debian bookworm main\n"
                       "deb http://security.example/debian-security bookworm-security main\n"
                       "deb [arch=amd64 signed-by=/k.gpg] http://one.example/debian bookworm main contrib\n")
    assert images.debian_mirror((listing,)) == "http://one.example/debian"


def test_disabled_and_non_debian_sources_fall_back_to_deb_debian_org(tmp_path, monkeypatch):
    monkeypatch.delenv(images.MIRROR_ENV, raising=False)
    (tmp_path / "ubuntu.sources").write_text(
        "Types: deb\nURIs: http://archive.ubuntu.com/ubuntu\nSuites: jammy jammy-updates\nComponents: main\n\n"
        "Types: deb\nURIs: http://off.example/debian\nSuites: bookworm\nEnabled: no\n")
    assert images.debian_mirror((tmp_path,)) == images.FALLBACK_MIRROR


def test_the_mirror_variable_wins(tmp_path, monkeypatch):
    (tmp_path / "debian.sources").write_text(DEB822)
    monkeypatch.setenv(images.MIRROR_ENV, "http://forced.example/debian")
    assert images.debian_mirror((tmp_path,)) == "http://forced.example/debian"


def supervisor_imports() -> set[str]:
    tree = ast.parse(docker_backend.AGENT_SOURCE)
    names = set()
    for node in ast.walk(tree):
        if isinstance(node, ast.Import):
            names |= {alias.name.split(".")[0] for alias in node.names}
        elif isinstance(node, ast.ImportFrom):
            names.add(node.module.split(".")[0])
    return names


def test_the_image_layer_checks_for_every_module_the_supervisor_imports():
    # The layer installs python3 unless `python3 -c "import ..."` succeeds; modules the
    # supervisor needs but the check omits could be missing from python3-minimal images.
    checked = set(re.search(r'import ([a-z0-9_, ]+)"', images.SUPERVISOR_LAYER).group(1).replace(" ", "").split(","))
    always_there = {"os", "sys", "signal", "stat", "time"}  # built into every python3 (python3-minimal)
    assert supervisor_imports() - always_there <= checked


def test_the_supervisor_fits_in_one_command_line_argument():
    # It travels as `python3 -c SOURCE`; Linux caps one argument at MAX_ARG_STRLEN, 32 pages
    # = 131072 bytes (include/uapi/linux/binfmts.h).
    assert len(docker_backend.AGENT_SOURCE.encode()) < 131072
    compile(docker_backend.AGENT_SOURCE, "step_supervisor.py", "exec")


def run_cli(*args):
    from typer.testing import CliRunner

    from harness.cli import app

    return CliRunner().invoke(app, list(args))


def test_building_a_runtime_without_a_dockerfile_names_the_missing_file(python_copy):
    (python_copy / "Dockerfile").unlink()
    result = run_cli("runtimes", "build", "python", "--runtimes-dir", str(python_copy.parent))
    assert result.exit_code == 2
    assert f"{python_copy / 'Dockerfile'}: missing" in result.output


def test_an_explicit_base_and_the_offline_base_exclude_each_other():
    result = run_cli("runtimes", "build", "python", "--base", "debian:bookworm", "--offline-base")
    assert result.exit_code == 2 and "exclude each other" in result.output


def test_the_offline_base_gets_the_hosts_local_ca_certificates(tmp_path):
    host = tmp_path / "host" / "usr" / "local" / "share" / "ca-certificates"
    (host / "corp").mkdir(parents=True)
    (host / "proxy.crt").write_text("PROXY")
    (host / "corp" / "inner.crt").write_text("INNER")
    (host / "README").write_text("not a certificate")
    root = tmp_path / "rootfs"
    copied = images.copy_local_certificates(root, host)
    # update-ca-certificates(8) reads *.crt below /usr/local/share/ca-certificates.
    target = root / "usr" / "local" / "share" / "ca-certificates"
    assert copied == ["corp/inner.crt", "proxy.crt"]
    assert (target / "proxy.crt").read_text() == "PROXY" and (target / "corp" / "inner.crt").read_text() == "INNER"
    assert not (target / "README").exists()
