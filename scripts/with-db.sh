#!/usr/bin/env bash
# Runs one command with the development database up; stops PostgreSQL afterwards if it started it.
set -euo pipefail
source "$(dirname "$0")/lib/common.sh"
ensure_node_modules
ensure_postgres
trap stop_postgres_if_started EXIT
DB_NAME="${DB_NAME:-strapsift}"
ensure_database "$DB_NAME"
export DATABASE_URL="${DATABASE_URL:-$(database_url "$DB_NAME")}"
"$@"
