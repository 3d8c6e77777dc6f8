#!/usr/bin/env bash
# npm run cluster:stop: stops what npm run cluster started.
source "$(dirname "$0")/common.sh"
source "$(dirname "$0")/cluster-common.sh"
for f in "$CLUSTER_DIR"/run/app*.pid "$CLUSTER_DIR"/run/haproxy.pid "$CLUSTER_DIR"/run/galera-check.pid; do
  [ -f "$f" ] && { kill "$(cat "$f")" 2>/dev/null || true; rm -f "$f"; }
done
fakes_stop cluster
for n in 3 2 1; do
  [ -S "$(node_socket "$n")" ] && mariadb-admin --no-defaults -S "$(node_socket "$n")" -uroot shutdown >/dev/null 2>&1 || true
  pid="$(cat "$CLUSTER_DIR/run/node$n.pid" 2>/dev/null || true)"
  for _ in $(seq 1 100); do [ -n "$pid" ] && kill -0 "$pid" 2>/dev/null || break; sleep 0.1; done
  [ -n "$pid" ] && kill -9 "$pid" 2>/dev/null || true
done
log "cluster stopped"
