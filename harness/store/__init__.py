"""Results folders on disk: writing one safely while scoring (``results``: lock, append-only
verdicts, crash repair), and loading a finished one for analysis (``runs``). Loads neither
runtimes nor sandboxes."""

from .keys import SampleKeySet
from .results import (EXECUTIONS, MANIFEST, REJECTS, SUMMARY, ResultStore, StoreBusy, StoreMismatch,
                      StoreWriteError, read_rows)
from .runs import Run, RunError, load_run

__all__ = ["EXECUTIONS", "MANIFEST", "REJECTS", "SUMMARY", "ResultStore", "Run", "RunError", "SampleKeySet",
           "StoreBusy", "StoreMismatch", "StoreWriteError", "load_run", "read_rows"]
