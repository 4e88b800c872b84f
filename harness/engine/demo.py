"""The demo: a fictional lab compares two checkpoints of its code model.

Tidewater Instruments trains "heron-coder" and must decide whether the checkpoint at step
18000 is better than the one at step 12000. The demo writes both checkpoints' completion dumps
deterministically (references, plus faults drawn from each runtime's ``demo/`` templates:
wrong logic, syntax errors, infinite loops, memory blow-ups, early exits, crashes, trailing
text the stop sequences must cut), scores both in the sandbox, and returns the summaries. Both
kinds of problem are in it: the core set's functions (completed in continue mode) and a few of
the dockside set's whole programs (written whole, as a chat model answers: fenced or bare, right,
wrong or crashing).
"""

from __future__ import annotations

import json
import random
from pathlib import Path

from ..problems import ProblemSet, load_problem_set
from ..runtimes import Runtime, available_runtimes, load_runtime
from ..sandbox import Sandbox
from ..vocabulary import LimitOverrides
from .programs import ProgramOptions
from .scoring import ScoreOptions, ScoreOutcome, score

CHECKPOINTS = {  # label -> chance that a sample is right, before difficulty adjusts it
    "heron-coder-step12000": 0.50,
    "heron-coder-step18000": 0.68,
}
DIFFICULTY_SHIFT = {"easy": 0.2, "medium": 0.0, "hard": -0.25}
CORRECT_FORMS = ("reference", "trailing_text")
# Expensive faults (they run into a limit) are rarer, as in real dumps.
FAULT_WEIGHTS = {"wrong_logic": 6, "runtime_error": 3, "syntax_error": 2, "early_exit": 1,
                 "infinite_loop": 1, "memory_blowup": 1}
SAMPLES_PER_PROBLEM = 6
PROBLEMS_PER_LANGUAGE = 12  # keeps the demo under two minutes on 2 cores with compiled languages
DEMO_LIMITS = LimitOverrides(wall_seconds=2.0, cpu_seconds=2.0, memory_mb=256)
PROGRAM_SET = "dockside"
PROGRAM_PROBLEMS_PER_LANGUAGE = 3  # whole programs run every case: a few keep the demo quick
PROGRAM_CORRECT_FORMS = ("reference", "program_fenced")
PROGRAM_FAULT_WEIGHTS = {"program_wrong_output": 4, "program_crash": 2}


def demo_templates(runtime: Runtime) -> list[str]:
    folder = runtime.path / "demo"
    return sorted(p.stem for p in folder.glob("*.j2")) if folder.is_dir() else []


def render_form(runtime: Runtime, problem, form: str) -> str:
    reference = runtime.reference_completion(problem)
    if form == "reference":
        return reference
    context = runtime.context(problem)
    context["reference"] = reference.rstrip("\n")
    return runtime.templates.get_template(f"demo/{form}.j2").render(context)


def demo_problems(problem_set: ProblemSet, runtime: Runtime) -> list:
    """The same problems for every language where references allow: those with the most
    references first, spread over difficulties, at most PROBLEMS_PER_LANGUAGE."""
    ranked = sorted(problem_set.problems.values(), key=lambda p: (-len(p.reference), p.id))
    functions = [p for p in ranked if p.kind == "function" and runtime.reference(p) is not None]
    # Programs whose cases are all small: the demo's short time limit (DEMO_LIMITS) must not stop
    # a right program on a large generated case on a busy machine.
    programs = [p for p in ranked if p.kind == "program" and runtime.reference(p) is not None
                and not any(case.generator for case in p.cases)]
    return functions[:PROBLEMS_PER_LANGUAGE] + programs[:PROGRAM_PROBLEMS_PER_LANGUAGE]


def write_dump(path: Path, label: str, chance: float, problem_set: ProblemSet, runtimes: dict[str, Runtime]) -> int:
    rng = random.Random(label)
    rows = 0
    with open(path, "w", encoding="utf-8") as handle:
        for name, runtime in runtimes.items():
            for problem in demo_problems(problem_set, runtime):
                available = set(demo_templates(runtime))
                weights = PROGRAM_FAULT_WEIGHTS if problem.kind == "program" else FAULT_WEIGHTS
                faults = [f for f in weights if f in available]
                correct = [f for f in (PROGRAM_CORRECT_FORMS if problem.kind == "program" else CORRECT_FORMS)
                           if f == "reference" or f in available]
                p_right = min(0.95, max(0.05, chance + DIFFICULTY_SHIFT[problem.difficulty]))
                for sample in range(SAMPLES_PER_PROBLEM):
                    if rng.random() < p_right or not faults:
                        form = rng.choice(correct)
                    else:
                        form = rng.choices(faults, weights=[weights[f] for f in faults])[0]
                    row = {"problem": problem.id, "language": name, "sample": sample,
                           "completion": render_form(runtime, problem, form)}
                    handle.write(json.dumps(row, ensure_ascii=False) + "\n")
                    rows += 1
    return rows


# Four languages keep the default demo under two minutes on 2 cores; --lang picks any others.
DEFAULT_LANGUAGES = ("python", "javascript", "cpp", "java")


def demo_runtimes(languages: list[str] | None) -> tuple[dict[str, Runtime], list[str]]:
    """The runtimes to score (named ones, or the default four) whose toolchain is installed,
    and a note for each one left out."""
    names = languages or [n for n in DEFAULT_LANGUAGES if n in available_runtimes()]
    runtimes, skipped = {}, []
    for name in names:
        runtime = load_runtime(name)
        if runtime.toolchain_version() is None:
            skipped.append(f"{name}: toolchain not installed ({' '.join(runtime.version_command)} not found)")
        elif not demo_templates(runtime):
            skipped.append(f"{name}: the runtime has no demo/ fault templates")
        else:
            runtimes[name] = runtime
    return runtimes, skipped


def run_demo(out: Path, sandbox: Sandbox, jobs: int = 2, progress: bool = True,
             set_name: str = "core", languages: list[str] | None = None,
             program_set: str | None = PROGRAM_SET) -> dict[str, ScoreOutcome]:
    problem_set = load_problem_set(f"{set_name},{program_set}" if program_set else set_name)
    runtimes, _ = demo_runtimes(languages)
    (out / "dumps").mkdir(parents=True, exist_ok=True)
    results = {}
    for label, chance in CHECKPOINTS.items():
        dump = out / "dumps" / f"{label}.jsonl"
        write_dump(dump, label, chance, problem_set, runtimes)
        # The shared cache runs a program both checkpoints wrote only once, as in real use.
        options = ScoreOptions(dumps=[dump], out=out / label, jobs=jobs, ks=[1, 5],
                               limit_overrides=DEMO_LIMITS, progress=progress, label=label,
                               cache_dir=out / "cache", programs=ProgramOptions(mode="whole"))
        results[label] = score(options, problem_set, runtimes, sandbox)
    return results
