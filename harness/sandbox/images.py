"""Container images for the Docker sandbox: one per runtime, named after the runtime folder's
content hash, so editing anything in a runtime (templates, Dockerfile) names a new image and
a stale one can never be used by mistake.

Each runtime's ``Dockerfile`` (``ARG BASE`` / ``FROM ${BASE}``) installs its toolchain. On top
of it the engine adds one small layer of its own (``SUPERVISOR_LAYER``): it makes sure the
image has the ``python3`` the in-container step supervisor runs on and the ``runner`` user
(uid 10001) every step runs as. A runtime with a warm compiler (``compile.warm``) gets its
files there too, read-only under ``/opt/assay`` (``warm_layer``): a compile server's own files,
or a prepared file turned by its build command during the image build, so once per image and
toolchain. The image's ``assay.warm-files`` label says where they are (empty: the prepared
build failed, and the runtime compiles cold); an image without the label predates them. Bases: ``debian:bookworm-slim`` from a registry, or, with no
registry in reach, a local Debian made by debootstrap and imported as ``assay-base:bookworm``.
"""

from __future__ import annotations

import io
import json
import os
import re
import shutil
import subprocess
import tarfile
import tempfile
import time
from dataclasses import dataclass
from pathlib import Path
from typing import Callable

from ..vocabulary import RuntimeSandboxNeeds, WarmFiles

DEFAULT_BASE = "debian:bookworm-slim"
OFFLINE_BASE = "assay-base:bookworm"
SUITE = "bookworm"
FALLBACK_MIRROR = "http://deb.debian.org/debian"
MIRROR_ENV = "ASSAY_DEBIAN_MIRROR"
APT_SOURCES = (Path("/etc/apt/sources.list"), Path("/etc/apt/sources.list.d"))
LOCAL_CERTIFICATES = Path("/usr/local/share/ca-certificates")
RUNNER_UID = 10001
TAG_HEX = 12
LABEL_RUNTIME = "assay.runtime"
LABEL_DIGEST = "assay.runtime-digest"
LABEL_WARM = "assay.warm-files"
WARM_ROOT = "/opt/assay"
SERVER_FILES = f"{WARM_ROOT}/warm"  # a compile server's files, where {files} points in a container
PREPARED_FILES = f"{WARM_ROOT}/prepared"  # a prepared file and what its build made
# The environment of a prepared build in the image, under the runtime's own on top.
BUILD_ENV = {"HOME": "/tmp", "TMPDIR": "/tmp", "LANG": "C.UTF-8", "PATH": "/usr/local/bin:/usr/bin:/bin"}

# Added on top of every runtime's own image. Only installs python3 when the toolchain image
# lacks the modules the supervisor imports (harness/sandbox/step_supervisor.py).
SUPERVISOR_LAYER = f"""\
ARG TOOLCHAIN
FROM ${{TOOLCHAIN}}
USER root
RUN if ! python3 -I -S -c "import base64, ctypes, json, resource, selectors, subprocess" 2>/dev/null; then \\
      apt-get update \\
      && DEBIAN_FRONTEND=noninteractive apt-get install -y --no-install-recommends python3 \\
      && rm -rf /var/lib/apt/lists/*; \\
    fi \\
 && if [ "$(id -u runner 2>/dev/null)" != "{RUNNER_UID}" ]; then \\
      echo "the runtime's Dockerfile must create the user runner with uid {RUNNER_UID}" >&2; exit 1; \\
    fi
USER {RUNNER_UID}:{RUNNER_UID}
"""

Log = Callable[[str], None]


def prepared_file_name(path: str) -> str:
    """The name a prepared file is used under: a ``.j2`` template is used as it is, as ``.h``."""
    name = Path(path).name
    return name[:-3] + ".h" if name.endswith(".j2") else name


def warm_location(warm: WarmFiles) -> str:
    """Where a container sees the warm compiler's files: the server's folder, or the prepared
    file (``{file}`` in the compile command)."""
    return SERVER_FILES if warm.kind == "server" else f"{PREPARED_FILES}/{prepared_file_name(warm.path)}"


def warm_layer(needs: RuntimeSandboxNeeds) -> tuple[str, dict[str, tuple[bytes, int]]]:
    """The Dockerfile lines that put a runtime's warm compiler files into its image, and the
    build context files they copy (name -> (bytes, mode)). Empty for a runtime without one."""
    warm = needs.warm_files
    if warm is None:
        return "", {}
    folder = Path(needs.folder)
    files: dict[str, tuple[bytes, int]] = {}
    lines = ["USER root"]
    if warm.kind == "server":
        if warm.path:
            for path in sorted(p for p in (folder / warm.path).rglob("*") if p.is_file()):
                mode = 0o755 if os.access(path, os.X_OK) else 0o644
                files["warm/" + str(path.relative_to(folder / warm.path))] = (path.read_bytes(), mode)
            lines.append(f"COPY warm/ {SERVER_FILES}/")
        else:
            lines.append(f"RUN mkdir -p {SERVER_FILES}")
        folder_in_image = SERVER_FILES
    else:
        name = prepared_file_name(warm.path)
        files[f"prepared/{name}"] = ((folder / warm.path).read_bytes(), 0o644)
        env = {**BUILD_ENV, **dict(needs.env)}
        build = ["env", "-i", *(f"{k}={v}" for k, v in env.items()),
                 *(part.replace("{file}", name) for part in warm.build)]
        lines += [f"COPY prepared/ {PREPARED_FILES}/", f"WORKDIR {PREPARED_FILES}", "RUN " + json.dumps(build),
                  "WORKDIR /work"]
        folder_in_image = PREPARED_FILES
    lines += [f"RUN chown -R 0:0 {folder_in_image} && chmod -R a+rX,go-w {folder_in_image}",
              f"USER {RUNNER_UID}:{RUNNER_UID}"]
    return "\n".join(lines) + "\n", files


def _context(dockerfile: str, files: dict[str, tuple[bytes, int]]) -> io.BytesIO:
    """A build context as a tar: the Dockerfile and ``files``, owned by root."""
    buffer = io.BytesIO()
    with tarfile.open(fileobj=buffer, mode="w") as tar:
        for name, (data, mode) in {"Dockerfile": (dockerfile.encode(), 0o644), **files}.items():
            info = tarfile.TarInfo(name)
            info.size, info.mode, info.mtime = len(data), mode, 0
            tar.addfile(info, io.BytesIO(data))
    buffer.seek(0)
    return buffer


class ImageError(RuntimeError):
    """An image could not be found or built; the message says what to run or fix."""


@dataclass
class BuiltImage:
    runtime: str
    tag: str
    id: str
    built: bool  # False when an image with this tag already existed
    seconds: float


def dockerfile_path(needs: RuntimeSandboxNeeds) -> Path:
    return Path(needs.folder) / "Dockerfile"


def image_tag(needs: RuntimeSandboxNeeds) -> str:
    """``assay-<runtime>:<first 12 hex of the runtime folder's content hash>``, or the image the
    runtime names itself."""
    if needs.image:
        return needs.image
    return f"assay-{needs.name}:{needs.digest[:TAG_HEX]}"


def dockerfile_problems(path: Path) -> list[str]:
    """What keeps a runtime's Dockerfile from taking the base the engine passes, as
    ``file:line: message`` strings (empty when it is fine)."""
    if not path.is_file():
        return [f"{path}: missing (a runtime needs a Dockerfile for the Docker sandbox)"]
    problems = []
    seen_arg = False
    for number, raw in enumerate(path.read_text(encoding="utf-8").splitlines(), start=1):
        line = raw.strip()
        if not line or line.startswith("#"):
            continue
        word, _, rest = line.partition(" ")
        word = word.upper()
        if word == "ARG" and re.fullmatch(r"BASE(=\S*)?", rest.strip()):
            seen_arg = True
        elif word == "FROM":
            source = rest.split()[0] if rest.split() else ""
            if source not in ("${BASE}", "$BASE"):
                problems.append(f"{path}:{number}: the first FROM must be 'FROM ${{BASE}}', not {line!r}")
            elif not seen_arg:
                problems.append(f"{path}:{number}: 'ARG BASE' must come before 'FROM ${{BASE}}'")
            return problems
    return problems + [f"{path}: no FROM line"]


# --- the Debian mirror debootstrap uses --------------------------------------------------------

def parse_one_line_sources(text: str) -> list[tuple[str, list[str]]]:
    """``deb [options] URI suite components...`` lines as (URI, [suite])."""
    found = []
    for raw in text.splitlines():
        line = raw.split("#", 1)[0].strip()
        if not line.startswith("deb "):
            continue
        line = re.sub(r"\[[^\]]*\]", " ", line[4:])
        fields = line.split()
        if len(fields) >= 2:
            found.append((fields[0], [fields[1]]))
    return found


def parse_deb822_sources(text: str) -> list[tuple[str, list[str]]]:
    """``.sources`` stanzas (deb822) as (URI, suites) for each URI of each ``deb`` stanza."""
    found = []
    for stanza in re.split(r"\n\s*\n", text):
        fields: dict[str, str] = {}
        key = None
        for raw in stanza.splitlines():
            if raw.startswith("#"):
                continue
            if raw[:1] in (" ", "\t") and key:
                fields[key] += " " + raw.strip()
                continue
            key, sep, value = raw.partition(":")
            if not sep:
                key = None
                continue
            key = key.strip().lower()
            fields[key] = value.strip()
        if "deb" not in fields.get("types", "").split() or fields.get("enabled", "yes").lower() == "no":
            continue
        suites = fields.get("suites", "").split()
        found += [(uri, suites) for uri in fields.get("uris", "").split()]
    return found


def debian_mirror(sources: tuple[Path, ...] = APT_SOURCES) -> str:
    """The host's Debian mirror for bookworm (``ASSAY_DEBIAN_MIRROR`` wins; a host that lists
    none, e.g. an Ubuntu machine, gets deb.debian.org)."""
    override = os.environ.get(MIRROR_ENV)
    if override:
        return override
    files: list[Path] = []
    for source in sources:
        if source.is_dir():
            files += sorted(p for p in source.iterdir() if p.suffix in (".list", ".sources"))
        elif source.is_file():
            files.append(source)
    for file in files:
        try:
            text = file.read_text(encoding="utf-8")
        except OSError:
            continue
        entries = parse_deb822_sources(text) if file.suffix == ".sources" else parse_one_line_sources(text)
        for uri, suites in entries:
            if SUITE in suites:
                return uri
    return FALLBACK_MIRROR


# --- building ------------------------------------------------------------------------------

def find_image(client, ref: str) -> str | None:
    """The image id for a tag, or None when there is no such image."""
    found = inspect_image(client, ref)
    return None if found is None else found["Id"]


def inspect_image(client, ref: str) -> dict | None:
    """What the daemon knows of an image (its id, its labels under Config), or None."""
    import docker

    try:
        return client.api.inspect_image(ref)
    except docker.errors.ImageNotFound:
        return None


def image_warm_files(facts: dict) -> str | None:
    """Where an inspected image keeps its warm compiler files: a path, ``""`` when their build
    failed, None when the image was built without them."""
    return ((facts.get("Config") or {}).get("Labels") or {}).get(LABEL_WARM)


def ensure_base(client, base: str | None, offline: bool, log: Log) -> str:
    """The base image to build on, made available locally."""
    import docker

    if offline:
        if base and base != OFFLINE_BASE:
            raise ImageError("--base and --offline-base exclude each other: the offline base is "
                             f"always {OFFLINE_BASE}")
        if find_image(client, OFFLINE_BASE) is None:
            build_offline_base(client, log)
        else:
            log(f"base: reusing {OFFLINE_BASE}")
        return OFFLINE_BASE
    base = base or DEFAULT_BASE
    if find_image(client, base) is None:
        log(f"base: pulling {base}")
        repository, _, tag = base.rpartition(":") if ":" in base.split("/")[-1] else (base, "", "latest")
        try:
            client.images.pull(repository, tag=tag)
        except docker.errors.DockerException as exc:
            raise ImageError(f"cannot pull the base image {base}: {_first_line(exc)}. Without a registry, "
                             "use --offline-base to build a local Debian base with debootstrap.") from None
    return base


def build_offline_base(client, log: Log) -> str:
    """debootstrap a minimal bookworm and import it as ``assay-base:bookworm``."""
    if os.geteuid() != 0:
        raise ImageError("--offline-base runs debootstrap, which needs root")
    debootstrap = shutil.which("debootstrap")
    if debootstrap is None:
        raise ImageError("--offline-base needs debootstrap; on Debian/Ubuntu: apt-get install debootstrap")
    mirror = debian_mirror()
    started = time.monotonic()
    with tempfile.TemporaryDirectory(prefix="assay-rootfs-") as scratch:
        root = Path(scratch) / "root"
        log(f"base: debootstrap --variant=minbase {SUITE} from {mirror}")
        done = subprocess.run([debootstrap, "--variant=minbase", SUITE, str(root), mirror],
                              capture_output=True, text=True)
        if done.returncode != 0:
            tail = "\n".join((done.stdout + done.stderr).strip().splitlines()[-15:])
            raise ImageError(f"debootstrap failed (exit {done.returncode}):\n{tail}")
        for leftover in ("var/cache/apt/archives", "var/lib/apt/lists"):
            for item in (root / leftover).glob("*"):
                if item.is_file():
                    item.unlink()
        copied = copy_local_certificates(root)
        if copied:
            log(f"base: with this host's local CA certificates ({', '.join(copied)})")
        tar = subprocess.Popen(["tar", "--numeric-owner", "-C", str(root), "-c", "."], stdout=subprocess.PIPE)
        try:
            repository, tag = OFFLINE_BASE.split(":")
            client.api.import_image(src=tar.stdout, repository=repository, tag=tag, stream_src=True,
                                    changes=["ENV PATH=/usr/local/sbin:/usr/local/bin:/usr/sbin:/usr/bin:/sbin:/bin"])
        finally:
            tar.stdout.close()
            tar.wait()
        if tar.returncode != 0:
            raise ImageError(f"packing the debootstrap tree failed (tar exit {tar.returncode})")
    log(f"base: {OFFLINE_BASE} imported in {time.monotonic() - started:.0f}s")
    return OFFLINE_BASE


def copy_local_certificates(root: Path, source: Path = LOCAL_CERTIFICATES) -> list[str]:
    """Copy the certificates this host added to its trust store into the new root's
    ``/usr/local/share/ca-certificates``. Debian's ca-certificates package adds them to the
    image's store when a Dockerfile installs it, so a build behind a TLS-inspecting proxy
    trusts what the host trusts (sandboxes themselves have no network)."""
    if not source.is_dir():
        return []
    target = root / "usr" / "local" / "share" / "ca-certificates"
    target.mkdir(parents=True, exist_ok=True)
    copied = []
    for cert in sorted(source.rglob("*.crt")):
        destination = target / cert.relative_to(source)
        destination.parent.mkdir(parents=True, exist_ok=True)
        shutil.copyfile(cert, destination)
        copied.append(str(cert.relative_to(source)))
    return copied


def build_runtime_image(client, runtime: RuntimeSandboxNeeds, base: str, log: Log, rebuild: bool = False) -> BuiltImage:
    """Build the image of the runtime with these ``needs`` on ``base`` (skipped when its tag already exists)."""
    tag = image_tag(runtime)
    started = time.monotonic()
    existing = inspect_image(client, tag)
    toolchain = f"{tag}-toolchain"
    if existing and not rebuild:
        if runtime.warm_files is None or image_warm_files(existing) is not None:
            return BuiltImage(runtime.name, tag, existing["Id"], False, 0.0)
        # Built before images carried warm compiler files: only the engine's layer is redone.
        if find_image(client, toolchain) is None:
            raise ImageError(f"{runtime.name}: {tag} lacks its warm compiler's files and its toolchain image "
                             f"{toolchain} is gone; rebuild it: assay runtimes build {runtime.name} --rebuild")
        log(f"{runtime.name}: adding the warm compiler's files to {tag}")
    else:
        problems = dockerfile_problems(dockerfile_path(runtime))
        if problems:
            raise ImageError("\n".join(problems))
        _stream_build(client, log, runtime.name, path=str(runtime.folder), tag=toolchain,
                      buildargs={"BASE": base}, labels={LABEL_RUNTIME: runtime.name, LABEL_DIGEST: runtime.digest})
    _build_engine_layer(client, runtime, toolchain, tag, log)
    image_id = find_image(client, tag)
    if image_id is None:
        raise ImageError(f"{runtime.name}: the build finished but {tag} is missing")
    return BuiltImage(runtime.name, tag, image_id, True, round(time.monotonic() - started, 1))


def _build_engine_layer(client, runtime: RuntimeSandboxNeeds, toolchain: str, tag: str, log: Log) -> None:
    """The supervisor layer on the toolchain image, with the warm compiler's files. A prepared
    build that fails there leaves the image without them (labelled so): the runtime then
    compiles cold under Docker, as it does elsewhere when its prepared build fails."""
    labels = {LABEL_RUNTIME: runtime.name, LABEL_DIGEST: runtime.digest}
    warm, files = warm_layer(runtime)
    if runtime.warm_files is not None:
        try:
            _stream_build(client, log, runtime.name, fileobj=_context(SUPERVISOR_LAYER + warm, files),
                          custom_context=True, tag=tag, buildargs={"TOOLCHAIN": toolchain},
                          labels={**labels, LABEL_WARM: warm_location(runtime.warm_files)})
            return
        except ImageError as exc:
            if runtime.warm_files.kind != "prepared":
                raise
            log(f"{runtime.name}: the prepared compile files did not build, so this image compiles cold: {exc}")
        labels[LABEL_WARM] = ""
    _stream_build(client, log, runtime.name, fileobj=io.BytesIO(SUPERVISOR_LAYER.encode()), tag=tag,
                  buildargs={"TOOLCHAIN": toolchain}, labels=labels)


def _stream_build(client, log: Log, name: str, **kwargs) -> None:
    lines: list[str] = []
    try:
        for event in client.api.build(network_mode="host", rm=True, forcerm=True, pull=False, decode=True, **kwargs):
            if "error" in event:
                tail = "\n".join(lines[-15:])
                raise ImageError(f"{name}: image build failed: {event['error'].strip()}\n{tail}")
            text = (event.get("stream") or "").rstrip()
            if text:
                lines.append(text)
                if text.startswith("Step "):
                    log(f"{name}: {text}")
    except ImageError:
        raise
    except Exception as exc:  # the daemon went away or refused the request
        raise ImageError(f"{name}: the Docker daemon failed during the build: {_first_line(exc)}") from None


def _first_line(exc: Exception) -> str:
    text = str(exc).strip()
    return text.splitlines()[0] if text else type(exc).__name__
