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
# Node runs the script itself with the tsx loader (no tsx parent process in between), so that
# Ctrl-C reaches the one process that stops the services, and nothing exits before it is done.
exec node --import tsx "scripts/$script.ts" "$@"
