#!/usr/bin/env bash
# npm run dev: like npm start, but `next dev` with hot reload.
set -euo pipefail
. "$(dirname "$0")/bootstrap.sh"
. scripts/pg.sh
ensure_node_modules
load_env dev
port_free_or_die "$PORT" "the web app (set PORT to use another)"
cleanup() { trap - EXIT INT TERM; stop_children; pg_stop dev; }
trap cleanup EXIT INT TERM
pg_start dev "$PG_PORT" "$PG_PASSWORD"
node_modules/.bin/tsx --conditions=react-server scripts/db.ts prepare
start_fake_smtp
if [ -f scripts/worker.ts ]; then node --conditions=react-server --import tsx scripts/worker.ts & CHILD_PIDS+=($!); fi
node_modules/.bin/next dev -p "$PORT" &
CHILD_PIDS+=($!)
wait "${CHILD_PIDS[-1]}"
