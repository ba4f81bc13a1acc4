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
# the local demo hands off through the built-in mail catcher (127.0.0.1) and shows its outbox;
# for a real mail server set SMTP_MODE=smtp and SMTP_HOST/SMTP_PORT/SMTP_USER/SMTP_PASS/SMTP_FROM
export SMTP_MODE=${SMTP_MODE:-catcher}
export OUTBOX_ENABLED=${OUTBOX_ENABLED:-true}

api_pid=
cleanup() {
  # a second Ctrl-C (or a forwarded signal) must not cut the clean-up short: ignore them from here
  trap "" INT TERM
  trap - EXIT
  [ -n "$api_pid" ] && kill "$api_pid" 2>/dev/null && wait "$api_pid" 2>/dev/null || true
  [ -n "$started_db" ] && bash scripts/db.sh stop || true
}
trap cleanup INT TERM EXIT

pnpm --filter @spanwright/web build >/dev/null
pnpm --filter @spanwright/api build >/dev/null
pnpm --silent --filter @spanwright/api run migrate
pnpm --silent --filter @spanwright/api run seed

PORT=${PORT:-3000}
HOST=${HOST:-127.0.0.1}
export PORT HOST
echo
echo "Spanwright: http://$HOST:$PORT"
echo "Demo sign-in: demo@spanwright.test / spanwright-demo   (Ctrl-C stops)"
echo
# node itself (not pnpm) is the child, so the trap's kill reaches the server and it shuts down cleanly
(cd apps/api && exec node --enable-source-maps dist/main.mjs) &
api_pid=$!
wait "$api_pid"
