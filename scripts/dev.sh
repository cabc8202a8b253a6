#!/usr/bin/env bash
# npm run dev: services, migrations and seed, the mail worker, then the Next.js dev server with hot reload
# (npm run stop ends the worker and the services).
source "$(dirname "$0")/lib.sh"
ensure_node_modules
ensure_env_file
export SAGLINE_DEV_TOOLS=1 APP_URL="${APP_URL:-http://localhost:$PORT}"
services_start
$TSX scripts/migrate.ts
$TSX scripts/seed/index.ts --if-empty
worker_start
exec node_modules/.bin/next dev -H 127.0.0.1 -p "$PORT"
