"""What enforces a sandbox's limits on this host: the cgroup version and where Assay's groups
go, which controllers it was given, swap, the per-step peak, user namespaces and seccomp. Read
by ``assay sandbox doctor``, recorded in the run manifest (the local backends' ``describe()``
carries ``enforcement``) and checked by ``assay score --require-cgroups``: a limit that silently
does not apply is the worst failure a scoring host can have, so a degraded host is said loudly.
"""

from __future__ import annotations

import os
import platform
from pathlib import Path

from . import cgroups, seccomp
from .supervised_local import SUPERVISOR_MB
RLIMIT_MEMORY = ("RLIMIT_DATA per process: an allocation over the limit fails instead of the step being killed, "
                 "several processes can each use the limit, and memory_limit is read from the runtime's "
                 "out-of-memory message")
RLIMIT_PROCESSES = "RLIMIT_NPROC: counts all of the sandbox user's processes, and root ignores it"


def enforcement(factory: cgroups.CgroupFactory | None) -> dict:
    """What enforces the memory and process limits of the sandboxes ``factory`` makes (None:
    rlimits). ``cgroup_limits`` is False on a degraded host. Probes one group, once per factory."""
    if factory is None:
        return {"cgroup_limits": False, "cgroup": None, "memory": RLIMIT_MEMORY, "processes": RLIMIT_PROCESSES,
                "swap": "not capped by Assay (no cgroup)", "peak_memory": "the step's largest process (wait4)",
                "oom_kills": "not counted (no cgroup)"}
    if factory.facts is not None:
        return dict(factory.facts)
    v = factory.version
    where = ", ".join(str(p) for p in factory.parents)
    facts = {"cgroup_limits": True, "cgroup": f"v{v}: {where}",
             "memory": (f"cgroup v{v} {'memory.max' if v == 2 else 'memory.limit_in_bytes'}: the step's limit "
                        f"plus {SUPERVISOR_MB} MB for the supervisor, the whole sandbox counted"),
             "oom_kills": f"counted ({'memory.events' if v == 2 else 'memory.oom_control'})"}
    try:
        group = factory.create(64 * 2**20, 8)
    except OSError as exc:
        facts.update(processes="unknown", swap="unknown", peak_memory="unknown",
                     problem=f"cannot create a group in {where}: {exc.strerror}")
        return facts
    try:
        facts["processes"] = (f"cgroup v{v} pids.max" if group.limits_processes
                              else f"{RLIMIT_PROCESSES} (no pids controller)")
        if group.swap_capped():
            facts["swap"] = "capped at 0 (" + ("memory.swap.max" if v == 2 else "memory.memsw.limit_in_bytes") + ")"
        else:
            facts["swap"] = ("not capped: no swap accounting (memory.swap.max or memory.memsw.* missing); "
                             + ("this host has swap, so a memory bomb may swap before it is killed" if swap_in_use()
                                else "harmless while this host has no swap"))
        facts["peak_memory"] = group.peak_method()
    finally:
        group.remove(wait_seconds=5)
    factory.facts = dict(facts)
    return facts


def swap_in_use() -> bool:
    try:
        return len(Path("/proc/swaps").read_text().strip().splitlines()) > 1
    except OSError:
        return False


def user_namespaces() -> tuple[bool, str]:
    """Whether this user may create user namespaces (what bubblewrap needs unless it is setuid)."""
    if os.geteuid() == 0:
        return True, "root: no user namespace needed"
    limit = _read("/proc/sys/user/max_user_namespaces")
    if limit == "0":
        return False, "disabled: /proc/sys/user/max_user_namespaces is 0"
    if _read("/proc/sys/kernel/unprivileged_userns_clone") == "0":
        return False, "disabled for unprivileged users: kernel.unprivileged_userns_clone = 0"
    if _read("/proc/sys/kernel/apparmor_restrict_unprivileged_userns") == "1":
        return False, ("restricted by AppArmor (kernel.apparmor_restrict_unprivileged_userns = 1): bubblewrap needs "
                       "a profile that allows them")
    return True, f"allowed for unprivileged users (max_user_namespaces = {limit})"


def seccomp_filters() -> tuple[bool, str]:
    """Whether the kernel takes seccomp filters, and whether Assay's filter covers this machine."""
    if not Path("/proc/sys/kernel/seccomp/actions_avail").exists():
        return False, "this kernel has no seccomp filter support (CONFIG_SECCOMP_FILTER)"
    machine = platform.machine()
    if machine not in ("x86_64", "aarch64"):
        return False, f"Assay's filter has system call tables for x86-64 and aarch64 only, not {machine}"
    return True, f"supported; Assay's filter ({len(seccomp.DENIED)} calls refused) has a table for {machine}"


def cgroup_mount(root: Path = cgroups.CGROUP_ROOT) -> dict:
    """The cgroup hierarchy mounted at ``root``: version and the controllers it offers."""
    if (root / "cgroup.controllers").exists():
        return {"version": 2, "mount": str(root), "controllers": (_read(root / "cgroup.controllers") or "").split()}
    named = ("unified", "systemd")  # a hybrid host's v2 mount and systemd's named hierarchy
    controllers = sorted(p.name for p in root.iterdir() if p.is_dir() and p.name not in named) if root.is_dir() else []
    if "memory" in controllers or "pids" in controllers:
        unified = root / "unified"
        return {"version": 1, "mount": str(root), "controllers": controllers,
                "hybrid": (unified / "cgroup.controllers").exists()}
    return {"version": None, "mount": str(root), "controllers": []}


def doctor(root: Path = cgroups.CGROUP_ROOT) -> dict:
    """The whole report ``assay sandbox doctor`` prints."""
    from .bubblewrap import BubblewrapSandbox  # bubblewrap's own check starts a real sandbox

    factory, where = cgroups.find(root)
    mount = cgroup_mount(root)
    mount["usable"] = factory is not None
    mount["where" if factory is not None else "problem"] = where
    userns, userns_detail = user_namespaces()
    filters, filters_detail = seccomp_filters()
    try:
        box = BubblewrapSandbox()
    except Exception as exc:  # noqa: BLE001 - said in the report, never a traceback
        bubblewrap = {"available": False, "detail": f"{type(exc).__name__}: {exc}"[:300]}
    else:
        try:
            box.check()
            version = box.describe().get("version", "bubblewrap")
            bubblewrap = {"available": True, "detail": f"{version}: a sandbox starts and answers"}
        except Exception as exc:  # noqa: BLE001
            bubblewrap = {"available": False, "detail": str(exc)[:300]}
        finally:
            box.close()
    limits = enforcement(factory)
    return {"uid": os.geteuid(), "cgroup": mount, "limits": limits,
            "user_namespaces": {"available": userns, "detail": userns_detail},
            "seccomp": {"available": filters, "detail": filters_detail},
            "bubblewrap": bubblewrap, "warnings": warnings(limits, bubblewrap)}


def refusal(sandbox) -> str | None:
    """Why ``assay score --require-cgroups`` must not start with this sandbox, or None when its
    memory and process limits are a cgroup's (Docker's containers always are)."""
    if sandbox.name == "docker":
        return None
    if not hasattr(sandbox, "cgroups"):
        return f"the {sandbox.name} sandbox enforces no cgroup limits"
    limits = enforcement(sandbox.cgroups)
    if not limits["cgroup_limits"]:
        return ("no cgroup limits on this host, only rlimits (RLIMIT_DATA per process for memory): "
                f"{cgroups.find()[1]}. Run 'assay sandbox doctor' for the whole picture.")
    if not limits["processes"].startswith("cgroup"):
        return f"the cgroup here has no pids controller, so process counts fall back to {RLIMIT_PROCESSES}"
    return None


def warnings(limits: dict, bubblewrap: dict | None = None) -> list[str]:
    found = []
    if not limits["cgroup_limits"]:
        found.append("no writable cgroup: memory and process limits fall back to rlimits (RLIMIT_DATA, RLIMIT_NPROC), "
                     "which a candidate with several processes can exceed; use --require-cgroups to refuse such a "
                     "host")
    elif limits.get("swap", "").startswith("not capped") and swap_in_use():
        found.append("swap is not capped for the sandboxes' groups: " + limits["swap"])
    if bubblewrap is not None and not bubblewrap["available"]:
        found.append("the bubblewrap sandbox cannot start here: " + bubblewrap["detail"])
    return found


def _read(path) -> str | None:
    try:
        return Path(path).read_text().strip()
    except OSError:
        return None
