#!/usr/bin/env bash
# `npm test` (and CI): every suite against its own services, apart from the demo's:
# PostgreSQL 127.0.0.1:54339 (.data/pg-test, database panelpoint_test recreated per run), fakes on
# 2526/8026/4570 (.data/mail-test, .data/s3-test, emptied per run), the app on 127.0.0.1:3100.
# Runs unit+reference, integration, then e2e against a freshly seeded database and a built app;
# keeps going after a failing suite so every count prints, and ends with the line CI reads:
#   Tests: <passed> passed, <failed> failed
# Exits non-zero when anything failed. Stops everything it started, also on Ctrl-C or TERM.
set -euo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/lib-services.sh"
source "$(dirname "${BASH_SOURCE[0]}")/lib-stack.sh"
cd "$PP_ROOT"

# Fixed on purpose, never taken from the shell: a PP_PG_PORT exported for the demo must not let a
# test run reset the development database.
export PP_APP_PORT=3100
export PP_PG_PORT=54339 PP_PG_DATA=.data/pg-test PP_DB_NAME=panelpoint_test PP_DB_RESET=1
export PP_SMTP_PORT=2526 PP_MAIL_API_PORT=8026 PP_MAIL_DIR=.data/mail-test
export PP_S3_PORT=4570 PP_S3_DIR=.data/s3-test
export APP_ENV=test
# The e2e suite walks the footbridge package from draft to Rev 0 itself, so it seeds the scenario without its history.
export PP_SEED_HISTORY=0
pp_export_app_env
export E2E_BASE_URL="$APP_URL"

summary=()
total_passed=0
total_failed=0
summary_printed=0

record() { # <suite> <passed> <failed> [note]
  local line="$1: $2 passed, $3 failed"
  if [[ -n "${4:-}" ]]; then line+=" ($4)"; fi
  summary+=("$line")
  total_passed=$((total_passed + $2))
  total_failed=$((total_failed + $3))
}

print_summary() {
  summary_printed=1
  echo
  local line
  for line in "${summary[@]}"; do echo "$line"; done
  echo "Tests: $total_passed passed, $total_failed failed"
}

# run_suite <label> <name> <vitest args...>: counts come from vitest's JSON report. A run that
# fails without a failed test (a file that does not load, a crash before the report) counts as
# failed too, so a broken suite can never read as green.
run_suite() {
  local label="$1" json=".run/vitest-$2.json" status=0 counts passed failed skipped failed_files note=""
  shift 2
  rm -f "$json"
  pp_log "== $label"
  pp_run node_modules/.bin/vitest run "$@" --passWithNoTests \
    --reporter=default --reporter=json --outputFile.json="$json" || status=$?
  counts=""
  if [[ -f "$json" ]]; then
    counts="$(node -e 'const r = JSON.parse(require("fs").readFileSync(process.argv[1], "utf8"));
      console.log(r.numPassedTests, r.numFailedTests, r.numPendingTests + r.numTodoTests, r.numFailedTestSuites)' "$json")" || counts=""
  fi
  if [[ -z "$counts" ]]; then
    record "$label" 0 1 "vitest exited $status without a report"
    return 0
  fi
  read -r passed failed skipped failed_files <<<"$counts"
  if [[ "$status" != 0 && "$failed" == 0 ]]; then
    failed=$((failed_files > 0 ? failed_files : 1))
    note="vitest exited $status"
  fi
  if [[ "$skipped" != 0 ]]; then note="${note:+$note, }$skipped skipped"; fi
  record "$label" "$passed" "$failed" "$note"
}

has_tests() { [[ -n "$(find "tests/$1" -name '*.test.ts' -print -quit 2>/dev/null)" ]]; }

pp_lock test

cleanup() {
  local status=$?
  trap '' INT TERM
  trap - EXIT
  pp_stop_spawned
  pp_stop_pg_if_ours test
  rm -f .run/test-*.pid
  if [[ "$summary_printed" == 0 ]]; then
    # Set-up failed or the run was interrupted: still end with the line CI reads, never green.
    record "run" 0 1 "stopped early: set-up failed or interrupted (status $status)"
    print_summary
  fi
  if [[ "$status" == 0 && "$total_failed" != 0 ]]; then status=1; fi
  exit "$status"
}
trap cleanup EXIT
trap 'exit 130' INT
trap 'exit 143' TERM

pp_stop_leftovers test
pp_npm_ci_if_needed
pp_run bash scripts/ensure-system.sh postgresql chromium poppler-utils
# Mail and objects from an earlier run would leak into this one's assertions.
rm -rf "$PP_MAIL_DIR" "$PP_S3_DIR"
pp_start_pg test
pp_start_fakes test
pp_run npm run --silent db:migrate
pp_make_dev_cert

run_suite "unit+reference" unit --project unit --project reference
run_suite "integration" integration --project integration

if ! has_tests e2e; then
  record "e2e" 0 0 "no tests in tests/e2e"
# The e2e suite starts from the demo data alone, whatever the integration tests left behind.
elif pp_run bash scripts/db-start.sh && pp_run npm run --silent db:migrate && pp_run npm run --silent db:seed &&
  pp_build_app && pp_start_worker test && pp_start_app test; then
  run_suite "e2e" e2e --project e2e
else
  record "e2e" 0 1 "database, build or app start failed: see above"
fi

pp_stop_spawned
print_summary
[[ "$total_failed" == 0 ]]
