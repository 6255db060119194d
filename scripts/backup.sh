#!/usr/bin/env bash
# `npm run backup [-- <folder>]`: the database (pg_dump, custom format) and every object of the
# storage bucket into one folder, by default backups/runnel-<UTC time>/ (git-ignored, mode 700).
# Safe while the app runs: pg_dump reads one consistent snapshot.
source "$(dirname "$0")/ops-env.sh"
use_database_and_storage

out="${1:-${RUNNEL_BACKUP_DIR:-backups}/runnel-$(date -u +%Y%m%dT%H%M%SZ)}"
[ -e "$out/database.dump" ] && die "$out already holds a backup; choose another folder"
(umask 077; mkdir -p "$out")
log "backing up the database into $out/database.dump"
"$PG_BIN/pg_dump" --format=custom --no-owner --no-privileges --file "$out/database.dump" --dbname "$DATABASE_URL" \
  || die "pg_dump failed (message above); the backup in $out is incomplete"
log "backing up object storage (bucket ${RUNNEL_S3_BUCKET:-runnel-files})"
node --disable-warning=NodeVersionSupportWarning --import tsx scripts/backup-objects.ts save "$out" || die "object storage backup failed; the backup in $out is incomplete"
date -u +%Y-%m-%dT%H:%M:%SZ > "$out/COMPLETE"
log "backup complete: $out"
