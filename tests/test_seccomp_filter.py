"""The bubblewrap sandbox's seccomp filter (harness/sandbox/seccomp.py): its numbers against the
system's own headers, every denied call against a candidate that tries it, and the keyring
channel between candidates closed on every backend that has one."""

import errno
import json
import os
import platform
import re
import shutil
import signal
import subprocess

import pytest

from harness.vocabulary import Limits, RuntimeSandboxNeeds
from harness.sandbox import make_sandbox, seccomp
from tests.test_sandbox_cleanup import open_backend

NEEDS = RuntimeSandboxNeeds("python")
LIMITS = Limits(wall_seconds=10, cpu_seconds=10)
MACHINE = platform.machine()
TABLE = {"x86_64": seccomp.X86_64, "aarch64": seccomp.AARCH64}.get(MACHINE)
needs_gcc = pytest.mark.skipif(shutil.which("gcc") is None, reason="gcc is not installed")


def compile_and_run(tmp_path, source: str, name: str = "probe") -> str:
    (tmp_path / f"{name}.c").write_text(source)
    built = subprocess.run(["gcc", "-o", str(tmp_path / name), str(tmp_path / f"{name}.c")],
                           capture_output=True, text=True)
    assert built.returncode == 0, built.stderr
    return subprocess.run([str(tmp_path / name)], capture_output=True, text=True, check=True).stdout


# --- the numbers ------------------------------------------------------------------------------

@needs_gcc
@pytest.mark.skipif(MACHINE != "x86_64", reason="the C library's numbers are this machine's")
def test_x86_64_syscall_numbers_match_the_c_library(tmp_path):
    # Source: SYS_<name> from glibc's <sys/syscall.h>, built from the kernel's syscall_64.tbl.
    lines = ["#include <stdio.h>", "#include <sys/syscall.h>", "int main(void) {"]
    for name in seccomp.X86_64:
        lines += [f"#ifdef SYS_{name}", f'  printf("{name} %ld\\n", (long)SYS_{name});', "#endif"]
    lines += ["  return 0;", "}"]
    found = dict(line.split() for line in compile_and_run(tmp_path, "\n".join(lines)).splitlines())
    assert {name: int(number) for name, number in found.items()} == seccomp.X86_64


@needs_gcc
def test_aarch64_syscall_numbers_match_the_generic_kernel_table(tmp_path):
    # Source: the installed kernel headers' asm-generic/unistd.h, which arm64 uses, with the
    # options arm64's asm/unistd.h turns on (clone3 among them; the list is from memory).
    wants = ["RENAMEAT", "NEW_STAT", "SET_GET_RLIMIT", "TIME32_SYSCALLS", "SYS_CLONE3"]
    done = subprocess.run(["gcc", "-E", "-dM", *[f"-D__ARCH_WANT_{w}" for w in wants], "-include",
                           "asm-generic/unistd.h", "-"], input="", capture_output=True, text=True)
    if done.returncode != 0:
        pytest.skip(f"no kernel headers: {done.stderr.strip()[:200]}")
    generic = {m.group(1): int(m.group(2)) for m in re.finditer(r"#define __NR_(\w+) (\d+)\b", done.stdout)}
    assert {name: generic.get(name) for name in seccomp.AARCH64} == seccomp.AARCH64
    # What the aarch64 table leaves out, the generic table does not have.
    missing = [name for name in list(seccomp.DENIED) + ["clone", "personality"] if name not in seccomp.AARCH64]
    assert missing and not [name for name in missing if name in generic]


@needs_gcc
def test_filter_constants_match_the_kernel_headers(tmp_path):
    # Source: linux/filter.h, linux/seccomp.h, linux/audit.h, glibc's <sched.h> (CLONE_NEW*),
    # and on x86-64 asm/unistd.h (__X32_SYSCALL_BIT).
    checks = {
        "AUDIT_ARCH_X86_64": "AUDIT_ARCH_X86_64", "AUDIT_ARCH_AARCH64": "AUDIT_ARCH_AARCH64",
        "SECCOMP_RET_KILL_PROCESS": "SECCOMP_RET_KILL_PROCESS", "SECCOMP_RET_ERRNO": "SECCOMP_RET_ERRNO",
        "SECCOMP_RET_ALLOW": "SECCOMP_RET_ALLOW", "BPF_LD_W_ABS": "BPF_LD | BPF_W | BPF_ABS",
        "BPF_JMP_JEQ_K": "BPF_JMP | BPF_JEQ | BPF_K", "BPF_JMP_JGE_K": "BPF_JMP | BPF_JGE | BPF_K",
        "BPF_JMP_JSET_K": "BPF_JMP | BPF_JSET | BPF_K", "BPF_RET_K": "BPF_RET | BPF_K",
        "OFFSET_NR": "offsetof(struct seccomp_data, nr)", "OFFSET_ARCH": "offsetof(struct seccomp_data, arch)",
        "CLONE_NAMESPACES": ("CLONE_NEWNS | CLONE_NEWCGROUP | CLONE_NEWUTS | CLONE_NEWIPC | CLONE_NEWUSER "
                             "| CLONE_NEWPID | CLONE_NEWNET"),
    }
    if MACHINE == "x86_64":
        checks["X32_SYSCALL_BIT"] = "__X32_SYSCALL_BIT"
    lines = ["#define _GNU_SOURCE", "#include <stdio.h>", "#include <stddef.h>", "#include <sched.h>",
             "#include <linux/audit.h>", "#include <linux/filter.h>", "#include <linux/seccomp.h>",
             "#include <asm/unistd.h>", "int main(void) {",
             '  printf("sock_filter %lu\\n", (unsigned long)sizeof(struct sock_filter));',
             '  printf("args0 %lu\\n", (unsigned long)offsetof(struct seccomp_data, args));']
    lines += [f'  printf("{name} %lu\\n", (unsigned long)({expr}));' for name, expr in checks.items()]
    lines += ["  return 0;", "}"]
    found = {k: int(v) for k, v in (line.split() for line in compile_and_run(tmp_path, "\n".join(lines)).splitlines())}
    assert found.pop("sock_filter") == 8 and len(seccomp.PROGRAM) % 8 == 0
    assert found.pop("args0") == seccomp.offset_arg_low(0)
    assert found == {name: getattr(seccomp, name) for name in checks}


# --- the filter at work, one candidate per denied call ----------------------------------------

@pytest.fixture(scope="module")
def box():
    sandbox = make_sandbox("bubblewrap")
    sandbox.check()
    yield sandbox
    sandbox.close()


def run_python(sandbox, code: str, limits: Limits = LIMITS):
    with sandbox.workspace(NEEDS) as space:
        space.write("probe.py", code)
        return space.run(["python3", "-I", "probe.py"], limits, {}), space


CALL = """
import ctypes, json, os
libc = ctypes.CDLL(None, use_errno=True)
libc.syscall.restype = ctypes.c_long
buffer = ctypes.create_string_buffer(512)
{prepare}
args = [{args}]
ctypes.set_errno(0)
result = libc.syscall(ctypes.c_long({number}), *args)
if result == 0 and {forks}:
    os._exit(0)  # a child a clone created: gone at once
print(json.dumps({{"result": result, "errno": ctypes.get_errno()}}))
"""
# Without the filter, unshare would give the process every capability in user, mount and UTS
# namespaces of its own, and many a privileged call would then succeed (CLONE_NEWUSER |
# CLONE_NEWNS | CLONE_NEWUTS, linux/sched.h). Not before clone or unshare themselves: a second
# user namespace is then refused whatever the filter says.
OWN_NAMESPACES = "libc.syscall(ctypes.c_long({unshare}), ctypes.c_int(0x10000000 | 0x00020000 | 0x04000000))"


def call(name: str, args: str = "", forks: bool = False) -> str:
    prepare = "" if name in ("unshare", "clone", "clone3") else OWN_NAMESPACES.format(unshare=TABLE["unshare"])
    return CALL.format(prepare=prepare, args=args or ARGUMENTS.get(name, ""), number=TABLE[name], forks=forks)


# Arguments that would make the call succeed (or fail other than with EPERM) without the
# filter, where that is easy; plain zeros elsewhere. Values from the man pages, from memory.
ARGUMENTS = {
    "add_key": 'b"user", b"assay-probe", b"x", ctypes.c_size_t(1), ctypes.c_int(-4)',  # KEY_SPEC_USER_KEYRING
    "request_key": 'b"user", b"assay-probe", None, ctypes.c_int(0)',
    "keyctl": "ctypes.c_int(0), ctypes.c_int(-4), ctypes.c_int(1)",  # KEYCTL_GET_KEYRING_ID, create
    "unshare": "ctypes.c_int(0x10000000)",  # CLONE_NEWUSER
    "setns": "ctypes.c_int(os.open('/proc/self/ns/uts', os.O_RDONLY)), ctypes.c_int(0)",
    "process_vm_readv": "ctypes.c_int(os.getpid()), None, ctypes.c_ulong(0), None, ctypes.c_ulong(0), ctypes.c_ulong(0)",
    "process_vm_writev": "ctypes.c_int(os.getpid()), None, ctypes.c_ulong(0), None, ctypes.c_ulong(0), ctypes.c_ulong(0)",
    "userfaultfd": "ctypes.c_int(1)",  # UFFD_USER_MODE_ONLY
    "io_uring_setup": "ctypes.c_uint(1), buffer",  # a zeroed struct io_uring_params
    "open_tree": "ctypes.c_int(-100), b'.', ctypes.c_uint(0)",  # AT_FDCWD, no clone: no privilege needed
    "iopl": "ctypes.c_int(0)",
    "syslog": "ctypes.c_int(10), None, ctypes.c_int(0)",  # SYSLOG_ACTION_SIZE_BUFFER
    "name_to_handle_at": "ctypes.c_int(-100), b'.', buffer, ctypes.byref(ctypes.c_int()), ctypes.c_int(0)",
    "sethostname": "b'x', ctypes.c_size_t(1)",
    "setdomainname": "b'x', ctypes.c_size_t(1)",
    "chroot": "b'/'",
    "mount": "b'none', b'/tmp', b'tmpfs', ctypes.c_ulong(0), None",
    "fsopen": "b'tmpfs', ctypes.c_uint(0)",
    "fspick": "ctypes.c_int(-100), b'/tmp', ctypes.c_uint(0)",
}
DENIED_HERE = sorted(name for name in seccomp.DENIED if TABLE and name in TABLE)


@pytest.mark.skipif(TABLE is None, reason=f"no syscall table for {MACHINE}")
@pytest.mark.parametrize("name", DENIED_HERE)
def test_a_denied_call_fails_with_eperm(box, name):
    result, _ = run_python(box, call(name))
    assert result.exit_code == 0, result.stderr
    assert json.loads(result.stdout) == {"result": -1, "errno": errno.EPERM}, f"{name}: {result.stdout}"


@pytest.mark.skipif(TABLE is None, reason=f"no syscall table for {MACHINE}")
@pytest.mark.parametrize("flag", ["NEWNS", "NEWCGROUP", "NEWUTS", "NEWIPC", "NEWUSER", "NEWPID", "NEWNET"])
def test_clone_into_a_new_namespace_fails_with_eperm(box, flag):
    # With CLONE_NEWUSER too: without the filter that gives the child what the other flags need.
    flags = seccomp.CLONE_NEWUSER | getattr(seccomp, f"CLONE_{flag}") | signal.SIGCHLD
    args = f"ctypes.c_ulong({flags}), None, None, None, ctypes.c_ulong(0)"
    result, _ = run_python(box, call("clone", args, forks=True))
    assert json.loads(result.stdout) == {"result": -1, "errno": errno.EPERM}, result.stdout + result.stderr


@pytest.mark.skipif(TABLE is None, reason=f"no syscall table for {MACHINE}")
def test_clone3_says_not_implemented_so_the_c_library_falls_back_to_clone(box):
    # clone3(struct clone_args *, size): a zeroed 64-byte struct (CLONE_ARGS_SIZE_VER0, from memory)
    args = "buffer, ctypes.c_size_t(64)"
    result, _ = run_python(box, call("clone3", args, forks=True))
    assert json.loads(result.stdout) == {"result": -1, "errno": errno.ENOSYS}, result.stdout + result.stderr


@pytest.mark.skipif(TABLE is None, reason=f"no syscall table for {MACHINE}")
@pytest.mark.parametrize("persona, allowed", [
    (0xFFFFFFFF, True), (0x0000, True),  # query; PER_LINUX
    (0x0040000, False), (0x0400000, False), (0x0100000, False),  # ADDR_NO_RANDOMIZE, READ_IMPLIES_EXEC, MMAP_PAGE_ZERO
], ids=["query", "linux", "no-randomize", "read-implies-exec", "page-zero"])
def test_personality_changes_that_matter_are_denied(box, persona, allowed):
    # Values from linux/personality.h, from memory.
    result, _ = run_python(box, call("personality", f"ctypes.c_uint({persona})"))
    reply = json.loads(result.stdout)
    if allowed:
        assert reply["result"] >= 0, reply
    else:
        assert reply == {"result": -1, "errno": errno.EPERM}


def test_threads_processes_and_ordinary_calls_still_work(box):
    code = ("import os, subprocess, threading, ctypes\n"
            "box = []\n"
            "threads = [threading.Thread(target=box.append, args=(i,)) for i in range(8)]\n"
            "[t.start() for t in threads]; [t.join() for t in threads]\n"
            "pid = os.fork()\n"
            "if pid == 0:\n    os._exit(7)\n"
            "_, status = os.waitpid(pid, 0)\n"
            "out = subprocess.run(['sh', '-c', 'echo child'], capture_output=True, text=True).stdout.strip()\n"
            "print(len(box), os.waitstatus_to_exitcode(status), out)\n")
    result, _ = run_python(box, code)
    assert result.stdout.split() == ["8", "7", "child"], result.stderr


@pytest.mark.skipif(MACHINE != "x86_64", reason="the x32 ABI is x86-64's")
def test_an_x32_system_call_kills_the_process(box):
    # getpid is 39 in syscall_64.tbl; the x32 ABI's numbers carry bit 30 (__X32_SYSCALL_BIT).
    code = "import ctypes\nprint(ctypes.CDLL(None).syscall(0x40000000 | 39))\n"
    result, _ = run_python(box, code)
    assert result.signal == signal.SIGSYS and result.stdout == "", (result.signal, result.stdout, result.stderr)


@needs_gcc
@pytest.mark.skipif(MACHINE != "x86_64", reason="int $0x80 is the 32-bit x86 entry")
def test_a_32_bit_system_call_kills_the_process(box):
    # int $0x80 enters the kernel's i386 table (getpid is 20 there, arch/x86/entry/syscalls/syscall_32.tbl).
    code = ("#include <stdio.h>\nint main(void) {\n  long r;\n"
            '  __asm__ volatile ("int $0x80" : "=a"(r) : "a"(20L) : "memory");\n'
            '  printf("%ld\\n", r);\n  return 0;\n}\n')
    with box.workspace(NEEDS) as space:
        space.write("probe.c", code)
        built = space.run(["gcc", "-o", "probe", "probe.c"], Limits(wall_seconds=60, cpu_seconds=60), {})
        assert built.exit_code == 0, built.stderr
        result = space.run(["./probe"], LIMITS, {})
    assert result.signal == signal.SIGSYS and result.stdout == "", (result.signal, result.stdout, result.stderr)


# --- the keyring channel, on every backend with warm sandboxes ---------------------------------

LEAVE_A_KEY = """
import ctypes
libc = ctypes.CDLL(None, use_errno=True)
# add_key("user", description, payload, length, KEY_SPEC_USER_KEYRING / KEY_SPEC_SESSION_KEYRING)
for keyring in (-4, -3):
    serial = libc.syscall(ctypes.c_long({number}), b"user", b"assay-channel", b"a message",
                          ctypes.c_size_t(9), ctypes.c_int(keyring))
    print(serial, ctypes.get_errno())
"""
FIND_THE_KEY = """
try:
    print([line for line in open('/proc/keys') if 'assay-channel' in line])
except OSError as exc:
    print([], exc)
"""


@pytest.mark.parametrize("name", ["bubblewrap", "docker"])
def test_the_keyring_is_no_channel_between_candidates(name):
    if TABLE is None:
        pytest.skip(f"no syscall table for {MACHINE}")
    sandbox = open_backend(name)
    try:
        left, first = run_python(sandbox, LEAVE_A_KEY.format(number=TABLE["add_key"]))
        assert left.exit_code == 0, left.stderr
        assert all(line.split() == ["-1", str(errno.EPERM)] for line in left.stdout.splitlines()), left.stdout
        found, second = run_python(sandbox, FIND_THE_KEY)
        same = (second.slot is first.slot) if name == "bubblewrap" else (second.box.id == first.box.id)
        assert same, "the same warm sandbox must serve both for this test to mean anything"
        assert found.stdout.startswith("[]"), found.stdout
    finally:
        sandbox.close()


def test_the_manifest_names_the_filter(box):
    described = box.describe()["syscall_filter"]
    assert "add_key" in described and "clone3" in described
    assert os.path.basename(seccomp.__file__) in described
