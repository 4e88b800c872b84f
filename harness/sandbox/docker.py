"""The production sandbox: a warm pool of locked-down Docker containers per runtime.

Each container has no network, a read-only root, tmpfs ``/work`` and ``/tmp``, no
capabilities, no-new-privileges, uid 10001, and cgroup limits on memory (swap off), processes
and CPU (one core). Its pid 1 is a small supervisor (``step_supervisor.py``) that runs every step
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
import logging
import os
import socket
import struct
import threading
import time
import uuid
from dataclasses import dataclass
from pathlib import Path
from typing import Callable

from ..vocabulary import Limits, RuntimeSandboxNeeds, StepResult
from .base import ClosingSandbox, SandboxUnavailable
from .cgroups import Cgroup
from .supervised import (
    AGENT_SOURCE,
    CALL_SECONDS,
    HELLO_SECONDS,
    STEP_GRACE_SECONDS,
    Channel,
    ChannelLost,
    Member,
    SupervisorError,
    SupervisorTrouble,
    WarmPool,
    brief,
    max_runs_from_env,
    memory_killed,
    read_run_reply,
    run_request,
)

LOG = logging.getLogger("assay.sandbox")
WORK_DIR = "/work"
RUNNER = "10001:10001"
LABEL_OWNER = "assay.owner"
LABEL_OWNER_START = "assay.owner-start"
LABEL_HOST = "assay.host"
LABEL_RUN = "assay.run"
LABEL_RUNTIME = "assay.runtime"
LABEL_ROLE = "assay.role"  # "compile-server" on a warm compiler's container; none on a candidate's
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
API_SECONDS = 120
ENV_BASE = {"HOME": WORK_DIR, "TMPDIR": "/tmp", "LANG": "C.UTF-8", "PATH": "/usr/local/bin:/usr/bin:/bin"}


class DaemonTrouble(SupervisorTrouble):
    """The Docker daemon or a container failed: not the candidate's doing."""


def _transient_errors() -> tuple[type[BaseException], ...]:
    import docker
    import requests

    return (SupervisorTrouble, OSError, requests.exceptions.RequestException, docker.errors.APIError)


def _is_transient(exc: BaseException, container_gone: bool = False) -> bool:
    """Daemon trouble worth another try. ``container_gone``: a container that vanished (someone
    removed it) counts too, where the caller can move to a fresh one."""
    import docker

    if isinstance(exc, docker.errors.NotFound):
        return container_gone
    if isinstance(exc, docker.errors.APIError):
        return exc.is_server_error() or exc.status_code == 409
    return isinstance(exc, _transient_errors())


# --- the channel to a container's supervisor --------------------------------------------------

def read_frame(exact: Callable[[int], bytes | None]) -> tuple[int, bytes] | None:
    """One frame of a container's attached, multiplexed stream (the Engine API's attach
    documentation: an 8-byte header of stream id, three zero bytes and the big-endian payload
    size, then the payload): (stream id, 2 for stderr, payload), or None where ``exact``, which
    reads that many bytes, finds the stream's end."""
    header = exact(8)
    if header is None:
        return None
    payload = exact(struct.unpack(">I", header[4:])[0])
    return None if payload is None else (header[0], payload)


class DockerChannel(Channel):
    """The container's attached stdin; replies come back in Docker's multiplexed stream frames
    (``read_frame``)."""

    def __init__(self, stream):
        super().__init__()
        self.stream = stream  # keeps the HTTP response object alive
        self.sock: socket.socket = getattr(stream, "_sock", stream)
        self.stdout = bytearray()
        self.stderr = bytearray()

    def _send_bytes(self, data: bytes) -> None:
        try:
            self.sock.settimeout(CALL_SECONDS)
            self.sock.sendall(data)
        except OSError as exc:
            raise ChannelLost(f"cannot reach the container's supervisor: {exc}") from None

    def _line(self, deadline: float) -> bytes:
        while b"\n" not in self.stdout:
            stream, payload = read_frame(lambda size: self._exact(size, deadline))  # _exact raises at the end
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


# --- containers -------------------------------------------------------------------------------

@dataclass(kw_only=True)
class Box(Member):
    """One running container and what is known about it."""

    id: str
    memory: int
    pids: int
    cgroup: Cgroup | None = None


# --- one candidate's workspace ---------------------------------------------------------------

class DockerWorkspace:
    """``/work`` of one checked-out container. Keeps a journal of its files and steps, so
    that when the daemon fails it can carry on in a fresh container. Writes are pipelined:
    their acknowledgements are read before the next request's reply."""

    def __init__(self, sandbox: "DockerSandbox", pool: WarmPool, needs: RuntimeSandboxNeeds):
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
        self.write_bytes(name, content.encode("utf-8"))

    def write_bytes(self, name: str, data: bytes) -> None:
        """A new file in /work (a compiled file a warm compiler made, say)."""
        request = {"op": "write", "name": name, "data": base64.b64encode(data).decode("ascii")}
        self.journal.append((request, None))
        self._perform(request, CALL_SECONDS, None, deferred=True)

    def read(self, name: str, max_bytes: int) -> bytes | None:
        reply = self._perform({"op": "read", "name": name, "max_bytes": max_bytes}, CALL_SECONDS, None)
        return None if reply["data"] is None else base64.b64decode(reply["data"])

    def run(self, argv: list[str], limits: Limits, env: dict[str, str], *, stdin: str | None = None,
            full_stdout: bool = False) -> StepResult:
        merged = dict(ENV_BASE)
        merged.update(dict(self.needs.env))
        merged.update(env)
        request = run_request(argv, merged, limits, stdin, full_stdout)
        started = time.monotonic()
        try:
            reply = self._perform(request, limits.wall_seconds + STEP_GRACE_SECONDS, limits)
        except SupervisorTrouble as exc:
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
            return memory_killed(started)
        result, spoiled = read_run_reply(reply, limits)
        self.box.spoiled = self.box.spoiled or spoiled
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
                self.box.spoiled = f"daemon trouble: {brief(exc)}"
        raise DaemonTrouble(f"gave up after {len(BACKOFF_SECONDS) + 1} tries: {brief(last)}")

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
        if self.box.spoiled is None:
            try:
                self._confirm()
            except Exception as exc:
                self.box.spoiled = f"daemon trouble: {brief(exc)}"
        self.pool.release(self.box)


# --- the backend -----------------------------------------------------------------------------

class DockerSandbox(ClosingSandbox):
    name = "docker"

    def __init__(self, work_root: Path | None = None, *, max_runs: int | None = None):
        # work_root is accepted for make_sandbox's sake: candidates' files live in containers.
        self.run_id = uuid.uuid4().hex
        self.max_runs = max_runs if max_runs is not None else max_runs_from_env(MAX_RUNS_ENV, DEFAULT_MAX_RUNS)
        self.client = None
        self.daemon: dict = {}
        self.images: dict[str, dict] = {}
        self.warm_in_images: dict[str, str | None] = {}  # runtime -> its image's warm compiler files
        self.pools: dict[str, WarmPool | SandboxUnavailable] = {}
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
            except Exception as exc:  # the daemon answered the ping, then failed
                raise SandboxUnavailable(f"the Docker daemon failed while the sandbox started: {brief(exc)}") from None
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
            "supervisor": "pid-1 step supervisor (harness/sandbox/step_supervisor.py) on the image's python3",
            "max_runs_per_container": self.max_runs,
            "images": self.images,
        }

    def close(self) -> None:
        """Never raises: containers that cannot be removed now are logged (orphans are removed
        by the next start)."""
        with self._lock:
            if self.closed:
                return
            self.closed = True
        pools = [p for p in self.pools.values() if isinstance(p, WarmPool)]
        for pool in pools:
            for box in pool.drain():
                box.channel.close()
        for future in list(self._pending):
            with contextlib.suppress(Exception):
                future.result(timeout=HELLO_SECONDS)
        self._executor.shutdown(wait=True)
        if self.client is not None:
            try:
                self.retry(lambda: remove_containers(self.client, run_id=self.run_id), "remove containers")
            except Exception as exc:  # noqa: BLE001 - close never stops a run; the next start removes them
                LOG.warning("assay: docker sandbox: could not remove this run's containers (%s); the next run, "
                            "or 'assay sandbox clean', removes them", brief(exc))
        with contextlib.suppress(Exception):
            atexit.unregister(self.close)

    # -- images and pools --
    def pool_for(self, needs: RuntimeSandboxNeeds) -> WarmPool:
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

    def _make_pool(self, needs: RuntimeSandboxNeeds) -> WarmPool:
        from .images import find_image, image_tag, image_warm_files, inspect_image

        if not needs.image and not needs.digest:
            raise SandboxUnavailable(f"docker sandbox: the {needs.name} runtime names no image and no folder to build one")
        tag = image_tag(needs)
        image_id = self.retry(lambda: find_image(self.client, tag), "look up an image")
        if image_id is None:
            raise SandboxUnavailable(
                f"docker sandbox: no image {tag} for the {needs.name} runtime (built from its current files); "
                f"build it with: assay runtimes build {needs.name} (add --offline-base without a registry)"
            )
        facts = self.retry(lambda: inspect_image(self.client, tag), "look up an image") or {}
        self.images[needs.name] = {"tag": tag, "id": image_id}
        self.warm_in_images[needs.name] = image_warm_files(facts)
        return WarmPool(self, lambda: self.start_box(image_id, needs.name))

    def warm_files(self, needs: RuntimeSandboxNeeds) -> tuple[str, str | None]:
        """(the runtime's image id, where it keeps its warm compiler files): None when it was
        built without them, ``""`` when their build failed (images.py, ``assay.warm-files``).
        SandboxUnavailable when the runtime has no image."""
        self.check()
        self.pool_for(needs)
        return self.images[needs.name]["id"], self.warm_in_images.get(needs.name)

    # -- containers --
    def _create(self, image: str, command: list[str], labels: dict[str, str], memory: int, pids: int,
                environment: dict[str, str] | None = None, **extra) -> str:
        """A locked-down container (not started): network none, read-only root, tmpfs /work and
        /tmp, no capabilities, no-new-privileges, uid 10001, memory (swap equal), pids and one
        CPU. Its stdin stays open for the harness to attach: with detach=False Docker also sets
        StdinOnce, so its pid 1's stdin closes when our attachment drops and a crashed harness
        stops it."""
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
            **extra,
        )
        return api.create_container(image, command=command, user=RUNNER, working_dir=WORK_DIR,
                                    labels={**self.labels, **labels}, host_config=host_config,
                                    environment=environment, stdin_open=True, detach=False,
                                    hostname="sandbox")["Id"]

    def start_compile_server(self, image: str, runtime: str, command: list[str], env: dict[str, str],
                             limits: Limits):
        """A container of its own for a warm compiler (harness/sandbox/docker_compilers.py):
        ``command`` as its pid 1, at the compile step's memory, pids and file size limits, with
        no core files. Returns (container id, the attached stream); the caller removes it."""
        import docker

        self.check()
        memory = limits.memory_mb * 2**20
        file_bytes = limits.max_file_mb * 2**20
        ulimits = [docker.types.Ulimit(name="fsize", soft=file_bytes, hard=file_bytes),
                   docker.types.Ulimit(name="core", soft=0, hard=0)]
        api = self.client.api
        container = self._create(image, command, {LABEL_RUNTIME: runtime, LABEL_ROLE: "compile-server"},
                                 memory, limits.max_processes, {**ENV_BASE, **env}, ulimits=ulimits)
        try:
            stream = api.attach_socket(container, params={"stdin": 1, "stdout": 1, "stderr": 1, "stream": 1})
            api.start(container)
        except BaseException:
            with contextlib.suppress(Exception):
                api.remove_container(container, force=True)
            raise
        if self.closed:
            with contextlib.suppress(Exception):
                stream.close()
            self.remove_container(container)
            raise DaemonTrouble("the sandbox was closed")
        return container, stream

    def remove_container(self, container: str) -> None:
        """Remove a container now (retrying daemon trouble); gone already is fine."""
        self.retry(lambda: self.client.api.remove_container(container, force=True), "remove a container",
                   not_found_ok=True)

    def start_box(self, image: str, runtime: str) -> Box:
        limits = Limits()
        memory = (limits.memory_mb + SUPERVISOR_MB) * 2**20
        pids = limits.max_processes + 1
        api = self.client.api
        container = self._create(image, ["python3", "-I", "-S", "-c", AGENT_SOURCE], {LABEL_RUNTIME: runtime},
                                 memory, pids)
        try:
            stream = api.attach_socket(container, params={"stdin": 1, "stdout": 1, "stderr": 1, "stream": 1})
            channel = DockerChannel(stream)
            api.start(container)
            hello = channel.call({"op": "hello"}, HELLO_SECONDS)
            if hello["pid"] != 1 or hello["uid"] != 10001:
                raise SupervisorError(f"supervisor runs as pid {hello['pid']}, uid {hello['uid']}")
        except BaseException:
            with contextlib.suppress(Exception):
                api.remove_container(container, force=True)
            raise
        box = Box(id=container, channel=channel, memory=memory, pids=pids, cgroup=find_container_cgroup(api, container),
                  launcher=hello.get("launcher"))
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
            box.cgroup.set_limits(memory, pids, old_memory=box.memory)
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
                    raise DaemonTrouble(f"could not {what}: {brief(exc)}") from None
                time.sleep(BACKOFF_SECONDS[attempt])


def find_container_cgroup(api, container: str, root: Path = Path("/sys/fs/cgroup")) -> Cgroup | None:
    """A container's cgroup directories as this host sees them (v1: memory and pids
    hierarchies; v2: one directory). Found through the container's pid 1, and only trusted
    when the path names the container, so a daemon on another host or in another pid
    namespace falls back to the API."""
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
        group = Cgroup(1, (root / "memory" / paths["memory"], root / "pids" / paths["pids"]))
        needed = [group.dirs[0] / "memory.limit_in_bytes", group.dirs[1] / "pids.max"]
    elif "" in paths:
        group = Cgroup(2, (root / paths[""],))
        needed = [group.dirs[0] / "memory.max", group.dirs[0] / "pids.max"]
    else:
        return None
    if container not in str(group.dirs[0]) or not all(os.access(f, os.W_OK) for f in needed):
        return None
    return group


# --- the daemon and the labels ---------------------------------------------------------------

def connect(timeout: int = API_SECONDS):
    """A client for the daemon DOCKER_HOST names, or SandboxUnavailable saying what to do."""
    import docker

    where = os.environ.get("DOCKER_HOST") or "unix:///var/run/docker.sock"
    try:
        client = docker.from_env(timeout=timeout)
        client.ping()
    except Exception as exc:  # the SDK wraps connection failures in several exception types
        reason = brief(exc)
        if "Connection refused" in str(exc) or "No such file" in str(exc) or "FileNotFoundError" in str(exc):
            reason = "nothing is listening there"
        raise SandboxUnavailable(
            f"cannot reach the Docker daemon at {where} ({reason}). Start it (for example "
            "'systemctl start docker', or 'dockerd &' as root; .ci/docker-setup.sh does both), point DOCKER_HOST "
            "at a running one, or choose another backend with --sandbox bubblewrap."
        ) from None
    return client


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
