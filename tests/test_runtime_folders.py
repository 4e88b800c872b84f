"""A runtime folder is self-contained: one made outside the project with `assay runtimes new
--into`, filled in there, passes `assay runtimes check`, scores under bubblewrap and (where a
Docker daemon and the offline base image exist) under Docker, and adds nothing to the project."""

from __future__ import annotations

import hashlib
import json
import shutil
import subprocess
import sys
from pathlib import Path

import pytest

from harness.runtimes import load_runtime

ROOT = Path(__file__).resolve().parents[1]
ASSAY = [sys.executable, "-m", "harness"]
PYTHON = ROOT / "runtimes" / "python"
SKELETON_FILES = {"runtime.yaml", "types.j2", "prompt.j2", "preamble.j2", "program.j2", "checks.yaml", "Dockerfile"}

# Two candidates for the conformance set's pass_int (returns its int argument): the first is the
# identity the problem asks for, the second is off by one on every case.
DUMP = [
    {"problem": "pass_int", "language": "pyclone", "completion": "    return value\n"},
    {"problem": "pass_int", "language": "pyclone", "completion": "    return value + 1\n"},
]


def assay(*args, timeout: float = 900) -> subprocess.CompletedProcess:
    return subprocess.run([*ASSAY, *map(str, args)], capture_output=True, text=True, cwd=ROOT, timeout=timeout)


def project_state() -> set[tuple[str, str]]:
    """Each entry of `git status` (ignored files included; results/ and bytecode caches left
    out) with a hash of the file's content, so a file added, or changed while already modified,
    shows up as a new entry."""
    done = subprocess.run(["git", "status", "--porcelain", "--ignored", "--untracked-files=all"],
                          capture_output=True, text=True, cwd=ROOT, check=True)
    state = set()
    for line in done.stdout.splitlines():
        path = line[3:].split(" -> ")[-1].strip('"')
        if path.startswith("results/") or "__pycache__/" in path or ".pytest_cache/" in path:
            continue
        file = ROOT / path
        content = hashlib.sha256(file.read_bytes()).hexdigest() if file.is_file() else ""
        state.add((line, content))
    return state


def assert_nothing_added_to_the_project(before: set) -> None:
    # Entries may disappear (work committed meanwhile) but none may appear or change.
    added = sorted(project_state() - before)
    assert not added, f"files added or changed inside the project: {added}"


def fill_in_from_python(folder: Path) -> None:
    """What a runtime author does: write each file of the skeleton (here, the Python runtime's
    files under the new name), including the conformance references and the checks."""
    for extra in SKELETON_FILES - {p.name for p in PYTHON.iterdir()}:
        (folder / extra).unlink()  # Python needs no preamble: a whole function stands alone
    for source in PYTHON.rglob("*"):
        if source.is_file() and "__pycache__" not in source.parts:
            target = folder / source.relative_to(PYTHON)
            target.parent.mkdir(parents=True, exist_ok=True)
            shutil.copyfile(source, target)
    config = folder / "runtime.yaml"
    text = config.read_text(encoding="utf-8")
    assert "\nname: python\n" in text
    config.write_text(text.replace("\nname: python\n", "\nname: pyclone\n")
                      .replace("display_name: Python 3", "display_name: Python 3 (clone)"), encoding="utf-8")
    checks = folder / "checks.yaml"
    checks.write_text(checks.read_text(encoding="utf-8").replace("assay runtimes check python",
                                                                 "assay runtimes check pyclone"), encoding="utf-8")


def score(dump: Path, out: Path, runtimes_dir: Path, sandbox: str) -> dict:
    done = assay("score", dump, "--set", "conformance", "--out", out, "--k", "1", "-j", "2", "-q", "--json",
                 "--sandbox", sandbox, "--runtimes-dir", runtimes_dir)
    assert done.returncode == 0, done.stderr
    rows = [json.loads(line) for line in (out / "executions.jsonl").read_text(encoding="utf-8").splitlines()]
    return {"summary": json.loads(done.stdout),
            "outcomes": sorted((r["language"], r["sample"], r["outcome"]) for r in rows)}


def docker_or_reason():
    """A Docker client and the offline base image, or why the Docker half cannot run here."""
    from harness.sandbox import SandboxUnavailable
    from harness.sandbox import docker as backend
    from harness.sandbox import images

    try:
        client = backend.connect(timeout=30)
    except SandboxUnavailable as exc:
        return None, f"no Docker daemon reachable: {exc}"
    if images.find_image(client, images.OFFLINE_BASE) is None:
        return None, f"the offline base image {images.OFFLINE_BASE} is missing (assay runtimes build python --offline-base makes it)"
    return client, None


@pytest.mark.slow
def test_a_runtime_made_outside_the_project_checks_scores_and_builds_there(tmp_path):
    before = project_state()
    outside = tmp_path / "my_runtimes"

    made = assay("runtimes", "new", "pyclone", "--into", outside)
    assert made.returncode == 0, made.stderr
    folder = outside / "pyclone"
    assert SKELETON_FILES <= {p.name for p in folder.iterdir() if p.is_file()}
    assert (folder / "references" / "conformance").is_dir()
    assert "FROM ${BASE}" in (folder / "Dockerfile").read_text(encoding="utf-8")

    fill_in_from_python(folder)
    runtime = load_runtime("pyclone", [outside])
    assert runtime.path == folder and runtime.name == "pyclone"
    assert runtime.digest != load_runtime("python").digest  # its own name and image

    checked = assay("runtimes", "check", "pyclone", "-j", "2", "--json", "--runtimes-dir", outside)
    assert checked.returncode == 0, checked.stdout[-3000:] + checked.stderr
    rows = json.loads(checked.stdout)["results"]["pyclone"]
    assert rows and all(r["ok"] for r in rows)
    # Every conformance problem's reference was found in the clone's own folder and passed.
    conformance_ids = {p.stem for p in (ROOT / "problem_sets" / "conformance").glob("*.yaml")} - {"set"}
    passed = {r["check"] for r in rows if r["expect"] == "passed" and r["outcome"] == "passed"}
    assert {f"reference {pid}" for pid in conformance_ids} <= passed
    assert {p.stem for p in (folder / "references" / "conformance").iterdir()} == conformance_ids

    dump = tmp_path / "dump.jsonl"
    dump.write_text("".join(json.dumps(row) + "\n" for row in DUMP), encoding="utf-8")
    under_bubblewrap = score(dump, tmp_path / "bwrap", outside, "bubblewrap")
    # pass@1 of one problem with n=2 samples, c=1 correct: 1 - C(1,1)/C(2,1) = 1/2 (the
    # unbiased estimator's definition, worked by hand).
    assert under_bubblewrap["summary"]["pass_at_k"]["by_language"]["pyclone"]["1"] == 0.5
    assert under_bubblewrap["outcomes"] == [("pyclone", 0, "passed"), ("pyclone", 1, "wrong_answer")]

    client, reason = docker_or_reason()
    if client is None:
        assert_nothing_added_to_the_project(before)
        pytest.skip(f"bubblewrap half passed; Docker half skipped: {reason}")
    from harness.sandbox import images

    tag = images.image_tag(runtime.needs)
    try:
        built = assay("runtimes", "build", "pyclone", "--offline-base", "--runtimes-dir", outside)
        assert built.returncode == 0, built.stderr[-3000:]
        assert images.find_image(client, tag) is not None
        under_docker = score(dump, tmp_path / "docker", outside, "docker")
        assert under_docker["summary"]["pass_at_k"]["by_language"]["pyclone"]["1"] == 0.5
        assert under_docker["outcomes"] == under_bubblewrap["outcomes"]
    finally:
        for name in (tag, f"{tag}-toolchain"):
            if images.find_image(client, name) is not None:
                client.api.remove_image(name)
    assert_nothing_added_to_the_project(before)


# --- the class Java and C# wrap the function in ----------------------------------------------

# A problem whose function is named like the wrapper class. C# forbids a member named like its
# enclosing type (ECMA-334, "Class members": CS0542), so its method must be renamed; Java
# allows a method named like its class (JLS 17, 8.4), and camelCase keeps it `harbour` anyway.
HARBOUR_SET = {"harbour.yaml": """\
    id: harbour
    title: Free berths in the harbour
    difficulty: easy
    tags: [math]
    description: Return how many of the harbour's `berths` are free when `moored` are taken.
    signature:
      name: harbour
      params: [{name: berths, type: int}, {name: moored, type: int}]
      returns: int
    cases:
      - {args: [12, 5], expected: 7, example: true}
      - {args: [3, 3], expected: 0}
      - {args: [40, 0], expected: 40}
    """}
# The method body and its closing brace, as the set's references/<language>/ files hold them.
HARBOUR_REFERENCE = "    return berths - moored;\n}\n"


@pytest.mark.parametrize("name,opening", [("java", "\nclass Harbour {\n"),
                                          ("csharp", "\npublic static class Harbour\n{\n")])
def test_java_and_csharp_wrap_every_function_in_a_class_named_harbour(name, opening):
    from harness.problems import load_problem_set

    runtime = load_runtime(name)
    for problem in load_problem_set("conformance").problems.values():
        prompt = runtime.render_prompt(problem)
        assert opening in prompt and "Solution" not in prompt, (name, problem.id)


def test_a_function_named_like_the_class_is_renamed_where_the_language_needs_it(tmp_path):
    from harness.problems import load_problem_set

    from .conftest import write_set

    folder = write_set(tmp_path / "harbour_set", HARBOUR_SET)
    for name, extension in (("java", "java"), ("csharp", "cs")):
        (folder / "references" / name).mkdir(parents=True)
        (folder / "references" / name / f"harbour.{extension}").write_text(HARBOUR_REFERENCE, encoding="utf-8")
    problem = load_problem_set(str(folder)).problems["harbour"]
    assert "public static long Harbour_(long berths, long moored)" in load_runtime("csharp").render_prompt(problem)
    assert "public static long harbour(long berths, long moored) {" in load_runtime("java").render_prompt(problem)
    languages = [n for n in ("java", "csharp") if load_runtime(n).toolchain_version() is not None]
    if not languages:
        pytest.skip("neither javac nor mcs is installed here (bash .ci/install installs them)")
    done = assay("problems", "check", folder, "--json", "-j", "2", *[a for n in languages for a in ("--lang", n)])
    report = json.loads(done.stdout)
    assert [(r["language"], r["outcome"]) for r in report["results"]] == [(n, "passed") for n in sorted(languages)]
