#!/usr/bin/env bash
# npm run bench: engine figures (against a C loop compiled here) and API figures (real app, real PostgreSQL).
# Both write their measured figures into docs/PERFORMANCE.md. Pass --no-write to only print.
set -euo pipefail
source "$(dirname "$0")/lib/common.sh"

trap stop_postgres_if_started EXIT
ensure_node_modules
command -v cc >/dev/null || apt_install gcc
say "engine bench"
node_modules/.bin/tsx test/bench/engine/engine-bench.ts "$@"
say "sequential chance calibration"
node_modules/.bin/tsx test/bench/engine/sequential-bench.ts "$@"
ensure_postgres
say "API bench"
node_modules/.bin/tsx test/bench/api/api-bench.ts "$@"
