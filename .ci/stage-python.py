#!/usr/bin/env python3
"""Copies what another Python (of the same minor version) or another user needs to run Assay
from this installation: every file of the distributions pyproject.toml depends on, pytest and pytest-timeout,
with their requirements (markers evaluated for this Python, no extras), into TARGET/deps; with
--project, the working tree's files too (tracked and untracked ones git does not ignore) into
TARGET. Used by .ci/vm-test.sh for the test VM's project disk and by tests/test_rootless.py,
whose unprivileged user cannot reach an interpreter installed under /root.

    python3 .ci/stage-python.py TARGET [--project]
"""

import importlib.metadata as metadata
import re
import shutil
import subprocess
import sys
import tomllib
from pathlib import Path

from packaging.requirements import Requirement

PROJECT = Path(__file__).resolve().parents[1]


def copy_project(target: Path) -> None:
    listed = subprocess.run(["git", "-C", str(PROJECT), "ls-files", "-z", "--cached", "--others",
                             "--exclude-standard"], capture_output=True)
    if listed.returncode == 0:
        names = [Path(n) for n in listed.stdout.decode().split("\0") if n]
    else:  # no git: everything but its folder, results and caches
        skip = {".git", "results", "__pycache__"}
        names = [p.relative_to(PROJECT) for p in PROJECT.rglob("*")
                 if not skip & set(p.relative_to(PROJECT).parts) and not p.name.endswith(".egg-info")]
    for name in names:
        source = PROJECT / name
        if source.is_file() and not source.is_symlink():
            (target / name).parent.mkdir(parents=True, exist_ok=True)
            shutil.copy2(source, target / name)


def copy_distributions(target: Path) -> None:
    seen: set[str] = set()

    def add(name: str) -> None:
        key = re.sub(r"[-_.]+", "-", name).lower()
        if key in seen:
            return
        seen.add(key)
        try:
            dist = metadata.distribution(name)
        except metadata.PackageNotFoundError:
            print(f"stage-python: {name} is not installed here (bash .ci/install); staged without it", file=sys.stderr)
            return
        for raw in dist.requires or []:
            requirement = Requirement(raw)
            if requirement.marker is None or requirement.marker.evaluate({"extra": ""}):
                add(requirement.name)
        for file in dist.files or []:
            source = Path(dist.locate_file(file))
            if source.is_file() and ".." not in file.parts and "__pycache__" not in file.parts:
                (target / file).parent.mkdir(parents=True, exist_ok=True)
                shutil.copy2(source, target / file)

    declared = tomllib.loads((PROJECT / "pyproject.toml").read_text())["project"]["dependencies"]
    for name in [Requirement(d).name for d in declared] + ["pytest", "pytest-timeout"]:
        add(name)


if __name__ == "__main__":
    if len(sys.argv) not in (2, 3) or sys.argv[2:] not in ([], ["--project"]):
        sys.exit(__doc__.split("\n\n")[-1])
    destination = Path(sys.argv[1])
    if sys.argv[2:]:
        copy_project(destination)
    copy_distributions(destination / "deps")
