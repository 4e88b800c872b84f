"""The Ray engine: candidates judged as Ray tasks on a cluster's nodes, verdicts streamed back.

The driver keeps everything stateful (dump reading, dedup, the store, the summary), so resume,
rejects and sharing behave exactly as on one machine. A worker process builds its Executor
once from an ``ExecutorSpec`` and checks that its node sees the same harness version, problem
set and runtimes as the driver: program keys are computed on the driver, so a node with other
files would hand back verdicts for different programs without anyone noticing.

A lost worker or node is Ray's to handle: its tasks are rerun elsewhere (``max_retries``).
Each task has one result, so the driver records every job exactly once.

Ray is an optional extra, imported only when this engine is chosen.
"""

from __future__ import annotations

import atexit
import logging
import os
import socket
import time
from dataclasses import dataclass
from typing import Iterator

from .. import __version__
from ..vocabulary import Sample
from .engines import EngineError, ExecutorSpec, Job
from ..vocabulary import Verdict
from .execution import Executor
from ..locations import bundled_dir

RAY_MISSING = ("--engine ray needs the Ray package, which is not installed: "
               "pip install 'assay-harness[ray]' (or: pip install ray)")
MAX_RETRIES = 5            # reruns of a task whose worker process or node died
WINDOW_PER_CPU = 2         # tasks in flight per cluster CPU: one running, one queued
WINDOW_REFRESH_SECONDS = 10.0
DRAIN_SECONDS = 120.0      # after Ctrl-C, how long running candidates may take to report
WORKER_PROBE_SECONDS = 120  # a worker's first task builds its executor (and sandbox)


class RayEngineError(EngineError):
    """The cluster cannot judge candidates: unreachable, or a node set up unlike the driver."""


class NodeMismatch(RuntimeError):
    """Raised on a worker whose node cannot build the driver's executor."""


@dataclass(frozen=True)
class Identity:
    """What the driver's executor is made of; every worker must build the same."""

    harness_version: str
    problem_set: str
    problem_set_digest: str
    runtime_digests: tuple[tuple[str, str], ...]


def import_ray():
    try:
        import ray
    except ImportError:
        raise RayEngineError(RAY_MISSING) from None
    return ray


def spec_for(executor: Executor) -> ExecutorSpec:
    """The recipe a worker follows to rebuild ``executor``. Bundled problem sets and runtimes go
    by name (each node uses its own installation's copy); others by absolute path."""
    problems_path = executor.problems.path.resolve()
    bundled_sets = bundled_dir("problem_sets").resolve()
    problem_set = problems_path.name if problems_path.parent == bundled_sets else str(problems_path)
    bundled_runtimes = bundled_dir("runtimes").resolve()
    runtime_dirs: list[str] = []
    for runtime in executor.runtimes.values():
        parent = runtime.path.resolve().parent
        if parent != bundled_runtimes and str(parent) not in runtime_dirs:
            runtime_dirs.append(str(parent))
    return ExecutorSpec(problem_set=problem_set, runtimes=tuple(sorted(executor.runtimes)),
                        runtime_dirs=tuple(runtime_dirs), sandbox=executor.sandbox.name, mode=executor.mode,
                        limit_overrides=executor.limit_overrides, repeat=executor.repeat,
                        programs=executor.programs, extract_policy=executor.extract_policy)


def identity_of(executor: Executor) -> Identity:
    return Identity(__version__, str(executor.problems.path), executor.problems.digest,
                    tuple(sorted((name, r.digest) for name, r in executor.runtimes.items())))


def mismatches(executor: Executor, expected: Identity) -> list[str]:
    """How this node's executor differs from the driver's (empty when it is the same)."""
    mine = identity_of(executor)
    found = []
    if mine.harness_version != expected.harness_version:
        found.append(f"harness version {mine.harness_version} (driver: {expected.harness_version})")
    if mine.problem_set_digest != expected.problem_set_digest:
        found.append(f"problem set at {mine.problem_set} has digest {mine.problem_set_digest[:12]} "
                     f"(driver: {expected.problem_set_digest[:12]} at {expected.problem_set})")
    theirs = dict(expected.runtime_digests)
    for name, digest in mine.runtime_digests:
        if theirs.get(name) != digest:
            found.append(f"runtime {name!r} has digest {digest[:12]} (driver: {str(theirs.get(name))[:12]})")
    return found


# Worker side: one executor per worker process, built by its first task and reused.
_built: tuple[ExecutorSpec, Identity, Executor] | None = None


def worker_executor(spec: ExecutorSpec, expected: Identity) -> Executor:
    global _built
    if _built is not None and _built[0] == spec and _built[1] == expected:
        return _built[2]
    where = f"node {socket.gethostname()}"
    try:
        executor, sandbox = spec.build()
    except Exception as exc:  # a missing sandbox, toolchain, problem set or runtime folder
        raise NodeMismatch(f"{where} cannot build the executor: {exc}") from None
    atexit.register(sandbox.close)
    differences = mismatches(executor, expected)
    if differences:
        sandbox.close()
        raise NodeMismatch(f"{where} is set up unlike the driver: " + "; ".join(differences)
                           + ". Every node needs the same harness, problem sets and runtimes (docs/scale.md).")
    _built = (spec, expected, executor)
    return executor


def describe_worker_sandbox(plan: tuple[ExecutorSpec, Identity]) -> dict:
    """A worker's own sandbox description, with the node that gave it."""
    facts = dict(worker_executor(*plan).sandbox.describe())
    facts["described_by"] = f"a worker on {socket.gethostname()}"
    return facts


def judge_on_worker(plan: tuple[ExecutorSpec, Identity], sample: Sample) -> Verdict:
    """The Ray task: judge one candidate with this worker process's executor."""
    return worker_executor(*plan).judge_sample(sample)


def lost_verdict(error: Exception, attempts: int) -> Verdict:
    """Ray gave up rerunning the task: not the candidate's doing, so an infra error, which the
    summary leaves out and the next run retries."""
    detail = f"the Ray worker judging this candidate was lost {attempts} time(s): {type(error).__name__}"
    return Verdict("infra_error", 0, 0, 0.0, detail)


def reachable_or_fail(address: str | None, seconds: float = 10.0) -> None:
    """Fail fast on a ``host:port`` nobody answers at: Ray itself retries for minutes."""
    if not address or address in ("auto", "local") or "://" in address or ":" not in address:
        return
    host, _, port = address.rpartition(":")
    try:
        with socket.create_connection((host.strip("[]"), int(port)), timeout=seconds):
            pass
    except (OSError, ValueError) as exc:
        raise RayEngineError(f"cannot reach the Ray cluster at {address}: {exc}. Is 'ray start --head' "
                             "running there, and is this the port it printed?") from None


class RayEngine:
    """Ray tasks, at most ``WINDOW_PER_CPU`` per cluster CPU in flight, results as they finish."""

    def __init__(self, spec: ExecutorSpec, expected: Identity, address: str | None = None,
                 max_retries: int = MAX_RETRIES):
        ray = import_ray()
        self.ray = ray
        self.address = address
        self.max_retries = max_retries
        self.owns_connection = not ray.is_initialized()
        if self.owns_connection:
            reachable_or_fail(address or os.environ.get("RAY_ADDRESS"))
            try:
                ray.init(address=address, logging_level=logging.WARNING, log_to_driver=False)
            except (ConnectionError, RuntimeError, ValueError) as exc:
                where = address or "this machine"
                raise RayEngineError(f"cannot connect to the Ray cluster at {where}: {exc}") from None
        self.task = ray.remote(num_cpus=1, max_retries=max_retries, retry_exceptions=False)(judge_on_worker)
        self.spec = spec
        self.plan = ray.put((spec, expected))
        self.pending: dict = {}  # ObjectRef -> Job, in submission order
        self._window, self._window_at = 0, 0.0

    def window(self) -> int:
        """Jobs in flight: twice the cluster's CPUs, rechecked now and then as nodes come and go."""
        now = time.monotonic()
        if now - self._window_at > WINDOW_REFRESH_SECONDS:
            cpus = int(self.ray.cluster_resources().get("CPU", 0))
            self._window, self._window_at = max(2, WINDOW_PER_CPU * cpus), now
        return self._window

    def run(self, jobs: Iterator[Job]) -> Iterator[tuple[str, Sample, Verdict]]:
        exhausted = False
        while not exhausted or self.pending:
            limit = self.window()
            while not exhausted and len(self.pending) < limit:
                job = next(jobs, None)
                if job is None:
                    exhausted = True
                else:
                    self.pending[self.task.remote(self.plan, job[1])] = job
            if self.pending:
                yield from self._collect(timeout=None, draining=False)

    def _collect(self, timeout: float | None, draining: bool):
        refs = list(self.pending)
        ready, rest = self.ray.wait(refs, num_returns=1, timeout=timeout)
        if ready and rest:
            ready += self.ray.wait(rest, num_returns=len(rest), timeout=0)[0]
        for ref in ready:
            key, sample = self.pending.pop(ref)
            try:
                verdict = self.ray.get(ref)
            except self.ray.exceptions.RayTaskError as exc:
                if draining:
                    continue
                raise RayEngineError(str(getattr(exc, "cause", None) or exc)) from None
            except self.ray.exceptions.RayError as exc:
                if draining:  # cancelled, or lost while stopping: the next run does it again
                    continue
                verdict = lost_verdict(exc, self.max_retries + 1)
            yield key, sample, verdict

    def drain(self) -> Iterator[tuple[str, Sample, Verdict]]:
        """Cancel what is probably still queued (the newest submissions beyond one per CPU) and
        collect the rest; whatever cannot report within ``DRAIN_SECONDS`` is dropped."""
        running = max(1, self.window() // WINDOW_PER_CPU)
        for ref in list(self.pending)[running:]:
            self.ray.cancel(ref, force=False)
        deadline = time.monotonic() + DRAIN_SECONDS
        while self.pending and time.monotonic() < deadline:
            yield from self._collect(timeout=max(0.0, deadline - time.monotonic()), draining=True)
        self._cancel_pending()

    def _cancel_pending(self) -> None:
        for ref in self.pending:
            try:
                self.ray.cancel(ref, force=False)
            except Exception:  # already finished or its worker is gone: nothing left to stop
                pass
        self.pending.clear()

    def close(self) -> None:
        self._cancel_pending()
        if self.owns_connection and self.ray.is_initialized():
            self.ray.shutdown()

    def describe(self) -> dict:
        nodes = [n for n in self.ray.nodes() if n.get("Alive")]
        try:
            address = self.ray.get_runtime_context().gcs_address
        except AttributeError:
            address = self.address or "local"
        return {"engine": "ray", "address": address, "ray_version": self.ray.__version__,
                "nodes": len(nodes), "cpus": int(self.ray.cluster_resources().get("CPU", 0)),
                "in_flight": self.window(), "max_retries": self.max_retries, "sandbox": self.worker_sandbox()}

    def worker_sandbox(self) -> dict:
        """The sandbox the workers judge in, as one worker describes its own: the driver's
        sandbox never runs a candidate under this engine, so the manifest records this one."""
        probe = self.ray.remote(num_cpus=1, max_retries=0)(describe_worker_sandbox)
        try:
            facts = self.ray.get(probe.remote(self.plan), timeout=WORKER_PROBE_SECONDS)
        except Exception as exc:  # a node that cannot build the executor fails every task anyway
            return {"name": self.spec.sandbox, "described_by": "the driver's request only",
                    "probe_error": f"{type(exc).__name__}: {exc}"[:300]}
        return facts


def ray_engine_factory(address: str | None):
    """``engine_factory`` for ``scoring.score``. Imports Ray now, so a missing package is
    reported before any dump is read, and so is an address nobody answers at."""
    import_ray()
    reachable_or_fail(address or os.environ.get("RAY_ADDRESS"))

    def factory(executor: Executor) -> RayEngine:
        return RayEngine(spec_for(executor), identity_of(executor), address)

    return factory
