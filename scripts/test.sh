#!/usr/bin/env bash
# Every test Chillwright has: types, lint, unit and integration (real MariaDB), then the browser.
set -euo pipefail
REPO="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$REPO"
export NEXT_TELEMETRY_DISABLED=1

bash scripts/ensure-deps.sh --with-browser
started=$(date +%s)
step() { echo; echo "== $* ($(( $(date +%s) - started )) s)"; }

step "typecheck"; npx tsc --noEmit
step "lint"; npx eslint . --max-warnings=0
step "formatting"; npx prettier --check . --log-level warn
step "unit and integration tests"; npx vitest run
step "production build"; npx next build
step "browser tests"; npx playwright test
step "all tests passed"
