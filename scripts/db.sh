#!/usr/bin/env bash
# The project's own PostgreSQL cluster on 127.0.0.1: init, start, stop, status, createdb, dropdb, url.
#
# PostgreSQL refuses to run as root, so as root the server runs as Debian's `postgres` user (created
# if missing). Its data folder lives outside the clone, because the clone's parent folders may be
# closed to that user; `.data/postgres` in the clone is a link to it.
set -euo pipefail

ROOT=$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)
# below Linux's ephemeral range (32768–60999): a client connection's local port can never be holding
# it when the server starts
PORT=${SPANWRIGHT_PG_PORT:-15432}
KEY=$(printf '%s' "$ROOT" | sha1sum | cut -c1-12)
if [ "$(id -u)" = 0 ]; then
  DEFAULT_BASE=/var/lib/spanwright/$KEY
else
  DEFAULT_BASE=${XDG_DATA_HOME:-$HOME/.local/share}/spanwright/$KEY
fi
BASE=${SPANWRIGHT_PG_DIR:-$DEFAULT_BASE}
PGDATA=$BASE/data
SOCKDIR=$BASE/run
LOG=$BASE/postgres.log
SUPERUSER=spanwright

pg_bin() {
  local dir
  dir=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1 || true)
  if [ -z "$dir" ] || [ ! -x "$dir/initdb" ]; then
    echo "db: PostgreSQL server binaries not found (run scripts/bootstrap.sh, which installs Debian's postgresql package)" >&2
    exit 1
  fi
  echo "$dir"
}
BIN=$(pg_bin)

# Runs a server command as the unprivileged owner of the data folder.
as_owner() {
  if [ "$(id -u)" = 0 ]; then
    runuser -u postgres -- "$@"
  else
    "$@"
  fi
}

ensure_owner() {
  if [ "$(id -u)" = 0 ] && ! id postgres >/dev/null 2>&1; then
    useradd --system --home-dir /var/lib/postgresql --shell /usr/sbin/nologin postgres
  fi
}

init_cluster() {
  ensure_owner
  mkdir -p "$BASE" "$SOCKDIR"
  chmod 755 "$BASE"
  [ "$(id -u)" = 0 ] && { chmod 755 "$(dirname "$BASE")"; chown postgres: "$BASE" "$SOCKDIR"; }
  if [ ! -s "$PGDATA/PG_VERSION" ]; then
    echo "db: initialising a cluster in $PGDATA" >&2
    # trust on loopback only: this cluster is a development and test server on 127.0.0.1
    as_owner "$BIN/initdb" -D "$PGDATA" -U "$SUPERUSER" --auth=trust -E UTF8 --no-locale >/dev/null
    cat >>"$PGDATA/postgresql.conf" <<CONF
# spanwright: loopback only, on the project's own port
listen_addresses = '127.0.0.1'
port = $PORT
unix_socket_directories = '$SOCKDIR'
max_connections = 200
CONF
  fi
  mkdir -p "$ROOT/.data"
  ln -sfn "$BASE" "$ROOT/.data/postgres"
}

is_running() {
  as_owner "$BIN/pg_ctl" -D "$PGDATA" status >/dev/null 2>&1
}

start() {
  init_cluster
  if is_running; then
    echo "db: already running on 127.0.0.1:$PORT" >&2
    return 0
  fi
  # a PID file left by a machine restart or a killed server
  rm -f "$PGDATA/postmaster.pid"
  as_owner "$BIN/pg_ctl" -D "$PGDATA" -l "$LOG" -w -t 60 -o "-p $PORT" start >/dev/null || {
    echo "db: the server did not start; its log:" >&2; tail -n 30 "$LOG" >&2; exit 1; }
  echo "db: started on 127.0.0.1:$PORT" >&2
}

stop() {
  if [ -s "$PGDATA/PG_VERSION" ] && is_running; then
    as_owner "$BIN/pg_ctl" -D "$PGDATA" -m fast -w -t 60 stop >/dev/null
    echo "db: stopped" >&2
  fi
}

psql_admin() {
  "$BIN/psql" -h 127.0.0.1 -p "$PORT" -U "$SUPERUSER" -d postgres -v ON_ERROR_STOP=1 -qtA "$@"
}

createdb_if_missing() {
  local name=$1
  if [ -z "$(psql_admin -c "SELECT 1 FROM pg_database WHERE datname = '$name'")" ]; then
    psql_admin -c "CREATE DATABASE \"$name\""
  fi
}

case "${1:-}" in
  start) start ;;
  stop) stop ;;
  status) if is_running; then echo "running on 127.0.0.1:$PORT ($PGDATA)"; else echo "stopped"; exit 3; fi ;;
  is-running) is_running ;;
  createdb) createdb_if_missing "${2:?database name}" ;;
  dropdb) psql_admin -c "DROP DATABASE IF EXISTS \"${2:?database name}\" WITH (FORCE)" ;;
  url) echo "postgres://$SUPERUSER@127.0.0.1:$PORT/${2:-spanwright}" ;;
  bin) echo "$BIN" ;;
  *) echo "usage: scripts/db.sh start|stop|status|is-running|createdb NAME|dropdb NAME|url [NAME]|bin" >&2; exit 64 ;;
esac
