# Shared helpers for start.sh, test.sh and dev.sh. Source it; do not run it.
# shellcheck shell=bash

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
PG_BIN=""

log() { printf '\033[1m[tunefork]\033[0m %s\n' "$*" >&2; }
die() { printf '\033[1;31m[tunefork]\033[0m %s\n' "$*" >&2; exit 1; }

is_root() { [ "$(id -u)" = "0" ]; }

# Install node packages when node_modules is missing or older than the lock file.
ensure_node_modules() {
  local stamp="$ROOT/node_modules/.package-lock.json"
  if [ ! -f "$stamp" ] || [ "$ROOT/package-lock.json" -nt "$stamp" ]; then
    log "installing node packages (npm ci)…"
    (cd "$ROOT" && npm ci --no-audit --no-fund) || die "npm ci failed; see the output above"
    touch "$stamp"
  fi
}

apt_install() {
  is_root || die "missing Debian package(s): $*. Install them with: sudo apt-get install -y $*"
  log "installing Debian package(s): $*"
  if [ -z "${TUNEFORK_APT_UPDATED:-}" ]; then
    DEBIAN_FRONTEND=noninteractive apt-get update -qq || die "apt-get update failed"
    export TUNEFORK_APT_UPDATED=1
  fi
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "$@" >/dev/null || die "apt-get install $* failed"
}

# Find PostgreSQL's server binaries, installing Debian's package when we may.
ensure_postgres() {
  find_pg_bin
  if [ -z "$PG_BIN" ]; then
    apt_install postgresql
    find_pg_bin
  fi
  [ -n "$PG_BIN" ] || die "PostgreSQL server binaries not found after install"
}

find_pg_bin() {
  local dir
  PG_BIN=""
  for dir in $(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V -r); do
    if [ -x "$dir/initdb" ] && [ -x "$dir/pg_ctl" ]; then PG_BIN="$dir"; return; fi
  done
}

ensure_chromium() {
  [ -x /usr/bin/chromium ] || apt_install chromium
}

# PostgreSQL refuses to run as root: as root, the cluster belongs to the postgres user.
as_pg_owner() {
  if is_root; then runuser -u postgres -- "$@"; else "$@"; fi
}

# pg_init DIR: create a cluster in DIR (trust auth on loopback only) unless one is there.
pg_init() {
  local dir="$1"
  [ -f "$dir/PG_VERSION" ] && return 0
  mkdir -p "$dir"
  chmod 700 "$dir"
  if is_root; then
    id postgres >/dev/null 2>&1 || die "the postgres system user is missing; reinstall Debian's postgresql package"
    chown postgres:postgres "$dir"
    # The postgres user must be able to reach the folder through its parents.
    local p; p="$(dirname "$dir")"
    while [ "$p" != "/" ]; do chmod o+x "$p" 2>/dev/null || true; p="$(dirname "$p")"; done
  fi
  log "creating a PostgreSQL cluster in $dir"
  as_pg_owner "$PG_BIN/initdb" -D "$dir" -A trust -U tunefork -E UTF8 --locale=C.UTF-8 >/dev/null \
    || die "initdb failed in $dir"
}

# pg_start DIR PORT: start the cluster on 127.0.0.1:PORT with its socket inside DIR.
pg_start() {
  local dir="$1" port="$2"
  if as_pg_owner "$PG_BIN/pg_ctl" -D "$dir" status >/dev/null 2>&1; then
    return 0
  fi
  as_pg_owner "$PG_BIN/pg_ctl" -D "$dir" -l "$dir/server.log" -w -t 30 \
    -o "-h 127.0.0.1 -p $port -k $dir -c listen_addresses=127.0.0.1" start >/dev/null \
    || die "PostgreSQL did not start; see $dir/server.log"
}

# pg_stop DIR: fast shutdown (rolls back open transactions, keeps all committed data).
pg_stop() {
  local dir="$1"
  as_pg_owner "$PG_BIN/pg_ctl" -D "$dir" -m fast -w stop >/dev/null 2>&1 || true
}

# pg_create_db PORT NAME: create the database unless it exists.
pg_create_db() {
  local port="$1" name="$2"
  if ! "$PG_BIN/psql" -h 127.0.0.1 -p "$port" -U tunefork -d postgres -tAc \
      "SELECT 1 FROM pg_database WHERE datname = '$name'" | grep -q 1; then
    "$PG_BIN/createdb" -h 127.0.0.1 -p "$port" -U tunefork "$name" || die "could not create database $name"
  fi
}

# free_port: a TCP port on 127.0.0.1 nobody listens on.
free_port() {
  node -e 'const s=require("net").createServer();s.listen(0,"127.0.0.1",()=>{console.log(s.address().port);s.close()})'
}

# The web export is stale when any source file that goes into it is newer than dist/index.html.
web_export_stale() {
  local marker="$ROOT/dist/index.html"
  [ -f "$marker" ] || return 0
  [ -n "$(find "$ROOT/app" "$ROOT/components" "$ROOT/hooks" "$ROOT/theme" "$ROOT/shared" "$ROOT/assets" \
      "$ROOT/app.json" "$ROOT/package-lock.json" -newer "$marker" -print -quit 2>/dev/null)" ]
}

build_web() {
  log "building the web app (expo export)…"
  (cd "$ROOT" && ./node_modules/.bin/expo export --platform web --output-dir dist >"$ROOT/.data/web-build.log" 2>&1) \
    || { tail -40 "$ROOT/.data/web-build.log" >&2; die "web build failed; full log in .data/web-build.log"; }
}

# Unless DATABASE_URL is set: start the embedded cluster in .data/postgres on TUNEFORK_PG_PORT
# (54329 by default), create the database and export DATABASE_URL. Sets PG_DIR and OWN_DB (1 when
# this script started the cluster and so must stop it).
use_embedded_postgres_unless_url() {
  PG_DIR="$ROOT/.data/postgres"
  OWN_DB=0
  [ -n "${DATABASE_URL:-}" ] && return 0
  local port="${TUNEFORK_PG_PORT:-54329}"
  ensure_postgres
  pg_init "$PG_DIR"
  pg_start "$PG_DIR" "$port"
  pg_create_db "$port" tunefork
  export DATABASE_URL="postgres://tunefork@127.0.0.1:$port/tunefork"
  OWN_DB=1
  log "PostgreSQL is up on 127.0.0.1:$port (data in .data/postgres)"
}
