"""A scoring run: stream the dumps, execute what is missing on a pool, store, summarize.

Resumable by construction: the store knows which samples have verdicts, and the same inputs
always give the same sample keys, so rerunning the command executes only what is missing.
"""

from __future__ import annotations

import datetime as dt
import hashlib
import platform
from dataclasses import dataclass, field
from pathlib import Path

from .. import __version__
from ..vocabulary import Reject
from .completions import MAX_COMPLETION_BYTES, read_dumps
from .engines import LocalEngine
from ..vocabulary import LimitOverrides, Verdict
from .execution import Executor
from .programs import ProgramOptions
from ..metrics import summarize
from ..problems import ProblemSet
from ..console import Progress
from ..runtimes import Runtime
from .scheduling import CostModel, interleave
from ..sandbox import Sandbox
from ..store import MANIFEST, SUMMARY, ResultStore, StoreMismatch, read_rows
from .cache import VerdictCache
from .utilisation import CpuMeter
from ..extraction import policy_label


@dataclass
class ScoreOptions:
    dumps: list[Path]
    out: Path
    jobs: int = 2
    mode: str = "continue"
    ks: list[int] = field(default_factory=lambda: [1, 10, 100])
    limit_overrides: LimitOverrides = field(default_factory=LimitOverrides)
    max_completion_bytes: int = MAX_COMPLETION_BYTES
    progress: bool = True
    label: str | None = None
    repeat: int = 1
    cache_dir: Path | None = None
    extract: str = "syntax"
    programs: ProgramOptions = field(default_factory=ProgramOptions)  # kind program: mode, all cases

    def __post_init__(self) -> None:
        self.limit_overrides = LimitOverrides.parse(self.limit_overrides)


@dataclass
class ScoreOutcome:
    summary: dict
    executed: int
    resumed: int
    rejected: int
    interrupted: bool
    shared: int = 0


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
        compile_limits = runtime.step_limits("compile")
        run_limits = runtime.step_limits("run", command_line=executor.limit_overrides)
        runtime_info[name] = {
            "digest": runtime.digest,
            "toolchain": runtime.toolchain_version(),
            # Problems may override run limits further; each verdict's program key includes them.
            "limits": {"compile": compile_limits.as_dict() if compile_limits else None, "run": run_limits.as_dict()},
        }
    return {
        "harness_version": __version__,
        "label": options.label,
        "inputs": [{"path": str(p), "sha256": file_sha256(p)} for p in options.dumps],
        "problem_set": {"name": problems.name, "path": str(problems.path), "digest": problems.digest,
                        "problems": len(problems)},
        "mode": options.mode,
        "extraction": policy_label(options.extract),
        "runtimes": runtime_info,
        "sandbox": sandbox.describe(),
        "limit_overrides": options.limit_overrides.set_fields(),
        "repeat": options.repeat,
        "host": {"python": platform.python_version(), "platform": platform.platform()},
        **program_facts(options, problems, runtimes),
    }


def program_facts(options: ScoreOptions, problems: ProblemSet, runtimes: dict[str, Runtime]) -> dict:
    """For a set with program problems: how they run (``programs``, part of the run's identity)
    and where each language's time limits come from."""
    ids = [pid for pid, kind in problems.kinds.items() if kind == "program"]
    if not ids:
        return {}
    sources = {name: sorted({problems.problems[pid].limit_source(name) for pid in ids}) for name in sorted(runtimes)}
    return {"programs": dict(options.programs.describe(options.mode), problems=len(ids), time_limits=sources)}


# What a candidate is taken to cost, in seconds, until the first ones of its language finish
# (harness/engine/scheduling.py's CostModel): a cold compile is about a second, an interpreted
# candidate tens of milliseconds.
PRIOR_SECONDS = {"compiled": 1.0, "interpreted": 0.1}
IDENTITY_FIELDS = ("inputs", "problem_set", "mode", "extraction", "limit_overrides", "repeat", "programs")


def check_resumable(previous: dict | None, manifest: dict, out: Path) -> None:
    if previous is None:
        return
    def strip(m: dict) -> dict:
        return {k: ([{"sha256": i["sha256"]} for i in m[k]] if k == "inputs" else m.get(k)) for k in IDENTITY_FIELDS}
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


def score(options: ScoreOptions, problems: ProblemSet, runtimes: dict[str, Runtime], sandbox: Sandbox,
          engine_factory=None) -> ScoreOutcome:
    """Score the dumps into ``options.out``. ``engine_factory(executor)`` picks where candidates
    run (default: a local thread pool of ``options.jobs`` workers)."""
    executor = Executor(sandbox, problems, runtimes, options.mode, options.limit_overrides, repeat=options.repeat,
                        extract_policy=options.extract, programs=options.programs)
    engine = engine_factory(executor) if engine_factory else LocalEngine(executor, options.jobs)
    cache = VerdictCache(options.cache_dir)
    manifest = build_manifest(options, problems, runtimes, sandbox, executor)
    manifest["engine"] = engine.describe()
    if "sandbox" in manifest["engine"]:  # the engine's workers judge in sandboxes of their own
        manifest["sandbox"] = manifest["engine"].pop("sandbox")
    total = sum(count_lines(p) for p in options.dumps)
    counts = {"executed": 0, "resumed": 0, "rejected": 0, "shared": 0}
    interrupted = False
    try:
        with ResultStore(options.out) as store:
            previous = store.read_manifest()
            check_resumable(previous, manifest, options.out)
            done, retried = store.recover()
            manifest["started_at"] = previous["started_at"] if previous else now_iso()
            manifest["resumed_at"] = (previous.get("resumed_at", []) + [now_iso()]) if previous else []
            manifest["finished_at"] = None
            store.write_json(MANIFEST, manifest)
            store.start_writing()
            # CPU utilisation of the local workers (engine/utilisation.py); a cluster's is its own.
            meter = CpuMeter(options.jobs) if manifest["engine"].get("engine") == "local" else None
            progress = Progress(total, label=options.label or "scoring", enabled=options.progress,
                                cpu_share=meter.share if meter else None)
            waiting: dict[str, list] = {}  # program key -> samples sharing the execution in flight

            def record(sample_key: tuple, verdict: Verdict, shared: bool, extraction: dict) -> None:
                row = verdict.row(sample_key)
                row["extraction"] = extraction
                if shared:
                    row["shared"] = True
                    counts["shared"] += 1
                store.append(row)
                counts["executed"] += not shared
                progress.advance(executed=True, passed=verdict.outcome == "passed")

            def jobs():
                """One item per input row: a job to run, or None for a row settled on the spot
                (rejected, resumed, or sharing a verdict). Yielding the None too makes every row
                count against the scheduler's look-ahead, which bounds memory."""
                def refusal(problem_id: str, language: str) -> str | None:
                    return runtimes[language].refusal(problems.problems[problem_id])

                for item in read_dumps(options.dumps, set(problems.problems), set(runtimes),
                                       options.max_completion_bytes, refusal):
                    if isinstance(item, Reject):
                        store.reject(item)
                        counts["rejected"] += 1
                        progress.advance()
                        yield None
                        continue
                    if item.key in done:
                        counts["resumed"] += 1
                        progress.advance()
                        yield None
                        continue
                    key = executor.program_key(item)
                    how = executor.extraction(item).record
                    if key in waiting:
                        waiting[key].append((item.key, how))  # not the sample: completions can be large
                        yield None
                        continue
                    cached = cache.get(key)
                    if cached is not None:
                        record(item.key, cached, shared=True, extraction=how)
                        yield None
                        continue
                    waiting[key] = []
                    yield key, item

            def finish(key: str, sample, verdict: Verdict) -> None:
                costs.observe(sample.language, verdict.seconds)
                cache.put(key, verdict)
                record(sample.key, verdict, shared=False, extraction=executor.extraction(sample).record)
                for other, how in waiting.pop(key, []):
                    record(other, verdict, shared=True, extraction=how)

            # Until a language's first candidates finish, a compiled one is taken to cost more.
            costs = CostModel(lambda language: 0.0 if language is None else
                              PRIOR_SECONDS["compiled" if runtimes[language].compile is not None else "interpreted"])
            scheduled = (job for job in interleave(jobs(), group_of=lambda job: job and job[1].language,
                                                   priority_of=costs) if job is not None)
            try:
                for key, sample, verdict in engine.run(scheduled):
                    finish(key, sample, verdict)
            except KeyboardInterrupt:
                interrupted = True
                for key, sample, verdict in engine.drain():
                    finish(key, sample, verdict)
            finally:
                progress.finish()

            summary = summarize(read_rows(store.executions_path), options.ks, kinds=problems.kinds)
            summary["rejected"] = counts["rejected"]
            summary["retried_infra_errors"] = retried
            if meter is not None and (share := meter.share()) is not None:
                summary["cpu_utilisation"] = {"share": round(share, 3), "cores": meter.cores}
            summary["executions"] = {"run": counts["executed"], "shared": counts["shared"],
                                     "saved_share": counts["shared"] / max(1, counts["executed"] + counts["shared"])}
            store.write_json(SUMMARY, summary)
            if not interrupted:
                manifest["finished_at"] = now_iso()
                store.write_json(MANIFEST, manifest)
    finally:
        engine.close()
        cache.close()
    return ScoreOutcome(summary, counts["executed"], counts["resumed"], counts["rejected"], interrupted,
                        counts["shared"])
