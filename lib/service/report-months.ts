// Which rows of a monthly report a screen shows first. Pure: the ledger page's report uses it.

/**
 * The rows of the latest `months` calendar months present in a report (rows oldest month first, as
 * monthlyReport gives them), and how many months the report holds in all.
 */
export function latestMonths<R extends { month: string }>(
  rows: readonly R[],
  months: number,
): { rows: R[]; monthCount: number } {
  const present = [...new Set(rows.map((r) => r.month))].sort();
  if (present.length <= months) return { rows: [...rows], monthCount: present.length };
  const earliest = present[present.length - months]!;
  return { rows: rows.filter((r) => r.month >= earliest), monthCount: present.length };
}
