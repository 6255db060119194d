#!/usr/bin/env bash
# Stops the test cluster for a few seconds, then starts it again: the database-outage test in
# tests/server runs it while the app is under load. Usage: pg-outage.sh <seconds> (port from RUNNEL_PG_PORT).
source "$(dirname "$0")/common.sh"
seconds="${1:-5}"
port="${RUNNEL_PG_PORT:?RUNNEL_PG_PORT is not set}"
PG_BIN="$(pg_bin_dir)" || die "PostgreSQL server binaries not found"
PGDATA_DIR="$(runnel_state_dir)/pg-test"
[ -f "$PGDATA_DIR/PG_VERSION" ] || die "no test cluster in $PGDATA_DIR"
pg_run "$PG_BIN/pg_ctl" -D "$PGDATA_DIR" -m fast -w stop >/dev/null
echo "stopped $(date +%s%3N)"
sleep "$seconds"
start_postgres test "$port" >/dev/null
echo "started $(date +%s%3N)"
