#!/usr/bin/env bash
# PostgreSQL on loopback for Swarfbook: a cluster in an ignored project folder, owned by
# the postgres user (the server refuses to run as root). Idempotent: start reuses a cluster.
#   scripts/pg.sh start|stop|status   (PG_DIR, PG_PORT, PG_DB, PG_USER, PG_PASSWORD from env)
set -euo pipefail
cmd=${1:-start}
root=$(cd "$(dirname "$0")/.." && pwd)
PG_DIR=${PG_DIR:-$root/.data/postgres}
PG_PORT=${PG_PORT:-54329}
PG_DB=${PG_DB:-swarfbook}
PG_USER=${PG_USER:-swarfbook}
PG_PASSWORD=${PG_PASSWORD:-swarfbook}

find_bin() {
  for d in /usr/lib/postgresql/*/bin; do [ -x "$d/initdb" ] && { echo "$d"; return; }; done
}
BIN=$(find_bin || true)
if [ -z "${BIN:-}" ]; then
  echo "Installing PostgreSQL (Debian package)..."
  export DEBIAN_FRONTEND=noninteractive
  apt-get update -qq && apt-get install -y -qq postgresql >/dev/null
  BIN=$(find_bin)
fi

as_pg() { if [ "$(id -u)" = 0 ]; then (cd / && runuser -u postgres -- "$@"); else "$@"; fi; }

# The postgres user must be able to reach the data folder. When the project sits under a folder it
# cannot enter (a 0700 temporary clone, say), the cluster goes to a per-project folder in /tmp instead.
if [ "$(id -u)" = 0 ]; then
  mkdir -p "$PG_DIR"
  if ! (cd / && runuser -u postgres -- test -x "$PG_DIR") 2>/dev/null; then
    PG_DIR=${TMPDIR:-/tmp}/swarfbook-pg-$(printf '%s' "$PG_DIR" | sha1sum | cut -c1-12)
  fi
fi
ctl() { as_pg "$BIN/pg_ctl" -D "$PG_DIR/data" "$@"; }

case "$cmd" in
  start)
    mkdir -p "$PG_DIR"
    [ "$(id -u)" = 0 ] && chown postgres:postgres "$PG_DIR"
    if [ ! -f "$PG_DIR/data/PG_VERSION" ]; then
      as_pg "$BIN/initdb" -D "$PG_DIR/data" -U postgres -A trust -E UTF8 --locale=C.UTF-8 >/dev/null
    fi
    if ! ctl status >/dev/null 2>&1; then
      ctl -w -l "$PG_DIR/data/server.log" \
        -o "-c listen_addresses=127.0.0.1 -p $PG_PORT -k /tmp -c fsync=${PG_FSYNC:-on} -c max_connections=200" start >/dev/null
    fi
    psql_() { as_pg "$BIN/psql" -h 127.0.0.1 -p "$PG_PORT" -U postgres -v ON_ERROR_STOP=1 -qAt -c "set client_min_messages=warning" "$@"; }
    if [ "$(psql_ -d postgres -c "select 1 from pg_roles where rolname='$PG_USER'")" != 1 ]; then
      psql_ -d postgres -c "create role \"$PG_USER\" login createdb password '$PG_PASSWORD'"
    fi
    if [ "$(psql_ -d postgres -c "select 1 from pg_database where datname='$PG_DB'")" != 1 ]; then
      psql_ -d postgres -c "create database \"$PG_DB\" owner \"$PG_USER\""
    fi
    # Extensions need a superuser; create them here so migrations run as the app role.
    psql_ -d "$PG_DB" -c "create extension if not exists pg_trgm; create extension if not exists unaccent; create extension if not exists citext;"
    psql_ -d template1 -c "create extension if not exists pg_trgm; create extension if not exists unaccent; create extension if not exists citext;"
    echo "PostgreSQL on 127.0.0.1:$PG_PORT, database $PG_DB (data in $PG_DIR)"
    ;;
  stop)
    if [ -f "$PG_DIR/data/PG_VERSION" ] && ctl status >/dev/null 2>&1; then ctl -m fast -w stop >/dev/null; fi
    ;;
  status) ctl status ;;
  destroy)
    "$0" stop || true
    rm -rf "$PG_DIR"
    ;;
  *) echo "usage: $0 start|stop|status|destroy" >&2; exit 2 ;;
esac
