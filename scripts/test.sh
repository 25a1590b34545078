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

cleanup() {
  pg_stop "$PG_DIR"
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
export TUNEFORK_TEST_PGDATA="$PG_DIR"
export TUNEFORK_TEST_PGPORT="$PG_PORT"
# Photo files of the seeded e2e world; the e2e server reads them from the same folder.
export TUNEFORK_E2E_DATA_DIR="$TMP/e2e-data"

./node_modules/.bin/tsx server/db/cli.ts migrate >/dev/null || die "migrations failed on the test database"
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

START=$(date +%s)
./node_modules/.bin/jest --ci --runInBand --json --outputFile="$TMP/results.json" "$@"
STATUS=$?
log "jest took $(( $(date +%s) - START )) s"
node scripts/summarize-tests.js "$TMP/results.json" || STATUS=1
[ "$TYPECHECK" = 0 ] || { log "type-check failed"; STATUS=1; }
exit $STATUS
