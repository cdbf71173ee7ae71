#!/usr/bin/env bash
# Installs what a fresh Debian machine lacks: MariaDB and Chromium from Debian, npm packages.
. "$(dirname "$0")/lib.sh"

need=()
command -v mariadbd >/dev/null 2>&1 || [ -x /usr/sbin/mariadbd ] || need+=(mariadb-server mariadb-client)
[ -x /usr/bin/chromium ] || need+=(chromium fonts-liberation)
command -v pdftotext >/dev/null 2>&1 || need+=(poppler-utils)
if [ ${#need[@]} -gt 0 ]; then
  log "installing from Debian: ${need[*]}"
  as_root apt-get update -qq
  as_root env DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends "${need[@]}" >"$LOCAL/log/apt.log"
fi

stamp="$ROOT/node_modules/.package-lock.json"
if [ ! -f "$stamp" ] || [ "$ROOT/package-lock.json" -nt "$stamp" ]; then
  log "installing npm packages"
  (cd "$ROOT" && npm ci --no-audit --no-fund --loglevel=error)
fi
