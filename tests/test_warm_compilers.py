"""Warm compilers (compile.warm in runtime.yaml, harness/sandbox/warm_compilers.py) reach the
verdicts the cold path reaches.

The reference for every comparison is the toolchain's own command-line compiler (javac, tsc,
g++) run cold, as the runtime's compile.command, in the same sandbox backend: a warm verdict
must equal the cold one in outcome, cases passed and detail, compile errors' messages
included. The default run compares a representative subset (references, and every wrong
program of checks.yaml that fails to compile); the full comparison (the conformance and core
references and every checks.yaml entry, per language) is marked slow and runs when
ASSAY_WARM_FULL=1 is set, as it takes minutes.
"""

from __future__ import annotations

import concurrent.futures as futures
import dataclasses
import os
import re
import shutil
import tempfile
import time
from pathlib import Path

import pytest

from harness.engine.checks import load_wrong_candidates
from harness.engine.execution import Executor
from harness.problems import load_problem_set
from harness.runtimes import indent_lines, load_runtime
from harness.runtimes.runtime import RuntimeConfigError, parse_runtime
from harness.sandbox import make_sandbox
from harness.sandbox.warm_compilers import PreparedCompiler, ServerCompiler
from harness.vocabulary import LimitOverrides, Sample

WARM_LANGUAGES = ("java", "typescript", "cpp", "csharp", "go")


def installed(language: str):
    runtime = load_runtime(language)
    if runtime.toolchain_version() is None:
        pytest.skip(f"the {language} toolchain is not installed")
    return runtime


@pytest.fixture(scope="module")
def box():
    sandbox = make_sandbox("bubblewrap")
    sandbox.check()
    yield sandbox
    sandbox.close()


def references(runtime, set_name: str) -> list[Sample]:
    problems = load_problem_set(set_name)
    return [Sample(p.id, runtime.name, 0, runtime.reference_completion(p), f"reference {set_name}", 0)
            for p in problems.problems.values() if runtime.reference(p) is not None and runtime.refusal(p) is None]


def wrong_programs(runtime, expect: str | None = None) -> list[Sample]:
    return [Sample(e["problem"], runtime.name, 0, indent_lines(e["completion"], runtime.reference_indent) + "\n",
                   f"checks.yaml: {e['name']}", 0)
            for e in load_wrong_candidates(runtime) if expect is None or e["expect"] == expect]


def shown(verdict) -> tuple:
    # A peak measured in a run is no part of what a program means, nor are the stack addresses a
    # Go traceback prints as a function's arguments (they vary from run to run of one binary);
    # everything else must match.
    detail = re.sub(r"peak (of|was only) [\d.]+ MB", "peak", verdict.detail)
    detail = re.sub(r"goroutine \d+ \[", "goroutine [", detail)  # numbered in the order they start
    return verdict.outcome, verdict.cases_passed, re.sub(r"\b0x[0-9a-f]+\??", "0x", detail)


def compare(box, runtime, set_name: str, samples: list[Sample], jobs: int = 2, mode: str = "continue") -> list:
    problems = load_problem_set(set_name)
    cold = Executor(box, problems, {runtime.name: runtime}, mode=mode, warm=False, infra_retries=0)
    warm = Executor(box, problems, {runtime.name: runtime}, mode=mode, warm=True, infra_retries=0)
    compiler = warm.compilers.prepare(runtime, runtime.step_limits("compile"), servers=jobs)
    used_before = getattr(compiler, "warm_compiles", 0)
    with futures.ThreadPoolExecutor(max_workers=jobs) as pool:
        cold_verdicts = list(pool.map(cold.execute, samples))
        warm_verdicts = list(pool.map(warm.execute, samples))
    differences = [(s.source, s.problem, shown(c), shown(w))
                   for s, c, w in zip(samples, cold_verdicts, warm_verdicts) if shown(c) != shown(w)]
    assert differences == []
    assert not any(v.outcome == "infra_error" for v in warm_verdicts)
    if isinstance(compiler, ServerCompiler):  # the servers compiled them, not the cold fallback
        assert compiler.warm_compiles - used_before >= len(samples) // 2
    else:
        assert isinstance(compiler, PreparedCompiler) and compiler.command is not None, compiler.describe()
    return warm_verdicts


@pytest.mark.parametrize("language", WARM_LANGUAGES)
def test_warm_verdicts_equal_cold_ones_on_a_representative_subset(box, language):
    runtime = installed(language)
    # A reference, and every wrong program that fails to compile: their messages must match.
    samples = references(runtime, "conformance")[:1] + wrong_programs(runtime, "compile_error")
    compare(box, runtime, "conformance", samples)


@pytest.mark.slow
@pytest.mark.skipif(os.environ.get("ASSAY_WARM_FULL") != "1",
                    reason="about 5 minutes on 2 cores: set ASSAY_WARM_FULL=1 (kept out of CI's time)")
@pytest.mark.parametrize("language", WARM_LANGUAGES)
def test_warm_verdicts_equal_cold_ones_on_every_reference_and_wrong_program(box, language):
    runtime = installed(language)
    compare(box, runtime, "conformance", references(runtime, "conformance") + wrong_programs(runtime))
    compare(box, runtime, "core", references(runtime, "core"))


def test_a_typescript_server_sees_no_host_files(box):
    """A module the host has and the sandboxes lack (/var is not bound into them): tsc run cold
    in the candidate's sandbox cannot find it, and neither can the compile server in its own."""
    runtime = installed("typescript")
    folder = Path(tempfile.mkdtemp(prefix="assay-host-only-", dir="/var/tmp"))
    try:
        os.chmod(folder, 0o755)
        (folder / "harbour_lib.ts").write_text("export const berths: bigint = 4n;\n", encoding="utf-8")
        completion = (f'  const lib: typeof import("{folder}/harbour_lib") | undefined = undefined;\n'
                      "  return value + (lib ? lib.berths : 0n);\n}\n")
        sample = Sample("pass_int", "typescript", 0, completion, "host file", 0)
        verdicts = compare(box, runtime, "conformance", [sample, sample])
        # tsc's error for a module it cannot resolve (TS2307), from memory.
        assert verdicts[0].outcome == "compile_error" and "TS2307" in verdicts[0].detail, verdicts[0].detail
    finally:
        shutil.rmtree(folder, ignore_errors=True)


GO_ANSWERS = {
    # A run-time panic: its message and stack trace come from the runtime's own tables, which
    # the warm path's linker flags (-s -w: no symbol table, no DWARF) keep.
    "panics": "package main\n\nfunc passInt(value int64) int64 {\n\tvar berths []int64\n"
              "\treturn berths[value]\n}\n",
    # cgo, which only the go command runs: the warm path hands it to go build.
    "imports C": "package main\n\n// static long long twice(long long v) { return v; }\nimport \"C\"\n\n"
                 "func passInt(value int64) int64 {\n\treturn int64(C.twice(C.longlong(value)))\n}\n",
    "imports C in a group": "package main\n\nimport (\n\t\"C\"\n)\n\n"
                            "func passInt(value int64) int64 {\n\treturn value\n}\n",
    "local import": "package main\n\nimport \"./quay\"\n\nfunc passInt(value int64) int64 {\n"
                    "\treturn quay.Berth(value)\n}\n",
}


@pytest.mark.parametrize("answer", GO_ANSWERS)
def test_go_answers_the_go_command_would_treat_apart_get_the_cold_verdicts(box, answer):
    runtime = installed("go")
    sample = Sample("pass_int", "go", 0, GO_ANSWERS[answer], answer, 0)
    verdicts = compare(box, runtime, "conformance", [sample, sample], mode="whole")
    if answer == "panics":  # the Go specification: an index out of range is a run-time panic
        assert verdicts[0].outcome == "runtime_error" and "index out of range" in verdicts[0].detail


def test_a_compile_over_its_time_limit_times_out_and_retires_the_server(tmp_path):
    runtime = installed("java")
    # 10 ms: javac, warm or cold, takes longer than that for a conformance program.
    quick = dataclasses.replace(runtime, compile=dataclasses.replace(
        runtime.compile, limits=runtime.compile.limits.then(LimitOverrides.parse({"wall_seconds": 0.01}))))
    problems = load_problem_set("conformance")
    sample = references(quick, "conformance")[0]
    with make_sandbox("bubblewrap") as sandbox:
        sandbox.check()
        cold = Executor(sandbox, problems, {"java": quick}, warm=False, infra_retries=0).execute(sample)
        warm_executor = Executor(sandbox, problems, {"java": quick}, warm=True, infra_retries=0)
        compiler = warm_executor.compilers.prepare(quick, quick.step_limits("compile"), servers=1)
        assert len(compiler.idle) == 1
        server = compiler.idle[0]
        warm = warm_executor.execute(sample)
        assert server not in compiler.idle  # retired: not handed out again, and ended
        deadline = time.monotonic() + 30
        while server.process.poll() is None and time.monotonic() < deadline:
            time.sleep(0.1)
        assert server.process.poll() is not None
    # The cold command under the same limit is the reference (javac run as a step).
    assert shown(warm) == shown(cold)
    assert (warm.outcome, warm.detail) == ("compile_error", "compilation exceeded its time limit (0.01s)")


def test_a_crashed_server_is_retired_and_the_candidate_compiles_cold():
    runtime = installed("typescript")
    problems = load_problem_set("conformance")
    samples = references(runtime, "conformance")[:1] + wrong_programs(runtime, "compile_error")[:1]
    with make_sandbox("bubblewrap") as sandbox:
        sandbox.check()
        cold = [Executor(sandbox, problems, {"typescript": runtime}, warm=False).execute(s) for s in samples]
        executor = Executor(sandbox, problems, {"typescript": runtime}, warm=True)
        compiler = executor.compilers.prepare(runtime, runtime.step_limits("compile"), servers=1)
        crashed = compiler.idle[0]
        crashed.process.kill()  # bubblewrap goes, and with it (--die-with-parent) the server
        crashed.process.wait()
        warm = [executor.execute(s) for s in samples]
        assert crashed not in compiler.idle
    assert [shown(v) for v in warm] == [shown(v) for v in cold]


def test_only_the_compiled_files_reach_the_candidates_workspace(box):
    runtime = installed("java")
    problems = load_problem_set("conformance")
    executor = Executor(box, problems, {"java": runtime}, warm=True)
    limits = runtime.step_limits("compile")
    compiler = executor.compilers.prepare(runtime, limits, servers=1)
    sample = references(runtime, "conformance")[0]
    source = executor.program(sample, "0" * 32, ".results-000000000000.jsonl")
    listings = []
    for chosen in (compiler, executor.compiler_for(runtime, limits).cold):
        with box.workspace(chosen.needs) as space:
            space.write(runtime.source_file, source)
            built = chosen.compile(space, runtime.source_file, source, limits)
            assert built.ok
            listings.append(sorted(os.listdir(space.path)))
            files = {name: (Path(space.path) / name).read_bytes() for name in listings[-1]}
        assert built.extra.get("warm_compiler") is (chosen is compiler or None)
    # The reference is the javac command run cold: the same files, one per class (nested ones
    # as Outer$Inner.class, JLS 13.1, from memory) beside the source, and nothing else.
    assert listings[0] == listings[1]
    assert "AssayDriver.class" in files and all(n == runtime.source_file or n.endswith(".class") for n in files)


def test_compile_warm_in_runtime_yaml_is_checked(tmp_path):
    folder = tmp_path / "mylang"
    folder.mkdir()
    for name in ("prompt.j2", "program.j2"):
        (folder / name).write_text("", encoding="utf-8")
    base = {"source_file": "main.x", "run": {"command": ["./main"]}}

    def load(warm):
        return parse_runtime(dict(base, compile={"command": ["cc", "main.x"], "warm": warm}), folder,
                             folder / "runtime.yaml")

    with pytest.raises(RuntimeConfigError, match=r"field 'compile.warm': expected a mapping with one key"):
        load({"daemon": {"command": ["x"]}})
    with pytest.raises(RuntimeConfigError, match=r"field 'compile.warm.server.files': .* does not exist"):
        load({"server": {"command": ["x", "{files}/s"], "files": "warm"}})
    with pytest.raises(RuntimeConfigError, match=r"field 'compile.warm.server.files': expected a path inside"):
        load({"server": {"command": ["x"], "files": "../elsewhere"}})
    with pytest.raises(RuntimeConfigError, match=r"field 'compile.warm.prepared.build'"):
        (folder / "h.h").write_text("", encoding="utf-8")
        load({"prepared": {"command": ["cc"], "file": "h.h"}})
    with pytest.raises(RuntimeConfigError, match=r"field 'compile.warm.prepared': unknown field\(s\) header"):
        load({"prepared": {"command": ["cc"], "file": "h.h", "build": ["cc"], "header": "h.h"}})
    (folder / "warm").mkdir()
    spec = load({"server": {"command": ["x", "{files}/s"], "files": "warm"}}).compile.warm
    assert (spec.kind, spec.command, spec.files) == ("server", ("x", "{files}/s"), "warm")
    assert load(None).compile.warm is None


# --- CPU utilisation of a run's workers (harness/engine/utilisation.py) --------------------------

BUSY = """
import os, resource, sys, time
end = time.process_time() + 0.3
while time.process_time() < end:
    pass
used = resource.getrusage(resource.RUSAGE_SELF)
print(used.ru_utime + used.ru_stime, flush=True)
time.sleep(30)
"""


def test_cpu_of_a_living_grandchild_is_counted():
    # The reference is the kernel's own account of the busy process, getrusage(2) as the process
    # reads it for itself (RUSAGE_SELF), while it is still alive two levels below the harness.
    import subprocess
    import sys

    from harness.engine.utilisation import tree_cpu_seconds

    before = tree_cpu_seconds()
    parent = subprocess.Popen([sys.executable, "-c", f"import subprocess, sys; subprocess.run([sys.executable, '-c', {BUSY!r}])"],
                              stdout=subprocess.PIPE, text=True)
    try:
        grandchild_cpu = float(parent.stdout.readline())
        during = tree_cpu_seconds() - before
    finally:
        parent.kill()
        parent.wait()
    assert grandchild_cpu >= 0.3
    assert grandchild_cpu - 0.02 <= during <= grandchild_cpu + 1.0  # plus two interpreters' start-up


def test_the_progress_line_shows_the_cpu_share():
    import io

    from harness.console import Progress

    stream = io.StringIO()
    progress = Progress(4, label="scoring", stream=stream, every=0.0, cpu_share=lambda: 0.734)
    progress.advance(executed=True, passed=True)
    progress.finish()
    assert all("CPU 73%" in line for line in stream.getvalue().splitlines())
    quiet = io.StringIO()
    Progress(4, stream=quiet, every=0.0).finish()
    assert "CPU" not in quiet.getvalue()
