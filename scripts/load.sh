#!/usr/bin/env bash
# npm run load: load and fault runs against servers on 127.0.0.1 only; stops what it starts.
set -euo pipefail
source "$(dirname "$0")/lib/common.sh"
# --help prints the usage without starting anything.
for arg in "$@"; do
  case "$arg" in -h | --help) exec node --import tsx test/load/load.ts --help ;; esac
done
trap stop_postgres_if_started EXIT
ensure_node_modules
ensure_postgres
export PGPORT
# The load run creates and drops its own database, so it gets the superuser's URL; the app processes
# it starts connect with that database's URL.
PG_ADMIN_URL="$(admin_database_url postgres)"
export PG_ADMIN_URL
node --import tsx test/load/load.ts "$@"
