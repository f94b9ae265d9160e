#!/usr/bin/env bash
# Installs npm dependencies when node_modules is missing or older than package-lock.json.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."
if [ ! -f node_modules/.package-lock.json ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
  echo "Installing dependencies (npm ci, about a minute the first time)..."
  npm ci --no-audit --no-fund --loglevel=error
fi
