#!/usr/bin/env bash
# Started by Playwright: a throwaway MariaDB with demo data and the built app on port 3100 (E2E_PORT).
set -euo pipefail
REPO="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$REPO"
export DB_DIR="${E2E_DB_DIR:-/tmp/cw-e2e-db}" DB_PORT="${E2E_DB_PORT:-3327}" DB_NAME=chillwright_e2e
export DATABASE_URL="$(bash scripts/db.sh url)"
E2E_PORT="${E2E_PORT:-3100}"
export APP_ORIGIN="http://127.0.0.1:$E2E_PORT"
export NEXT_TELEMETRY_DISABLED=1

bash scripts/db.sh down >/dev/null 2>&1 || true
rm -rf "$DB_DIR"
bash scripts/db.sh up
cleanup() {
  [[ -n "${app_pid:-}" ]] && kill "$app_pid" 2>/dev/null || true
  bash scripts/db.sh down >/dev/null 2>&1 || true
  rm -rf "$DB_DIR"
}
trap cleanup EXIT INT TERM
npx tsx scripts/migrate.ts up
npx tsx scripts/seed.ts
"$REPO/node_modules/.bin/next" start -H 127.0.0.1 -p "$E2E_PORT" &
app_pid=$!
wait "$app_pid"
