#!/usr/bin/env bash
# npm test: the same prerequisites as npm start, then every suite. Exits non-zero on any failure.
set -uo pipefail
. "$(dirname "$0")/env.sh"
cd "$ROOT"

bash scripts/prereqs.sh test || exit 1

started_db=0
if ! bash scripts/db.sh status >/dev/null 2>&1; then bash scripts/db.sh start || exit 1; started_db=1; fi
server_pid=""
s3_pid=""
smtp_pid=""
e2e_db="siteband_e2e_$$"
cleanup() {
  if [ -n "$s3_pid" ]; then kill "$s3_pid" 2>/dev/null; wait "$s3_pid" 2>/dev/null; fi
  if [ -n "$smtp_pid" ]; then kill "$smtp_pid" 2>/dev/null; wait "$smtp_pid" 2>/dev/null; fi
  if [ -n "$server_pid" ]; then kill "$server_pid" 2>/dev/null; wait "$server_pid" 2>/dev/null; fi
  bash scripts/db.sh sql "DROP DATABASE IF EXISTS \`$e2e_db\`" >/dev/null 2>&1
  if [ "$started_db" = 1 ]; then bash scripts/db.sh stop >/dev/null; fi
}
trap cleanup EXIT

passed=()
failed=()
suite() {
  local name="$1"; shift
  echo
  echo "=== $name"
  if "$@"; then passed+=("$name"); else failed+=("$name"); fi
}

browser_e2e() {
  # A throwaway database and server on a free port, the way a user's npm start would run it.
  local port="${E2E_PORT:-$((PORT + 900))}"
  local S3_PORT="$((S3_PORT + 900))" SMTP_PORT="$((SMTP_PORT + 900))" SMTP_WEB_PORT="$((SMTP_WEB_PORT + 900))"
  export S3_PORT SMTP_PORT SMTP_WEB_PORT
  start_s3_fake || return 1
  rm -rf "$SITEBAND_DATA_DIR/mail/$SMTP_PORT"
  start_smtp_fake || return 1
  bash scripts/db.sh sql "CREATE DATABASE \`$e2e_db\` CHARACTER SET utf8mb4" || return 1
  DB_NAME="$e2e_db" npm run -s migration:run -w api || return 1
  DB_NAME="$e2e_db" npm run -s seed -w api || return 1
  DB_NAME="$e2e_db" PORT="$port" node api/dist/main.js >"$SITEBAND_DATA_DIR/e2e-server.log" 2>&1 &
  server_pid=$!
  node scripts/wait-http.mjs "http://127.0.0.1:$port/api/health" 60 || { tail -30 "$SITEBAND_DATA_DIR/e2e-server.log"; return 1; }
  BASE_URL="http://127.0.0.1:$port" node pwa/e2e/run.mjs
  local rc=$?
  kill "$server_pid" 2>/dev/null; wait "$server_pid" 2>/dev/null; server_pid=""
  return $rc
}

suite "shared unit tests (Vitest)" npm test -w shared
suite "pwa unit tests (Vitest)" npm test -w pwa
suite "command-line contract tests (node:test)" node --test scripts/cli/
suite "api unit tests (Jest)" npm test -w api
suite "api e2e tests (Jest + supertest, MariaDB)" npm run test:e2e -w api
suite "browser e2e tests (playwright-core, Chromium)" browser_e2e
# The PWA's sync engine against API processes killed mid-sync; its own database, S3 fake and API ports (PORT+950, +951; S3_PORT+950).
suite "sync fault injection (node:test, API processes killed)" node --test scripts/sync-harness/

echo
for s in "${passed[@]}"; do echo "  ok    $s"; done
for s in "${failed[@]}"; do echo "  FAIL  $s"; done
echo "suites: ${#passed[@]} passed, ${#failed[@]} failed"
[ ${#failed[@]} -eq 0 ]
