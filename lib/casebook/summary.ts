import type { ConfirmedCauseId, SimilarCase } from "@/lib/contracts/casebook";
import { confirmedCauseShortName } from "./labels";

/** The confirmed cause most neighbours share (ties go to the nearer neighbour's cause). */
export function neighbourSummary(
  neighbours: Pick<SimilarCase, "confirmedCauses">[],
): { cause: ConfirmedCauseId; count: number; of: number } | null {
  const counts = new Map<ConfirmedCauseId, number>();
  for (const n of neighbours)
    for (const cause of n.confirmedCauses) counts.set(cause, (counts.get(cause) ?? 0) + 1);
  let best: { cause: ConfirmedCauseId; count: number } | null = null;
  for (const [cause, count] of counts) if (!best || count > best.count) best = { cause, count };
  return best ? { ...best, of: neighbours.length } : null;
}

/** "7 of the 10 nearest closed cases were confirmed as poor condenser airflow." */
export function neighbourSummaryLine(summary: {
  cause: ConfirmedCauseId;
  count: number;
  of: number;
}): string {
  const { cause, count, of } = summary;
  const what = `confirmed as ${confirmedCauseShortName(cause)}.`;
  if (of === 1) return `The nearest closed case was ${what}`;
  if (count === of) return `All ${of} nearest closed cases were ${what}`;
  return `${count} of the ${of} nearest closed cases ${count === 1 ? "was" : "were"} ${what}`;
}
