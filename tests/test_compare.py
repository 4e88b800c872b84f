"""``assay compare``: paired differences, McNemar, flipped problems, warnings and the CI gate.

Run folders are written directly (executions.jsonl, manifest.json, and summary.json made by
``harness.metrics.summarize``), so every expected number here is known by construction.
"""

from __future__ import annotations

import json
from pathlib import Path

import pytest
import scipy.stats
from typer.testing import CliRunner

from harness.cli import app
from harness.metrics import summarize
from harness.problems import load_problem_set

runner = CliRunner()
FAST = ["--resamples", "2000"]


def write_problem_set(root: Path, problems: dict[str, tuple[str, list[str]]]) -> Path:
    """A valid problem set: one tiny YAML file per problem with the given difficulty and tags."""
    root.mkdir(parents=True, exist_ok=True)
    (root / "set.yaml").write_text("name: tiny\ndescription: test set\n")
    for pid, (difficulty, tags) in problems.items():
        (root / f"{pid}.yaml").write_text(
            f"id: {pid}\ndifficulty: {difficulty}\ntags: [{', '.join(tags)}]\ndescription: Return x.\n"
            "signature:\n  name: echo\n  params: [{name: x, type: int}]\n  returns: int\n"
            "cases:\n  - {args: [1], expected: 1}\n")
    return root


def write_run(folder: Path, rows: list[dict], *, label: str, problem_set: Path | None = None, ks=(1,),
              run_limits: dict | None = None, runtime_digest: str = "r1", limit_overrides: dict | None = None) -> Path:
    folder.mkdir(parents=True, exist_ok=True)
    full = [{"sample": 0, "cases_passed": 0, "cases_total": 1, "seconds": 0.1, "detail": "", **r} for r in rows]
    with open(folder / "executions.jsonl", "w", encoding="utf-8") as handle:
        for row in full:
            handle.write(json.dumps(row) + "\n")
    languages = sorted({r["language"] for r in full})
    limits = run_limits or {"wall_seconds": 2.0, "cpu_seconds": 2.0, "memory_mb": 256}
    manifest = {
        "harness_version": "0.1.0", "label": label, "inputs": [], "mode": "continue",
        "problem_set": ({"name": "tiny", "path": str(problem_set), "digest": load_problem_set(str(problem_set)).digest,
                         "problems": len(list(problem_set.glob("*.yaml"))) - 1} if problem_set else {}),
        "runtimes": {lang: {"digest": runtime_digest, "toolchain": f"{lang} 1.0",
                            "limits": {"compile": None, "run": limits}} for lang in languages},
        "sandbox": {"backend": "bubblewrap"}, "limit_overrides": limit_overrides or {},
        "started_at": "2026-01-01T00:00:00+00:00", "finished_at": "2026-01-01T00:01:00+00:00",
    }
    (folder / "manifest.json").write_text(json.dumps(manifest))
    (folder / "summary.json").write_text(json.dumps(summarize(full, list(ks))))
    return folder


def greedy_rows(passing: set[int], problems: int, language: str = "python", failure: str = "wrong_answer"):
    return [{"problem": f"p{i:02d}", "language": language, "outcome": "passed" if i in passing else failure}
            for i in range(problems)]


def invoke(*args: str):
    return runner.invoke(app, [str(a) for a in args])


def compare_json(a: Path, b: Path, *extra: str) -> dict:
    result = invoke("compare", a, b, "--json", *FAST, *extra)
    assert result.exit_code == 0, result.output
    return json.loads(result.stdout)


def group(result: dict, name: str) -> dict:
    return next(g for g in result["groups"] if g["group"] == name)


def test_greedy_runs_get_difference_mcnemar_and_flipped_problems(tmp_path):
    a = write_run(tmp_path / "a", greedy_rows(set(range(6)), 12), label="m-step100")
    b = write_run(tmp_path / "b", greedy_rows(set(range(3, 12)), 12, failure="timeout"), label="m-step200")
    result = compare_json(a, b)
    overall = group(result, "overall")
    figure = overall["pass_at_k"]["1"]
    assert (figure["a"], figure["b"], figure["estimate"]) == (pytest.approx(0.5), pytest.approx(0.75), pytest.approx(0.25))
    assert figure["low"] <= figure["estimate"] <= figure["high"]
    assert result["greedy"] is True
    # p0..p2 passed only in A, p6..p11 only in B. Reference: scipy.stats.binomtest(3, 9, 0.5).
    assert (overall["mcnemar"]["a_only"], overall["mcnemar"]["b_only"]) == (3, 6)
    assert overall["mcnemar"]["p_value"] == pytest.approx(scipy.stats.binomtest(3, 9, 0.5).pvalue)
    lost = result["flips"]["passed_to_failed"]
    won = result["flips"]["failed_to_passed"]
    assert [f["problem"] for f in lost] == ["p00", "p01", "p02"]
    assert [f["problem"] for f in won] == [f"p{i:02d}" for i in range(6, 12)]
    assert (lost[0]["a"]["text"], lost[0]["b"]["text"]) == ("passed", "timeout")
    assert (won[0]["a"]["text"], won[0]["b"]["text"]) == ("wrong_answer", "passed")


def test_text_output_lists_tables_flips_and_method(tmp_path):
    a = write_run(tmp_path / "a", greedy_rows(set(range(6)), 12), label="a")
    b = write_run(tmp_path / "b", greedy_rows(set(range(3, 12)), 12), label="b")
    result = invoke("compare", a, b, *FAST)
    assert result.exit_code == 0, result.output
    assert "percentile paired bootstrap over problems" in result.stdout
    assert "McNemar" in result.stdout
    assert "solved in A, not in B: 3" in result.stdout
    assert "solved in B, not in A: 6" in result.stdout
    overall_line = next(line for line in result.stdout.splitlines() if line.startswith("overall"))
    assert "50.0" in overall_line and "75.0" in overall_line and "+25.0" in overall_line


def test_multi_sample_runs_have_no_mcnemar_and_flips_mean_any_sample_passed(tmp_path):
    def rows(passes: dict[str, int]):
        return [{"problem": p, "language": "python", "sample": s,
                 "outcome": "passed" if s < c else ("wrong_answer" if s % 2 else "runtime_error")}
                for p, c in passes.items() for s in range(4)]

    a = write_run(tmp_path / "a", rows({f"q{i}": i % 4 for i in range(12)}), label="a", ks=(1, 2))
    b = write_run(tmp_path / "b", rows({f"q{i}": (i + 1) % 4 for i in range(12)}), label="b", ks=(1, 2))
    result = compare_json(a, b)
    assert result["greedy"] is False
    assert group(result, "overall")["mcnemar"] is None
    # q3, q7, q11 go from 3/4 passed to 0/4; q0, q4, q8 from 0/4 to 1/4.
    assert [f["problem"] for f in result["flips"]["passed_to_failed"]] == ["q11", "q3", "q7"]
    assert [f["problem"] for f in result["flips"]["failed_to_passed"]] == ["q0", "q4", "q8"]
    assert result["flips"]["passed_to_failed"][0]["b"]["text"] == "0/4 passed (wrong_answer 2, runtime_error 2)"
    assert set(group(result, "overall")["pass_at_k"]) == {"1", "2"}


def test_overall_difference_weighs_each_pair_and_only_shared_pairs_count(tmp_path):
    # Two languages; B lacks p11 in go. Shared pairs: 12 python + 11 go = 23.
    rows_a = greedy_rows(set(range(12)), 12) + greedy_rows(set(), 12, language="go")
    rows_b = greedy_rows(set(range(6)), 12) + [r for r in greedy_rows(set(range(11)), 12, language="go")
                                              if r["problem"] != "p11"]
    a = write_run(tmp_path / "a", rows_a, label="a")
    b = write_run(tmp_path / "b", rows_b, label="b")
    result = compare_json(a, b)
    assert result["shared_pairs"] == 23 and result["only_a"] == 1 and result["only_b"] == 0
    assert any("1 (problem, language) pair(s) only in A" in w for w in result["warnings"])
    figure = group(result, "overall")["pass_at_k"]["1"]
    assert figure["a"] == pytest.approx(12 / 23)  # python all passed in A, go none
    assert figure["b"] == pytest.approx((6 + 11) / 23)
    assert group(result, "go")["pass_at_k"]["1"]["estimate"] == pytest.approx(1.0)
    assert group(result, "python")["pass_at_k"]["1"]["estimate"] == pytest.approx(-0.5)


def test_breakdown_by_difficulty_and_tag(tmp_path):
    problems = {f"p{i:02d}": ("easy" if i < 8 else "hard", ["arrays"] + (["graphs"] if i % 2 else [])) for i in range(12)}
    tiny = write_problem_set(tmp_path / "set", problems)
    a = write_run(tmp_path / "a", greedy_rows(set(range(4)), 12), label="a", problem_set=tiny)
    b = write_run(tmp_path / "b", greedy_rows(set(range(8)), 12), label="b", problem_set=tiny)
    result = compare_json(a, b)
    easy, hard, graphs = group(result, "easy"), group(result, "hard"), group(result, "graphs")
    assert (easy["kind"], easy["problems"]) == ("difficulty", 8)
    assert easy["pass_at_k"]["1"]["estimate"] == pytest.approx(0.5)   # 4/8 -> 8/8
    assert hard["pass_at_k"]["1"]["estimate"] == pytest.approx(0.0)   # 0/4 -> 0/4
    assert (graphs["kind"], graphs["problems"]) == ("tag", 6)         # odd ids
    assert graphs["pass_at_k"]["1"]["estimate"] == pytest.approx(2 / 6)  # p05, p07 gained
    assert "few_problems" in easy["marks"] and "few_problems" not in group(result, "arrays")["marks"]
    assert not any("problem set" in w for w in result["warnings"])


def test_few_problems_and_infra_errors_are_marked_not_hidden(tmp_path):
    rows = greedy_rows({0, 1, 2}, 5)
    a = write_run(tmp_path / "a", rows + [{"problem": "p00", "language": "python", "sample": 1,
                                            "outcome": "infra_error"}], label="a")
    b = write_run(tmp_path / "b", greedy_rows({0, 1}, 5), label="b")
    refused = invoke("compare", a, b, *FAST)
    assert refused.exit_code == 2 and "--allow-infra-errors" in refused.output
    result = compare_json(a, b, "--allow-infra-errors")
    overall = group(result, "overall")
    assert set(overall["marks"]) == {"few_problems", "infra_errors"}
    assert overall["pass_at_k"]["1"] is not None  # shown, only flagged
    assert any("infra error" in w for w in result["warnings"])
    text = invoke("compare", a, b, *FAST, "--allow-infra-errors").stdout
    assert "few problems (5)" in text and "1 infra error(s)" in text and "-20.0*" in text


def test_warnings_when_problem_set_runtimes_limits_or_samples_differ(tmp_path):
    set_one = write_problem_set(tmp_path / "one", {f"p{i:02d}": ("easy", []) for i in range(12)})
    set_two = write_problem_set(tmp_path / "two", {f"p{i:02d}": ("medium", []) for i in range(12)})
    a = write_run(tmp_path / "a", greedy_rows({1}, 12), label="a", problem_set=set_one)
    rows_b = greedy_rows({1}, 12) + [{"problem": "p00", "language": "python", "sample": 1, "outcome": "passed"}]
    b = write_run(tmp_path / "b", rows_b, label="b", problem_set=set_two, runtime_digest="r2",
                  run_limits={"wall_seconds": 5.0, "cpu_seconds": 2.0, "memory_mb": 256},
                  limit_overrides={"wall_seconds": 5.0})
    warnings = compare_json(a, b)["warnings"]
    joined = "\n".join(warnings)
    assert "problem set tiny changed between the runs" in joined
    assert "runtime python differs (digest r1 vs r2)" in joined
    assert "run limits differ (wall_seconds 2.0 vs 5.0)" in joined
    assert "limit overrides differ" in joined
    assert "python: sample counts differ (A 1, B 1-2 per problem)" in joined


def test_identical_runs_compare_clean(tmp_path):
    a = write_run(tmp_path / "a", greedy_rows({1, 2, 3}, 12), label="a")
    b = write_run(tmp_path / "b", greedy_rows({1, 2, 3}, 12), label="b")
    result = compare_json(a, b)
    assert result["warnings"] == []
    figure = group(result, "overall")["pass_at_k"]["1"]
    assert (figure["estimate"], figure["p_value"]) == (0.0, 1.0)
    assert result["flips"] == {"passed_to_failed": [], "failed_to_passed": []}


def test_fail_if_worse_exits_1_only_when_the_upper_bound_is_below_minus_delta(tmp_path):
    good = write_run(tmp_path / "good", greedy_rows(set(range(30)), 40), label="good")
    bad = write_run(tmp_path / "bad", greedy_rows(set(range(10)), 40), label="bad")  # 50 points worse
    worse = invoke("compare", good, bad, "--fail-if-worse", "2", *FAST)
    assert worse.exit_code == 1, worse.output
    assert "FAILED" in worse.stdout
    tolerant = invoke("compare", good, bad, "--fail-if-worse", "90", *FAST)
    assert tolerant.exit_code == 0, tolerant.output
    better = invoke("compare", bad, good, "--fail-if-worse", "0", "--json", *FAST)
    assert better.exit_code == 0
    gate = json.loads(better.stdout)["gate"]
    assert gate["failed"] is False and gate["k"] == 1 and gate["upper_points"] > 0


def test_fail_if_worse_uses_the_interval_not_the_point_estimate(tmp_path):
    # A 4-point drop over 25 problems: the point estimate is below -2, but the interval's upper
    # bound is above -2, so the noise-tolerant gate passes.
    a = write_run(tmp_path / "a", greedy_rows(set(range(13)), 25), label="a")
    b = write_run(tmp_path / "b", greedy_rows(set(range(12)), 25), label="b")
    result = invoke("compare", a, b, "--fail-if-worse", "2", "--json", *FAST)
    gate = json.loads(result.stdout)["gate"]
    assert gate["difference_points"] == pytest.approx(-4.0)
    assert gate["upper_points"] > -2
    assert result.exit_code == 0 and gate["failed"] is False


def test_fail_if_worse_without_the_needed_figure_is_a_usage_error(tmp_path):
    a = write_run(tmp_path / "a", greedy_rows({1}, 12), label="a")
    b = write_run(tmp_path / "b", greedy_rows({2}, 12), label="b")
    result = invoke("compare", a, b, "--k", "5", "--fail-if-worse", "1", *FAST)
    assert result.exit_code == 2
    assert "pass@5 difference, which is n/a" in result.output


def test_seed_makes_the_comparison_reproducible(tmp_path):
    a = write_run(tmp_path / "a", greedy_rows(set(range(0, 20, 2)), 20), label="a")
    b = write_run(tmp_path / "b", greedy_rows(set(range(0, 20, 3)), 20), label="b")
    first = compare_json(a, b, "--seed", "7")
    again = compare_json(a, b, "--seed", "7")
    other = compare_json(a, b, "--seed", "8")
    assert first["groups"] == again["groups"]
    assert first["settings"]["seed"] == 7
    assert group(first, "overall")["pass_at_k"]["1"] != group(other, "overall")["pass_at_k"]["1"]


def test_bad_run_folder_names_file_and_line(tmp_path):
    a = write_run(tmp_path / "a", greedy_rows({1}, 3), label="a")
    with open(a / "executions.jsonl", "a") as handle:
        handle.write('{"problem": "p09", "language": "python"}\n')
    result = invoke("compare", a, a, *FAST)
    assert result.exit_code == 2
    assert f"{a / 'executions.jsonl'}:4: field 'outcome' missing" in result.output
    good = write_run(tmp_path / "good", greedy_rows({1}, 3), label="good")
    missing = invoke("compare", good, tmp_path / "nowhere", *FAST)
    assert missing.exit_code == 2 and "nowhere: not a folder" in missing.output
