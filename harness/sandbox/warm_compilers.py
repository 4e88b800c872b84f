"""Warm compilers: a compile step that skips starting a compiler cold for every candidate.

A runtime may declare one in runtime.yaml (``compile.warm``, docs/runtime-format.md); one that
declares none, or a backend without warm compilers, compiles cold as before. Two kinds:

* ``server``: a long-lived compiler process (javac's API in one JVM, the TypeScript compiler's
  API in one Node process, mcs.exe in one Mono process) in a sandbox of its own, apart from the sandboxes where candidates
  run: the backend's isolation (bubblewrap's namespaces and seccomp filter; under Docker a
  container of its own, docker_compilers.py; none for ``none``),
  no network, no host files beyond the system and the runtime's own read-only paths, a cgroup
  or rlimits at the compile step's limits. It is fed the cold compile command and the source
  and never runs what it compiles; the files it made are the only thing copied into the
  candidate's workspace, where the run step runs as before. One starts in the background when
  a candidate finds none idle (that candidate compiles cold), and compiles that candidate's
  files WARM_UP_COMPILES times before it serves, so its JIT is warm.
* ``prepared``: a file of the runtime turned once per toolchain into files the compile command
  reads (C++'s precompiled header; Go's index of its precompiled standard library, which lets
  the compiler and linker run without the go command), kept in a cache folder keyed by the
  file's text, the build command and the toolchain's identity; under Docker they are built
  into the runtime's image instead (images.py), once per image. The candidate's own compile
  step, still in the candidate's sandbox, reads them read-only.

Verdicts must equal the cold path's (``tests/test_warm_compilers.py`` compares them), so a
warm result is used only when it is the cold compiler's answer: a server that crashes, runs
out of memory, breaks the protocol or cannot start is retired and the candidate compiles cold;
a compile that exceeds the step's wall or CPU limit ends as the cold step would (timed out),
and the server is retired too. ``ASSAY_WARM_COMPILERS=off`` turns all of it off.
"""

from __future__ import annotations

import concurrent.futures as futures
import contextlib
import hashlib
import os
import resource
import select
import shutil
import signal
import subprocess
import tempfile
import threading
import time
import weakref
from dataclasses import dataclass, field, replace
from pathlib import Path
from typing import Callable, Protocol

from . import seccomp
from ..vocabulary import Limits, RuntimeSandboxNeeds, StepResult
from .base import SandboxError
from .cgroups import Cgroup
from .images import prepared_file_name
from .local import LOG, candidate_env, default_work_root, private_folder, remove_folder
from .process import join_and_drop
from .step_supervisor import keep_tail

ENABLE_ENV = "ASSAY_WARM_COMPILERS"
MAX_USES = 500  # compiles one server serves before a fresh one replaces it
WARM_UP_COMPILES = 20  # compiles of the first candidate's files before a new server serves
WARM_UP_SECONDS = 10.0  # for each of them
MAX_TROUBLES = 10  # servers failing one compile after another: the runtime stays cold from then on
IDLE_SECONDS = 120.0  # a server nobody used for this long is ended
START_SECONDS = 60.0  # for a server's first answer (a JVM compiling the server's own source)
POLL_SECONDS = 0.2  # how often a compile's CPU time is read
MAX_FIELD = 64 << 20
PCH_CACHE_ENV = "ASSAY_PCH_CACHE"
FILES_IN_SANDBOX = "/run/assay-compiler"  # where a bubblewrap compile server sees its runtime's files


def enabled_by_default() -> bool:
    return os.environ.get(ENABLE_ENV, "on").strip().lower() not in ("0", "off", "no", "false")


class ServerTrouble(RuntimeError):
    """A compile server failed (not the candidate's doing): the candidate compiles cold."""


# --- what a compiler is -----------------------------------------------------------------------

class WarmSpec(Protocol):
    """``compile.warm`` of a runtime (harness/runtimes/runtime.py, WarmCompile)."""

    kind: str
    command: tuple[str, ...]
    files: str | None
    file: str | None
    build: tuple[str, ...]


class Compiler(Protocol):
    """How one runtime's compile step runs. ``needs`` is what the candidate's workspace must
    offer (prepared files add a read-only folder)."""

    needs: RuntimeSandboxNeeds

    def compile(self, space, source_file: str, source: str, limits: Limits) -> StepResult: ...

    def describe(self) -> str: ...


@dataclass
class ColdCompiler:
    """Today's path: the compile command in the candidate's own workspace."""

    needs: RuntimeSandboxNeeds
    command: tuple[str, ...]
    why: str = "cold"

    def compile(self, space, source_file: str, source: str, limits: Limits) -> StepResult:
        return space.run(list(self.command), limits, {})

    def describe(self) -> str:
        return self.why


# --- the server protocol ----------------------------------------------------------------------
# Every field is its length in bytes as decimal digits, a newline, then the bytes (the servers
# in runtimes/java/warm/, runtimes/typescript/warm/ and runtimes/csharp/warm/ say the same).

def frame(data: bytes | str | int) -> bytes:
    raw = data if isinstance(data, bytes) else str(data).encode("utf-8")
    return str(len(raw)).encode("ascii") + b"\n" + raw


def compile_request(argv: list[str], files: dict[str, bytes]) -> bytes:
    parts = [frame("compile"), frame(len(argv))] + [frame(arg) for arg in argv] + [frame(len(files))]
    for name, data in files.items():
        parts += [frame(name), frame(data)]
    return b"".join(parts)


class FieldReader:
    """Fields from a server's stdout, each by a deadline (TimeoutError after it; ServerTrouble
    at EOF or on a garbled field). ``wait`` runs while nothing arrives (the CPU watch)."""

    def __init__(self, fd: int):
        self.fd = fd
        self.buffer = bytearray()

    def _fill(self, deadline: float, wait: Callable[[float], None] | None) -> None:
        while True:
            remaining = deadline - time.monotonic()
            if remaining <= 0:
                raise TimeoutError
            readable, _, _ = select.select([self.fd], [], [], min(remaining, POLL_SECONDS))
            if readable:
                chunk = os.read(self.fd, 1 << 16)
                if not chunk:
                    raise ServerTrouble("the compile server exited")
                self.buffer += chunk
                return
            if wait is not None:
                wait(remaining)

    def field(self, deadline: float, wait: Callable[[float], None] | None = None) -> bytes:
        while b"\n" not in self.buffer[:12]:
            if len(self.buffer) >= 12:
                raise ServerTrouble(f"garbled reply from the compile server: {bytes(self.buffer[:40])!r}")
            self._fill(deadline, wait)
        head, _, _ = self.buffer.partition(b"\n")
        if not head.isdigit() or int(head) > MAX_FIELD:
            raise ServerTrouble(f"garbled reply from the compile server: {bytes(head[:40])!r}")
        size, start = int(head), len(head) + 1
        while len(self.buffer) < start + size:
            self._fill(deadline, wait)
        data = bytes(self.buffer[start:start + size])
        del self.buffer[:start + size]
        return data

    def number(self, deadline: float, wait=None) -> int:
        text = self.field(deadline, wait)
        try:
            return int(text)
        except ValueError:
            raise ServerTrouble(f"garbled number from the compile server: {text[:40]!r}") from None


# --- one server -------------------------------------------------------------------------------

@dataclass(kw_only=True)
class Server:
    process: subprocess.Popen
    folder: Path
    scratch: Path | None
    cgroup: Cgroup | None
    reader: FieldReader
    log: Path
    uses: int = 0
    last_used: float = field(default_factory=time.monotonic)

    def send(self, data: bytes) -> None:
        self.process.stdin.write(data)
        self.process.stdin.flush()

    def cpu_seconds(self) -> float:
        """CPU time of every process of the server so far (its cgroup's, else its own tree's)."""
        pids: set[int] = set()
        if self.cgroup is not None:
            for procs in self.cgroup.procs_files:
                with contextlib.suppress(OSError, ValueError):
                    pids |= {int(p) for p in Path(procs).read_text().split()}
        if not pids and self.process is not None:
            pids = {self.process.pid} | set(_descendants(self.process.pid))
        ticks = os.sysconf("SC_CLK_TCK")
        total = 0
        for pid in pids:
            with contextlib.suppress(OSError, ValueError, IndexError):
                fields = Path(f"/proc/{pid}/stat").read_text().rpartition(")")[2].split()
                total += int(fields[11]) + int(fields[12])  # utime, stime (proc(5))
        return total / ticks

    def last_words(self) -> str:
        try:
            with open(self.log, "rb") as handle:
                handle.seek(max(0, os.fstat(handle.fileno()).st_size - 300))
                return handle.read().decode("utf-8", "replace").strip()
        except OSError:
            return ""


def _descendants(root: int) -> list[int]:
    found, frontier = [], [root]
    while frontier:
        pid = frontier.pop()
        try:
            kids = [int(k) for task in os.listdir(f"/proc/{pid}/task")
                    for k in Path(f"/proc/{pid}/task/{task}/children").read_text().split()]
        except OSError:
            kids = []
        found += kids
        frontier += kids
    return found


class ServerLauncher(Protocol):
    """How a backend starts a compile server: ``command`` with ``{files}`` standing for where
    the server sees the host folder ``files`` (read-only), under the compile step's limits."""

    def start(self, needs: RuntimeSandboxNeeds, command: tuple[str, ...], files: Path | None,
              limits: Limits) -> Server: ...

    def end(self, server: Server) -> None: ...

    def close(self) -> None: ...


class LocalLauncher:
    """Compile servers as local child processes in folders and cgroups of their own: inside a
    bubblewrap sandbox of their own for the bubblewrap backend, as plain host processes for
    ``none`` (which isolates nothing anywhere)."""

    def __init__(self, sandbox):
        self.isolated = sandbox.name == "bubblewrap"
        self.sandbox = weakref.ref(sandbox)  # its bubblewrap command; never kept alive by us
        self.run_as = getattr(sandbox, "run_as", None)
        self.cgroups = getattr(sandbox, "cgroups", None)
        self.work_root = Path(tempfile.mkdtemp(prefix="assay-compilers-", dir=default_work_root()))
        os.chmod(self.work_root, 0o711)
        # bubblewrap's --die-with-parent ties a sandbox to the thread that started it.
        self.thread = futures.ThreadPoolExecutor(max_workers=1, thread_name_prefix="assay-compiler-launch")

    def start(self, needs, command, files, limits) -> Server:
        # Under bubblewrap the server's files are bound at a fixed path of their own, never
        # where the host keeps them (which may lie under the server's /work or /tmp).
        seen = FILES_IN_SANDBOX if self.isolated else str(files)
        command = [part.replace("{files}", seen) for part in command] if files is not None else list(command)
        binds = ("--ro-bind", str(files), FILES_IN_SANDBOX) if self.isolated and files is not None else ()
        folder = private_folder(self.work_root, self.run_as, prefix="server-")
        scratch = None if self.isolated else private_folder(self.work_root, None, prefix="tmp-")
        group = None
        try:
            if self.cgroups is not None:
                group = self.cgroups.create(limits.memory_mb * 2**20, limits.max_processes)
            process = self.thread.submit(self._launch, needs, command, binds, limits, folder, scratch, group).result()
        except BaseException:
            if group is not None:
                group.remove(wait_seconds=5)
            for path in (folder, scratch):
                if path is not None:
                    remove_folder(path)
            raise
        return Server(process=process, folder=folder, scratch=scratch, cgroup=group,
                      reader=FieldReader(process.stdout.fileno()), log=folder.with_suffix(".log"))

    def _launch(self, needs, command, binds, limits, folder, scratch, group) -> subprocess.Popen:
        drop = join_and_drop(group, self.run_as)
        rlimit_memory = group is None

        def preexec() -> None:  # plain system calls only: it runs in a fork of a threaded process
            drop()
            file_bytes = limits.max_file_mb * 2**20
            resource.setrlimit(resource.RLIMIT_FSIZE, (file_bytes, file_bytes))
            resource.setrlimit(resource.RLIMIT_CORE, (0, 0))
            if rlimit_memory:  # as the step supervisor does without a cgroup
                data = limits.memory_mb * 2**20
                resource.setrlimit(resource.RLIMIT_DATA, (data, data))

        # What the server prints besides its replies (a crash's last words) goes to a log file
        # beside its folder, outside the sandbox.
        with open(folder.with_suffix(".log"), "wb") as log:
            if self.isolated:
                sandbox = self.sandbox()
                if sandbox is None:
                    raise ServerTrouble("the sandbox was closed")
                filter_fd = seccomp.program_fd()
                try:
                    argv = sandbox.bwrap_argv(folder, needs, {}, seccomp_fd=filter_fd)
                    last = len(argv) - 1 - argv[::-1].index("--remount-ro")  # the root made read-only
                    argv[last:last] = list(binds)
                    argv += ["--"] + command
                    return subprocess.Popen(argv, cwd=str(folder), env={"PATH": "/usr/bin:/bin"},
                                            stdin=subprocess.PIPE, stdout=subprocess.PIPE, stderr=log,
                                            start_new_session=True, close_fds=True, pass_fds=(filter_fd,),
                                            preexec_fn=preexec)
                finally:
                    os.close(filter_fd)
            env = candidate_env(needs, {}, home=str(folder), tmp=str(scratch))
            return subprocess.Popen(command, cwd=str(folder), env=env, stdin=subprocess.PIPE, stdout=subprocess.PIPE,
                                    stderr=log, start_new_session=True, close_fds=True, preexec_fn=preexec)

    def end(self, server: Server) -> None:
        """Kill the server and everything it started; its cgroup and folders go. Never raises."""
        with contextlib.suppress(Exception):
            server.process.stdin.close()
        if server.cgroup is not None:
            with contextlib.suppress(Exception):
                server.cgroup.kill_all()
        if server.process.returncode is None:
            with contextlib.suppress(ProcessLookupError, PermissionError):
                os.killpg(server.process.pid, signal.SIGKILL)
        with contextlib.suppress(Exception):
            server.process.wait(timeout=10)
        with contextlib.suppress(Exception):
            server.process.stdout.close()
        if server.cgroup is not None:
            with contextlib.suppress(Exception):
                server.cgroup.remove(wait_seconds=10)
        for path in (server.folder, server.scratch):
            if path is not None:
                remove_folder(path)
        with contextlib.suppress(OSError):
            server.log.unlink()

    def close(self) -> None:
        self.thread.shutdown(wait=True)
        remove_folder(self.work_root)


# --- a warm compile through a server ----------------------------------------------------------

class ServerCompiler:
    """A runtime's compile servers: one per candidate compiling at once, started on demand in
    the background (the candidate that found none idle compiles cold meanwhile)."""

    def __init__(self, owner: "WarmCompilers", runtime, spec: WarmSpec):
        self.owner = owner
        self.name = runtime.name
        self.needs = runtime.needs
        self.cold = ColdCompiler(runtime.needs, tuple(runtime.compile.command))
        # Under Docker the image carries them (docker_compilers.py); the launcher says where.
        self.files = (Path(runtime.path) / spec.files).resolve() if spec.files else None
        self.command = tuple(spec.command)
        self.limits: Limits | None = None
        self.idle: list[Server] = []
        self.starting = 0
        self.failures = 0  # servers that did not start, in a row
        self.troubles = 0  # compiles a server failed (crashed, broke the protocol), in a row
        self.lock = threading.Lock()
        self.warm_compiles = 0

    def describe(self) -> str:
        where = " (a container per server)" if self.owner.backend == "docker" else ""
        return f"warm compile server{where}: {' '.join(self.command)}"

    # -- the pool --
    def _take(self, limits: Limits, example: dict[str, bytes]) -> Server | None:
        """An idle server, or None: then one is started in the background (when none is
        starting already), warmed up on ``example``, the files of the candidate that asked."""
        with self.lock:
            if self.limits is not None and self.limits != limits:
                stale, self.idle = self.idle, []  # another step's limits: servers start afresh
                for server in stale:
                    self.owner.retire(server)
            self.limits = limits
            if self.idle:
                return self.idle.pop()
            if self.starting == 0 and self.failures < 3 and self.troubles < MAX_TROUBLES and not self.owner.closed:
                self.starting += 1
                self.owner.background(lambda: self._start(limits, example))
        return None

    def _start(self, limits: Limits, example: dict[str, bytes] | None = None) -> None:
        server, broken = None, False  # broken: the server itself could not start
        try:
            server = self.owner.launcher.start(self.needs, self.command, self.files, limits)
            self._wait_ready(server)
            if example:
                try:
                    self._warm_up(server, example, limits)
                except (ServerTrouble, OSError, ValueError) as exc:  # the example's fault (a bomb?)
                    LOG.info("assay: %s compile server's warm-up failed (%s); a later candidate starts another",
                             self.name, exc)
                    self.owner.retire(server)
                    server = None
        except Exception as exc:  # noqa: BLE001 - logged; candidates compile cold
            LOG.warning("assay: %s compile server did not start: %s", self.name, exc)
            if server is not None:
                self.owner.retire(server)
            server, broken = None, True
        with self.lock:
            self.starting -= 1
            if broken:
                self.failures += 1
            elif server is None:
                pass
            elif self.owner.closed or self.limits != limits:
                self.owner.retire(server)
            else:
                self.failures = 0
                self.idle.append(server)

    def _wait_ready(self, server: Server) -> None:
        """A first compile of nothing: the server answers once it is up (a JVM that compiled
        the server's own source, Node with the compiler loaded)."""
        server.send(frame("hello"))
        try:
            answer = server.reader.field(time.monotonic() + START_SECONDS)
        except TimeoutError:
            raise ServerTrouble(f"no answer within {START_SECONDS:g} s") from None
        except ServerTrouble as exc:
            raise ServerTrouble(f"{exc}: {server.last_words()}") from None
        if answer != b"ready":
            raise ServerTrouble(f"the server said {answer[:80]!r}, not 'ready'")

    def _warm_up(self, server: Server, files: dict[str, bytes], limits: Limits) -> None:
        """Compile ``files`` WARM_UP_COMPILES times before the server serves anyone: a JIT
        (HotSpot's, V8's, Mono's) makes the compiler fast only after it has run a while, and
        that cost is better paid in the background than by the first candidates."""
        for _ in range(WARM_UP_COMPILES):
            server.send(compile_request(list(self.cold.command), files))
            try:
                status = self._reply(server, time.monotonic() + min(limits.wall_seconds, WARM_UP_SECONDS))[0]
            except TimeoutError:
                raise ServerTrouble("a warm-up compile did not end in time") from None
            if status not in (0, 1, 2):
                raise ServerTrouble(f"a warm-up compile ended with status {status}: {server.last_words()}")

    def start_now(self, limits: Limits, count: int, example: dict[str, bytes] | None = None) -> int:
        """Start up to ``count`` servers, warmed up on ``example`` (file name -> bytes), and wait
        for them (a benchmark's or a test's warm-up); how many are idle now."""
        with self.lock:
            self.limits = self.limits or limits
            wanted = max(0, count - len(self.idle) - self.starting)
            self.starting += wanted
        with futures.ThreadPoolExecutor(max_workers=max(1, wanted)) as starting:
            list(starting.map(lambda _: self._start(limits, example), range(wanted)))
        with self.lock:
            return len(self.idle)

    def _give_back(self, server: Server) -> None:
        server.uses += 1
        server.last_used = time.monotonic()
        with self.lock:
            if server.uses < MAX_USES and not self.owner.closed:
                self.idle.append(server)
                return
        self.owner.retire(server)

    def expire(self, now: float) -> None:
        with self.lock:
            old = [s for s in self.idle if now - s.last_used > IDLE_SECONDS]
            self.idle = [s for s in self.idle if s not in old]
        for server in old:
            self.owner.retire(server)

    def drain(self) -> list[Server]:
        with self.lock:
            servers, self.idle = self.idle, []
        return servers

    # -- one compile --
    def compile(self, space, source_file: str, source: str, limits: Limits) -> StepResult:
        server = self._take(limits, {source_file: source.encode("utf-8")})
        if server is None:
            return self.cold.compile(space, source_file, source, limits)
        started = time.monotonic()
        cpu_before = server.cpu_seconds()
        oom_before = server.cgroup.oom_kills() if server.cgroup is not None else 0
        try:
            server.send(compile_request(list(self.cold.command), {source_file: source.encode("utf-8")}))
            status, stdout, stderr, made = self._reply(server, started + limits.wall_seconds,
                                                       self._cpu_watch(server, cpu_before, limits))
        except (TimeoutError, CpuExceeded):
            self.owner.retire(server)
            return StepResult(exit_code=None, signal=signal.SIGKILL, timed_out=True,
                              wall_seconds=round(time.monotonic() - started, 4), extra={"warm_compiler": True})
        except (ServerTrouble, OSError, ValueError) as exc:
            memory = server.cgroup is not None and server.cgroup.oom_kills() > oom_before
            self.owner.retire(server)
            with self.lock:
                self.troubles += 1
                if self.troubles == MAX_TROUBLES:
                    LOG.warning("assay: %s: %d compile servers failed in a row; compiling cold from now on",
                                self.name, MAX_TROUBLES)
            LOG.info("assay: %s compile server retired (%s); compiling cold", self.name,
                     "memory limit" if memory else f"{exc}: {server.last_words()}")
            return self.cold.compile(space, source_file, source, limits)
        if status not in (0, 1, 2):  # out of resources or a compiler crash: not trusted, retired
            self.owner.retire(server)
            return self.cold.compile(space, source_file, source, limits)
        self._give_back(server)
        result = StepResult(exit_code=status, wall_seconds=round(time.monotonic() - started, 4),
                            extra={"warm_compiler": True})
        if len(stdout) + len(stderr) > limits.max_output_kb * 1024:
            result.output_exceeded = True
        result.stdout, result.stderr = _tail(stdout), _tail(stderr)
        cap = limits.max_file_mb * 2**20
        if any(len(data) > cap for data in made.values()):
            result.file_size_exceeded = True
            return result
        for name, data in made.items():
            space.write_bytes(name, data)  # no link followed, as for the candidate's own files
        with self.lock:
            self.warm_compiles += 1
            self.troubles = 0
        return result

    def _cpu_watch(self, server: Server, before: float, limits: Limits):
        def wait(_remaining: float) -> None:
            if server.cpu_seconds() - before > limits.cpu_seconds:
                raise CpuExceeded
        return wait

    def _reply(self, server: Server, deadline: float, wait=None) -> tuple[int, bytes, bytes, dict[str, bytes]]:
        reader = server.reader
        if reader.field(deadline, wait) != b"done":
            raise ServerTrouble("the compile server's reply does not start with 'done'")
        status = reader.number(deadline, wait)
        stdout, stderr = reader.field(deadline, wait), reader.field(deadline, wait)
        made = {}
        for _ in range(reader.number(deadline, wait)):
            name = reader.field(deadline, wait).decode("utf-8", "replace")
            if not name or "/" in name or name in (".", ".."):
                raise ServerTrouble(f"the compile server made a file with an odd name: {name[:80]!r}")
            made[name] = reader.field(deadline, wait)
        return status, stdout, stderr, made


class CpuExceeded(Exception):
    pass


def _tail(data: bytes) -> str:
    """As the step supervisor keeps a step's output: about its last KEEP_BYTES."""
    kept = bytearray()
    keep_tail(kept, data)
    return bytes(kept).decode("utf-8", errors="replace")


# --- prepared files -----------------------------------------------------------------------------

class PreparedCompiler:
    """A compile command that reads files prepared once per toolchain (a precompiled header),
    read-only in the candidate's sandbox. They are built in a workspace of the same backend; a
    build that fails leaves the runtime on its cold command. Under Docker they were built into
    the runtime's image (``in_image``: the prepared file's path there), and nothing is mounted."""

    def __init__(self, owner: "WarmCompilers", runtime, spec: WarmSpec, in_image: str | None = None):
        self.owner = owner
        self.name = runtime.name
        self.runtime = runtime
        self.spec = spec
        self.cold = ColdCompiler(runtime.needs, tuple(runtime.compile.command))
        self.needs = runtime.needs
        self.file_name = prepared_file_name(spec.file)  # a template is used as it is
        self.command: tuple[str, ...] | None = None
        self.lock = threading.Lock()
        self.tried = False
        self.why = "cold"
        if in_image is not None:
            self.tried = True
            self.command = tuple(part.replace("{file}", in_image) for part in spec.command)

    def describe(self) -> str:
        if self.command is None:
            return self.why
        return f"prepared{' in the image' if self.owner.backend == 'docker' else ''}: {' '.join(self.command)}"

    def prepare(self, limits: Limits) -> None:
        """Find or build the prepared files for this toolchain; on any failure stay cold."""
        with self.lock:
            if self.tried:
                return
            self.tried = True
            try:
                folder = self._build(limits)
            except Exception as exc:  # noqa: BLE001 - the cold command still works
                self.why = f"cold (the prepared files could not be built: {str(exc)[:300]})"
                LOG.warning("assay: %s: %s", self.name, self.why)
                return
            path = str(folder / self.file_name)
            self.command = tuple(part.replace("{file}", path) for part in self.spec.command)
            self.needs = replace(self.runtime.needs, ro_binds=tuple(self.runtime.needs.ro_binds) + (str(folder),))

    def _build(self, limits: Limits) -> Path:
        text = (Path(self.runtime.path) / self.spec.file).read_bytes()
        name = self.file_name
        key = hashlib.sha256(b"\0".join([text, "\0".join(self.spec.build).encode(), self._toolchain_identity()]))
        folder = pch_cache_root() / f"{self.name}-{key.hexdigest()[:24]}"
        if (folder / ".complete").is_file():
            return folder
        build = [part.replace("{file}", name) for part in self.spec.build]
        outputs = [part for part in build if part.startswith(name) and part != name]
        sandbox = self.owner.sandbox()
        if sandbox is None:
            raise RuntimeError("the sandbox was closed")
        with sandbox.workspace(self.runtime.needs) as space:
            space.write(name, text.decode("utf-8"))
            built = space.run(build, limits, {})
            if not built.ok:
                raise RuntimeError(f"{' '.join(build)}: {(built.stderr or built.stdout).strip()[:300] or built}")
            files = {name: text}
            for output in outputs:
                data = space.read(output, limits.max_file_mb * 2**20 + 1)
                if data is None or len(data) > limits.max_file_mb * 2**20:
                    raise RuntimeError(f"the build left no {output} (or one over {limits.max_file_mb} MB)")
                files[output] = data
        staging = Path(tempfile.mkdtemp(prefix=".building-", dir=folder.parent))
        try:
            for file_name, data in files.items():
                (staging / file_name).write_bytes(data)
                os.chmod(staging / file_name, 0o644)
            (staging / ".complete").write_text("built by assay\n")
            os.chmod(staging, 0o755)
            try:
                staging.rename(folder)
            except OSError:  # built meanwhile by another process
                if not (folder / ".complete").is_file():
                    raise
        finally:
            if staging.exists():
                shutil.rmtree(staging, ignore_errors=True)
        return folder

    def _toolchain_identity(self) -> bytes:
        """The toolchain: the program of the runtime's version command (else the build
        command's), its resolved path, size and change time, and what it says its version is."""
        probe = list(self.runtime.version_command or [self.spec.build[0], "--version"])
        program = shutil.which(probe[0], path=dict(self.runtime.needs.env).get("PATH", "/usr/bin:/bin"))
        if program is None:
            raise RuntimeError(f"{probe[0]} is not installed")
        real = os.path.realpath(program)
        stat = os.stat(real)
        version = subprocess.run([real, *probe[1:]], capture_output=True, timeout=30).stdout
        return f"{real}\0{stat.st_size}\0{stat.st_mtime_ns}\0".encode() + version

    def compile(self, space, source_file: str, source: str, limits: Limits) -> StepResult:
        if self.command is None:
            return self.cold.compile(space, source_file, source, limits)
        return space.run(list(self.command), limits, {})


def pch_cache_root() -> Path:
    """Where prepared compile files are kept, one folder per runtime and toolchain key:
    ``ASSAY_PCH_CACHE``, else ``/var/tmp/assay-pch-<uid>``. Not under a home folder: the
    sandbox user (nobody, when Assay runs as root) must reach it. The folder must be this
    user's and writable by nobody else, or it is not used."""
    configured = os.environ.get(PCH_CACHE_ENV)
    root = Path(configured) if configured else Path(tempfile.gettempdir() if os.path.isdir("/var/tmp") is False
                                                    else "/var/tmp") / f"assay-pch-{os.geteuid()}"
    root.mkdir(mode=0o755, parents=True, exist_ok=True)
    info = root.lstat()
    if not os.path.isdir(root) or root.is_symlink() or info.st_uid != os.geteuid() or info.st_mode & 0o022:
        raise RuntimeError(f"{root} is not a folder of this user's that only it can write to")
    return root


# --- the compilers of one sandbox -------------------------------------------------------------

def _docker_launcher(sandbox) -> ServerLauncher:
    from .docker_compilers import DockerLauncher  # imports this module

    return DockerLauncher(sandbox)


LAUNCHERS: dict[str, Callable[[object], ServerLauncher]] = {
    "bubblewrap": LocalLauncher,
    "none": LocalLauncher,
    "docker": _docker_launcher,
}
PREPARED_BACKENDS = ("bubblewrap", "none", "docker")
IN_IMAGE_BACKENDS = ("docker",)  # warm compiler files built into the runtime's image


class WarmCompilers:
    """Every warm compiler of one sandbox backend object, made on first use per runtime."""

    def __init__(self, sandbox):
        self.sandbox = weakref.ref(sandbox)  # the registry must not keep its sandbox alive
        self.backend = getattr(sandbox, "name", "?")
        self.closed = False
        self.compilers: dict[tuple[str, str], Compiler] = {}
        self.lock = threading.Lock()
        self.launcher: ServerLauncher | None = None
        self._background = futures.ThreadPoolExecutor(max_workers=2, thread_name_prefix="assay-compilers")
        self._reaper: threading.Thread | None = None

    def compiler(self, runtime) -> Compiler:
        key = (runtime.name, runtime.digest or "")
        with self.lock:
            found = self.compilers.get(key)
            if found is None:
                found = self.compilers[key] = self._make(runtime)
        return found

    def _make(self, runtime) -> Compiler:
        spec = runtime.compile.warm
        backend = self.backend
        if spec is None:
            return ColdCompiler(runtime.needs, tuple(runtime.compile.command))
        in_image = None
        if backend in IN_IMAGE_BACKENDS:
            in_image, why = self._in_image(runtime)
            if in_image is None:
                return ColdCompiler(runtime.needs, tuple(runtime.compile.command), why)
        if spec.kind == "server":
            if backend not in LAUNCHERS:
                return ColdCompiler(runtime.needs, tuple(runtime.compile.command),
                                    f"cold (no compile servers for the {backend} backend)")
            if self.launcher is None:
                self.launcher = LAUNCHERS[backend](self.sandbox())
                self._reaper = threading.Thread(target=self._expire_idle, name="assay-compilers-idle", daemon=True)
                self._reaper.start()
            return ServerCompiler(self, runtime, spec)
        if backend not in PREPARED_BACKENDS:
            return ColdCompiler(runtime.needs, tuple(runtime.compile.command),
                                f"cold (no prepared compile files for the {backend} backend)")
        return PreparedCompiler(self, runtime, spec, in_image)

    def _in_image(self, runtime) -> tuple[str | None, str]:
        """Where the runtime's image keeps its warm compiler files, or None and why not."""
        sandbox = self.sandbox()
        try:
            if sandbox is None:
                raise SandboxError("the sandbox was closed")
            _, where = sandbox.warm_files(runtime.needs)
        except SandboxError as exc:
            return None, f"cold ({str(exc)[:300]})"
        if where is None:
            return None, (f"cold (the {runtime.name} image was built before images carried warm compiler files; "
                          f"add them with: assay runtimes build {runtime.name})")
        if not where:
            return None, f"cold (the {runtime.name} image's prepared compile files failed to build with it)"
        return where, ""

    def prepare(self, runtime, limits: Limits, servers: int = 0, example: dict[str, bytes] | None = None) -> Compiler:
        """The runtime's compiler, ready for a candidate (prepared files built first;
        ``servers`` compile servers started, warmed up on ``example``, and waited for)."""
        found = self.compiler(runtime)
        if isinstance(found, PreparedCompiler):
            found.prepare(limits)
        elif isinstance(found, ServerCompiler) and servers:
            found.start_now(limits, servers, example)
        return found

    def describe(self) -> dict[str, str]:
        with self.lock:
            return {name: compiler.describe() for (name, _), compiler in sorted(self.compilers.items())}

    def background(self, job: Callable[[], None]) -> None:
        try:
            self._background.submit(job)
        except RuntimeError:  # shutting down
            job()

    def retire(self, server: Server) -> None:
        """End a server in the background (its clean-up may wait for a dying process)."""
        launcher = self.launcher
        if launcher is not None:
            self.background(lambda: launcher.end(server))

    def _expire_idle(self) -> None:
        while not self.closed:
            time.sleep(min(IDLE_SECONDS / 4, 10.0))
            now = time.monotonic()
            for found in list(self.compilers.values()):
                if isinstance(found, ServerCompiler):
                    found.expire(now)

    def close(self) -> None:
        """End every compile server. Never raises."""
        with self.lock:
            if self.closed:
                return
            self.closed = True
        with contextlib.suppress(Exception):
            self._background.shutdown(wait=True, cancel_futures=True)
        for found in list(self.compilers.values()):
            if isinstance(found, ServerCompiler):
                for server in found.drain():
                    self.retire(server)
        if self.launcher is not None:
            with contextlib.suppress(Exception):
                self.launcher.close()


_BY_SANDBOX: "weakref.WeakKeyDictionary[object, WarmCompilers]" = weakref.WeakKeyDictionary()
_LOCK = threading.Lock()


def warm_compilers(sandbox) -> WarmCompilers:
    """The warm compilers that go with ``sandbox`` (one set per sandbox object, shared by every
    Executor on it). They end when the sandbox is garbage-collected, at interpreter exit, or
    on ``close_warm_compilers(sandbox)``; a server also ends when its stdin closes."""
    with _LOCK:
        found = _BY_SANDBOX.get(sandbox)
        if found is None:
            found = _BY_SANDBOX[sandbox] = WarmCompilers(sandbox)
            weakref.finalize(sandbox, found.close)
            import atexit

            atexit.register(found.close)
        return found


def close_warm_compilers(sandbox) -> None:
    with _LOCK:
        found = _BY_SANDBOX.pop(sandbox, None)
    if found is not None:
        found.close()
