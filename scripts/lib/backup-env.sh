# What backup and restore need around them: dependencies, PostgreSQL with its tools, and the object
# store. A local fake store that is not running is started for the run and stopped after, by PID.
source "$(dirname "${BASH_SOURCE[0]}")/common.sh"

BACKUP_PIDS=()
backup_cleanup() {
  for pid in "${BACKUP_PIDS[@]:-}"; do
    [ -n "$pid" ] && kill "$pid" 2>/dev/null && wait "$pid" 2>/dev/null || true
  done
  stop_postgres_if_started
}
trap backup_cleanup EXIT

ensure_node_modules
ensure_postgres
export PG_BIN
DB_NAME="${DB_NAME:-strapsift}"
export DATABASE_URL="${DATABASE_URL:-$(database_url "$DB_NAME")}"
# The app's role may not create databases; restore makes its fresh one as the superuser.
export PG_ADMIN_URL="${PG_ADMIN_URL:-$(admin_database_url postgres)}"
export S3_PORT="${S3_PORT:-4569}"
if [ -z "${S3_ENDPOINT:-}" ]; then
  export S3_ENDPOINT="http://127.0.0.1:$S3_PORT"
  if ! curl -fs "$S3_ENDPOINT/" >/dev/null 2>&1; then
    say "starting the local object store on $S3_PORT for this run"
    SMTP_PORT="${SMTP_PORT:-2525}" INBOX_PORT="${INBOX_PORT:-8025}" node_modules/.bin/tsx scripts/fakes.ts >"$DATA_DIR/fakes-backup.log" 2>&1 &
    BACKUP_PIDS+=($!)
    for _ in $(seq 1 100); do curl -fs "$S3_ENDPOINT/" >/dev/null 2>&1 && break; sleep 0.1; done
  fi
fi
