#!/usr/bin/env bash
# `npm run restore -- <folder>`: puts a backup made by `npm run backup` back: the database is
# replaced by the dump (in one transaction) and the bucket made to hold exactly the saved objects.
# Stop the app first: restoring replaces every table under it.
source "$(dirname "$0")/ops-env.sh"

from="${1:-}"
[ -n "$from" ] || die "usage: npm run restore -- <backup folder> (made by npm run backup)"
[ -f "$from/COMPLETE" ] || die "$from is not a complete Runnel backup (no COMPLETE marker); nothing restored"
[ -f "$from/database.dump" ] || die "$from/database.dump is missing; nothing restored"
use_database_and_storage

log "restoring the database from $from/database.dump"
"$PG_BIN/pg_restore" --clean --if-exists --no-owner --no-privileges --single-transaction --exit-on-error \
  --dbname "$DATABASE_URL" "$from/database.dump" \
  || die "pg_restore failed (message above); the database was left as it was"
log "restoring object storage (bucket ${RUNNEL_S3_BUCKET:-runnel-files})"
node --disable-warning=NodeVersionSupportWarning --import tsx scripts/backup-objects.ts load "$from" || die "object storage restore failed (message above)"
log "restore complete from $from"
