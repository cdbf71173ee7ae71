#!/usr/bin/env bash
# npm test: on a fresh machine too — installs what is missing, starts (or reuses) the private
# MariaDB, then type checks, lint, unit, API and browser tests against throwaway databases.
. "$(dirname "$0")/lib.sh"
cd "$ROOT"
bash server/scripts/ensure-system.sh
ensure_secrets
started_db=0
if ! bash server/scripts/db.sh status >/dev/null 2>&1; then
  bash server/scripts/db.sh start
  started_db=1
fi
cleanup() { [ "$started_db" = 1 ] && bash server/scripts/db.sh stop >/dev/null 2>&1 || true; }
trap cleanup EXIT

export NODE_ENV=test
step() { log "$1"; shift; "$@"; }
step "type checks" npm run -s typecheck
step "lint" npm run -s lint
step "building the client for the browser tests" npx vite build --logLevel warn
step "unit, API and browser tests" npx vitest run
