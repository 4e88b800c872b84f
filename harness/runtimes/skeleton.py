"""``assay runtimes new``: a commented runtime folder to fill in."""

from __future__ import annotations

import re
from pathlib import Path

SKELETON_DIR = Path(__file__).parent / "skeleton"
_RUNTIME_NAME = re.compile(r"^[a-z][a-z0-9_+-]*$")


def write_skeleton(name: str, target: Path) -> None:
    """Copy the commented runtime skeleton to ``target`` with ``name`` filled in."""
    if not _RUNTIME_NAME.match(name):
        raise ValueError(f"runtime name {name!r} must be lower case letters, digits, '_', '+' or '-'")
    if target.exists():
        raise FileExistsError(f"{target} already exists")
    target.mkdir(parents=True)
    for source in sorted(p for p in SKELETON_DIR.iterdir() if p.is_file()):
        (target / source.name).write_text(source.read_text(encoding="utf-8").replace("{{NAME}}", name),
                                          encoding="utf-8")
    # Where the runtime keeps the references of the sets it must pass (see runtime.yaml).
    (target / "references" / "conformance").mkdir(parents=True)
