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

# A fresh clone in the same place makes a new .secrets/pg-password while the clusters outside the
# clone keep the old one. The password is kept beside the clusters for such a clone to take up,
# and a test-only cluster whose password no longer matches is made afresh instead of stopping here.
[ "$(cat "$(cluster_password_file)")" = "$PG_PASSWORD" ] \
  || die "the cluster password is not kept beside the clusters ($(cluster_password_file))"
sql "ALTER ROLE runnel PASSWORD 'a password from an earlier clone'" >/dev/null
stop_postgres "$PGDATA_DIR" >/dev/null
start_postgres "$CLUSTER" "$PORT_CHECK" >/dev/null
[ "$(pg_client "$PG_BIN/psql" -h 127.0.0.1 -p "$PORT_CHECK" -U runnel -d postgres -tAc \
     "SELECT count(*) FROM pg_database WHERE datname = 'runnel'")" = 0 ] \
  || die "a test cluster made with another password was not made afresh"
log "a test cluster made with another password is made afresh"
