"""What the backends with warm sandboxes share: the channel to a sandbox's step supervisor
(``step_supervisor.py``), the pool that checks sandboxes out one candidate at a time, and the
reading of the supervisor's replies into step results and reasons to discard a sandbox.

The Docker backend keeps containers warm this way, and bubblewrap and the bare backend keep one
long-lived supervisor per worker (``supervised_local.py``); each supplies how a sandbox starts,
how its channel carries bytes, and how it is thrown away. The rules for when a sandbox may serve the next candidate live here, once.
"""

from __future__ import annotations

import abc
import base64
import concurrent.futures as futures
import json
import os
import select
import signal
import threading
import time
from dataclasses import dataclass
from pathlib import Path
from typing import Callable, Protocol

from ..vocabulary import Limits, StepResult
from .base import SandboxError, SandboxUnavailable

AGENT_SOURCE = Path(__file__).with_name("step_supervisor.py").read_text(encoding="utf-8")
CALL_SECONDS = 60.0
HELLO_SECONDS = 60.0
STEP_GRACE_SECONDS = 15.0  # beyond the step's own wall limit before the supervisor counts as lost


class SupervisorTrouble(SandboxError):
    """The sandbox or the channel to its supervisor failed: not the candidate's doing."""


class ChannelLost(SupervisorTrouble):
    """The supervisor's stream ended or went silent."""


class SupervisorError(SupervisorTrouble):
    """The supervisor answered a request with an error."""


def max_runs_from_env(variable: str, default: int = 50) -> int:
    """How many candidates one sandbox serves before it is replaced, from ``variable``."""
    raw = os.environ.get(variable, "")
    if not raw:
        return default
    try:
        value = int(raw)
    except ValueError:
        value = 0
    if value < 1:
        raise SandboxUnavailable(f"{variable}={raw!r}: expected a whole number of candidates, 1 or more")
    return value


def brief(exc: BaseException) -> str:
    text = str(exc).strip().splitlines()
    return (text[0] if text else type(exc).__name__)[:300]


# --- the channel ------------------------------------------------------------------------------

class Channel(abc.ABC):
    """JSON lines to the supervisor and its replies, matched by sequence number. Requests may
    be pipelined: ``send`` now, ``receive`` the reply later (replies come in order).
    Subclasses say how bytes travel: ``_send_bytes``, ``_line`` and ``close``."""

    def __init__(self):
        self.seq = 0

    def call(self, request: dict, timeout: float) -> dict:
        return self.receive(self.send(request), timeout)

    def send(self, request: dict) -> int:
        self.seq += 1
        self._send_bytes(json.dumps(dict(request, seq=self.seq)).encode("ascii") + b"\n")
        return self.seq

    def receive(self, seq: int, timeout: float) -> dict:
        """The reply to request ``seq`` (replies to earlier, abandoned requests are skipped)."""
        deadline = time.monotonic() + timeout
        while True:
            line = self._line(deadline)
            try:
                reply = json.loads(line)
            except ValueError:
                raise ChannelLost(f"garbled reply from the supervisor: {line[:200]!r}") from None
            if reply.get("seq") == seq:
                break
        if not reply.get("ok"):
            raise SupervisorError(f"supervisor: {reply.get('error')}")
        return reply

    @abc.abstractmethod
    def _send_bytes(self, data: bytes) -> None:
        """Deliver ``data`` to the supervisor's stdin, or raise ChannelLost."""

    @abc.abstractmethod
    def _line(self, deadline: float) -> bytes:
        """The supervisor's next output line, or ChannelLost once ``deadline`` passes."""

    @abc.abstractmethod
    def close(self) -> None:
        """Release the transport; the supervisor sees its stdin close and exits."""


class PipeChannel(Channel):
    """The supervisor's stdin and stdout as plain pipes (a local child process)."""

    def __init__(self, stdin, stdout, stderr=None):
        super().__init__()
        self.stdin, self.stdout, self.stderr = stdin, stdout, stderr
        self.buffer = bytearray()

    def _send_bytes(self, data: bytes) -> None:
        try:
            self.stdin.write(data)
            self.stdin.flush()
        except (OSError, ValueError) as exc:
            raise ChannelLost(f"cannot reach the sandbox's supervisor: {exc}") from None

    def _line(self, deadline: float) -> bytes:
        fd = self.stdout.fileno()
        while b"\n" not in self.buffer:
            remaining = deadline - time.monotonic()
            if remaining <= 0:
                raise ChannelLost("the sandbox's supervisor did not answer in time")
            readable, _, _ = select.select([fd], [], [], remaining)
            if not readable:
                continue
            chunk = os.read(fd, 65536)
            if not chunk:
                raise ChannelLost("the sandbox's supervisor exited" + self._last_words())
            self.buffer += chunk
        line, _, rest = self.buffer.partition(b"\n")
        self.buffer = bytearray(rest)
        return bytes(line)

    def _last_words(self) -> str:
        if self.stderr is None:
            return ""
        try:
            os.set_blocking(self.stderr.fileno(), False)
            text = (self.stderr.read() or b"").decode("utf-8", "replace").strip()
        except (OSError, ValueError):
            return ""
        return f": {text[-300:]}" if text else ""

    def close(self) -> None:
        for stream in (self.stdin, self.stdout, self.stderr):
            if stream is not None:
                try:
                    stream.close()
                except (OSError, ValueError):
                    pass


# --- sandboxes and their pool -----------------------------------------------------------------

@dataclass(kw_only=True)
class Member:
    """One warm sandbox and what is known about it."""

    channel: Channel
    served: int = 0
    spoiled: str | None = None
    reset_seq: int | None = None  # the reset sent when the last candidate left, reply unread
    launcher: str | None = None  # the shell its supervisor starts steps through (None: by fork, slower)

    def settle(self) -> None:
        """Read the pending reset's reply: the sandbox is reusable only if the last candidate
        left nothing behind."""
        seq, self.reset_seq = self.reset_seq, None
        if seq is None or self.spoiled:
            return
        try:
            reply = self.channel.receive(seq, CALL_SECONDS)
        except Exception as exc:
            self.spoiled = f"reset failed: {brief(exc)}"
            return
        self.spoiled = reset_spoils(reply)


class PoolHost(Protocol):
    """What a pool needs of its backend."""

    closed: bool
    max_runs: int

    def discard(self, member: Member) -> None: ...

    def background(self, job: Callable[[], None]) -> None: ...


class WarmPool:
    """Warm sandboxes of one kind. A sandbox is checked out by one candidate at a time;
    discarded ones are replaced in the background so the next checkout finds one ready."""

    def __init__(self, host: PoolHost, start: Callable[[], Member]):
        self.host = host
        self.start = start
        self.idle: list[Member] = []
        self.spares = 0  # replacements being started in the background
        self.cond = threading.Condition()

    def acquire(self) -> Member:
        while True:
            with self.cond:
                while not self.idle and self.spares > 0 and not self.host.closed:
                    self.cond.wait(timeout=HELLO_SECONDS)
                member = self.idle.pop() if self.idle else None
            if member is None:
                return self.start()
            member.settle()
            if member.spoiled is None:
                return member
            self._replace(member)

    def release(self, member: Member) -> None:
        member.served += 1
        if member.spoiled is None and member.served >= self.host.max_runs:
            member.spoiled = f"served {member.served} candidates"
        if member.spoiled is None and not self.host.closed:
            try:  # emptied while nobody waits; the next checkout reads the outcome
                member.reset_seq = member.channel.send({"op": "reset"})
            except SupervisorTrouble as exc:
                member.spoiled = f"reset failed: {brief(exc)}"
        if member.spoiled is None and not self.host.closed:
            with self.cond:
                self.idle.append(member)
                self.cond.notify()
            return
        self._replace(member)

    def _replace(self, member: Member) -> None:
        self.host.discard(member)
        if not self.host.closed:
            with self.cond:
                self.spares += 1
            self.host.background(self._start_spare)

    def warm(self, count: int) -> None:
        with futures.ThreadPoolExecutor(max_workers=4) as starting:
            members = list(starting.map(lambda _: self.start(), range(count)))
        with self.cond:
            self.idle += members
            self.cond.notify_all()

    def _start_spare(self) -> None:
        member = None
        try:
            member = self.start()
        except Exception:  # the next checkout starts its own and reports the failure
            pass
        with self.cond:
            self.spares -= 1
            if member is not None:
                if self.host.closed:
                    self.host.discard(member)
                else:
                    self.idle.append(member)
            self.cond.notify_all()

    def drain(self) -> list[Member]:
        with self.cond:
            members, self.idle = self.idle, []
            self.cond.notify_all()
        return members


# --- reading the supervisor's replies ---------------------------------------------------------

def run_request(argv: list[str], env: dict[str, str], limits: Limits, stdin: str | None = None,
                full_stdout: bool = False, **options) -> dict:
    """A step for the supervisor; ``stdin`` names a work-dir file to feed it (else /dev/null),
    ``full_stdout`` keeps all its output up to the cap rather than the diagnostic tail."""
    request = {"op": "run", "argv": list(argv), "env": env, "limits": limits.as_dict(), **options}
    if stdin is not None:
        request["stdin"] = stdin
    if full_stdout:
        request["full_stdout"] = True
    return request


def read_run_reply(reply: dict, limits: Limits) -> tuple[StepResult, str | None]:
    """The step's result from the supervisor's reply, and why the sandbox must not serve
    another candidate (None when it may). ``oom_kills`` in the reply is the number of memory
    kills in the sandbox during the step, None when nobody could count them."""
    if reply.get("spawn_error"):
        return StepResult(exit_code=None, infra_error=reply["spawn_error"]), None
    code = reply["returncode"]
    result = StepResult(
        exit_code=code if code >= 0 else None,
        signal=-code if code < 0 else None,
        wall_seconds=reply["wall"],
        stdout=base64.b64decode(reply["stdout"]).decode("utf-8", errors="replace"),
        stderr=base64.b64decode(reply["stderr"]).decode("utf-8", errors="replace"),
        timed_out=reply["timed_out"],
        output_exceeded=reply["flooded"],
    )
    # Limits the kernel enforces by signal: the hard CPU rlimit (SIGXCPU, then SIGKILL past it), file size.
    if code == -signal.SIGXCPU or (code == -signal.SIGKILL and reply["wall"] >= limits.cpu_seconds):
        result.timed_out = True
    if code == -signal.SIGXFSZ:
        result.file_size_exceeded = True
    if reply.get("cpu") is not None:  # user + system time of the step and what it waited for
        result.extra["cpu_seconds"] = reply["cpu"]
    if reply.get("max_rss_kb") is not None:  # the backend may replace it with its cgroup's peak
        result.extra["peak_memory_mb"] = round(reply["max_rss_kb"] / 1024, 1)
    oom_kills = reply["oom_kills"]
    if oom_kills is None:  # no readable OOM counter: a SIGKILL nobody else sent
        result.memory_exceeded = code == -signal.SIGKILL and not (result.timed_out or result.output_exceeded)
    elif oom_kills > 0 and not result.timed_out:
        result.memory_exceeded = True
    spoiled = None
    if result.timed_out:
        spoiled = "a step timed out"
    elif result.memory_exceeded:
        spoiled = "a step was killed for memory"
    if reply["left_running"]:
        spoiled = spoiled or f"{reply['left_running']} process(es) outlived a step"
        result.extra["processes_left_running"] = reply["left_running"]
    if reply["residue"]:
        spoiled = spoiled or f"could not empty the scratch folders: {reply['residue'][0]}"
    return result, spoiled


def reset_spoils(reply: dict) -> str | None:
    """Why a sandbox that has just been emptied must not serve another candidate, if it must not."""
    if reply["left_running"]:
        return f"{reply['left_running']} process(es) outlived the candidate"
    if reply["residue"]:
        return f"could not empty the work dir: {reply['residue'][0]}"
    if reply["ipc"]:
        return f"IPC objects left behind: {', '.join(reply['ipc'][:3])}"
    return None


def memory_killed(started: float) -> StepResult:
    """The step's result when the sandbox itself died of the memory limit mid-step."""
    return StepResult(exit_code=None, signal=signal.SIGKILL, memory_exceeded=True,
                      wall_seconds=round(time.monotonic() - started, 4))
