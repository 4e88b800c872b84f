"""A candidate's program, rendered from a problem's driver rendered once (Runtime.render_program),
is the text a full rendering of program.j2 gives: for every bundled runtime and problem, with
nonces and results files of several lengths, and with code that looks like the template's own
placeholders. The reference is jinja2 rendering the template in full each time."""

from __future__ import annotations

import secrets
import shutil

import pytest

from harness.problems import load_problem_set
from harness.runtimes import available_runtimes, load_runtime

SETS = ("conformance", "core")
CODES = [
    "return 1\n",
    "{{ nonce }} {{ results_file }} {% raw %}\n",  # template syntax in the code is text, never rendered
    "// .results-0123456789ab.jsonl 0123456789abcdef0123456789abcdef\n",
    "",
]


def full(runtime, problem, code, results_file, nonce) -> str:
    return runtime._render_program(problem, runtime._candidate_source(problem, code), results_file, nonce)


@pytest.mark.parametrize("language", available_runtimes())
def test_a_program_filled_into_its_problems_driver_is_the_full_rendering(language):
    runtime = load_runtime(language)
    for set_name in SETS:
        for problem in load_problem_set(set_name).problems.values():
            if problem.kind != "function" or runtime.refusal(problem) is not None:
                continue
            for code in CODES:
                for width in (8, 16):
                    nonce = secrets.token_hex(width)
                    results_file = f".results-{nonce[:12]}.jsonl"
                    assert runtime.render_program(problem, code, results_file, nonce) == \
                        full(runtime, problem, code, results_file, nonce), (set_name, problem.id)


def test_a_runtime_that_looks_at_the_code_does_so_in_its_source_template(tmp_path):
    """PHP looks at how an answer opens (its own ``<?php``, a ``declare``, a closing ``?>``) in
    source.j2, so that program.j2 takes the code verbatim and each problem's driver is rendered
    once. Its programs must be those of one template doing both: the reference is a copy of the
    runtime whose program.j2 includes that logic in place of ``{{ code }}``, which jinja2
    renders in full for every candidate (an include is never framed)."""
    php = load_runtime("php")
    folder = tmp_path / "php"
    shutil.copytree(php.path, folder)
    (folder / "source.j2").rename(folder / "opening.j2")
    program = folder / "program.j2"
    text = program.read_text(encoding="utf-8")
    assert text.count("{{ code }}\n") == 1
    program.write_text(text.replace("{{ code }}\n", '{% include "opening.j2" %}\n\n'), encoding="utf-8")
    combined = load_runtime(str(folder))
    assert php._code_is_verbatim and not combined._code_is_verbatim
    body = "function f($x) {\n    return $x;\n}\n"
    for problem in load_problem_set("conformance").problems.values():
        if problem.kind != "function" or php.refusal(problem) is not None:
            continue
        opener = php.templates.get_template("preamble.j2").render(php.context(problem))
        for code in (body, opener + body, opener + "<?php\n" + body, opener + "  <?php\ndeclare(strict_types=1);\n" + body,
                     opener + "declare(strict_types=1);\n" + body, body + "?>\n", opener + body + "?>", opener, ""):
            nonce = secrets.token_hex(16)
            results_file = f".results-{nonce[:12]}.jsonl"
            assert php.render_program(problem, code, results_file, nonce) == \
                combined.render_program(problem, code, results_file, nonce), (problem.id, code)


def test_a_template_that_transforms_the_nonce_falls_back_to_full_rendering(tmp_path):
    runtime = load_runtime("python")
    folder = tmp_path / "python"
    shutil.copytree(runtime.path, folder)
    program = folder / "program.j2"
    program.write_text(program.read_text(encoding="utf-8") + "# {{ nonce[:4] | upper }}\n", encoding="utf-8")
    changed = load_runtime(str(folder))
    problem = next(iter(load_problem_set("conformance").problems.values()))
    for _ in range(3):
        nonce = secrets.token_hex(16)
        text = changed.render_program(problem, "return 1\n", ".results-x.jsonl", nonce)
        assert text.endswith(f"# {nonce[:4].upper()}\n")
    assert changed._code_is_verbatim is False
