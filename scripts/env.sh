# Shared settings for Siteband's scripts: every value can be overridden from the environment.
# Sourced by db.sh, start.sh and test.sh; see .env.example for what each one means.
ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
if [ -f "$ROOT/.env" ]; then set -a; . "$ROOT/.env"; set +a; fi
export PORT="${PORT:-3000}"
export DB_HOST="${DB_HOST:-127.0.0.1}"
export DB_PORT="${DB_PORT:-3307}"
export DB_NAME="${DB_NAME:-siteband}"
export DB_USER="${DB_USER:-siteband}"
export DB_PASSWORD="${DB_PASSWORD:-siteband-local}"
export SITEBAND_DATA_DIR="${SITEBAND_DATA_DIR:-$ROOT/.data}"
export S3_PORT="${S3_PORT:-4569}"
export S3_BUCKET="${S3_BUCKET:-siteband-dev}"
export SMTP_PORT="${SMTP_PORT:-2525}"
export SMTP_WEB_PORT="${SMTP_WEB_PORT:-$((SMTP_PORT + 1))}"
export SITEBAND_DEMO_PASSWORD="${SITEBAND_DEMO_PASSWORD:-siteband-demo-2026}"
export MARIADB_DIR="${MARIADB_DIR:-$SITEBAND_DATA_DIR/mariadb-$DB_PORT}"

# Starts the local S3 fake on $S3_PORT in the background and waits for it; sets s3_pid.
start_s3_fake() {
  local log="$SITEBAND_DATA_DIR/s3-$S3_PORT.log"
  mkdir -p "$SITEBAND_DATA_DIR"
  node "$ROOT/scripts/fakes/s3.mjs" --port "$S3_PORT" --bucket "$S3_BUCKET" >"$log" 2>&1 &
  s3_pid=$!
  for _ in $(seq 1 100); do
    grep -q "ready" "$log" 2>/dev/null && return 0
    kill -0 "$s3_pid" 2>/dev/null || break
    sleep 0.1
  done
  echo "The S3 fake did not start; see $log" >&2
  cat "$log" >&2
  return 1
}

# Starts the local SMTP fake on $SMTP_PORT (inbox on $SMTP_WEB_PORT) in the background and waits for it; sets smtp_pid.
start_smtp_fake() {
  local log="$SITEBAND_DATA_DIR/smtp-$SMTP_PORT.log"
  mkdir -p "$SITEBAND_DATA_DIR"
  node "$ROOT/scripts/fakes/smtp.mjs" --port "$SMTP_PORT" --web-port "$SMTP_WEB_PORT" >"$log" 2>&1 &
  smtp_pid=$!
  for _ in $(seq 1 100); do
    grep -q "ready" "$log" 2>/dev/null && return 0
    kill -0 "$smtp_pid" 2>/dev/null || break
    sleep 0.1
  done
  echo "The SMTP fake did not start; see $log" >&2
  cat "$log" >&2
  return 1
}
