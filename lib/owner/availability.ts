// When the owner's page may show a case is a case rule: ownerMayViewCase in lib/cases/rules.ts.

export const OWNER_SUMMARY_UNAVAILABLE =
  "The owner's page opens once the diagnosis is submitted, and an apprentice's once it is signed off.";
