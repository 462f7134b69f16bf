/**
 * The owner may see a case once a second person has signed off an apprentice's diagnosis, or as
 * soon as anyone else submits theirs (their submission is signed off at once).
 */
export function ownerSummaryAvailable(status: string, technicianRole: string | null): boolean {
  if (status === "signed_off" || status === "closed") return true;
  return status === "awaiting_signoff" && technicianRole !== null && technicianRole !== "apprentice";
}

export const OWNER_SUMMARY_UNAVAILABLE =
  "The owner's page opens once the diagnosis is submitted, and an apprentice's once it is signed off.";
