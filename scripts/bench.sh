#!/usr/bin/env bash
# npm run bench: a throwaway PostgreSQL with the demo world, the real server on a free port, and
# scripts/bench.ts measuring it over loopback; then the community routes at scale
# (scripts/bench-scale.sh: the generated 10,000-racer world, autocannon at 16 and 64 connections
# against a bare-route ceiling). BENCH_SCALE=0 skips the second part. Speed goals live here, never
# in timed tests.
set -uo pipefail
source "$(dirname "$0")/lib.sh"
cd "$ROOT"
mkdir -p .data
ensure_node_modules
ensure_postgres
TMP="$(mktemp -d /tmp/tunefork-bench.XXXXXX)"
chmod 755 "$TMP"
PG_PORT="$(free_port)"
cleanup() { pg_stop "$TMP/pg"; rm -rf "$TMP"; }
trap cleanup EXIT
pg_init "$TMP/pg"
pg_start "$TMP/pg" "$PG_PORT"
pg_create_db "$PG_PORT" tunefork_bench
export DATABASE_URL="postgres://tunefork@127.0.0.1:$PG_PORT/tunefork_bench" NODE_ENV=production
export SESSION_SECRET="bench-only-session-secret-0123456789abcdef" BCRYPT_COST=10 DATA_DIR="$TMP/data"
./node_modules/.bin/tsx server/db/cli.ts migrate >/dev/null || die "migrations failed"
./node_modules/.bin/tsx server/db/cli.ts seed >/dev/null || die "seeding failed"
./node_modules/.bin/tsx scripts/bench.ts "$@" || die "the demo-world benchmark failed"
if [ "${BENCH_SCALE:-1}" != "0" ]; then
  log "now the community routes on the generated world (BENCH_SCALE=0 skips this)…"
  bash "$ROOT/scripts/bench-scale.sh"
fi
