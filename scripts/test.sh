#!/usr/bin/env bash
# `npm test`: installs what is missing (npm packages, Debian's chromium and
# postgresql), then runs every test against a throwaway stack.
set -euo pipefail
cd "$(dirname "$0")/.."
bash scripts/ensure-deps.sh
if [ ! -x /usr/bin/chromium ]; then
  echo "Installing Debian's chromium for the browser tests…"
  export DEBIAN_FRONTEND=noninteractive
  apt-get update -qq && apt-get install -y -qq chromium >/dev/null
fi
# The cluster drills (tests/integration/cluster-drills.test.ts) run PgBouncer and HAProxy.
if [ ! -x /usr/sbin/pgbouncer ] || [ ! -x /usr/sbin/haproxy ]; then
  echo "Installing Debian's pgbouncer and haproxy for the cluster drills…"
  export DEBIAN_FRONTEND=noninteractive
  apt-get update -qq && apt-get install -y -qq --no-install-recommends pgbouncer haproxy >/dev/null
fi
export NEXT_TELEMETRY_DISABLED=1
# The whole suite starts with the linter (eslint.config.mjs: Next's rules, layers,
# cycles, file size); `npm test -- <paths>` runs just those tests.
if [ "$#" -eq 0 ]; then
  echo "Linting…"
  npx eslint . --cache --cache-location node_modules/.cache/eslint/
fi
exec node --import tsx scripts/test.ts "$@"
