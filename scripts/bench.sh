#!/usr/bin/env bash
# npm run bench [-- --quick]: every benchmark in bench/ in one run, on a fresh database of its own
# (cluster "bench", database loamcast_bench), then one table of ratios (bench/run-all.ts).
# Everything started here is stopped on exit; the cluster too, unless it was already running.
set -euo pipefail
. "$(dirname "$0")/bootstrap.sh"
. scripts/pg.sh

ensure_node_modules
load_env bench
case "$DATABASE_URL" in
  */loamcast_bench) ;;
  *) echo "✗ DATABASE_URL must name the loamcast_bench database: the benchmarks drop and recreate it" >&2; exit 1 ;;
esac

pg_ensure_installed
if pg_as_owner "$PG_BIN/pg_ctl" -D "$(pg_cluster_dir bench)/data" status >/dev/null 2>&1; then was_running=1; else was_running=0; fi
cleanup() {
  trap - EXIT INT TERM
  stop_children
  [ "$was_running" = 1 ] || pg_stop bench
}
trap cleanup EXIT INT TERM

pg_start bench "$PG_PORT" "$PG_PASSWORD"
rm -rf "$PHOTO_STORAGE_DIR"
node_modules/.bin/tsx --conditions=react-server scripts/db.ts fresh
build_if_needed
# The notice benchmark starts its own fake SMTP server on free ports; nothing else sends mail.
node_modules/.bin/tsx --conditions=react-server bench/run-all.ts "$@" &
CHILD_PIDS+=($!)
wait "${CHILD_PIDS[-1]}"
