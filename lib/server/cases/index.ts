import "server-only";

// The case's persistence: every read and change of a case goes through here, each change in one
// transaction with the audit row that records it, after the rules in lib/cases/rules.ts allow it.
export { listCases, getCase } from "./read";
export { createCase } from "./create";
export { saveInterview, submitCase } from "./interview";
export { recordSignOff } from "./verdict";
export { caseForAction } from "./load";
export { addCasePhoto, caseAttachments, caseEmails, caseProposal, caseShareLinks, shareCase } from "./panels";
