#!/usr/bin/env bash
# npm run cluster: the production layout on one machine, on loopback only —
# a three-node MariaDB Galera cluster, two Bandwright instances, and HAProxy in front of both.
#   database through HAProxy: 127.0.0.1:$CLUSTER_DB_PORT   app through HAProxy: http://127.0.0.1:$CLUSTER_APP_PORT
# npm run cluster:stop stops it. scripts/cluster-node.sh kills or restarts one node for the failover test.
source "$(dirname "$0")/common.sh"
source "$(dirname "$0")/cluster-common.sh"

ensure_node_modules
ensure_debian_packages
command -v haproxy >/dev/null 2>&1 || [ -x /usr/sbin/haproxy ] || apt_install haproxy
[ -f /usr/lib/galera/libgalera_smm.so ] || apt_install galera-4
command -v rsync >/dev/null 2>&1 || apt_install rsync
export PATH="$PATH:/usr/sbin"

bash "$(dirname "$0")/cluster-stop.sh" >/dev/null 2>&1 || true
[ "${CLUSTER_KEEP_DATA:-0}" = 1 ] || rm -rf "$CLUSTER_DIR"
mkdir -p "$CLUSTER_DIR/run"
chown mysql:mysql "$CLUSTER_DIR" "$CLUSTER_DIR/run"
export JWT_SECRET="${JWT_SECRET:-$(bash scripts/jwt-secret.sh "$CLUSTER_DIR/secret")}" SEED_DEMO_ACCOUNTS=1

log "starting a three-node Galera cluster (ports ${NODE_SQL_PORTS[*]})"
cluster_node_start 1 new
for n in 2 3; do cluster_node_start "$n"; done
cluster_wait_size 3

mariadb --no-defaults -S "$(node_socket 1)" -uroot -e "
  CREATE DATABASE IF NOT EXISTS \`$DB_NAME\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
  CREATE USER IF NOT EXISTS '$DB_USER'@'127.0.0.1' IDENTIFIED BY '$DB_PASSWORD';
  CREATE USER IF NOT EXISTS '$DB_USER'@'localhost' IDENTIFIED BY '$DB_PASSWORD';
  GRANT ALL ON \`$DB_NAME\`.* TO '$DB_USER'@'127.0.0.1';
  GRANT ALL ON \`$DB_NAME\`.* TO '$DB_USER'@'localhost';
  GRANT PROCESS ON *.* TO '$DB_USER'@'127.0.0.1';"

checks=()
for n in 1 2 3; do checks+=("${NODE_CHECK_PORTS[$((n - 1))]}:${NODE_SQL_PORTS[$((n - 1))]}"); done
nohup node scripts/galera-check.js "${checks[@]}" >"$CLUSTER_DIR/run/galera-check.log" 2>&1 &
echo $! >"$CLUSTER_DIR/run/galera-check.pid"

cluster_write_haproxy_config
haproxy -f "$CLUSTER_DIR/haproxy.cfg" -D -p "$CLUSTER_DIR/run/haproxy.pid"
for _ in $(seq 1 100); do mariadb-admin --no-defaults -h127.0.0.1 -P"$CLUSTER_DB_PORT" -u"$DB_USER" -p"$DB_PASSWORD" ping >/dev/null 2>&1 && break; sleep 0.2; done

[ -f dist/server/main.js ] && [ "${CLUSTER_SKIP_BUILD:-0}" = 1 ] || build_server
[ -f dist/client/index.html ] && [ "${CLUSTER_SKIP_BUILD:-0}" = 1 ] || build_client
fakes_start cluster
log "migrating and loading demo data through HAProxy"
DB_HOST=127.0.0.1 DB_PORT=$CLUSTER_DB_PORT node dist/server/database/migrate.js
DB_HOST=127.0.0.1 DB_PORT=$CLUSTER_DB_PORT node dist/server/database/seed.js

for i in 1 2; do cluster_app_start "$i"; done
for _ in $(seq 1 200); do curl -fsS "http://127.0.0.1:$CLUSTER_APP_PORT/api/health" >/dev/null 2>&1 && break; sleep 0.2; done
cat <<MSG

  Bandwright cluster is running:
    app through HAProxy:      http://127.0.0.1:$CLUSTER_APP_PORT  (instances on ${APP_PORTS[*]})
    database through HAProxy: 127.0.0.1:$CLUSTER_DB_PORT  (Galera nodes on ${NODE_SQL_PORTS[*]})
    HAProxy statistics:       http://127.0.0.1:$CLUSTER_STATS_PORT/
  Stop it with: npm run cluster:stop
MSG
