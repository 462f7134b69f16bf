// The technician's conclusion: the cause, and why. A technician or senior may leave the why empty;
// an apprentice, whose conclusion a senior checks, picks at least one short reason (our own list)
// or writes their own words, so the senior sees what the conclusion rests on.

export const CONCLUSION_REASON_IDS = [
  "pressures",
  "line_temperatures",
  "charge_weight",
  "static_check",
  "clutch_and_fans",
  "identifier",
  "leak_found",
  "leading_cause",
] as const;
export type ConclusionReasonId = (typeof CONCLUSION_REASON_IDS)[number];

export const CONCLUSION_REASON_LABELS: Readonly<Record<ConclusionReasonId, string>> = {
  pressures: "The pressures point to it",
  line_temperatures: "Subcooling or superheat points to it",
  charge_weight: "The recovered charge against the label",
  static_check: "The static pressure against the air temperature",
  clutch_and_fans: "What the clutch and fans did",
  identifier: "The identifier's result",
  leak_found: "A leak was found",
  leading_cause: "It leads the findings",
};

/** The stored sentence: the picked reasons in list order, then the technician's own words. */
export function conclusionNotesFrom(reasons: readonly ConclusionReasonId[], words: string): string {
  const picked = CONCLUSION_REASON_IDS.filter((id) => reasons.includes(id)).map(
    (id) => CONCLUSION_REASON_LABELS[id],
  );
  const said = words.trim();
  if (picked.length === 0) return said;
  const list = `${picked.map((label, i) => (i === 0 ? label : label.charAt(0).toLowerCase() + label.slice(1))).join("; ")}.`;
  return said ? `${list} ${said}` : list;
}

/** Why the conclusion cannot be sent yet, or null. */
export function conclusionProblem({
  needsReason,
  reasons,
  words,
}: {
  needsReason: boolean;
  reasons: readonly ConclusionReasonId[];
  words: string;
}): string | null {
  if (needsReason && reasons.length === 0 && words.trim() === "")
    return "Pick at least one reason, or say why in your own words, so the senior sees what it rests on.";
  return null;
}
