#!/usr/bin/env bash
# npm start: everything on one machine — packages, MariaDB, migrations, demo data, fakes, app.
. "$(dirname "$0")/lib.sh"
cd "$ROOT"
# Each default may use the ones above it, so they are set one at a time.
export PORT="${PORT:-4300}"
export MAIL_WEB_PORT="${MAIL_WEB_PORT:-4380}"
export PAYMENTS_FAKE_PORT="${PAYMENTS_FAKE_PORT:-4310}"
export MAIL_SMTP_PORT="${MAIL_SMTP_PORT:-4325}"
export SMTP_PORT="${SMTP_PORT:-$MAIL_SMTP_PORT}"
export STRIPE_API_HOST="${STRIPE_API_HOST:-127.0.0.1}"
export STRIPE_API_PORT="${STRIPE_API_PORT:-$PAYMENTS_FAKE_PORT}"
export STRIPE_API_PROTOCOL="${STRIPE_API_PROTOCOL:-http}"
export MAILBOX_URL="${MAILBOX_URL:-http://127.0.0.1:$MAIL_WEB_PORT}"
export PAYMENTS_WEBHOOK_URL="${PAYMENTS_WEBHOOK_URL:-http://127.0.0.1:$PORT/api/payments/webhook}"
export NODE_ENV="${NODE_ENV:-development}"
APP_PID="$LOCAL/run/app.pid"
FAKES_PID="$LOCAL/run/fakes.pid"

print_banner() {
  cat <<TXT

  Quellnode is running:  http://127.0.0.1:$PORT
  Caught e-mail:         $MAILBOX_URL
  Payment stand-in:      http://127.0.0.1:$PAYMENTS_FAKE_PORT

  Demo sign-ins (e-mail / password):
TXT
  npx tsx -e "import('./seed/demo-people.ts').then(m => m.DEMO_USERS.forEach(u => console.log('    ' + u.role.padEnd(11) + u.email.padEnd(28) + u.password)))"
  printf '\n  Stop everything with: npm run stop\n\n'
}

healthy() { curl -fsS "http://127.0.0.1:$PORT/api/health" >/dev/null 2>&1; }

bash server/scripts/ensure-system.sh
ensure_secrets
if pid_alive "$APP_PID" && healthy; then
  log "already running"
  print_banner
  exit 0
fi

bash server/scripts/db.sh start
log "migrating the database"
npx tsx node_modules/typeorm/cli.js migration:run -d server/data-source.ts >"$LOCAL/log/migrate.log" 2>&1 \
  || fail "migration failed; see .local/log/migrate.log"
log "loading demo data"
npx tsx seed/index.ts
log "building the client"
npx vite build --logLevel warn

if ! pid_alive "$FAKES_PID"; then
  setsid nohup npx tsx fakes/main.ts >"$LOCAL/log/fakes.log" 2>&1 9>&- &
  echo $! >"$FAKES_PID"
fi
setsid nohup npx tsx server/main.ts >"$LOCAL/log/app.log" 2>&1 9>&- &
echo $! >"$APP_PID"
for _ in $(seq 1 150); do
  healthy && break
  pid_alive "$APP_PID" || { tail -20 "$LOCAL/log/app.log" >&2; fail "the app stopped (port $PORT taken?)"; }
  sleep 0.2
done
healthy || fail "the app did not answer within 30 s; see .local/log/app.log"
print_banner
