#!/usr/bin/env bash
# For development: run some jest files against the test database without the whole npm test.
#   bash scripts/quick-test.sh test/e2e/auth.e2e-spec.ts [more jest args]
# Starts MariaDB and the test fakes if needed, rebuilds the server, migrates and seeds bandwright_test.
source "$(dirname "$0")/common.sh"
export NODE_ENV=test DB_PORT="${DB_PORT:-3307}" DB_USER="${DB_USER:-bandwright}" DB_PASSWORD="${DB_PASSWORD:-bandwright-local}"
# Each may be overridden, so that several checkouts can share one MariaDB with their own database and fakes.
export DB_NAME="${DB_NAME:-bandwright_test}" S3_PORT="${S3_PORT:-4579}" SMTP_PORT="${SMTP_PORT:-1026}" MAIL_WEB_PORT="${MAIL_WEB_PORT:-1081}"
export FAKES_DIR="${FAKES_DIR:-$DATA_DIR/fakes-test-$DB_NAME}"
export JWT_SECRET="${JWT_SECRET:-test-secret-not-for-production-0123456789}" SEED_DEMO_ACCOUNTS=1
ensure_debian_packages
db_start
db_create "$DB_NAME"
build_server
fakes_start test
node dist/server/database/migrate.js >/dev/null
node dist/server/database/seed.js >/dev/null
npx jest --runInBand "$@"
