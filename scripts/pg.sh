#!/usr/bin/env bash
# Small wrapper over lib.sh's PostgreSQL helpers, for tests and developers:
#   scripts/pg.sh start DIR PORT | stop DIR | status DIR
set -euo pipefail
source "$(dirname "$0")/lib.sh"
ensure_postgres
case "${1:-}" in
  start) pg_start "$2" "$3" ;;
  stop) pg_stop "$2" ;;
  status) as_pg_owner "$PG_BIN/pg_ctl" -D "$2" status ;;
  *) die "usage: scripts/pg.sh start DIR PORT | stop DIR | status DIR" ;;
esac
