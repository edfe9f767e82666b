#!/usr/bin/env bash
# npm start: install what is missing, start PostgreSQL and the fake SMTP server (and the fake
# S3 server with PHOTO_STORAGE=s3),
# migrate, seed the demo park into an empty database, build if needed, serve.
set -euo pipefail
. "$(dirname "$0")/bootstrap.sh"
. scripts/pg.sh

ensure_node_modules
load_env dev
port_free_or_die "$PORT" "the web app (set PORT to use another)"

cleanup() {
  trap - EXIT INT TERM
  say "› Stopping…"
  stop_children
  pg_stop dev
  say "› Stopped. Your data is kept for the next npm start."
}
trap cleanup EXIT INT TERM

pg_start dev "$PG_PORT" "$PG_PASSWORD"
node_modules/.bin/tsx --conditions=react-server scripts/db.ts prepare
start_fake_smtp
start_fake_s3
build_if_needed
if [ -f scripts/worker.ts ]; then node --conditions=react-server --import tsx scripts/worker.ts & CHILD_PIDS+=($!); fi
say "› Loamcast on http://localhost:$PORT  (demo accounts in README.md; Ctrl-C stops everything)"
node scripts/serve.mjs "$PORT" &
CHILD_PIDS+=($!)
wait "${CHILD_PIDS[-1]}"
