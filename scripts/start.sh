#!/usr/bin/env bash
# npm start: install what is missing, start PostgreSQL and the fake SMTP server (and the fake
# S3 server with PHOTO_STORAGE=s3), migrate, seed the demo park into an empty database, build if
# needed, serve.
set -euo pipefail
. "$(dirname "$0")/bootstrap.sh"
. scripts/pg.sh

start_local_services
build_if_needed
say "› Loamcast on http://localhost:$PORT  (demo accounts in README.md; Ctrl-C stops everything)"
node scripts/serve.mjs "$PORT" &
CHILD_PIDS+=($!)
wait "${CHILD_PIDS[-1]}"
