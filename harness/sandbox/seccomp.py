"""The bubblewrap sandbox's own seccomp filter: a classic-BPF program, built here in plain
Python and handed to bubblewrap (``--seccomp FD``), which loads it just before it starts the
sandbox's pid 1; every process in the sandbox inherits it.

Why: a warm sandbox serves many candidates, and some kernel state outlives a candidate's
processes without being a file, a process or an IPC object the supervisor could see and
clear. The kernel keyring is one (a key added by one candidate is read by the next); new mount,
user or other namespaces, io_uring, BPF, ptrace and the module, swap, clock and reboot calls are
kernel surface no candidate needs. Denied calls fail with EPERM; ``clone3`` fails with ENOSYS,
so that the C library falls back to ``clone``, whose flags the filter can read (a ``clone``
asking for a new namespace is denied). A call from any other ABI (32-bit x86, x32) kills the
process: the tables below are for x86-64 and aarch64 only.

Syscall numbers come from the Linux kernel's tables: arch/x86/entry/syscalls/syscall_64.tbl
for x86-64 and include/uapi/asm-generic/unistd.h (which aarch64 uses) for aarch64.
tests/test_seccomp_filter.py checks them against the C library's <sys/syscall.h> and the
installed kernel headers. The other constants are from include/uapi/linux/filter.h, bpf_common.h,
seccomp.h, audit.h, elf-em.h and sched.h.
"""

from __future__ import annotations

import errno
import os
import struct

# struct seccomp_data (linux/seccomp.h): int nr; __u32 arch; __u64 instruction_pointer;
# __u64 args[6]. Both architectures are little-endian: an argument's low 32 bits come first.
OFFSET_NR = 0
OFFSET_ARCH = 4


def offset_arg_low(index: int) -> int:
    return 16 + 8 * index


# Classic BPF opcodes (linux/bpf_common.h).
BPF_LD_W_ABS = 0x00 | 0x00 | 0x20  # BPF_LD | BPF_W | BPF_ABS
BPF_JMP_JEQ_K = 0x05 | 0x10 | 0x00  # BPF_JMP | BPF_JEQ | BPF_K
BPF_JMP_JGE_K = 0x05 | 0x30 | 0x00  # BPF_JMP | BPF_JGE | BPF_K
BPF_JMP_JSET_K = 0x05 | 0x40 | 0x00  # BPF_JMP | BPF_JSET | BPF_K
BPF_RET_K = 0x06 | 0x00  # BPF_RET | BPF_K

# Filter return values (linux/seccomp.h).
SECCOMP_RET_KILL_PROCESS = 0x80000000
SECCOMP_RET_ERRNO = 0x00050000
SECCOMP_RET_ALLOW = 0x7FFF0000

# seccomp_data.arch values (linux/audit.h): the ELF machine (EM_X86_64 = 62, EM_AARCH64 = 183)
# with __AUDIT_ARCH_64BIT (0x80000000) and __AUDIT_ARCH_LE (0x40000000).
AUDIT_ARCH_X86_64 = 0xC000003E
AUDIT_ARCH_AARCH64 = 0xC00000B7
X32_SYSCALL_BIT = 0x40000000  # x86-64 numbers with this bit set are the x32 ABI's

# The namespace flags of clone(2) (linux/sched.h). CLONE_NEWTIME (0x80) is clone3/unshare only:
# in clone's flags that bit is part of the exit signal.
CLONE_NEWNS = 0x00020000
CLONE_NEWCGROUP = 0x02000000
CLONE_NEWUTS = 0x04000000
CLONE_NEWIPC = 0x08000000
CLONE_NEWUSER = 0x10000000
CLONE_NEWPID = 0x20000000
CLONE_NEWNET = 0x40000000
CLONE_NAMESPACES = (CLONE_NEWNS | CLONE_NEWCGROUP | CLONE_NEWUTS | CLONE_NEWIPC | CLONE_NEWUSER | CLONE_NEWPID
                    | CLONE_NEWNET)

# personality(2) values that change nothing that matters (linux/personality.h): PER_LINUX,
# PER_LINUX32, and 0xffffffff, which only asks for the current one. Anything else (turning off
# address randomisation, READ_IMPLIES_EXEC, MMAP_PAGE_ZERO...) is denied.
PERSONALITY_ALLOWED = (0x0000, 0x0008, 0xFFFFFFFF)

# What is denied and why, by name; numbers per architecture below.
DENIED = {
    # the kernel keyring: keys outlive the process that added them
    "add_key": "keyring", "request_key": "keyring", "keyctl": "keyring",
    # looking into or changing other processes
    "ptrace": "tracing", "process_vm_readv": "tracing", "process_vm_writev": "tracing",
    "pidfd_getfd": "tracing", "process_madvise": "tracing", "perf_event_open": "tracing",
    # kernel programs, page-fault handlers, asynchronous I/O rings
    "bpf": "kernel surface", "userfaultfd": "kernel surface",
    "io_uring_setup": "kernel surface", "io_uring_enter": "kernel surface",
    "io_uring_register": "kernel surface",
    # namespaces and mounts
    "unshare": "namespaces", "setns": "namespaces",
    "mount": "mounts", "umount2": "mounts", "pivot_root": "mounts", "chroot": "mounts",
    "open_tree": "mounts", "move_mount": "mounts", "fsopen": "mounts", "fsconfig": "mounts",
    "fsmount": "mounts", "fspick": "mounts", "mount_setattr": "mounts",
    "name_to_handle_at": "mounts", "open_by_handle_at": "mounts", "fanotify_init": "mounts",
    # the machine itself
    "kexec_load": "machine", "kexec_file_load": "machine", "init_module": "machine",
    "finit_module": "machine", "delete_module": "machine", "reboot": "machine",
    "swapon": "machine", "swapoff": "machine", "acct": "machine", "quotactl": "machine",
    "quotactl_fd": "machine", "lookup_dcookie": "machine", "syslog": "machine",
    "vhangup": "machine", "nfsservctl": "machine", "uselib": "machine",
    "settimeofday": "clock", "clock_settime": "clock", "clock_adjtime": "clock",
    "sethostname": "identity", "setdomainname": "identity",
    # x86-64 only
    "iopl": "machine", "ioperm": "machine", "create_module": "machine", "get_kernel_syms": "machine",
    "query_module": "machine", "_sysctl": "machine",
}
ENOSYS_CALLS = ("clone3",)  # "not implemented": the C library then uses clone
ARGUMENT_CHECKED = ("clone", "personality")

# arch/x86/entry/syscalls/syscall_64.tbl ("common" and "64" entries)
X86_64 = {
    "clone": 56, "ptrace": 101, "syslog": 103, "uselib": 134, "personality": 135, "vhangup": 153,
    "pivot_root": 155, "_sysctl": 156, "chroot": 161, "acct": 163, "settimeofday": 164, "mount": 165,
    "umount2": 166, "swapon": 167, "swapoff": 168, "reboot": 169, "sethostname": 170,
    "setdomainname": 171, "iopl": 172, "ioperm": 173, "create_module": 174, "init_module": 175,
    "delete_module": 176, "get_kernel_syms": 177, "query_module": 178, "quotactl": 179,
    "nfsservctl": 180, "lookup_dcookie": 212, "clock_settime": 227, "kexec_load": 246, "add_key": 248,
    "request_key": 249, "keyctl": 250, "unshare": 272, "perf_event_open": 298, "fanotify_init": 300,
    "name_to_handle_at": 303, "open_by_handle_at": 304, "clock_adjtime": 305, "setns": 308,
    "process_vm_readv": 310, "process_vm_writev": 311, "finit_module": 313, "kexec_file_load": 320,
    "bpf": 321, "userfaultfd": 323, "io_uring_setup": 425, "io_uring_enter": 426,
    "io_uring_register": 427, "open_tree": 428, "move_mount": 429, "fsopen": 430, "fsconfig": 431,
    "fsmount": 432, "fspick": 433, "clone3": 435, "pidfd_getfd": 438, "process_madvise": 440,
    "mount_setattr": 442, "quotactl_fd": 443,
}

# include/uapi/asm-generic/unistd.h (aarch64 has no iopl, ioperm, _sysctl or the old module calls)
AARCH64 = {
    "lookup_dcookie": 18, "umount2": 39, "mount": 40, "pivot_root": 41, "nfsservctl": 42, "chroot": 51,
    "vhangup": 58, "quotactl": 60, "acct": 89, "personality": 92, "unshare": 97, "kexec_load": 104,
    "init_module": 105, "delete_module": 106, "clock_settime": 112, "syslog": 116, "ptrace": 117,
    "reboot": 142, "sethostname": 161, "setdomainname": 162, "settimeofday": 170, "add_key": 217,
    "request_key": 218, "keyctl": 219, "clone": 220, "swapon": 224, "swapoff": 225,
    "perf_event_open": 241, "fanotify_init": 262, "name_to_handle_at": 264, "open_by_handle_at": 265,
    "clock_adjtime": 266, "setns": 268, "process_vm_readv": 270, "process_vm_writev": 271,
    "finit_module": 273, "bpf": 280, "userfaultfd": 282, "kexec_file_load": 294, "io_uring_setup": 425,
    "io_uring_enter": 426, "io_uring_register": 427, "open_tree": 428, "move_mount": 429, "fsopen": 430,
    "fsconfig": 431, "fsmount": 432, "fspick": 433, "clone3": 435, "pidfd_getfd": 438,
    "process_madvise": 440, "mount_setattr": 442, "quotactl_fd": 443,
}
TABLES = {AUDIT_ARCH_X86_64: X86_64, AUDIT_ARCH_AARCH64: AARCH64}


class _Program:
    """Instructions with symbolic forward jumps, resolved when the program is packed."""

    def __init__(self):
        self.code: list[tuple[int, object, object, int]] = []
        self.labels: dict[str, int] = {}

    def load(self, offset: int) -> None:
        self.code.append((BPF_LD_W_ABS, None, None, offset))

    def jump(self, op: int, k: int, yes, no) -> None:
        """``yes``/``no``: a label, or None for the next instruction."""
        self.code.append((op, yes, no, k))

    def ret(self, value: int) -> None:
        self.code.append((BPF_RET_K, None, None, value))

    def label(self, name: str) -> None:
        self.labels[name] = len(self.code)

    def pack(self) -> bytes:
        out = bytearray()
        for index, (op, yes, no, k) in enumerate(self.code):
            offsets = [self._offset(index, target) for target in (yes, no)]
            out += struct.pack("=HBBI", op, offsets[0], offsets[1], k)  # struct sock_filter
        return bytes(out)

    def _offset(self, index: int, target) -> int:
        if target is None:
            return 0
        distance = self.labels[target] - index - 1
        if not 0 <= distance <= 255:  # classic BPF jumps forward only, by at most 255
            raise ValueError(f"seccomp filter: jump to {target} out of range ({distance})")
        return distance


def build_program() -> bytes:
    """The filter as bubblewrap reads it: an array of ``struct sock_filter``."""
    p = _Program()
    eperm = SECCOMP_RET_ERRNO | errno.EPERM
    enosys = SECCOMP_RET_ERRNO | errno.ENOSYS
    p.load(OFFSET_ARCH)
    p.jump(BPF_JMP_JEQ_K, AUDIT_ARCH_X86_64, None, "not-x86-64")
    _arch_block(p, "x86-64", X86_64, x32_bit=True)
    p.label("not-x86-64")
    p.jump(BPF_JMP_JEQ_K, AUDIT_ARCH_AARCH64, None, "kill")
    _arch_block(p, "aarch64", AARCH64, x32_bit=False)
    p.label("deny")
    p.ret(eperm)
    p.label("enosys")
    p.ret(enosys)
    p.label("kill")
    p.ret(SECCOMP_RET_KILL_PROCESS)
    return p.pack()


def _arch_block(p: _Program, arch: str, table: dict[str, int], x32_bit: bool) -> None:
    p.load(OFFSET_NR)
    if x32_bit:
        p.jump(BPF_JMP_JGE_K, X32_SYSCALL_BIT, "kill", None)
    for name in DENIED:
        if name in table:
            p.jump(BPF_JMP_JEQ_K, table[name], "deny", None)
    for name in ENOSYS_CALLS:
        p.jump(BPF_JMP_JEQ_K, table[name], "enosys", None)
    p.jump(BPF_JMP_JEQ_K, table["clone"], f"{arch}-clone", None)
    p.jump(BPF_JMP_JEQ_K, table["personality"], f"{arch}-personality", None)
    p.ret(SECCOMP_RET_ALLOW)
    p.label(f"{arch}-clone")  # clone(flags, ...): no new namespace
    p.load(offset_arg_low(0))
    p.jump(BPF_JMP_JSET_K, CLONE_NAMESPACES, "deny", None)
    p.ret(SECCOMP_RET_ALLOW)
    p.label(f"{arch}-personality")  # personality(persona): only the harmless values
    p.load(offset_arg_low(0))
    for value in PERSONALITY_ALLOWED:
        p.jump(BPF_JMP_JEQ_K, value, f"{arch}-allow", None)
    p.ret(SECCOMP_RET_ERRNO | errno.EPERM)
    p.label(f"{arch}-allow")
    p.ret(SECCOMP_RET_ALLOW)


PROGRAM = build_program()


def program_fd() -> int:
    """A fresh descriptor holding the program, read from its start (for ``--seccomp FD``);
    close-on-exec, so only a child given it explicitly (``pass_fds``) has it."""
    fd = os.memfd_create("assay-seccomp", os.MFD_CLOEXEC)
    try:
        os.write(fd, PROGRAM)
        os.lseek(fd, 0, os.SEEK_SET)
    except BaseException:
        os.close(fd)
        raise
    return fd


def describe() -> str:
    names = sorted(DENIED)
    return (f"seccomp filter of Assay's own (harness/sandbox/seccomp.py): EPERM for {', '.join(names)}, "
            "and for clone with namespace flags and personality changes; ENOSYS for clone3; "
            "other ABIs (32-bit x86, x32) killed")
