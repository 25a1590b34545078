#!/usr/bin/env bash
# npm start: install what is missing, start the embedded PostgreSQL (unless DATABASE_URL is set),
# migrate, seed an empty database, build the web app when stale, and serve everything on one port.
set -euo pipefail
source "$(dirname "$0")/lib.sh"
cd "$ROOT"
mkdir -p .data

ensure_node_modules

PG_DIR="$ROOT/.data/postgres"
PG_PORT="${TUNEFORK_PG_PORT:-54329}"
OWN_DB=0
if [ -z "${DATABASE_URL:-}" ]; then
  ensure_postgres
  pg_init "$PG_DIR"
  pg_start "$PG_DIR" "$PG_PORT"
  pg_create_db "$PG_PORT" tunefork
  export DATABASE_URL="postgres://tunefork@127.0.0.1:$PG_PORT/tunefork"
  OWN_DB=1
  log "PostgreSQL is up on 127.0.0.1:$PG_PORT (data in .data/postgres)"
fi

cleanup() {
  if [ "$OWN_DB" = 1 ]; then
    log "stopping PostgreSQL"
    pg_stop "$PG_DIR"
  fi
}
trap cleanup EXIT

./node_modules/.bin/tsx server/db/cli.ts migrate
./node_modules/.bin/tsx server/db/cli.ts seed-if-empty
if web_export_stale; then build_web; fi

export NODE_ENV="${NODE_ENV:-development}"
log "open http://${HOST:-127.0.0.1}:${PORT:-8080} (Ctrl-C stops the server and the database)"
# Run the server in the foreground of this script, forwarding Ctrl-C/TERM so it closes cleanly.
./node_modules/.bin/tsx server/index.ts &
SERVER_PID=$!
trap 'kill -TERM $SERVER_PID 2>/dev/null || true' INT TERM
wait $SERVER_PID || true
wait $SERVER_PID 2>/dev/null || true
