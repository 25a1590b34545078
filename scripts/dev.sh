#!/usr/bin/env bash
# npm run dev: the embedded PostgreSQL, the API with reload on :8080 and the Expo dev server
# (fast refresh) on :8081, which calls the API across origins (CORS allowed for it in development).
set -euo pipefail
source "$(dirname "$0")/lib.sh"
cd "$ROOT"
mkdir -p .data
ensure_node_modules

use_embedded_postgres_unless_url
./node_modules/.bin/tsx server/db/cli.ts migrate
./node_modules/.bin/tsx server/db/cli.ts seed-if-empty

API_PORT="${PORT:-8080}"
WEB_PORT="${WEB_PORT:-8081}"
export NODE_ENV=development DEV_WEB_ORIGIN="http://localhost:$WEB_PORT"
./node_modules/.bin/tsx watch server/index.ts &
API_PID=$!
EXPO_PUBLIC_API_URL="http://localhost:$API_PORT" ./node_modules/.bin/expo start --web --port "$WEB_PORT" --localhost --offline &
WEB_PID=$!

cleanup() {
  kill "$API_PID" "$WEB_PID" 2>/dev/null || true
  wait 2>/dev/null || true
  if [ "$OWN_DB" = 1 ]; then pg_stop "$PG_DIR"; fi
}
trap cleanup EXIT INT TERM
log "API on http://127.0.0.1:$API_PORT, app with fast refresh on http://localhost:$WEB_PORT"
wait
