#!/usr/bin/env bash
# npm start: install what is missing, start local services, migrate, seed when empty, start the mail worker,
# build, serve.
source "$(dirname "$0")/lib.sh"
ensure_postgres_installed
ensure_node_modules
ensure_env_file
export SAGLINE_DEV_TOOLS="${SAGLINE_DEV_TOOLS:-1}"
export APP_URL="${APP_URL:-http://localhost:$PORT}"
node_modules/.bin/tsx scripts/check-env.ts
port_in_use "$PORT" && fail "port $PORT is taken (is Sagline already running?); run npm run stop or set PORT"
services_start
$TSX scripts/migrate.ts
$TSX scripts/seed/index.ts --if-empty
# The mail worker sends what the app queues (sign-in links, receipts, decisions); npm run stop ends it.
worker_start
say "building (next build)"
# The data cache (tagged reads) outlives builds and belongs to whichever database filled it (npm test's
# browser run uses its own): start from an empty one so the site shows this database.
rm -rf "$DIST_DIR/cache/fetch-cache"
node_modules/.bin/next build >"$RUN_DIR/build.log" 2>&1 || { tail -n 40 "$RUN_DIR/build.log" >&2; fail "next build failed (full log in .run/build.log)"; }
say "serving on http://localhost:$PORT  (open this address; npm run stop stops everything)"
echo $$ >"$RUN_DIR/app.pid"
exec node scripts/serve.mjs -H 127.0.0.1 -p "$PORT"
