import type { CaseSubmitInput } from "@/lib/contracts/interview";
import type { CaseSubmitResult } from "@/lib/contracts/case-submit";
import { apiFetch } from "./api-fetch";

export type { CaseSubmitResult };

/** The technician's conclusion; the server works the findings out again and stores them with it. */
export function submitCase(caseId: number, body: CaseSubmitInput) {
  return apiFetch<CaseSubmitResult>(`/api/cases/${caseId}/submit`, { method: "POST", body });
}
