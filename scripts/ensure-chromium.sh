#!/usr/bin/env bash
# Debian's Chromium drives the e2e tests; a downloaded browser is never used.
set -euo pipefail
if [ -x /usr/bin/chromium ]; then exit 0; fi
if [ "$(id -u)" = "0" ]; then
  echo "[chromium] installing Debian's chromium package"
  export DEBIAN_FRONTEND=noninteractive
  apt-get update -qq
  apt-get install -y -qq chromium >/dev/null
else
  echo "Chromium is missing. Install it with: sudo apt-get update && sudo apt-get install -y chromium" >&2
  exit 1
fi
