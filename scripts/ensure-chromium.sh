#!/usr/bin/env bash
# Browser tests drive Debian's Chromium; install it with apt-get the first time (no browser download).
set -euo pipefail
if [ -x /usr/bin/chromium ]; then exit 0; fi
echo "[chromium] not installed; installing Debian's chromium with apt-get (one time)" >&2
run() { if [ "$(id -u)" -eq 0 ]; then "$@"; else sudo "$@"; fi; }
run env DEBIAN_FRONTEND=noninteractive apt-get update -qq
run env DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends chromium >/dev/null
