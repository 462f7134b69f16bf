import { handler } from "@/lib/server/handler";
import { submitCase } from "@/lib/server/cases";
import { caseParamsSchema } from "@/lib/contracts/cases";
import { caseSubmitSchema } from "@/lib/contracts/interview";

/** The technician's conclusion; the server recomputes and stores the findings snapshot. */
export const POST = handler(
  { permission: "cases:write", params: caseParamsSchema, body: caseSubmitSchema },
  async ({ user, params, body }) => submitCase({ user, caseId: params.id, input: body }),
);
