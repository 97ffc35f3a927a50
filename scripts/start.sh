#!/usr/bin/env bash
# npm start: installs what is missing, starts MariaDB and the local stand-ins on loopback, migrates,
# imports the demo content, builds and serves on http://127.0.0.1:3000. Ctrl-C stops everything.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/common.sh

APP_PORT=${PORT:-3000}
export DB_PORT=${DB_PORT:-3307}
export DB_NAME=${DB_NAME:-dryside}
PAYMENTS_PORT=${PAYMENTS_STANDIN_PORT:-12111}
SMTP_PORT_LOCAL=${SMTP_PORT:-2525}

ensure_mariadb_installed
ensure_node_modules

mkdir -p .data
# Secrets are generated once per checkout and kept out of git.
if [ ! -f .data/secrets.env ]; then
  printf 'SESSION_SECRET=%s\n' "$(node -e 'console.log(require("crypto").randomBytes(32).toString("base64url"))')" > .data/secrets.env
fi
set -a; source .data/secrets.env; set +a

children=()
cleanup() {
  trap - EXIT INT TERM
  log "stopping"
  # After Ctrl-C the children got the terminal's SIGINT too: give them a moment to close by
  # themselves, then ask, then insist, so nothing is left behind.
  for signal in none TERM KILL; do
    [ $signal != none ] && for pid in "${children[@]}"; do kill -s $signal "$pid" 2>/dev/null || true; done
    for _ in $(seq 15); do
      alive=0; for pid in "${children[@]}"; do kill -0 "$pid" 2>/dev/null && alive=1; done
      [ $alive = 0 ] && break; sleep 0.1
    done
    [ $alive = 0 ] && break
  done
  stop_pid "${MARIADB_PID:-}"
}
trap cleanup EXIT INT TERM

log "starting MariaDB on 127.0.0.1:$DB_PORT (data in .data/mariadb)"
start_mariadb .data/mariadb "$DB_PORT"
mariadb_sql "$DB_PORT" "CREATE DATABASE IF NOT EXISTS \`$DB_NAME\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci"

export NODE_ENV=production
export APP_URL="http://127.0.0.1:$APP_PORT"
export STRIPE_API_HOST=127.0.0.1 STRIPE_API_PORT=$PAYMENTS_PORT STRIPE_API_PROTOCOL=http
export STRIPE_SECRET_KEY=${STRIPE_SECRET_KEY:-sk_test_standin} STRIPE_WEBHOOK_SECRET=${STRIPE_WEBHOOK_SECRET:-whsec_standin_local}
export SMTP_HOST=127.0.0.1 SMTP_PORT=$SMTP_PORT_LOCAL
export MAIL_OUTBOX_DIR=${MAIL_OUTBOX_DIR:-.data/outbox}  # the app reads it for /admin/outbox

log "starting the payments stand-in on 127.0.0.1:$PAYMENTS_PORT"
PAYMENTS_STANDIN_PORT=$PAYMENTS_PORT PAYMENTS_WEBHOOK_URL="$APP_URL/api/payments/webhook" \
  PAYMENTS_WEBHOOK_SECRET=$STRIPE_WEBHOOK_SECRET PAYMENTS_STANDIN_STATE_FILE=.data/payments-standin.json \
  node --import tsx dev/payments-standin/cli.ts &
children+=($!)
log "starting the mail catcher on 127.0.0.1:$SMTP_PORT_LOCAL (messages in .data/outbox)"
MAIL_CATCHER_PORT=$SMTP_PORT_LOCAL MAIL_OUTBOX_DIR=.data/outbox node --import tsx dev/mail-catcher/cli.ts &
children+=($!)

log "migrating, importing content/, demo logins, payments catalogue"
node --import tsx scripts/prepare-local.ts || die "preparing the database failed"

# Rebuild only when a source changed since the last build: a second start takes seconds.
if [ ! -f build/server/index.js ] || [ -n "$(find app public package-lock.json vite.config.ts react-router.config.ts -newer build/server/index.js -print -quit)" ]; then
  log "building"
  npx react-router build > .data/build.log 2>&1 || { cat .data/build.log; die "the build failed"; }
fi
log "serving on $APP_URL"
HOST=127.0.0.1 PORT=$APP_PORT node node_modules/@react-router/serve/bin.js ./build/server/index.js &
children+=($!)
wait -n "${children[@]}" "$MARIADB_PID" || true
