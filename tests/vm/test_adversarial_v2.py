"""The adversarial corpus (tests/adversarial/) under cgroup v2, for the test VM: Python's whole
corpus and C++'s memory bomb, through tests/test_adversarial.py's own check with its limits (and
the compile step's) scaled for the VM's emulated CPU, many times slower than a host's: a limit
tuned for a host would turn slow controls into timeouts. Skipped where Assay has no v2 group."""

import dataclasses

import pytest

from harness.runtimes.runtime import Runtime
from harness.sandbox import cgroups
from tests import test_adversarial as corpus
from tests.test_adversarial import backend, host, hostile_set  # noqa: F401 - fixtures

FACTORY, WHERE = cgroups.find()
pytestmark = [
    pytest.mark.slow,
    pytest.mark.skipif(FACTORY is None or FACTORY.version != 2, reason="needs a cgroup v2 group Assay can use "
                       f"(tests/test_cgroup_v2_vm.py boots a VM with one); here: {WHERE}"),
]

# How many times the VM's limits exceed a host's. C++'s is larger: its compile takes one to
# two minutes of emulated CPU, and the corpus's check allows an attack 60 s plus twice the
# run's wall limit in all.
SLOWDOWN = {"python": 8, "cpp": 20}
REAL_STEP_LIMITS = Runtime.step_limits


def scaled(language: str) -> dict:
    factor = SLOWDOWN[language]
    return dict(corpus.LIMITS, wall_seconds=corpus.LIMITS["wall_seconds"] * factor,
                cpu_seconds=corpus.LIMITS["cpu_seconds"] * factor)


def slower_compiles(runtime, kind, *args, **kwargs):
    """runtime.yaml's compile limits, scaled like the run limits."""
    limits = REAL_STEP_LIMITS(runtime, kind, *args, **kwargs)
    if limits is None or kind != "compile":
        return limits
    factor = SLOWDOWN[runtime.name]
    return dataclasses.replace(limits, wall_seconds=limits.wall_seconds * factor,
                               cpu_seconds=limits.cpu_seconds * factor)
# A C++ compile takes about a minute of emulated CPU: C++'s memory bomb only (processes are
# tests/vm/test_cgroup_v2.py's, with a C fork bomb). Python's huge-source entry tests compile
# time, not the cgroup, and takes as long.
CPP_ATTACKS = {"memory bomb"}
PYTHON_LEFT_OUT = {"huge source is compiled and judged within the limits"}


def chosen():
    for entry in corpus.corpus_entries():
        language, _, attack = entry.values
        if (language == "python" and attack["name"] not in PYTHON_LEFT_OUT) or (
                language == "cpp" and attack["name"] in CPP_ATTACKS):
            yield entry


@pytest.mark.parametrize("language,control,attack", list(chosen()))
def test_hostile_candidate_is_contained_under_cgroup_v2(language, control, attack, backend, host,  # noqa: F811
                                                        hostile_set, request, monkeypatch):  # noqa: F811
    monkeypatch.setattr(corpus, "LIMITS", scaled(language))
    monkeypatch.setattr(Runtime, "step_limits", slower_compiles)
    corpus.test_hostile_candidate_is_contained(language, control, attack, backend, host, hostile_set, request)
