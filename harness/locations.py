"""Where bundled data lives, and where users may add their own.

Problem sets and runtimes are data folders at the top of the project, beside ``harness/``.
``ASSAY_HOME`` points elsewhere for installs that keep the data apart from the code.
"""

from __future__ import annotations

import os
from pathlib import Path

PROJECT_ROOT = Path(__file__).resolve().parent.parent


def bundled_dir(kind: str) -> Path:
    """``problem_sets`` or ``runtimes`` of the installation."""
    home = os.environ.get("ASSAY_HOME")
    return (Path(home) if home else PROJECT_ROOT) / kind


def runtime_search_path(extra: list[Path] | None = None) -> list[Path]:
    """Folders searched for runtimes, first match wins: explicit ones, then
    ``ASSAY_RUNTIMES_PATH`` (colon-separated), then the bundled ``runtimes/``."""
    paths = list(extra or [])
    env = os.environ.get("ASSAY_RUNTIMES_PATH", "")
    paths += [Path(p) for p in env.split(os.pathsep) if p]
    paths.append(bundled_dir("runtimes"))
    return paths
