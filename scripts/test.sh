#!/usr/bin/env bash
# npm test: typecheck, format and lint, then unit + integration tests against a throwaway MariaDB, then browser tests
# against a built server. Cleans up what it started, also on failure; ends with one summary line.
set -uo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/common.sh

ensure_mariadb_installed
ensure_node_modules
ensure_chromium_installed
ensure_test_tools

scratch=$(mktemp -d "${TMPDIR_FOR_TESTS:-/dev/shm}/dryside-test.XXXXXX" 2>/dev/null || mktemp -d)
results="$scratch/results"; mkdir -p "$results" test-results
cleanup() {
  trap - EXIT INT TERM
  stop_pid "${MARIADB_PID:-}"
  rm -rf "$scratch"
}
trap cleanup EXIT INT TERM

status=0
log "typecheck (react-router typegen && tsc)"
if npm run -s typecheck; then echo "typecheck ok" > "$results/typecheck.txt"; else status=1; echo "typecheck failed" > "$results/typecheck.txt"; fi

log "format and lint (biome), dead exports and files (knip)"
if npx biome ci --reporter=summary . && npx knip --no-progress; then echo "lint ok" > "$results/lint.txt"; else status=1; echo "lint failed" > "$results/lint.txt"; fi

DB_PORT=$(free_port)
log "throwaway MariaDB on 127.0.0.1:$DB_PORT in $scratch"
start_mariadb "$scratch/mariadb" "$DB_PORT" --innodb-log-file-size=8M --innodb-buffer-pool-size=64M \
  --innodb-doublewrite=0 --innodb-flush-log-at-trx-commit=2 --skip-log-bin
export DB_HOST=127.0.0.1 DB_PORT DB_USER=root DB_PASSWORD="" NODE_ENV=test
export SESSION_SECRET=test-secret-that-is-long-enough-for-signing-cookies
export TEST_SCRATCH_DIR="$scratch"

log "unit and integration tests (vitest)"
# Arguments narrow the run to matching test files, e.g. `npm test -- tests/e2e/desk` (the typecheck and lint always run).
npx vitest run --passWithNoTests --reporter=default --reporter=json --outputFile.json="$results/vitest.json" "$@" || status=1

log "building the app for browser tests"
if npx react-router build >"$scratch/build.log" 2>&1; then
  log "browser tests (playwright-core + Debian chromium)"
  npx vitest run --config vitest.e2e.config.ts --passWithNoTests --reporter=default --reporter=json --outputFile.json="$results/e2e.json" "$@" || status=1
else
  cat "$scratch/build.log"; status=1
fi

node scripts/lib/summarise-results.mjs "$results" || status=1
exit $status
