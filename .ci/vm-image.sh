#!/usr/bin/env bash
# The cgroup v2 test bed's base image, as root on a Debian/Ubuntu machine with apt: a Debian
# kernel (linux-image-amd64, unpacked with dpkg-deb -x, never installed), a busybox initramfs
# that loads the few modules a virtio disk with ext4 needs, and a small Debian root file system
# built offline with debootstrap (bubblewrap, python3, gcc for the native hostile program) packed into
# an ext4 image with mkfs.ext4 -d (no loop device needed). The project itself is not in it:
# .ci/vm-test.sh packs the project on a second disk at each run, so the base is rebuilt only when
# this script changes.
#
# Cached like the runtime images (harness/sandbox/images.py): the folder is named after the
# content hash of this script, so an edit here names a new image and a stale one is never used.
# Prints the image folder (kernel, initrd.gz, root.ext4) on stdout; progress goes to stderr.
#
#   bash .ci/vm-image.sh [CACHE_DIR]      (default: $ASSAY_VM_CACHE or /var/cache/assay/vm)
set -euo pipefail
here=$(cd "$(dirname "$0")" && pwd)
CACHE=${1:-${ASSAY_VM_CACHE:-/var/cache/assay/vm}}
export DEBIAN_FRONTEND=noninteractive
log() { echo "vm-image: $*" >&2; }

key=$(sha256sum "$here/vm-image.sh" | cut -c1-16)
image="$CACHE/base-$key"
if [ -f "$image/ready" ]; then
  log "reusing $image"
  echo "$image"
  exit 0
fi
[ "$(id -u)" -eq 0 ] || { log "building the image needs root (debootstrap, file ownership)"; exit 1; }
mkdir -p "$CACHE"
exec 9>"$CACHE/.build-lock"
flock 9  # one build at a time; the one that waited finds the image ready
if [ -f "$image/ready" ]; then
  log "reusing $image (built meanwhile)"
  echo "$image"
  exit 0
fi
for tool in debootstrap mkfs.ext4 cpio apt-get dpkg-deb python3; do
  command -v "$tool" >/dev/null || { log "missing $tool (bash .ci/install installs it)"; exit 1; }
done

work=$(mktemp -d "$CACHE/build-XXXXXX")
trap 'rm -rf "$work"' EXIT
cd "$work"
started=$(date +%s)

# The kernel and busybox, downloaded by apt but never installed on this machine.
kernel_package=$(apt-cache depends linux-image-amd64 | awk '/Depends: linux-image-/{print $2; exit}')
[ -n "$kernel_package" ] || { log "apt knows no linux-image-amd64 (apt-get update?)"; exit 1; }
log "downloading $kernel_package and busybox-static"
apt-get download "$kernel_package" busybox-static >/dev/null 2>&1 \
  || { apt-get update -qq && apt-get download "$kernel_package" busybox-static >/dev/null; }
dpkg-deb -x linux-image-*.deb kernel-tree
dpkg-deb -x busybox-static_*.deb busybox-tree
version=$(ls kernel-tree/lib/modules)

# The initramfs: busybox, the modules for a virtio disk holding ext4 (in dependency order, read
# from each module's .modinfo section since there is no depmod here), and an init that mounts
# the root disk and the project disk and hands over to the project's .ci/vm-guest.sh.
mkdir -p initrd/bin initrd/proc initrd/sys initrd/dev initrd/newroot initrd/modules
cp busybox-tree/bin/busybox initrd/bin/
python3 - "kernel-tree/lib/modules/$version/kernel" initrd/modules <<'PY'
import pathlib, shutil, sys
tree, target = pathlib.Path(sys.argv[1]), pathlib.Path(sys.argv[2])
paths = {p.name[:-3].replace("-", "_"): p for p in tree.rglob("*.ko")}
def depends(name):
    data = paths[name].read_bytes()
    at = data.find(b"depends=")
    return [d.replace("-", "_") for d in data[at + 8:data.index(b"\0", at)].decode().split(",") if d] if at >= 0 else []
order = []
def add(name):
    if name in order:
        return
    for dep in depends(name):
        add(dep)
    order.append(name)
for wanted in ("crc32c_generic", "virtio_pci", "virtio_blk", "ext4"):
    add(wanted)
for name in order:
    shutil.copy(paths[name], target / f"{name}.ko")
(target / "order").write_text("\n".join(order) + "\n")
PY
cat > initrd/init <<'INIT'
#!/bin/busybox sh
/bin/busybox --install -s /bin
mount -t proc proc /proc
mount -t sysfs sys /sys
mount -t devtmpfs dev /dev
for module in $(cat /modules/order); do insmod "/modules/$module.ko" || echo "initrd: insmod $module failed"; done
for _ in $(seq 100); do [ -b /dev/vda ] && [ -b /dev/vdb ] && break; sleep 0.1; done
mount -t ext4 /dev/vda /newroot || { echo "initrd: cannot mount the root disk"; poweroff -f; }
mount -t ext4 /dev/vdb /newroot/srv/assay || { echo "initrd: cannot mount the project disk"; poweroff -f; }
umount /proc /sys
mount --move /dev /newroot/dev
exec switch_root /newroot /bin/bash /srv/assay/.ci/vm-guest.sh
INIT
chmod +x initrd/init
(cd initrd && find . | cpio -o -H newc 2>/dev/null | gzip -1) > initrd.gz
cp kernel-tree/boot/vmlinuz-* kernel

# The root file system: minbase plus what the in-VM tests need. The Python libraries the
# project uses come from this machine's installation, on the project disk (vm-test.sh).
mirror=$(cd "$here/.." && python3 -c "from harness.sandbox.images import debian_mirror; print(debian_mirror())" \
         2>/dev/null || echo http://deb.debian.org/debian)
log "debootstrap bookworm from $mirror"
debootstrap --variant=minbase --include=bubblewrap,python3,procps,iproute2,gcc,libc6-dev \
  bookworm root "$mirror" > debootstrap.log 2>&1 || { tail -n 20 debootstrap.log >&2; exit 1; }
rm -rf root/var/cache/apt/archives/*.deb root/var/lib/apt/lists/* root/usr/share/doc/* \
       root/usr/share/locale/* root/usr/share/man/*
echo assay-vm > root/etc/hostname
mkdir -p root/srv/assay

size_mb=$(( $(du -sm root | cut -f1) * 13 / 10 + 768 ))  # room for the tests' files and a swap file
log "packing the root file system (${size_mb} MB ext4)"
mkfs.ext4 -q -F -L assay-root -d root root.ext4 "${size_mb}M" >&2
rm -rf root kernel-tree busybox-tree initrd ./*.deb

mkdir "$image.tmp" && mv kernel initrd.gz root.ext4 "$image.tmp/"
echo "$kernel_package" > "$image.tmp/kernel-package"
touch "$image.tmp/ready"
rm -rf "$image" && mv "$image.tmp" "$image"
for old in "$CACHE"/base-*; do  # one base at a time: an older one is never used again
  [ "$old" = "$image" ] || rm -rf "$old"
done
log "built $image in $(( $(date +%s) - started )) s"
echo "$image"
