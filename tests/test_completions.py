"""Reading completion dumps: every line becomes a sample or a reject, never lost."""

import json

from hypothesis import given, settings
from hypothesis import strategies as st

from harness.vocabulary import Reject, Sample
from harness.engine.completions import read_dumps

PROBLEMS = {"add_pair"}
LANGUAGES = {"python"}


def read(path):
    return list(read_dumps([path], PROBLEMS, LANGUAGES, max_completion_bytes=1000))


def test_malformed_lines_are_rejected_with_their_line_numbers(tmp_path):
    dump = tmp_path / "dump.jsonl"
    good = {"problem": "add_pair", "language": "python", "completion": "    return a + b\n"}
    lines = [
        json.dumps(good).encode(),
        b"{not json",
        json.dumps({"problem": "add_pair", "language": "python"}).encode(),
        json.dumps({**good, "problem": "nope"}).encode(),
        json.dumps({**good, "language": "cobol"}).encode(),
        b'{"problem": "add_pair", "language": "python", "completion": "\xff\xfe"}',
        json.dumps({**good, "completion": "x" * 2000}).encode(),
        json.dumps({**good, "sample": 0}).encode(),
        json.dumps({**good, "sample": -3}).encode(),
        json.dumps([1, 2]).encode(),
        b"",
        json.dumps({**good, "completion": 5}).encode(),
    ]
    dump.write_bytes(b"\n".join(lines) + b"\n")
    items = read(dump)
    assert len(items) == len(lines)
    rejects = {item.line: item.reason for item in items if isinstance(item, Reject)}
    assert [item.line for item in items if isinstance(item, Sample)] == [1]
    assert "invalid JSON" in rejects[2]
    assert "missing field(s): completion" in rejects[3]
    assert "unknown problem" in rejects[4]
    assert "unknown language" in rejects[5]
    assert "UTF-8" in rejects[6]
    assert "larger than 1000 bytes" in rejects[7]
    assert "duplicate sample 0" in rejects[8]
    assert "non-negative integer" in rejects[9]
    assert "JSON object" in rejects[10]
    assert "empty line" in rejects[11]
    assert "must be a string" in rejects[12]


def test_rows_without_sample_index_take_the_next_index_after_the_highest_seen(tmp_path):
    dump = tmp_path / "dump.jsonl"
    row = {"problem": "add_pair", "language": "python", "completion": ""}
    dump.write_text("\n".join(json.dumps(r) for r in [row, {**row, "sample": 5}, row, row]) + "\n")
    assert [item.sample for item in read(dump)] == [0, 5, 6, 7]


def test_numbering_continues_across_several_dump_files(tmp_path):
    row = json.dumps({"problem": "add_pair", "language": "python", "completion": ""})
    first, second = tmp_path / "a.jsonl", tmp_path / "b.jsonl"
    first.write_text(row + "\n" + row + "\n")
    second.write_text(row + "\n")
    items = list(read_dumps([first, second], PROBLEMS, LANGUAGES))
    assert [(i.source.endswith("b.jsonl"), i.sample) for i in items] == [(False, 0), (False, 1), (True, 2)]


@settings(max_examples=200, deadline=None)
@given(st.lists(st.binary(max_size=120), max_size=20))
def test_arbitrary_bytes_account_for_every_line(tmp_path_factory, chunks):
    dump = tmp_path_factory.mktemp("fuzz") / "dump.jsonl"
    payload = b"\n".join(chunk.replace(b"\n", b" ") for chunk in chunks)
    dump.write_bytes(payload)
    expected_lines = payload.count(b"\n") + (1 if payload and not payload.endswith(b"\n") else 0)
    items = read(dump)
    assert len(items) == expected_lines
    assert [item.line for item in items] == list(range(1, expected_lines + 1))


def test_sample_key_set_behaves_like_a_set_of_tuples():
    from harness.store import SampleKeySet

    keys = SampleKeySet()
    reference = set()
    for key in [("p", "python", 0), ("p", "python", 9), ("q", "lua", 3), ("p", "python", 2**30), ("p", "lua", 9)]:
        keys.add(key)
        reference.add(key)
    probes = reference | {("p", "python", 1), ("q", "lua", 4), ("p", "python", 2**30 + 1), ("z", "go", 0)}
    assert {k for k in probes if k in keys} == reference
