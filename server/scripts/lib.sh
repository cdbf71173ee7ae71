# Shared settings for the start, stop, test and database scripts. Sourced, not run.
set -euo pipefail
ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
LOCAL="$ROOT/.local"
mkdir -p "$LOCAL/run" "$LOCAL/log"

DB_PORT="${DB_PORT:-3307}"
DB_DATA="$LOCAL/mariadb"
DB_SOCK="$LOCAL/run/mariadb.sock"
# A unix socket path must stay under 108 bytes; a deep checkout falls back to /tmp.
if [ ${#DB_SOCK} -gt 100 ]; then
  DB_SOCK="/tmp/quellnode-$(printf '%s' "$ROOT" | md5sum | cut -c1-12).sock"
fi
DB_PID="$LOCAL/run/mariadb.pid"
DB_LOG="$LOCAL/log/mariadb.log"

log() { printf '\033[1m[quellnode]\033[0m %s\n' "$*"; }
fail() { printf '[quellnode] error: %s\n' "$*" >&2; exit 1; }

pid_alive() { [ -f "$1" ] && kill -0 "$(cat "$1")" 2>/dev/null; }

as_root() { if [ "$(id -u)" = 0 ]; then "$@"; else sudo "$@"; fi; }

# Secrets made once per checkout and kept out of git: the app's database password and token key.
ensure_secrets() {
  local file="$LOCAL/secrets.env"
  if [ ! -f "$file" ]; then
    umask 077
    {
      echo "DB_PASSWORD=$(head -c 18 /dev/urandom | base64 | tr -dc 'A-Za-z0-9' | head -c 20)"
      echo "JWT_SECRET=$(head -c 48 /dev/urandom | base64 | tr -dc 'A-Za-z0-9' | head -c 48)"
    } >"$file"
  fi
  set -a
  # shellcheck disable=SC1090
  . "$file"
  set +a
}
