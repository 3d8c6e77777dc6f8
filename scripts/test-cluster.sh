#!/usr/bin/env bash
# npm run test:cluster (npm test runs it too): starts the cluster, drives writes through HAProxy while a database node
# and an app instance are killed, checks every node afterwards, and stops the cluster.
#   RESULTS=<dir> writes jest's JSON there for the summary.
source "$(dirname "$0")/common.sh"
trap 'bash "$ROOT/scripts/cluster-stop.sh" >/dev/null 2>&1 || true' EXIT
bash scripts/cluster.sh
args=(-c jest.cluster.config.js --runInBand)
[ -n "${RESULTS:-}" ] && args+=(--json --outputFile="$RESULTS/cluster.json")
npx jest "${args[@]}"
