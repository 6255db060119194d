#!/usr/bin/env bash
# Local stand-ins for hosted services (mail, object storage), on loopback only.
# `fakes.sh start` launches the ones the app uses; `fakes.sh stop` ends them.
# Pid and log files go to $RUNNEL_RUNTIME_DIR, so `npm test` never stops the fakes of `npm start`.
set -euo pipefail
cd "$(dirname "$0")/.."
RUNTIME="${RUNNEL_RUNTIME_DIR:-.runtime}"
mkdir -p "$RUNTIME"
case "${1:-}" in
  start)
    for f in scripts/fakes/*.mjs; do
      [ -e "$f" ] || continue
      name="$(basename "$f" .mjs)"
      pidfile="$RUNTIME/$name.pid"
      if [ -f "$pidfile" ] && kill -0 "$(cat "$pidfile")" 2>/dev/null; then continue; fi
      flags=()
      # The storage fake signs its listing continuation tokens with DES, which OpenSSL 3 keeps in
      # its legacy provider: without it every bucket of more than one page (1,000 keys) fails to list.
      [ "$name" = s3 ] && flags=(--openssl-legacy-provider)
      node "${flags[@]}" "$f" > "$RUNTIME/$name.log" 2>&1 &
      echo $! > "$pidfile"
    done
    ;;
  stop)
    for pidfile in "$RUNTIME"/*.pid; do
      [ -e "$pidfile" ] || continue
      kill "$(cat "$pidfile")" 2>/dev/null || true
      rm -f "$pidfile"
    done
    ;;
  *) echo "usage: fakes.sh start|stop" >&2; exit 2 ;;
esac
