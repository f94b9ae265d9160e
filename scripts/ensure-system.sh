#!/usr/bin/env bash
# Debian packages the tests need: Chromium for the browser tests, PostgreSQL 15 for the database.
set -euo pipefail
missing=()
[ -x /usr/bin/chromium ] || missing+=(chromium)
if ! ls /usr/lib/postgresql/*/bin/postgres >/dev/null 2>&1; then missing+=(postgresql-15); fi
[ ${#missing[@]} -eq 0 ] && exit 0
if [ "$(id -u)" -ne 0 ]; then
  echo "Missing Debian packages: ${missing[*]}. Install them with: sudo apt-get install -y ${missing[*]}" >&2
  exit 1
fi
echo "Installing Debian packages: ${missing[*]} ..."
mkdir -p /etc/postgresql-common/createcluster.d
echo 'create_main_cluster = false' > /etc/postgresql-common/createcluster.d/ligandry.conf
export DEBIAN_FRONTEND=noninteractive
apt-get update -qq >/dev/null
apt-get install -y -qq "${missing[@]}" >/dev/null
