#!/usr/bin/env bash
# Shared pieces of the bootstrap behind `npm start` and `npm test`.
# Everything it creates lives under .data/ (git-ignored): the PostgreSQL cluster,
# its log, the generated database password and the JWT signing secret.
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
DATA_DIR="${PLUMBLINE_DATA_DIR:-$ROOT/.data}"
PG_PORT="${PLUMBLINE_DB_PORT:-54329}"
PG_HOST=127.0.0.1
PG_USER=plumbline

say() { printf '[plumbline] %s\n' "$*"; }
die() { printf '[plumbline] error: %s\n' "$*" >&2; exit 1; }

as_root() { [[ $(id -u) -eq 0 ]]; }

apt_install() {
  as_root || die "missing Debian package(s) $*; install them with: sudo apt-get install $*"
  say "installing Debian package(s): $* (one time)"
  export DEBIAN_FRONTEND=noninteractive
  if ! apt-get install -y -o DPkg::Lock::Timeout=1200 --no-install-recommends "$@" >"$DATA_DIR/apt.log" 2>&1; then
    apt-get update -o DPkg::Lock::Timeout=1200 >>"$DATA_DIR/apt.log" 2>&1 || true
    apt-get install -y -o DPkg::Lock::Timeout=1200 --no-install-recommends "$@" >>"$DATA_DIR/apt.log" 2>&1 \
      || die "could not install $* (see $DATA_DIR/apt.log)"
  fi
}

ensure_node_modules() {
  local stamp="$ROOT/node_modules/.package-lock.json"
  if [[ ! -f "$stamp" || "$ROOT/package-lock.json" -nt "$stamp" ]]; then
    say "installing npm dependencies (npm ci)"
    (cd "$ROOT" && npm ci --no-audit --no-fund --loglevel=error) || die "npm ci failed"
  fi
}

pg_bindir() {
  local d
  for d in /usr/lib/postgresql/*/bin; do
    [[ -x "$d/initdb" ]] && { echo "$d"; return 0; }
  done
  return 1
}

ensure_postgres_binaries() {
  mkdir -p "$DATA_DIR"
  pg_bindir >/dev/null || apt_install postgresql
  PG_BIN="$(pg_bindir)" || die "PostgreSQL binaries not found after installing Debian's postgresql"
  # Debian's own cluster (port 5432) is not ours; keep it from starting on install.
}

# The cluster must not run as root: as root we hand it to the `postgres` system user.
pg_run() {
  if as_root; then (cd / && runuser -u postgres -- "$@"); else "$@"; fi
}

pg_cluster_dir() {
  local dir="$DATA_DIR/pg/cluster"
  if as_root && ! runuser -u postgres -- test -x "$DATA_DIR" 2>/dev/null; then
    # The checkout's parents are closed to other users: keep the cluster in a
    # per-checkout folder the postgres user can reach.
    local key; key=$(printf '%s' "$ROOT" | sha1sum | cut -c1-12)
    dir="/var/lib/plumbline/$key/cluster"
  fi
  echo "$dir"
}

pg_password() {
  local f="$DATA_DIR/db-password"
  [[ -s "$f" ]] || { umask 077; head -c 24 /dev/urandom | base64 | tr -dc 'A-Za-z0-9' >"$f"; }
  cat "$f"
}

jwt_secret() {
  local f="$DATA_DIR/jwt-secret"
  [[ -s "$f" ]] || { umask 077; head -c 48 /dev/urandom | base64 | tr -dc 'A-Za-z0-9' >"$f"; }
  cat "$f"
}

port_in_use() {
  (exec 3<>"/dev/tcp/$PG_HOST/$1") 2>/dev/null
}

# Sets PG_STARTED_HERE=1 when this call started the server (so Ctrl-C can stop it).
PG_STARTED_HERE=0
ensure_postgres_running() {
  ensure_postgres_binaries
  PG_DATA="$(pg_cluster_dir)"
  local parent; parent="$(dirname "$PG_DATA")"
  mkdir -p "$parent"
  if as_root; then chown postgres:postgres "$parent"; fi
  chmod 700 "$parent"
  if [[ ! -f "$PG_DATA/PG_VERSION" ]]; then
    say "creating the PostgreSQL cluster in $PG_DATA"
    local pwfile="$parent/.pw"
    (umask 077; pg_password >"$pwfile"); as_root && chown postgres "$pwfile"
    pg_run "$PG_BIN/initdb" -D "$PG_DATA" -U "$PG_USER" --pwfile="$pwfile" \
      --auth=scram-sha-256 --encoding=UTF8 --locale=C.UTF-8 >"$parent/initdb.log" 2>&1 \
      || { rm -f "$pwfile"; die "initdb failed: $(tail -n 1 "$parent/initdb.log")"; }
    rm -f "$pwfile"
  fi
  if pg_run "$PG_BIN/pg_ctl" -D "$PG_DATA" status >/dev/null 2>&1; then
    return 0
  fi
  if port_in_use "$PG_PORT"; then
    die "port $PG_PORT on $PG_HOST is taken by another program; free it or set PLUMBLINE_DB_PORT"
  fi
  local log="$parent/server.log"
  pg_run "$PG_BIN/pg_ctl" -D "$PG_DATA" -l "$log" -w -t 30 \
    -o "-c listen_addresses=$PG_HOST -p $PG_PORT -k $parent" start >/dev/null 2>&1 \
    || die "PostgreSQL did not start: $(grep -E 'FATAL|ERROR|could not' "$log" | tail -n 1)"
  PG_STARTED_HERE=1
}

stop_postgres() {
  ensure_postgres_binaries
  PG_DATA="$(pg_cluster_dir)"
  if [[ -f "$PG_DATA/PG_VERSION" ]] && pg_run "$PG_BIN/pg_ctl" -D "$PG_DATA" status >/dev/null 2>&1; then
    pg_run "$PG_BIN/pg_ctl" -D "$PG_DATA" -m fast -w stop >/dev/null && say "PostgreSQL stopped"
  else
    say "PostgreSQL is not running"
  fi
}

database_url() {
  printf 'postgres://%s:%s@%s:%s/%s' "$PG_USER" "$(pg_password)" "$PG_HOST" "$PG_PORT" "$1"
}

# Creates the database when missing (recreates it with --fresh).
ensure_database() {
  local name="$1" fresh="${2:-}"
  export PGPASSWORD; PGPASSWORD="$(pg_password)"
  local psql=(psql -h "$PG_HOST" -p "$PG_PORT" -U "$PG_USER" -d postgres -v ON_ERROR_STOP=1 -qtA)
  if [[ "$fresh" == --fresh ]]; then
    "${psql[@]}" -c "DROP DATABASE IF EXISTS \"$name\" WITH (FORCE)" >/dev/null
  fi
  if [[ -z "$("${psql[@]}" -c "SELECT 1 FROM pg_database WHERE datname = '$name'")" ]]; then
    "${psql[@]}" -c "CREATE DATABASE \"$name\"" >/dev/null || die "could not create database $name"
  fi
}

# Rebuilds a workspace only when a source file is newer than its last build.
build_if_stale() {
  local ws="$1" stamp="$2"; shift 2
  if [[ ! -f "$stamp" ]] || [[ -n "$(find "$@" -newer "$stamp" -type f -print -quit 2>/dev/null)" ]]; then
    say "building $ws"
    (cd "$ROOT" && npm run build -w "$ws" --silent) || die "build of $ws failed"
    touch "$stamp"
  fi
}

build_api() {
  build_if_stale api "$ROOT/api/dist/.stamp" "$ROOT/api/src" "$ROOT/api/tsconfig.json" "$ROOT/api/tsconfig.build.json" "$ROOT/packages" "$ROOT/package-lock.json"
}

build_all() {
  build_api
  build_if_stale pwa "$ROOT/pwa/dist/.stamp" "$ROOT/pwa/src" "$ROOT/pwa/index.html" "$ROOT/pwa/vite.config.ts" "$ROOT/pwa/public" "$ROOT/fonts" "$ROOT/packages" "$ROOT/package-lock.json"
}

# The local mail fake of `npm start`: maildev on loopback, SMTP on MAILDEV_SMTP_PORT (1025)
# and its web page and API on MAILDEV_WEB_PORT (1080). Mail is kept in memory only.
MAIL_FAKE_SMTP_PORT="${MAILDEV_SMTP_PORT:-1025}"
MAIL_FAKE_WEB_PORT="${MAILDEV_WEB_PORT:-1080}"
MAIL_FAKE_PID_FILE="$DATA_DIR/maildev.pid"
MAIL_FAKE_STARTED_HERE=0

mail_fake_running() {
  [[ -s "$MAIL_FAKE_PID_FILE" ]] && kill -0 "$(cat "$MAIL_FAKE_PID_FILE")" 2>/dev/null
}

ensure_mail_fake_running() {
  mkdir -p "$DATA_DIR"
  mail_fake_running && return 0
  for port in "$MAIL_FAKE_SMTP_PORT" "$MAIL_FAKE_WEB_PORT"; do
    port_in_use "$port" && die "port $port on $PG_HOST is taken; set MAILDEV_SMTP_PORT and MAILDEV_WEB_PORT to free ports"
  done
  "$ROOT/node_modules/.bin/maildev" --ip 127.0.0.1 --web-ip 127.0.0.1 \
    --smtp "$MAIL_FAKE_SMTP_PORT" --web "$MAIL_FAKE_WEB_PORT" --silent >"$DATA_DIR/maildev.log" 2>&1 &
  echo $! >"$MAIL_FAKE_PID_FILE"
  for _ in $(seq 1 50); do
    port_in_use "$MAIL_FAKE_WEB_PORT" && port_in_use "$MAIL_FAKE_SMTP_PORT" && { MAIL_FAKE_STARTED_HERE=1; return 0; }
    mail_fake_running || die "maildev did not start (see $DATA_DIR/maildev.log)"
    sleep 0.2
  done
  die "maildev did not start listening (see $DATA_DIR/maildev.log)"
}

stop_mail_fake() {
  if mail_fake_running; then
    kill "$(cat "$MAIL_FAKE_PID_FILE")" && say "maildev stopped"
  fi
  rm -f "$MAIL_FAKE_PID_FILE"
}
