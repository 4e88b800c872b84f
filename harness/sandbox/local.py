"""What the backends that run candidates as local processes share: a per-sandbox work root
(in RAM where possible), per-candidate work dirs, and the candidate's base environment."""

from __future__ import annotations

import logging
import os
import tempfile
from pathlib import Path

from ..vocabulary import RuntimeSandboxNeeds
from .base import ClosingSandbox
from .step_supervisor import read_regular_file, remove_tree, write_new_file

LOG = logging.getLogger("assay.sandbox")

BASE_PATH = "/usr/local/bin:/usr/bin:/bin"


def default_work_root() -> str:
    """Work dirs live in RAM (/dev/shm) when possible: pages a candidate writes there are
    charged to its memory cgroup, so filling the disk is bounded by the memory limit."""
    shm = "/dev/shm"
    if os.path.isdir(shm) and os.access(shm, os.W_OK):
        return shm
    return tempfile.gettempdir()


def private_folder(root: Path, owner: int | None, prefix: str = "cand-") -> Path:
    """A new folder under ``root`` that only ``owner`` (or this user) can enter."""
    path = Path(tempfile.mkdtemp(prefix=prefix, dir=root))
    if owner is not None:
        os.chown(path, owner, owner)
    os.chmod(path, 0o700)
    return path


class LocalWorkspace:
    """A candidate's work dir as a host folder, written and read from the host; subclasses
    decide how a step runs."""

    def __init__(self, path: Path, owner: int | None):
        self.path = path
        self.owner = owner

    def write(self, name: str, content: str) -> None:
        self.write_bytes(name, content.encode("utf-8"))

    def write_bytes(self, name: str, data: bytes) -> None:
        # The harness may run as root and the folder is the candidate's: a link planted there
        # (by a process that outlived an earlier candidate in a warm sandbox) must never be
        # followed, and only the file just made is given to the sandbox user, by descriptor.
        write_new_file(str(self.path), name, data, owner=self.owner)

    def read(self, name: str, max_bytes: int) -> bytes | None:
        # No link followed, on the way or at the end; a FIFO in its place reads as missing.
        return read_regular_file(str(self.path), name, max_bytes)


def remove_folder(path: Path) -> str | None:
    """Remove a host folder a candidate wrote into, however deep or odd its tree (see
    ``remove_tree``); a failure is logged and returned, never raised, so cleaning up can
    neither stop a run nor turn into a candidate's verdict."""
    try:
        remove_tree(str(path))
    except Exception as exc:  # noqa: BLE001 - whatever it was, the run goes on
        problem = f"could not remove {path}: {type(exc).__name__}: {exc}"[:500]
        LOG.warning("assay: %s", problem)
        return problem
    return None


def candidate_env(needs: RuntimeSandboxNeeds, env: dict[str, str], home: str, tmp: str) -> dict[str, str]:
    """A clean environment: a few basics, then the runtime's needs, then the step's own."""
    merged = {"HOME": home, "TMPDIR": tmp, "LANG": "C.UTF-8", "PATH": BASE_PATH}
    merged.update(dict(needs.env))
    merged.update(env)
    return merged


class LocalSandbox(ClosingSandbox):
    """Owns one work root, where its sandboxes' folders are made, and the record of folders
    that could not be removed."""

    def __init__(self, work_root: Path | None, prefix: str):
        # One folder per sandbox object, so two sandboxes in one process never share it.
        self.work_root = Path(tempfile.mkdtemp(prefix=prefix, dir=work_root or default_work_root()))
        self.cleanup_problems: list[str] = []  # folders that could not be removed, for the record

    def note(self, problem: str | None) -> None:
        if problem:
            self.cleanup_problems.append(problem)

    def close(self) -> None:
        """Never raises: a folder that cannot be removed is logged and noted."""
        self.note(remove_folder(self.work_root))
