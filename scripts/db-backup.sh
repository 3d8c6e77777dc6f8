#!/usr/bin/env bash
# npm run db:backup [file]   — a consistent SQL dump of the app database (mariadb-dump, single transaction).
# npm run db:restore <file>  — loads a dump into the app database, replacing its tables.
source "$(dirname "$0")/common.sh"
[ -f .env ] && set -a && source .env && set +a
export DB_PORT="${DB_PORT:-3307}" DB_USER="${DB_USER:-bandwright}" DB_PASSWORD="${DB_PASSWORD:-bandwright-local}"
DB_NAME="${DB_NAME:-bandwright}"
export PATH="$PATH:/usr/sbin"
mode="$1"; shift
connect=(--no-defaults --protocol=tcp -h "${DB_HOST:-127.0.0.1}" -P "$DB_PORT" -u "$DB_USER")
export MYSQL_PWD="$DB_PASSWORD"
case "$mode" in
  backup)
    out="${1:-$ROOT/.data/backups/$DB_NAME-$(date -u +%Y%m%dT%H%M%SZ).sql.gz}"
    mkdir -p "$(dirname "$out")"
    mariadb-dump "${connect[@]}" --single-transaction --routines --triggers --hex-blob --default-character-set=utf8mb4 "$DB_NAME" | gzip >"$out.partial"
    # A dump is only trusted once the dump tool finished and wrote its completion line.
    gzip -dc "$out.partial" | tail -1 | grep -q "Dump completed" || { rm -f "$out.partial"; echo "backup incomplete" >&2; exit 1; }
    mv "$out.partial" "$out"
    log "backup of $DB_NAME written to $out"
    ;;
  restore)
    in="${1:?usage: npm run db:restore -- <file.sql.gz|file.sql>}"
    [ -f "$in" ] || { echo "no such file: $in" >&2; exit 1; }
    reader=(cat); case "$in" in *.gz) reader=(gzip -dc) ;; esac
    "${reader[@]}" "$in" | tail -1 | grep -q "Dump completed" || { echo "$in is not a complete dump; nothing restored" >&2; exit 1; }
    "${reader[@]}" "$in" | mariadb "${connect[@]}" "$DB_NAME"
    log "restored $DB_NAME from $in"
    ;;
  *) echo "usage: $0 backup [file] | restore <file>" >&2; exit 2 ;;
esac
