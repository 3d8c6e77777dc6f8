#!/usr/bin/env bash
# Shared by start.sh, test.sh, stop.sh and bench.sh: installs what is missing and runs the private services.
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$ROOT"
DATA_DIR="$ROOT/.data"
RUN_DIR="$ROOT/.run"
mkdir -p "$RUN_DIR"

# A unix socket path must stay under 107 bytes.
SOCK="$DATA_DIR/run/mariadb.sock"
if [ ${#SOCK} -gt 100 ]; then SOCK="/tmp/bandwright-$(echo "$ROOT" | md5sum | cut -c1-8).sock"; fi
export DB_SOCKET="$SOCK"

log() { printf '\033[1;36m[bandwright]\033[0m %s\n' "$*"; }

APT_UPDATED=0
apt_install() {
  local missing=("$@")
  if [ "$(id -u)" != 0 ]; then SUDO=sudo; else SUDO=; fi
  if [ $APT_UPDATED = 0 ]; then $SUDO apt-get update -qq >/dev/null; APT_UPDATED=1; fi
  log "installing from Debian: ${missing[*]}"
  DEBIAN_FRONTEND=noninteractive $SUDO apt-get install -y -qq --no-install-recommends "${missing[@]}" >/dev/null
}

ensure_node_modules() {
  if [ ! -d node_modules ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
    log "installing npm dependencies (npm ci)"
    npm ci --no-audit --no-fund --loglevel=error
  fi
}

ensure_debian_packages() {
  local want=()
  command -v mariadbd >/dev/null 2>&1 || [ -x /usr/sbin/mariadbd ] || want+=(mariadb-server mariadb-client)
  for extra in "$@"; do
    case "$extra" in
      chromium) command -v chromium >/dev/null 2>&1 || want+=(chromium) ;;
      skrf) python3 -c 'import skrf' >/dev/null 2>&1 || /usr/bin/python3 -c 'import skrf' >/dev/null 2>&1 || want+=(python3-scikit-rf) ;;
      pdftotext) command -v pdftotext >/dev/null 2>&1 || want+=(poppler-utils) ;;
    esac
  done
  if [ ${#want[@]} -gt 0 ]; then apt_install "${want[@]}"; fi
  export PATH="$PATH:/usr/sbin"
}

db_ping() { mariadb-admin --no-defaults --protocol=socket -S "$SOCK" -uroot ping >/dev/null 2>&1; }

db_start() {
  mkdir -p "$DATA_DIR/run"
  if [ ! -d "$DATA_DIR/mariadb/mysql" ]; then
    log "initialising private MariaDB data directory in .data/mariadb"
    rm -rf "$DATA_DIR/mariadb"
    mariadb-install-db --no-defaults --datadir="$DATA_DIR/mariadb" --user=root \
      --auth-root-authentication-method=socket --skip-test-db --skip-name-resolve >"$DATA_DIR/run/install.log" 2>&1
  fi
  if ! db_ping; then
    log "starting MariaDB on 127.0.0.1:${DB_PORT}"
    nohup mariadbd --no-defaults --datadir="$DATA_DIR/mariadb" --user=root --bind-address=127.0.0.1 \
      --port="$DB_PORT" --socket="$SOCK" --pid-file="$DATA_DIR/run/mariadb.pid" \
      --log-error="$DATA_DIR/run/mariadb.err" --skip-name-resolve --innodb-buffer-pool-size=128M \
      --skip-log-bin --max-connections=300 </dev/null >/dev/null 2>&1 &
    for _ in $(seq 1 300); do db_ping && break; sleep 0.1; done
    db_ping || { echo "MariaDB did not start; see $DATA_DIR/run/mariadb.err" >&2; tail -20 "$DATA_DIR/run/mariadb.err" >&2; exit 1; }
  fi
}

db_create() {
  local db="$1"
  mariadb --no-defaults -S "$SOCK" -uroot -e "
    CREATE DATABASE IF NOT EXISTS \`$db\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
    CREATE USER IF NOT EXISTS '$DB_USER'@'127.0.0.1' IDENTIFIED BY '$DB_PASSWORD';
    CREATE USER IF NOT EXISTS '$DB_USER'@'localhost' IDENTIFIED BY '$DB_PASSWORD';
    GRANT ALL ON \`$db\`.* TO '$DB_USER'@'127.0.0.1';
    GRANT ALL ON \`$db\`.* TO '$DB_USER'@'localhost';"
}

db_drop() { mariadb --no-defaults -S "$SOCK" -uroot -e "DROP DATABASE IF EXISTS \`$1\`;"; }

db_stop() {
  if db_ping; then
    mariadb-admin --no-defaults --protocol=socket -S "$SOCK" -uroot shutdown >/dev/null 2>&1 || true
    local pid; pid=$(cat "$DATA_DIR/run/mariadb.pid" 2>/dev/null || true)
    for _ in $(seq 1 100); do [ -n "$pid" ] && kill -0 "$pid" 2>/dev/null || break; sleep 0.1; done
  fi
}

# Local fakes for object storage (S3 protocol) and e-mail (SMTP, with a web inbox).
fakes_start() {
  local name="$1"
  local pidfile="$RUN_DIR/fakes-$name.pid"
  if [ -f "$pidfile" ] && kill -0 "$(cat "$pidfile")" 2>/dev/null; then return; fi
  node dist/server/dev-fakes/run-fakes.js >"$RUN_DIR/fakes-$name.log" 2>&1 &
  echo $! >"$pidfile"
  for _ in $(seq 1 100); do grep -q 'fakes ready' "$RUN_DIR/fakes-$name.log" 2>/dev/null && return; sleep 0.1; done
  echo "local fakes did not start; see $RUN_DIR/fakes-$name.log" >&2; cat "$RUN_DIR/fakes-$name.log" >&2; exit 1
}

fakes_stop() {
  local pidfile="$RUN_DIR/fakes-$1.pid"
  if [ -f "$pidfile" ]; then kill "$(cat "$pidfile")" 2>/dev/null || true; rm -f "$pidfile"; fi
}

# Benchmarks left the production build (tsconfig.bench.json); an older build's copy is removed.
build_server() { log "building server"; rm -rf dist/server; npx tsc -p tsconfig.server.build.json; } # from scratch: a stale file of a moved module would shadow its folder
build_client() { log "building client"; npx vite build --logLevel warn; }
