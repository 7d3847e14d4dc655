#!/usr/bin/env bash
# sqlmap against Pondwright's injectable-looking inputs, the way an outside tester would run it:
#
#   POST /api/auth/login            JSON body: email, password                 (public)
#   GET  /api/customers?q=…         q, sort, order, page, pageSize             (bearer token, estimator)
#   GET  /api/quotes/<token>        the token in the path                      (public)
#
# It installs Debian's sqlmap when missing (apt-get, as root), builds the server (as `npm run e2e`
# does; SQLMAP_SKIP_BUILD=1 uses the existing build), migrates and seeds a database of its own
# (pondwright_sqlmap, so the scan's sign-ins and wrong tokens touch nobody's data), starts the built
# server on a free port (SQLMAP_PORT, 3190 by default) with the demo data, runs sqlmap in batch mode at
# level 2, risk 1 against PostgreSQL, stops the server and prints one line per parameter.
#
# The server runs with TRUST_PROXY=true and sqlmap with the `xforwardedfor` tamper script, so each
# probe comes from a random address: the per-address limits (10 failed sign-ins, 20 wrong quote tokens
# in 15 minutes) would otherwise turn every later probe into the same 429 and hide what sqlmap looks
# for. The per-account sign-in limit and the global rate limit are raised for the same reason.
#
#   bash scripts/sqlmap-check.sh            # output and sqlmap's session files in .data/sqlmap/
set -euo pipefail

repo_root=$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)
cd "$repo_root"

port=${SQLMAP_PORT:-3190}
level=${SQLMAP_LEVEL:-2}
export DB_HOST=127.0.0.1
export DB_PORT=${DB_PORT:-54329}
export DB_USER=${DB_USER:-pondwright}
export DB_PASSWORD=${DB_PASSWORD:-pondwright}
database=${SQLMAP_DB_NAME:-pondwright_sqlmap}
work_dir="$repo_root/.data/sqlmap"
base="http://127.0.0.1:$port"

say() { printf '\033[36m[sqlmap-check]\033[0m %s\n' "$*" >&2; }
die() { say "$*"; exit 1; }

# --- sqlmap ------------------------------------------------------------------------------------------
if ! command -v sqlmap >/dev/null 2>&1; then
  [ "$(id -u)" -eq 0 ] || die "sqlmap is not installed. Install it with: sudo apt-get install -y sqlmap"
  say "installing Debian's sqlmap (apt-get)..."
  export DEBIAN_FRONTEND=noninteractive
  apt-get install -y -qq sqlmap >/dev/null 2>&1 ||
    { apt-get update -qq >/dev/null && apt-get install -y -qq sqlmap >/dev/null; } ||
    die "apt-get install -y sqlmap failed"
fi
sqlmap_version=$(sqlmap --version 2>/dev/null | grep -Eo '^[0-9][^ ]*' | head -n 1)
say "sqlmap $sqlmap_version"

# --- database and build ------------------------------------------------------------------------------
bash scripts/db.sh start
export PGPASSWORD=$DB_PASSWORD
psql_db() { psql -h "$DB_HOST" -p "$DB_PORT" -U "$DB_USER" -v ON_ERROR_STOP=1 -Atq "$@"; }
if [ -z "$(psql_db -d postgres -c "SELECT 1 FROM pg_database WHERE datname = '$database'")" ]; then
  psql_db -d postgres -c "CREATE DATABASE $database"
fi
if [ "${SQLMAP_SKIP_BUILD:-0}" != 1 ]; then
  npm run build -w shared >/dev/null
  npm run build -w server >/dev/null
fi
[ -f server/dist/main.js ] || die "server/dist/main.js is missing: build the server first"
DB_NAME=$database npm run migrate -w server >/dev/null
DB_NAME=$database npm run seed -w server >/dev/null

# --- the server --------------------------------------------------------------------------------------
mkdir -p "$work_dir"
if (exec 3<>"/dev/tcp/127.0.0.1/$port") 2>/dev/null; then
  die "something already listens on 127.0.0.1:$port (set SQLMAP_PORT)"
fi
server_log="$work_dir/server.log"
DB_NAME=$database \
  JWT_SECRET=$(node -e "process.stdout.write(require('crypto').randomBytes(32).toString('base64url'))") \
  HOST=127.0.0.1 PORT=$port PUBLIC_APP_URL=$base \
  TRUST_PROXY=true RATE_LIMIT_PER_MINUTE=1000000 LOGIN_MAX_FAILURES=1000000 \
  OUTBOX_WORKER=off LOG_LEVEL=warn \
  node server/dist/main.js >"$server_log" 2>&1 &
server_pid=$!
stop_server() {
  if kill -0 "$server_pid" 2>/dev/null; then
    kill "$server_pid" 2>/dev/null || true
    wait "$server_pid" 2>/dev/null || true
  fi
}
trap stop_server EXIT
for _ in $(seq 1 120); do
  curl -fsS "$base/api/health" >/dev/null 2>&1 && break
  kill -0 "$server_pid" 2>/dev/null || die "the server exited; see $server_log"
  sleep 0.5
done
curl -fsS "$base/api/health" >/dev/null || die "the server did not answer on $base; see $server_log"
say "server (pid $server_pid) on $base, database $database"

json_field() { node -e "let s='';process.stdin.on('data',c=>s+=c).on('end',()=>{const v=JSON.parse(s)$1;process.stdout.write(String(v??''))})"; }
sign_in() {
  curl -fsS "$base/api/auth/login" -H 'Content-Type: application/json' \
    -d "{\"email\":\"$1\",\"password\":\"$2\"}" | json_field '.accessToken'
}
owner_token=$(sign_in owner@heronmoss.example pond-owner-2026)
estimator_token=$(sign_in estimator@heronmoss.example pond-estimator-2026)
[ -n "$owner_token" ] && [ -n "$estimator_token" ] || die "the demo sign-ins failed"

# A real quote link: the demo's approved estimate sent again, its token read from the queued e-mail.
estimate_id=$(curl -fsS "$base/api/estimates?q=Kitchen-view" -H "Authorization: Bearer $owner_token" |
  json_field '.items.find(e=>e.title==="Kitchen-view pond with waterfall")?.id')
[ -n "$estimate_id" ] || die "the demo estimate 'Kitchen-view pond with waterfall' was not found"
curl -fsS "$base/api/estimates/$estimate_id/send" -H "Authorization: Bearer $owner_token" \
  -H 'Content-Type: application/json' -d '{"recipientEmail":"sqlmap@example.test"}' >/dev/null
quote_token=$(psql_db -d "$database" -c \
  "SELECT substring(text_body from '/q/([A-Za-z0-9_-]{43})') FROM outbox_messages
   WHERE kind = 'quote-sent' ORDER BY created_at DESC LIMIT 1")
[ -n "$quote_token" ] || die "no quote link was queued"
curl -fsS "$base/api/quotes/$quote_token" >/dev/null || die "the quote link does not open"

# --- sqlmap ------------------------------------------------------------------------------------------
common=(--batch --level="$level" --risk=1 --dbms=PostgreSQL --tamper=xforwardedfor
  --flush-session --output-dir="$work_dir/sessions" --disable-coloring --timeout=20)
run_sqlmap() {
  local name=$1
  shift
  say "sqlmap: $name..."
  sqlmap "$@" "${common[@]}" >"$work_dir/$name.txt" 2>&1 || true
}
# The right password, so the untouched request answers 200 and a probe that changed the query's
# meaning would stand out; a refused probe answers 400 (validation) or 401, which sqlmap must not
# take for "stop, wrong credentials".
run_sqlmap login -u "$base/api/auth/login" --method=POST \
  -H 'Content-Type: application/json' --ignore-code=401 \
  --data='{"email":"estimator@heronmoss.example","password":"pond-estimator-2026"}' -p email,password
run_sqlmap customers \
  -u "$base/api/customers?q=Fen&sort=name&order=asc&page=1&pageSize=25" \
  -H "Authorization: Bearer $estimator_token" -p q,sort,order,page,pageSize
run_sqlmap quote -u "$base/api/quotes/$quote_token*"

# --- summary -----------------------------------------------------------------------------------------
summarise() {
  local name=$1 file="$work_dir/$1.txt"
  local injectable
  injectable=$(grep -Eo "parameter '[^']+' is '[^']+' injectable" "$file" | sort -u || true)
  grep -Eo "parameter '[^']+' does not seem to be injectable" "$file" | sort -u |
    sed -E "s/^parameter '([^']+)'.*/  $name  \1: not injectable/" || true
  if [ -n "$injectable" ]; then
    printf '%s\n' "$injectable" | sed -E "s/^parameter '([^']+)' is '(.+)' injectable/  $name  \1: INJECTABLE (\2)/"
  fi
  # What the refused probes were answered, e.g. "400 (Bad Request) - 620 times".
  local codes
  codes=$(grep -A6 "HTTP error codes detected" "$file" | grep -E '^[0-9]{3} ' | paste -sd ',' - || true)
  grep -q "all tested parameters do not appear to be injectable" "$file" &&
    echo "  $name  => all tested parameters do not appear to be injectable${codes:+; error answers: $codes}"
  grep -q "identified the following injection point" "$file" && echo "  $name  => INJECTION POINT FOUND"
  grep -Eq "^\[[0-9:]+\] \[(CRITICAL|ERROR)\] (not authorized|page not found|unable to connect)" "$file" &&
    echo "  $name  => sqlmap could not test this target: see $file"
  return 0
}
echo
echo "sqlmap $sqlmap_version, level $level, risk 1, --dbms=PostgreSQL, $(date -u +%Y-%m-%d)"
for name in login customers quote; do summarise "$name"; done
echo "full output: $work_dir/{login,customers,quote}.txt"
if grep -q "identified the following injection point" "$work_dir"/{login,customers,quote}.txt; then
  exit 1
fi
