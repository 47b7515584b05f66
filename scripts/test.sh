#!/usr/bin/env bash
# npm test: the same preparation as npm start, with throwaway databases, then every test.
# Ends with one plain line "N passed, N failed" that CI reads.
set -uo pipefail
source "$(dirname "$0")/lib/common.sh"

# A preparation step that fails still ends with the line CI reads.
die() { printf '\033[31m[strapsift] %s\033[0m\n' "$*" >&2; echo "0 passed, 1 failed"; exit 1; }

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

set -e
trap 'echo "0 passed, 1 failed"' ERR
ensure_node_modules

# The gate comes first and is cheap: a type or lint error fails the run before any database starts.
# SKIP_GATE=1 is for a quick loop on one test file, never for CI.
# The two run side by side (one core each); each one's output is shown after both end.
if [ "${SKIP_GATE:-0}" != 1 ]; then
  say "type check (tsc --noEmit) and lint (eslint)"
  mkdir -p "$DATA_DIR"
  node_modules/.bin/tsc --noEmit -p tsconfig.json >"$DATA_DIR/gate-tsc.log" 2>&1 &
  tsc_pid=$!
  node_modules/.bin/eslint . >"$DATA_DIR/gate-eslint.log" 2>&1 &
  lint_pid=$!
  PIDS+=("$tsc_pid" "$lint_pid")
  typed=0; linted=0
  wait "$tsc_pid" || typed=$?
  wait "$lint_pid" || linted=$?
  cat "$DATA_DIR/gate-tsc.log" "$DATA_DIR/gate-eslint.log" >&2
  [ "$typed" = 0 ] || die "the type check failed"
  [ "$linted" = 0 ] || die "the linter found problems"
fi
ensure_postgres
[ "${QUICK:-0}" = 1 ] || ensure_chromium
ensure_card_fonts
mkdir -p test-results

# Each suite gets a fresh database so runs never depend on each other.
# TEST_DB_PREFIX lets two checkouts share one cluster without touching each other's databases.
P="${TEST_DB_PREFIX:-strapsift}"
for db in "${P}_test" "${P}_migrations" "${P}_e2e"; do recreate_database "$db"; done
export NODE_ENV=test LOG_LEVEL="${LOG_LEVEL:-silent}"
export TEST_DATABASE_URL="$(database_url "${P}_test")"
export MIGRATIONS_DATABASE_URL="$(database_url "${P}_migrations")"
# Tests that make scratch databases (backups, account round trips) need the superuser; the app never does.
export PG_ADMIN_URL="$(admin_database_url postgres)"
DATABASE_URL="$TEST_DATABASE_URL" run_migrations

# The local stand-ins for S3 and SMTP, on their own ports so a running `npm start` is left alone.
# A prefix other than the default shifts the ports, so two checkouts' runs don't collide.
OFFSET=0
[ "$P" = strapsift ] || OFFSET=$(( $(printf '%s' "$P" | cksum | cut -d' ' -f1) % 40 + 1 ))
export S3_PORT="${TEST_S3_PORT:-$((4579 + OFFSET))}" SMTP_PORT="${TEST_SMTP_PORT:-$((2535 + OFFSET))}" INBOX_PORT="${TEST_INBOX_PORT:-$((8035 + OFFSET))}"
export S3_ENDPOINT="http://127.0.0.1:$S3_PORT" SMTP_HOST=127.0.0.1 MAIL_DIR="$DATA_DIR/mail-${P}"
rm -rf "$DATA_DIR/mail-${P}" "$DATA_DIR/s3-${P}"
FAKES_PREFIX="$P" node_modules/.bin/tsx scripts/fakes.ts >"$DATA_DIR/fakes-${P}.log" 2>&1 &
PIDS+=($!)
for _ in $(seq 1 100); do
  curl -fs "http://127.0.0.1:$INBOX_PORT/" >/dev/null 2>&1 && break
  sleep 0.1
done

# QUICK=1 skips the web export and the served app, for a fast loop on engine or server tests
# (pass a project too: QUICK=1 npm test -- --project server). CI never sets it.
if [ "${QUICK:-0}" != 1 ]; then
ensure_web_export

# The browser tests run against a real served app with demo data, as a user would meet it.
E2E_PORT="${E2E_PORT:-8091}"
E2E_DB_URL="$(database_url "${P}_e2e")"
DATABASE_URL="$E2E_DB_URL" run_migrations
DATABASE_URL="$E2E_DB_URL" node_modules/.bin/tsx server/db/seed/run-seed.ts >"$DATA_DIR/e2e-seed.log" 2>&1 \
  || { cat "$DATA_DIR/e2e-seed.log" >&2; die "seeding the browser-test database failed"; }
DATABASE_URL="$E2E_DB_URL" PORT="$E2E_PORT" HOST=127.0.0.1 node --import tsx server/main.ts >"$DATA_DIR/e2e-server.log" 2>&1 &
PIDS+=($!)
E2E_SERVER_PID=$!
for _ in $(seq 1 150); do
  curl -fs "http://127.0.0.1:$E2E_PORT/api/health" >/dev/null 2>&1 && break
  kill -0 "$E2E_SERVER_PID" 2>/dev/null || { cat "$DATA_DIR/e2e-server.log" >&2; die "the browser-test server did not start"; }
  sleep 0.2
done
export E2E_BASE_URL="http://127.0.0.1:$E2E_PORT"
fi
set +e
trap - ERR

rm -f test-results/vitest.json
node_modules/.bin/vitest run --reporter=default --reporter=json --outputFile.json=test-results/vitest.json "$@"
status=$?
node scripts/lib/summarise-tests.mjs test-results/vitest.json || status=1
exit $status
