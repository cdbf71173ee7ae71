#!/usr/bin/env bash
# npm run bench [-- --json]: engine, server and client-bundle figures beside their targets.
# With --json, stdout carries one JSON object and nothing else (progress goes to stderr).
. "$(dirname "$0")/lib.sh"
cd "$ROOT"
ensure_secrets
started_db=0
if ! bash server/scripts/db.sh status >/dev/null 2>&1; then
  bash server/scripts/db.sh start >&2
  started_db=1
fi
cleanup() { [ "$started_db" = 1 ] && bash server/scripts/db.sh stop >/dev/null 2>&1 || true; }
trap cleanup EXIT
npx tsx server/scripts/bench.ts "$@"
