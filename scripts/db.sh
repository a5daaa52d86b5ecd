#!/usr/bin/env bash
# A private MariaDB for Siteband: data under .data/, bound to 127.0.0.1 only, never the system service.
# Usage: scripts/db.sh start|stop|status|reset|sql [SQL]
set -euo pipefail
. "$(dirname "$0")/env.sh"

SOCK="$MARIADB_DIR/mariadb.sock"
PIDFILE="$MARIADB_DIR/mariadb.pid"
LOG="$MARIADB_DIR/mariadb.log"
DATA="$MARIADB_DIR/data"

root_sql() { mariadb --no-defaults --socket="$SOCK" -uroot "$@"; }

is_running() { [ -S "$SOCK" ] && mariadb-admin --no-defaults --socket="$SOCK" -uroot ping --silent >/dev/null 2>&1; }

start() {
  if is_running; then echo "MariaDB already running on 127.0.0.1:$DB_PORT"; return 0; fi
  command -v mariadbd >/dev/null || { echo "mariadbd not found: run scripts/prereqs.sh first" >&2; exit 1; }
  mkdir -p "$MARIADB_DIR"
  if [ ! -d "$DATA/mysql" ]; then
    echo "Initialising a private MariaDB in $DATA"
    mariadb-install-db --no-defaults --datadir="$DATA" --user=root \
      --auth-root-authentication-method=socket --skip-test-db >"$MARIADB_DIR/install.log" 2>&1
  fi
  rm -f "$SOCK"
  mariadbd --no-defaults --datadir="$DATA" --user=root --bind-address=127.0.0.1 --port="$DB_PORT" \
    --socket="$SOCK" --pid-file="$PIDFILE" --log-error="$LOG" --skip-name-resolve \
    --character-set-server=utf8mb4 --collation-server=utf8mb4_unicode_ci >/dev/null 2>&1 &
  for _ in $(seq 1 100); do is_running && break; sleep 0.2; done
  is_running || { echo "MariaDB did not start; see $LOG" >&2; tail -20 "$LOG" >&2; exit 1; }
  # The app user may create throwaway test databases named siteband_*.
  root_sql <<SQL
CREATE USER IF NOT EXISTS '$DB_USER'@'127.0.0.1' IDENTIFIED BY '$DB_PASSWORD';
ALTER USER '$DB_USER'@'127.0.0.1' IDENTIFIED BY '$DB_PASSWORD';
GRANT ALL PRIVILEGES ON \`siteband%\`.* TO '$DB_USER'@'127.0.0.1';
CREATE DATABASE IF NOT EXISTS \`$DB_NAME\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
SQL
  echo "MariaDB running on 127.0.0.1:$DB_PORT (data in $DATA)"
}

stop() {
  if ! is_running; then echo "MariaDB not running"; return 0; fi
  local pid; pid="$(cat "$PIDFILE" 2>/dev/null || true)"
  mariadb-admin --no-defaults --socket="$SOCK" -uroot shutdown
  if [ -n "$pid" ]; then for _ in $(seq 1 100); do kill -0 "$pid" 2>/dev/null || break; sleep 0.1; done; fi
  echo "MariaDB stopped"
}

case "${1:-status}" in
  start) start ;;
  stop) stop ;;
  status) if is_running; then echo "running on 127.0.0.1:$DB_PORT"; else echo "stopped"; exit 3; fi ;;
  reset) stop; rm -rf "$MARIADB_DIR"; start ;;
  sql) shift; root_sql "$DB_NAME" ${1:+-e "$1"} ;;
  *) echo "usage: $0 start|stop|status|reset|sql [SQL]" >&2; exit 2 ;;
esac
