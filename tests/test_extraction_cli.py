"""The extraction policy as a user meets it: ``--extract`` on score, the record on every row
and in the manifest, ``assay extract`` showing text beside program, and compare warning when
two runs read text differently."""

from __future__ import annotations

import json

from .conftest import ADD_PAIR, write_set
from .test_scoring import assay, read_rows, write_dump

CHAT_ANSWER = ("Usage:\n```bash\npython3 add.py 1 2\n```\nSolution:\n```python\nimport sys\n\n"
               "def add_pair(a, b):\n    return a + b\n\nif __name__ == '__main__':\n"
               "    print(add_pair(*map(int, sys.argv[1:])))\n```\n")


def test_score_records_the_policy_and_how_each_row_was_read(tmp_path):
    problems = write_set(tmp_path / "set", {"add_pair.yaml": ADD_PAIR})
    dump = write_dump(tmp_path / "d.jsonl", [{"problem": "add_pair", "language": "python", "completion": CHAT_ANSWER}])
    syntax_out, strict_out = tmp_path / "syntax", tmp_path / "strict"
    assay("score", dump, "--set", problems, "--mode", "whole", "--out", syntax_out, "-q")
    assay("score", dump, "--set", problems, "--mode", "whole", "--out", strict_out, "-q", "--extract", "strict")
    (row,) = read_rows(syntax_out)
    assert row["outcome"] == "passed"
    assert row["extraction"]["source"] == "block 2 of 2 (python)"
    assert row["extraction"]["dropped"][0].startswith("if __name__ == '__main__': print(add_pair(")
    (old,) = read_rows(strict_out)
    assert old["outcome"] != "passed" and old["extraction"]["method"] == "first_block"
    manifests = [json.loads((out / "manifest.json").read_text()) for out in (syntax_out, strict_out)]
    assert [m["extraction"] for m in manifests] == ["syntax/1", "strict/1"]
    compared = assay("compare", strict_out, syntax_out, "--json")
    assert any("extraction policy differs: strict/1 vs syntax/1" in w for w in json.loads(compared.stdout)["warnings"])


def test_resuming_under_another_policy_is_refused(tmp_path):
    problems = write_set(tmp_path / "set", {"add_pair.yaml": ADD_PAIR})
    dump = write_dump(tmp_path / "d.jsonl", [{"problem": "add_pair", "language": "python", "completion": CHAT_ANSWER}])
    assay("score", dump, "--set", problems, "--mode", "whole", "--out", tmp_path / "o", "-q")
    done = assay("score", dump, "--set", problems, "--mode", "whole", "--out", tmp_path / "o", "-q",
                 "--extract", "strict", check=False)
    assert done.returncode == 2 and "extraction" in done.stderr


def test_extract_shows_the_text_beside_the_program(tmp_path):
    problems = write_set(tmp_path / "set", {"add_pair.yaml": ADD_PAIR})
    dump = write_dump(tmp_path / "d.jsonl", [{"problem": "add_pair", "language": "python", "completion": CHAT_ANSWER}])
    shown = assay("extract", dump, "--set", problems, "--lang", "python", "--mode", "whole", "--width", "140")
    assert "what the model wrote" in shown.stdout and "what will run" in shown.stdout
    assert "source: block 2 of 2 (python)" in shown.stdout
    sides = [line.split(" │ ", 1) for line in shown.stdout.splitlines() if " │ " in line]
    assert any(right == "def add_pair(a, b):" for _, right in sides)
    assert any(left == "def add_pair(a, b):" for left, _ in [(l.rstrip(), r) for l, r in sides])
    assert not any("__main__" in right for _, right in sides)
    as_json = json.loads(assay("extract", dump, "--set", problems, "--lang", "python", "--mode", "whole",
                               "--json").stdout)
    assert as_json["program"].startswith("import sys") and "__main__" not in as_json["program"]
    assert as_json["text"] == CHAT_ANSWER


def test_extract_says_when_nothing_matches_and_refuses_bad_options(tmp_path):
    problems = write_set(tmp_path / "set", {"add_pair.yaml": ADD_PAIR})
    dump = write_dump(tmp_path / "d.jsonl", [{"problem": "add_pair", "language": "python", "completion": "x"}])
    none = assay("extract", dump, "--set", problems, "--lang", "python", "--sample", "7", check=False)
    assert none.returncode == 1 and "no row" in none.stderr
    bad = assay("extract", dump, "--set", problems, "--lang", "python", "--extract", "guess", check=False)
    assert bad.returncode == 2 and "--extract must be one of: syntax, strict" in bad.stderr
    bad = assay("score", dump, "--set", problems, "--extract", "guess", "--out", tmp_path / "o", check=False)
    assert bad.returncode == 2 and "--extract must be one of" in bad.stderr
