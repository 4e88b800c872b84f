"""Compile servers under the Docker backend: each in a container of its own, from its runtime's
image, locked down as a candidate's container is (network none, read-only root, tmpfs ``/work``
and ``/tmp``, no capabilities, no-new-privileges, uid 10001) and held to the compile step's
memory, pids and file size limits and one CPU. The server's files are part of the image
(images.py puts them under ``/opt/assay/warm``), so nothing of the host is mounted.

The server is the container's pid 1, attached the way the backend attaches to its step
supervisors (``docker.py``): requests go to its stdin over the attach socket; a thread takes
Docker's multiplexed stream apart, passing stdout through a pipe to the same FieldReader local
servers use and keeping stderr's tail as the server's last words. Containers carry the run's
labels (and ``assay.role=compile-server``), so the backend's close and orphan clean-up remove
what a killed run left.
"""

from __future__ import annotations

import contextlib
import os
import socket
import threading
import weakref
from dataclasses import dataclass, field

from .docker import DockerSandbox, find_container_cgroup, read_frame
from .supervised import brief
from .warm_compilers import FieldReader, Server, ServerTrouble

STDERR_KEPT = 4096


@dataclass(kw_only=True)
class ContainerServer(Server):
    """A compile server that is a container's pid 1."""

    container: str
    sock: socket.socket
    stream: object  # the attach response: keeps the socket alive
    stderr: bytearray = field(default_factory=bytearray)
    pump: threading.Thread | None = None

    def send(self, data: bytes) -> None:
        try:
            self.sock.sendall(data)
        except OSError as exc:
            raise ServerTrouble(f"cannot reach the compile server's container: {exc}") from None

    def cpu_seconds(self) -> float:
        """The container's processes' CPU time (its cgroup, read on this host). Where the
        daemon's cgroups are out of reach, 0: the wall limit and the one-CPU quota bound it."""
        return 0.0 if self.cgroup is None else super().cpu_seconds()

    def last_words(self) -> str:
        return bytes(self.stderr[-300:]).decode("utf-8", "replace").strip()


class DockerLauncher:
    """Starts compile servers as containers of a DockerSandbox (warm_compilers.ServerLauncher)."""

    def __init__(self, sandbox: DockerSandbox):
        self.sandbox = weakref.ref(sandbox)  # the warm compilers must not keep their sandbox alive

    def _backend(self) -> DockerSandbox:
        sandbox = self.sandbox()
        if sandbox is None:
            raise ServerTrouble("the sandbox was closed")
        return sandbox

    def start(self, needs, command, files, limits) -> Server:
        sandbox = self._backend()
        image, where = sandbox.warm_files(needs)
        if not where:
            raise ServerTrouble(f"the {needs.name} image carries no compile server files")
        argv = [part.replace("{files}", where) for part in command]
        container, stream = sandbox.retry(
            lambda: sandbox.start_compile_server(image, needs.name, argv, dict(needs.env), limits),
            "start a compile server's container")
        sock = getattr(stream, "_sock", stream)
        sock.settimeout(None)
        read_end, write_end = os.pipe()
        server = ContainerServer(process=None, folder=None, scratch=None, reader=FieldReader(read_end), log=None,
                                 cgroup=find_container_cgroup(sandbox.client.api, container),
                                 container=container, sock=sock, stream=stream)
        server.pump = threading.Thread(target=_pump, args=(server, write_end), daemon=True,
                                       name=f"assay-compiler-{container[:12]}")
        server.pump.start()
        return server

    def end(self, server: Server) -> None:
        """Remove the server's container; its stream and pipe close. Never raises."""
        with contextlib.suppress(Exception):
            self._backend().remove_container(server.container)  # else its close removed it
        with contextlib.suppress(Exception):
            server.sock.shutdown(socket.SHUT_RDWR)  # wakes the pump's recv, which a close alone does not
        for thing in (server.sock, server.stream):
            with contextlib.suppress(Exception):
                thing.close()
        with contextlib.suppress(OSError):
            os.close(server.reader.fd)  # a pump stuck writing to the pipe gets EPIPE
        if server.pump is not None:
            server.pump.join(timeout=10)

    def close(self) -> None:
        pass  # every server is ended by end(); the sandbox's close removes the run's containers


def _pump(server: ContainerServer, write_end: int) -> None:
    """Docker's stream frames (docker.read_frame) to the stdout pipe and the stderr tail, until
    it ends."""
    try:
        while True:
            frame = read_frame(lambda size: _exact(server.sock, size))
            if frame is None:
                return
            stream, payload = frame
            if stream == 2:
                server.stderr += payload
                del server.stderr[:-STDERR_KEPT]
            else:
                view = memoryview(payload)
                while view:
                    view = view[os.write(write_end, view):]
    except OSError as exc:  # the reader went away, or the socket was closed under us
        server.stderr += f"\n(stream: {brief(exc)})".encode()
    finally:
        os.close(write_end)


def _exact(sock: socket.socket, size: int) -> bytes | None:
    data = bytearray()
    while len(data) < size:
        chunk = sock.recv(size - len(data))
        if not chunk:
            return None
        data += chunk
    return bytes(data)
