#!/usr/bin/env bash
# Boots the cgroup v2 test bed and runs the sandbox tests inside it: the base image from
# .ci/vm-image.sh (built once, then cached), plus a second disk with this project and the
# Python libraries it uses, copied from this machine's installation. The VM runs under QEMU's
# software emulation (TCG; the KVM device hung for this guest when tried) with cgroup v2 only,
# and .ci/vm-guest.sh runs the tests as its init. The console is the test log, on stdout; the
# exit status is the in-VM test run's (3 when the VM never reported one); the console is also
# kept in $ASSAY_VM_CACHE/last-console.log.
#
#   bash .ci/vm-test.sh                   the whole in-VM plan (.ci/vm-guest.sh)
#   bash .ci/vm-test.sh tests/vm -k peak  only these pytest arguments, as root in the VM
#
# Environment: ASSAY_VM_CACHE (default /var/cache/assay/vm), ASSAY_VM_TIMEOUT (seconds for the
# whole script, image build included; default 840), ASSAY_VM_CPUS (default 2),
# ASSAY_VM_MEMORY_MB (default 2048).
set -euo pipefail
here=$(cd "$(dirname "$0")" && pwd)
project=$(cd "$here/.." && pwd)
CACHE=${ASSAY_VM_CACHE:-/var/cache/assay/vm}
TIMEOUT=${ASSAY_VM_TIMEOUT:-840}
log() { echo "vm-test: $*" >&2; }
command -v qemu-system-x86_64 >/dev/null || { log "qemu-system-x86_64 is missing (apt-get install qemu-system-x86)"; exit 1; }

base=$(bash "$here/vm-image.sh" "$CACHE")

# The project disk: the working tree's files (tracked and untracked, not ignored ones) and the
# installed distributions the harness and pytest need, keyed by the hash of all of it.
stage=$(mktemp -d "$CACHE/stage-XXXXXX")
trap 'rm -rf "$stage"' EXIT
python3 "$here/stage-python.py" "$stage/assay" --project
key=$(cd "$stage/assay" && find . -type f -print0 | LC_ALL=C sort -z | xargs -0 sha256sum | sha256sum | cut -c1-16)
disk="$CACHE/project-$key.ext4"
if [ -f "$disk" ]; then
  touch "$disk"
else
  size_mb=$(( $(du -sm "$stage/assay" | cut -f1) * 12 / 10 + 64 ))
  mkfs.ext4 -q -F -L assay-project -E root_owner=0:0 -d "$stage/assay" "$disk.tmp.$$" "${size_mb}M" >&2
  mv "$disk.tmp.$$" "$disk"
fi
rm -rf "$stage"
# Older project disks go, but never one made or used in the last hour (another run may be
# booting it): the three most recent stay in any case.
ls -t "$CACHE"/project-*.ext4 | tail -n +4 | while read -r old; do
  if [ -n "$(find "$old" -mmin +60)" ]; then rm -f "$old"; fi
done

append="console=ttyS0 panic=-1 quiet loglevel=3 cgroup_no_v1=all mitigations=off"
if [ "$#" -gt 0 ]; then
  append+=" assay.pytest=$(printf '%s\n' "$@" | base64 -w0)"
fi
log "booting $base with project disk $(basename "$disk") (TCG, ${ASSAY_VM_CPUS:-2} CPUs, $(( TIMEOUT - SECONDS )) s left)"
console=$(mktemp "$CACHE/console-XXXXXX.log")
trap 'chmod 644 "$console"; mv -f "$console" "$CACHE/last-console.log"' EXIT  # kept for a look after the run
started=$(date +%s)
left=$(( TIMEOUT - SECONDS ))  # what the image build and the project disk left of the budget
[ "$left" -gt 60 ] || { log "no time left to boot the VM (ASSAY_VM_TIMEOUT=${TIMEOUT})"; exit 3; }
set +e
timeout --kill-after=10 "$left" qemu-system-x86_64 \
  -accel tcg,thread=multi -cpu max -smp "${ASSAY_VM_CPUS:-2}" -m "${ASSAY_VM_MEMORY_MB:-2048}" \
  -kernel "$base/kernel" -initrd "$base/initrd.gz" -append "$append" \
  -drive "file=$base/root.ext4,format=raw,if=virtio,snapshot=on" \
  -drive "file=$disk,format=raw,if=virtio,snapshot=on" \
  -nic none -nographic -no-reboot < /dev/null 2>&1 | stdbuf -oL tr -d '\r' | tee "$console"
qemu_status=${PIPESTATUS[0]}
set -e
log "the VM ran $(( $(date +%s) - started )) s (qemu exit $qemu_status)"
result=$(grep -a -o 'assay-vm: exit [0-9]*' "$console" | tail -n 1 | awk '{print $3}')
if [ -z "$result" ]; then
  if [ "$qemu_status" -eq 124 ]; then log "the VM did not finish within ${left} s"; else log "the VM reported no result"; fi
  exit 3
fi
exit "$result"
