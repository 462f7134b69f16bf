import type { Findings } from "@/lib/diagnosis";

/** A case's status once submitted: a senior signs off an apprentice's diagnosis. */
export type SubmittedCaseStatus = "awaiting_signoff" | "signed_off";

/**
 * What POST /api/cases/:id/submit answers. The server always works the findings out again and stores
 * them; when the screen's findings came from another version of the engine (an interview left open
 * across an update), the stored findings come back so the screen can show them.
 */
export type CaseSubmitResult =
  | { version: number; status: SubmittedCaseStatus; findingsChanged: false }
  | { version: number; status: SubmittedCaseStatus; findingsChanged: true; findings: Findings };
