#!/usr/bin/env bash
# npm run dev: MariaDB, fakes and the API with reload, and Vite with hot reload proxying /api.
. "$(dirname "$0")/lib.sh"
cd "$ROOT"
bash server/scripts/ensure-system.sh
ensure_secrets
bash server/scripts/db.sh start
npx tsx node_modules/typeorm/cli.js migration:run -d server/data-source.ts >/dev/null
npx tsx seed/index.ts
export STRIPE_API_HOST=127.0.0.1 STRIPE_API_PORT=4310 STRIPE_API_PROTOCOL=http PUBLIC_URL=http://127.0.0.1:5173
trap 'kill 0' EXIT
npx tsx fakes/main.ts &
npx tsx watch server/main.ts &
npx vite
