import { handler } from "@/lib/server/handler";
import { recordCaseOutcome } from "@/lib/server/casebook/outcome";
import { caseParamsSchema } from "@/lib/contracts/cases";
import { caseOutcomeSchema } from "@/lib/contracts/case-outcome";

// Closes a signed-off case with what the repair confirmed and what was done (or corrects a closed case's
// outcome); who may, and from which status, is the case rules' answer (lib/cases/rules.ts).
export const POST = handler(
  { permission: "cases:write", params: caseParamsSchema, body: caseOutcomeSchema },
  async ({ user, params, body }) => {
    return recordCaseOutcome({ user, caseId: params.id, ...body });
  },
);
