"""Verdicts keyed by program content, so an identical program is executed once.

Low-temperature samples repeat themselves; within a run an in-memory LRU shares verdicts, and
an optional folder (``--cache DIR``) carries them across runs and checkpoints. The folder is a
SQLite database in WAL mode, which is safe with several writers at once (concurrent runs, or
machines sharing a file system that supports POSIX locks).
"""

from __future__ import annotations

import json
import sqlite3
import threading
from collections import OrderedDict
from pathlib import Path

from ..vocabulary import Verdict

UNCACHEABLE = {"infra_error"}


class VerdictCache:
    def __init__(self, folder: Path | None = None, memory_entries: int = 200_000):
        self.memory: OrderedDict[str, Verdict] = OrderedDict()
        self.memory_entries = memory_entries
        self._lock = threading.Lock()
        self.db = None
        if folder is not None:
            folder.mkdir(parents=True, exist_ok=True)
            self.db = sqlite3.connect(str(folder / "verdicts.sqlite"), timeout=60, check_same_thread=False)
            self.db.execute("PRAGMA journal_mode=WAL")
            self.db.execute("PRAGMA synchronous=NORMAL")
            self.db.execute("CREATE TABLE IF NOT EXISTS verdicts (key TEXT PRIMARY KEY, verdict TEXT NOT NULL)")
            self.db.commit()

    def get(self, key: str) -> Verdict | None:
        with self._lock:
            verdict = self.memory.get(key)
            if verdict is not None:
                self.memory.move_to_end(key)
                return verdict
            if self.db is None:
                return None
            row = self.db.execute("SELECT verdict FROM verdicts WHERE key = ?", (key,)).fetchone()
        if row is None:
            return None
        verdict = Verdict(**json.loads(row[0]))
        self._remember(key, verdict)
        return verdict

    def put(self, key: str, verdict: Verdict) -> None:
        if verdict.outcome in UNCACHEABLE:
            return
        self._remember(key, verdict)
        if self.db is not None:
            data = json.dumps({"outcome": verdict.outcome, "cases_passed": verdict.cases_passed,
                               "cases_total": verdict.cases_total, "seconds": verdict.seconds,
                               "detail": verdict.detail, "extra": verdict.extra})
            with self._lock:
                self.db.execute("INSERT OR IGNORE INTO verdicts (key, verdict) VALUES (?, ?)", (key, data))
                self.db.commit()

    def _remember(self, key: str, verdict: Verdict) -> None:
        with self._lock:
            self.memory[key] = verdict
            self.memory.move_to_end(key)
            while len(self.memory) > self.memory_entries:
                self.memory.popitem(last=False)

    def close(self) -> None:
        if self.db is not None:
            self.db.close()
