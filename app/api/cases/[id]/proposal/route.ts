import { caseIdParamsSchema, repairProposalSchema } from "@/lib/contracts/owner-summary";
import { handler } from "@/lib/server/handler";
import { caseProposal } from "@/lib/server/cases";
import { proposeRepair } from "@/lib/server/repair-proposals";

export const GET = handler(
  { permission: "cases:read", params: caseIdParamsSchema },
  async ({ user, params }) => caseProposal({ user, caseId: params.id }),
);

export const POST = handler(
  { permission: "cases:write", params: caseIdParamsSchema, body: repairProposalSchema },
  async ({ user, params, body }) => proposeRepair({ user, caseId: params.id, input: body }),
);
