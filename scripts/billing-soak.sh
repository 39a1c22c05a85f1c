#!/usr/bin/env bash
# The billing browser tests, many times in a row, while the machine is kept busy: a check that
# webhooks are not lost when the server answers slowly (the payment fake retries on a growing
# delay). Usage: bash scripts/billing-soak.sh [repeats, default 20]. Its own set-up, like
# npm test (a fresh antinode_test database, the local fakes, a production build), then two
# CPU-burning loops, one per core, each stopped when the run ends and in any case after an hour.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
cd "$ROOT"
REPEATS="${1:-20}"
ensure_node
ensure_node_modules
ensure_chromium
ensure_postgres_installed
ensure_cluster
start_postgres
reset_database antinode_test
prepare_database antinode_test
start_fakes test
export ANTINODE_DIST_DIR=.next-test

step "Building the app for the browser tests"
build_app test-build.log
# Webhooks are applied by the job worker.
start_jobs_worker test

step "Keeping both cores busy (two loops, at most an hour)"
BURNERS=()
for _ in 1 2; do
  timeout 3600 node -e 'for (;;) {}' &
  BURNERS+=($!)
done
trap 'kill "${BURNERS[@]}" 2>/dev/null; stop_pid_file "$DATA_DIR/jobs-test.pid" "the job worker (test)"' EXIT

step "Billing browser tests, $REPEATS times in a row"
node node_modules/@playwright/test/cli.js test tests/e2e/team-billing.spec.ts --repeat-each "$REPEATS" || {
  show_log_tail "$DATA_DIR/e2e-server-${ANTINODE_E2E_PORT:-3100}.log" "the test web server"
  show_log_tail "$DATA_DIR/fakes-test.log" "the local fakes (mail, storage, payments)"
  fail "a billing browser test failed under load" "see playwright-report/, test-results/ and the logs above (in .data/)"
}
step "All $REPEATS rounds passed under load"
