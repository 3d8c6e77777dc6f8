#!/usr/bin/env bash
# npm test: the same bootstrap as npm start against separate test databases and ports, then every suite.
source "$(dirname "$0")/common.sh"
export NODE_ENV=test
export DB_PORT="${DB_PORT:-3307}" DB_USER="${DB_USER:-bandwright}" DB_PASSWORD="${DB_PASSWORD:-bandwright-local}"
export DB_NAME=bandwright_test
export S3_PORT="${S3_PORT:-4579}" SMTP_PORT="${SMTP_PORT:-1026}" MAIL_WEB_PORT="${MAIL_WEB_PORT:-1081}" FAKES_DIR="$DATA_DIR/fakes-test"
export JWT_SECRET="${JWT_SECRET:-test-secret-not-for-production-0123456789}" SEED_DEMO_ACCOUNTS=1
BROWSER_PORT="${BROWSER_PORT:-3100}"
RESULTS="$RUN_DIR/results"; rm -rf "$RESULTS"; mkdir -p "$RESULTS"

ensure_node_modules
ensure_debian_packages chromium skrf pdftotext
DB_WAS_RUNNING=0; db_ping && DB_WAS_RUNNING=1
db_start
for db in bandwright_test bandwright_browser; do db_drop "$db"; db_create "$db"; done
rm -rf "$FAKES_DIR"

log "linting (ESLint) and checking the format (Prettier); npm run format fixes most findings"
npx eslint .
npx prettier --check . >/dev/null || { npx prettier --list-different .; log "these files are not in Prettier's format: run npm run format"; exit 1; }
log "type-checking server, tests and client"
npx tsc -p tsconfig.test.json
npx tsc -p tsconfig.client.json
build_server
log "checking that the client's API types match the server's OpenAPI document"
API_TYPES_BUILT=1 bash scripts/api-types.sh --check
build_client
fakes_stop test
fakes_start test

for db in bandwright_test bandwright_browser; do DB_NAME=$db node dist/server/database/migrate.js; DB_NAME=$db node dist/server/database/seed.js; done

cleanup() {
  [ -n "${APP_PID:-}" ] && kill "$APP_PID" 2>/dev/null || true
  fakes_stop test
  [ $DB_WAS_RUNNING = 1 ] || db_stop
}
trap cleanup EXIT

status=0
set +e
log "server unit and reference tests"
npx jest --selectProjects unit --json --outputFile="$RESULTS/unit.json" || status=1
log "API end-to-end tests"
npx jest --selectProjects e2e --runInBand --json --outputFile="$RESULTS/e2e.json" || status=1
log "client tests"
npx vitest run --reporter=default --reporter=json --outputFile.json="$RESULTS/client.json" || status=1

log "browser tests (Chromium)"
DB_NAME=bandwright_browser PORT=$BROWSER_PORT APP_URL="http://127.0.0.1:$BROWSER_PORT" node dist/server/main.js >"$RUN_DIR/app-browser.log" 2>&1 &
APP_PID=$!
for _ in $(seq 1 200); do curl -fsS "http://127.0.0.1:$BROWSER_PORT/api/health" >/dev/null 2>&1 && break; sleep 0.1; done
APP_URL="http://127.0.0.1:$BROWSER_PORT" DB_NAME=bandwright_browser npx jest -c jest.browser.config.js --runInBand --json --outputFile="$RESULTS/browser.json" || status=1
set -e

node scripts/summary.js "$RESULTS" || status=1
exit $status
