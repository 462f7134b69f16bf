#!/usr/bin/env bash
# From a fresh clone to Chillwright with demo data at http://127.0.0.1:3000.
# Ctrl-C stops the app and the private MariaDB this script started.
set -euo pipefail
REPO="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$REPO"

bash scripts/ensure-deps.sh

export DB_DIR="${DB_DIR:-$REPO/.data/mariadb}" DB_PORT="${DB_PORT:-3307}"
export DATABASE_URL="${DATABASE_URL:-$(bash scripts/db.sh url)}"
export APP_ORIGIN="${APP_ORIGIN:-http://127.0.0.1:3000}"
export NEXT_TELEMETRY_DISABLED=1
# The local mail catcher and S3 fake (loopback only); a real provider is set in .env instead.
MAIL_SMTP_PORT="${MAIL_SMTP_PORT:-2525}" MAIL_HTTP_PORT="${MAIL_HTTP_PORT:-8025}" S3_PORT="${S3_PORT:-4569}"
export SMTP_URL="${SMTP_URL:-smtp://127.0.0.1:$MAIL_SMTP_PORT}"
export S3_ENDPOINT="${S3_ENDPOINT-http://127.0.0.1:$S3_PORT}"

started_db=0
if ! bash scripts/db.sh status >/dev/null 2>&1; then started_db=1; fi
bash scripts/db.sh up
stop_all() {
  [[ -n "${app_pid:-}" ]] && kill "$app_pid" 2>/dev/null || true
  [[ -n "${mail_pid:-}" ]] && kill "$mail_pid" 2>/dev/null || true
  [[ -n "${s3_pid:-}" ]] && kill "$s3_pid" 2>/dev/null || true
  if (( started_db )); then bash scripts/db.sh down || true; fi
}
trap stop_all EXIT INT TERM

npx tsx scripts/migrate.ts up

"$REPO/node_modules/.bin/tsx" scripts/fakes/mail-catcher.ts --smtp-port "$MAIL_SMTP_PORT" --http-port "$MAIL_HTTP_PORT" --dir "$REPO/.data/mail" &
mail_pid=$!
"$REPO/node_modules/.bin/tsx" scripts/fakes/s3-fake.ts --port "$S3_PORT" --dir "$REPO/.data/s3" --bucket "${S3_BUCKET:-chillwright-photos}" &
s3_pid=$!
npx tsx scripts/seed.ts

# Build once; rebuild when sources are newer than the last build.
if [[ ! -f .next/BUILD_ID ]] || [[ -n "$(find app components lib machines models proxy.ts next.config.mjs tailwind.config.ts -newer .next/BUILD_ID -type f -print -quit)" ]]; then
  npx next build
fi

echo "Chillwright is starting at $APP_ORIGIN (demo accounts in README.md). Ctrl-C stops it."
echo "E-mail the demo sends is caught, not delivered: read it at http://127.0.0.1:$MAIL_HTTP_PORT/ (files in .data/mail)."
"$REPO/node_modules/.bin/next" start -H 127.0.0.1 -p 3000 &
app_pid=$!
wait "$app_pid"
