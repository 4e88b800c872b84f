"""The step supervisor: pid 1 of a long-lived sandbox (a Docker container, or a warm
bubblewrap sandbox), running each step of each candidate inside it.

Why it exists: entering a sandbox afresh per step costs milliseconds to tens of milliseconds
(``docker exec`` joins the namespaces anew; bubblewrap builds namespaces and mounts), as much
as a whole Python candidate takes. Instead the backend starts this script once per sandbox
(``python3 -I -S -c <this file>``) and talks to it over its stdin/stdout, one JSON line per
request and per reply; it starts each step with vfork/exec (see ``ShellLauncher``).

Why it is safe to share a uid with the candidate: as pid 1 of the sandbox's pid namespace it
cannot be signalled from inside the namespace (the kernel drops SIGKILL/SIGSTOP sent to a
namespace's init by its members, and every signal that would end or stop it is caught and
dropped here), and it makes itself non-dumpable, so a candidate can neither ptrace it nor open
its /proc files (memory, fds, environment). After every step it kills whatever the step left
running and reports it, so the backend can discard the sandbox.

Host mode: the bare backend (``--sandbox none``) runs the same supervisor as a plain child
process, with no namespaces of its own, so that limits are enforced by this one file whatever
the backend. The backend then names the work dir and private scratch folders (a JSON argument,
see ``main``), and the supervisor must leave the host alone: it makes itself a child subreaper,
so whatever a step leaves behind stays below it, and it kills only its own descendants and the
members of its cgroup, never by a process id that may have been handed to another process
since it was read (``kill_verified``).

Standard library only and no harness imports: the file is sent as source into the image's
``python3``.
"""

import base64
import ctypes
import json
import os
import resource
import selectors
import signal
import stat
import subprocess
import sys
import time

WORK = "/work"
SCRATCH = ("/tmp", "/dev/shm")
KEEP_BYTES = 8192  # output kept for diagnostics
PR_SET_DUMPABLE = 4
PR_SET_CHILD_SUBREAPER = 36  # <linux/prctl.h>
LIBC = ctypes.CDLL(None)
DROPPED = [s for s in (signal.SIGINT, signal.SIGTERM, signal.SIGHUP, signal.SIGQUIT, signal.SIGUSR1,
                       signal.SIGUSR2, signal.SIGALRM, signal.SIGTSTP, signal.SIGTTIN, signal.SIGTTOU)]


def oom_counter_files():
    """The sandbox's own OOM-kill counter, seen from inside (cgroup v2 or v1), where visible."""
    found = []
    try:
        lines = open("/proc/self/cgroup").read().splitlines()
    except OSError:
        lines = []
    for line in lines:
        number, controllers, path = line.split(":", 2)
        if number == "0" and controllers == "":
            found += ["/sys/fs/cgroup" + path.rstrip("/") + "/memory.events", "/sys/fs/cgroup/memory.events"]
        elif "memory" in controllers.split(","):
            found += ["/sys/fs/cgroup/memory/memory.oom_control",
                      "/sys/fs/cgroup/memory" + path.rstrip("/") + "/memory.oom_control"]
    return [f for f in found if os.path.isfile(f)]


def read_oom_kills(files):
    for name in files:
        try:
            for line in open(name).read().splitlines():
                key, _, value = line.partition(" ")
                if key == "oom_kill":
                    return int(value)
        except (OSError, ValueError):
            continue
    return None


def memory_usage():
    for name in ("/sys/fs/cgroup/memory/memory.usage_in_bytes", "/sys/fs/cgroup/memory.current"):
        try:
            return int(open(name).read().split()[0])
        except (OSError, ValueError, IndexError):
            continue
    return None


class Supervisor:
    """``host``: None as pid 1 of a sandbox's own namespaces; in host mode (see the module's
    summary) ``{"work": folder, "scratch": [folders], "cgroup_procs": [cgroup.procs files]}``."""

    def __init__(self, host=None):
        self.host = host is not None
        if host is None:
            self.work, self.scratch = WORK, SCRATCH
            self.modes = {WORK: 0o700, "/tmp": 0o1777, "/dev/shm": 0o1777}
            self.oom_files = oom_counter_files()
            self.sweep = sweep
        else:
            self.work, self.scratch = host["work"], tuple(host["scratch"])
            self.modes = dict.fromkeys((self.work,) + self.scratch, 0o700)  # private folders
            self.oom_files = []  # the host's counters are not this sandbox's: the backend reads its group's
            procs_files = tuple(host.get("cgroup_procs", ()))
            self.sweep = lambda: sweep_own(procs_files)
            if LIBC.prctl(PR_SET_CHILD_SUBREAPER, 1, 0, 0, 0) != 0:
                raise OSError("prctl(PR_SET_CHILD_SUBREAPER) failed: cannot become a child subreaper")
        self.launcher = ShellLauncher.probe(self.work)

    def spawn(self, argv, env, stdin, limits, rlimit_memory, rlimit_processes):
        """Start a step in a session of its own with its rlimits, default signal dispositions
        and the memory killer's preference set. Through the shell launcher where it can take
        the step (subprocess then uses vfork: 2 to 4 ms less CPU per step), else with a
        ``preexec_fn``. Returns the process and the launcher's mark (None on the fallback)."""
        common = dict(cwd=self.work, env=env, stdin=stdin, stdout=subprocess.PIPE, stderr=subprocess.PIPE,
                      start_new_session=True, close_fds=True)
        rlimits = step_rlimits(limits, rlimit_memory, rlimit_processes)
        launch = self.launcher.command(argv, env, self.work, rlimits) if self.launcher else None
        if launch is not None:
            command, mark = launch
            return subprocess.Popen(command, **common), mark
        return subprocess.Popen(argv, preexec_fn=step_preexec(rlimits), **common), None

    def empty(self, folders):
        return [problem for top in folders for problem in empty_folder(top, self.modes[top])]

    # --- files -----------------------------------------------------------------------------
    def op_write(self, req):
        write_new_file(self.work, req["name"], base64.b64decode(req["data"]))
        return {}

    def op_read(self, req):
        data = read_regular_file(self.work, req["name"], int(req["max_bytes"]))
        return {"data": None if data is None else base64.b64encode(data).decode("ascii")}

    # --- steps -----------------------------------------------------------------------------
    def op_run(self, req):
        limits = req["limits"]
        argv, env = req["argv"], req["env"]
        stdin = subprocess.DEVNULL
        if req.get("stdin"):  # a file of the work dir, read through no link, as read_regular_file
            stdin = open_input_file(self.work, req["stdin"])
            if stdin is None:
                return {"spawn_error": "the step's input file %s is missing or not a regular file" % req["stdin"]}
        before = read_oom_kills(self.oom_files)
        started = time.monotonic()
        try:
            proc, mark = self.spawn(argv, env, stdin, limits, req.get("rlimit_memory"), req.get("rlimit_processes"))
        except OSError as exc:
            return {"spawn_error": "cannot start %s: %s" % (argv[0], exc)}
        finally:
            if stdin is not subprocess.DEVNULL:
                os.close(stdin)
        full = bool(req.get("full_stdout"))
        out, err, timed_out, flooded, left_running = collect(proc, limits, started, self.sweep, full)
        wall = time.monotonic() - started
        left_running += self.sweep()
        after = read_oom_kills(self.oom_files)
        # Each step gets empty scratch areas, as bubblewrap's fresh tmpfs /tmp per step.
        residue = self.empty(self.scratch)
        if mark is not None and proc.returncode and err.startswith(mark):
            # The launcher's shell failed before the step's program ran: what subprocess reports
            # as an error of starting it. Only the shell knows the step's secret mark.
            return {"spawn_error": "cannot start %s: %s" % (argv[0], ShellLauncher.message(err, mark))}
        return {
            "returncode": proc.returncode,
            "wall": round(wall, 4),
            # The whole output when asked (a program's answer; the output cap bounds it).
            "stdout": base64.b64encode(out if full else out[-KEEP_BYTES:]).decode("ascii"),
            "stderr": base64.b64encode(err[-KEEP_BYTES:]).decode("ascii"),
            "timed_out": timed_out,
            "flooded": flooded,
            "oom_kills": None if before is None or after is None else after - before,
            "max_rss_kb": getattr(proc, "max_rss_kb", None),
            "cpu": getattr(proc, "cpu_seconds", None),
            "left_running": left_running,
            "residue": residue[:20],
        }

    # --- between candidates --------------------------------------------------------------
    def op_reset(self, req):
        """Empty the work dir and the scratch areas for the next candidate. Reports what
        could not be removed and any state a candidate could leave for the next one outside
        those folders: processes, System V IPC objects, POSIX message queues."""
        left_running = self.sweep()
        residue = self.empty((self.work,) + self.scratch)
        # On the host, IPC objects and memory in use are the whole machine's, not the sandbox's.
        return {"left_running": left_running, "residue": residue[:20],
                "ipc": [] if self.host else ipc_objects()[:20], "memory_bytes": None if self.host else memory_usage()}

    def op_hello(self, req):
        return {"pid": os.getpid(), "uid": os.getuid(), "oom_counter": bool(self.oom_files),
                "python": sys.version.split()[0], "memory_bytes": None if self.host else memory_usage(),
                "host_mode": self.host, "launcher": self.launcher.SHELL if self.launcher else None}


def step_rlimits(limits, rlimit_memory, rlimit_processes):
    """A step's rlimits, ``{resource: (soft, hard)}``. CPU time, file size and core dumps always.
    Memory and process counts are normally the sandbox's cgroup's job; where there is none, the
    backend asks for RLIMIT_DATA and RLIMIT_NPROC instead. RLIMIT_DATA, not RLIMIT_AS: it counts
    the writable private memory a process maps (its heap), not address space merely reserved,
    which V8, the JVM and Go reserve by the gigabyte at start and never touch (under RLIMIT_AS
    they die before the candidate's code runs)."""
    cpu = max(1, int(float(limits["cpu_seconds"]) + 0.999))
    fsize = int(limits["max_file_mb"]) * 1024 * 1024
    chosen = {resource.RLIMIT_CPU: (cpu, cpu + 1), resource.RLIMIT_FSIZE: (fsize, fsize),
              resource.RLIMIT_CORE: (0, 0)}
    if rlimit_memory:
        memory = int(limits["memory_mb"]) * 1024 * 1024
        chosen[resource.RLIMIT_DATA] = (memory, memory)
    if rlimit_processes:
        processes = int(limits["max_processes"])
        chosen[resource.RLIMIT_NPROC] = (processes, processes)
    return chosen


def step_preexec(rlimits):
    """The fallback's child side: the rlimits, then dumpable again (exec would do it anyway,
    else /proc/self belongs to root), then the memory cgroup's OOM killer must pick the step,
    never the supervisor. Signals need nothing: the supervisor catches those it must survive,
    and exec resets caught signals to their defaults."""

    def preexec():
        for which, pair in rlimits.items():
            resource.setrlimit(which, pair)
        LIBC.prctl(PR_SET_DUMPABLE, 1, 0, 0, 0)
        with open("/proc/self/oom_score_adj", "w") as handle:
            handle.write("1000")

    return preexec


class ShellLauncher:
    """Starts a step as ``/bin/sh -c 'set -e; <ulimits>; <oom_score_adj>; exec "$@"' <mark> <argv>``.

    Why: a ``preexec_fn`` makes subprocess fork the supervisor (copying its page tables, running
    Python's fork handlers: 2 to 4 ms of CPU per step); without one subprocess uses vfork, and
    the shell, a small program, sets the limits and replaces itself with the step's program:
    the same process, session, argv and environment, the limits in place before any of the
    step's code runs.

    The shell must do what ``step_preexec`` does. ``probe`` checks that once per supervisor by
    reading back /proc/self/limits as the shell leaves them (shells differ: bash's ``ulimit -p``
    is the pipe size, dash's the process count). ``command`` declines a step whose start the
    shell could treat differently: a program that is not an ELF file or a ``#!`` script (a
    shell runs such a file as a shell script where exec refuses it), a limit above the
    supervisor's own hard limit (subprocess fails that step), an environment with no PATH or
    a PWD of its own (the shell would supply those), or a program named like an option (some
    shells' exec reads "-x" as one of its own). A declined step takes the ``preexec_fn`` path.
    When the shell fails (``set -e``: a limit not set, a program not started) its message
    starts with the step's mark, a random ``$0`` that the step's program never sees, so that
    no program can pass off its own failure as one of starting it."""

    SHELL = "/bin/sh"
    FLAGS = {resource.RLIMIT_CPU: "t", resource.RLIMIT_FSIZE: "f", resource.RLIMIT_CORE: "c",
             resource.RLIMIT_DATA: "d", resource.RLIMIT_NPROC: "p"}
    UNITS = {"f": 512, "c": 512, "d": 1024}  # POSIX: ulimit -f counts 512-byte blocks; dash's -c and -d as here
    TITLES = {resource.RLIMIT_CPU: "Max cpu time", resource.RLIMIT_FSIZE: "Max file size",
              resource.RLIMIT_CORE: "Max core file size", resource.RLIMIT_DATA: "Max data size",
              resource.RLIMIT_NPROC: "Max processes"}  # /proc/<pid>/limits (proc(5))
    PROBE = {resource.RLIMIT_CPU: (7, 8), resource.RLIMIT_FSIZE: (3 << 20, 3 << 20), resource.RLIMIT_CORE: (0, 0),
             resource.RLIMIT_DATA: (1 << 30, 1 << 30), resource.RLIMIT_NPROC: (999, 999)}

    def __init__(self):
        self.hard = {which: resource.getrlimit(which)[1] for which in self.FLAGS}

    @classmethod
    def probe(cls, cwd):
        """A launcher when this machine's shell sets every limit as asked, else None."""
        if not os.access(cls.SHELL, os.X_OK):
            return None
        launcher = cls()
        if not launcher.within_hard_limits(cls.PROBE):
            return None
        report = 'while IFS= read -r line; do echo "$line"; done </proc/self/limits; ' \
                 'read -r adj </proc/self/oom_score_adj; echo "oom_score_adj $adj"'
        script = launcher.script(cls.PROBE, {}).replace('exec "$@"', report)
        try:
            done = subprocess.run([cls.SHELL, "-c", script], cwd=cwd, env={"PATH": os.defpath},
                                  stdin=subprocess.DEVNULL, capture_output=True, timeout=10)
        except (OSError, subprocess.SubprocessError):
            return None
        lines = done.stdout.decode("ascii", "replace").splitlines()
        if done.returncode != 0 or done.stderr or "oom_score_adj 1000" not in lines:
            return None
        seen = {}
        for line in lines:
            for which, title in cls.TITLES.items():
                if line.startswith(title + " "):
                    fields = line[len(title):].split()
                    if fields[0].isdigit() and fields[1].isdigit():
                        seen[which] = (int(fields[0]), int(fields[1]))
        return launcher if seen == cls.PROBE else None

    def within_hard_limits(self, rlimits):
        return all(self.hard[which] == resource.RLIM_INFINITY or hard <= self.hard[which]
                   for which, (_, hard) in rlimits.items())

    def script(self, rlimits, env):
        lines = ["set -e"]
        for which, (soft, hard) in rlimits.items():
            flag = self.FLAGS[which]
            unit = self.UNITS.get(flag, 1)
            if soft == hard:
                lines.append("ulimit -%s %d" % (flag, soft // unit))
            else:  # the soft limit first: a hard limit below the current soft one is refused
                lines += ["ulimit -S -%s %d" % (flag, soft // unit), "ulimit -H -%s %d" % (flag, hard // unit)]
        lines.append("echo 1000 >/proc/self/oom_score_adj")
        if "PWD" not in env:
            lines.append("unset PWD")  # the shell exports one of its own
        lines.append('exec "$@"')
        return "; ".join(lines)

    def command(self, argv, env, cwd, rlimits):
        """The launcher's argv for this step and its mark, or None where the step must take
        the fallback."""
        if not argv or argv[0].startswith("-") or "PATH" not in env or "PWD" in env \
                or not self.within_hard_limits(rlimits):
            return None
        for which, pair in rlimits.items():
            if any(value % self.UNITS.get(self.FLAGS[which], 1) for value in pair):
                return None
        if not execs_directly(argv[0], env["PATH"], cwd):
            return None
        mark = "assay-step-" + os.urandom(8).hex()
        return [self.SHELL, "-c", self.script(rlimits, env), mark] + list(argv), (mark + ": ").encode("ascii")

    @staticmethod
    def message(err, mark):
        """The shell's complaint without its mark and line number ("<mark>: 1: exec: x: not found")."""
        text = err[len(mark):].decode("utf-8", "replace").strip()
        number, _, rest = text.partition(": ")
        return rest if number.isdigit() else text


def execs_directly(program, path, cwd):
    """Whether the first regular file that exec would try for ``program`` (the path itself when
    it has a slash, else the first in PATH) is executable and an ELF file or a ``#!`` script,
    which execve runs rather than refusing with ENOEXEC, where a shell would read it as a script."""
    places = [program] if "/" in program else [os.path.join(folder, program) for folder in path.split(os.pathsep)]
    for place in places:
        place = os.path.join(cwd, place)  # an absolute place stays as it is
        try:
            if not stat.S_ISREG(os.stat(place).st_mode):
                continue
            fd = os.open(place, os.O_RDONLY | os.O_NONBLOCK | os.O_CLOEXEC)  # no wait, should it be a FIFO by now
        except OSError:
            continue
        try:
            head = os.read(fd, 4) if stat.S_ISREG(os.fstat(fd).st_mode) else b""
        except OSError:
            head = b""
        finally:
            os.close(fd)
        return os.access(place, os.X_OK) and (head == b"\x7fELF" or head[:2] == b"#!")
    return False


def collect(proc, limits, started, kill_leftovers, full_stdout=False):
    """Read both pipes until EOF, the wall-clock deadline or the output cap (``full_stdout``:
    keep all of stdout, not only its tail). When the step's
    own process ends, whatever it started is killed (``kill_leftovers``, the supervisor's sweep), as bubblewrap's pid namespace
    ends with its first process: a detached child holding the pipes open cannot stretch the
    step. Returns the output, the two flags and how many processes were still running then."""
    deadline = started + float(limits["wall_seconds"])
    cap = int(limits["max_output_kb"]) * 1024
    buffers = {proc.stdout: bytearray(), proc.stderr: bytearray()}
    total = 0
    timed_out = flooded = ended = False
    left_running = 0
    try:
        exit_fd = os.pidfd_open(proc.pid)  # readable once the process ends (Linux 5.3)
    except (AttributeError, OSError):
        exit_fd = None
    with selectors.DefaultSelector() as selector:
        for stream in buffers:
            selector.register(stream, selectors.EVENT_READ)
        if exit_fd is not None:
            selector.register(exit_fd, selectors.EVENT_READ, "exit")
        while selector.get_map():
            remaining = deadline - time.monotonic()
            if remaining <= 0:
                timed_out = True
                break
            for key, _ in selector.select(timeout=min(remaining, 0.5 if exit_fd is not None else 0.05)):
                if key.data == "exit":
                    selector.unregister(key.fileobj)
                    ended = True
                    continue
                chunk = os.read(key.fd, 65536)
                if not chunk:
                    selector.unregister(key.fileobj)
                    continue
                total += len(chunk)
                if full_stdout and key.fileobj is proc.stdout:
                    buffers[proc.stdout] += chunk
                else:
                    keep_tail(buffers[key.fileobj], chunk)
                if total > cap:
                    flooded = True
                    break
            if flooded:
                break
            if exit_fd is None and not ended and proc.poll() is not None:
                ended = True
            if ended and proc.returncode is None:
                reap_step(proc)  # reaped first, so the sweep cannot take its exit status
                left_running = kill_leftovers()
            if exit_fd is None and ended and not any(k.data != "exit" for k in selector.get_map().values()):
                break
    if exit_fd is not None:
        os.close(exit_fd)
    if timed_out or flooded:
        kill_step_group(proc)
    if not reap_step(proc, timeout=max(1.0, deadline - time.monotonic())):
        timed_out = True
        kill_step_group(proc)
        reap_step(proc)
    for stream in buffers:
        stream.close()
    return bytes(buffers[proc.stdout]), bytes(buffers[proc.stderr]), timed_out, flooded, left_running


def reap_step(proc, timeout=None):
    """Wait for the step's process with wait4(), keeping its resource usage: ru_maxrss is the
    peak resident memory of the step and the descendants it waited for, per step, on any host
    (no cgroup needed). False when ``timeout`` passed first."""
    if proc.returncode is not None:
        return True
    deadline = None if timeout is None else time.monotonic() + timeout
    while True:
        try:
            pid, status, usage = os.wait4(proc.pid, 0 if deadline is None else os.WNOHANG)
        except ChildProcessError:  # reaped elsewhere: Popen's own reading of that case
            proc.wait()
            return True
        if pid == proc.pid:
            proc.returncode = os.waitstatus_to_exitcode(status)
            proc.max_rss_kb = usage.ru_maxrss
            proc.cpu_seconds = round(usage.ru_utime + usage.ru_stime, 4)
            return True
        if time.monotonic() >= deadline:
            return False
        time.sleep(0.01)


def keep_tail(buffer, chunk):
    """Append ``chunk`` to ``buffer``, keeping about its last KEEP_BYTES (trimmed in batches)."""
    buffer += chunk
    if len(buffer) > 2 * KEEP_BYTES:
        del buffer[: len(buffer) - KEEP_BYTES]


def kill_step_group(proc):
    """Kill the step's process group (its session: the step starts one), but only while its
    leader is unreaped: until then no other process can hold that number, so on a host the
    signal cannot reach another program's group. What is left afterwards is the sweep's."""
    if proc.returncode is not None:
        return
    try:
        os.killpg(proc.pid, signal.SIGKILL)
    except (ProcessLookupError, PermissionError):
        pass


def sweep():
    """As pid 1 of the sandbox's pid namespace: kill and reap every process but this one;
    return how many were still running (zombies, finished but not yet reaped, do not count)."""
    me = os.getpid()
    running = None
    for _ in range(200):
        pids = [int(p) for p in os.listdir("/proc") if p.isdigit() and int(p) != me]
        if running is None:
            running = sum(1 for pid in pids if process_state(pid) not in ("Z", "X", None))
        for pid in pids:
            try:
                os.kill(pid, signal.SIGKILL)
            except (ProcessLookupError, PermissionError):
                pass
        reap()
        if not pids:
            break
        time.sleep(0.005)
    return running or 0


def sweep_own(procs_files):
    """In host mode: kill and reap this supervisor's descendants and the members of its cgroup
    (``procs_files``), and nothing else; return how many were still running. As a child
    subreaper it inherits every orphan below it, so a process that detached from its parent
    is still found through the parent links."""
    me = os.getpid()
    running = None
    for _ in range(200):
        pids = own_processes(me, procs_files)
        if running is None:
            running = sum(1 for pid in pids if process_state(pid) not in ("Z", "X", None))
        if pids:
            kill_verified(pids, lambda: own_processes(me, procs_files))
        reap()
        if not pids:
            break
        time.sleep(0.005)
    return running or 0


def own_processes(root, procs_files=()):
    """The process ids below ``root`` (its descendants) and in the cgroups whose
    ``cgroup.procs`` files are given, ``root`` itself excepted."""
    found = descendants(root)
    for name in procs_files:
        try:
            found.update(int(p) for p in open(name).read().split())
        except (OSError, ValueError):
            continue
    found.discard(root)
    return found


def descendants(root):
    """Every process below ``root``, through the kernel's per-thread children lists, or through
    every process's parent link where the kernel keeps no such lists."""
    if not os.path.exists("/proc/%d/task/%d/children" % (os.getpid(), os.getpid())):
        return descendants_by_parent_links(root)
    found, queue = set(), [root]
    while queue:
        pid = queue.pop()
        try:
            tasks = os.listdir("/proc/%d/task" % pid)
        except OSError:
            continue  # gone meanwhile: its children are ours (the subreaper's) by the next pass
        for task in tasks:
            try:
                kids = open("/proc/%d/task/%s/children" % (pid, task)).read().split()
            except OSError:
                continue
            for kid in map(int, kids):
                if kid not in found and kid != root:
                    found.add(kid)
                    queue.append(kid)
    return found


def descendants_by_parent_links(root):
    parents = {}
    for name in os.listdir("/proc"):
        if name.isdigit():
            parent = parent_of(int(name))
            if parent is not None:
                parents.setdefault(parent, []).append(int(name))
    found, queue = set(), [root]
    while queue:
        for kid in parents.get(queue.pop(), ()):
            if kid not in found and kid != root:
                found.add(kid)
                queue.append(kid)
    return found


def parent_of(pid):
    try:
        text = open("/proc/%d/stat" % pid).read()
    except OSError:
        return None
    try:
        return int(text[text.rfind(")") + 2:].split()[1])
    except (IndexError, ValueError):
        return None


def kill_verified(pids, still_own):
    """SIGKILL the processes ``pids``, each through a pidfd opened first and used only if its
    number still belongs to one of ours afterwards (``still_own()``): a pidfd names the process
    it was opened on for good, so one that ended meanwhile, its number reused by a stranger, is
    signalled in vain instead of the stranger. Without pidfds (Linux before 5.3, Python before
    3.9) by number, after checking again."""
    handles = {}
    for pid in pids:
        try:
            handles[pid] = os.pidfd_open(pid)
        except (AttributeError, OSError):
            handles[pid] = None
    current = still_own()
    for pid, handle in handles.items():
        try:
            if pid in current:
                if handle is not None and hasattr(signal, "pidfd_send_signal"):
                    signal.pidfd_send_signal(handle, signal.SIGKILL)
                else:
                    os.kill(pid, signal.SIGKILL)
        except (ProcessLookupError, PermissionError, OSError):
            pass
        finally:
            if handle is not None:
                os.close(handle)


def process_state(pid):
    try:
        text = open("/proc/%d/stat" % pid).read()
    except OSError:
        return None
    return text[text.rfind(")") + 2:][:1]


def reap():
    while True:
        try:
            pid, _ = os.waitpid(-1, os.WNOHANG)
        except ChildProcessError:
            return
        if pid == 0:
            return


def empty_folder(top, mode):
    """Remove everything inside ``top`` and give it back ``mode``; what could not be removed,
    as messages."""
    try:
        if os.lstat(top).st_uid == os.getuid():
            os.chmod(top, mode)
        names = os.listdir(top)
    except OSError as exc:
        return ["%s: %s" % (top, exc)]
    problems = []
    for name in names:
        try:
            remove_tree(os.path.join(top, name))
        except OSError as exc:
            problems.append("%s: %s" % (os.path.join(top, name), exc))
    return problems


def ipc_objects():
    """System V shared memory, semaphores and message queues, and POSIX message queues, in
    this sandbox's IPC namespace (the next candidate would share them)."""
    found = []
    for kind in ("shm", "sem", "msg"):
        try:
            lines = open("/proc/sysvipc/" + kind).read().splitlines()[1:]
        except OSError:
            continue
        found += ["sysv %s %s" % (kind, line.split()[1]) for line in lines if line.strip()]
    try:
        found += ["mqueue " + name for name in os.listdir("/dev/mqueue")]
    except OSError:
        pass
    return found


DIR_FLAGS = os.O_RDONLY | os.O_DIRECTORY | os.O_NOFOLLOW | os.O_CLOEXEC


def open_folder_of(root, name, create=False, owner=None):
    """A descriptor for the folder that holds ``name`` (a path relative to the folder
    ``root``) and the file's own name there. Every step is taken with O_NOFOLLOW, so a link a
    candidate planted (in place of the file or of any folder on the way) is never followed.
    With ``create``, missing folders are made (and given to ``owner``)."""
    parts = name.split("/")
    if not name or name.startswith("/") or any(part in ("", ".", "..") for part in parts):
        raise ValueError("file name must be relative to the work dir: %r" % name)
    fd = os.open(root, DIR_FLAGS)
    try:
        for part in parts[:-1]:
            made = False
            if create:
                try:
                    os.mkdir(part, 0o755, dir_fd=fd)
                    made = True
                except FileExistsError:
                    pass
            inner = os.open(part, DIR_FLAGS, dir_fd=fd)
            os.close(fd)
            fd = inner
            if made and owner is not None:
                os.fchown(fd, owner, owner)
    except BaseException:
        os.close(fd)
        raise
    return fd, parts[-1]


def write_new_file(root, name, data, owner=None):
    """Create ``name`` under ``root`` with ``data``: a new file or an error, never a write
    through a link or into a file that someone else put there first."""
    folder, leaf = open_folder_of(root, name, create=True, owner=owner)
    try:
        fd = os.open(leaf, os.O_WRONLY | os.O_CREAT | os.O_EXCL | os.O_NOFOLLOW | os.O_CLOEXEC, 0o644,
                     dir_fd=folder)
    except FileExistsError:
        raise FileExistsError("%s: something is already there in a work dir that should be empty (left "
                              "by an earlier candidate?); not written" % name) from None
    finally:
        os.close(folder)
    with os.fdopen(fd, "wb") as handle:
        if owner is not None:
            os.fchown(fd, owner, owner)  # the file just made, by its descriptor
        handle.write(data)


def open_input_file(root, name):
    """A read-only descriptor for ``name`` under ``root`` if it is a regular file reached
    through no link, else None: a step's standard input, written there by the harness."""
    try:
        folder, leaf = open_folder_of(root, name)
    except (OSError, ValueError):
        return None
    try:
        fd = os.open(leaf, os.O_RDONLY | os.O_NOFOLLOW | os.O_NONBLOCK | os.O_CLOEXEC, dir_fd=folder)
    except OSError:
        return None
    finally:
        os.close(folder)
    if not stat.S_ISREG(os.fstat(fd).st_mode):
        os.close(fd)
        return None
    os.set_blocking(fd, True)
    return fd


def read_regular_file(root, name, max_bytes):
    """The first ``max_bytes`` of ``name`` under ``root``, or None if it is missing, not a
    regular file, or reached through a link. O_NONBLOCK: a FIFO in its place must not hang."""
    try:
        folder, leaf = open_folder_of(root, name)
    except OSError:
        return None
    try:
        fd = os.open(leaf, os.O_RDONLY | os.O_NOFOLLOW | os.O_NONBLOCK | os.O_CLOEXEC, dir_fd=folder)
    except OSError:
        return None
    finally:
        os.close(folder)
    with os.fdopen(fd, "rb") as handle:
        if not stat.S_ISREG(os.fstat(fd).st_mode):
            return None
        return handle.read(max_bytes)


def remove_tree(path):
    """Remove ``path`` and everything below it, however deep, following no link.

    Iterative, with at most two directories open at once: every directory met is moved up
    into the one being removed and emptied from there. A recursive walk (``shutil.rmtree`` in
    Python 3.11 too) fails with RecursionError on a tree a few thousand levels deep, and
    would need a descriptor per level. Raises OSError for what cannot be removed."""
    try:
        info = os.lstat(path)
    except FileNotFoundError:
        return
    if not stat.S_ISDIR(info.st_mode):
        os.unlink(path)
        return
    parent, name = os.path.split(os.path.abspath(path))
    parent_fd = os.open(parent, DIR_FLAGS)
    try:
        top = open_directory(name, parent_fd)
        try:
            empty_directory(top)
        finally:
            os.close(top)
        os.rmdir(name, dir_fd=parent_fd)
    finally:
        os.close(parent_fd)


def empty_directory(top):
    """Remove everything inside the directory open as ``top`` (see ``remove_tree``)."""
    make_writable(top)
    serial = 0
    while True:
        subdirectories = []
        for name in os.listdir(top):
            if is_directory(name, top):
                subdirectories.append(name)
            else:
                unlink_quietly(name, top)
        if not subdirectories:
            return
        for name in subdirectories:
            try:
                sub = open_directory(name, top)
            except FileNotFoundError:
                continue
            try:
                make_writable(sub)
                for entry in os.listdir(sub):
                    if is_directory(entry, sub):
                        # Moving a folder to a new parent rewrites its "..": it must be writable.
                        grant_owner_rights(entry, sub)
                        serial += 1
                        while exists(".assay-rm-%d" % serial, top):
                            serial += 1
                        os.rename(entry, ".assay-rm-%d" % serial, src_dir_fd=sub, dst_dir_fd=top)
                    else:
                        unlink_quietly(entry, sub)
            finally:
                os.close(sub)
            os.rmdir(name, dir_fd=top)


def is_directory(name, dir_fd):
    try:
        return stat.S_ISDIR(os.stat(name, dir_fd=dir_fd, follow_symlinks=False).st_mode)
    except FileNotFoundError:
        return False


def exists(name, dir_fd):
    try:
        os.stat(name, dir_fd=dir_fd, follow_symlinks=False)
    except FileNotFoundError:
        return False
    return True


def unlink_quietly(name, dir_fd):
    try:
        os.unlink(name, dir_fd=dir_fd)
    except FileNotFoundError:
        pass


def open_directory(name, dir_fd):
    """Open the directory ``name`` in ``dir_fd`` (never through a link), first making it
    readable when its owner (this user) took its permissions away."""
    try:
        return os.open(name, DIR_FLAGS, dir_fd=dir_fd)
    except PermissionError:
        grant_owner_rights(name, dir_fd)
    return os.open(name, DIR_FLAGS, dir_fd=dir_fd)


def grant_owner_rights(name, dir_fd):
    """Give the directory ``name`` in ``dir_fd`` rwx for its owner, where it lacks them and
    this user owns it (root needs none). Through an O_PATH handle, so never through a link."""
    handle = os.open(name, os.O_PATH | os.O_DIRECTORY | os.O_NOFOLLOW | os.O_CLOEXEC, dir_fd=dir_fd)
    try:
        info = os.fstat(handle)
        if stat.S_IMODE(info.st_mode) & 0o700 == 0o700 or info.st_uid != os.geteuid():
            return
        try:
            os.chmod("/proc/self/fd/%d" % handle, 0o700)  # the directory itself, by its handle
        except FileNotFoundError:  # no /proc: by name (it was a directory a moment ago)
            os.chmod(name, 0o700, dir_fd=dir_fd)
    finally:
        os.close(handle)


def make_writable(fd):
    """Owner rights on an open directory, so its entries can be listed and removed."""
    try:
        if stat.S_IMODE(os.fstat(fd).st_mode) & 0o700 != 0o700:
            os.fchmod(fd, 0o700)
    except OSError:
        pass  # not ours: whatever cannot be removed is reported by the caller


def drop_signal(signum, frame):
    """The handler of the signals the supervisor must survive. A handler rather than SIG_IGN
    because exec resets caught signals to their defaults but keeps ignored ones ignored."""


def main():
    """Serve requests until stdin closes. An argument, when given, is the host mode's JSON
    (see ``Supervisor``)."""
    LIBC.prctl(PR_SET_DUMPABLE, 0, 0, 0, 0)
    # Caught, not ignored: a step's program must start with every signal at its default, and
    # exec keeps ignored signals ignored. So are those ignored by whoever started the supervisor
    # (nohup's SIGHUP, say), but SIGPIPE and SIGXFSZ, which Python ignores for its own sake and
    # subprocess restores in the child.
    kept = (signal.SIGPIPE, signal.SIGXFSZ, signal.SIGKILL, signal.SIGSTOP)
    inherited = [s for s in signal.valid_signals() if s not in kept and signal.getsignal(s) == signal.SIG_IGN]
    for sig in set(DROPPED) | set(inherited):
        signal.signal(sig, drop_signal)
        signal.siginterrupt(sig, False)
    supervisor = Supervisor(json.loads(sys.argv[1]) if len(sys.argv) > 1 else None)
    out = sys.stdout.buffer
    handlers = {"hello": supervisor.op_hello, "write": supervisor.op_write, "read": supervisor.op_read,
                "run": supervisor.op_run, "reset": supervisor.op_reset}
    for line in sys.stdin.buffer:
        seq = None
        try:
            request = json.loads(line)
            seq = request.get("seq")
            reply = handlers[request["op"]](request)
            reply["ok"] = True
        except Exception as exc:  # reported to the backend, which treats it as a sandbox failure
            reply = {"ok": False, "error": "%s: %s" % (type(exc).__name__, exc)}
        reply["seq"] = seq
        try:
            out.write(json.dumps(reply).encode("ascii") + b"\n")
            out.flush()
        except OSError:  # nobody reads the replies: the harness is gone
            break
        reap()
    # The harness is gone. In a sandbox, exiting as its pid 1 ends everything in it; on the host
    # the supervisor's descendants would outlive it, so they go first.
    supervisor.sweep()


if __name__ == "__main__":
    main()
