# Shared shell helpers for scripts/start.sh and scripts/test.sh. Source, do not run.
# shellcheck shell=bash

log() { printf '\033[2m[dryside %s]\033[0m %s\n' "$(date +%H:%M:%S)" "$*"; }
die() { printf '[dryside] error: %s\n' "$*" >&2; exit 1; }

as_root() { if [ "$(id -u)" = 0 ]; then "$@"; else sudo "$@"; fi; }

apt_updated=0
apt_install() {
  if [ $apt_updated = 0 ]; then as_root apt-get update -qq >/dev/null || die "apt-get update failed"; apt_updated=1; fi
  DEBIAN_FRONTEND=noninteractive as_root apt-get install -y -qq --no-install-recommends "$@" >/dev/null || die "apt-get install $* failed"
}

ensure_mariadb_installed() {
  if ! command -v mariadbd >/dev/null 2>&1 && [ ! -x /usr/sbin/mariadbd ]; then
    log "installing Debian's mariadb-server (first run only)"
    apt_install mariadb-server
  fi
  export PATH="$PATH:/usr/sbin"
}

ensure_chromium_installed() {
  if [ ! -x /usr/bin/chromium ]; then
    log "installing Debian's chromium for browser tests (first run only)"
    apt_install chromium
  fi
}

# Command-line tools the tests read PDFs and packs with (Debian's poppler-utils and unzip).
ensure_test_tools() {
  local missing=()
  command -v pdfinfo >/dev/null 2>&1 || missing+=(poppler-utils)
  command -v unzip >/dev/null 2>&1 || missing+=(unzip)
  if [ ${#missing[@]} -gt 0 ]; then
    log "installing ${missing[*]} for the tests (first run only)"
    apt_install "${missing[@]}"
  fi
}

# npm ci when node_modules is missing or older than the lock file.
ensure_node_modules() {
  if [ ! -f node_modules/.package-lock.json ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
    log "installing npm packages (npm ci)"
    npm ci --no-audit --no-fund >/dev/null || die "npm ci failed"
  fi
}

free_port() { node -e 'const s=require("net").createServer();s.listen(0,"127.0.0.1",()=>{console.log(s.address().port);s.close()})'; }

# start_mariadb DATADIR PORT [extra mariadbd flags...]: initialises on first use, starts in the
# background as a child of this shell (MARIADB_PID), waits until it answers.
start_mariadb() {
  local datadir=$1 port=$2; shift 2
  mkdir -p "$datadir"
  datadir=$(cd "$datadir" && pwd)
  if [ ! -d "$datadir/mysql" ]; then
    log "initialising MariaDB data directory $datadir"
    mariadb-install-db --no-defaults --user=root --datadir="$datadir" --auth-root-authentication-method=normal \
      --skip-test-db --skip-name-resolve >"$datadir/install.log" 2>&1 || { cat "$datadir/install.log"; die "mariadb-install-db failed"; }
  fi
  if [ -f "$datadir/mariadb.pid" ] && kill -0 "$(cat "$datadir/mariadb.pid")" 2>/dev/null; then
    die "a MariaDB is already running on $datadir (pid $(cat "$datadir/mariadb.pid")); stop it first"
  fi
  mariadbd --no-defaults --user=root --datadir="$datadir" --port="$port" --bind-address=127.0.0.1 \
    --socket="$datadir/mariadb.sock" --pid-file="$datadir/mariadb.pid" --log-error="$datadir/error.log" \
    --skip-name-resolve --character-set-server=utf8mb4 --collation-server=utf8mb4_unicode_ci "$@" &
  MARIADB_PID=$!
  local tries=0
  until mariadb-admin --no-defaults --protocol=tcp -h127.0.0.1 -P"$port" -uroot --connect-timeout=1 ping >/dev/null 2>&1; do
    kill -0 "$MARIADB_PID" 2>/dev/null || { tail -20 "$datadir/error.log"; die "MariaDB exited during start-up"; }
    tries=$((tries + 1)); [ $tries -gt 600 ] && die "MariaDB did not answer within 30 s"
    sleep 0.05
  done
}

mariadb_sql() { mariadb --no-defaults --protocol=tcp -h127.0.0.1 -P"$1" -uroot -e "$2"; }

stop_pid() { local pid=$1; [ -n "$pid" ] && kill "$pid" 2>/dev/null && wait "$pid" 2>/dev/null; return 0; }

# wait_for_http URL NAME: polls until URL answers 2xx (30 s at most).
wait_for_http() {
  local tries=0
  until curl -fsS -o /dev/null "$1" 2>/dev/null || node -e 'fetch(process.argv[1]).then(r=>process.exit(r.ok?0:1),()=>process.exit(1))' "$1"; do
    tries=$((tries + 1)); [ $tries -gt 300 ] && die "$2 did not answer at $1"
    sleep 0.1
  done
}
