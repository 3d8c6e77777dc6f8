#!/usr/bin/env bash
# npm run bench: every benchmark in src-server/bench/*-bench.ts, each printing its own figures.
# They are built apart from the production build (tsconfig.bench.json, into dist/bench) with the server code they start.
# They run against a separate database (bandwright_bench) and their own fake-service ports.
source "$(dirname "$0")/common.sh"
export NODE_ENV=test
export DB_PORT="${DB_PORT:-3307}" DB_USER="${DB_USER:-bandwright}" DB_PASSWORD="${DB_PASSWORD:-bandwright-local}"
export DB_NAME=bandwright_bench
export S3_PORT="${S3_PORT:-4599}" SMTP_PORT="${SMTP_PORT:-1046}" MAIL_WEB_PORT="${MAIL_WEB_PORT:-1101}" FAKES_DIR="$DATA_DIR/fakes-bench"
export JWT_SECRET="${JWT_SECRET:-bench-secret-not-for-production-0123456789}" SEED_DEMO_ACCOUNTS=1
export BENCH_PORT="${BENCH_PORT:-3200}"

ensure_node_modules
ensure_debian_packages skrf
DB_WAS_RUNNING=0; db_ping && DB_WAS_RUNNING=1
db_start
db_create bandwright_bench
build_server
log "building benchmarks"; npx tsc -p tsconfig.bench.json
build_client
fakes_start bench
trap 'fakes_stop bench; [ $DB_WAS_RUNNING = 1 ] || db_stop' EXIT
node dist/server/database/migrate.js >/dev/null
node dist/server/database/seed.js >/dev/null

only="${1:-}"
for bench in dist/bench/bench/*-bench.js; do
  name=$(basename "$bench" .js)
  [ -n "$only" ] && [[ "$name" != *"$only"* ]] && continue
  log "$name"
  node "$bench"
done
