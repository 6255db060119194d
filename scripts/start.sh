#!/usr/bin/env bash
# `npm start`: set everything up on this machine and serve Runnel on http://127.0.0.1:$PORT.
#   RUNNEL_ENV=development (default): PostgreSQL run here, demo data, local fakes for S3 and mail.
#   RUNNEL_ENV=production: the database, object storage and mail given in the environment; no demo,
#   no fakes; refuses to start while any of them (or the session secret) is missing.
#   RUNNEL_SETUP_ONLY=1: set up (database, migrations, seed), then stop what was started and exit.
#   RUNNEL_DEV_SERVER=1 (`npm run dev`): the same set-up, then `next dev` with hot reload instead of a build.
source "$(dirname "$0")/common.sh"

export RUNNEL_ENV="${RUNNEL_ENV:-development}"
export PORT="${PORT:-3000}"
export RUNNEL_RUNTIME_DIR="${RUNNEL_RUNTIME_DIR:-.runtime}"
PGDATA_DIR=""

ensure_node_packages

case "$RUNNEL_ENV" in
  production)
    # Checked by the app's own rules (lib/env.ts) before anything is touched.
    node --import tsx scripts/check-env.ts || die "not starting: fix the settings above (see README, \"Environments\")"
    ;;
  development)
    export NEXTAUTH_URL="${NEXTAUTH_URL:-http://127.0.0.1:$PORT}"
    development_settings
    ensure_postgres_binaries
    ensure_session_secret
    start_postgres "${RUNNEL_PG_CLUSTER:-dev}" "$RUNNEL_PG_PORT"
    export DATABASE_URL="${DATABASE_URL:-$(database_url "$RUNNEL_PG_PORT" "$RUNNEL_DB_NAME")}"
    ;;
  *) die "RUNNEL_ENV must be development or production (got '$RUNNEL_ENV')" ;;
esac

APP_PID=""
FAKES_STARTED=""
cleanup() {
  # Finish the clean-up even if the terminal or a pipe reading our output has already gone.
  trap '' INT TERM PIPE
  trap - EXIT
  set +e
  if [ -n "$APP_PID" ] && kill -0 "$APP_PID" 2>/dev/null; then
    log "stopping the app"
    kill -TERM -- "-$APP_PID" 2>/dev/null || kill -TERM "$APP_PID" 2>/dev/null || true
    wait "$APP_PID" 2>/dev/null || true
  fi
  # Only what this run started: a set-up-only run never stops fakes another run owns.
  [ -n "$FAKES_STARTED" ] && { bash scripts/fakes.sh stop || true; }
  [ "$RUNNEL_ENV" = development ] && stop_postgres "$PGDATA_DIR"
  true
}
trap cleanup INT TERM EXIT

if [ "$RUNNEL_ENV" = development ]; then
  ensure_database "$RUNNEL_PG_PORT" "$RUNNEL_DB_NAME"
  migrate_and_seed
else
  migrate
fi
[ "${RUNNEL_SETUP_ONLY:-0}" = "1" ] && { log "set-up done (RUNNEL_SETUP_ONLY=1): stopping"; exit 0; }
if [ "$RUNNEL_ENV" = development ]; then
  FAKES_STARTED=1
  bash scripts/fakes.sh start
fi

if [ "${RUNNEL_DEV_SERVER:-0}" = "1" ]; then
  [ "$RUNNEL_ENV" = development ] || die "the hot-reload server is for development only (RUNNEL_ENV=$RUNNEL_ENV)"
  log "serving Runnel with hot reload (next dev) on http://127.0.0.1:$PORT (Ctrl-C stops what npm run dev started)"
  set -m
  node node_modules/next/dist/bin/next dev --hostname "${RUNNEL_HOST:-127.0.0.1}" --port "$PORT" &
  APP_PID=$!
  set +m
  wait "$APP_PID"
  exit
fi

if [ "${RUNNEL_SKIP_BUILD:-0}" != "1" ] || [ ! -f .next/BUILD_ID ]; then
  log "building the app"
  NODE_ENV=production node node_modules/next/dist/bin/next build
fi

log "serving Runnel ($RUNNEL_ENV) on http://127.0.0.1:$PORT (Ctrl-C stops what npm start started)"
# Own process group, so Ctrl-C reaches next-server's children too.
set -m
NODE_ENV=production node node_modules/next/dist/bin/next start --hostname "${RUNNEL_HOST:-127.0.0.1}" --port "$PORT" &
APP_PID=$!
set +m
wait "$APP_PID"
