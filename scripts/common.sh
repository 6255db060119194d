# Shared set-up steps for `npm start` and `npm test`. Sourced, not run.
# Each step is idempotent: a second run reuses what the first one made.
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$ROOT"
export NEXT_TELEMETRY_DISABLED=1

log() { printf '\033[1;34m[runnel]\033[0m %s\n' "$*"; }
die() { printf '\033[1;31m[runnel]\033[0m %s\n' "$*" >&2; exit 1; }

# Packages: install when node_modules is missing or older than the lockfile.
ensure_node_packages() {
  if [ ! -d node_modules ] || [ ! -f node_modules/.package-lock.json ] \
     || [ package-lock.json -nt node_modules/.package-lock.json ]; then
    log "installing npm packages (npm ci)"
    # Dev dependencies too: the build (TypeScript, Tailwind) and migrations (sequelize-cli) need them.
    npm ci --include=dev --no-audit --no-fund
  fi
}

as_root() { if [ "$(id -u)" -eq 0 ]; then "$@"; else sudo "$@"; fi; }

apt_install() {
  log "installing Debian packages: $*"
  as_root env DEBIAN_FRONTEND=noninteractive apt-get update -qq
  as_root env DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "$@" >/dev/null
}

pg_bin_dir() {
  local d
  for d in /usr/lib/postgresql/*/bin; do
    [ -x "$d/initdb" ] && { echo "$d"; return 0; }
  done
  return 1
}

ensure_postgres_binaries() {
  pg_bin_dir >/dev/null || apt_install postgresql
  PG_BIN="$(pg_bin_dir)" || die "PostgreSQL server binaries not found after install"
  export PG_BIN
}

# PostgreSQL refuses to run as root: run its tools as the 'postgres' OS user when we are root.
PG_OS_USER=""
pg_run() {
  if [ "$(id -u)" -eq 0 ]; then
    if ! id "${PG_OS_USER:=postgres}" >/dev/null 2>&1; then
      useradd --system --no-create-home --shell /usr/sbin/nologin postgres
    fi
    runuser -u "$PG_OS_USER" -- "$@"
  else
    "$@"
  fi
}

# $1 data dir, $2 port. Cluster lives in the project (git-ignored); its socket outside it
# (a socket inside the tree breaks the Tailwind file scan during `next build`).
start_postgres() {
  local data="$1" port="$2"
  PG_SOCKET_DIR="${TMPDIR:-/tmp}/runnel-pg-$port"
  mkdir -p "$PG_SOCKET_DIR" "$data"
  if [ "$(id -u)" -eq 0 ]; then
    pg_run true
    chown "${PG_OS_USER:-postgres}" "$PG_SOCKET_DIR" "$data"
    chmod 700 "$data"
  fi
  if [ ! -f "$data/PG_VERSION" ]; then
    log "initialising PostgreSQL cluster in $data"
    pg_run "$PG_BIN/initdb" -D "$data" -U runnel --auth=trust --encoding=UTF8 --locale=C.UTF-8 >/dev/null
  fi
  if pg_run "$PG_BIN/pg_ctl" -D "$data" status >/dev/null 2>&1; then
    log "PostgreSQL already running on 127.0.0.1:$port"
  else
    log "starting PostgreSQL on 127.0.0.1:$port"
    pg_run "$PG_BIN/pg_ctl" -D "$data" -w -t 60 -l "$data/server.log" \
      -o "-h 127.0.0.1 -p $port -k $PG_SOCKET_DIR" start >/dev/null \
      || { tail -n 30 "$data/server.log" >&2; die "PostgreSQL did not start (log above)"; }
  fi
}

stop_postgres() {
  local data="$1"
  if pg_run "$PG_BIN/pg_ctl" -D "$data" status >/dev/null 2>&1; then
    log "stopping PostgreSQL"
    pg_run "$PG_BIN/pg_ctl" -D "$data" -m fast -w stop >/dev/null || true
  fi
}

# $1 port, $2 database name
ensure_database() {
  local port="$1" db="$2"
  if ! pg_run "$PG_BIN/psql" -h 127.0.0.1 -p "$port" -U runnel -d postgres -tAc \
       "SELECT 1 FROM pg_database WHERE datname = '$db'" | grep -q 1; then
    log "creating database $db"
    pg_run "$PG_BIN/createdb" -h 127.0.0.1 -p "$port" -U runnel "$db"
  fi
}

# A session secret generated once into a git-ignored file, unless one is given.
ensure_session_secret() {
  if [ -z "${NEXTAUTH_SECRET:-}" ]; then
    mkdir -p .secrets
    [ -s .secrets/session-secret ] || node -e "process.stdout.write(require('crypto').randomBytes(48).toString('base64url'))" > .secrets/session-secret
    NEXTAUTH_SECRET="$(cat .secrets/session-secret)"
    export NEXTAUTH_SECRET
  fi
}

migrate_and_seed() {
  log "running migrations"
  npx sequelize-cli db:migrate >/dev/null
  log "seeding the demo scenario (once)"
  npx sequelize-cli db:seed:all >/dev/null
}
