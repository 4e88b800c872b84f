"""Starting a warm sandbox's process on the host: it joins its cgroup and drops to the sandbox
user between fork and exec. Limits for each step are the step supervisor's (``step_supervisor.py``)."""

from __future__ import annotations

import os

from .cgroups import Cgroup


def join_and_drop(group: Cgroup | None, user: int | None):
    """A preexec that joins ``group`` (while still privileged) and drops to ``user``. Kept to
    plain system calls, since it runs in a forked copy of a multi-threaded process."""
    procs_files = group.procs_files if group else ()

    def preexec() -> None:
        for path in procs_files:
            fd = os.open(path, os.O_WRONLY)
            try:
                os.write(fd, b"0")
            finally:
                os.close(fd)
        if user is not None:
            os.setgroups([])
            os.setgid(user)
            os.setuid(user)

    return preexec
