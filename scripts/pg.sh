#!/usr/bin/env bash
# Private PostgreSQL on loopback, run as the `postgres` OS user (the server refuses root).
# Usage: source scripts/pg.sh; pg_up DATA_DIR PORT; pg_down DATA_DIR
# Idempotent: skips initdb when data exists, treats a stale postmaster.pid as dead, retries the
# start for a few seconds after a crash (socket lock), then waits for pg_isready.
set -euo pipefail

pg_bin() {
  local d
  for d in /usr/lib/postgresql/*/bin; do
    if [ -x "$d/initdb" ]; then echo "$d"; return 0; fi
  done
  return 1
}

pg_ensure_installed() {
  if ! pg_bin >/dev/null; then
    echo "[equilibrist] installing Debian's postgresql server…"
    apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq postgresql >/dev/null
  fi
}

# Make every parent of $1 traversable by the postgres user.
pg_open_parents() {
  local d
  d=$(dirname "$1")
  while [ "$d" != "/" ]; do
    if ! runuser -u postgres -- test -x "$d" 2>/dev/null; then chmod o+x "$d"; fi
    d=$(dirname "$d")
  done
}

pg_up() {
  local data=$1 port=$2 bin sock log
  pg_ensure_installed
  bin=$(pg_bin)
  mkdir -p "$data"
  data=$(cd "$data" && pwd)
  sock="$data/../$(basename "$data")-sock"
  log="$data/../$(basename "$data").log"
  mkdir -p "$sock"
  pg_open_parents "$data/x"
  chown postgres:postgres "$data" "$sock"
  chmod 700 "$data"
  touch "$log"; chown postgres:postgres "$log"
  if [ ! -f "$data/PG_VERSION" ]; then
    runuser -u postgres -- "$bin/initdb" -D "$data" -U postgres --auth=trust --encoding=UTF8 \
      --locale=C.UTF-8 --no-sync >/dev/null
  fi
  if [ -f "$data/postmaster.pid" ]; then
    local pid
    pid=$(head -1 "$data/postmaster.pid")
    if [ -n "$pid" ] && [ "$(ps -p "$pid" -o comm= 2>/dev/null)" = "postgres" ]; then
      wait_ready "$bin" "$port"; return 0
    fi
    rm -f "$data/postmaster.pid"
  fi
  local try
  for try in 1 2 3 4 5 6 7 8; do
    if runuser -u postgres -- "$bin/pg_ctl" -D "$data" -l "$log" -w -t 30 \
      -o "-c listen_addresses=127.0.0.1 -p $port -c unix_socket_directories=$sock -c fsync=on" \
      start >/dev/null 2>&1; then
      wait_ready "$bin" "$port"; return 0
    fi
    sleep 0.5
  done
  echo "[equilibrist] PostgreSQL failed to start; see $log" >&2
  tail -20 "$log" >&2
  return 1
}

wait_ready() {
  local bin=$1 port=$2 i
  for i in $(seq 1 60); do
    if "$bin/pg_isready" -q -h 127.0.0.1 -p "$port"; then return 0; fi
    sleep 0.25
  done
  echo "[equilibrist] PostgreSQL on port $port is not answering" >&2
  return 1
}

pg_createdb() {
  local port=$1 name=$2 bin
  bin=$(pg_bin)
  if ! "$bin/psql" -h 127.0.0.1 -p "$port" -U postgres -tAc "select 1 from pg_database where datname='$name'" | grep -q 1; then
    "$bin/createdb" -h 127.0.0.1 -p "$port" -U postgres "$name"
  fi
}

pg_down() {
  local data=$1 bin
  bin=$(pg_bin) || return 0
  [ -f "$data/postmaster.pid" ] || return 0
  runuser -u postgres -- "$bin/pg_ctl" -D "$data" -m fast -w stop >/dev/null 2>&1 || true
}
