#!/usr/bin/env bash
# `npm start`: the product with its demo data on http://127.0.0.1:$PORT (default 3000).
# Ctrl-C stops the server, and the database too if this command started it.
set -euo pipefail
ROOT=$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)
cd "$ROOT"
bash scripts/bootstrap.sh

started_db=
if ! bash scripts/db.sh is-running; then started_db=1; fi
bash scripts/db.sh start
bash scripts/db.sh createdb spanwright
export DATABASE_URL=${DATABASE_URL:-$(bash scripts/db.sh url spanwright)}
export NODE_ENV=${NODE_ENV:-production}

api_pid=
cleanup() {
  trap - INT TERM EXIT
  [ -n "$api_pid" ] && kill "$api_pid" 2>/dev/null && wait "$api_pid" 2>/dev/null || true
  [ -n "$started_db" ] && bash scripts/db.sh stop || true
}
trap cleanup INT TERM EXIT

pnpm --filter @spanwright/web build >/dev/null
pnpm --filter @spanwright/api run migrate
pnpm --filter @spanwright/api run seed
pnpm --filter @spanwright/api run start &
api_pid=$!
wait "$api_pid"
