#!/usr/bin/env bash
# npm start: install what is missing, start the embedded PostgreSQL (unless DATABASE_URL is set),
# migrate, seed an empty database, build the web app when stale, and serve everything on one port.
set -euo pipefail
source "$(dirname "$0")/lib.sh"
cd "$ROOT"
mkdir -p .data

ensure_node_modules

use_embedded_postgres_unless_url

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
