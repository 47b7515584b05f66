#!/usr/bin/env bash
# Profiles one app process under the load mix (test/load/profile.ts): SQL per request type, CPU split
# between app, PostgreSQL and generator, and where the app's CPU goes. 127.0.0.1 only; stops what it starts.
set -euo pipefail
source "$(dirname "$0")/lib/common.sh"
ensure_node_modules
trap stop_postgres_if_started EXIT
ensure_postgres
export PGPORT
export PG_ADMIN_URL="$(admin_database_url postgres)"
node --import tsx test/load/profile.ts "$@"
