"""Problem sets are data: loading, schema errors that name file and field, bundled sets."""

import pytest

from harness.problems import ProblemError, load_problem_set

from .conftest import ADD_PAIR, write_set


def test_a_folder_outside_the_project_loads_as_a_set(tiny_set):
    problem_set = load_problem_set(str(tiny_set))
    problem = problem_set.problems["add_pair"]
    assert problem.function == "add_pair"
    assert [c.example for c in problem.cases] == [True, False, False]
    assert len(problem_set.digest) == 64


def test_bundled_sets_load_by_name():
    core = load_problem_set("core")
    assert len(core) >= 60
    assert all(len(p.cases) >= 8 and "python" in p.reference for p in core.problems.values())
    assert {p.difficulty for p in core.problems.values()} == {"easy", "medium", "hard"}


def test_unknown_set_name_lists_the_bundled_ones():
    with pytest.raises(ProblemError, match="core"):
        load_problem_set("no_such_set")


@pytest.mark.parametrize("broken,field", [
    (ADD_PAIR.replace("returns: int", "returns: integer"), "signature.returns"),
    (ADD_PAIR.replace("{args: [40, 2], expected: 42}", "{args: [40], expected: 42}"), "cases[2].args"),
    (ADD_PAIR.replace("expected: 42}", "expected: forty-two}"), "cases[2]"),
    (ADD_PAIR.replace("id: add_pair", "id: other_name"), "id"),
    (ADD_PAIR.replace("difficulty: easy", "difficulty: brutal"), "difficulty"),
    (ADD_PAIR.replace("description: Return the sum of `a` and `b`.\n", ""), "description"),
])
def test_schema_errors_name_the_file_and_the_field(tmp_path, broken, field):
    folder = write_set(tmp_path / "bad", {"add_pair.yaml": broken})
    with pytest.raises(ProblemError) as error:
        load_problem_set(str(folder))
    message = str(error.value)
    assert "add_pair.yaml" in message and f"'{field}'" in message


def test_broken_yaml_names_the_file_and_line(tmp_path):
    folder = write_set(tmp_path / "bad", {"add_pair.yaml": ADD_PAIR.replace("cases:", "cases: [\n  - oops: {")})
    with pytest.raises(ProblemError, match=r"add_pair\.yaml:\d+: invalid YAML"):
        load_problem_set(str(folder))


def test_references_may_live_in_sidecar_source_files(tiny_set):
    (tiny_set / "references" / "lua").mkdir(parents=True)
    (tiny_set / "references" / "lua" / "add_pair.lua").write_text("return a + b\nend\n")
    problem = load_problem_set(str(tiny_set)).problems["add_pair"]
    assert problem.reference["lua"].startswith("return a + b")


def test_a_sidecar_reference_for_an_unknown_problem_is_an_error(tiny_set):
    (tiny_set / "references" / "lua").mkdir(parents=True)
    (tiny_set / "references" / "lua" / "nope.lua").write_text("end\n")
    with pytest.raises(ProblemError, match="nope.lua"):
        load_problem_set(str(tiny_set))


def test_references_a_runtime_carries_count_for_listing_and_checking():
    import json
    import subprocess
    import sys

    from harness.cli.problems import reference_languages
    from harness.runtimes import available_runtimes, load_runtime

    conformance = load_problem_set("conformance")
    runtimes = {name: load_runtime(name) for name in available_runtimes()}
    # The conformance set holds no reference itself: every one lives in its runtime's folder.
    assert not any(p.reference for p in conformance.problems.values())
    assert reference_languages(conformance, runtimes) == set(runtimes)
    listed = subprocess.run([sys.executable, "-m", "harness", "problems", "list", "conformance", "--json"],
                            capture_output=True, text=True, check=True)
    rows = {row["id"]: row for row in json.loads(listed.stdout)}
    assert set(rows["pass_int"]["languages"]) == set(runtimes)
