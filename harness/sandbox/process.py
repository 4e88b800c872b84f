"""Running one child process under limits: rlimits, a cgroup, a wall clock and output caps.

Shared by every backend that starts local processes (bubblewrap and the bare baseline).
"""

from __future__ import annotations

import os
import resource
import selectors
import signal
import subprocess
import time

from ..vocabulary import Limits, StepResult
from .cgroups import Cgroup, CgroupFactory
# Bytes of stdout/stderr kept for diagnostics (the output limit counts everything produced),
# kept the same way as inside the warm sandboxes.
from .step_supervisor import KEEP_BYTES, keep_tail


def run_limited(
    argv: list[str],
    *,
    cwd: str,
    env: dict[str, str],
    limits: Limits,
    cgroups: CgroupFactory | None,
    user: int | None = None,
    memory_rlimit: bool = True,
    status_fd_placeholder: str | None = None,
    exit_codes_encode_signals: bool = False,
    pass_fds: tuple[int, ...] = (),
) -> StepResult:
    """Run ``argv`` to completion or until a limit is hit, and say which limit ended it.

    With ``status_fd_placeholder``, that argument of ``argv`` is replaced by the number of a
    pipe the wrapper (bubblewrap) reports its own status on; the text lands in
    ``extra["wrapper_status"]``, so a wrapper failure is told apart from the candidate's.
    With ``exit_codes_encode_signals``, an exit status above 128 means death by signal
    (status - 128), as wrappers such as bubblewrap report it. ``pass_fds``: descriptors the
    child keeps (bubblewrap's seccomp program).
    """
    group: Cgroup | None = None
    memory_bytes = limits.memory_mb * 1024 * 1024
    if cgroups is not None:
        try:
            group = cgroups.create(memory_bytes, limits.max_processes)
        except OSError as exc:
            return StepResult(exit_code=None, infra_error=f"cannot create cgroup: {exc}")
    preexec = _make_preexec(limits, group, user, use_as_limit=group is None and memory_rlimit)
    status_read = status_write = None
    if status_fd_placeholder is not None:
        status_read, status_write = os.pipe()
        argv = [str(status_write) if arg == status_fd_placeholder else arg for arg in argv]
    started = time.monotonic()
    try:
        proc = subprocess.Popen(
            argv,
            cwd=cwd,
            env=env,
            stdin=subprocess.DEVNULL,
            stdout=subprocess.PIPE,
            stderr=subprocess.PIPE,
            start_new_session=True,
            preexec_fn=preexec,
            close_fds=True,
            pass_fds=tuple(pass_fds) + ((status_write,) if status_write is not None else ()),
        )
    except OSError as exc:
        if group:
            group.remove()
        _close(status_read, status_write)
        return StepResult(exit_code=None, infra_error=f"cannot start {argv[0]}: {exc}")
    if status_write is not None:
        os.close(status_write)
        status_write = None
    try:
        out, err, timed_out, flooded = _collect(proc, limits, started)
        wall = time.monotonic() - started
        returncode = proc.returncode
        if exit_codes_encode_signals and returncode > 128:
            returncode = -(returncode - 128)
        result = StepResult(
            exit_code=returncode if returncode >= 0 else None,
            signal=-returncode if returncode < 0 else None,
            wall_seconds=round(wall, 4),
            stdout=_tail(out),
            stderr=_tail(err),
            timed_out=timed_out,
            output_exceeded=flooded,
        )
        if returncode == -signal.SIGXCPU or (returncode == -signal.SIGKILL and _cpu_exhausted(limits, wall)):
            result.timed_out = True
        if returncode == -signal.SIGXFSZ:
            result.file_size_exceeded = True
        if status_read is not None:
            result.extra["wrapper_status"] = _read_all(status_read)
        if group is not None:
            result.extra["peak_memory_mb"] = round(group.peak_bytes() / 2**20, 1)
            if group.oom_killed() and not timed_out:
                result.memory_exceeded = True
        return result
    finally:
        _kill_group(proc)
        _close(status_read, status_write)
        if group:
            group.remove()


def _read_all(fd: int) -> str:
    chunks = []
    os.set_blocking(fd, False)
    while True:
        try:
            chunk = os.read(fd, 65536)
        except BlockingIOError:
            break
        if not chunk:
            break
        chunks.append(chunk)
    return b"".join(chunks).decode("utf-8", errors="replace")


def _close(*fds) -> None:
    for fd in fds:
        if fd is not None:
            try:
                os.close(fd)
            except OSError:
                pass


def _collect(proc: subprocess.Popen, limits: Limits, started: float):
    """Read both pipes until EOF, the wall-clock deadline, or the output cap."""
    deadline = started + limits.wall_seconds
    cap = limits.max_output_kb * 1024
    buffers = {proc.stdout: bytearray(), proc.stderr: bytearray()}
    total = 0
    timed_out = flooded = False
    with selectors.DefaultSelector() as selector:
        for stream in buffers:
            selector.register(stream, selectors.EVENT_READ)
        while selector.get_map():
            remaining = deadline - time.monotonic()
            if remaining <= 0:
                timed_out = True
                break
            for key, _ in selector.select(timeout=min(remaining, 0.5)):
                chunk = os.read(key.fd, 65536)
                if not chunk:
                    selector.unregister(key.fileobj)
                    continue
                total += len(chunk)
                keep_tail(buffers[key.fileobj], chunk)
                if total > cap:
                    flooded = True
                    break
            if flooded:
                break
    if timed_out or flooded:
        _kill_group(proc)
    try:
        proc.wait(timeout=max(1.0, deadline - time.monotonic()))
    except subprocess.TimeoutExpired:
        timed_out = True
        _kill_group(proc)
        proc.wait()
    for stream in buffers:
        stream.close()
    return bytes(buffers[proc.stdout]), bytes(buffers[proc.stderr]), timed_out, flooded


def _cpu_exhausted(limits: Limits, wall: float) -> bool:
    # The kernel sends SIGKILL once the hard RLIMIT_CPU (soft + 1 s) is passed.
    return wall >= limits.cpu_seconds


def _kill_group(proc: subprocess.Popen) -> None:
    try:
        os.killpg(proc.pid, signal.SIGKILL)
    except (ProcessLookupError, PermissionError):
        pass


def _tail(data: bytes) -> str:
    return data[-KEEP_BYTES:].decode("utf-8", errors="replace")


def _make_preexec(limits: Limits, group: Cgroup | None, user: int | None, use_as_limit: bool):
    """Runs in the child between fork and exec: join the cgroup (while still privileged), set
    rlimits, then drop to ``user``. Kept to plain system calls, since it runs in a forked copy
    of a multi-threaded process."""
    procs_files = group.procs_files if group else ()
    limit_processes = group is None or not group.limits_processes
    cpu = max(1, int(limits.cpu_seconds + 0.999))
    fsize = limits.max_file_mb * 1024 * 1024
    memory = limits.memory_mb * 1024 * 1024

    def preexec() -> None:
        _join_groups(procs_files)
        resource.setrlimit(resource.RLIMIT_CPU, (cpu, cpu + 1))
        resource.setrlimit(resource.RLIMIT_FSIZE, (fsize, fsize))
        resource.setrlimit(resource.RLIMIT_CORE, (0, 0))
        if use_as_limit:
            resource.setrlimit(resource.RLIMIT_AS, (memory, memory))
        if limit_processes:
            resource.setrlimit(resource.RLIMIT_NPROC, (limits.max_processes, limits.max_processes))
        _become(user)

    return preexec


def join_and_drop(group: Cgroup | None, user: int | None):
    """A preexec that only joins ``group`` and drops to ``user``: for a long-lived sandbox whose
    supervisor sets each step's own limits."""
    procs_files = group.procs_files if group else ()

    def preexec() -> None:
        _join_groups(procs_files)
        _become(user)

    return preexec


def _join_groups(procs_files: tuple[str, ...]) -> None:
    for path in procs_files:
        fd = os.open(path, os.O_WRONLY)
        try:
            os.write(fd, b"0")
        finally:
            os.close(fd)


def _become(user: int | None) -> None:
    if user is not None:
        os.setgroups([])
        os.setgid(user)
        os.setuid(user)
