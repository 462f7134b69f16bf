/*
 * The one list of case statuses, with the one way each is named on screen. A case goes
 * draft → awaiting_signoff → signed_off | sent_back → closed (product brief §4); an apprentice's
 * submitted case waits for a senior, anyone else's is signed off on submission.
 * tests/unit/vocabulary.test.ts fails on a second list.
 */
export const CASE_STATUSES = ["draft", "awaiting_signoff", "signed_off", "sent_back", "closed"] as const;
export type CaseStatus = (typeof CASE_STATUSES)[number];

export const CASE_STATUS_LABELS: Readonly<Record<CaseStatus, string>> = {
  draft: "In progress",
  awaiting_signoff: "Waiting for sign-off",
  signed_off: "Signed off",
  sent_back: "Sent back",
  closed: "Closed",
};

export function isCaseStatus(value: unknown): value is CaseStatus {
  return typeof value === "string" && (CASE_STATUSES as readonly string[]).includes(value);
}
