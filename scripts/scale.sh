#!/usr/bin/env bash
# `npm run test:scale`: two app instances behind nginx (Debian's package) on loopback, sharing the
# test cluster's PostgreSQL; see tests/load/scale-test.ts for the load and what must hold.
source "$(dirname "$0")/common.sh"

export RUNNEL_ENV=test
export RUNNEL_PG_PORT="${RUNNEL_TEST_PG_PORT:-5489}"
export RUNNEL_DB_NAME=runnel_scale
export RUNNEL_SCALE_APP_PORTS="${RUNNEL_SCALE_APP_PORTS:-3110 3111}"
export RUNNEL_SCALE_LB_PORT="${RUNNEL_SCALE_LB_PORT:-3112}"
export NEXTAUTH_URL="http://127.0.0.1:$RUNNEL_SCALE_LB_PORT"
export RUNNEL_S3_ENDPOINT="http://127.0.0.1:${RUNNEL_TEST_S3_PORT:-9402}"
export RUNNEL_RUNTIME_DIR=".runtime/scale"
mkdir -p "$RUNNEL_RUNTIME_DIR"

ensure_node_packages
ensure_postgres_binaries
[ -x /usr/sbin/nginx ] || command -v nginx >/dev/null || apt_install nginx
ensure_session_secret
start_postgres test "$RUNNEL_PG_PORT"
SCALE_PGDATA_DIR="$PGDATA_DIR"
trap 'stop_postgres "$SCALE_PGDATA_DIR"' EXIT
export DATABASE_URL="$(database_url "$RUNNEL_PG_PORT" "$RUNNEL_DB_NAME")"
pg_client "$PG_BIN/dropdb" -h 127.0.0.1 -p "$RUNNEL_PG_PORT" -U runnel --if-exists "$RUNNEL_DB_NAME"
ensure_database "$RUNNEL_PG_PORT" "$RUNNEL_DB_NAME"
migrate
if [ ! -f .next/BUILD_ID ]; then
  log "building the app"
  NODE_ENV=production node node_modules/next/dist/bin/next build >/dev/null
fi
node --import tsx tests/load/scale-test.ts
