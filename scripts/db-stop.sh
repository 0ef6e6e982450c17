#!/usr/bin/env bash
# Stops the project's PostgreSQL cluster (fast mode: open sessions are cut, nothing is lost).
# Same PP_PG_DATA as db-start.sh; doing nothing when it is not running.
set -euo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/lib-services.sh"

pp_pg_paths
shown_data="${PG_DATA#"$PP_ROOT"/}"
if ! pp_pg_running "$PG_DATA"; then
  echo "PostgreSQL (data $shown_data) is not running"
  exit 0
fi

bindir="$(pp_pg_bindir_for "$PG_DATA")"
[[ -n "$bindir" ]] || pp_die "PostgreSQL binaries not found under /usr/lib/postgresql"
pp_as_pg "$bindir/pg_ctl" stop -D "$PG_DATA" -m fast -w -t 60 -s
echo "PostgreSQL (data $shown_data) stopped"
