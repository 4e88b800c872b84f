"""Execution engines: where judged samples run. The scorer hands an engine a stream of
(program key, sample) jobs and receives verdicts as they finish, in any order.

``LocalEngine`` runs them on a thread pool on this machine. Other engines (a cluster) implement
the same three methods and build their executors from an ``ExecutorSpec``.
"""

from __future__ import annotations

import concurrent.futures as futures
from dataclasses import dataclass, field
from pathlib import Path
from typing import Callable, Iterator, Protocol

from ..vocabulary import LimitOverrides, Sample, Verdict
from .execution import Executor
from .programs import ProgramOptions

Job = tuple[str, Sample]


@dataclass(frozen=True)
class ExecutorSpec:
    """A picklable recipe for an Executor, so a worker elsewhere can build the same one."""

    problem_set: str
    runtimes: tuple[str, ...]
    runtime_dirs: tuple[str, ...] = ()
    sandbox: str = "bubblewrap"
    mode: str = "continue"
    limit_overrides: LimitOverrides = field(default_factory=LimitOverrides)
    repeat: int = 1
    programs: ProgramOptions = field(default_factory=ProgramOptions)
    extract_policy: str = "syntax"

    def build(self):
        """(executor, sandbox); the caller closes the sandbox when done."""
        from ..problems import load_problem_set
        from ..runtimes import load_runtime
        from ..sandbox import make_sandbox

        extra = [Path(d) for d in self.runtime_dirs]
        problems = load_problem_set(self.problem_set)
        runtimes = {name: load_runtime(name, extra) for name in self.runtimes}
        sandbox = make_sandbox(self.sandbox)
        sandbox.check()
        executor = Executor(sandbox, problems, runtimes, self.mode, self.limit_overrides, repeat=self.repeat,
                            programs=self.programs, extract_policy=self.extract_policy)
        return executor, sandbox


class Engine(Protocol):
    def run(self, jobs: Iterator[Job]) -> Iterator[tuple[str, Sample, Verdict]]:
        """Pull jobs lazily (bounded in flight) and yield each verdict as it finishes."""

    def drain(self) -> Iterator[tuple[str, Sample, Verdict]]:
        """After an interrupt: drop jobs not started, yield those already running."""

    def close(self) -> None: ...

    def describe(self) -> dict: ...


class LocalEngine:
    """A thread pool: each worker thread drives one sandboxed candidate at a time."""

    def __init__(self, executor: Executor, jobs: int):
        self.executor = executor
        self.workers = jobs
        self.pool = futures.ThreadPoolExecutor(max_workers=jobs, thread_name_prefix="assay-worker")
        self.pending: dict[futures.Future, Job] = {}

    def run(self, jobs: Iterator[Job]) -> Iterator[tuple[str, Sample, Verdict]]:
        exhausted = False
        while not exhausted or self.pending:
            while not exhausted and len(self.pending) < self.workers * 2:
                job = next(jobs, None)
                if job is None:
                    exhausted = True
                else:
                    self.pending[self.pool.submit(self.executor.judge_sample, job[1])] = job
            if self.pending:
                yield from self._collect(block=True)

    def _collect(self, block: bool):
        done, _ = futures.wait(self.pending, timeout=None if block else 0, return_when=futures.FIRST_COMPLETED)
        for future in done:
            key, sample = self.pending.pop(future)
            yield key, sample, future.result()

    def drain(self) -> Iterator[tuple[str, Sample, Verdict]]:
        for future in list(self.pending):
            if future.cancel():
                self.pending.pop(future)
        while self.pending:
            yield from self._collect(block=True)

    def close(self) -> None:
        self.pool.shutdown(wait=True, cancel_futures=True)

    def describe(self) -> dict:
        return {"engine": "local", "workers": self.workers}


# --- the registry: engines by name --------------------------------------------------------------

class EngineError(RuntimeError):
    """An engine cannot start (a missing package, an unreachable cluster, a bad option)."""


@dataclass(frozen=True)
class EngineOptions:
    """What the command line says about where candidates run."""

    jobs: int = 2
    address: str | None = None


EngineFactory = Callable[[Executor], Engine]
_ENGINES: dict[str, Callable[[EngineOptions], EngineFactory]] = {}


def register_engine(name: str, prepare: Callable[[EngineOptions], EngineFactory]) -> None:
    """``prepare(options)`` checks what the engine needs (raising EngineError with a message a
    user can act on) and returns ``factory(executor) -> Engine``."""
    _ENGINES[name] = prepare


def engines() -> tuple[str, ...]:
    return tuple(_ENGINES)


def engine_factory(name: str, options: EngineOptions) -> EngineFactory:
    if name not in _ENGINES:
        raise EngineError(f"--engine must be one of: {', '.join(_ENGINES)} (got {name!r})")
    return _ENGINES[name](options)


def _local(options: EngineOptions) -> EngineFactory:
    if options.address:
        raise EngineError("--address is for --engine ray (a cluster), not the local pool")
    return lambda executor: LocalEngine(executor, options.jobs)


def _ray(options: EngineOptions) -> EngineFactory:
    from .ray import ray_engine_factory

    return ray_engine_factory(options.address)


register_engine("local", _local)
register_engine("ray", _ray)
