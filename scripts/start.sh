#!/usr/bin/env bash
# npm start: everything a fresh clone needs, then the app at http://127.0.0.1:8080.
set -euo pipefail
source "$(dirname "$0")/lib/common.sh"

PIDS=()
cleanup() {
  trap - EXIT INT TERM
  for pid in "${PIDS[@]:-}"; do
    [ -n "$pid" ] && kill "$pid" 2>/dev/null && wait "$pid" 2>/dev/null || true
  done
  stop_postgres_if_started
}
trap cleanup EXIT
trap 'exit 130' INT TERM

ensure_node_modules
ensure_postgres
ensure_database strapsift
export DATABASE_URL="${DATABASE_URL:-$(database_url strapsift)}"
export PORT="${PORT:-8080}" HOST="${HOST:-127.0.0.1}"
export NODE_ENV="${NODE_ENV:-development}"
# The fakes and the server agree on ports: S3_PORT, SMTP_PORT and INBOX_PORT move both.
export S3_PORT="${S3_PORT:-4569}" SMTP_PORT="${SMTP_PORT:-2525}" INBOX_PORT="${INBOX_PORT:-8025}"
export S3_ENDPOINT="${S3_ENDPOINT:-http://127.0.0.1:$S3_PORT}" SMTP_HOST="${SMTP_HOST:-127.0.0.1}"
run_migrations
# The fakes first: the demo seed stores its drawn keeper photos in the object store.
node_modules/.bin/tsx scripts/fakes.ts &
PIDS+=($!)
for _ in $(seq 1 100); do
  curl -fs "http://127.0.0.1:${INBOX_PORT:-8025}/" >/dev/null 2>&1 && break
  sleep 0.1
done
say "seeding demo data"
node_modules/.bin/tsx server/db/seed/run-seed.ts || die "seeding failed"
ensure_web_export

# WORKERS app processes (default: one per core) under Node's cluster module; see docs/SCALING.md.
# Each process hashes passwords on libuv's pool; 4 threads a process is plenty on a small machine.
export UV_THREADPOOL_SIZE="${UV_THREADPOOL_SIZE:-4}"
node --import tsx server/cluster.ts &
SERVER_PID=$!
PIDS+=($SERVER_PID)

for _ in $(seq 1 100); do
  if curl -fs "http://$HOST:$PORT/api/health" >/dev/null 2>&1; then break; fi
  kill -0 "$SERVER_PID" 2>/dev/null || die "the server stopped during start-up"
  sleep 0.2
done
cat >&2 <<MSG

  Strapsift is running at  http://$HOST:$PORT
  Demo collector:          demo@strapsift.test  /  sift-demo-2026
  Demo admin:              admin@strapsift.test /  console-demo-2026
  Development inbox:       http://127.0.0.1:${INBOX_PORT:-8025}  (mail the app sent: reset links, invitations)
  Press Ctrl-C to stop (the server and the PostgreSQL this command started).

MSG
wait "$SERVER_PID"
