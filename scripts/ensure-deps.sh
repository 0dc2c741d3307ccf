#!/usr/bin/env bash
# Installs the npm packages when they are missing or older than the lock file.
set -euo pipefail
cd "$(dirname "$0")/.."
if [ ! -d node_modules ] || [ ! -f node_modules/.package-lock.json ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  echo "Installing npm packages…"
  npm ci --no-audit --no-fund --loglevel=error
fi
