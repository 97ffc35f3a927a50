#!/usr/bin/env bash
# npm run bench: the engine's checks per second, then the catalogue over 10,000 details on a
# throwaway MariaDB. Prints figures; asserts nothing.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/common.sh
ensure_mariadb_installed
ensure_node_modules

scratch=$(mktemp -d /dev/shm/dryside-bench.XXXXXX 2>/dev/null || mktemp -d)
cleanup() { stop_pid "${MARIADB_PID:-}"; rm -rf "$scratch"; }
trap cleanup EXIT INT TERM

log "site-check engine"
npx tsx scripts/bench-site-check.ts
npx tsx scripts/bench/seasonal-check.ts

export DB_PORT=$(free_port) DB_NAME=bench DB_USER=root DB_PASSWORD=""
export SESSION_SECRET=bench-secret-bench-secret-bench-secret
start_mariadb "$scratch/mariadb" "$DB_PORT" --innodb-buffer-pool-size=256M --skip-log-bin
mariadb_sql "$DB_PORT" "CREATE DATABASE bench CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci"
npx tsx db/migrate.ts up >/dev/null
npx tsx scripts/content-import.ts
log "building"
npx react-router build >/dev/null
npx tsx scripts/bench/catalogue.ts
