import { type SpecRow, specRowKey } from "./schema";

interface RowLike {
  line: number;
  values?: SpecRow;
  problems: string[];
  warnings: string[];
}

function variantKey(r: SpecRow): string {
  return specRowKey({ ...r, yearFrom: 0, yearTo: 0 });
}

/**
 * Same make, model, variant, years and rear A/C twice is a duplicate (blocking); the same
 * variant with overlapping but different years is a warning, since the interview would
 * then offer both rows.
 */
export function findDuplicatesAndOverlaps(rows: RowLike[], existing: readonly SpecRow[]): void {
  const existingKeys = new Set(existing.map(specRowKey));
  const firstLineByKey = new Map<string, { line: number; row: SpecRow }>();
  const byVariant = new Map<string, { line: number; row: SpecRow }[]>();
  for (const r of rows) {
    const v = r.values;
    if (!v) continue;
    const key = specRowKey(v);
    if (existingKeys.has(key)) r.problems.push("already in the spec table");
    const first = firstLineByKey.get(key);
    if (first) {
      const differs =
        first.row.labelChargeG !== v.labelChargeG
          ? ` with a different charge (${first.row.labelChargeG} g there)`
          : "";
      r.problems.push(`duplicate of line ${first.line}${differs}`);
      continue;
    }
    firstLineByKey.set(key, { line: r.line, row: v });
    const vk = variantKey(v);
    const siblings = byVariant.get(vk) ?? [];
    for (const s of siblings) {
      if (s.row.yearFrom <= v.yearTo && v.yearFrom <= s.row.yearTo) {
        r.warnings.push(
          `years overlap line ${s.line} (${s.row.yearFrom}–${s.row.yearTo}) for the same variant`,
        );
      }
    }
    siblings.push({ line: r.line, row: v });
    byVariant.set(vk, siblings);
  }
}
