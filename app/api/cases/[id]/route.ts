import { handler } from "@/lib/server/handler";
import { getCase } from "@/lib/server/cases";
import { caseParamsSchema } from "@/lib/contracts/cases";

export const GET = handler(
  { permission: "cases:read", params: caseParamsSchema },
  async ({ user, params }) => {
    return { case: await getCase({ shopId: user.shopId, caseId: params.id }) };
  },
);
