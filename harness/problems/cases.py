"""Case files of program problems, and generated cases kept in a content-keyed cache.

A generator is a trusted Python script of the problem set, run on the host (it is our own code,
not a candidate's) as ``python3 GENERATOR ARGS... INPUT_PATH OUTPUT_PATH``. It must be
deterministic, so its output is cached under a hash of what decides it: the generator's file,
the modules beside it (a generator may import a shared solver) and its arguments. A case is
made once per machine and then read from the cache, whichever run or thread asks first.
"""

from __future__ import annotations

import contextlib
import fcntl
import hashlib
import json
import os
import shutil
import subprocess
import sys
import tempfile
import threading
from pathlib import Path

CACHE_ENV = "ASSAY_CASE_CACHE"
GENERATOR_SECONDS = 600
KEY_VERSION = "assay-generated-case/1"
_locks: dict[str, threading.Lock] = {}
_locks_guard = threading.Lock()


class CaseError(ValueError):
    """A case that cannot be had: an unreadable file or a failing generator (the message names it)."""


def case_cache_dir() -> Path:
    """``ASSAY_CASE_CACHE``, else ``$XDG_CACHE_HOME/assay/cases``, else ``~/.cache/assay/cases``."""
    explicit = os.environ.get(CACHE_ENV)
    if explicit:
        return Path(explicit).expanduser()
    base = os.environ.get("XDG_CACHE_HOME") or str(Path.home() / ".cache")
    return Path(base) / "assay" / "cases"


def generator_digest(generator: Path, args: tuple[str, ...]) -> str:
    """The cache key of a generated case: every ``.py`` file in the generator's folder (names
    and bytes), the generator's name and its arguments."""
    hasher = hashlib.sha256(KEY_VERSION.encode() + b"\0")
    for file in sorted(p for p in generator.parent.glob("*.py") if p.is_file()):
        hasher.update(file.name.encode() + b"\0" + file.read_bytes() + b"\0")
    hasher.update(json.dumps([generator.name, list(args)]).encode())
    return hasher.hexdigest()


def generated_case(generator: Path, args: tuple[str, ...]) -> tuple[Path, Path]:
    """(input path, output path) of a generated case, running the generator on a cache miss."""
    try:
        key = generator_digest(generator, args)
    except OSError as exc:
        raise CaseError(f"{generator}: cannot read the generator: {exc}") from None
    folder = case_cache_dir() / key[:2] / key
    paths = (folder / "input", folder / "output")
    if all(p.is_file() for p in paths):
        return paths
    with _lock_for(key), _file_lock(folder.parent, key):
        if all(p.is_file() for p in paths):  # another thread or process made it meanwhile
            return paths
        _generate(generator, args, folder)
    return paths


def _generate(generator: Path, args: tuple[str, ...], folder: Path) -> None:
    folder.parent.mkdir(parents=True, exist_ok=True)
    scratch = Path(tempfile.mkdtemp(prefix=".making-", dir=folder.parent))
    try:
        command = [sys.executable, str(generator), *args, str(scratch / "input"), str(scratch / "output")]
        # A fixed hash seed: set and dict-of-str orders cannot make two machines' cases differ.
        env = dict(os.environ, PYTHONHASHSEED="0")
        try:
            done = subprocess.run(command, cwd=str(generator.parent), env=env, capture_output=True,
                                  timeout=GENERATOR_SECONDS, stdin=subprocess.DEVNULL)
        except subprocess.TimeoutExpired:
            raise CaseError(f"{generator} {' '.join(args)}: the generator ran over {GENERATOR_SECONDS} s") from None
        except OSError as exc:
            raise CaseError(f"{generator}: cannot run the generator: {exc}") from None
        if done.returncode != 0:
            tail = done.stderr.decode("utf-8", "replace").strip()[-400:]
            raise CaseError(f"{generator} {' '.join(args)}: the generator exited with status {done.returncode}"
                            + (f": {tail}" if tail else ""))
        for name in ("input", "output"):
            if not (scratch / name).is_file():
                raise CaseError(f"{generator} {' '.join(args)}: the generator wrote no {name} file "
                                f"(it is called as GENERATOR ARGS... INPUT_PATH OUTPUT_PATH)")
        for name in ("input", "output"):
            read_case_text(scratch / name)  # a case must be UTF-8 text: say so now, naming the generator
        os.rename(scratch, folder)
    except CaseError as exc:
        raise CaseError(str(exc).replace(str(scratch), "<cache>")) from None
    finally:
        if scratch.exists():
            shutil.rmtree(scratch, ignore_errors=True)


def read_case_text(path: Path) -> str:
    try:
        return path.read_bytes().decode("utf-8")
    except UnicodeDecodeError as exc:
        raise CaseError(f"{path}: not UTF-8 text ({exc.reason} at byte {exc.start})") from None
    except OSError as exc:
        raise CaseError(f"{path}: cannot read the case: {exc.strerror or exc}") from None


def _lock_for(key: str) -> threading.Lock:
    with _locks_guard:
        return _locks.setdefault(key, threading.Lock())


@contextlib.contextmanager
def _file_lock(folder: Path, key: str):
    """An exclusive lock between processes (two runs, or Ray workers, on one machine)."""
    folder.mkdir(parents=True, exist_ok=True)
    with open(folder / f".{key}.lock", "w") as handle:
        fcntl.flock(handle, fcntl.LOCK_EX)
        try:
            yield
        finally:
            fcntl.flock(handle, fcntl.LOCK_UN)
