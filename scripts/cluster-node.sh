#!/usr/bin/env bash
# For the failover test: bash scripts/cluster-node.sh kill-db N | start-db N | kill-app I | start-app I
source "$(dirname "$0")/common.sh"
source "$(dirname "$0")/cluster-common.sh"
case "$1" in
  kill-db) cluster_node_kill "$2" ;;
  start-db) cluster_node_start "$2" ;;
  kill-app) cluster_app_kill "$2" ;;
  start-app) cluster_app_start "$2" ;;
  *) echo "usage: $0 kill-db N | start-db N | kill-app I | start-app I" >&2; exit 2 ;;
esac
