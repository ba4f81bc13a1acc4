#!/usr/bin/env bash
# Brings what the two README commands need onto a fresh machine: pnpm (from the npm registry), the
# workspace's dependencies, Debian's PostgreSQL server and, with --browser, Debian's Chromium.
set -euo pipefail
ROOT=$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)
cd "$ROOT"
PNPM_VERSION=$(node -p "require('./package.json').packageManager.split('@')[1]")

apt_install() {
  if [ "$(id -u)" != 0 ]; then
    echo "bootstrap: '$*' is missing; install it (apt-get install $*) or run as root" >&2
    exit 1
  fi
  if [ -z "${APT_UPDATED:-}" ]; then apt-get update -qq >/dev/null; APT_UPDATED=1; fi
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends "$@" >/dev/null
}

if [ "$(pnpm --version 2>/dev/null || true)" != "$PNPM_VERSION" ]; then
  echo "bootstrap: installing pnpm $PNPM_VERSION through npm" >&2
  npm install --global --no-fund --no-audit "pnpm@$PNPM_VERSION" >/dev/null
fi

pnpm install --frozen-lockfile --reporter=silent

if ! ls /usr/lib/postgresql/*/bin/initdb >/dev/null 2>&1; then
  echo "bootstrap: installing Debian's postgresql package" >&2
  apt_install postgresql
fi

if [ "${1:-}" = "--browser" ] && ! command -v chromium >/dev/null 2>&1; then
  echo "bootstrap: installing Debian's chromium package for the browser tests" >&2
  apt_install chromium
fi
