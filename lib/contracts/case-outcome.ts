import { z } from "zod";
import { multiLineText } from "./text";
import type { CaseStatus } from "@/lib/cases/statuses";
import type { RepairId } from "@/lib/repairs/catalog";
import { caseOutcomeSchema, type CaseOutcomeInput, type ConfirmedCauseId } from "./casebook";

// Closing a case with what the repair confirmed, and reopening it with a reason. The outcome's own
// schema (the confirmed causes, the repairs done and a note) lives beside the casebook that reads it.
export { caseOutcomeSchema, type CaseOutcomeInput };

/** POST /api/cases/[id]/outcome: the case closed (or its outcome corrected) and its new version. */
export interface CaseOutcomeResponse {
  caseId: number;
  status: "closed";
  closedAt: string;
  version: number;
}

/** A senior's or the owner's reason for reopening a closed case: required, read by whoever closed it. */
export const caseReopenSchema = z.object({
  reason: multiLineText()
    .trim()
    .min(1, "Say why the case is reopened: the technician reads it.")
    .max(2000, "Keep the reason under 2000 characters."),
});
export type CaseReopenInput = z.infer<typeof caseReopenSchema>;

/** POST /api/cases/[id]/reopen: the case's new status and version. */
export interface CaseReopenResponse {
  caseId: number;
  status: CaseStatus;
  version: number;
}

/** One close or reopen of a case, from its audit trail, for the case page's history. */
export interface CaseOutcomeEvent {
  action: "close" | "outcome_corrected" | "reopen";
  by: string | null;
  at: string;
  /** A reopen's reason. */
  reason: string | null;
}

/** What the case page shows of a case's outcome: the stored rows and the closes and reopens. */
export interface CaseOutcomeView {
  closedAt: string | null;
  causes: ConfirmedCauseId[];
  repairIds: RepairId[];
  note: string | null;
  history: CaseOutcomeEvent[];
}
