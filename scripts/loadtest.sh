#!/usr/bin/env bash
# `pnpm loadtest`: the production server on 127.0.0.1 with a fresh database on the project's
# cluster, driven by autocannon (tests/load/loadtest.ts). Stops the server and drops the database
# at the end, and stops PostgreSQL too if this script started it. Not part of `npm test`.
set -euo pipefail
ROOT=$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)
cd "$ROOT"

started_db=
if ! bash scripts/db.sh is-running; then started_db=1; fi
bash scripts/db.sh start

DB_NAME="spanwright_load_$(date +%s)_$$"
LOG=$(mktemp /tmp/spanwright-loadtest-XXXXXX.log)
server_pid=
cleanup() {
  # a second Ctrl-C (or a forwarded signal) must not cut the clean-up short: ignore them from here
  trap "" INT TERM
  trap - EXIT
  if [ -n "$server_pid" ]; then kill "$server_pid" 2>/dev/null || true; wait "$server_pid" 2>/dev/null || true; fi
  bash scripts/db.sh dropdb "$DB_NAME" >/dev/null 2>&1 || true
  [ -n "$started_db" ] && bash scripts/db.sh stop || true
}
trap cleanup INT TERM EXIT

if [ ! -f apps/web/dist/index.html ]; then
  echo "loadtest: building the web app" >&2
  pnpm --filter @spanwright/web build >/dev/null
fi

# the production server bundle (apps/api/build.mjs), as `npm start` runs it
pnpm --filter @spanwright/api build >/dev/null

bash scripts/db.sh createdb "$DB_NAME" >/dev/null
DATABASE_URL=$(bash scripts/db.sh url "$DB_NAME")
export DATABASE_URL
pnpm --silent --filter @spanwright/api run migrate

PORT=$(node -e 'const s=require("net").createServer().listen(0,"127.0.0.1",()=>{console.log(s.address().port);s.close()})')
# a production server; the sign-in rate limit is raised only so the script's own sign-up is never refused
(cd apps/api && NODE_ENV=production HOST=127.0.0.1 PORT="$PORT" AUTH_RATE_LIMIT=1000 exec node dist/main.mjs) >"$LOG" 2>&1 &
server_pid=$!

for _ in $(seq 1 120); do
  if curl -fs "http://127.0.0.1:$PORT/api/health" >/dev/null 2>&1; then break; fi
  if ! kill -0 "$server_pid" 2>/dev/null; then echo "loadtest: the server exited; log: $LOG" >&2; cat "$LOG" >&2; exit 1; fi
  sleep 0.5
done

status=0
(cd tests && BASE_URL="http://127.0.0.1:$PORT" SERVER_PID="$server_pid" node --import tsx load/loadtest.ts) || status=$?
echo "server log: $LOG" >&2
exit $status
