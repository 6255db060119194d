#!/usr/bin/env bash
# `npm run backup [-- <folder>]`: the database (pg_dump, custom format) and every object of the
# storage bucket into one folder, by default backups/runnel-<UTC time>/ (git-ignored, mode 700).
# Safe while the app runs: pg_dump reads one consistent snapshot. The backup is written beside the
# folder and renamed to it when complete, so the folder exists only as a whole backup; a failure
# removes what was written and says which step failed.
source "$(dirname "$0")/ops-env.sh"
use_database_and_storage

out="${1:-${RUNNEL_BACKUP_DIR:-backups}/runnel-$(date -u +%Y%m%dT%H%M%SZ)}"
out="${out%/}"
if [ -e "$out" ] && [ -n "$(ls -A "$out" 2>/dev/null)" ]; then die "$out already exists and is not empty; choose another folder"; fi
(umask 077; mkdir -p "$(dirname "$out")")
partial="$(mktemp -d "$out.partial-XXXXXX")" || die "cannot write beside $out"
remove_partial() { rm -rf "$partial"; }
trap 'remove_partial; ops_cleanup' EXIT

log "backing up the database into $out/database.dump"
"$PG_BIN/pg_dump" --format=custom --no-owner --no-privileges --file "$partial/database.dump" --dbname "$DATABASE_URL" \
  || die "pg_dump failed (message above); no backup was written"
log "backing up object storage (bucket ${RUNNEL_S3_BUCKET:-runnel-files})"
node --disable-warning=NodeVersionSupportWarning --import tsx scripts/backup-objects.ts save "$partial" \
  || die "object storage backup failed (message above); no backup was written"
date -u +%Y-%m-%dT%H:%M:%SZ > "$partial/COMPLETE"
[ -d "$out" ] && rmdir "$out"
mv "$partial" "$out" || die "could not move the finished backup from $partial to $out"
log "backup complete: $out"
