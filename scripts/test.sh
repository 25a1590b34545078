#!/usr/bin/env bash
# npm test: install what is missing, start a throwaway PostgreSQL on a free loopback port, build the
# web export when stale, run every jest project (shared, server, client, e2e), stop the database,
# print "N passed, N failed" and exit non-zero when anything failed.
# Extra arguments go to jest, e.g. `npm test -- --selectProjects server`.
set -uo pipefail
source "$(dirname "$0")/lib.sh"
cd "$ROOT"
mkdir -p .data

ensure_node_modules
ensure_postgres
ensure_chromium

TMP="$(mktemp -d /tmp/tunefork-test.XXXXXX)"
chmod 755 "$TMP"
PG_DIR="$TMP/pg"
PG_PORT="$(free_port)"

HEALTH_DIR="$TMP/pg-health"

cleanup() {
  pg_stop "$PG_DIR"
  pg_stop "$HEALTH_DIR"
  rm -rf "$TMP"
}
trap cleanup EXIT

pg_init "$PG_DIR"
pg_start "$PG_DIR" "$PG_PORT"
pg_create_db "$PG_PORT" tunefork_test
pg_create_db "$PG_PORT" tunefork_e2e
log "test PostgreSQL on 127.0.0.1:$PG_PORT"

export NODE_ENV=test
export DATABASE_URL="postgres://tunefork@127.0.0.1:$PG_PORT/tunefork_test"
export TUNEFORK_E2E_DATABASE_URL="postgres://tunefork@127.0.0.1:$PG_PORT/tunefork_e2e"
# The health test stops and restarts its database to see the 503: it gets a cluster of its own so
# the other tests running beside it keep theirs.
HEALTH_PORT="$(free_port)"
pg_init "$HEALTH_DIR"
pg_start "$HEALTH_DIR" "$HEALTH_PORT"
pg_create_db "$HEALTH_PORT" tunefork_health
export TUNEFORK_TEST_PGDATA="$HEALTH_DIR"
export TUNEFORK_TEST_PGPORT="$HEALTH_PORT"
export TUNEFORK_HEALTH_DATABASE_URL="postgres://tunefork@127.0.0.1:$HEALTH_PORT/tunefork_health"
# Photo files of the seeded e2e world; the e2e server reads them from the same folder.
export TUNEFORK_E2E_DATA_DIR="$TMP/e2e-data"

./node_modules/.bin/tsx server/db/cli.ts migrate >/dev/null || die "migrations failed on the test database"
DATABASE_URL="$TUNEFORK_HEALTH_DATABASE_URL" ./node_modules/.bin/tsx server/db/cli.ts migrate >/dev/null \
  || die "migrations failed on the health test's database"
DATABASE_URL="$TUNEFORK_E2E_DATABASE_URL" ./node_modules/.bin/tsx server/db/cli.ts migrate >/dev/null \
  || die "migrations failed on the e2e database"
DATABASE_URL="$TUNEFORK_E2E_DATABASE_URL" DATA_DIR="$TUNEFORK_E2E_DATA_DIR" ./node_modules/.bin/tsx server/db/cli.ts seed >/dev/null \
  || die "seeding the e2e database failed"
# Only the browser tests need the exported web app; TUNEFORK_SKIP_WEB_EXPORT=1 skips the build for
# runs that select other projects (several people can then run tests in one tree at once).
if [ -z "${TUNEFORK_SKIP_WEB_EXPORT:-}" ] && web_export_stale; then build_web; fi

TYPECHECK=0
if [ -z "${TUNEFORK_SKIP_TYPECHECK:-}" ]; then
  log "type-checking the client and server projects…"
  ./node_modules/.bin/tsc --noEmit -p tsconfig.json && ./node_modules/.bin/tsc --noEmit -p tsconfig.server.json || TYPECHECK=1
  [ "$TYPECHECK" = 0 ] || log "type errors above: the run will fail"
fi

# jest runs each project's files one at a time (they share a database). With no arguments, two
# jest processes run side by side, one per core: shared logic and the API on the test database;
# the components and the browser journeys (their servers on the e2e database). Each line of output
# is marked with its half.
run_half() {
  local name="$1"; shift
  ./node_modules/.bin/jest --ci --runInBand --json --outputFile="$TMP/results-$name.json" "$@" 2>&1 | sed -u "s/^/[$name] /"
  return "${PIPESTATUS[0]}"
}
START=$(date +%s)
if [ $# -eq 0 ]; then
  run_half api --selectProjects shared server &
  API=$!
  run_half ui --selectProjects client e2e &
  UI=$!
  STATUS=0
  wait "$API" || STATUS=1
  wait "$UI" || STATUS=1
  RESULTS=("$TMP/results-api.json" "$TMP/results-ui.json")
else
  ./node_modules/.bin/jest --ci --runInBand --json --outputFile="$TMP/results.json" "$@"
  STATUS=$?
  RESULTS=("$TMP/results.json")
fi
log "jest took $(( $(date +%s) - START )) s"
node scripts/summarize-tests.js "${RESULTS[@]}" || STATUS=1
[ "$TYPECHECK" = 0 ] || { log "type-check failed"; STATUS=1; }
exit $STATUS
