#!/usr/bin/env bash
# npm run stop: stops the app, the fakes and the private MariaDB that npm start began.
. "$(dirname "$0")/lib.sh"
stop_group() {
  local file="$1" name="$2"
  pid_alive "$file" || { rm -f "$file"; return 0; }
  local pid
  pid="$(cat "$file")"
  kill -TERM -- "-$pid" 2>/dev/null || kill -TERM "$pid" 2>/dev/null || true
  for _ in $(seq 1 50); do kill -0 "$pid" 2>/dev/null || break; sleep 0.1; done
  kill -KILL -- "-$pid" 2>/dev/null || true
  rm -f "$file"
  log "$name stopped"
}
stop_group "$LOCAL/run/app.pid" "app"
stop_group "$LOCAL/run/fakes.pid" "fakes"
bash "$ROOT/server/scripts/db.sh" stop
