#!/usr/bin/env bash
# npm run bench:notices: the notice fan-out benchmark on the test cluster's database
# (the cluster is started here, and stopped again if it was not already running).
set -euo pipefail
. "$(dirname "$0")/bootstrap.sh"
. scripts/pg.sh
load_env test
pg_ensure_installed
if pg_as_owner "$PG_BIN/pg_ctl" -D "$(pg_cluster_dir test)/data" status >/dev/null 2>&1; then was_running=1; else was_running=0; fi
pg_start test "$PG_PORT" "$PG_PASSWORD"
[ "$was_running" = 1 ] || trap 'pg_stop test' EXIT
node_modules/.bin/tsx --conditions=react-server scripts/db.ts prepare
node_modules/.bin/tsx --conditions=react-server bench/notices-fanout.ts
