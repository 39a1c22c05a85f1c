#!/usr/bin/env bash
# npm run stop: stop what npm start (or npm test) started.
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"
stop_pid_file "$DATA_DIR/server.pid" "the web server"
stop_pid_file "$DATA_DIR/test-server.pid" "the test web server"
stop_pid_file "$DATA_DIR/jobs-app.pid" "the job worker (app)"
stop_pid_file "$DATA_DIR/jobs-test.pid" "the job worker (test)"
stop_pid_file "$DATA_DIR/jobs-bench.pid" "the job worker (bench)"
stop_pid_file "$DATA_DIR/fakes-app.pid" "the local fakes (app)"
stop_pid_file "$DATA_DIR/fakes-test.pid" "the local fakes (test)"
stop_postgres
step "Stopped"
