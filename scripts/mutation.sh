#!/usr/bin/env bash
# Mutation testing (issue 16): Stryker over the areas in stryker.config.mjs, then the score per area.
# Extra arguments go to Stryker, e.g. `npm run test:mutation -- --force` to retest every mutant, or
# `npm run test:mutation -- --mutate 'lib/units/**/*.ts'` for one area (the table then covers the last run only).
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."
started=$(date +%s)
npx stryker run "$@"
echo
npx tsx scripts/mutation-score.ts
echo "mutation run: $(( $(date +%s) - started )) s"
