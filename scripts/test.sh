#!/usr/bin/env bash
# npm test: type check, web build, then every jest project (ui, unit, server, browser) against a real Postgres.
# Extra arguments go to jest, e.g. `npm test -- --selectProjects unit`.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."
export EXPO_OFFLINE=1 EXPO_NO_TELEMETRY=1

bash scripts/ensure-system.sh
bash scripts/ensure-deps.sh

if ! bash scripts/pg.sh running; then
  # Tests need a database, not a particular port: when the usual one is busy, take a free one.
  PG_PORT="${LIGANDRY_PG_PORT:-54329}"
  if (exec 3<>"/dev/tcp/127.0.0.1/$PG_PORT") 2>/dev/null; then
    LIGANDRY_PG_PORT="$(node -e "const s=require('net').createServer().listen(0,'127.0.0.1',()=>{console.log(s.address().port);s.close()})")"
    export LIGANDRY_PG_PORT
    echo "Port $PG_PORT is busy; the test database server uses $LIGANDRY_PG_PORT."
  fi
  bash scripts/pg.sh start
  trap 'bash scripts/pg.sh stop >/dev/null 2>&1 || true' EXIT
fi
export LIGANDRY_TEST_ADMIN_URL="$(bash scripts/pg.sh url postgres)"

echo "== Type check"
npx tsc --noEmit
echo "== Web build"
bash scripts/build-web.sh
echo "== Tests"
npx jest "$@"
