#!/usr/bin/env bash
# npm run restore FOLDER: bring a backup (npm run backup) back into an empty installation: the
# database is created if missing and must hold no tables; the stored files go back into the store.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
cd "$ROOT"
[ -n "${1:-}" ] || fail "say which backup to restore" "npm run restore backups/<date-time>"
[ -f "$1/manifest.json" ] || fail "$1 is not a backup folder (it has no manifest.json)" "give the folder npm run backup wrote"
ensure_node
ensure_node_modules
ensure_postgres_installed
ensure_cluster
start_postgres
command -v psql >/dev/null || apt_install postgresql-client
ensure_database antinode
export DATABASE_URL; DATABASE_URL="${DATABASE_URL:-$(database_url antinode)}"
start_fakes app
export ANTINODE_PG_BIN="$PG_BIN"
step "Restoring $1"
node node_modules/tsx/dist/cli.mjs scripts/backup.ts restore "$1" || fail "the restore failed" "read the error above"
step "Restored: npm start serves it"
