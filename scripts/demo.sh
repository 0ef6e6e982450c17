#!/usr/bin/env bash
# `npm run demo`: from a fresh clone to a running Panelpoint at http://localhost:3000 with the demo
# firm seeded. Data stays in .data/ between runs (seeding happens only into an empty database).
# Ctrl-C stops everything this run started; a PostgreSQL that was already running stays running.
#   PP_APP_PORT (3000)  PP_PG_PORT (54329)  PP_PG_DATA (.data/pg)  PP_DB_NAME (panelpoint)
#   PP_SMTP_PORT (2525) PP_MAIL_API_PORT (8025)  PP_S3_PORT (4569)  PP_S3_DIR (.data/s3)  PP_MAIL_DIR (.data/mail)
set -euo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/lib-services.sh"
source "$(dirname "${BASH_SOURCE[0]}")/lib-stack.sh"
cd "$PP_ROOT"

export PP_APP_PORT="${PP_APP_PORT:-3000}"
export PP_PG_PORT="${PP_PG_PORT:-54329}" PP_PG_DATA="${PP_PG_DATA:-.data/pg}" PP_DB_NAME="${PP_DB_NAME:-panelpoint}"
export PP_SMTP_PORT="${PP_SMTP_PORT:-2525}" PP_MAIL_API_PORT="${PP_MAIL_API_PORT:-8025}" PP_MAIL_DIR="${PP_MAIL_DIR:-.data/mail}"
export PP_S3_PORT="${PP_S3_PORT:-4569}" PP_S3_DIR="${PP_S3_DIR:-.data/s3}"
# A demo must never wipe its own data.
export PP_DB_RESET=0
export APP_ENV=development
pp_export_app_env

pp_lock demo

cleanup() {
  local status=$?
  # A second Ctrl-C must not cut the clean-up short and leave processes behind.
  trap '' INT TERM
  trap - EXIT
  pp_stop_spawned
  pp_stop_pg_if_ours demo
  rm -f .run/demo-*.pid
  exit "$status"
}
trap cleanup EXIT
trap 'exit 130' INT
trap 'exit 143' TERM

pp_stop_leftovers demo
pp_npm_ci_if_needed
pp_run bash scripts/ensure-system.sh postgresql chromium poppler-utils
pp_start_pg demo
pp_start_fakes demo
pp_run npm run --silent db:migrate
pp_make_dev_cert
# Assigned first so that a failing check stops the demo instead of silently skipping the seed.
firms="$(node_modules/.bin/tsx scripts/has-seed.ts)"
if [[ "$firms" == 0 ]]; then
  pp_log "seeding the demo data"
  pp_run npm run --silent db:seed
fi
pp_build_app || pp_die "next build failed"
pp_start_worker demo
pp_start_app demo || exit 1

echo
echo "Panelpoint is running at $APP_URL"
# The logins come from the seed's own data (scripts/print-demo-logins.ts) or, failing that, a text file.
if [[ -f scripts/print-demo-logins.ts ]]; then
  node_modules/.bin/tsx scripts/print-demo-logins.ts || pp_log "(could not print the demo logins)"
elif [[ -f db/seeds/demo-logins.txt ]]; then
  echo "Demo logins:"
  sed 's/^/  /' db/seeds/demo-logins.txt
else
  echo "(no demo logins yet: scripts/print-demo-logins.ts or db/seeds/demo-logins.txt will list them)"
fi
echo "Captured e-mail: $MAIL_CAPTURE_URL/messages"
echo "Logs: .run/demo-app.log .run/demo-worker.log .run/demo-fakes.log; Ctrl-C stops everything."

# Run until Ctrl-C, or until one of the processes dies (then stop the rest rather than half-run).
pids=("$PP_APP_PID")
for p in "${PP_SPAWNED[@]}"; do [[ "$p" == "$PP_APP_PID" ]] || pids+=("$p"); done
status=0
wait -n "${pids[@]}" || status=$?
pp_log "a demo process exited (status $status); stopping the rest"
exit 1
