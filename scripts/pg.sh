#!/usr/bin/env bash
# Ligandry's own PostgreSQL: Debian's server package, data under .data/, listening on loopback only.
# Usage: scripts/pg.sh start | stop | status | running | url [database] | install
# Settings: LIGANDRY_PG_PORT (default 54329), LIGANDRY_PG_OPTS (extra server options, e.g. "-c fsync=off").
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
DATA_DIR="$ROOT/.data"
PASS_FILE="$DATA_DIR/pg-password"
PORT_FILE="$DATA_DIR/pg-port"
PORT="${LIGANDRY_PG_PORT:-54329}"
DB_USER="ligandry"

die() { printf '\nPostgreSQL: %s\n\n' "$*" >&2; exit 1; }
say() { printf 'PostgreSQL: %s\n' "$*"; }
is_root() { [ "$(id -u)" -eq 0 ]; }

# As root, the server runs as the postgres user (initdb and postgres refuse to run as root).
as_pg() { if is_root; then (cd / && runuser -u postgres -- "$@"); else "$@"; fi; }

find_bindir() {
  local v
  for v in 17 16 15 14 13; do
    if [ -x "/usr/lib/postgresql/$v/bin/postgres" ]; then echo "/usr/lib/postgresql/$v/bin"; return 0; fi
  done
  if command -v pg_config >/dev/null 2>&1; then
    local d; d="$(pg_config --bindir 2>/dev/null || true)"
    if [ -n "$d" ] && [ -x "$d/postgres" ]; then echo "$d"; return 0; fi
  fi
  return 1
}

install_server() {
  command -v apt-get >/dev/null 2>&1 || die "no server found and apt-get is not available: install PostgreSQL 15 and run again."
  is_root || die "no server found. Install it with: sudo apt-get install -y postgresql-15   (then run again)"
  say "installing Debian's postgresql-15 (one time, about a minute)"
  # Keep Debian from creating and starting its own cluster on port 5432.
  mkdir -p /etc/postgresql-common/createcluster.d
  echo 'create_main_cluster = false' > /etc/postgresql-common/createcluster.d/ligandry.conf
  export DEBIAN_FRONTEND=noninteractive
  apt-get update -qq >/dev/null || die "apt-get update failed; check the package sources."
  apt-get install -y -qq postgresql-15 >/dev/null || apt-get install -y -qq postgresql >/dev/null \
    || die "apt-get could not install postgresql-15."
}

BINDIR=""
need_server() {
  BINDIR="$(find_bindir || true)"
  if [ -z "$BINDIR" ]; then install_server; BINDIR="$(find_bindir || true)"; fi
  [ -n "$BINDIR" ] || die "the server is still missing after installing; look for postgres under /usr/lib/postgresql."
}

# Data, socket and log live under .data/. When root runs us from a folder the postgres user cannot
# enter (for example under /root), they live in /var/lib/ligandry/<hash> with links under .data/.
locate_dirs() {
  mkdir -p "$DATA_DIR"
  local base="$DATA_DIR"
  if is_root && ! runuser -u postgres -- test -x "$DATA_DIR" 2>/dev/null; then
    base="/var/lib/ligandry/$(printf '%s' "$ROOT" | sha1sum | cut -c1-12)"
    mkdir -p "$base"
    for d in pg pg-run pg-log; do
      [ -e "$DATA_DIR/$d" ] || ln -s "$base/$d" "$DATA_DIR/$d"
    done
  fi
  PGDATA_DIR="$base/pg"
  RUN_DIR="$base/pg-run"
  LOG_DIR="$base/pg-log"
  # Unix socket paths are limited to about 107 bytes.
  if [ $(( ${#RUN_DIR} + 20 )) -gt 100 ]; then
    RUN_DIR="/tmp/ligandry-pg-$(printf '%s' "$ROOT" | sha1sum | cut -c1-12)"
  fi
  LOG_FILE="$LOG_DIR/postgres.log"
  mkdir -p "$PGDATA_DIR" "$RUN_DIR" "$LOG_DIR"
  chmod 700 "$PGDATA_DIR" "$RUN_DIR"
  if is_root; then chown postgres:postgres "$PGDATA_DIR" "$RUN_DIR" "$LOG_DIR"; fi
}

init_cluster() {
  [ -s "$PGDATA_DIR/PG_VERSION" ] && return 0
  say "creating a new cluster in .data/pg"
  if [ ! -s "$PASS_FILE" ]; then
    (umask 077; head -c 24 /dev/urandom | base64 | tr -dc 'A-Za-z0-9' > "$PASS_FILE")
  fi
  local pw="$RUN_DIR/initdb-pw"
  cp "$PASS_FILE" "$pw"
  if is_root; then chown postgres "$pw"; fi
  chmod 600 "$pw"
  if ! as_pg "$BINDIR/initdb" -D "$PGDATA_DIR" -U "$DB_USER" --pwfile="$pw" -E UTF8 --no-locale \
      --auth-local=trust --auth-host=scram-sha-256 >"$LOG_DIR/initdb.log" 2>&1; then
    rm -f "$pw"
    die "initdb failed; see $LOG_DIR/initdb.log"
  fi
  rm -f "$pw"
}

running() { [ -n "$BINDIR" ] && [ -s "$PGDATA_DIR/PG_VERSION" ] && as_pg "$BINDIR/pg_ctl" -D "$PGDATA_DIR" status >/dev/null 2>&1; }

port_taken() { (exec 3<>"/dev/tcp/127.0.0.1/$1") 2>/dev/null; }

start() {
  need_server
  locate_dirs
  init_cluster
  if running; then say "already running on 127.0.0.1:$(cat "$PORT_FILE" 2>/dev/null || echo "$PORT")"; return 0; fi
  if port_taken "$PORT"; then
    die "port $PORT on 127.0.0.1 is taken by another program. Stop it, or set LIGANDRY_PG_PORT to a free port."
  fi
  local before=0
  [ -f "$LOG_FILE" ] && before="$(stat -c %s "$LOG_FILE")"
  if ! as_pg "$BINDIR/pg_ctl" -D "$PGDATA_DIR" -l "$LOG_FILE" -w -t 60 \
      -o "-c listen_addresses=127.0.0.1 -p $PORT -k $RUN_DIR ${LIGANDRY_PG_OPTS:-}" start >/dev/null 2>&1; then
    # Show what this attempt wrote to the log, not earlier runs.
    tail -c +"$((before + 1))" "$LOG_FILE" 2>/dev/null | tail -n 15 >&2 || true
    die "failed to start; the log is $LOG_FILE"
  fi
  echo "$PORT" > "$PORT_FILE"
  say "running on 127.0.0.1:$PORT (log: $LOG_FILE)"
}

stop() {
  BINDIR="$(find_bindir || true)"
  [ -n "$BINDIR" ] || { say "not installed"; return 0; }
  locate_dirs
  if running; then as_pg "$BINDIR/pg_ctl" -D "$PGDATA_DIR" -m fast -w stop >/dev/null; say "stopped"; else say "not running"; fi
}

url() {
  [ -s "$PASS_FILE" ] || die "no cluster yet: run scripts/pg.sh start first."
  local port; port="$(cat "$PORT_FILE" 2>/dev/null || echo "$PORT")"
  echo "postgres://$DB_USER:$(cat "$PASS_FILE")@127.0.0.1:$port/${1:-ligandry}"
}

case "${1:-}" in
  start) start ;;
  stop) stop ;;
  install) need_server; say "server binaries in $BINDIR" ;;
  running) BINDIR="$(find_bindir || true)"; [ -n "$BINDIR" ] || exit 1; locate_dirs; running ;;
  status) BINDIR="$(find_bindir || true)"; [ -n "$BINDIR" ] || { say "not installed"; exit 1; }; locate_dirs
    if running; then say "running on 127.0.0.1:$(cat "$PORT_FILE" 2>/dev/null || echo "$PORT")"; else say "not running"; exit 1; fi ;;
  url) url "${2:-}" ;;
  *) echo "usage: scripts/pg.sh start | stop | status | running | url [database] | install" >&2; exit 2 ;;
esac
