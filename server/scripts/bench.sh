#!/usr/bin/env bash
# npm run bench: engine timings, then request latency while the worker pool is busy.
. "$(dirname "$0")/lib.sh"
cd "$ROOT"
ensure_secrets
bash server/scripts/db.sh start >/dev/null
npx tsx server/scripts/bench.ts
npx tsx server/scripts/bench-server.ts
