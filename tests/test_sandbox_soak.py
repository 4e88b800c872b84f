"""Soak: 500 hostile Python candidates through warm bubblewrap sandboxes (one per worker, two
workers), then nothing of theirs may be left on the host: no byte in the temporary and
shared-memory folders, no process, no kernel key, no cgroup, no host file touched."""

import concurrent.futures as futures
import os
import platform
import subprocess
import tempfile
import time
from pathlib import Path

import pytest

from harness.vocabulary import Limits, RuntimeSandboxNeeds
from harness.sandbox import seccomp
from harness.sandbox.bubblewrap import BubblewrapSandbox

pytestmark = pytest.mark.slow

CANDIDATES = 500
WORKERS = 2
NEEDS = RuntimeSandboxNeeds("python")
LIMITS = Limits(wall_seconds=5, cpu_seconds=5, memory_mb=128, max_processes=32, max_file_mb=64)
NOBODY = 65534

# One candidate per attack class in turn. Each prints what it managed; {tag} marks everything
# it leaves (process names, key descriptions, IPC names), {victim} is a host file, {victim_dir}
# a host folder.
ATTACKS = {
    "background processes": """
import subprocess
subprocess.Popen(['bash', '-c', 'exec -a {tag} sleep 60'], start_new_session=True)
if __import__('os').fork() == 0:
    __import__('os').setsid()
    subprocess.Popen(['bash', '-c', 'exec -a {tag}-grandchild sleep 60'])
    __import__('os')._exit(0)
print('spawned')
""",
    "fork fan-out": """
import os
for _ in range(20):
    try:
        if os.fork() == 0:
            os.execvp('bash', ['bash', '-c', 'exec -a {tag}-fan sleep 60'])
    except OSError:
        break
print('forked')
""",
    "deep tree": """
import os
for top in ('/work', '/tmp'):
    os.chdir(top)
    os.mkdir('deep-{tag}'); os.chdir('deep-{tag}')
    for _ in range(1500):
        os.mkdir('d'); os.chdir('d')
        with open('f', 'wb') as handle:
            handle.write(b'x' * 1024)
    os.chmod('.', 0o500)
print('deep')
""",
    "big files in /tmp and /dev/shm": """
blob = b'x' * (1 << 20)
for path in ('/tmp/big-{tag}', '/dev/shm/big-{tag}', '/work/big-{tag}'):
    with open(path, 'wb') as handle:
        for _ in range(20):
            handle.write(blob)
print('filled')
""",
    "keyring": """
import ctypes
libc = ctypes.CDLL(None, use_errno=True)
for keyring in (-4, -3, -5):  # the user, session and user-session keyrings (linux/keyctl.h)
    serial = libc.syscall(ctypes.c_long({add_key}), b'user', b'{tag}', b'message', ctypes.c_size_t(7),
                          ctypes.c_int(keyring))
    print(serial, ctypes.get_errno())
""",
    "SysV and POSIX IPC": """
import ctypes, os
libc = ctypes.CDLL(None, use_errno=True)
rt = ctypes.CDLL('librt.so.1', use_errno=True)
print(libc.shmget(0, 4096, 0o1600), libc.semget(0, 1, 0o1600), libc.msgget(0, 0o1600))
print(rt.mq_open(b'/{tag}', os.O_CREAT | os.O_RDWR, 0o600, None))
fd = os.open('/dev/shm/{tag}', os.O_CREAT | os.O_RDWR, 0o600)
os.ftruncate(fd, 1 << 20)
print('ipc')
""",
    "symlink planting": """
import os, subprocess
for name, target in (('main.py', '{victim}'), ('probe2.py', '{victim}'), ('folder', '{victim_dir}'),
                     ('root', '/'), ('loop', 'loop')):
    os.symlink(target, name)
os.symlink('{victim}', '/tmp/link-{tag}')
os.mkdir('sub'); os.symlink('{victim_dir}', 'sub/inner')
# A process left behind retires the sandbox, so the host, not the supervisor, removes these.
subprocess.Popen(['bash', '-c', 'exec -a {tag} sleep 60'], start_new_session=True)
print('planted')
""",
    "memory bomb": """
chunks = []
while True:
    chunks.append(bytearray(16 << 20))
""",
    "benign": """
print('ok')
""",
}
ORDER = list(ATTACKS)


@pytest.fixture
def shm_root():
    base = "/dev/shm" if os.access("/dev/shm", os.W_OK) else None
    root = Path(tempfile.mkdtemp(prefix="assay-soak-", dir=base))
    os.chmod(root, 0o711)
    yield root
    subprocess.run(["rm", "-rf", "--one-file-system", str(root)], check=False)


def top_level(folder: str) -> dict[str, int]:
    found = {}
    try:
        for entry in os.scandir(folder):
            try:
                found[entry.name] = entry.stat(follow_symlinks=False).st_uid
            except OSError:
                continue
    except OSError:
        pass
    return found


def identity(pid: int) -> tuple[int, str] | None:
    """A process as (pid, start time in clock ticks since boot): unique, unlike a pid alone."""
    try:
        text = Path(f"/proc/{pid}/stat").read_text()
    except OSError:
        return None
    return pid, text[text.rfind(")") + 2:].split()[19]


def still_running(process: tuple[int, str]) -> bool:
    """Whether that very process still runs (a zombie, dead but not yet reaped, does not)."""
    try:
        text = Path(f"/proc/{process[0]}/stat").read_text()
    except OSError:
        return False
    fields = text[text.rfind(")") + 2:].split()
    return fields[19] == process[1] and fields[0] not in ("Z", "X")


def children_of(parent: int) -> list[int]:
    found = []
    for name in os.listdir("/proc"):
        if name.isdigit():
            try:
                status = Path(f"/proc/{name}/status").read_text()
            except OSError:
                continue
            if f"\nPPid:\t{parent}\n" in status:
                found.append(int(name))
    return found


def keys_visible_to_nobody(tag: str) -> str:
    """Keys the sandbox user could see on the host (/proc/keys lists those its reader may
    view), read by a process running as that user."""
    reader = subprocess.run(
        ["python3", "-I", "-S", "-c", f"print(''.join(l for l in open('/proc/keys') if {tag!r} in l), end='')"],
        capture_output=True, text=True, user=NOBODY, group=NOBODY, extra_groups=[], cwd="/")
    assert reader.returncode == 0, reader.stderr
    return reader.stdout


@pytest.mark.skipif(os.geteuid() != 0, reason="checks the host's keyrings and processes as root")
def test_hundreds_of_hostile_candidates_leave_nothing_behind(shm_root, tmp_path):
    table = {"x86_64": seccomp.X86_64, "aarch64": seccomp.AARCH64}.get(platform.machine())
    if table is None:
        pytest.skip(f"no syscall table for {platform.machine()}")
    tag = f"assay-soak-{os.getpid()}-{time.time_ns()}"
    victim = tmp_path / "victim.txt"
    victim.write_text("host file")
    victim_dir = tmp_path / "victim-dir"
    victim_dir.mkdir()
    before_stat = victim.stat()
    scratch = {folder: top_level(folder) for folder in ("/tmp", "/dev/shm", "/dev/mqueue")}

    box = BubblewrapSandbox(shm_root, max_runs=CANDIDATES)  # retired only for what candidates do
    box.check()
    sandboxes = []  # bubblewrap's process and the supervisor (pid 1 inside) of every sandbox
    groups = []
    real_start = box.start_slot

    def start_slot(needs):
        slot = real_start(needs)
        # When the supervisor ends, the kernel kills everything left in its pid namespace.
        sandboxes.extend(filter(None, [identity(slot.process.pid)]
                                + [identity(pid) for pid in children_of(slot.process.pid)]))
        if slot.cgroup is not None:
            groups.append(slot.cgroup)
        return slot

    box.start_slot = start_slot
    outcomes = []

    def candidate(index: int):
        attack = ORDER[index % len(ORDER)]
        code = ATTACKS[attack].format(tag=tag, victim=victim, victim_dir=victim_dir, add_key=table["add_key"])
        with box.workspace(NEEDS) as space:
            space.write("probe.py", code)
            result = space.run(["python3", "-I", "-S", "probe.py"], LIMITS, {})
        return attack, result

    started = time.monotonic()
    try:
        box.warm(NEEDS, WORKERS)
        with futures.ThreadPoolExecutor(WORKERS) as pool:
            outcomes = list(pool.map(candidate, range(CANDIDATES)))
    finally:
        box.close()
    elapsed = time.monotonic() - started

    # Every candidate was contained, as its kind should be, and none broke the sandbox.
    assert len(outcomes) == CANDIDATES
    broken = [(attack, r.infra_error) for attack, r in outcomes if r.infra_error]
    assert broken == []
    for attack, result in outcomes:
        if attack == "memory bomb":
            assert result.memory_exceeded, result
        elif attack == "keyring":
            assert result.stdout.split() == ["-1", "1"] * 3, result.stdout + result.stderr  # EPERM is 1
        else:
            assert result.exit_code == 0 and not result.timed_out, (attack, result.stderr[-500:])
    assert box.cleanup_problems == []

    # No byte left in the host's temporary and shared-memory folders: the work root's parent is
    # empty, and nothing new in /tmp, /dev/shm or /dev/mqueue belongs to the sandbox user or
    # carries the run's tag.
    assert [str(p) for p in shm_root.rglob("*")] == []
    for folder, earlier in scratch.items():
        new = {name: uid for name, uid in top_level(folder).items() if name not in earlier}
        assert [name for name, uid in new.items() if uid == NOBODY or tag in name] == [], folder

    # No process: no bubblewrap, no supervisor (so nothing in their pid namespaces), nothing
    # carrying the tag.
    time.sleep(0.5)
    assert len(sandboxes) >= 2 * WORKERS, "every sandbox's bubblewrap and supervisor are recorded"
    assert [process for process in sandboxes if still_running(process)] == []
    assert subprocess.run(["pgrep", "-f", tag], capture_output=True, text=True).stdout == ""

    # No key the candidates' user could read, no cgroup left, the host files untouched.
    assert keys_visible_to_nobody(tag) == ""
    assert [str(d) for group in groups for d in group.dirs if d.exists()] == []
    assert victim.read_text() == "host file" and victim.stat().st_uid == before_stat.st_uid
    assert list(victim_dir.iterdir()) == []
    print(f"{CANDIDATES} candidates in {elapsed:.0f}s, {len(groups) or len(sandboxes) // 2} sandboxes started")
