import { handler } from "@/lib/server/handler";
import { recordSignOff } from "@/lib/server/cases";
import { caseParamsSchema, signOffSchema } from "@/lib/contracts/cases";

export const POST = handler(
  { permission: "signoff:review", params: caseParamsSchema, body: signOffSchema },
  async ({ user, params, body }) => {
    return recordSignOff({ user, caseId: params.id, verdict: body.verdict, comment: body.comment });
  },
);
