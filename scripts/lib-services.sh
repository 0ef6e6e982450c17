# shellcheck shell=bash
# Shared helpers for the lifecycle scripts (db-start, demo, test). Source it; do not run it.
# Every background process goes through pp_spawn so that pp_stop_spawned can stop it, its
# children included, from a trap: no script may leave a stray process behind.

# The project root, from this file's location, so the scripts work from any clone and any cwd.
PP_ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
export PP_ROOT

pp_log() { printf '%s\n' "$*" >&2; }
pp_die() { pp_log "error: $*"; exit 1; }
pp_is_root() { [[ "$(id -u)" == 0 ]]; }

# A path from the environment may be relative: it is relative to the project root, not the cwd.
pp_abs() {
  case "$1" in
    /*) printf '%s\n' "$1" ;;
    *) printf '%s\n' "$PP_ROOT/$1" ;;
  esac
}

# Newest PostgreSQL server binaries installed by Debian's packages; empty when none.
pp_pg_bindir() {
  local dir
  dir="$(find /usr/lib/postgresql -mindepth 2 -maxdepth 2 -type d -name bin 2>/dev/null | sort -V | tail -n 1)"
  if [[ -n "$dir" && -x "$dir/pg_ctl" && -x "$dir/initdb" ]]; then printf '%s\n' "$dir"; fi
}

# The binaries matching a data folder's PG_VERSION, else the newest installed.
pp_pg_bindir_for() {
  local data="$1" version
  if [[ -f "$data/PG_VERSION" ]]; then
    version="$(cat "$data/PG_VERSION")"
    if [[ -x "/usr/lib/postgresql/$version/bin/pg_ctl" ]]; then
      printf '%s\n' "/usr/lib/postgresql/$version/bin"
      return 0
    fi
  fi
  pp_pg_bindir
}

# Sets PG_DATA and PG_SOCKET (absolute) from PP_PG_DATA (default .data/pg) and PP_PG_SOCKET_DIR
# (default .run/pg-socket). As root the server runs as `postgres`, which must reach these folders:
# a clone under a private home (e.g. /root, mode 700) cannot host them, so folders given relative
# to the project then move to a per-clone folder under /tmp (absolute ones are taken as given).
# Unix socket paths are limited to 107 bytes: a long default socket path moves there too.
# shellcheck disable=SC2034 # PG_DATA and PG_SOCKET are this function's output, read by callers.
pp_pg_paths() {
  local fallback data="${PP_PG_DATA:-.data/pg}" socket="${PP_PG_SOCKET_DIR:-.run/pg-socket}"
  fallback="${TMPDIR:-/tmp}/panelpoint-pg-$(printf '%s' "$PP_ROOT" | cksum | cut -d' ' -f1)"
  PG_DATA="$(pp_abs "$data")"
  PG_SOCKET="$(pp_abs "$socket")"
  if pp_is_root && ! runuser -u postgres -- test -x "$PP_ROOT" 2>/dev/null; then
    if [[ "$data" != /* ]]; then PG_DATA="$fallback/$(basename "$data")"; fi
    if [[ "$socket" != /* ]]; then PG_SOCKET="$fallback/socket"; fi
  fi
  if [[ ${#PG_SOCKET} -gt 90 && "$socket" != /* ]]; then PG_SOCKET="$fallback/socket"; fi
}

# PostgreSQL refuses to run as root: root runs it as the `postgres` system user, anyone else as
# themselves. cwd must be readable by that user, hence /tmp.
pp_as_pg() {
  if pp_is_root; then
    (cd /tmp && runuser -u postgres -- "$@")
  else
    (cd /tmp && "$@")
  fi
}

# Is the server of this data folder alive? postmaster.pid alone can lie after a kill -9 (and its
# PID may since belong to another process), so the process must be a postgres whose cwd is the folder.
pp_pg_running() {
  local data="$1" pid
  [[ -f "$data/postmaster.pid" ]] || return 1
  pid="$(head -n 1 "$data/postmaster.pid" 2>/dev/null || true)"
  [[ "$pid" =~ ^[0-9]+$ ]] || return 1
  [[ "$(cat "/proc/$pid/comm" 2>/dev/null || true)" == postgres ]] || return 1
  [[ "$(readlink "/proc/$pid/cwd" 2>/dev/null || true)" == "$(cd "$data" && pwd -P)" ]]
}

# After a kill -9 of the postmaster its children linger for a moment, still using the folder:
# a new server must not start beside them. Waits up to 10 s for the last one to exit.
pp_pg_wait_orphans() {
  local data proc i found
  data="$(cd "$1" && pwd -P)"
  for ((i = 0; i < 100; i++)); do
    found=0
    for proc in /proc/[0-9]*; do
      if [[ "$(readlink "$proc/cwd" 2>/dev/null || true)" == "$data" && "$(cat "$proc/comm" 2>/dev/null || true)" == postgres ]]; then
        found=1
        break
      fi
    done
    [[ "$found" == 1 ]] || return 0
    sleep 0.1
  done
  return 1
}

# True when something accepts TCP connections on 127.0.0.1:<port>.
pp_port_open() {
  (exec 3<>"/dev/tcp/127.0.0.1/$1") 2>/dev/null
}

# Wait until 127.0.0.1:<port> accepts connections; fail after <seconds> or when <pid> (optional) dies.
pp_wait_port() {
  local port="$1" seconds="${2:-30}" pid="${3:-}" i
  for ((i = 0; i < seconds * 10; i++)); do
    pp_port_open "$port" && return 0
    if [[ -n "$pid" ]] && ! kill -0 "$pid" 2>/dev/null; then return 1; fi
    sleep 0.1
  done
  return 1
}

# Wait until <url> answers HTTP at all (any status); node's fetch, because curl may be missing.
pp_wait_http() {
  local url="$1" seconds="${2:-60}" pid="${3:-}" i
  for ((i = 0; i < seconds * 2; i++)); do
    if node -e 'fetch(process.argv[1], { redirect: "manual" }).then(() => process.exit(0), () => process.exit(1))' "$url" 2>/dev/null; then
      return 0
    fi
    if [[ -n "$pid" ]] && ! kill -0 "$pid" 2>/dev/null; then return 1; fi
    sleep 0.5
  done
  return 1
}

# Processes started by pp_spawn, newest last. Each leads its own process group (setsid), so one
# kill reaches npm/tsx/next and every child they forked.
PP_SPAWNED=()

# pp_spawn <logfile|-> <command...>: start in the background; the PID is in PP_LAST_PID.
# "-" keeps the output on this terminal (used for foreground steps run through pp_run).
pp_spawn() {
  local log="$1"
  shift
  # 9>&-: the run's lock (pp_lock) must not live on in a server that outlives the run.
  if [[ "$log" == - ]]; then
    setsid "$@" </dev/null 9>&- &
  else
    mkdir -p "$(dirname "$log")"
    setsid "$@" </dev/null >>"$log" 2>&1 9>&- &
  fi
  PP_LAST_PID=$!
  PP_SPAWNED+=("$PP_LAST_PID")
}

# pp_run <command...>: a foreground step, but interruptible: bash runs a trap only after a
# foreground child ends, while `wait` returns at once on a signal and lets the trap stop the step.
pp_run() {
  local status=0
  pp_spawn - "$@"
  wait "$PP_LAST_PID" || status=$?
  pp_forget "$PP_LAST_PID"
  return "$status"
}

pp_forget() {
  local keep=() p
  for p in "${PP_SPAWNED[@]}"; do [[ "$p" == "$1" ]] || keep+=("$p"); done
  PP_SPAWNED=("${keep[@]}")
}

# Stop one spawned process group: TERM, up to 10 s of grace, then KILL.
pp_stop_group() {
  local pid="$1" i
  kill -TERM -- "-$pid" 2>/dev/null || kill -TERM "$pid" 2>/dev/null || return 0
  for ((i = 0; i < 100; i++)); do
    kill -0 -- "-$pid" 2>/dev/null || break
    sleep 0.1
  done
  kill -KILL -- "-$pid" 2>/dev/null || true
  wait "$pid" 2>/dev/null || true
}

# Stop everything pp_spawn started, newest first (the app before the services it uses).
pp_stop_spawned() {
  local i
  for ((i = ${#PP_SPAWNED[@]} - 1; i >= 0; i--)); do pp_stop_group "${PP_SPAWNED[$i]}"; done
  PP_SPAWNED=()
}

# A previous run killed with -9 cannot clean up: its pid file names the group it left behind.
# Only a process whose cwd is this project is ours to stop.
pp_stop_stale() {
  local pidfile="$1" pid
  [[ -f "$pidfile" ]] || return 0
  pid="$(cat "$pidfile" 2>/dev/null || true)"
  rm -f "$pidfile"
  [[ "$pid" =~ ^[0-9]+$ ]] || return 0
  [[ "$(readlink "/proc/$pid/cwd" 2>/dev/null || true)" == "$(cd "$PP_ROOT" && pwd -P)" ]] || return 0
  pp_log "stopping leftover process group $pid from an earlier run ($pidfile)"
  pp_stop_group "$pid"
}

# Refuse to start a service on a port somebody else holds: waiting on it would "succeed" wrongly.
pp_require_free_port() {
  if pp_port_open "$1"; then pp_die "port $1 on 127.0.0.1 is already in use ($2)"; fi
}

# One run at a time per kind (demo, test): they share folders and ports. Take it before setting
# the clean-up trap: a run turned away must not stop what the running one started.
pp_lock() {
  mkdir -p "$PP_ROOT/.run"
  exec 9>"$PP_ROOT/.run/$1.lock"
  flock -n 9 || pp_die "another '$1' run is in progress in this clone"
}
