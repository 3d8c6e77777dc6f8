#!/usr/bin/env bash
# npm run stop: stops what npm start (or an interrupted npm test) left running.
source "$(dirname "$0")/common.sh"
export PATH="$PATH:/usr/sbin"
for f in "$RUN_DIR"/app*.pid; do [ -f "$f" ] && { kill "$(cat "$f")" 2>/dev/null || true; rm -f "$f"; }; done
for f in "$RUN_DIR"/fakes-*.pid; do [ -f "$f" ] && { kill "$(cat "$f")" 2>/dev/null || true; rm -f "$f"; }; done
command -v mariadb-admin >/dev/null 2>&1 && db_stop
log "stopped"
