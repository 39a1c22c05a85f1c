#!/usr/bin/env bash
# npm run bench: the engine's speed figures, then the plan editor's in Chromium against a
# production build on loopback (its own database, antinode_bench).
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
cd "$ROOT"
ensure_node
ensure_node_modules

step "Acoustic engine"
node node_modules/tsx/dist/cli.mjs bench/run.ts || fail "the engine benchmark failed"

ensure_chromium
ensure_postgres_installed
ensure_cluster
start_postgres
reset_database antinode_bench
prepare_database antinode_bench
export ANTINODE_DIST_DIR=.next-bench
BENCH_PORT="${ANTINODE_BENCH_PORT:-3200}"
# Schedules are stored in the file store: the test profile's fakes (mail, store, payments).
start_fakes test
step "Building the app for the editor benchmark"
build_app bench-build.log
export ANTINODE_BASE_URL="http://localhost:$BENCH_PORT"
start_jobs_worker bench
# The bench measures the server, not the per-person rate limit: one person sends every request here.
# It stands behind a "proxy" on loopback, so the account bench can send each request as its own client.
ANTINODE_ANALYSIS_RATE_PER_MINUTE=1000000 ANTINODE_TRUSTED_PROXIES=127.0.0.1 \
  node scripts/serve.mjs --port "$BENCH_PORT" --host 127.0.0.1 >"$DATA_DIR/bench-server.log" 2>&1 &
SERVER_PID=$!
trap 'kill $SERVER_PID 2>/dev/null; stop_pid_file "$DATA_DIR/jobs-bench.pid" "the job worker (bench)"' EXIT
wait_for_health "http://127.0.0.1:$BENCH_PORT/api/v1/health" "$SERVER_PID"
ANTINODE_BENCH_URL="http://localhost:$BENCH_PORT" node node_modules/tsx/dist/cli.mjs bench/editor/run.ts || fail "the editor benchmark failed"
ANTINODE_BENCH_URL="http://localhost:$BENCH_PORT" node node_modules/tsx/dist/cli.mjs bench/editor/dxf.ts || fail "the DXF drawing benchmark failed"

step "Load on loopback (concurrency 8, an oversized analysis in flight)"
ANTINODE_BENCH_URL="http://127.0.0.1:$BENCH_PORT" ANTINODE_BENCH_SERVER_PID="$SERVER_PID" node node_modules/tsx/dist/cli.mjs bench/load/run.ts || fail "the load benchmark failed"

step "Analysis answers (the 100-segment run, concurrency 8, route and bare handler)"
ANTINODE_BENCH_URL="http://127.0.0.1:$BENCH_PORT" node node_modules/tsx/dist/cli.mjs bench/load/analysis-answers.ts || fail "the analysis answer benchmark failed"

step "Account answers: an address with an account and one without (reset, sign-up)"
ANTINODE_BENCH_URL="http://127.0.0.1:$BENCH_PORT" node node_modules/tsx/dist/cli.mjs bench/accounts/run.ts || fail "the account benchmark failed"

step "Background jobs: schedules issued through the job worker, and the web answers meanwhile"
ANTINODE_BENCH_URL="http://127.0.0.1:$BENCH_PORT" node node_modules/tsx/dist/cli.mjs bench/jobs/run.ts || fail "the job benchmark failed"

step "Treatment schedule PDF"
# @react-pdf/renderer ships ES modules only, so the benchmark is bundled (packages stay external) and run as ESM.
node_modules/.bin/esbuild bench/schedule/run.ts --bundle --platform=node --format=esm --packages=external --jsx=automatic --log-level=warning --outfile="$DATA_DIR/bench-schedule.mjs" || fail "the schedule benchmark did not build"
node "$DATA_DIR/bench-schedule.mjs" || fail "the schedule benchmark failed"
