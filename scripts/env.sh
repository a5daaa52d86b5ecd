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
export SITEBAND_DEMO_PASSWORD="${SITEBAND_DEMO_PASSWORD:-siteband-demo-2026}"
export MARIADB_DIR="${MARIADB_DIR:-$SITEBAND_DATA_DIR/mariadb-$DB_PORT}"
