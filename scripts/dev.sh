#!/usr/bin/env bash
# npm run dev: like npm start, but `next dev` with hot reload.
set -euo pipefail
. "$(dirname "$0")/bootstrap.sh"
. scripts/pg.sh

start_local_services
node_modules/.bin/next dev -p "$PORT" &
CHILD_PIDS+=($!)
wait "${CHILD_PIDS[-1]}"
