#!/usr/bin/env bash
# npm run bench:scale: a throwaway PostgreSQL with the demo world and the generated world of
# npm run seed:scale (SCALE=1 unless set), then scripts/bench-scale.ts measuring the community
# routes with autocannon over loopback against a bare pg route as the ceiling.
# BENCH_SECONDS sets each measurement's length (default 10).
set -uo pipefail
source "$(dirname "$0")/lib.sh"
cd "$ROOT"
mkdir -p .data
ensure_node_modules
ensure_postgres
TMP="$(mktemp -d /tmp/tunefork-bench-scale.XXXXXX)"
chmod 755 "$TMP"
PG_PORT="$(free_port)"
cleanup() { pg_stop "$TMP/pg"; rm -rf "$TMP"; }
trap cleanup EXIT
pg_init "$TMP/pg"
pg_start "$TMP/pg" "$PG_PORT"
pg_create_db "$PG_PORT" tunefork_bench_scale
export DATABASE_URL="postgres://tunefork@127.0.0.1:$PG_PORT/tunefork_bench_scale" NODE_ENV=production
export SESSION_SECRET="bench-only-session-secret-0123456789abcdef" BCRYPT_COST=10 DATA_DIR="$TMP/data"
./node_modules/.bin/tsx server/db/cli.ts migrate >/dev/null || die "migrations failed"
./node_modules/.bin/tsx server/db/cli.ts seed >/dev/null || die "seeding failed"
log "generating the world at SCALE=${SCALE:-1}…"
SCALE="${SCALE:-1}" ./node_modules/.bin/tsx scripts/seed-scale.ts || die "seed:scale failed"
./node_modules/.bin/tsx scripts/bench-scale.ts "$@"
