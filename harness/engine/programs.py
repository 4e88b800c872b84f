"""Whole-program problems (kind ``program``): one sample to one verdict, case by case.

The program is compiled once, then every case runs as its own process in the same warm
sandbox workspace: the case's input written there under a fresh random name and fed as standard
input, standard output kept whole (up to the output cap), the problem's per-case limits. The
first failing case decides the outcome and, by default, ends the candidate (``all_cases`` runs
them all); ``cases_passed`` counts cases. A custom checker runs in a sandbox of its own, opened
beside the candidate's and never reachable from it: the candidate's output reaches it as a
file the harness writes.
"""

from __future__ import annotations

import contextlib
import secrets
import time
from dataclasses import dataclass, field

from ..extraction import Extraction, ExtractionRequest, extract
from ..problems import CaseError, ProgramProblem
from ..runtimes import Runtime, load_runtime
from ..sandbox.base import Sandbox
from ..vocabulary import LimitOverrides, Limits, StepResult, Verdict
from .checkers import check

CHECKER_DETAIL_CHARS = 200


@dataclass(frozen=True)
class ProgramOptions:
    """How a run treats program problems: ``mode`` (None: the run's ``--mode``) and whether
    every case runs after a failure (``--all-cases``). Recorded in the manifest."""

    mode: str | None = None
    all_cases: bool = False

    def describe(self, run_mode: str) -> dict:
        return {"mode": self.mode or run_mode, "all_cases": self.all_cases}


def program_extraction(mode: str, runtime: Runtime, prompt: str, completion: str, policy: str) -> Extraction:
    """What of the model's text is the program: the single place where extraction treats the
    program kind its own way. A whole program keeps everything, ``main`` included: the syntax
    policy only chooses the block (this language's, with an entry point, parsing cleanly), and a
    continuation keeps the prompt plus the text up to the runtime's program stop sequences."""
    request = ExtractionRequest(mode=mode, completion=completion, prompt=prompt, preamble="", function="",
                                param_count=0, stops=runtime.program.stop_sequences, spec=runtime.extraction,
                                policy=policy, kind="program")
    return extract(request)


def program_limits(runtime: Runtime, problem: ProgramProblem,
                   command_line: LimitOverrides) -> tuple[Limits | None, Limits]:
    """(compile limits or None, per-case run limits): the runtime's program steps, the problem's
    limits with its calibrated time limit for this language on top, then the command line."""
    return (runtime.step_limits("compile", program=True),
            runtime.step_limits("run", problem.run_limits(runtime.name), command_line, program=True))


@dataclass
class CaseRun:
    """How one case ended: ``passed`` or a failing outcome with its detail."""

    index: int
    outcome: str
    detail: str = ""
    wall_seconds: float = 0.0
    cpu_seconds: float | None = None
    peak_memory_mb: float | None = None


@dataclass
class ProgramRun:
    """A candidate's compile and the cases it ran, in order."""

    compile_failure: Verdict | None = None
    compile_seconds: float = 0.0
    cases: list[CaseRun] = field(default_factory=list)


class CheckerFailure(Exception):
    """The set's custom checker failed (not the candidate): the sample is an infra_error."""


class CustomChecker:
    """A set's checker program in a sandbox workspace of its own, compiled once per candidate
    and run once per case as ``CHECKER INPUT EXPECTED ACTUAL``."""

    def __init__(self, sandbox: Sandbox, runtime: Runtime, problem: ProgramProblem, stack: contextlib.ExitStack):
        self.runtime = runtime
        self.limits = runtime.step_limits("run", problem.checker.limits, program=True)
        self.space = stack.enter_context(sandbox.workspace(runtime.needs))
        self.space.write(runtime.program.source_file, problem.checker.program.read_text(encoding="utf-8"))
        if runtime.program.compile is not None:
            limits = runtime.step_limits("compile", program=True)
            built = self.space.run(list(runtime.program.compile.command), limits, {})
            if not built.ok:
                raise CheckerFailure(f"the checker {problem.checker.program.name} does not compile: "
                                     + (built.infra_error or (built.stderr or built.stdout).strip()[-300:]))

    def judge(self, given: str, expected: str, actual: str) -> str | None:
        """None if the checker accepts, else its detail; CheckerFailure when it fails."""
        token = secrets.token_hex(8)
        names = [f"{part}-{token}.txt" for part in ("input", "expected", "actual")]
        for name, text in zip(names, (given, expected, actual)):
            self.space.write(name, text)
        ran = self.space.run(list(self.runtime.program.run.command) + names, self.limits, {})
        said = next(iter(ran.stdout.strip().splitlines()), "").strip()[:CHECKER_DETAIL_CHARS]
        if ran.infra_error:
            raise CheckerFailure(f"the checker's sandbox failed: {ran.infra_error}")
        if ran.timed_out or ran.memory_exceeded or ran.output_exceeded or ran.file_size_exceeded:
            raise CheckerFailure("the checker ran into its own limits")
        if ran.exit_code == 0:
            return None
        if ran.exit_code == 1:
            return said or "rejected by the checker"
        how = f"status {ran.exit_code}" if ran.exit_code is not None else f"signal {ran.signal}"
        tail = ran.stderr.strip()[-300:]
        raise CheckerFailure(f"the checker failed ({how})" + (f": {tail}" if tail else ""))


def run_program(sandbox: Sandbox, runtime: Runtime, problem: ProgramProblem, source: str,
                limits: tuple[Limits | None, Limits], all_cases: bool, checker_runtime: Runtime | None,
                limit_note: str) -> ProgramRun:
    """Compile ``source`` once and run the cases; raises only for sandbox trouble (an
    infra_error for the caller). ``limit_note`` says where the time limit comes from."""
    from .execution import _compile_failure  # execution.py imports this module

    compile_limits, run_limits = limits
    setup = runtime.program
    total = len(problem.cases)
    result = ProgramRun()
    started = time.monotonic()
    with contextlib.ExitStack() as stack:
        space = stack.enter_context(sandbox.workspace(runtime.needs))
        space.write(setup.source_file, source)
        if setup.compile is not None:
            built = space.run(list(setup.compile.command), compile_limits, {})
            result.compile_seconds = round(built.wall_seconds, 4)
            result.compile_failure = _compile_failure(built, compile_limits, total, started)
            if result.compile_failure is not None:
                return result
        checker = None
        for index, case in enumerate(problem.cases):
            try:
                given, expected = case.texts()
            except CaseError as exc:
                result.cases.append(CaseRun(index, "infra_error", f"case {index}: {exc}"))
                break
            name = f".stdin-{secrets.token_hex(8)}"  # unguessable: no earlier case can plant it
            space.write(name, given)
            ran = space.run(list(setup.run.command), run_limits, {}, stdin=name, full_stdout=True)
            outcome, detail = step_outcome(runtime, ran, run_limits, limit_note)
            if outcome == "passed":
                try:
                    if problem.checker.kind == "custom":
                        checker = checker or CustomChecker(sandbox, checker_runtime, problem, stack)
                        detail = checker.judge(given, expected, ran.stdout)
                    else:
                        detail = check(problem.checker, expected, ran.stdout)
                except CheckerFailure as exc:
                    outcome, detail = "infra_error", str(exc)
                else:
                    outcome = "passed" if detail is None else "wrong_answer"
            where = f"case {index}" + (f" ({case.origin})" if case.origin != "inline" else "")
            result.cases.append(CaseRun(index, outcome, f"{where}: {detail}" if detail else "",
                                        round(ran.wall_seconds, 4), ran.extra.get("cpu_seconds"),
                                        ran.extra.get("peak_memory_mb")))
            if outcome == "infra_error" or (outcome != "passed" and not all_cases):
                break
    return result


def step_outcome(runtime: Runtime, ran: StepResult, limits: Limits, limit_note: str) -> tuple[str, str]:
    """The outcome of one case's run before its output is checked: ``passed`` means it ended
    normally and its output is to be judged."""
    from .execution import _error_outcome, _signal_name

    if ran.infra_error:
        return "infra_error", ran.infra_error
    if ran.timed_out:
        return "timeout", (f"exceeded the time limit ({limits.wall_seconds:g}s wall, {limits.cpu_seconds:g}s CPU; "
                           f"{limit_note})")
    if ran.memory_exceeded:
        return "memory_limit", f"exceeded the memory limit ({limits.memory_mb} MB)"
    if ran.output_exceeded:
        return "output_limit", f"printed more than {limits.max_output_kb} KB"
    if ran.file_size_exceeded:
        return "output_limit", f"wrote a file larger than {limits.max_file_mb} MB"
    if ran.signal or ran.exit_code != 0:
        # The program is exec'd, never run by a shell: a status over 128 is its own (Perl's die
        # exits 255), not a shell's report of a signal.
        how = f"killed by signal {_signal_name(ran.signal)}" if ran.signal else f"exited with status {ran.exit_code}"
        stderr = head_and_tail(ran.stderr)
        outcome, marked = _error_outcome(runtime, stderr, ran, limits) if stderr else ("runtime_error", "")
        return outcome, how + (f": {stderr}" if stderr else "") + marked
    return "passed", ""


def head_and_tail(text: str, head: int = 200, tail: int = 250) -> str:
    """An error output for a detail: its start and its end. Where the message stands differs by
    language (Python's at the end of a traceback, Java's and Node's at the top)."""
    text = text.strip()
    return text if len(text) <= head + tail + 5 else f"{text[:head]} ... {text[-tail:]}"


def program_verdict(run: ProgramRun, total: int) -> Verdict:
    """The verdict of a finished ProgramRun (``seconds`` is the caller's to set)."""
    from .execution import _clip

    if run.compile_failure is not None:
        run.compile_failure.compile_seconds = run.compile_seconds
        return run.compile_failure
    passed = sum(case.outcome == "passed" for case in run.cases)
    failed = next((case for case in run.cases if case.outcome != "passed"), None)
    if failed is None and len(run.cases) < total:  # cannot happen: every case ran or one failed
        failed = CaseRun(len(run.cases), "infra_error", "the cases stopped early")
    verdict = Verdict(failed.outcome if failed else "passed", passed, total, 0.0,
                      _clip(failed.detail) if failed else "")
    verdict.compile_seconds = run.compile_seconds
    verdict.run_seconds = round(sum(case.wall_seconds for case in run.cases), 4)
    verdict.extra["cases_run"] = len(run.cases)
    if run.cases:
        verdict.extra["slowest_case_seconds"] = max(case.wall_seconds for case in run.cases)
    peaks = [case.peak_memory_mb for case in run.cases if case.peak_memory_mb is not None]
    if peaks:
        verdict.extra["peak_memory_mb"] = max(peaks)
    return verdict


def checker_runtime_for(problem: ProgramProblem, runtimes: dict[str, Runtime], loaded: dict) -> Runtime | None:
    """The runtime a custom checker runs in (the run's own, else loaded once by name)."""
    if problem.checker.kind != "custom":
        return None
    language = problem.checker.language
    if language not in runtimes and language not in loaded:
        loaded[language] = load_runtime(language)
    return runtimes.get(language) or loaded[language]


def limit_note(problem: ProgramProblem, language: str, command_line: LimitOverrides) -> str:
    """Where the time limit of a case comes from, for a timeout's detail."""
    if command_line.wall_seconds is not None or command_line.cpu_seconds is not None:
        return "set on the command line"
    source = problem.limit_source(language)
    return f"{source} for {language}" if source == "calibrated" else source
