"""The production sandbox: a warm pool of locked-down Docker containers per runtime.

Each container has no network, a read-only root, tmpfs ``/work`` and ``/tmp``, no
capabilities, no-new-privileges, uid 10001, and cgroup limits on memory (swap off), processes
and CPU (one core). Its pid 1 is a small supervisor (``docker_agent.py``) that runs every step
with rlimits, a wall clock and an output cap; the backend reaches it over the container's
attached stdin/stdout, so a step costs a fork, not a ``docker exec``.

A container serves one candidate at a time; ``/work`` is emptied between candidates, and the
scratch folders (``/tmp``, ``/dev/shm``) after every step, as bubblewrap's fresh ``/tmp``; the
root is read-only, so nothing else takes files. A container is discarded (and a replacement
started in the background) after a timeout, a memory kill, any sign of tampering (processes
outliving a step, files that cannot be removed, IPC objects left behind), and after
``ASSAY_DOCKER_MAX_RUNS`` candidates (default 50).

Nothing outlives a run: containers carry ``assay.owner``/``assay.run`` labels, ``close()``
removes the run's containers, a container whose harness dies stops by itself (its
supervisor's stdin closes), and every backend start removes containers whose owner process
is gone. ``assay sandbox clean`` removes them all on demand.

Daemon trouble never counts against a candidate: the backend retries with backoff on a fresh
container, replaying the candidate's earlier files and steps, and reports ``infra_error``
(which the store retries on the next run) only when that keeps failing.
"""

from __future__ import annotations

import atexit
import base64
import concurrent.futures as futures
import contextlib
import json
import os
import signal
import socket
import struct
import threading
import time
import uuid
from dataclasses import dataclass
from pathlib import Path

from .base import Limits, RuntimeSandboxNeeds, SandboxUnavailable, StepResult

AGENT_SOURCE = Path(__file__).with_name("docker_agent.py").read_text(encoding="utf-8")
WORK_DIR = "/work"
RUNNER = "10001:10001"
LABEL_OWNER = "assay.owner"
LABEL_OWNER_START = "assay.owner-start"
LABEL_HOST = "assay.host"
LABEL_RUN = "assay.run"
LABEL_RUNTIME = "assay.runtime"
MAX_RUNS_ENV = "ASSAY_DOCKER_MAX_RUNS"
DEFAULT_MAX_RUNS = 50
# The supervisor (a Python process: ~8 MB charged when idle) lives in the same memory cgroup as the
# step, so the container gets this much on top of the step's own limit.
SUPERVISOR_MB = 12
TMPFS = {
    WORK_DIR: "rw,exec,nosuid,nodev,size=256m,mode=0700,uid=10001,gid=10001",
    "/tmp": "rw,exec,nosuid,nodev,size=64m,mode=1777",
}
CPUS = 1
BACKOFF_SECONDS = (0.5, 1.0, 2.0)  # waits before the 2nd, 3rd and 4th try
STEP_GRACE_SECONDS = 15.0  # beyond the step's own wall limit before the supervisor counts as lost
CALL_SECONDS = 60.0
API_SECONDS = 120
HELLO_SECONDS = 60.0
ENV_BASE = {"HOME": WORK_DIR, "TMPDIR": "/tmp", "LANG": "C.UTF-8", "PATH": "/usr/local/bin:/usr/bin:/bin"}


class DaemonTrouble(Exception):
    """The Docker daemon, a container or the channel to its supervisor failed: not the
    candidate's doing."""


class ChannelLost(DaemonTrouble):
    """The supervisor's stream ended or went silent."""


class SupervisorError(DaemonTrouble):
    """The supervisor answered a request with an error."""


def _transient_errors() -> tuple[type[BaseException], ...]:
    import docker
    import requests

    return (DaemonTrouble, OSError, requests.exceptions.RequestException, docker.errors.APIError)


def _is_transient(exc: BaseException, container_gone: bool = False) -> bool:
    """Daemon trouble worth another try. ``container_gone``: a container that vanished (someone
    removed it) counts too, where the caller can move to a fresh one."""
    import docker

    if isinstance(exc, docker.errors.NotFound):
        return container_gone
    if isinstance(exc, docker.errors.APIError):
        return exc.is_server_error() or exc.status_code == 409
    return isinstance(exc, _transient_errors())


def _brief(exc: BaseException) -> str:
    text = str(exc).strip().splitlines()
    return (text[0] if text else type(exc).__name__)[:300]


# --- the channel to a container's supervisor --------------------------------------------------

class Channel:
    """JSON lines to the supervisor's stdin; its replies come back in Docker's multiplexed
    stream frames (8-byte header: stream id, three zero bytes, big-endian payload size).
    Requests may be pipelined: ``send`` now, ``receive`` the reply later (replies come in
    order)."""

    def __init__(self, stream):
        self.stream = stream  # keeps the HTTP response object alive
        self.sock: socket.socket = getattr(stream, "_sock", stream)
        self.stdout = bytearray()
        self.stderr = bytearray()
        self.seq = 0

    def call(self, request: dict, timeout: float) -> dict:
        return self.receive(self.send(request), timeout)

    def send(self, request: dict) -> int:
        self.seq += 1
        try:
            self.sock.settimeout(CALL_SECONDS)
            self.sock.sendall(json.dumps(dict(request, seq=self.seq)).encode("ascii") + b"\n")
        except OSError as exc:
            raise ChannelLost(f"cannot reach the container's supervisor: {exc}") from None
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

    def _line(self, deadline: float) -> bytes:
        while b"\n" not in self.stdout:
            header = self._exact(8, deadline)
            stream, size = header[0], struct.unpack(">I", header[4:])[0]
            payload = self._exact(size, deadline)
            if stream == 2:
                self.stderr = (self.stderr + payload)[-4096:]
            else:
                self.stdout += payload
        line, _, rest = self.stdout.partition(b"\n")
        self.stdout = bytearray(rest)
        return bytes(line)

    def _exact(self, size: int, deadline: float) -> bytes:
        data = bytearray()
        while len(data) < size:
            remaining = deadline - time.monotonic()
            if remaining <= 0:
                raise ChannelLost("the container's supervisor did not answer in time")
            try:
                self.sock.settimeout(remaining)
                chunk = self.sock.recv(size - len(data))
            except socket.timeout:
                continue
            except OSError as exc:
                raise ChannelLost(f"lost the container's supervisor: {exc}") from None
            if not chunk:
                detail = self.stderr.decode("utf-8", "replace").strip()[-300:]
                raise ChannelLost("the container's supervisor exited" + (f": {detail}" if detail else ""))
            data += chunk
        return bytes(data)

    def close(self) -> None:
        for thing in (self.sock, self.stream):
            with contextlib.suppress(Exception):
                thing.close()


# --- containers and pools --------------------------------------------------------------------

@dataclass
class Box:
    """One running container and what is known about it."""

    id: str
    channel: Channel
    memory: int
    pids: int
    cgroup: "HostCgroup | None" = None
    served: int = 0
    spoiled: str | None = None
    reset_seq: int | None = None  # the reset sent when the last candidate left, reply unread

    def settle(self) -> None:
        """Read the pending reset's reply: the container is reusable only if the last
        candidate left nothing behind."""
        seq, self.reset_seq = self.reset_seq, None
        if seq is None or self.spoiled:
            return
        try:
            reply = self.channel.receive(seq, CALL_SECONDS)
        except Exception as exc:
            self.spoiled = f"reset failed: {_brief(exc)}"
            return
        if reply["left_running"]:
            self.spoiled = f"{reply['left_running']} process(es) outlived the candidate"
        elif reply["residue"]:
            self.spoiled = f"could not empty the work dir: {reply['residue'][0]}"
        elif reply["ipc"]:
            self.spoiled = f"IPC objects left behind: {', '.join(reply['ipc'][:3])}"


class Pool:
    """Warm containers of one image. A container is checked out by one candidate at a time;
    discarded ones are replaced in the background so the next checkout finds one ready."""

    def __init__(self, sandbox: "DockerSandbox", runtime: str, image: str):
        self.sandbox = sandbox
        self.runtime = runtime
        self.image = image
        self.idle: list[Box] = []
        self.spares = 0  # replacements being started in the background
        self.cond = threading.Condition()

    def acquire(self) -> Box:
        while True:
            with self.cond:
                while not self.idle and self.spares > 0 and not self.sandbox.closed:
                    self.cond.wait(timeout=HELLO_SECONDS)
                box = self.idle.pop() if self.idle else None
            if box is None:
                return self.sandbox.start_box(self.image, self.runtime)
            box.settle()
            if box.spoiled is None:
                return box
            self._replace(box)

    def release(self, box: Box) -> None:
        if box.spoiled is None and box.served >= self.sandbox.max_runs:
            box.spoiled = f"served {box.served} candidates"
        if box.spoiled is None and not self.sandbox.closed:
            try:  # emptied while nobody waits; the next checkout reads the outcome
                box.reset_seq = box.channel.send({"op": "reset"})
            except DaemonTrouble as exc:
                box.spoiled = f"reset failed: {_brief(exc)}"
        if box.spoiled is None and not self.sandbox.closed:
            with self.cond:
                self.idle.append(box)
                self.cond.notify()
            return
        self._replace(box)

    def _replace(self, box: Box) -> None:
        self.sandbox.discard(box)
        if not self.sandbox.closed:
            with self.cond:
                self.spares += 1
            self.sandbox.background(self._start_spare)

    def warm(self, count: int) -> None:
        boxes = list(self.sandbox.pool_threads(lambda _: self.sandbox.start_box(self.image, self.runtime),
                                               range(count)))
        with self.cond:
            self.idle += boxes
            self.cond.notify_all()

    def _start_spare(self) -> None:
        box = None
        try:
            box = self.sandbox.start_box(self.image, self.runtime)
        except Exception:  # the next checkout starts its own and reports the failure
            pass
        with self.cond:
            self.spares -= 1
            if box is not None:
                if self.sandbox.closed:
                    self.sandbox.discard(box)
                else:
                    self.idle.append(box)
            self.cond.notify_all()

    def drain(self) -> list[Box]:
        with self.cond:
            boxes, self.idle = self.idle, []
            self.cond.notify_all()
        return boxes


# --- one candidate's workspace ---------------------------------------------------------------

class DockerWorkspace:
    """``/work`` of one checked-out container. Keeps a journal of its files and steps, so
    that when the daemon fails it can carry on in a fresh container. Writes are pipelined:
    their acknowledgements are read before the next request's reply."""

    def __init__(self, sandbox: "DockerSandbox", pool: Pool, needs: RuntimeSandboxNeeds):
        self.sandbox = sandbox
        self.pool = pool
        self.needs = needs
        self.box = sandbox.retry(pool.acquire, "start a container")
        self.journal: list[tuple[dict, Limits | None]] = []
        self.unconfirmed: list[int] = []
        self.recoveries = 0

    @property
    def container_id(self) -> str:
        return self.box.id

    def write(self, name: str, content: str) -> None:
        request = {"op": "write", "name": name, "data": base64.b64encode(content.encode("utf-8")).decode("ascii")}
        self.journal.append((request, None))
        self._perform(request, CALL_SECONDS, None, deferred=True)

    def read(self, name: str, max_bytes: int) -> bytes | None:
        reply = self._perform({"op": "read", "name": name, "max_bytes": max_bytes}, CALL_SECONDS, None)
        return None if reply["data"] is None else base64.b64decode(reply["data"])

    def run(self, argv: list[str], limits: Limits, env: dict[str, str]) -> StepResult:
        merged = dict(ENV_BASE)
        merged.update(dict(self.needs.env))
        merged.update(env)
        request = {"op": "run", "argv": list(argv), "env": merged, "limits": limits.as_dict()}
        started = time.monotonic()
        try:
            reply = self._perform(request, limits.wall_seconds + STEP_GRACE_SECONDS, limits)
        except DaemonTrouble as exc:
            return StepResult(exit_code=None, wall_seconds=round(time.monotonic() - started, 4),
                              infra_error=f"docker sandbox: {exc}"[:500])
        self.journal.append((request, limits))
        result = self._step_result(reply, limits, started)
        if self.recoveries:
            result.extra["sandbox_retries"] = self.recoveries
        return result

    def _step_result(self, reply: dict, limits: Limits, started: float) -> StepResult:
        if reply.get("container_oom"):
            self.box.spoiled = "the container was killed for memory"
            return StepResult(exit_code=None, signal=signal.SIGKILL, memory_exceeded=True,
                              wall_seconds=round(time.monotonic() - started, 4))
        if reply.get("spawn_error"):
            return StepResult(exit_code=None, infra_error=reply["spawn_error"])
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
        # The same readings as harness/sandbox/process.py makes of a local child.
        if code == -signal.SIGXCPU or (code == -signal.SIGKILL and reply["wall"] >= limits.cpu_seconds):
            result.timed_out = True
        if code == -signal.SIGXFSZ:
            result.file_size_exceeded = True
        oom_kills = reply["oom_kills"]
        if oom_kills is None:  # no readable OOM counter: a SIGKILL nobody else sent
            result.memory_exceeded = code == -signal.SIGKILL and not (result.timed_out or result.output_exceeded)
        elif oom_kills > 0 and not result.timed_out:
            result.memory_exceeded = True
        if result.timed_out:
            self.box.spoiled = self.box.spoiled or "a step timed out"
        if result.memory_exceeded:
            self.box.spoiled = self.box.spoiled or "a step was killed for memory"
        if reply["left_running"]:
            self.box.spoiled = self.box.spoiled or f"{reply['left_running']} process(es) outlived a step"
            result.extra["processes_left_running"] = reply["left_running"]
        if reply["residue"]:
            self.box.spoiled = self.box.spoiled or f"could not empty the scratch folders: {reply['residue'][0]}"
        return result

    def _perform(self, request: dict, timeout: float, limits: Limits | None, deferred: bool = False) -> dict:
        """Send one request, carrying on in a fresh container (with the journal replayed) if
        the daemon or container fails; DaemonTrouble once the tries are used up. A
        ``deferred`` request must already be in the journal; its reply is read later."""
        last: BaseException | None = None
        for attempt in range(len(BACKOFF_SECONDS) + 1):
            try:
                if attempt:
                    time.sleep(BACKOFF_SECONDS[attempt - 1])
                    self._move_to_fresh_box()
                    if deferred:  # the replay has just done it
                        return {}
                self._confirm()
                if deferred:
                    self.unconfirmed.append(self.box.channel.send(request))
                    return {}
                if limits is not None:
                    self.sandbox.fit_limits(self.box, limits)
                return self.box.channel.call(request, timeout)
            except Exception as exc:
                if not _is_transient(exc, container_gone=True):
                    raise
                last = exc
                if limits is not None and self.sandbox.died_of_memory(self.box):
                    return {"container_oom": True}
                self.box.spoiled = f"daemon trouble: {_brief(exc)}"
        raise DaemonTrouble(f"gave up after {len(BACKOFF_SECONDS) + 1} tries: {_brief(last)}")

    def _confirm(self) -> None:
        while self.unconfirmed:
            self.box.channel.receive(self.unconfirmed[0], CALL_SECONDS)
            self.unconfirmed.pop(0)

    def _move_to_fresh_box(self) -> None:
        old = self.box
        self.box = self.pool.acquire()
        self.recoveries += 1
        self.unconfirmed = []
        self.sandbox.discard(old)
        for request, limits in self.journal:
            if limits is not None:
                self.sandbox.fit_limits(self.box, limits)
                self.box.channel.call(request, limits.wall_seconds + STEP_GRACE_SECONDS)
            else:
                self.box.channel.call(request, CALL_SECONDS)

    def release(self) -> None:
        """Hand the container back: the pool empties it for the next candidate, or discards it."""
        self.box.served += 1
        if self.box.spoiled is None:
            try:
                self._confirm()
            except Exception as exc:
                self.box.spoiled = f"daemon trouble: {_brief(exc)}"
        self.pool.release(self.box)


# --- the backend -----------------------------------------------------------------------------

class DockerSandbox:
    name = "docker"

    def __init__(self, work_root: Path | None = None, *, max_runs: int | None = None,
                 runtimes_dirs: list[Path] | None = None):
        # work_root is accepted for make_sandbox's sake: candidates' files live in containers.
        self.run_id = uuid.uuid4().hex
        self.max_runs = max_runs if max_runs is not None else _max_runs_from_env()
        self.runtimes_dirs = runtimes_dirs
        self.client = None
        self.daemon: dict = {}
        self.images: dict[str, dict] = {}
        self.pools: dict[str, Pool | SandboxUnavailable] = {}
        self.orphans_removed = 0
        self.closed = False
        self._lock = threading.Lock()
        self._executor = futures.ThreadPoolExecutor(max_workers=2, thread_name_prefix="assay-docker")
        self._pending: set[futures.Future] = set()
        self.labels = {LABEL_RUN: self.run_id, **owner_labels()}
        atexit.register(self.close)

    # -- protocol --
    def check(self) -> None:
        with self._lock:
            if self.client is not None:
                return
            client = connect()
            try:
                info = client.info()
                orphans = remove_containers(client, orphans_only=True)
                self.images = self._survey_images(client)
            except Exception as exc:  # the daemon answered the ping, then failed
                raise SandboxUnavailable(f"the Docker daemon failed while the sandbox started: {_brief(exc)}") from None
            self.daemon = {
                "version": info.get("ServerVersion"),
                "api_version": client.api.api_version,
                "cgroup_version": info.get("CgroupVersion"),
                "cgroup_driver": info.get("CgroupDriver"),
                "runtime": info.get("DefaultRuntime"),
                "security": info.get("SecurityOptions"),
            }
            self.orphans_removed = len(orphans)
            self.client = client

    @contextlib.contextmanager
    def workspace(self, needs: RuntimeSandboxNeeds):
        self.check()
        space = DockerWorkspace(self, self.pool_for(needs), needs)
        try:
            yield space
        except BaseException:
            space.box.spoiled = space.box.spoiled or "the candidate's handling was interrupted"
            raise
        finally:
            space.release()

    def describe(self) -> dict:
        self.check()
        return {
            "backend": self.name,
            "version": f"Docker {self.daemon.get('version')} (API {self.daemon.get('api_version')})",
            "daemon": self.daemon,
            "isolation": ("container per candidate at a time: network none, read-only root, tmpfs /work and /tmp, "
                          "all capabilities dropped, no-new-privileges, uid 10001"),
            "limits": (f"cgroup memory = step limit + {SUPERVISOR_MB} MB supervisor allowance, swap = memory; "
                       f"pids = step max_processes + 1; {CPUS} CPU; rlimits CPU/file size inside"),
            "supervisor": "pid-1 step supervisor (harness/sandbox/docker_agent.py) on the image's python3",
            "max_runs_per_container": self.max_runs,
            "images": self.images,
        }

    def close(self) -> None:
        with self._lock:
            if self.closed:
                return
            self.closed = True
        pools = [p for p in self.pools.values() if isinstance(p, Pool)]
        for pool in pools:
            for box in pool.drain():
                box.channel.close()
        for future in list(self._pending):
            with contextlib.suppress(Exception):
                future.result(timeout=HELLO_SECONDS)
        self._executor.shutdown(wait=True)
        if self.client is not None:
            with contextlib.suppress(Exception):
                self.retry(lambda: remove_containers(self.client, run_id=self.run_id), "remove containers")
        with contextlib.suppress(Exception):
            atexit.unregister(self.close)

    # -- images and pools --
    def pool_for(self, needs: RuntimeSandboxNeeds) -> Pool:
        with self._lock:
            pool = self.pools.get(needs.name)
            if pool is None:
                try:
                    pool = self._make_pool(needs)
                except SandboxUnavailable as exc:
                    pool = exc
                self.pools[needs.name] = pool
        if isinstance(pool, SandboxUnavailable):
            raise pool
        return pool

    def warm(self, needs: RuntimeSandboxNeeds, count: int) -> None:
        """Start ``count`` containers for a runtime ahead of its first candidates."""
        self.check()
        self.pool_for(needs).warm(count)

    def _make_pool(self, needs: RuntimeSandboxNeeds) -> Pool:
        from .images import find_image, image_tag

        if needs.image:
            tag = needs.image
        else:
            from ..runtimes import RuntimeConfigError, load_runtime

            try:
                runtime = load_runtime(needs.name, self.runtimes_dirs)
            except RuntimeConfigError as exc:
                raise SandboxUnavailable(f"docker sandbox: {exc}") from None
            tag = image_tag(runtime)
        image_id = self.retry(lambda: find_image(self.client, tag), "look up an image")
        if image_id is None:
            raise SandboxUnavailable(
                f"docker sandbox: no image {tag} for the {needs.name} runtime (built from its current files); "
                f"build it with: assay runtimes build {needs.name} (add --offline-base without a registry)"
            )
        self.images[needs.name] = {"tag": tag, "id": image_id}
        return Pool(self, needs.name, image_id)

    def _survey_images(self, client) -> dict[str, dict]:
        """Every known runtime's expected image and, when built, its id (for the manifest)."""
        from ..runtimes import RuntimeConfigError, available_runtimes, load_runtime
        from .images import dockerfile_path, find_image, image_tag

        found = {}
        for name in available_runtimes(self.runtimes_dirs):
            try:
                runtime = load_runtime(name, self.runtimes_dirs)
            except RuntimeConfigError:
                continue
            if runtime.needs.image or not dockerfile_path(runtime).is_file():
                continue
            tag = image_tag(runtime)
            found[name] = {"tag": tag, "id": find_image(client, tag)}
        return found

    # -- containers --
    def start_box(self, image: str, runtime: str) -> Box:
        limits = Limits()
        memory = (limits.memory_mb + SUPERVISOR_MB) * 2**20
        pids = limits.max_processes + 1
        api = self.client.api
        host_config = api.create_host_config(
            network_mode="none",
            read_only=True,
            tmpfs=TMPFS,
            cap_drop=["ALL"],
            security_opt=["no-new-privileges:true"],
            pids_limit=pids,
            mem_limit=memory,
            memswap_limit=memory,
            nano_cpus=CPUS * 10**9,
            log_config={"Type": "none", "Config": {}},
            init=False,
        )
        created = api.create_container(
            image,
            command=["python3", "-I", "-S", "-c", AGENT_SOURCE],
            user=RUNNER,
            working_dir=WORK_DIR,
            labels={**self.labels, LABEL_RUNTIME: runtime},
            host_config=host_config,
            stdin_open=True,  # with detach=False this also sets StdinOnce: the supervisor's stdin
            detach=False,     # closes when our attachment drops, so a crashed harness stops it
            hostname="sandbox",
        )
        container = created["Id"]
        try:
            stream = api.attach_socket(container, params={"stdin": 1, "stdout": 1, "stderr": 1, "stream": 1})
            channel = Channel(stream)
            api.start(container)
            hello = channel.call({"op": "hello"}, HELLO_SECONDS)
            if hello["pid"] != 1 or hello["uid"] != 10001:
                raise SupervisorError(f"supervisor runs as pid {hello['pid']}, uid {hello['uid']}")
        except BaseException:
            with contextlib.suppress(Exception):
                api.remove_container(container, force=True)
            raise
        box = Box(container, channel, memory, pids, HostCgroup.find(api, container))
        if self.closed:
            self.discard(box)
            raise DaemonTrouble("the sandbox was closed")
        return box

    def fit_limits(self, box: Box, limits: Limits) -> None:
        """Set the container's memory (swap equal to it) and pids limits to the step's: in its
        cgroup files when this host holds them (microseconds), else through the Engine API
        (tens of milliseconds: compile and run steps usually differ)."""
        memory = (limits.memory_mb + SUPERVISOR_MB) * 2**20
        pids = limits.max_processes + 1
        if (memory, pids) == (box.memory, box.pids):
            return
        if box.cgroup is not None:
            box.cgroup.set_limits(box.memory, memory, pids)
            box.memory, box.pids = memory, pids
            return
        api = self.client.api
        # docker-py's update_container() has no PidsLimit; the Engine API's update takes it.
        response = api._post_json(api._url("/containers/{0}/update", box.id),
                                  data={"Memory": memory, "MemorySwap": memory, "PidsLimit": pids})
        api._raise_for_status(response)
        box.memory, box.pids = memory, pids

    def died_of_memory(self, box: Box) -> bool:
        """Whether the container's own pid 1 was killed by its memory cgroup (only a step can
        fill it: tmpfs files count as memory)."""
        for _ in range(20):  # the daemon notices the exit a moment after the stream ends
            try:
                state = self.client.api.inspect_container(box.id)["State"]
            except Exception:
                return False
            if not state.get("Running"):
                return bool(state.get("OOMKilled"))
            time.sleep(0.1)
        return False

    def discard(self, box: Box) -> None:
        box.channel.close()
        self.background(lambda: self.retry(lambda: self.client.api.remove_container(box.id, force=True),
                                           "remove a container", not_found_ok=True))

    def background(self, job) -> None:
        try:
            future = self._executor.submit(job)
        except RuntimeError:  # shut down: close() removes what is left by label
            return
        self._pending.add(future)
        future.add_done_callback(self._pending.discard)

    def pool_threads(self, job, items):
        with futures.ThreadPoolExecutor(max_workers=4) as pool:
            return list(pool.map(job, items))

    def retry(self, job, what: str, not_found_ok: bool = False):
        """Run ``job``, retrying daemon trouble with backoff; DaemonTrouble when it persists."""
        import docker

        for attempt in range(len(BACKOFF_SECONDS) + 1):
            try:
                return job()
            except docker.errors.NotFound:
                if not_found_ok:
                    return None
                raise
            except Exception as exc:
                if not _is_transient(exc):
                    raise
                if attempt == len(BACKOFF_SECONDS):
                    raise DaemonTrouble(f"could not {what}: {_brief(exc)}") from None
                time.sleep(BACKOFF_SECONDS[attempt])


class HostCgroup:
    """A container's cgroup directories as this host sees them (v1: memory and pids
    hierarchies; v2: one directory). Found through the container's pid 1, and only trusted
    when the path names the container, so a daemon on another host or in another pid
    namespace falls back to the API."""

    def __init__(self, version: int, memory: Path, pids: Path):
        self.version = version
        self.memory = memory
        self.pids = pids

    @classmethod
    def find(cls, api, container: str, root: Path = Path("/sys/fs/cgroup")) -> "HostCgroup | None":
        try:
            pid = api.inspect_container(container)["State"]["Pid"]
            lines = Path(f"/proc/{pid}/cgroup").read_text().splitlines()
        except Exception:
            return None
        paths = {}
        for line in lines:
            _, controllers, path = line.split(":", 2)
            for controller in controllers.split(",") if controllers else [""]:
                paths[controller] = path.lstrip("/")
        if "memory" in paths and "pids" in paths:
            group = cls(1, root / "memory" / paths["memory"], root / "pids" / paths["pids"])
            needed = [group.memory / "memory.limit_in_bytes", group.pids / "pids.max"]
        elif "" in paths:
            directory = root / paths[""]
            group = cls(2, directory, directory)
            needed = [directory / "memory.max", directory / "pids.max"]
        else:
            return None
        if container not in str(group.memory) or not all(os.access(f, os.W_OK) for f in needed):
            return None
        return group

    def set_limits(self, old_memory: int, memory: int, pids: int) -> None:
        if self.version == 2:
            (self.memory / "memory.max").write_text(str(memory))
            _write_if_present(self.memory / "memory.swap.max", "0")
        else:
            # v1 wants memory <= memory+swap at every moment: order the two writes.
            pair = [("memory.limit_in_bytes", memory), ("memory.memsw.limit_in_bytes", memory)]
            for name, value in (reversed(pair) if memory > old_memory else pair):
                _write_if_present(self.memory / name, str(value), required=name == "memory.limit_in_bytes")
        (self.pids / "pids.max").write_text(str(pids))


def _write_if_present(path: Path, value: str, required: bool = False) -> None:
    if required or path.exists():
        path.write_text(value)


# --- the daemon and the labels ---------------------------------------------------------------

def connect(timeout: int = API_SECONDS):
    """A client for the daemon DOCKER_HOST names, or SandboxUnavailable saying what to do."""
    import docker

    where = os.environ.get("DOCKER_HOST") or "unix:///var/run/docker.sock"
    try:
        client = docker.from_env(timeout=timeout)
        client.ping()
    except Exception as exc:  # the SDK wraps connection failures in several exception types
        reason = _brief(exc)
        if "Connection refused" in str(exc) or "No such file" in str(exc) or "FileNotFoundError" in str(exc):
            reason = "nothing is listening there"
        raise SandboxUnavailable(
            f"cannot reach the Docker daemon at {where} ({reason}). Start it (for example "
            "'systemctl start docker', or 'dockerd &' as root; .ci/docker-setup.sh does both), point DOCKER_HOST "
            "at a running one, or choose another backend with --sandbox bubblewrap."
        ) from None
    return client


def _max_runs_from_env() -> int:
    raw = os.environ.get(MAX_RUNS_ENV, "")
    if not raw:
        return DEFAULT_MAX_RUNS
    try:
        value = int(raw)
    except ValueError:
        value = 0
    if value < 1:
        raise SandboxUnavailable(f"{MAX_RUNS_ENV}={raw!r}: expected a whole number of candidates, 1 or more")
    return value


def host_id() -> str:
    try:
        boot = Path("/proc/sys/kernel/random/boot_id").read_text().strip()
    except OSError:
        boot = ""
    return f"{socket.gethostname()}/{boot}"


def process_start(pid: int) -> str | None:
    """The process's start time in clock ticks since boot (tells a live owner from a new
    process that reused its pid), or None when there is no such process."""
    try:
        text = Path(f"/proc/{pid}/stat").read_text()
    except OSError:
        return None
    return text[text.rfind(")") + 2:].split()[19]


def owner_labels(pid: int | None = None) -> dict[str, str]:
    pid = os.getpid() if pid is None else pid
    return {LABEL_OWNER: str(pid), LABEL_OWNER_START: process_start(pid) or "", LABEL_HOST: host_id()}


def owner_gone(labels: dict[str, str]) -> bool:
    """True only when the labels name a process of this machine that no longer runs."""
    if labels.get(LABEL_HOST) != host_id():
        return False
    try:
        pid = int(labels.get(LABEL_OWNER, ""))
    except ValueError:
        return False
    started = process_start(pid)
    return started is None or started != labels.get(LABEL_OWNER_START)


def remove_containers(client, *, orphans_only: bool = False, run_id: str | None = None) -> list[str]:
    """Remove Assay's containers: all of them, a run's, or those whose owner is gone."""
    import docker

    label = f"{LABEL_RUN}={run_id}" if run_id else LABEL_RUN
    removed = []
    for summary in client.api.containers(all=True, filters={"label": label}):
        if orphans_only and not owner_gone(summary.get("Labels") or {}):
            continue
        try:
            client.api.remove_container(summary["Id"], force=True)
        except docker.errors.NotFound:  # removed meanwhile (its run closing, or auto-removal)
            continue
        removed.append(summary["Id"])
    return removed
