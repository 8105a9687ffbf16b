#!/usr/bin/env bash
# Installs what Leeway needs on a fresh machine: npm packages from the lockfile, and Debian's
# Chromium for the browser tests (only when it is missing). Safe to run again.
set -euo pipefail
cd "$(dirname "$0")/.."

if [ ! -d node_modules ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  npm ci
fi

if [ "${1:-}" = "--with-browser" ] && [ ! -x /usr/bin/chromium ]; then
  echo "installing Debian's chromium for the browser tests"
  export DEBIAN_FRONTEND=noninteractive
  apt-get update -qq
  apt-get install -y -qq chromium >/dev/null
fi
