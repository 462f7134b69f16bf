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
# Throwaway mail catcher and S3 fake next to the app's port, so parallel checkouts never share them.
MAIL_SMTP_PORT="${E2E_SMTP_PORT:-$((E2E_PORT + 1))}" MAIL_HTTP_PORT="${E2E_MAIL_HTTP_PORT:-$((E2E_PORT + 2))}"
S3_PORT="${E2E_S3_PORT:-$((E2E_PORT + 3))}"
FAKES_DIR="${DB_DIR}-fakes"
export SMTP_URL="smtp://127.0.0.1:$MAIL_SMTP_PORT" S3_ENDPOINT="http://127.0.0.1:$S3_PORT"

bash scripts/db.sh down >/dev/null 2>&1 || true
rm -rf "$DB_DIR"
bash scripts/db.sh up
cleanup() {
  [[ -n "${app_pid:-}" ]] && kill "$app_pid" 2>/dev/null || true
  [[ -n "${mail_pid:-}" ]] && kill "$mail_pid" 2>/dev/null || true
  [[ -n "${s3_pid:-}" ]] && kill "$s3_pid" 2>/dev/null || true
  rm -rf "$FAKES_DIR"
  bash scripts/db.sh down >/dev/null 2>&1 || true
  rm -rf "$DB_DIR"
}
trap cleanup EXIT INT TERM
rm -rf "$FAKES_DIR"
"$REPO/node_modules/.bin/tsx" scripts/fakes/mail-catcher.ts --smtp-port "$MAIL_SMTP_PORT" --http-port "$MAIL_HTTP_PORT" --dir "$FAKES_DIR/mail" &
mail_pid=$!
"$REPO/node_modules/.bin/tsx" scripts/fakes/s3-fake.ts --port "$S3_PORT" --dir "$FAKES_DIR/s3" --bucket chillwright-photos &
s3_pid=$!
npx tsx scripts/migrate.ts up
npx tsx scripts/seed.ts
"$REPO/node_modules/.bin/next" start -H 127.0.0.1 -p "$E2E_PORT" &
app_pid=$!
wait "$app_pid"
