#!/usr/bin/env bash
# npm start: dependencies, PostgreSQL, database (migrate and seed), web build, then the server in the foreground.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."

PORT="${PORT:-8080}"
HOST="${HOST:-127.0.0.1}"
if (exec 3<>"/dev/tcp/127.0.0.1/$PORT") 2>/dev/null; then
  printf '\nPort %s on 127.0.0.1 is taken by another program. Stop it, or run: PORT=<free port> npm start\n\n' "$PORT" >&2
  exit 1
fi

bash scripts/ensure-deps.sh
bash scripts/pg.sh start
export DATABASE_URL="${DATABASE_URL:-$(bash scripts/pg.sh url ligandry)}"
bash scripts/build-web.sh

# SEED_DEMO: the server creates the database if missing, migrates and seeds before it listens.
# npm start is the local, demo start: NODE_ENV stays development unless set, so the demo team is
# seeded and mail goes to the local outbox. A deployment sets NODE_ENV=production (no demo data)
# and SMTP_URL.
export PORT HOST NODE_ENV="${NODE_ENV:-development}" SEED_DEMO=1
exec node --import tsx server/index.ts
