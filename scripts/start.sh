#!/usr/bin/env bash
# npm start / npm test entry: installs the dependencies when missing or stale, then hands over
# to the TypeScript script named in $1.
set -euo pipefail
cd "$(dirname "$0")/.."
script="$1"; shift
if [ ! -x node_modules/.bin/tsx ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  echo "· installing dependencies (npm ci)"
  npm ci --no-audit --no-fund --loglevel=error
fi
export TURBO_TELEMETRY_DISABLED=1
exec node node_modules/tsx/dist/cli.mjs "scripts/$script.ts" "$@"
