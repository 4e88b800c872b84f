"""The cgroup v2 test bed: boots a Debian VM under QEMU's software emulation with cgroup v2 only
(.ci/vm-test.sh: the image from .ci/vm-image.sh, cached between runs, and this working tree on a
second disk) and runs the limit, adversarial and unprivileged-user tests inside it
(.ci/vm-guest.sh). This project's hosts run cgroup v1, so this is where the v2 code runs.
The VM's console is the test log, printed when the run fails. Needs root, apt and qemu (CI
installs them: .ci/install); elsewhere it is skipped, saying what is missing."""

import os
import platform
import shutil
import signal
import subprocess
import time

import pytest

from tests.conftest import ROOT

pytestmark = pytest.mark.slow

BUDGET_SECONDS = 900  # the whole VM part, image build included, within CI's budget on 2 cores


def missing() -> str | None:
    if platform.machine() != "x86_64":
        return f"the test VM is an x86-64 guest; this host is {platform.machine()}"
    if os.geteuid() != 0:
        return "building the VM image needs root (debootstrap)"
    tools = ("qemu-system-x86_64", "debootstrap", "mkfs.ext4", "cpio", "apt-get", "dpkg-deb")
    absent = [tool for tool in tools if shutil.which(tool) is None]
    if absent:
        return f"missing {', '.join(absent)} (bash .ci/install installs them)"
    return None


@pytest.mark.timeout(BUDGET_SECONDS + 300)
def test_limit_and_adversarial_tests_pass_in_a_cgroup_v2_vm():
    reason = missing()
    if reason and not os.environ.get("CI"):
        pytest.skip(reason)
    assert reason is None, reason  # in CI the test bed must run
    started = time.monotonic()
    env = dict(os.environ, ASSAY_VM_TIMEOUT=str(BUDGET_SECONDS - 30))
    # A session of its own, so that a run past the budget ends with its emulator, not orphaning it.
    run = subprocess.Popen(["bash", str(ROOT / ".ci" / "vm-test.sh")], cwd=ROOT, env=env, stdout=subprocess.PIPE,
                           stderr=subprocess.PIPE, text=True, errors="replace", start_new_session=True)
    try:
        stdout, stderr = run.communicate(timeout=BUDGET_SECONDS)
    except subprocess.TimeoutExpired:
        os.killpg(run.pid, signal.SIGKILL)
        stdout, stderr = run.communicate()
    elapsed = time.monotonic() - started
    log = stdout.splitlines()
    tail = "\n".join(log[-200:]) + "\n--- vm-test.sh ---\n" + stderr[-3000:]
    assert elapsed < BUDGET_SECONDS, f"the VM part ran past {BUDGET_SECONDS} s; the console's end:\n{tail}"
    assert run.returncode == 0, f"the in-VM tests failed (exit {run.returncode}); the console's end:\n{tail}"
    # The run really was on cgroup v2 with the controllers handed on, and pytest passed in it.
    assert any(line.startswith("assay-vm: cgroup2 controllers:") and line.endswith("for children: memory pids")
               for line in log), tail
    assert "assay-vm: exit 0" in log, tail
    print(f"the cgroup v2 VM part took {elapsed:.0f}s")
