#!/usr/bin/env bash
# npm start: install what is missing, start MariaDB and the local fakes, migrate, seed the demo, serve on :3000.
source "$(dirname "$0")/common.sh"
[ -f .env ] && set -a && source .env && set +a
export PORT="${PORT:-3000}" DB_PORT="${DB_PORT:-3307}" DB_USER="${DB_USER:-bandwright}" DB_PASSWORD="${DB_PASSWORD:-bandwright-local}"
export DB_NAME="${DB_NAME:-bandwright}"
export S3_PORT="${S3_PORT:-4569}" SMTP_PORT="${SMTP_PORT:-1025}" MAIL_WEB_PORT="${MAIL_WEB_PORT:-1080}"
export FAKES_DIR="$DATA_DIR/fakes"
# A secret of this install's own unless one is configured; demo accounts unless this is a production start.
[ -n "${JWT_SECRET:-}" ] || JWT_SECRET="$(bash scripts/jwt-secret.sh "$DATA_DIR")"
export JWT_SECRET
if [ "${NODE_ENV:-}" = production ]; then export SEED_DEMO_ACCOUNTS="${SEED_DEMO_ACCOUNTS:-0}"; else export SEED_DEMO_ACCOUNTS="${SEED_DEMO_ACCOUNTS:-1}"; fi

ensure_node_modules
ensure_debian_packages
db_start
db_create "$DB_NAME"
build_server
fakes_start dev
log "migrating and loading demo data"
node dist/server/database/migrate.js
node dist/server/database/seed.js
build_client

STOPPED=0
cleanup() {
  [ $STOPPED = 1 ] && return; STOPPED=1
  log "stopping"; kill "$APP_PID" 2>/dev/null || true; fakes_stop dev; db_stop
}
trap 'cleanup; exit 0' INT TERM
node dist/server/main.js &
APP_PID=$!
echo "$APP_PID" >"$RUN_DIR/app.pid"
for _ in $(seq 1 200); do curl -fsS "http://127.0.0.1:$PORT/api/health" >/dev/null 2>&1 && break; sleep 0.1; done
cat <<MSG

  Bandwright is running at http://127.0.0.1:$PORT
  API documentation:        http://127.0.0.1:$PORT/api/docs
  Caught e-mail (fake SMTP): http://127.0.0.1:$MAIL_WEB_PORT
MSG
if [ "$SEED_DEMO_ACCOUNTS" = 1 ]; then cat <<MSG

  Demo accounts (demo only), password: ${DEMO_PASSWORD:-bandwright-demo}
    admin@bandwright.test      admin
    engineer@bandwright.test   engineer
    buyer@bandwright.test      procurement
MSG
fi
cat <<MSG

  Ctrl-C stops the app, the fakes and MariaDB (or run: npm run stop).
MSG
wait "$APP_PID" || true
cleanup
