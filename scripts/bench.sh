#!/usr/bin/env bash
# npm run bench: engine figures (against a C loop compiled here) and API figures (real app, real PostgreSQL).
# Both write their measured figures into docs/PERFORMANCE.md. Pass --no-write to only print.
set -euo pipefail
source "$(dirname "$0")/lib/common.sh"
# --help prints the usage without starting anything.
for arg in "$@"; do
  case "$arg" in -h | --help) exec node --import tsx test/bench/engine/engine-bench.ts --help ;; esac
done

trap stop_postgres_if_started EXIT
ensure_node_modules
command -v cc >/dev/null || apt_install gcc
ensure_card_fonts
say "engine bench"
node_modules/.bin/tsx test/bench/engine/engine-bench.ts "$@"
say "sequential chance calibration"
node_modules/.bin/tsx test/bench/engine/sequential-bench.ts "$@"
ensure_postgres
PG_ADMIN_URL="$(admin_database_url postgres)"
export PG_ADMIN_URL
say "API bench"
node_modules/.bin/tsx test/bench/api/api-bench.ts "$@"
say "camera bench (serial cards)"
node_modules/.bin/tsx test/bench/camera/camera-bench.ts "$@"

# The archive bench needs an object store: the local fake on its own ports, stopped by PID at the end.
say "archive bench"
export S3_PORT="${BENCH_S3_PORT:-4599}" SMTP_PORT="${BENCH_SMTP_PORT:-2599}" INBOX_PORT="${BENCH_INBOX_PORT:-8099}"
export S3_ENDPOINT="http://127.0.0.1:$S3_PORT"
rm -rf "$DATA_DIR/s3-bench"
FAKES_PREFIX=bench node_modules/.bin/tsx scripts/fakes.ts >"$DATA_DIR/fakes-bench.log" 2>&1 &
FAKES_PID=$!
trap 'kill "$FAKES_PID" 2>/dev/null; wait "$FAKES_PID" 2>/dev/null; stop_postgres_if_started' EXIT
for _ in $(seq 1 100); do curl -fs "$S3_ENDPOINT/" >/dev/null 2>&1 && break; sleep 0.1; done
node --expose-gc --import tsx test/bench/archive/archive-bench.ts "$@"
