#!/usr/bin/env bash
# Entry point for `npm start`, `npm test` and the db scripts on a fresh clone: it installs the
# npm dependencies when they are missing or stale, then hands over to the TypeScript orchestrator.
set -euo pipefail
cd "$(dirname "$0")/.."
export NEXT_TELEMETRY_DISABLED=1

if [ ! -x node_modules/.bin/tsx ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  echo "spanwright: installing npm dependencies (npm ci)"
  if ! npm ci --no-audit --no-fund; then
    echo "spanwright: npm ci failed; check that the npm registry is reachable and package-lock.json is committed, then run the command again." >&2
    exit 1
  fi
fi

script="$1"
shift
# The scripts run server code (the seeds store files through lib/storage): the react-server condition
# resolves server-only's marker to its empty module, as Next's server build does.
exec node_modules/.bin/tsx --conditions=react-server "scripts/$script.ts" "$@"
