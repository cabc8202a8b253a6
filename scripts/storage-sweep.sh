#!/usr/bin/env bash
# npm run storage:sweep [-- --dry-run] [-- --max-age-days N] — remove abandoned draft uploads under incoming/
# (scripts/storage-sweep.ts). Reads .env.local like the other scripts; needs the database and the bucket.
source "$(dirname "$0")/lib.sh"
cd "$ROOT"
exec $TSX scripts/storage-sweep.ts "$@"
