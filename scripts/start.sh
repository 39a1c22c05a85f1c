#!/usr/bin/env bash
# npm start: install what is missing, start PostgreSQL on loopback, migrate, seed the demo,
# build and serve Antinode on http://localhost:${PORT:-3000}.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"

APP_PORT="${PORT:-3000}"
cd "$ROOT"
ensure_node
ensure_node_modules
ensure_pdftoppm
prepare_database antinode
start_fakes app

if [ "${NODE_ENV:-}" = production ]; then
  step "NODE_ENV=production: the demo data is not seeded"
else
  step "Seeding the demo team (only into an empty database)"
  node node_modules/tsx/dist/cli.mjs scripts/migrate.ts seed || fail "seeding failed" "read the error above"
fi

step "Building the app (next build)"
build_app build.log

stop_pid_file "$DATA_DIR/server.pid" "the previous web server"
export ANTINODE_BASE_URL="${ANTINODE_BASE_URL:-http://localhost:$APP_PORT}"
start_jobs_worker app
step "Serving Antinode"
node scripts/serve.mjs --port "$APP_PORT" --host "${HOST:-127.0.0.1}" &
SERVER_PID=$!
echo "$SERVER_PID" > "$DATA_DIR/server.pid"
trap 'kill $SERVER_PID 2>/dev/null; rm -f "$DATA_DIR/server.pid"; stop_pid_file "$DATA_DIR/jobs-app.pid" "the job worker"; printf "\nThe web server stopped. PostgreSQL keeps running: npm run stop stops it.\n"; exit 0' INT TERM

wait_for_health "http://127.0.0.1:$APP_PORT/api/v1/health" "$SERVER_PID"

cat <<MSG

  Antinode is running at $ANTINODE_BASE_URL

  Demo sign-ins (password: antinode-demo)
    admin@antinode.test          team admin
    acoustician@antinode.test    acoustician
    engineer@antinode.test       mechanical engineer
    architect@antinode.test      architect
    viewer@antinode.test         viewer

  Mail sent by the app lands in the local inbox: $MAIL_INBOX_URL
  Payments go to the local payment fake: $PAYMENTS_FAKE_URL (webhooks to $PAYMENTS_WEBHOOK_URL)

  Background jobs (schedules, analyses ahead) run in the job worker: log in .data/jobs-app.log.
  Ctrl-C stops the web server and the job worker; npm run stop stops everything npm start started.

MSG
wait "$SERVER_PID"
