#!/usr/bin/env bash
# Prints this install's JWT secret, generating it on first use: random, kept in <data dir>/jwt-secret (mode 600).
#   bash scripts/jwt-secret.sh .data
# Each install gets its own key, so no published value ever signs a token.
set -euo pipefail
DIR="${1:?usage: jwt-secret.sh <data dir>}"
FILE="$DIR/jwt-secret"
mkdir -p "$DIR"
if [ ! -s "$FILE" ]; then
  rm -f "$FILE"  # an empty file left by a full disk is no secret
  umask 077
  TMP="$(mktemp "$DIR/.jwt-secret.XXXXXX")"
  node -e "process.stdout.write(require('node:crypto').randomBytes(48).toString('base64url'))" >"$TMP"
  # A hard link never replaces an existing file, so two starts at once keep whichever secret landed first.
  ln "$TMP" "$FILE" 2>/dev/null || true
  rm -f "$TMP"
fi
chmod 600 "$FILE"
cat "$FILE"
