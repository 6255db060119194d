#!/usr/bin/env bash
# Local stand-ins for hosted services (mail, object storage), on loopback only.
# `fakes.sh start` launches the ones the app uses; `fakes.sh stop` ends them.
set -euo pipefail
cd "$(dirname "$0")/.."
mkdir -p .runtime
case "${1:-}" in
  start)
    for f in scripts/fakes/*.mjs; do
      [ -e "$f" ] || continue
      name="$(basename "$f" .mjs)"
      pidfile=".runtime/$name.pid"
      if [ -f "$pidfile" ] && kill -0 "$(cat "$pidfile")" 2>/dev/null; then continue; fi
      node "$f" > ".runtime/$name.log" 2>&1 &
      echo $! > "$pidfile"
    done
    ;;
  stop)
    for pidfile in .runtime/*.pid; do
      [ -e "$pidfile" ] || continue
      kill "$(cat "$pidfile")" 2>/dev/null || true
      rm -f "$pidfile"
    done
    ;;
  *) echo "usage: fakes.sh start|stop" >&2; exit 2 ;;
esac
