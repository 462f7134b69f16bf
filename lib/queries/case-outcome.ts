import type {
  CaseOutcomeInput,
  CaseOutcomeResponse,
  CaseReopenInput,
  CaseReopenResponse,
} from "@/lib/contracts/case-outcome";
import { apiFetch } from "./api-fetch";

/** Closes the case with what the repair confirmed and what was done. */
export function closeCase(caseId: number, body: CaseOutcomeInput) {
  return apiFetch<CaseOutcomeResponse>(`/api/cases/${caseId}/outcome`, { method: "POST", body });
}

/** Reopens a closed case with a reason. */
export function reopenCase(caseId: number, body: CaseReopenInput) {
  return apiFetch<CaseReopenResponse>(`/api/cases/${caseId}/reopen`, { method: "POST", body });
}
