import { handler } from "@/lib/server/handler";
import { reopenCase } from "@/lib/server/casebook/outcome";
import { caseParamsSchema } from "@/lib/contracts/cases";
import { caseReopenSchema } from "@/lib/contracts/case-outcome";

// A senior or the owner reopens a closed case with a reason (lib/cases/rules.ts: reopen).
export const POST = handler(
  { permission: "signoff:review", params: caseParamsSchema, body: caseReopenSchema },
  async ({ user, params, body }) => {
    return reopenCase({ user, caseId: params.id, reason: body.reason });
  },
);
