#!/usr/bin/env bash
# Shared by cluster.sh, cluster-stop.sh, cluster-node.sh and the cluster test: ports, paths and the node lifecycle.
CLUSTER_DIR="$DATA_DIR/cluster"
NODE_SQL_PORTS=(3411 3412 3413)
NODE_GCOMM_PORTS=(4567 4577 4587)
NODE_IST_PORTS=(4568 4578 4588)
NODE_SST_PORTS=(4444 4454 4464)
NODE_CHECK_PORTS=(9201 9202 9203)
APP_PORTS=(3501 3502)
CLUSTER_DB_PORT=3400
CLUSTER_APP_PORT=3500
CLUSTER_STATS_PORT=3599
export DB_USER="${DB_USER:-bandwright}" DB_PASSWORD="${DB_PASSWORD:-bandwright-local}" DB_NAME="${CLUSTER_DB_NAME:-bandwright_cluster}"
export S3_PORT="${CLUSTER_S3_PORT:-4589}" SMTP_PORT="${CLUSTER_SMTP_PORT:-1027}" MAIL_WEB_PORT="${CLUSTER_MAIL_WEB_PORT:-1082}"
export FAKES_DIR="$CLUSTER_DIR/fakes"
export PATH="$PATH:/usr/sbin"

node_socket() { echo "$CLUSTER_DIR/run/node$1.sock"; }
node_datadir() { echo "$CLUSTER_DIR/node$1"; }
gcomm_address() {
  local list=() p
  for p in "${NODE_GCOMM_PORTS[@]}"; do list+=("127.0.0.1:$p"); done
  (IFS=,; echo "gcomm://${list[*]}")
}

# Start node N (1-3); "new" bootstraps a new cluster from it. Runs as the mysql user: rsync state transfer drops to it.
cluster_node_start() {
  local n="$1" mode="${2:-join}" i=$(($1 - 1)) datadir
  datadir="$(node_datadir "$n")"
  if [ ! -d "$datadir/mysql" ]; then
    mkdir -p "$datadir"; chown mysql:mysql "$datadir"
    mariadb-install-db --no-defaults --datadir="$datadir" --user=mysql --auth-root-authentication-method=socket \
      --skip-test-db --skip-name-resolve >"$CLUSTER_DIR/run/install$n.log" 2>&1
  fi
  local bootstrap=()
  [ "$mode" = new ] && bootstrap=(--wsrep-new-cluster)
  nohup mariadbd --no-defaults --datadir="$datadir" --user=mysql --bind-address=127.0.0.1 \
    --port="${NODE_SQL_PORTS[$i]}" --socket="$(node_socket "$n")" --pid-file="$CLUSTER_DIR/run/node$n.pid" \
    --log-error="$CLUSTER_DIR/run/node$n.err" --skip-name-resolve --innodb-buffer-pool-size=64M --max-connections=300 \
    --binlog-format=ROW --default-storage-engine=InnoDB --innodb-autoinc-lock-mode=2 --innodb-flush-log-at-trx-commit=2 \
    --wsrep-on=ON --wsrep-provider=/usr/lib/galera/libgalera_smm.so --wsrep-cluster-name=bandwright \
    --wsrep-cluster-address="$(gcomm_address)" --wsrep-node-name="node$n" --wsrep-node-address="127.0.0.1:${NODE_GCOMM_PORTS[$i]}" \
    --wsrep-provider-options="gmcast.listen_addr=tcp://127.0.0.1:${NODE_GCOMM_PORTS[$i]};ist.recv_addr=127.0.0.1:${NODE_IST_PORTS[$i]};evs.suspect_timeout=PT3S;evs.inactive_timeout=PT6S;evs.install_timeout=PT6S" \
    --wsrep-sst-method=rsync --wsrep-sst-receive-address="127.0.0.1:${NODE_SST_PORTS[$i]}" \
    "${bootstrap[@]}" </dev/null >/dev/null 2>&1 &
  for _ in $(seq 1 600); do cluster_node_synced "$n" && return 0; sleep 0.2; done
  echo "Galera node $n did not reach Synced; see $CLUSTER_DIR/run/node$n.err" >&2
  tail -30 "$CLUSTER_DIR/run/node$n.err" >&2
  return 1
}

cluster_node_status() { mariadb --no-defaults -S "$(node_socket "$1")" -uroot -N -e "SHOW GLOBAL STATUS LIKE '$2'" 2>/dev/null | awk '{print $2}'; }
cluster_node_synced() { [ "$(cluster_node_status "$1" wsrep_local_state_comment)" = Synced ]; }

cluster_wait_size() {
  for _ in $(seq 1 300); do [ "$(cluster_node_status 1 wsrep_cluster_size)" = "$1" ] && return 0; sleep 0.2; done
  echo "the cluster did not reach $1 nodes" >&2; return 1
}

# Kill node N hard (no clean shutdown), as a crash would.
cluster_node_kill() {
  local pid; pid="$(cat "$CLUSTER_DIR/run/node$1.pid" 2>/dev/null || true)"
  [ -n "$pid" ] && kill -9 "$pid" 2>/dev/null || true
  for _ in $(seq 1 50); do [ -n "$pid" ] && kill -0 "$pid" 2>/dev/null || break; sleep 0.1; done
}

cluster_app_start() {
  local i="$1"
  DB_HOST=127.0.0.1 DB_PORT=$CLUSTER_DB_PORT PORT="${APP_PORTS[$((i - 1))]}" APP_URL="http://127.0.0.1:$CLUSTER_APP_PORT" \
    JWT_SECRET="${JWT_SECRET:-$(bash scripts/jwt-secret.sh "$CLUSTER_DIR/secret")}" SEED_DEMO_ACCOUNTS=1 \
    nohup node dist/server/main.js >"$CLUSTER_DIR/run/app$i.log" 2>&1 &
  echo $! >"$CLUSTER_DIR/run/app$i.pid"
  for _ in $(seq 1 200); do curl -fsS "http://127.0.0.1:${APP_PORTS[$((i - 1))]}/api/health" >/dev/null 2>&1 && return 0; sleep 0.2; done
  echo "app instance $i did not start; see $CLUSTER_DIR/run/app$i.log" >&2; tail -20 "$CLUSTER_DIR/run/app$i.log" >&2; return 1
}

cluster_app_kill() { kill -9 "$(cat "$CLUSTER_DIR/run/app$1.pid" 2>/dev/null)" 2>/dev/null || true; }

# HAProxy's own refusals in the app's error shape: a 503 with a code, so a client knows it was not served.
cluster_write_error_pages() {
  local status
  for status in 502 503 504; do
    local body='{"statusCode":503,"code":"INSTANCE_UNAVAILABLE","message":"No Bandwright instance could answer; try again shortly"}'
    printf 'HTTP/1.1 503 Service Unavailable\r\nContent-Type: application/json\r\nCache-Control: no-store\r\nContent-Length: %s\r\nConnection: close\r\n\r\n%s' "${#body}" "$body" >"$CLUSTER_DIR/error-$status.http"
  done
}

cluster_write_haproxy_config() {
  cluster_write_error_pages
  {
    cat <<CFG
global
  maxconn 2000
defaults
  timeout connect 2s
  timeout client 60s
  timeout server 60s
  timeout check 2s
  retries 2
  option redispatch
listen stats
  bind 127.0.0.1:$CLUSTER_STATS_PORT
  mode http
  stats enable
  stats uri /
# The database: one writer at a time (the others as backups) avoids certification conflicts between nodes;
# a node counts only while it is Synced in the primary component (scripts/galera-check.js).
listen galera
  bind 127.0.0.1:$CLUSTER_DB_PORT
  mode tcp
  option httpchk GET /
  default-server inter 1s fall 2 rise 2 on-marked-down shutdown-sessions
CFG
    local i
    for i in 0 1 2; do
      local backup=""; [ "$i" -gt 0 ] && backup=" backup"
      echo "  server node$((i + 1)) 127.0.0.1:${NODE_SQL_PORTS[$i]} check port ${NODE_CHECK_PORTS[$i]}$backup"
    done
    cat <<CFG
# The app: both instances, round robin, each checked on its own health route.
listen app
  bind 127.0.0.1:$CLUSTER_APP_PORT
  mode http
  balance roundrobin
  option httpchk GET /api/health
  option forwardfor
  # The whole request reaches HAProxy before an instance sees it: an instance dying mid-upload then gets a 503 answer, not a cut connection.
  option http-buffer-request
  # Only a connection that never reached an instance is retried: a write cut off after it arrived may have committed.
  retry-on conn-failure
  default-server inter 1s fall 2 rise 2
  errorfile 502 $CLUSTER_DIR/error-502.http
  errorfile 503 $CLUSTER_DIR/error-503.http
  errorfile 504 $CLUSTER_DIR/error-504.http
CFG
    for i in 0 1; do echo "  server app$((i + 1)) 127.0.0.1:${APP_PORTS[$i]} check"; done
  } >"$CLUSTER_DIR/haproxy.cfg"
}
