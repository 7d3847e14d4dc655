#!/usr/bin/env bash
# Owns Pondwright's private PostgreSQL cluster: finds (or installs) Debian's PostgreSQL server, creates a
# cluster in a git-ignored folder, runs it on 127.0.0.1 only and creates the app and test databases.
#
#   scripts/db.sh start    create the cluster if needed, start it, create the databases (idempotent)
#   scripts/db.sh stop     stop the cluster (fast shutdown)
#   scripts/db.sh status   say whether it runs, where and on which port
#   scripts/db.sh env      print the connection settings as shell assignments
#
# Settings (environment): DB_PORT (54329), DB_USER (pondwright), DB_PASSWORD (pondwright),
# DB_NAME (pondwright), DB_TEST_NAME (pondwright_test), PONDWRIGHT_PG_DATA (<repo>/.data/postgres).
set -euo pipefail

repo_root=$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)
DB_HOST=127.0.0.1
DB_PORT=${DB_PORT:-54329}
DB_USER=${DB_USER:-pondwright}
DB_PASSWORD=${DB_PASSWORD:-pondwright}
DB_NAME=${DB_NAME:-pondwright}
DB_TEST_NAME=${DB_TEST_NAME:-pondwright_test}
data_dir=${PONDWRIGHT_PG_DATA:-$repo_root/.data/postgres}
log_file="$(dirname "$data_dir")/postgres-$DB_PORT.log"

say() { printf '[db] %s\n' "$*" >&2; }
die() { say "$*"; exit 1; }

find_pg_bin() {
  local dir
  dir=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1 || true)
  if [ -n "$dir" ] && [ -x "$dir/initdb" ] && [ -x "$dir/pg_ctl" ]; then
    printf '%s\n' "$dir"
  fi
}

install_postgresql() {
  if [ "$(id -u)" -ne 0 ]; then
    die "PostgreSQL's server is not installed. Install it with: sudo apt-get install -y postgresql   (then run this again)"
  fi
  say "PostgreSQL's server is missing: installing Debian's postgresql package (apt-get)..."
  export DEBIAN_FRONTEND=noninteractive
  apt-get update -qq >/dev/null || die "apt-get update failed"
  apt-get install -y -qq postgresql >/dev/null || die "apt-get install -y postgresql failed"
}

pg_bin=$(find_pg_bin)
need_bin() {
  if [ -z "$pg_bin" ]; then
    install_postgresql
    pg_bin=$(find_pg_bin)
    [ -n "$pg_bin" ] || die "PostgreSQL was installed but no server binaries were found under /usr/lib/postgresql/*/bin"
  fi
}

# initdb and postgres refuse to run as root: as root the cluster belongs to the postgres system user.
as_owner() {
  if [ "$(id -u)" -eq 0 ]; then
    runuser -u postgres -- "$@"
  else
    "$@"
  fi
}

# As root, the cluster folder must be reachable by the postgres user; a checkout under a private home
# folder is not, so the cluster then lives under /var/tmp instead.
resolve_data_dir() {
  if [ "$(id -u)" -eq 0 ] && [ -z "${PONDWRIGHT_PG_DATA:-}" ]; then
    mkdir -p "$repo_root/.data"
    if ! runuser -u postgres -- test -x "$repo_root/.data"; then
      local key
      key=$(printf '%s' "$repo_root" | sha256sum | cut -c1-12)
      data_dir="/var/tmp/pondwright-pg-$key/postgres"
      log_file="$(dirname "$data_dir")/postgres-$DB_PORT.log"
      say "the checkout is not reachable by the postgres user; the cluster lives in $data_dir"
    fi
  fi
}

is_running() {
  [ -f "$data_dir/PG_VERSION" ] && as_owner "$pg_bin/pg_ctl" -D "$data_dir" status >/dev/null 2>&1
}

print_log_tail() {
  if [ -f "$log_file" ]; then
    say "last lines of $log_file:"
    tail -n 30 "$log_file" >&2 || true
  fi
}

init_cluster() {
  local parent pwfile
  parent=$(dirname "$data_dir")
  mkdir -p "$data_dir"
  chmod 700 "$data_dir"
  if [ "$(id -u)" -eq 0 ]; then
    chown postgres:postgres "$parent" "$data_dir"
  fi
  pwfile=$(mktemp)
  printf '%s\n' "$DB_PASSWORD" >"$pwfile"
  [ "$(id -u)" -eq 0 ] && chown postgres "$pwfile"
  say "creating a private cluster in $data_dir"
  if ! as_owner "$pg_bin/initdb" -D "$data_dir" -U "$DB_USER" --pwfile="$pwfile" \
    --auth-host=scram-sha-256 --auth-local=scram-sha-256 -E UTF8 --locale=C.UTF-8 >"$parent/initdb.log" 2>&1; then
    rm -f "$pwfile"
    tail -n 30 "$parent/initdb.log" >&2
    die "initdb failed (log: $parent/initdb.log)"
  fi
  rm -f "$pwfile"
  cat >>"$data_dir/postgresql.conf" <<CONF

# Pondwright's private cluster: loopback only, on its own port.
listen_addresses = '127.0.0.1'
port = $DB_PORT
unix_socket_directories = '$data_dir'
max_connections = 200
fsync = on
CONF
}

psql_admin() {
  PGPASSWORD="$DB_PASSWORD" "$pg_bin/psql" -h "$DB_HOST" -p "$DB_PORT" -U "$DB_USER" -d postgres \
    -v ON_ERROR_STOP=1 -tAq "$@"
}

ensure_database() {
  local name=$1
  if [ "$(psql_admin -c "SELECT 1 FROM pg_database WHERE datname = '$name'")" != "1" ]; then
    psql_admin -c "CREATE DATABASE \"$name\"" && say "created database $name"
  fi
}

start() {
  need_bin
  resolve_data_dir
  [ -f "$data_dir/PG_VERSION" ] || init_cluster
  if is_running; then
    say "PostgreSQL already runs on $DB_HOST:$DB_PORT ($data_dir)"
  else
    [ "$(id -u)" -eq 0 ] && { touch "$log_file"; chown postgres "$log_file"; }
    if ! as_owner "$pg_bin/pg_ctl" -D "$data_dir" -l "$log_file" -w -t 60 -o "-p $DB_PORT" start >/dev/null; then
      print_log_tail
      die "PostgreSQL did not start"
    fi
    say "PostgreSQL started on $DB_HOST:$DB_PORT ($data_dir, log $log_file)"
  fi
  ensure_database "$DB_NAME"
  ensure_database "$DB_TEST_NAME"
}

stop() {
  pg_bin=${pg_bin:-}
  [ -n "$pg_bin" ] || { say "PostgreSQL is not installed; nothing to stop"; return 0; }
  resolve_data_dir
  if is_running; then
    as_owner "$pg_bin/pg_ctl" -D "$data_dir" -m fast -w -t 60 stop >/dev/null || { print_log_tail; die "PostgreSQL did not stop"; }
    say "PostgreSQL stopped"
  else
    say "PostgreSQL is not running"
  fi
}

status() {
  [ -n "$pg_bin" ] || { say "PostgreSQL is not installed"; return 3; }
  resolve_data_dir
  if is_running; then
    say "running on $DB_HOST:$DB_PORT, data in $data_dir, log $log_file"
  else
    say "not running (data in $data_dir)"
    return 3
  fi
}

case "${1:-}" in
  start) start ;;
  stop) stop ;;
  status) status ;;
  env)
    printf 'DB_HOST=%s\nDB_PORT=%s\nDB_USER=%s\nDB_PASSWORD=%s\nDB_NAME=%s\nDB_TEST_NAME=%s\n' \
      "$DB_HOST" "$DB_PORT" "$DB_USER" "$DB_PASSWORD" "$DB_NAME" "$DB_TEST_NAME"
    ;;
  *) die "usage: scripts/db.sh start|stop|status|env" ;;
esac
