"""Shared fixtures: a real bubblewrap sandbox, runtimes, and small problem sets."""

from __future__ import annotations

import shutil
import textwrap
from pathlib import Path

import pytest

from harness.problems import load_problem_set
from harness.runtimes import load_runtime
from harness.sandbox import make_sandbox

ROOT = Path(__file__).resolve().parents[1]

# Modules that run many sandboxed candidates, images or clusters: `-m "not slow"` leaves them out
# for a contributor's quick run (under two minutes on 2 cores); CI runs everything.
SLOW_MODULES = {
    "test_adversarial", "test_docker_sandbox", "test_ray_engine", "test_runtimes", "test_demo",
    "test_sandbox_isolation", "test_sandbox_cleanup", "test_sandbox_planted_links", "test_seccomp_filter",
    "test_sandbox_none_host_mode", "test_sandbox_soak", "test_runtime_folders", "test_extraction_corpus",
    "test_docker_warm_compilers",
}


def pytest_collection_modifyitems(items):
    for item in items:
        if item.module.__name__.rsplit(".", 1)[-1] in SLOW_MODULES:
            item.add_marker(pytest.mark.slow)


@pytest.fixture(scope="session")
def sandbox():
    if shutil.which("bwrap") is None:
        pytest.fail("bubblewrap is required for the test suite: apt-get install bubblewrap")
    box = make_sandbox("bubblewrap")
    box.check()
    yield box
    box.close()


@pytest.fixture(scope="session")
def python_runtime():
    return load_runtime("python")


@pytest.fixture(scope="session")
def conformance():
    return load_problem_set("conformance")


ADD_PAIR = """\
id: add_pair
title: Add a pair
difficulty: easy
tags: [math]
description: Return the sum of `a` and `b`.
signature:
  name: add_pair
  params: [{name: a, type: int}, {name: b, type: int}]
  returns: int
cases:
  - {args: [1, 2], expected: 3, example: true}
  - {args: [-5, 5], expected: 0}
  - {args: [40, 2], expected: 42}
reference:
  python: |
    return a + b
"""


def write_set(folder: Path, files: dict[str, str]) -> Path:
    folder.mkdir(parents=True, exist_ok=True)
    for name, text in files.items():
        (folder / name).write_text(textwrap.dedent(text), encoding="utf-8")
    return folder


@pytest.fixture
def tiny_set(tmp_path):
    """A one-problem set, as a private team would keep outside the project."""
    return write_set(tmp_path / "tiny", {"add_pair.yaml": ADD_PAIR})
