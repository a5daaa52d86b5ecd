#!/usr/bin/env bash
# Installs what Siteband needs and is missing, then builds. Safe to run again: it skips what is there.
# Usage: scripts/prereqs.sh [run|test]   (test also brings Chromium and the outside reference tools)
set -euo pipefail
. "$(dirname "$0")/env.sh"
cd "$ROOT"
mode="${1:-run}"

need=()
command -v mariadbd >/dev/null 2>&1 || need+=(mariadb-server)
if [ "$mode" = test ]; then
  [ -x /usr/bin/chromium ] || need+=(chromium)
  /usr/bin/python3 -c 'import pymatgen.symmetry.analyzer' >/dev/null 2>&1 || need+=(python3-pymatgen)
  /usr/bin/python3 -c 'import ase.collections' >/dev/null 2>&1 || need+=(python3-ase)
  /usr/bin/python3 -c 'import scipy.signal' >/dev/null 2>&1 || need+=(python3-scipy)
  # pdftotext reads the case reports back in the tests.
  command -v pdftotext >/dev/null 2>&1 || need+=(poppler-utils)
fi
if [ ${#need[@]} -gt 0 ]; then
  echo "Installing Debian packages: ${need[*]}"
  sudo_cmd=()
  if [ "$(id -u)" != 0 ]; then
    command -v sudo >/dev/null 2>&1 || { echo "Need root (or sudo) to install: ${need[*]}" >&2; exit 1; }
    sudo_cmd=(sudo)
  fi
  "${sudo_cmd[@]}" apt-get update -qq
  DEBIAN_FRONTEND=noninteractive "${sudo_cmd[@]}" apt-get install -y -qq --no-install-recommends "${need[@]}" >/dev/null
fi

# npm ci when node_modules is missing or older than the lock file.
if [ ! -f node_modules/.package-lock.json ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  echo "Installing npm dependencies (npm ci)"
  npm ci --no-audit --no-fund --loglevel=error
fi

echo "Building shared, api and pwa"
npm run -s build
