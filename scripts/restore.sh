#!/usr/bin/env bash
# Restores a backup made by scripts/backup.sh (pg_dump's custom format) with pg_restore, in one
# transaction: the database ends up holding the backup, or, on any error, exactly what it held before.
#
#   RESTORE_DB_NAME=pondwright_copy scripts/restore.sh <file>
#   scripts/restore.sh --overwrite-app-db <file>     restore over the app's own database (DB_NAME)
#
# RESTORE_DB_NAME names the database to restore into; it is created when missing. Left unset, it is
# DB_NAME, the database the app runs on (production's, on a server), and then the restore is refused
# unless --overwrite-app-db is given. Objects in the backup replace those of the same name
# (--clean --if-exists); stop the app first when restoring over its database.
#
# Connection (environment, as scripts/db.sh): DB_HOST (127.0.0.1), DB_PORT (54329), DB_USER (pondwright),
# DB_PASSWORD (pondwright), DB_NAME (pondwright).
set -euo pipefail

DB_HOST=${DB_HOST:-127.0.0.1}
DB_PORT=${DB_PORT:-54329}
DB_USER=${DB_USER:-pondwright}
DB_PASSWORD=${DB_PASSWORD:-pondwright}
DB_NAME=${DB_NAME:-pondwright}
RESTORE_DB_NAME=${RESTORE_DB_NAME:-$DB_NAME}

say() { printf '[restore] %s\n' "$*" >&2; }
die() { say "$*"; exit 1; }
usage() { die "usage: [RESTORE_DB_NAME=<database>] scripts/restore.sh [--overwrite-app-db] <file>"; }

overwrite_app_db=false
file=
for argument in "$@"; do
  case "$argument" in
    --overwrite-app-db) overwrite_app_db=true ;;
    -*) usage ;;
    *) [ -z "$file" ] || usage; file=$argument ;;
  esac
done
[ -n "$file" ] || usage
[ -f "$file" ] || die "no such file: $file"

if [ "$RESTORE_DB_NAME" = "$DB_NAME" ] && [ "$overwrite_app_db" != true ]; then
  die "refusing to restore over $DB_NAME, the app's database: set RESTORE_DB_NAME to restore into another database, or pass --overwrite-app-db to replace its data with the backup"
fi

pg_bin=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1 || true)
[ -n "$pg_bin" ] && [ -x "$pg_bin/pg_restore" ] && [ -x "$pg_bin/psql" ] ||
  die "pg_restore was not found under /usr/lib/postgresql/*/bin. Install it with: sudo apt-get install -y postgresql-client"
export PGPASSWORD="$DB_PASSWORD"

"$pg_bin/pg_restore" --list "$file" >/dev/null 2>&1 || die "$file is not a backup made by scripts/backup.sh (pg_dump --format=custom)"

psql_admin() {
  "$pg_bin/psql" -h "$DB_HOST" -p "$DB_PORT" -U "$DB_USER" -d postgres -v ON_ERROR_STOP=1 -tAq "$@"
}
exists=$(psql_admin -v name="$RESTORE_DB_NAME" <<'SQL'
SELECT 1 FROM pg_database WHERE datname = :'name'
SQL
)
if [ "$exists" != "1" ]; then
  psql_admin -v name="$RESTORE_DB_NAME" <<'SQL' || die "could not create database $RESTORE_DB_NAME"
CREATE DATABASE :"name"
SQL
  say "created database $RESTORE_DB_NAME"
fi

say "restoring $file into $RESTORE_DB_NAME on $DB_HOST:$DB_PORT..."
# Owners and grants are the restoring user's, so a backup restores under another role name too.
"$pg_bin/pg_restore" -h "$DB_HOST" -p "$DB_PORT" -U "$DB_USER" -d "$RESTORE_DB_NAME" \
  --clean --if-exists --no-owner --no-privileges --single-transaction --exit-on-error "$file" ||
  die "pg_restore failed; $RESTORE_DB_NAME is unchanged"
say "restored $RESTORE_DB_NAME from $file"
