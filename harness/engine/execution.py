"""Turning one sample into one verdict: assemble, render, compile, run, judge.

The judge trusts only the driver's results file, whose every record must carry this run's
nonce, and a final ``done`` record; exit status 0 alone never makes a pass.
"""

from __future__ import annotations

import hashlib
import json
import re
import secrets
import signal
import time
from functools import lru_cache

from ..vocabulary import Sample
from ..extraction import Extraction, extract
from .completions import assemble_code, extraction_request
from ..problems import Problem, ProblemSet
from ..runtimes import Runtime
from ..vocabulary import LimitOverrides, Limits, StepResult, Verdict
from ..sandbox.base import Sandbox
from ..sandbox.warm_compilers import ColdCompiler, Compiler, enabled_by_default, warm_compilers
from ..problems.types import JsonObject, loads_reported, show, values_equal
from .programs import (ProgramOptions, checker_runtime_for, limit_note, program_extraction, program_limits,
                       program_verdict, run_program)

DETAIL_CHARS = 500
RESULTS_MAX_BYTES = 4 * 1024 * 1024


class Executor:
    """Runs samples of one problem set with fixed runtimes, mode and limits. Thread-safe."""

    def __init__(
        self,
        sandbox: Sandbox,
        problems: ProblemSet,
        runtimes: dict[str, Runtime],
        mode: str = "continue",
        limit_overrides: LimitOverrides = LimitOverrides(),
        repeat: int = 1,
        infra_retries: int = 3,
        retry_backoff: float = 0.5,
        extract_policy: str = "syntax",
        programs: ProgramOptions | None = None,
        warm: bool | None = None,
    ):
        # Warm compilers (runtime.yaml's compile.warm): on unless warm=False or ASSAY_WARM_COMPILERS=off.
        on = enabled_by_default() if warm is None else warm
        self.compilers = warm_compilers(sandbox) if on and sandbox is not None else None
        self.extract_policy = extract_policy
        self.programs = programs or ProgramOptions()  # how problems of kind program run
        self._checker_runtimes: dict[str, Runtime] = {}
        self._extraction = lru_cache(maxsize=4096)(self._extract_uncached)
        self.sandbox = sandbox
        self.repeat = repeat
        self.infra_retries = infra_retries
        self.retry_backoff = retry_backoff
        self.problems = problems
        self.runtimes = runtimes
        self.mode = mode
        self.limit_overrides = LimitOverrides.parse(limit_overrides)
        self._prompt = lru_cache(maxsize=None)(self._render_prompt)
        self._key_prefix = lru_cache(maxsize=None)(self._key_prefix_uncached)

    def _render_prompt(self, problem_id: str, language: str) -> tuple[str, str]:
        runtime = self.runtimes[language]
        problem = self.problems.problems[problem_id]
        return runtime.render_prompt(problem), runtime.render_preamble(problem)

    def limits_for(self, runtime: Runtime, problem: Problem) -> tuple[Limits | None, Limits]:
        """(compile limits or None, run limits) of ``problem`` in ``runtime``: see
        ``Runtime.step_limits`` for how the layers combine."""
        if problem.kind == "program":
            return program_limits(runtime, problem, self.limit_overrides)
        return (runtime.step_limits("compile"),
                runtime.step_limits("run", problem.limits, self.limit_overrides))

    def extraction(self, sample: Sample) -> Extraction:
        """What of the model's text will run, and the record of how it was chosen."""
        return self._extraction(sample.problem, sample.language, sample.completion)

    def _extract_uncached(self, problem_id: str, language: str, completion: str) -> Extraction:
        prompt, preamble = self._prompt(problem_id, language)
        if self.problems.problems[problem_id].kind == "program":  # extraction decides per kind here
            return program_extraction(self.programs.mode or self.mode, self.runtimes[language], prompt, completion,
                                      self.extract_policy)
        request = extraction_request(self.mode, self.runtimes[language], self.problems.problems[problem_id],
                                     prompt, preamble, completion, self.extract_policy)
        return extract(request)

    def code(self, sample: Sample) -> str:
        """The candidate's source before the driver: what the model's text amounts to."""
        _, preamble = self._prompt(sample.problem, sample.language)
        if self.problems.problems[sample.problem].kind == "program":
            return self.extraction(sample).code  # the program as the model wrote it, no driver
        return assemble_code(self.runtimes[sample.language], self.problems.problems[sample.problem],
                             self.mode, self.extraction(sample), preamble)

    def program(self, sample: Sample, nonce: str, results_file: str) -> str:
        problem = self.problems.problems[sample.problem]
        return self.runtimes[sample.language].render_program(problem, self.code(sample), results_file, nonce)

    def program_key(self, sample: Sample) -> str:
        """Content hash of everything that decides a verdict: runtime and problem set contents,
        the problem, the candidate's code after stop sequences, limits and repeats. Samples
        with equal keys are the same experiment, so one execution serves them all."""
        hasher = self._key_prefix(sample.language, sample.problem).copy()
        # Trailing whitespace is the one edit that changes no program in any language.
        hasher.update(b"\0" + self.code(sample).rstrip().encode("utf-8"))
        return hasher.hexdigest()

    def _key_prefix_uncached(self, language: str, problem_id: str):
        runtime = self.runtimes[language]
        compile_limits, run_limits = self.limits_for(runtime, self.problems.problems[problem_id])
        identity = [runtime.digest, self.problems.digest, problem_id, self.repeat,
                    compile_limits.as_dict() if compile_limits else None, run_limits.as_dict()]
        problem = self.problems.problems[problem_id]
        if problem.kind == "program":  # what else decides its verdict: all cases or not, the checker's runtime
            checker = checker_runtime_for(problem, self.runtimes, self._checker_runtimes)
            identity += [self.programs.all_cases, checker.digest if checker else None]
        return hashlib.sha256(json.dumps(identity).encode())

    def judge_sample(self, sample: Sample) -> Verdict:
        """The verdict to record: infra errors retried with backoff; with ``repeat`` > 1 the
        candidate runs that many times and disagreeing outcomes mark it flaky."""
        verdicts = [self._execute_with_retries(sample) for _ in range(self.repeat)]
        verdict = verdicts[0]
        if self.repeat > 1:
            outcomes = [v.outcome for v in verdicts]
            verdict.extra["repeat_outcomes"] = outcomes
            verdict.extra["flaky"] = len(set(outcomes)) > 1
        return verdict

    def _execute_with_retries(self, sample: Sample) -> Verdict:
        verdict = self.execute(sample)
        for attempt in range(self.infra_retries):
            if verdict.outcome != "infra_error":
                break
            time.sleep(self.retry_backoff * 2**attempt)
            verdict = self.execute(sample)
        return verdict

    def execute(self, sample: Sample) -> Verdict:
        """One execution of one sample, no retries."""
        started = time.monotonic()
        runtime = self.runtimes[sample.language]
        problem = self.problems.problems[sample.problem]
        if problem.kind == "program":
            return self._execute_program(sample, runtime, problem, started)
        total = len(problem.cases)
        nonce = secrets.token_hex(16)
        results_file = f".results-{nonce[:12]}.jsonl"
        try:
            source = self.program(sample, nonce, results_file)
        except Exception as exc:  # a template bug in the runtime, never the candidate's fault
            return Verdict("infra_error", 0, total, 0.0, f"rendering the program failed: {exc}"[:DETAIL_CHARS])
        compile_limits, run_limits = self.limits_for(runtime, problem)
        compile_seconds = 0.0
        try:
            compiler = self.compiler_for(runtime, compile_limits)
            with self.sandbox.workspace(compiler.needs) as space:
                space.write(runtime.source_file, source)
                if runtime.compile:
                    built = compiler.compile(space, runtime.source_file, source, compile_limits)
                    compile_seconds = round(built.wall_seconds, 4)
                    failed = _compile_failure(built, compile_limits, total, started)
                    if failed:
                        failed.compile_seconds = compile_seconds
                        return failed
                ran = space.run(list(runtime.run.command), run_limits, {})
                results = space.read(results_file, RESULTS_MAX_BYTES) or b""
        except Exception as exc:  # the sandbox itself broke: not the candidate's fault
            return Verdict("infra_error", 0, total, _since(started), f"sandbox failure: {exc}"[:DETAIL_CHARS])
        try:
            verdict = judge(problem, runtime, ran, results, nonce, run_limits)
        except Exception as exc:  # a judge bug must cost one sample a loud infra_error, never the run
            return Verdict("infra_error", 0, total, _since(started),
                           _clip(f"judging failed: {type(exc).__name__}: {exc}"))
        verdict.seconds = _since(started)
        verdict.compile_seconds, verdict.run_seconds = compile_seconds, round(ran.wall_seconds, 4)
        if "peak_memory_mb" in ran.extra:
            verdict.extra["peak_memory_mb"] = ran.extra["peak_memory_mb"]
        return verdict

    def _execute_program(self, sample: Sample, runtime: Runtime, problem, started: float) -> Verdict:
        """A whole program, case by case (``programs.py``)."""
        total = len(problem.cases)
        try:
            source = self.code(sample)
            checker = checker_runtime_for(problem, self.runtimes, self._checker_runtimes)
        except Exception as exc:  # a template or runtime folder bug, never the candidate's fault
            return Verdict("infra_error", 0, total, 0.0, _clip(f"preparing the program failed: {exc}"))
        try:
            ran = run_program(self.sandbox, runtime, problem, source, self.limits_for(runtime, problem),
                              self.programs.all_cases, checker,
                              limit_note(problem, runtime.name, self.limit_overrides))
        except Exception as exc:  # the sandbox itself broke: not the candidate's fault
            return Verdict("infra_error", 0, total, _since(started), _clip(f"sandbox failure: {exc}"))
        verdict = program_verdict(ran, total)
        verdict.seconds = _since(started)
        return verdict

    def compiler_for(self, runtime: Runtime, limits: Limits | None) -> Compiler:
        """How ``runtime`` compiles here: its warm compiler when it declares one and this
        sandbox backend runs it, else the cold command (harness/sandbox/warm_compilers.py)."""
        if runtime.compile is None or self.compilers is None:
            return ColdCompiler(runtime.needs, tuple(runtime.compile.command) if runtime.compile else ())
        return self.compilers.prepare(runtime, limits)


def _since(started: float) -> float:
    return round(time.monotonic() - started, 4)


def _compile_failure(built: StepResult, limits: Limits, total: int, started: float) -> Verdict | None:
    if built.infra_error:
        return Verdict("infra_error", 0, total, _since(started), built.infra_error[:DETAIL_CHARS])
    if built.timed_out:
        detail = f"compilation exceeded its time limit ({limits.wall_seconds:g}s)"
    elif built.memory_exceeded:
        detail = f"compilation exceeded its memory limit ({limits.memory_mb} MB)"
    elif built.output_exceeded:
        detail = f"compiler output exceeded {limits.max_output_kb} KB"
    elif built.file_size_exceeded:
        detail = f"compiler wrote a file over {limits.max_file_mb} MB"
    elif built.exit_code != 0:
        detail = _first_error(built.stderr or built.stdout) or f"compiler exited with status {built.exit_code}"
    else:
        return None
    return Verdict("compile_error", 0, total, _since(started), detail)


def parse_results(data: bytes, nonce: str) -> tuple[dict[int, dict], bool]:
    """Case records by index, and whether the driver's ``done`` record arrived. Lines without
    this run's nonce (anything the candidate may have written) are ignored. Values stay in the
    wire format's reading (:func:`loads_reported`) for the judge."""
    records: dict[int, dict] = {}
    done = False
    for line in data.splitlines():
        try:
            parsed = loads_reported(line)
        except (ValueError, RecursionError):
            continue
        if not isinstance(parsed, JsonObject):
            continue
        record = dict(parsed)
        if record.get("nonce") != nonce:
            continue
        if record.get("done") is True:
            done = True
        elif type(record.get("case")) is int:
            records.setdefault(record["case"], record)
    return records, done


def judge(problem: Problem, runtime: Runtime, ran: StepResult, results: bytes, nonce: str, limits: Limits) -> Verdict:
    """Decide the outcome of a finished run from the sandbox's report and the results file."""
    total = len(problem.cases)
    records, done = parse_results(results, nonce)
    passed = 0
    first_failure: Verdict | None = None
    for index, case in enumerate(problem.cases):
        record = records.get(index)
        if record is None:
            break
        if "error" in record:
            if first_failure is None:
                message = show_text(record["error"])
                outcome, how = _error_outcome(runtime, message, ran, limits)
                first_failure = Verdict(outcome, 0, total, 0.0, _clip(f"case {index}: {message}{how}"))
            continue
        if values_equal(case.expected, record.get("value"), problem.returns, problem.tolerance):
            passed += 1
        elif first_failure is None:
            first_failure = Verdict(
                "wrong_answer", 0, total, 0.0,
                _clip(f"case {index}: expected {show(case.expected)}, got {show(record.get('value'))}"),
            )

    def verdict(outcome: str, detail: str) -> Verdict:
        return Verdict(outcome, passed, total, 0.0, _clip(detail))

    if ran.infra_error:
        return verdict("infra_error", ran.infra_error)
    if ran.timed_out:
        return verdict("timeout", f"exceeded the time limit ({limits.wall_seconds:g}s wall, {limits.cpu_seconds:g}s CPU)")
    if ran.memory_exceeded:
        return verdict("memory_limit", f"exceeded the memory limit ({limits.memory_mb} MB)")
    if ran.output_exceeded:
        return verdict("output_limit", f"printed more than {limits.max_output_kb} KB")
    if ran.file_size_exceeded:
        return verdict("output_limit", f"wrote a file larger than {limits.max_file_mb} MB")
    if first_failure is not None:
        first_failure.cases_passed = passed
        return first_failure
    if len(records) < total or not done:
        missing = next((i for i in range(total) if i not in records), total)
        if ran.signal:
            how = f"killed by signal {_signal_name(ran.signal)}"
        elif ran.exit_code and ran.exit_code > 128:
            how = f"killed by signal {_signal_name(ran.exit_code - 128)}"
        else:
            how = f"exited with status {ran.exit_code}"
        where = f"before case {missing} reported" if missing < total else "before the test driver finished"
        stderr = _tail(ran.stderr)
        # A runtime may die of a limit without reporting a case (a fatal out-of-memory abort).
        outcome, marked = _error_outcome(runtime, stderr, ran, limits) if stderr else ("runtime_error", "")
        return verdict(outcome, f"{how} {where}" + (f": {stderr}" if stderr else "") + marked)
    if ran.exit_code != 0:
        return verdict("runtime_error", f"all cases reported, but the program exited with status {ran.exit_code}")
    return verdict("passed", "")


# A limit error message is believed only when the sandbox saw the step use at least this share
# of its memory limit; a runtime's own heap cap (-Xmx and the like) sits below the limit.
MESSAGE_EVIDENCE_SHARE = 0.5


def _error_outcome(runtime: Runtime, message: str, ran: StepResult, limits: Limits) -> tuple[str, str]:
    """The outcome a limit-like error message stands for, and a note for the detail.

    Limits are decided from what the sandbox observed (OOM kills, signals, clocks). A message
    matching the runtime's ``error_patterns`` is only a fallback: any candidate can raise an
    exception that reads like an out-of-memory error. It counts as ``memory_limit`` when the
    observed peak memory backs it, and when the sandbox cannot observe a peak, with the detail
    saying so; with a peak well below the limit it is the candidate's own ``runtime_error``.
    """
    for outcome in ("memory_limit", "timeout", "output_limit"):
        if not any(pattern in message for pattern in runtime.error_patterns.get(outcome, ())):
            continue
        peak = ran.extra.get("peak_memory_mb")
        if outcome != "memory_limit":
            return outcome, " [judged from the error message]"
        if peak is None:
            return outcome, " [judged from the error message: this sandbox reports no peak memory]"
        if peak >= MESSAGE_EVIDENCE_SHARE * limits.memory_mb:
            return outcome, f" [error message backed by a peak of {peak:g} MB]"
        return "runtime_error", f" [reads like an out-of-memory error, but the peak was only {peak:g} MB]"
    return "runtime_error", ""


def _signal_name(number: int) -> str:
    try:
        return signal.Signals(number).name
    except ValueError:
        return str(number)


def show_text(message: object) -> str:
    """An error message from a results line as printable text (lone surrogates escaped)."""
    text = message if isinstance(message, str) else show(message)
    return text.encode("utf-8", "backslashreplace").decode("utf-8")


def _first_error(text: str) -> str:
    """A compiler's output from its first error on: echoed source lines and notes come after
    the message that matters, and the first error is the one that explains the rest."""
    lines = text.strip().splitlines()
    for i, line in enumerate(lines):
        if re.search(r"\w*error\b", line, re.IGNORECASE):  # error, SyntaxError, error TS1109
            return _clip("\n".join(lines[i:]))
    return _clip("\n".join(lines))


def _tail(text: str) -> str:
    text = text.strip()
    return text[-DETAIL_CHARS:] if text else ""


def _clip(text: str) -> str:
    return text if len(text) <= DETAIL_CHARS else text[: DETAIL_CHARS - 3] + "..."
