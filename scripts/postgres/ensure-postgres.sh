#!/usr/bin/env bash
# Debian's PostgreSQL server for the PostgreSQL test pass; installed only when its binaries are missing.
set -euo pipefail
if ls /usr/lib/postgresql/*/bin/initdb >/dev/null 2>&1; then exit 0; fi
if [ "$(id -u)" = "0" ]; then
  echo "[postgres] installing Debian's postgresql package"
  export DEBIAN_FRONTEND=noninteractive
  apt-get update -qq
  # The package's own cluster may fail to start without an init system; the tests start their own.
  apt-get install -y -qq --no-install-recommends postgresql >/dev/null
  ls /usr/lib/postgresql/*/bin/initdb >/dev/null
else
  echo "PostgreSQL is missing. Install it with: sudo apt-get update && sudo apt-get install -y postgresql" >&2
  exit 1
fi
