#!/usr/bin/env bash
# npm test: the same bootstrap as npm start, against a throwaway database, then
# lint (the layout's import boundaries), type-check, unit tests, integration tests (real PostgreSQL)
# and browser tests (Chromium).
set -uo pipefail
. "$(dirname "$0")/bootstrap.sh"
. scripts/pg.sh
set +e

ensure_node_modules || exit 1
load_env test
export BCRYPT_COST=${BCRYPT_COST:-10}

if [ ! -x /usr/bin/chromium ]; then
  say "› Installing Debian's chromium for the browser tests"
  SUDO=""; [ "$(id -u)" -ne 0 ] && SUDO="sudo"
  $SUDO apt-get update -qq && DEBIAN_FRONTEND=noninteractive $SUDO apt-get install -y -qq chromium >/dev/null || { echo "✗ could not install chromium"; exit 1; }
fi

cleanup() { trap - EXIT INT TERM; stop_children; pg_stop test; }
trap cleanup EXIT INT TERM

pg_start test "$PG_PORT" "$PG_PASSWORD" || exit 1
# Photos first: the demo seed writes its hazard photos into the fresh folder.
rm -rf "$PHOTO_STORAGE_DIR"
node_modules/.bin/tsx --conditions=react-server scripts/db.ts fresh || exit 1
INTEGRATION_DATABASE_URL="${DATABASE_URL%/*}/loamcast_integration"
DATABASE_URL="$INTEGRATION_DATABASE_URL" node_modules/.bin/tsx --conditions=react-server scripts/db.ts fresh || exit 1
start_fake_smtp
start_fake_push
start_fake_weather
rm -rf .local/test-results && mkdir -p .local/test-results

# `npm test -- tests/unit/x.test.ts tests/e2e/y.spec.ts` runs only the stages those paths belong to, on
# those files (browser paths also build). With no paths, everything runs.
UNIT_FILES=(); INTEGRATION_FILES=(); E2E_FILES=()
for path in "$@"; do
  case "$path" in
    tests/unit*) UNIT_FILES+=("$path") ;;
    tests/integration*) INTEGRATION_FILES+=("$path") ;;
    tests/e2e*) E2E_FILES+=("$path") ;;
    *) echo "✗ $path is not under tests/unit, tests/integration or tests/e2e" >&2; exit 2 ;;
  esac
done
SELECTED=$#

declare -A RESULT
run_step() {
  local name="$1"; shift
  if [ "$SELECTED" -gt 0 ] && ! wanted "$name"; then RESULT[$name]=skipped; return; fi
  say "━━ $name"
  if "$@"; then RESULT[$name]=pass; else RESULT[$name]=FAIL; fi
}
wanted() {
  case "$1" in
    unit) [ ${#UNIT_FILES[@]} -gt 0 ] ;;
    integration) [ ${#INTEGRATION_FILES[@]} -gt 0 ] ;;
    build|browser) [ ${#E2E_FILES[@]} -gt 0 ] ;;
    *) return 1 ;;
  esac
}

run_step lint node scripts/lint/run.mjs --report .local/test-results/lint.json
run_step typecheck node_modules/.bin/tsc --noEmit
run_step unit node_modules/.bin/vitest run --project unit --reporter=default --reporter=json --outputFile=.local/test-results/unit.json "${UNIT_FILES[@]}"
# Integration tests get a database of their own, so what they create never shows in the browser tests.
run_step integration env DATABASE_URL="$INTEGRATION_DATABASE_URL" node_modules/.bin/vitest run --project integration --reporter=default --reporter=json --outputFile=.local/test-results/integration.json "${INTEGRATION_FILES[@]}"
run_step build node_modules/.bin/next build
if [ "${RESULT[build]}" != FAIL ]; then
  run_step browser node_modules/.bin/playwright test "${E2E_FILES[@]}"
else
  RESULT[browser]=FAIL
fi

# Photos in object storage: the storage, photo and two-instance tests once more with PHOTO_STORAGE=s3,
# against the local fake S3 server. The demo is seeded again so its photos are in the bucket.
s3_stage() {
  use_fake_s3 && rm -rf "$FAKE_S3_DIR" && start_fake_s3 || return 1
  env DATABASE_URL="$INTEGRATION_DATABASE_URL" node_modules/.bin/vitest run --project integration tests/integration/server tests/integration/hazards --reporter=default --reporter=json --outputFile=.local/test-results/integration-s3.json || return 1
  [ "${RESULT[build]}" = pass ] || return 1
  node_modules/.bin/tsx --conditions=react-server scripts/db.ts fresh || return 1
  PLAYWRIGHT_JSON_OUTPUT_NAME=.local/test-results/e2e-s3.json node_modules/.bin/playwright test tests/e2e/two-instances.spec.ts --reporter=list,json
}
run_step s3 s3_stage

node scripts/test-summary.mjs
status=0
for step in lint typecheck unit integration build browser s3; do
  printf '  %-12s %s\n' "$step" "${RESULT[$step]}"
  [ "${RESULT[$step]}" = pass ] || [ "${RESULT[$step]}" = skipped ] || status=1
done
exit $status
