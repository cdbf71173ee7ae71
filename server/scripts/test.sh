#!/usr/bin/env bash
# npm test: on a fresh machine too — installs what is missing, starts (or reuses) the private
# MariaDB, then type checks, lint, unit, API and browser tests against throwaway databases
# (the checks and the unit tests run beside the slower steps).
. "$(dirname "$0")/lib.sh"
cd "$ROOT"
bash server/scripts/ensure-system.sh
ensure_secrets
started_db=0
if ! bash server/scripts/db.sh status >/dev/null 2>&1; then
  bash server/scripts/db.sh start
  started_db=1
fi
cleanup() {
  # a step run beside the others does not outlive a failed run
  for pid in $(jobs -p); do kill "$pid" 2>/dev/null || true; done
  [ "$started_db" = 1 ] && bash server/scripts/db.sh stop >/dev/null 2>&1 || true
}
trap cleanup EXIT

export NODE_ENV=test
step() { log "$1"; shift; "$@"; }
# Steps that need neither the database nor the built client run beside the others (each is one
# process on one core); their output is kept in .local/log and shown when they are waited for.
declare -A BESIDE
beside() {
  local name=$1
  shift
  log "$name (beside the next steps)"
  "$@" >"$LOCAL/log/test-${name// /-}.log" 2>&1 &
  BESIDE[$name]=$!
}
joined() {
  local name=$1 rc=0
  wait "${BESIDE[$name]}" || rc=$?
  log "$name: $([ "$rc" = 0 ] && echo passed || echo "FAILED (exit $rc)")"
  cat "$LOCAL/log/test-${name// /-}.log"
  return "$rc"
}

beside "type checks" npm run -s typecheck
step "lint" npm run -s lint
joined "type checks"
beside "unit and client tests" npx vitest run --project unit --project client
step "building the client for the browser tests" npx vite build --logLevel warn
# A log's failures, printed again at the very end: CI keeps only the tail of a long output.
failures() {
  sed 's/\x1b\[[0-9;]*m//g' "$LOCAL/log/test-$1.log" |
    sed -n '/Failed Suites\|Failed Tests\|Unhandled Error/,$p' | head -200
}
# where each page of a failed browser test stood (tests/helpers/browser-journal.ts)
page_reports() {
  grep -a -F '[page report]' "$LOCAL/log/test-$1.log" | sed 's/\x1b\[[0-9;]*m//g' | head -150 || true
}
rc=0
step "API and browser tests" bash -c 'npx vitest run --project api --project e2e 2>&1 | tee "$1"; exit "${PIPESTATUS[0]}"' _ "$LOCAL/log/test-API-and-browser-tests.log" || rc=$?
joined "unit and client tests" || rc=$?
if [ "$rc" != 0 ]; then
  log "failed; what failed, once more:"
  page_reports "API-and-browser-tests"
  failures "API-and-browser-tests"
  failures "unit-and-client-tests"
elif grep -q -a -F '[page report]' "$LOCAL/log/test-API-and-browser-tests.log"; then
  log "passed, but a browser test passed only when run again; where its first run's pages stood:"
  page_reports "API-and-browser-tests"
fi
exit "$rc"
