#!/usr/bin/env bash
# `npm test`: the same set-up as `npm start` against a separate test cluster and database, then
# type checking, lint, unit + integration tests (real PostgreSQL) and end-to-end tests (Playwright).
source "$(dirname "$0")/common.sh"

export RUNNEL_PG_PORT="${RUNNEL_TEST_PG_PORT:-5489}"
export RUNNEL_DB_NAME="${RUNNEL_TEST_DB_NAME:-runnel_test}"
export PORT="${RUNNEL_TEST_PORT:-3100}"
export NEXTAUTH_URL="http://127.0.0.1:$PORT"
export RUNNEL_ENV=test
# Its own fake object storage (port, data folder, pid files), apart from `npm start`'s.
export RUNNEL_S3_PORT="${RUNNEL_TEST_S3_PORT:-9402}"
export RUNNEL_S3_DIR="$(runnel_state_dir)/s3-test"
export RUNNEL_S3_ENDPOINT="http://127.0.0.1:$RUNNEL_S3_PORT"
export RUNNEL_RUNTIME_DIR=".runtime/test"
# Its own fake mail server; Playwright reads the messages from its web port.
export RUNNEL_SMTP_PORT="${RUNNEL_TEST_SMTP_PORT:-2526}"
export RUNNEL_MAIL_WEB_PORT="${RUNNEL_TEST_MAIL_WEB_PORT:-1081}"
export RUNNEL_MAIL_DIR="$(runnel_state_dir)/mail-test"
rm -rf "$RUNNEL_MAIL_DIR"
rm -rf "$RUNNEL_S3_DIR"

ensure_node_packages
ensure_postgres_binaries
[ -x /usr/bin/chromium ] || apt_install chromium
ensure_session_secret
start_postgres test "$RUNNEL_PG_PORT"
export DATABASE_URL="$(database_url "$RUNNEL_PG_PORT" "$RUNNEL_DB_NAME")"
TEST_PGDATA_DIR="$PGDATA_DIR"
cleanup() {
  trap - INT TERM EXIT
  bash scripts/fakes.sh stop || true
  stop_postgres "$TEST_PGDATA_DIR"
}
trap cleanup INT TERM EXIT

step() { log "── $1"; }

# A fresh test database every run, so tests never depend on leftovers.
pg_client "$PG_BIN/dropdb" -h 127.0.0.1 -p "$RUNNEL_PG_PORT" -U runnel --if-exists "$RUNNEL_DB_NAME"
ensure_database "$RUNNEL_PG_PORT" "$RUNNEL_DB_NAME"
migrate_and_seed

step "set-up: a second npm start keeps the first one's data"
bash scripts/check-setup.sh
bash scripts/fakes.sh start
step "type check (tsc --noEmit)"
npx tsc --noEmit
step "lint (eslint)"
npx eslint --max-warnings=0 -c scripts/config/eslint.config.mjs .
step "formatting (prettier --check; npm run format rewrites)"
npm run --silent format:check
step "unit and integration tests (vitest)"
npx vitest run --config tests/vitest.config.mts
step "build for end-to-end tests"
NODE_ENV=production node node_modules/next/dist/bin/next build >/dev/null
step "tests against next start (headers, sign-in, authorisation matrix, sessions, faults, hostile input and files, database outage, log secrets)"
RUNNEL_SERVER_PORT="$PORT" npx vitest run --config tests/server/vitest.config.mts
step "end-to-end tests (Playwright, Debian chromium)"
npx playwright test --config tests/e2e/playwright.config.ts
log "all tests passed"
