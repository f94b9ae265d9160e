#!/usr/bin/env bash
# Exports the web app to dist/ when it is missing or older than its sources; --force rebuilds.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."
export EXPO_OFFLINE=1 EXPO_NO_TELEMETRY=1 CI="${CI:-1}"

SOURCES=(app components lib shared assets app.json package-lock.json babel.config.js metro.config.js tsconfig.json)
stale() {
  [ -f dist/index.html ] || return 0
  [ -n "$(find "${SOURCES[@]}" -newer dist/index.html -print -quit 2>/dev/null)" ]
}

if [ "${1:-}" != "--force" ] && ! stale; then
  echo "Web build is up to date."
  exit 0
fi
echo "Building the web app (about a minute cold, seconds warm)..."
rm -rf dist.tmp
if ! npx expo export --platform web --output-dir dist.tmp > .expo-export.log 2>&1; then
  tail -n 30 .expo-export.log >&2
  echo "The web build failed; the full log is .expo-export.log" >&2
  exit 1
fi
# Swap in one step so a running server never sees a half-written build.
rm -rf dist.old
[ -d dist ] && mv dist dist.old
mv dist.tmp dist
rm -rf dist.old
echo "Web build written to dist/."
