#!/usr/bin/env bash
# npm start: prerequisites, build, private MariaDB, migrations, demo seed, then the app on one port.
# Ctrl-C stops everything this script started, MariaDB included.
set -euo pipefail
. "$(dirname "$0")/env.sh"
cd "$ROOT"

bash scripts/prereqs.sh run

started_db=0
if ! bash scripts/db.sh status >/dev/null 2>&1; then bash scripts/db.sh start; started_db=1; fi
api_pid=""
s3_pid=""
smtp_pid=""
cleanup() {
  trap - INT TERM EXIT
  if [ -n "$s3_pid" ]; then kill "$s3_pid" 2>/dev/null || true; wait "$s3_pid" 2>/dev/null || true; fi
  if [ -n "$smtp_pid" ]; then kill "$smtp_pid" 2>/dev/null || true; wait "$smtp_pid" 2>/dev/null || true; fi
  if [ -n "$api_pid" ]; then kill "$api_pid" 2>/dev/null || true; wait "$api_pid" 2>/dev/null || true; fi
  if [ "$started_db" = 1 ]; then bash scripts/db.sh stop; fi
}
trap cleanup INT TERM EXIT

start_s3_fake
start_smtp_fake
npm run -s migration:run -w api
npm run -s seed -w api

node api/dist/main.js &
api_pid=$!
for _ in $(seq 1 100); do
  node scripts/wait-http.mjs "http://127.0.0.1:$PORT/api/health" 1 && break
  kill -0 "$api_pid" 2>/dev/null || { echo "The API exited during start-up" >&2; exit 1; }
  sleep 0.2
done

cat <<MSG

  Siteband is running at http://127.0.0.1:$PORT
  API documentation:      http://127.0.0.1:$PORT/api/docs
  Object storage (fake):  http://127.0.0.1:$S3_PORT  bucket $S3_BUCKET, files in .data/s3-$S3_PORT
  Mail inbox (fake SMTP): http://127.0.0.1:$SMTP_WEB_PORT  every mail the app sends, also in .data/mail/$SMTP_PORT

  Demo sign-ins (password: $SITEBAND_DEMO_PASSWORD)
    inspector@demo.test    inspector
    supervisor@demo.test   supervisor
    safety@demo.test       safety officer
    admin@demo.test        admin

  Press Ctrl-C to stop (the private MariaDB on 127.0.0.1:$DB_PORT stops too).

MSG
wait "$api_pid"
