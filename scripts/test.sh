#!/usr/bin/env bash
# npm test: its own set-up (packages, PostgreSQL, a fresh test database, Chromium), then
# unit tests, integration tests against the real database, and browser tests against a
# production build served on loopback.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
cd "$ROOT"
ensure_node
ensure_node_modules
ensure_pdftoppm
ensure_chromium
ensure_postgres_installed
ensure_cluster
start_postgres
reset_database antinode_test
prepare_database antinode_test
start_fakes test
export ANTINODE_DIST_DIR=.next-test
# The test machine is shared with other work: the compute threads run at the normal priority here
# (in service they run below the server's own thread; lib/compute/limits.ts).
export ANTINODE_COMPUTE_NICE="${ANTINODE_COMPUTE_NICE:-0}"
export ANTINODE_JOBS_NICE="${ANTINODE_JOBS_NICE:-0}"

step "Unit tests"
node node_modules/vitest/vitest.mjs run --project unit || fail "unit tests failed"

step "Integration tests (database antinode_test)"
node node_modules/vitest/vitest.mjs run --project integration || fail "integration tests failed"

step "Building the app for the browser tests"
build_app test-build.log

step "Tests with several app processes (web instances and job workers on the build)"
node node_modules/vitest/vitest.mjs run --project processes || fail "the tests with several app processes failed" "their output is in .data/processes-*.log"

# The worker writes the links in mails: the address the browser tests use (playwright.config.ts).
export ANTINODE_BASE_URL="http://localhost:${ANTINODE_E2E_PORT:-3100}"
start_jobs_worker test
trap 'stop_pid_file "$DATA_DIR/jobs-test.pid" "the job worker (test)"' EXIT

step "Browser tests (Chromium)"
node node_modules/@playwright/test/cli.js test || {
  show_log_tail "$DATA_DIR/e2e-server-${ANTINODE_E2E_PORT:-3100}.log" "the test web server"
  show_log_tail "$DATA_DIR/jobs-test.log" "the job worker"
  show_log_tail "$DATA_DIR/fakes-test.log" "the local fakes (mail, storage, payments)"
  fail "browser tests failed" "see playwright-report/, test-results/ and the logs above (in .data/)"
}

stop_pid_file "$DATA_DIR/fakes-test.pid" "the local fakes (test)"
step "All tests passed"
