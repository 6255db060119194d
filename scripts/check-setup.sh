#!/usr/bin/env bash
# Run by `npm test`: `npm start`'s set-up twice on a cluster of its own, with a row written in
# between; the second start must keep that row and must not seed the demo a second time.
source "$(dirname "$0")/common.sh"
ensure_postgres_binaries

PORT_CHECK="${RUNNEL_SETUP_CHECK_PG_PORT:-$(( ${RUNNEL_PG_PORT:-5489} + 20 ))}"
CLUSTER=setup-check
setup_once() {
  # Its own runtime folder and ports: the start script's clean-up must never stop the fakes of the
  # test run that called it.
  env -u DATABASE_URL -u RUNNEL_S3_PORT -u RUNNEL_S3_DIR -u RUNNEL_S3_ENDPOINT \
    RUNNEL_RUNTIME_DIR=.runtime/setup-check RUNNEL_ENV=development RUNNEL_SETUP_ONLY=1 RUNNEL_PG_CLUSTER="$CLUSTER" \
    RUNNEL_PG_PORT="$PORT_CHECK" RUNNEL_DB_NAME=runnel bash scripts/start.sh >/dev/null
}
sql() { pg_client "$PG_BIN/psql" -h 127.0.0.1 -p "$PORT_CHECK" -U runnel -d runnel -tAc "$1"; }

setup_once
start_postgres "$CLUSTER" "$PORT_CHECK" >/dev/null
trap 'stop_postgres "$PGDATA_DIR" >/dev/null; rm -rf "$PGDATA_DIR"' EXIT
marker="set-up check $(date +%s%N)"
sql "INSERT INTO teams (name) VALUES ('$marker')" >/dev/null
users_before="$(sql 'SELECT count(*) FROM users')"
stop_postgres "$PGDATA_DIR" >/dev/null

setup_once
start_postgres "$CLUSTER" "$PORT_CHECK" >/dev/null
kept="$(sql "SELECT count(*) FROM teams WHERE name = '$marker'")"
users_after="$(sql 'SELECT count(*) FROM users')"
[ "$kept" = 1 ] || die "a second npm start lost the row written after the first (found $kept)"
[ "$users_after" = "$users_before" ] || die "a second npm start changed the demo users ($users_before -> $users_after)"
log "second start kept the data ($users_after demo users, marker row kept)"
