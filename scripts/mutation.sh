#!/usr/bin/env bash
# Mutation testing (issue 16): Stryker over each area of stryker.config.mjs in turn, then the score per area.
#   npm run test:mutation                                  every area, one after the other
#   npm run test:mutation -- diagnosis service             the areas named (diagnosis refrigerants service units machines)
#   npm run test:mutation -- diagnosis --mutate 'lib/diagnosis/grading.ts'
#                                                          one file of an area; the area's other results are kept
#   npm run test:mutation -- diagnosis --force             retest every mutant of the area, not only the changed ones
# Each area keeps its incremental file (reports/incremental/<area>.json) and its report
# (reports/mutation/<area>.json); the table at the end merges every area's last report.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."
all_areas=(diagnosis refrigerants service units machines)
areas=()
while [[ $# -gt 0 && " ${all_areas[*]} " == *" $1 "* ]]; do
  areas+=("$1")
  shift
done
[[ ${#areas[@]} -eq 0 ]] && areas=("${all_areas[@]}")
started=$(date +%s)
for area in "${areas[@]}"; do
  echo "== mutation testing: ${area}"
  MUTATION_AREA="$area" npx stryker run "$@"
done
echo
npx tsx scripts/mutation-score.ts
echo "mutation run: $(($(date +%s) - started)) s"
