#!/usr/bin/env bash
# Backs up Pondwright's database with pg_dump in its custom format (compressed; restored by
# scripts/restore.sh with pg_restore). Prints the file's path on success.
#
#   scripts/backup.sh [file]     default file: .data/backups/pondwright-<UTC timestamp>.dump
#
# Connection (environment, as scripts/db.sh): DB_HOST (127.0.0.1), DB_PORT (54329), DB_USER (pondwright),
# DB_PASSWORD (pondwright), DB_NAME (pondwright). The dump holds password hashes and customers' details:
# it is written readable by its owner only.
set -euo pipefail

repo_root=$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)
DB_HOST=${DB_HOST:-127.0.0.1}
DB_PORT=${DB_PORT:-54329}
DB_USER=${DB_USER:-pondwright}
DB_PASSWORD=${DB_PASSWORD:-pondwright}
DB_NAME=${DB_NAME:-pondwright}

say() { printf '[backup] %s\n' "$*" >&2; }
die() { say "$*"; exit 1; }

# The newest PostgreSQL client: pg_dump must be at least as new as the server it reads.
pg_bin=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1 || true)
[ -n "$pg_bin" ] && [ -x "$pg_bin/pg_dump" ] ||
  die "pg_dump was not found under /usr/lib/postgresql/*/bin. Install it with: sudo apt-get install -y postgresql-client"

file=${1:-$repo_root/.data/backups/pondwright-$(date -u +%Y%m%dT%H%M%SZ).dump}
[ -e "$file" ] && die "$file exists already; choose another name"
mkdir -p "$(dirname "$file")"
umask 077
partial="$file.partial"
trap 'rm -f "$partial"' EXIT

say "dumping $DB_NAME on $DB_HOST:$DB_PORT..."
# A consistent snapshot of one moment (pg_dump reads in one transaction); the running app may keep writing.
PGPASSWORD="$DB_PASSWORD" "$pg_bin/pg_dump" -h "$DB_HOST" -p "$DB_PORT" -U "$DB_USER" -d "$DB_NAME" \
  --format=custom --file="$partial" || die "pg_dump failed; no backup was written"
# Only a complete dump gets the final name, so a file under that name is always restorable.
mv "$partial" "$file"
say "wrote $file ($(du -h "$file" | cut -f1))"
printf '%s\n' "$file"
