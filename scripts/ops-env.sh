# For `npm run backup` / `npm run restore`: the database and object storage to work on. Sourced.
# With DATABASE_URL set: that database and the RUNNEL_S3_* storage (production, or any given one).
# Without: `npm start`'s development set-up; its PostgreSQL and fake S3 are started for the time of
# the command when they are not running, and stopped again after.
source "$(dirname "${BASH_SOURCE[0]}")/common.sh"

OPS_STARTED_PG=""
OPS_STARTED_FAKES=""
ops_cleanup() {
  set +e
  [ -n "$OPS_STARTED_FAKES" ] && bash scripts/fakes.sh stop
  [ -n "$OPS_STARTED_PG" ] && stop_postgres "$OPS_STARTED_PG"
}

use_database_and_storage() {
  ensure_node_packages
  ensure_postgres_binaries
  trap ops_cleanup EXIT
  if [ -z "${DATABASE_URL:-}" ]; then
    export RUNNEL_ENV="${RUNNEL_ENV:-development}"
    development_settings
    ensure_session_secret
    ensure_pg_password
    local data
    data="$(runnel_state_dir)/pg-${RUNNEL_PG_CLUSTER:-dev}"
    postgres_running "$data" || OPS_STARTED_PG="$data"
    start_postgres "${RUNNEL_PG_CLUSTER:-dev}" "$RUNNEL_PG_PORT" >/dev/null
    ensure_database "$RUNNEL_PG_PORT" "$RUNNEL_DB_NAME"
    export DATABASE_URL="$(database_url "$RUNNEL_PG_PORT" "$RUNNEL_DB_NAME")"
    local pidfile="$RUNNEL_RUNTIME_DIR/s3.pid"
    if ! { [ -f "$pidfile" ] && kill -0 "$(cat "$pidfile")" 2>/dev/null; }; then
      OPS_STARTED_FAKES=1
      bash scripts/fakes.sh start
      wait_for_port "${RUNNEL_S3_PORT}"
    fi
  elif [ "${RUNNEL_ENV:-}" = production ]; then
    node --import tsx scripts/check-env.ts >/dev/null || die "the production settings are incomplete (run npm start to see which)"
  else
    ensure_session_secret
  fi
}

# $1 port on 127.0.0.1: waits up to 20 s for something to listen there.
wait_for_port() {
  local i
  for i in $(seq 1 100); do
    (exec 3<>"/dev/tcp/127.0.0.1/$1") 2>/dev/null && return 0
    sleep 0.2
  done
  die "nothing listens on 127.0.0.1:$1"
}
