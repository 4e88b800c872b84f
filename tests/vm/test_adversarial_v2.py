"""The adversarial corpus (tests/adversarial/) under cgroup v2, for the test VM: Python's attacks
on what a cgroup contains, through tests/test_adversarial.py's own check with its limits (and
the compile step's) scaled for the VM's emulated CPU, many times slower than a host's: a limit
tuned for a host would turn slow controls into timeouts. Native programs' bombs under v2 are tests/vm/test_cgroup_v2.py's
(a small C program, cheap to build under emulation; a C++ candidate's compile alone took two
minutes of the VM's time). Skipped where Assay has no v2 group."""

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

# How many times the VM's limits exceed a host's.
SLOWDOWN = {"python": 8}
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
# The attacks whose containment rests on the cgroup: memory, processes, files in RAM, output,
# processes left behind and killed. The others (network, host files, the driver's records,
# compile-time bombs, the wall clock) rest on namespaces, the driver and rlimits, which do not
# change with the cgroup version, and run on the host (tests/test_adversarial.py).
CGROUP_ATTACKS = {"fork bomb", "memory bomb", "fills the disk with many files", "floods the output",
                  "leaves a background child behind", "kills every process it can see", "kills the harness"}


def chosen():
    for entry in corpus.corpus_entries():
        language, _, attack = entry.values
        if language == "python" and attack["name"] in CGROUP_ATTACKS:
            yield entry


@pytest.mark.parametrize("language,control,attack", list(chosen()))
def test_hostile_candidate_is_contained_under_cgroup_v2(language, control, attack, backend, host,  # noqa: F811
                                                        hostile_set, request, monkeypatch):  # noqa: F811
    monkeypatch.setattr(corpus, "LIMITS", scaled(language))
    monkeypatch.setattr(Runtime, "step_limits", slower_compiles)
    corpus.test_hostile_candidate_is_contained(language, control, attack, backend, host, hostile_set, request)
