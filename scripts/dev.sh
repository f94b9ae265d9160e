#!/usr/bin/env bash
# npm run dev: the API restarts on server changes, the web app rebuilds on client changes (reload the page).
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."
bash scripts/ensure-deps.sh
bash scripts/pg.sh start
export DATABASE_URL="${DATABASE_URL:-$(bash scripts/pg.sh url ligandry)}"
bash scripts/build-web.sh
export PORT="${PORT:-8080}" HOST="${HOST:-127.0.0.1}" NODE_ENV=development SEED_DEMO=1

node scripts/watch-web.js &
WATCHER=$!
trap 'kill $WATCHER 2>/dev/null || true' EXIT
node --import tsx --watch-path=server --watch-path=db --watch-path=shared --watch-path=lib server/index.ts
