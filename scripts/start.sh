#!/usr/bin/env bash
set -euo pipefail
cd "$(dirname "$0")/.."
bash scripts/ensure-deps.sh
export NEXT_TELEMETRY_DISABLED=1
exec node --import tsx scripts/start.ts
