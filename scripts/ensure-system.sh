#!/usr/bin/env bash
# Installs the Debian packages Panelpoint needs outside npm, only those missing.
#   ensure-system.sh [postgresql] [chromium] [poppler-utils]   (no argument: all three)
# As root it installs them with apt (one `apt-get update`); as anyone else it only says what is
# missing and carries on, so the steps that need a missing tool fail later with their own message.
set -euo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/lib-services.sh"

has_postgresql() { [[ -n "$(pp_pg_bindir)" ]]; }
has_chromium() { [[ -x /usr/bin/chromium ]]; }
has_poppler_utils() { command -v pdftotext >/dev/null && command -v pdfsig >/dev/null; }

wanted=("$@")
if [[ ${#wanted[@]} -eq 0 ]]; then wanted=(postgresql chromium poppler-utils); fi

missing=()
for pkg in "${wanted[@]}"; do
  case "$pkg" in
    postgresql) has_postgresql || missing+=(postgresql) ;;
    chromium) has_chromium || missing+=(chromium) ;;
    poppler-utils) has_poppler_utils || missing+=(poppler-utils) ;;
    *) pp_die "ensure-system.sh knows postgresql, chromium and poppler-utils, not '$pkg'" ;;
  esac
done

if [[ ${#missing[@]} -eq 0 ]]; then exit 0; fi

if ! pp_is_root; then
  pp_log "missing system packages: ${missing[*]}"
  pp_log "  install them with: sudo apt-get install -y ${missing[*]}"
  exit 0
fi

pp_log "installing system packages: ${missing[*]}"
# No questions: CI has no terminal, and a prompt would hang the run.
export DEBIAN_FRONTEND=noninteractive
apt-get update -qq
apt-get install -y -qq "${missing[@]}" >/dev/null
pp_log "installed: ${missing[*]}"
