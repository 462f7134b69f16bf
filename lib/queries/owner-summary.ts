import type { OutboundEmailView, SendOwnerEmailInput } from "@/lib/contracts/emails";
import type {
  CreateShareLinkInput,
  OwnerAnswerInput,
  RepairProposalInput,
} from "@/lib/contracts/owner-summary";
import { apiFetch } from "./api-fetch";

export function answerOwnerProposal(token: string, body: OwnerAnswerInput) {
  return apiFetch<{ answer: string; answeredAt: string }>(`/api/s/${token}/answer`, { method: "POST", body });
}

export function createOwnerLink(caseId: number, body: CreateShareLinkInput = {}) {
  return apiFetch<{ link: { id: number; url: string; expiresAt: string } }>(
    `/api/cases/${caseId}/share-links`,
    {
      method: "POST",
      body,
    },
  );
}

export function revokeOwnerLink(caseId: number, linkId: number) {
  return apiFetch<{ revoked: boolean }>(`/api/cases/${caseId}/share-links/${linkId}`, { method: "DELETE" });
}

export function sendOwnerEmail(caseId: number, body: SendOwnerEmailInput) {
  return apiFetch<{ email: OutboundEmailView }>(`/api/cases/${caseId}/emails`, { method: "POST", body });
}

export function retryOwnerEmail(caseId: number, emailId: number) {
  return apiFetch<{ email: OutboundEmailView }>(`/api/cases/${caseId}/emails/${emailId}/retry`, {
    method: "POST",
  });
}

export function proposeRepairs(caseId: number, body: RepairProposalInput) {
  return apiFetch<{ id: number }>(`/api/cases/${caseId}/proposal`, { method: "POST", body });
}
