#!/usr/bin/env bash
# A private MariaDB instance for this checkout: own data directory, port and socket, loopback only.
# Usage: db.sh start | stop | status
. "$(dirname "$0")/lib.sh"
ensure_secrets
PATH="$PATH:/usr/sbin:/usr/bin"
USER_ARG=()
[ "$(id -u)" = 0 ] && USER_ARG=(--user=root)

client() { mariadb --no-defaults --socket="$DB_SOCK" -uroot "$@"; }
ping_db() { mariadb-admin --no-defaults --socket="$DB_SOCK" -uroot ping >/dev/null 2>&1; }

start() {
  if pid_alive "$DB_PID" && ping_db; then return 0; fi
  if [ ! -d "$DB_DATA/mysql" ]; then
    log "creating the database directory in .local/mariadb"
    mkdir -p "$DB_DATA"
    mariadb-install-db --no-defaults --datadir="$DB_DATA" "${USER_ARG[@]}" \
      --auth-root-authentication-method=socket --skip-test-db >"$LOCAL/log/mariadb-install.log" 2>&1 \
      || fail "mariadb-install-db failed; see .local/log/mariadb-install.log"
  fi
  setsid nohup mariadbd --no-defaults --datadir="$DB_DATA" "${USER_ARG[@]}" \
    --bind-address=127.0.0.1 --port="$DB_PORT" --socket="$DB_SOCK" --pid-file="$DB_PID" \
    --log-error="$DB_LOG" --skip-name-resolve --character-set-server=utf8mb4 \
    --collation-server=utf8mb4_unicode_ci --skip-log-bin 9>&- >/dev/null 2>&1 &
  local bg=$!
  for _ in $(seq 1 100); do
    ping_db && break
    kill -0 "$bg" 2>/dev/null || fail "MariaDB did not start (port $DB_PORT taken?); see $DB_LOG"
    sleep 0.1
  done
  ping_db || fail "MariaDB did not answer within 10 s; see $DB_LOG"
  client <<SQL
CREATE DATABASE IF NOT EXISTS quellnode CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
CREATE USER IF NOT EXISTS 'app'@'127.0.0.1' IDENTIFIED BY '$DB_PASSWORD';
CREATE USER IF NOT EXISTS 'app'@'localhost' IDENTIFIED BY '$DB_PASSWORD';
ALTER USER 'app'@'127.0.0.1' IDENTIFIED BY '$DB_PASSWORD';
ALTER USER 'app'@'localhost' IDENTIFIED BY '$DB_PASSWORD';
GRANT ALL PRIVILEGES ON quellnode.* TO 'app'@'127.0.0.1', 'app'@'localhost';
GRANT ALL PRIVILEGES ON \`app_test\_%\`.* TO 'app'@'127.0.0.1', 'app'@'localhost';
FLUSH PRIVILEGES;
SQL
  log "MariaDB on 127.0.0.1:$DB_PORT"
}

stop() {
  pid_alive "$DB_PID" || return 0
  local pid
  pid="$(cat "$DB_PID")"
  mariadb-admin --no-defaults --socket="$DB_SOCK" -uroot shutdown >/dev/null 2>&1 || kill "$pid" 2>/dev/null || true
  for _ in $(seq 1 100); do kill -0 "$pid" 2>/dev/null || break; sleep 0.1; done
  log "MariaDB stopped"
}

case "${1:-}" in
  start) start ;;
  stop) stop ;;
  status) if pid_alive "$DB_PID" && ping_db; then echo running; else echo stopped; exit 1; fi ;;
  *) echo "usage: db.sh start|stop|status" >&2; exit 64 ;;
esac
