#!/usr/bin/env bash
# `npm run restore -- <folder>`: puts a backup made by `npm run backup` back: the bucket is made to
# hold exactly the saved objects, then the database is replaced by the dump in one transaction.
# All or nothing: the whole backup is checked before anything changes; the objects the restore
# replaces or removes are kept aside until the database half has succeeded, and put back if it
# fails (or if storage fails part way), so a failed restore leaves database and storage as they were.
# Stop the app first: restoring replaces every table under it.
source "$(dirname "$0")/ops-env.sh"

from="${1:-}"
[ -n "$from" ] || die "usage: npm run restore -- <backup folder> (made by npm run backup)"
[ -f "$from/COMPLETE" ] || die "$from is not a complete Runnel backup (no COMPLETE marker); nothing restored"
[ -f "$from/database.dump" ] || die "$from/database.dump is missing; nothing restored"
use_database_and_storage

"$PG_BIN/pg_restore" --list "$from/database.dump" >/dev/null \
  || die "$from/database.dump cannot be read (message above); nothing restored"

objects() { node --disable-warning=NodeVersionSupportWarning --import tsx scripts/backup-objects.ts "$@"; }
journal="$(mktemp -d "${TMPDIR:-/tmp}/runnel-restore-XXXXXX")" || die "cannot make a scratch folder; nothing restored"
undo_hint="node --import tsx scripts/backup-objects.ts undo $journal"
# The journal (the objects as they were) goes only once the bucket is whole again: restored with the
# database, or put back. Stopped any other way (Ctrl-C, a crash), it stays, and this says where.
bucket_whole=""
finish() {
  if [ -n "$bucket_whole" ] || [ ! -f "$journal/journal.json" ]; then
    rm -rf "$journal"
  else
    printf '\033[1;31m[runnel]\033[0m object storage may be part restored: the objects as they were are in %s; put them back with: %s\n' "$journal" "$undo_hint" >&2
  fi
  ops_cleanup
}
trap finish EXIT

log "restoring object storage (bucket ${RUNNEL_S3_BUCKET:-runnel-files})"
rc=0
objects load "$from" "$journal" || rc=$?
if [ "$rc" = 1 ]; then
  bucket_whole=1
  die "object storage restore failed (message above); object storage is as it was and the database was not touched"
elif [ "$rc" != 0 ]; then
  # 3: the bucket could not be put back; anything else: the step ended abnormally (a signal, a crash).
  if [ "$rc" != 3 ] && [ -f "$journal/journal.json" ] && objects undo "$journal"; then
    bucket_whole=1
    die "object storage restore stopped part way (exit status $rc); the bucket was put back as it was and the database was not touched"
  fi
  die "object storage restore failed and the bucket could not be put back (message above); the database was not touched"
fi

log "restoring the database from $from/database.dump"
if ! "$PG_BIN/pg_restore" --clean --if-exists --no-owner --no-privileges --single-transaction --exit-on-error \
  --dbname "$DATABASE_URL" "$from/database.dump"; then
  log "putting object storage back as it was"
  if objects undo "$journal"; then
    bucket_whole=1
    die "pg_restore failed (message above); the database was left as it was and object storage was put back as it was"
  fi
  die "pg_restore failed (message above); the database was left as it was, but object storage could not be put back (message above)"
fi
bucket_whole=1
log "restore complete from $from"
