"""A scoring run: stream the dumps, execute what is missing on a pool, store, summarize.

Resumable by construction: the store knows which samples have verdicts, and the same inputs
always give the same sample keys, so rerunning the command executes only what is missing.
"""

from __future__ import annotations

import concurrent.futures as futures
import datetime as dt
import hashlib
import platform
from dataclasses import dataclass, field
from pathlib import Path

from . import __version__
from .completions import MAX_COMPLETION_BYTES, Reject, key_hash, read_dumps
from .execution import Executor, Verdict
from .metrics import read_rows, summarize
from .problems import ProblemSet
from .progress import Progress
from .runtimes import Runtime
from .sandbox import Sandbox
from .store import MANIFEST, SUMMARY, ResultStore, StoreMismatch


@dataclass
class ScoreOptions:
    dumps: list[Path]
    out: Path
    jobs: int = 2
    mode: str = "continue"
    ks: list[int] = field(default_factory=lambda: [1, 10, 100])
    limit_overrides: dict = field(default_factory=dict)
    max_completion_bytes: int = MAX_COMPLETION_BYTES
    progress: bool = True
    label: str | None = None


@dataclass
class ScoreOutcome:
    summary: dict
    executed: int
    resumed: int
    rejected: int
    interrupted: bool


def now_iso() -> str:
    return dt.datetime.now(dt.timezone.utc).isoformat(timespec="seconds")


def file_sha256(path: Path) -> str:
    hasher = hashlib.sha256()
    with open(path, "rb") as handle:
        for chunk in iter(lambda: handle.read(1 << 20), b""):
            hasher.update(chunk)
    return hasher.hexdigest()


def count_lines(path: Path) -> int:
    count, last = 0, b"\n"
    with open(path, "rb") as handle:
        for chunk in iter(lambda: handle.read(1 << 20), b""):
            count += chunk.count(b"\n")
            last = chunk[-1:]
    return count + (last != b"\n")


def build_manifest(options: ScoreOptions, problems: ProblemSet, runtimes: dict[str, Runtime],
                   sandbox: Sandbox, executor: Executor) -> dict:
    """What identifies the run: inputs, problem set, runtimes, limits, sandbox, harness."""
    runtime_info = {}
    for name, runtime in sorted(runtimes.items()):
        compile_limits, run_limits = executor.limits_for(runtime)
        runtime_info[name] = {
            "digest": runtime.digest,
            "toolchain": runtime.toolchain_version(),
            "limits": {"compile": compile_limits.as_dict() if compile_limits else None, "run": run_limits.as_dict()},
        }
    return {
        "harness_version": __version__,
        "label": options.label,
        "inputs": [{"path": str(p), "sha256": file_sha256(p)} for p in options.dumps],
        "problem_set": {"name": problems.name, "path": str(problems.path), "digest": problems.digest,
                        "problems": len(problems)},
        "mode": options.mode,
        "runtimes": runtime_info,
        "sandbox": sandbox.describe(),
        "limit_overrides": options.limit_overrides,
        "host": {"python": platform.python_version(), "platform": platform.platform()},
    }


IDENTITY_FIELDS = ("inputs", "problem_set", "mode", "limit_overrides")


def check_resumable(previous: dict | None, manifest: dict, out: Path) -> None:
    if previous is None:
        return
    def strip(m: dict) -> dict:
        return {k: ([{"sha256": i["sha256"]} for i in m[k]] if k == "inputs" else m[k]) for k in IDENTITY_FIELDS}
    before, after = strip(previous), strip(manifest)
    changed = [k for k in IDENTITY_FIELDS if before.get(k) != after.get(k)]
    runtime_changed = [
        name for name, info in manifest["runtimes"].items()
        if name in previous.get("runtimes", {}) and previous["runtimes"][name]["digest"] != info["digest"]
    ]
    if runtime_changed:
        changed.append("runtimes (" + ", ".join(runtime_changed) + ")")
    if changed:
        raise StoreMismatch(
            f"{out} holds results of a different run (changed: {', '.join(changed)}); "
            "resuming would mix verdicts. Use a new --out folder."
        )


def score(options: ScoreOptions, problems: ProblemSet, runtimes: dict[str, Runtime], sandbox: Sandbox) -> ScoreOutcome:
    executor = Executor(sandbox, problems, runtimes, options.mode, options.limit_overrides)
    manifest = build_manifest(options, problems, runtimes, sandbox, executor)
    total = sum(count_lines(p) for p in options.dumps)
    with ResultStore(options.out) as store:
        previous = store.read_manifest()
        check_resumable(previous, manifest, options.out)
        done, retried = store.recover()
        manifest["started_at"] = previous["started_at"] if previous else now_iso()
        manifest["resumed_at"] = (previous.get("resumed_at", []) + [now_iso()]) if previous else []
        manifest["finished_at"] = None
        store.write_json(MANIFEST, manifest)
        store.start_writing()

        progress = Progress(total, label=options.label or "scoring", enabled=options.progress)
        counts = {"executed": 0, "resumed": 0, "rejected": 0}
        interrupted = False
        pool = futures.ThreadPoolExecutor(max_workers=options.jobs, thread_name_prefix="assay-worker")
        pending: dict[futures.Future, object] = {}

        def collect(block: bool) -> None:
            finished, _ = futures.wait(pending, timeout=None if block else 0, return_when=futures.FIRST_COMPLETED)
            for future in finished:
                sample = pending.pop(future)
                verdict: Verdict = future.result()
                store.append(verdict.row(sample))
                counts["executed"] += 1
                progress.advance(executed=True, passed=verdict.outcome == "passed")

        try:
            items = read_dumps(options.dumps, set(problems.problems), set(runtimes), options.max_completion_bytes)
            for item in items:
                if isinstance(item, Reject):
                    store.reject(item)
                    counts["rejected"] += 1
                    progress.advance()
                    continue
                if key_hash(*item.key) in done:
                    counts["resumed"] += 1
                    progress.advance()
                    continue
                while len(pending) >= options.jobs * 2:
                    collect(block=True)
                pending[pool.submit(executor.execute, item)] = item
                collect(block=False)
            while pending:
                collect(block=True)
        except KeyboardInterrupt:
            interrupted = True
            for future in list(pending):
                if future.cancel():
                    pending.pop(future)
            while pending:  # let running candidates finish (bounded by their limits) and keep them
                collect(block=True)
        finally:
            pool.shutdown(wait=True, cancel_futures=True)
            progress.finish()

        summary = summarize(read_rows(store.executions_path), options.ks)
        summary["rejected"] = counts["rejected"]
        summary["retried_infra_errors"] = retried
        store.write_json(SUMMARY, summary)
        if not interrupted:
            manifest["finished_at"] = now_iso()
            store.write_json(MANIFEST, manifest)
    return ScoreOutcome(summary, counts["executed"], counts["resumed"], counts["rejected"], interrupted)
