#!/usr/bin/env bash
# npm run services:start|services:stop — only the local services (PostgreSQL, mail catcher, S3 stand-in).
source "$(dirname "$0")/lib.sh"
case "${1:-start}" in
  start) ensure_node_modules; services_start ;;
  stop) services_stop ;;
  *) fail "usage: scripts/services.sh start|stop" ;;
esac
