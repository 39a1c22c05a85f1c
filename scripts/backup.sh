#!/usr/bin/env bash
# npm run backup [FOLDER]: a consistent dump of the app's database and a copy of its stored files,
# into FOLDER (default backups/<date-time>). PostgreSQL and the file store are started if they are not.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
cd "$ROOT"
ensure_node
ensure_node_modules
ensure_postgres_installed
ensure_cluster
start_postgres
export PGPASSWORD; PGPASSWORD="$(cat "$PG_PASSWORD_FILE")"
export DATABASE_URL; DATABASE_URL="${DATABASE_URL:-$(database_url antinode)}"
start_fakes app
export ANTINODE_PG_BIN="$PG_BIN"
step "Backing up"
node node_modules/tsx/dist/cli.mjs scripts/backup.ts backup "$@" || fail "the backup failed" "read the error above; nothing was changed"
