#!/usr/bin/env bash
# The Docker sandbox for CI, as root on a Debian/Ubuntu machine: installs docker.io and
# debootstrap, starts dockerd when no daemon answers, then builds the offline Debian base
# (assay-base:bookworm, reused when present) and the images of the runtimes named as
# arguments (default: python). Idempotent: a second run finds everything in place.
#
#   bash .ci/docker-setup.sh python go
set -euo pipefail
cd "$(dirname "$0")/.."
export DEBIAN_FRONTEND=noninteractive
DOCKERD_LOG=${DOCKERD_LOG:-/var/log/assay-dockerd.log}

retry() {  # another apt run may hold the dpkg lock for a while
  local attempt
  for attempt in 1 2 3 4 5 6 7 8; do
    "$@" && return 0
    echo "docker-setup: '$*' failed (attempt $attempt); retrying in 15 s" >&2
    sleep 15
  done
  return 1
}

missing=()
for package in docker.io debootstrap debian-archive-keyring; do
  dpkg-query -W -f='${Status}' "$package" 2>/dev/null | grep -q "install ok installed" || missing+=("$package")
done
if [ "${#missing[@]}" -gt 0 ]; then
  retry apt-get update -qq
  retry apt-get install -y -qq --no-install-recommends "${missing[@]}"
fi

if ! docker info >/dev/null 2>&1; then
  # No registry or bridge network is needed: builds use the host network, sandboxes none.
  setsid dockerd --iptables=false --ip6tables=false --bridge=none >"$DOCKERD_LOG" 2>&1 < /dev/null &
  for _ in $(seq 60); do
    docker info >/dev/null 2>&1 && break
    sleep 1
  done
  if ! docker info >/dev/null 2>&1; then
    echo "docker-setup: dockerd did not come up; the end of $DOCKERD_LOG:" >&2
    tail -n 20 "$DOCKERD_LOG" >&2
    exit 1
  fi
fi

command -v assay >/dev/null 2>&1 || python3 -m pip install -q -e .
if [ "$#" -eq 0 ]; then
  set -- python
fi
assay runtimes build --offline-base "$@"
