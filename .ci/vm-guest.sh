#!/bin/bash
# Init (pid 1) of the cgroup v2 test bed (.ci/vm-test.sh boots it): mounts what a Debian system
# has, cgroup v2 alone at /sys/fs/cgroup with the memory and pids controllers enabled for
# children, a swap file (so a memory limit must hold against swap too), then runs the in-VM
# test plan: the sandbox, limit and adversarial tests as root, and assay score as an
# unprivileged user in a delegated cgroup subtree. Its last line is
# "assay-vm: exit N", N being 0 only when every part passed; then the VM powers off.
export PATH=/usr/local/sbin:/usr/local/bin:/usr/sbin:/usr/bin:/sbin:/bin
say() { echo "assay-vm: $*"; }
finish() {
  say "exit $1"
  sync
  echo o > /proc/sysrq-trigger
  sleep 30
}

mount -t proc proc /proc
mount -t sysfs sys /sys
mkdir -p /dev/pts /dev/shm /dev/mqueue
ln -sf /proc/self/fd /dev/fd; ln -sf fd/0 /dev/stdin; ln -sf fd/1 /dev/stdout; ln -sf fd/2 /dev/stderr
mount -t devpts devpts /dev/pts
mount -t tmpfs -o mode=1777,nosuid,nodev tmpfs /dev/shm
mount -t mqueue mqueue /dev/mqueue
mount -t tmpfs -o mode=1777,nosuid,nodev tmpfs /tmp
mount -t tmpfs -o mode=755 tmpfs /run
mount -t cgroup2 -o nsdelegate cgroup2 /sys/fs/cgroup || { say "cannot mount cgroup2"; finish 4; }
echo "+memory +pids" > /sys/fs/cgroup/cgroup.subtree_control
ip link set lo up
hostname assay-vm
say "kernel $(uname -r), $(nproc) CPUs, $(awk '/MemTotal/{print int($2/1024)}' /proc/meminfo) MB"
say "cgroup2 controllers: $(cat /sys/fs/cgroup/cgroup.controllers); for children: $(cat /sys/fs/cgroup/cgroup.subtree_control)"
dd if=/dev/zero of=/swapfile bs=1M count=256 status=none && chmod 600 /swapfile && mkswap -q /swapfile \
  && swapon /swapfile && say "swap: $(awk 'NR>1{print $1, $3 " KB"}' /proc/swaps)"

cd /srv/assay || finish 4
export HOME=/root CI=1 PYTHONPATH=/srv/assay:/srv/assay/deps PYTHONDONTWRITEBYTECODE=1 LANG=C.UTF-8
export ASSAY_WARM_COMPILERS=off  # compile servers are a speed-up; under emulation they only cost

pytest() { python3 -m pytest -p no:cacheprovider --color=no -v -rs --durations=0 --durations-min=5 "$@"; }
args=$(tr ' ' '\n' < /proc/cmdline | sed -n 's/^assay.pytest=//p')
if [ -n "$args" ]; then
  mapfile -t pytest_args < <(echo "$args" | base64 -d)
  pytest "${pytest_args[@]}"
  finish $?
fi

say "assay sandbox doctor, as root:"
python3 -m harness sandbox doctor
# The plan, in two parts run side by side (one per CPU), each line of their output marked with
# the part's name. limits: cgroup v2 limits, bombs, per-step peaks and 100 hostile candidates,
# and the isolation tests that rest on the cgroup (process caps, children left behind, spoilt
# and lost sandboxes). corpus: Python's attacks on what a cgroup contains, the limits under
# --sandbox none, and assay score as an unprivileged user in a delegated group (the same
# without a group runs on CI's own cgroup v1 host).
part() {
  local name=$1 started=$SECONDS
  shift
  pytest "$@" 2>&1 | sed -u "s/^/[$name] /"
  local result=${PIPESTATUS[0]}
  say "part $name: pytest exit $result in $(( SECONDS - started )) s"
  return "$result"
}
part limits tests/vm/test_cgroup_v2.py tests/test_sandbox_isolation.py \
  -k "test_cgroup_v2 or background_children or fork_bombs or spoils_it or closing_the_sandbox or lost_supervisor or cpu_limit_kill" &
limits=$!
part corpus tests/vm/test_adversarial_v2.py \
  tests/test_sandbox_none_host_mode.py::test_limits_are_the_supervisors_under_both_mechanisms \
  tests/test_rootless.py::test_an_unprivileged_user_in_a_delegated_v2_group_gets_cgroup_limits &
corpus=$!
status=0
wait "$limits" || status=1
wait "$corpus" || status=1
finish $status
