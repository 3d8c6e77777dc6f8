#!/usr/bin/env bash
# The private MariaDB by hand: bash scripts/db.sh start|stop|status|shell [database]
source "$(dirname "$0")/common.sh"
export DB_PORT="${DB_PORT:-3307}" DB_USER="${DB_USER:-bandwright}" DB_PASSWORD="${DB_PASSWORD:-bandwright-local}"
export PATH="$PATH:/usr/sbin"
case "${1:-status}" in
  start) ensure_debian_packages; db_start; log "MariaDB up on 127.0.0.1:$DB_PORT" ;;
  stop) db_stop; log "MariaDB stopped" ;;
  status) if db_ping; then echo up; else echo down; exit 1; fi ;;
  shell) exec mariadb --no-defaults -S "$SOCK" -uroot "${2:-bandwright}" ;;
  *) echo "usage: $0 start|stop|status|shell [database]" >&2; exit 2 ;;
esac
