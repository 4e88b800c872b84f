"""The output folder of a scoring run: verdicts, rejects, manifest, summary.

One process at a time may write a folder (an exclusive file lock). Verdicts are appended and
flushed one row at a time, so a crash loses at most the row being written; on reopening, a
torn last line is cut off and rows of infra errors are dropped so they get retried.
"""

from __future__ import annotations

import json
import os
from pathlib import Path
from typing import Iterable

from filelock import FileLock, Timeout

from ..vocabulary import Reject
from .keys import SampleKeySet

EXECUTIONS = "executions.jsonl"
REJECTS = "rejects.jsonl"
MANIFEST = "manifest.json"
SUMMARY = "summary.json"
LOCK = ".assay.lock"


class StoreBusy(RuntimeError):
    pass


class StoreMismatch(RuntimeError):
    pass


class StoreWriteError(RuntimeError):
    """The results folder cannot take more writes (disk full, I/O error): the machinery's
    fault, never a candidate's. What was written stays; the same command resumes."""


class ResultStore:
    def __init__(self, out_dir: Path):
        self.dir = Path(out_dir)
        self.executions_path = self.dir / EXECUTIONS
        self.rejects_path = self.dir / REJECTS
        self._lock = FileLock(str(self.dir / LOCK))
        self._executions = None
        self._rejects = None

    def __enter__(self) -> "ResultStore":
        self.dir.mkdir(parents=True, exist_ok=True)
        try:
            self._lock.acquire(timeout=0)
        except Timeout:
            raise StoreBusy(
                f"{self.dir} is in use by another 'assay score' (lock {self.dir / LOCK}); "
                "wait for it to finish or choose another --out"
            ) from None
        return self

    def __exit__(self, *exc) -> None:
        for handle in (self._executions, self._rejects):
            if handle:
                try:
                    handle.flush()
                    os.fsync(handle.fileno())
                except OSError:
                    pass  # already reported by the failed write; recover() repairs a torn tail
                finally:
                    try:
                        handle.close()
                    except OSError:
                        pass
        self._lock.release()

    def read_manifest(self) -> dict | None:
        path = self.dir / MANIFEST
        return json.loads(path.read_text()) if path.exists() else None

    def write_json(self, name: str, data: dict) -> None:
        """Write atomically: a reader never sees half a manifest or summary."""
        target = self.dir / name
        temporary = target.with_suffix(".tmp")
        temporary.write_text(json.dumps(data, indent=2, ensure_ascii=False) + "\n", encoding="utf-8")
        os.replace(temporary, target)

    def recover(self) -> tuple[SampleKeySet, int]:
        """Keys of samples already judged, and how many rows were dropped for retry.

        Repairs the file in place: a torn or unreadable line (a crash mid-write) is removed,
        and so are infra_error rows, which the coming run retries.
        """
        done = SampleKeySet()
        if not self.executions_path.exists():
            return done, 0
        kept, dropped, rewrite = [], 0, False
        with open(self.executions_path, "rb") as handle:
            data = handle.read()
        lines = data.split(b"\n")
        if lines and lines[-1] == b"":
            lines.pop()
        else:
            rewrite = True  # the last line has no newline: torn
        for raw in lines:
            try:
                row = json.loads(raw)
                key = (row["problem"], row["language"], row["sample"])
                if not isinstance(key[2], int):
                    raise TypeError("sample index must be an integer")
            except (ValueError, KeyError, TypeError):
                rewrite, dropped = True, dropped + 1
                continue
            if row.get("outcome") == "infra_error" or key in done:
                rewrite, dropped = True, dropped + 1
                continue
            done.add(key)
            kept.append(raw)
        if rewrite:
            temporary = self.executions_path.with_suffix(".tmp")
            with open(temporary, "wb") as handle:
                for raw in kept:
                    handle.write(raw + b"\n")
                handle.flush()
                os.fsync(handle.fileno())
            os.replace(temporary, self.executions_path)
        return done, dropped

    def start_writing(self) -> None:
        """Open verdicts for appending; rejects are rebuilt from the inputs on every run."""
        self._executions = open(self.executions_path, "a", encoding="utf-8")
        self._rejects = open(self.rejects_path, "w", encoding="utf-8")

    def append(self, row: dict) -> None:
        self._write(self._executions, row)

    def reject(self, reject: Reject) -> None:
        self._write(self._rejects, reject.as_dict())

    def _write(self, handle, data: dict) -> None:
        try:
            # ASCII escapes: a candidate's output may hold lone surrogates, which no UTF-8 file takes.
            handle.write(json.dumps(data, ensure_ascii=True) + "\n")
            handle.flush()
        except OSError as exc:
            raise StoreWriteError(
                f"cannot write to {handle.name}: {exc.strerror or exc}. Verdicts already written are kept; "
                "free space (or fix the disk) and run the same command again to resume."
            ) from None


def read_rows(path: Path) -> Iterable[dict]:
    with open(path, encoding="utf-8") as handle:
        for line in handle:
            if line.strip():
                yield json.loads(line)
