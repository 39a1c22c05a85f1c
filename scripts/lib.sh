#!/usr/bin/env bash
# Shared set-up steps for `npm start` and `npm test`. Each step says what it does;
# a failing step says why and what to do, then stops.
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
DATA_DIR="$ROOT/.data"
PG_DATA="$DATA_DIR/pg"
PG_RUN="$DATA_DIR/run"
PG_LOG="$DATA_DIR/postgres.log"
PG_PASSWORD_FILE="$DATA_DIR/pg-password"
DB_PORT="${ANTINODE_DB_PORT:-54329}"
DB_USER="antinode"
export NEXT_TELEMETRY_DISABLED=1

step() { printf '\n\033[1m==> %s\033[0m\n' "$*"; }
info() { printf '    %s\n' "$*"; }
fail() { printf '\n\033[31mStopped: %s\033[0m\n' "$1" >&2; [ -n "${2:-}" ] && printf '  What to do: %s\n' "$2" >&2; exit 1; }

as_root() {
  if [ "$(id -u)" = 0 ]; then "$@"; elif command -v sudo >/dev/null; then sudo "$@"; else
    fail "this step needs root to run: $*" "run it once as root, or install sudo"; fi
}

# Run a command as the user that owns the database cluster (PostgreSQL refuses root).
as_db_owner() {
  # From / so the postgres user never starts in a folder it cannot read.
  if [ "$(id -u)" = 0 ]; then (cd / && runuser -u postgres -- "$@"); else "$@"; fi
}

apt_install() {
  step "Installing $* from Debian's packages"
  export DEBIAN_FRONTEND=noninteractive
  as_root apt-get install -y --no-install-recommends "$@" >/dev/null 2>&1 || {
    info "apt-get install failed; refreshing the package lists and trying again"
    as_root apt-get update >/dev/null || fail "apt-get update failed" "check that Debian's package mirrors are reachable"
    as_root apt-get install -y --no-install-recommends "$@" >/dev/null || fail "could not install $*" "install them by hand: apt-get install $*"
  }
}

ensure_node() {
  local major
  major="$(node -p 'process.versions.node.split(".")[0]' 2>/dev/null || echo 0)"
  [ "$major" = 20 ] || fail "Node.js 20 is required (found: $(node -v 2>/dev/null || echo none))" "install Node.js 20.x"
}

ensure_node_modules() {
  cd "$ROOT"
  if [ ! -f node_modules/.package-lock.json ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
    step "Installing npm packages (npm ci)"
    npm ci --no-audit --no-fund || fail "npm ci failed" "read the npm error above; delete node_modules and try again"
  else
    step "npm packages are installed"
  fi
}

pg_bin_dir() {
  local dir
  dir="$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1 || true)"
  [ -n "$dir" ] && [ -x "$dir/initdb" ] && echo "$dir"
}

ensure_postgres_installed() {
  if [ -z "$(pg_bin_dir)" ]; then apt_install postgresql; fi
  PG_BIN="$(pg_bin_dir)" || fail "PostgreSQL's programs were not found under /usr/lib/postgresql" "apt-get install postgresql"
  step "PostgreSQL found in $PG_BIN"
}

# Every folder above the cluster must be traversable by the user that runs PostgreSQL.
ensure_traversable() {
  [ "$(id -u)" = 0 ] || return 0
  local dir="$DATA_DIR"
  while [ "$dir" != "/" ]; do
    if ! runuser -u postgres -- test -x "$dir" 2>/dev/null; then
      info "letting the postgres user pass through $dir (chmod o+x)"
      chmod o+x "$dir" || fail "the postgres user cannot reach $dir" "chmod o+x $dir"
    fi
    dir="$(dirname "$dir")"
  done
}

ensure_cluster() {
  mkdir -p "$DATA_DIR"
  ensure_traversable
  if [ ! -f "$PG_DATA/PG_VERSION" ]; then
    step "Creating a PostgreSQL cluster in .data/pg (owned by $( [ "$(id -u)" = 0 ] && echo postgres || id -un ))"
    mkdir -p "$PG_DATA" "$PG_RUN"
    [ -f "$PG_PASSWORD_FILE" ] || node -e 'process.stdout.write(require("crypto").randomBytes(18).toString("base64url"))' > "$PG_PASSWORD_FILE"
    chmod 600 "$PG_PASSWORD_FILE"
    if [ "$(id -u)" = 0 ]; then chown postgres "$PG_DATA" "$PG_RUN"; fi
    local pwcopy="$PG_RUN/initdb-password"
    cp "$PG_PASSWORD_FILE" "$pwcopy"
    if [ "$(id -u)" = 0 ]; then chown postgres "$pwcopy"; fi
    as_db_owner "$PG_BIN/initdb" -D "$PG_DATA" -U "$DB_USER" --pwfile="$pwcopy" --auth=scram-sha-256 --encoding=UTF8 --locale=C.UTF-8 >/dev/null \
      || { rm -f "$pwcopy"; fail "initdb failed" "remove .data/pg and try again"; }
    rm -f "$pwcopy"
  fi
  mkdir -p "$PG_RUN"
  if [ "$(id -u)" = 0 ]; then chown postgres "$PG_RUN"; fi
}

start_postgres() {
  if as_db_owner "$PG_BIN/pg_ctl" -D "$PG_DATA" status >/dev/null 2>&1; then
    step "PostgreSQL is already running (port $DB_PORT)"
    return 0
  fi
  step "Starting PostgreSQL on 127.0.0.1:$DB_PORT"
  touch "$PG_LOG"; if [ "$(id -u)" = 0 ]; then chown postgres "$PG_LOG"; fi
  as_db_owner "$PG_BIN/pg_ctl" -D "$PG_DATA" -l "$PG_LOG" -w -t 60 \
    -o "-c listen_addresses=127.0.0.1 -p $DB_PORT -k $PG_RUN" start >/dev/null \
    || { tail -n 20 "$PG_LOG" >&2; fail "PostgreSQL did not start (log above, in .data/postgres.log)" "is port $DB_PORT taken? set ANTINODE_DB_PORT to another port"; }
}

database_url() { echo "postgres://$DB_USER:$(cat "$PG_PASSWORD_FILE")@127.0.0.1:$DB_PORT/$1"; }

ensure_database() {
  local name="$1"
  export PGPASSWORD; PGPASSWORD="$(cat "$PG_PASSWORD_FILE")"
  if ! psql -h 127.0.0.1 -p "$DB_PORT" -U "$DB_USER" -d postgres -tAc "select 1 from pg_database where datname='$name'" | grep -q 1; then
    step "Creating database $name"
    psql -h 127.0.0.1 -p "$DB_PORT" -U "$DB_USER" -d postgres -qc "create database \"$name\"" || fail "could not create database $name"
  fi
}

# Bring the database cluster up and make sure the named database exists and is migrated.
prepare_database() {
  local name="$1"
  ensure_postgres_installed
  ensure_cluster
  start_postgres
  command -v psql >/dev/null || apt_install postgresql-client
  ensure_database "$name"
  export DATABASE_URL; DATABASE_URL="$(database_url "$name")"
  step "Migrating database $name"
  node node_modules/tsx/dist/cli.mjs scripts/migrate.ts up || fail "migrations failed" "read the error above; nothing was changed by the failed migration"
}

stop_postgres() {
  PG_BIN="$(pg_bin_dir)" || return 0
  if [ -f "$PG_DATA/PG_VERSION" ] && as_db_owner "$PG_BIN/pg_ctl" -D "$PG_DATA" status >/dev/null 2>&1; then
    step "Stopping PostgreSQL"
    as_db_owner "$PG_BIN/pg_ctl" -D "$PG_DATA" -m fast -w stop >/dev/null
  fi
}

stop_pid_file() {
  local file="$1" label="$2" pid
  [ -f "$file" ] || return 0
  pid="$(cat "$file")"
  if kill -0 "$pid" 2>/dev/null; then
    step "Stopping $label (pid $pid)"
    kill "$pid" 2>/dev/null || true
    for _ in $(seq 1 50); do kill -0 "$pid" 2>/dev/null || break; sleep 0.1; done
    kill -9 "$pid" 2>/dev/null || true
  fi
  rm -f "$file"
}

# Wait until the app answers its health check, or its process dies.
wait_for_health() {
  local url="$1" pid="$2"
  for _ in $(seq 1 150); do
    node -e 'fetch(process.argv[1]).then(r=>process.exit(r.ok?0:1),()=>process.exit(1))' "$url" && return 0
    kill -0 "$pid" 2>/dev/null || fail "the web server exited while starting" "read its output above"
    sleep 0.2
  done
  fail "the web server did not answer $url within 30 s"
}

# The end of a log, for a failure's cause: `show_log_tail <file> <what it is>`.
show_log_tail() {
  [ -f "$1" ] || return 0
  printf '\n\033[1m--- last 60 lines of %s (%s) ---\033[0m\n' "${1#"$ROOT"/}" "$2" >&2
  tail -n 60 "$1" >&2
}

ensure_chromium() {
  if [ ! -x /usr/bin/chromium ]; then apt_install chromium; fi
  step "Chromium found: $(/usr/bin/chromium --version 2>/dev/null | head -n 1)"
}

reset_database() {
  local name="$1"
  export PGPASSWORD; PGPASSWORD="$(cat "$PG_PASSWORD_FILE")"
  step "Recreating database $name"
  psql -h 127.0.0.1 -p "$DB_PORT" -U "$DB_USER" -d postgres -qc "drop database if exists \"$name\" with (force)" >/dev/null
}

# Local fakes of outside services (mail, file storage, payments), on loopback; see scripts/fakes.ts.
start_fakes() {
  local profile="$1" pid_file="$DATA_DIR/fakes-$1.pid" log="$DATA_DIR/fakes-$1.log"
  eval "$(node node_modules/tsx/dist/cli.mjs scripts/fakes.ts env "$profile")"
  if [ -f "$pid_file" ] && kill -0 "$(cat "$pid_file")" 2>/dev/null; then
    if node -e 'fetch(process.argv[1]).then(()=>process.exit(0),()=>process.exit(1))' "$PAYMENTS_FAKE_URL"; then
      step "Local fakes ($profile) are already running"
      return 0
    fi
    stop_pid_file "$pid_file" "the local fakes ($profile), started without the payment fake"
  fi
  step "Starting the local fakes ($profile): mail inbox $MAIL_INBOX_URL, file storage $S3_ENDPOINT, payments $PAYMENTS_FAKE_URL"
  nohup node node_modules/tsx/dist/cli.mjs scripts/fakes.ts run "$profile" >"$log" 2>&1 &
  echo $! > "$pid_file"
  for _ in $(seq 1 100); do
    grep -q 'fakes ready' "$log" 2>/dev/null && return 0
    kill -0 "$(cat "$pid_file")" 2>/dev/null || { cat "$log" >&2; fail "the local fakes did not start (log in .data/fakes-$profile.log)" "is another program using their ports?"; }
    sleep 0.2
  done
  fail "the local fakes did not report ready within 20 s (log in .data/fakes-$profile.log)"
}

# PDF plans become images through poppler's pdftoppm (Debian's poppler-utils).
ensure_pdftoppm() {
  if ! command -v pdftoppm >/dev/null; then apt_install poppler-utils; fi
}

# The compute pool's worker thread, bundled into .compute/worker.mjs (lib/compute/).
build_compute_worker() {
  node node_modules/tsx/dist/cli.mjs scripts/build-worker.ts >/dev/null || fail "the compute worker did not build" "read the error above"
}

# The job worker (lib/jobs/worker-main.ts, bundled by build_compute_worker) beside the web server,
# with the environment of the caller (DATABASE_URL, the fakes' settings); its output in .data/jobs-<name>.log.
start_jobs_worker() {
  local name="$1" pid_file="$DATA_DIR/jobs-$1.pid" log="$DATA_DIR/jobs-$1.log"
  stop_pid_file "$pid_file" "the previous job worker ($name)"
  step "Starting the job worker ($name; log in .data/jobs-$name.log)"
  # Background work takes one compute thread: asked-for analyses in the web server keep the rest.
  ANTINODE_COMPUTE_THREADS="${ANTINODE_JOBS_COMPUTE_THREADS:-1}" nohup node .compute/jobs-worker.mjs >"$log" 2>&1 &
  echo $! > "$pid_file"
  for _ in $(seq 1 150); do
    grep -q 'job worker ready' "$log" 2>/dev/null && return 0
    kill -0 "$(cat "$pid_file")" 2>/dev/null || { tail -n 30 "$log" >&2; fail "the job worker did not start (log in .data/jobs-$name.log)" "read the error above"; }
    sleep 0.2
  done
  fail "the job worker did not report ready within 30 s (log in .data/jobs-$name.log)"
}

# next build into $ANTINODE_DIST_DIR (default .next), its output kept in .data/<log name>.
build_app() {
  local log="$DATA_DIR/$1"
  build_compute_worker
  node node_modules/next/dist/bin/next build >"$log" 2>&1 || { tail -n 40 "$log" >&2; fail "the build failed (full log in .data/$1)"; }
}
