"""No isolation at all (``--sandbox none``): candidates run as plain host processes, under the
same step supervisor and the same limits as in the real sandboxes.

Exists as the baseline that benchmarks compare the real sandboxes against, and for debugging a
runtime. It protects nothing: never point it at untrusted code. Each worker keeps a warm
supervisor (``step_supervisor.py`` in its host mode) as a plain child process, in a cgroup of
its own where one is writable, else with per-step rlimits; so the baseline differs from
bubblewrap only in isolation. The supervisor's work dir and its scratch folder (TMPDIR) are
private host folders under this backend's work root; it kills only its own descendants and
empties only those folders.
"""

from __future__ import annotations

import json
import subprocess
import sys
from pathlib import Path

from ..vocabulary import RuntimeSandboxNeeds
from . import hostlimits
from .base import SandboxUnavailable
from .cgroups import Cgroup
from .local import BASE_PATH, candidate_env, private_folder
from .process import join_and_drop
from .step_supervisor import kill_verified, own_processes, process_state
from .supervised import AGENT_SOURCE, SupervisorTrouble, brief
from .supervised_local import Slot, SupervisedLocalSandbox

MAX_RUNS_ENV = "ASSAY_BARE_MAX_RUNS"
END_PASSES = 50  # rounds of killing a discarded supervisor's descendants before it goes itself


class BareSandbox(SupervisedLocalSandbox):
    name = "none"
    label = "bare sandbox"
    max_runs_env = MAX_RUNS_ENV
    supervisor_processes = 1  # the supervisor itself shares the cgroup with the step

    def __init__(self, work_root: Path | None = None, *, max_runs: int | None = None):
        super().__init__(work_root, "assay-bare-", max_runs, run_as=None)

    def check(self) -> None:
        try:
            self.discard(self.start_slot(RuntimeSandboxNeeds("probe")))
        except (SupervisorTrouble, OSError) as exc:
            raise SandboxUnavailable(f"cannot start the step supervisor on {sys.executable}: {brief(exc)}") from None

    def describe(self) -> dict:
        return {
            "backend": self.name,
            "isolation": "none (unsafe baseline): candidates run as host processes with the invoking user's rights",
            "memory_limit": self.memory_mechanism(),
            "enforcement": hostlimits.enforcement(self.cgroups),  # what `assay sandbox doctor` prints
            "supervisor": ("step supervisor (harness/sandbox/step_supervisor.py) in host mode, one plain child "
                           "process per worker: a child subreaper that kills only its own descendants"),
            "max_runs_per_sandbox": self.max_runs,
        }

    # -- a warm supervisor --
    def scratch_folders(self) -> tuple[Path, ...]:
        return (private_folder(self.work_root, None, prefix="tmp-"),)

    def launch(self, needs: RuntimeSandboxNeeds, folder: Path, scratch: tuple[Path, ...],
               group: Cgroup | None) -> subprocess.Popen:
        host = {"work": str(folder), "scratch": [str(path) for path in scratch],
                "cgroup_procs": list(group.procs_files) if group is not None else []}
        argv = [sys.executable, "-I", "-S", "-B", "-c", AGENT_SOURCE, json.dumps(host)]
        return subprocess.Popen(
            argv, cwd=str(folder), env={"PATH": BASE_PATH}, stdin=subprocess.PIPE, stdout=subprocess.PIPE,
            stderr=subprocess.PIPE, start_new_session=True, close_fds=True, preexec_fn=join_and_drop(group, None),
        )

    def check_hello(self, hello: dict, process: subprocess.Popen) -> None:
        if hello["pid"] != process.pid or not hello.get("host_mode"):
            raise SupervisorTrouble(f"the supervisor (pid {hello['pid']}) is not the host-mode process started "
                                    f"(pid {process.pid})")

    def step_env(self, slot: Slot, needs: RuntimeSandboxNeeds, env: dict[str, str]) -> dict[str, str]:
        return candidate_env(needs, env, home=str(slot.folder), tmp=str(slot.scratch[0]))

    def end_supervisor(self, slot: Slot) -> None:
        """Nothing ends with the supervisor here (no pid namespace): what it started goes first,
        while it is alive to inherit orphans, so none escapes to the host's init. With a
        cgroup, everything in it, the supervisor too; else its descendants, then itself."""
        if slot.cgroup is not None:
            slot.cgroup.kill_all()
        elif slot.process.returncode is None:  # not reaped: the number is still the supervisor's
            root = slot.process.pid
            for _ in range(END_PASSES):
                alive = [pid for pid in own_processes(root) if process_state(pid) not in ("Z", "X", None)]
                if not alive:
                    break
                kill_verified(alive, lambda: own_processes(root))
        super().end_supervisor(slot)
