#!/usr/bin/env bash
# npm test: type check, web build, then every jest project (ui, unit, server, browser) against a real Postgres.
# Extra arguments go to jest, e.g. `npm test -- --selectProjects unit`.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."
export EXPO_OFFLINE=1 EXPO_NO_TELEMETRY=1

bash scripts/ensure-system.sh
bash scripts/ensure-deps.sh

if ! bash scripts/pg.sh running; then
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
