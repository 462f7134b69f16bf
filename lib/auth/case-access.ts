import type { Role } from "./roles";

/** Statuses in which a case's interview may still change; submitted cases wait for a verdict. */
export const EDITABLE_CASE_STATUSES: readonly string[] = ["draft", "sent_back"];

/** The case's own technician may change it, and so may a senior or the owner. */
export function mayChangeCase(user: { id: string; role: Role }, caseRow: { technicianId: string }): boolean {
  return caseRow.technicianId === user.id || user.role === "owner" || user.role === "senior";
}

export function caseIsEditable(caseRow: { status: string }): boolean {
  return EDITABLE_CASE_STATUSES.includes(caseRow.status);
}
