#!/usr/bin/env bash
# `npm start`: set everything up on this machine and serve Runnel on http://127.0.0.1:3000.
source "$(dirname "$0")/common.sh"

export RUNNEL_PG_PORT="${RUNNEL_PG_PORT:-5488}"
export RUNNEL_DB_NAME="${RUNNEL_DB_NAME:-runnel}"
export DATABASE_URL="${DATABASE_URL:-postgres://runnel@127.0.0.1:$RUNNEL_PG_PORT/$RUNNEL_DB_NAME}"
export PORT="${PORT:-3000}"
export NEXTAUTH_URL="${NEXTAUTH_URL:-http://127.0.0.1:$PORT}"
# Object storage: the local fake (scripts/fakes/s3.mjs) and the app agree on these.
export RUNNEL_S3_PORT="${RUNNEL_S3_PORT:-9401}"
export RUNNEL_S3_DIR="${RUNNEL_S3_DIR:-.runtime/s3}"
export RUNNEL_S3_ENDPOINT="${RUNNEL_S3_ENDPOINT:-http://127.0.0.1:$RUNNEL_S3_PORT}"
export RUNNEL_RUNTIME_DIR="${RUNNEL_RUNTIME_DIR:-.runtime}"
# Mail: the local fake SMTP server (scripts/fakes/mail.mjs) and its reading page.
export RUNNEL_SMTP_PORT="${RUNNEL_SMTP_PORT:-2525}"
export RUNNEL_MAIL_WEB_PORT="${RUNNEL_MAIL_WEB_PORT:-1080}"
export RUNNEL_MAIL_DIR="${RUNNEL_MAIL_DIR:-.runtime/mail}"
PGDATA_DIR="$ROOT/.pgdata"

ensure_node_packages
ensure_postgres_binaries
ensure_session_secret
start_postgres "$PGDATA_DIR" "$RUNNEL_PG_PORT"

APP_PID=""
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
  bash scripts/fakes.sh stop || true
  stop_postgres "$PGDATA_DIR"
}
trap cleanup INT TERM EXIT

ensure_database "$RUNNEL_PG_PORT" "$RUNNEL_DB_NAME"
migrate_and_seed
bash scripts/fakes.sh start

if [ "${RUNNEL_SKIP_BUILD:-0}" != "1" ] || [ ! -f .next/BUILD_ID ]; then
  log "building the app"
  NODE_ENV=production node node_modules/next/dist/bin/next build
fi

log "serving Runnel on http://127.0.0.1:$PORT (Ctrl-C stops the app and the database)"
# Own process group, so Ctrl-C reaches next-server's children too.
set -m
NODE_ENV=production node node_modules/next/dist/bin/next start --hostname 127.0.0.1 --port "$PORT" &
APP_PID=$!
set +m
wait "$APP_PID"
