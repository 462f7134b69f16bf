import { caseIdParamsSchema, createShareLinkSchema } from "@/lib/contracts/owner-summary";
import { handler } from "@/lib/server/handler";
import { caseShareLinks, shareCase } from "@/lib/server/cases";

export const GET = handler(
  { permission: "cases:read", params: caseIdParamsSchema },
  async ({ user, params }) => caseShareLinks({ user, caseId: params.id }),
);

/** A new link to the owner page; its address is in this answer only (the token is stored hashed). */
export const POST = handler(
  { permission: "cases:write", params: caseIdParamsSchema, body: createShareLinkSchema },
  async ({ user, params, body }) => shareCase({ user, caseId: params.id, expiresInDays: body.expiresInDays }),
);
