#!/usr/bin/env bash
# PostgreSQL lifecycle for Barwright: a private cluster on 127.0.0.1 under .data/.
#
#   scripts/db.sh start     install (if root and missing), init, start, create the database
#   scripts/db.sh stop      stop the cluster
#   scripts/db.sh status    say whether it runs
#   scripts/db.sh destroy   stop and delete the data folder (used for throw-away test clusters)
#   scripts/db.sh url       print the DATABASE_URL for this cluster
#   scripts/db.sh install   only make sure the server binaries are installed
#
# Settings (environment): BARWRIGHT_PG_PORT (default 54329), BARWRIGHT_PG_DIR (default .data/pg),
# BARWRIGHT_PG_DB (default barwright), BARWRIGHT_PG_FAST=1 (fsync off: test clusters only).
# When DATABASE_URL is set, start/stop do nothing: everything points at that server instead.
set -euo pipefail

cd "$(dirname "$0")/.."
ROOT=$(pwd)
PORT=${BARWRIGHT_PG_PORT:-54329}
DIR=${BARWRIGHT_PG_DIR:-$ROOT/.data/pg}
DB=${BARWRIGHT_PG_DB:-barwright}
case "$DIR" in /*) ;; *) DIR="$ROOT/$DIR" ;; esac
SOCK="$DIR/socket"
LOG="$DIR/server.log"
PGUSER_OS=postgres

fail() { echo "db: $*" >&2; exit 1; }

find_bindir() {
  local d
  for d in /usr/lib/postgresql/*/bin; do
    [ -x "$d/initdb" ] && { BINDIR="$d"; return 0; }
  done
  return 1
}

ensure_installed() {
  find_bindir && return 0
  if [ "$(id -u)" -ne 0 ]; then
    fail "PostgreSQL server binaries are missing. Install them as root: apt-get update && apt-get install -y postgresql (or set DATABASE_URL to an existing server)."
  fi
  echo "db: installing Debian's postgresql package (once)…"
  mkdir -p /etc/postgresql-common
  # We run our own cluster; do not let the package create and start its own.
  grep -qs '^create_main_cluster' /etc/postgresql-common/createcluster.conf \
    || echo 'create_main_cluster = false' >> /etc/postgresql-common/createcluster.conf
  DEBIAN_FRONTEND=noninteractive apt-get update -qq >/dev/null \
    || fail "apt-get update failed: check the network, or install postgresql yourself."
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq -o Dpkg::Options::=--force-confdef -o Dpkg::Options::=--force-confold postgresql >/dev/null \
    || fail "apt-get install postgresql failed: see the message above."
  find_bindir || fail "postgresql was installed but initdb was not found under /usr/lib/postgresql/*/bin."
}

# PostgreSQL refuses to run as root: as root, run its tools as the 'postgres' system user.
as_pg() {
  if [ "$(id -u)" -eq 0 ]; then runuser -u "$PGUSER_OS" -- "$@"; else "$@"; fi
}

ensure_os_user() {
  [ "$(id -u)" -eq 0 ] || return 0
  id "$PGUSER_OS" >/dev/null 2>&1 || useradd --system --home-dir /var/lib/postgresql --shell /usr/sbin/nologin "$PGUSER_OS"
}

port_in_use() {
  (exec 3<>"/dev/tcp/127.0.0.1/$PORT") 2>/dev/null
}

is_running() {
  [ -f "$DIR/postmaster.pid" ] && as_pg "$BINDIR/pg_ctl" -D "$DIR" status >/dev/null 2>&1
}

cmd_start() {
  if [ -n "${DATABASE_URL:-}" ]; then echo "db: DATABASE_URL is set; using that server."; return 0; fi
  ensure_installed
  ensure_os_user
  if [ ! -f "$DIR/PG_VERSION" ]; then
    mkdir -p "$DIR"
    # Every parent must be traversable by the postgres user.
    local p="$DIR"; while [ "$p" != "/" ]; do p=$(dirname "$p"); chmod o+x "$p" 2>/dev/null || true; done
    [ "$(id -u)" -eq 0 ] && chown "$PGUSER_OS": "$DIR"
    chmod 700 "$DIR"
    as_pg "$BINDIR/initdb" -D "$DIR" -U postgres --auth=trust --encoding=UTF8 --locale=C.UTF-8 \
      ${BARWRIGHT_PG_FAST:+--no-sync} >"$DIR.initdb.log" 2>&1 \
      || { cat "$DIR.initdb.log" >&2; fail "initdb failed in $DIR (log above)."; }
    rm -f "$DIR.initdb.log"
  fi
  mkdir -p "$SOCK"; [ "$(id -u)" -eq 0 ] && chown "$PGUSER_OS": "$SOCK"
  if is_running; then
    echo "db: already running on 127.0.0.1:$PORT"
  else
    # A pid file left by a crash: pg_ctl status says not running, so it is stale.
    rm -f "$DIR/postmaster.pid"
    if port_in_use; then
      fail "port $PORT on 127.0.0.1 is already in use by another program. Stop it, or choose another port: BARWRIGHT_PG_PORT=NNNN."
    fi
    local opts="-c listen_addresses=127.0.0.1 -p $PORT -k $SOCK"
    [ -n "${BARWRIGHT_PG_FAST:-}" ] && opts="$opts -c fsync=off -c synchronous_commit=off -c full_page_writes=off"
    touch "$LOG"; [ "$(id -u)" -eq 0 ] && chown "$PGUSER_OS": "$LOG"
    as_pg "$BINDIR/pg_ctl" -D "$DIR" -l "$LOG" -o "$opts" -w -t 30 start >/dev/null \
      || { tail -n 20 "$LOG" >&2; fail "PostgreSQL did not start (last log lines above, full log: $LOG)."; }
    echo "db: started PostgreSQL on 127.0.0.1:$PORT (data: $DIR)"
  fi
  local exists
  exists=$(as_pg "$BINDIR/psql" -h "$SOCK" -p "$PORT" -U postgres -tAc "SELECT 1 FROM pg_database WHERE datname='$DB'" postgres)
  if [ "$exists" != "1" ]; then
    as_pg "$BINDIR/createdb" -h "$SOCK" -p "$PORT" -U postgres "$DB" || fail "could not create database $DB."
    echo "db: created database $DB"
  fi
}

cmd_stop() {
  if [ -n "${DATABASE_URL:-}" ]; then echo "db: DATABASE_URL is set; not stopping an external server."; return 0; fi
  find_bindir || { echo "db: PostgreSQL is not installed; nothing to stop."; return 0; }
  if is_running; then
    as_pg "$BINDIR/pg_ctl" -D "$DIR" -m fast -w stop >/dev/null && echo "db: stopped"
  else
    echo "db: not running"
  fi
}

cmd_status() {
  find_bindir || { echo "db: PostgreSQL is not installed"; exit 3; }
  if is_running; then echo "db: running on 127.0.0.1:$PORT (data: $DIR)"; else echo "db: not running"; exit 3; fi
}

cmd_destroy() {
  cmd_stop
  rm -rf "$DIR"
  echo "db: removed $DIR"
}

cmd_url() { echo "postgres://postgres@127.0.0.1:$PORT/$DB"; }

case "${1:-}" in
  start) cmd_start ;;
  stop) cmd_stop ;;
  status) cmd_status ;;
  destroy) cmd_destroy ;;
  url) cmd_url ;;
  install) ensure_installed; ensure_os_user ;;
  *) echo "usage: scripts/db.sh start|stop|status|destroy|url|install" >&2; exit 2 ;;
esac
