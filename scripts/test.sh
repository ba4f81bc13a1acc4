#!/usr/bin/env bash
# `npm test`: every test of the workspace, against a fresh database on the project's PostgreSQL.
set -euo pipefail
ROOT=$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)
cd "$ROOT"
bash scripts/bootstrap.sh --browser

started_db=
if ! bash scripts/db.sh is-running; then started_db=1; fi
bash scripts/db.sh start
cleanup() { [ -n "$started_db" ] && bash scripts/db.sh stop || true; }
trap cleanup EXIT

pnpm --filter @spanwright/web build >/dev/null
pnpm exec vitest run "$@"
