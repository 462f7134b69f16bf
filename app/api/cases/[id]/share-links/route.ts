import { caseIdParamsSchema, createShareLinkSchema } from "@/lib/contracts/owner-summary";
import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";
import { OWNER_SUMMARY_UNAVAILABLE } from "@/lib/owner/availability";
import { handler } from "@/lib/server/handler";
import { loadCaseForOwner } from "@/lib/server/owner-case";
import { createShareLink, listShareLinks, ownerPagePath } from "@/lib/server/share-links";

export const GET = handler(
  { permission: "cases:read", params: caseIdParamsSchema },
  async ({ user, params }) => {
    await loadCaseForOwner({ user, caseId: params.id });
    return { links: await listShareLinks({ shopId: user.shopId, caseId: params.id }) };
  },
);

/** A new link to the owner page; its address is in this answer only (the token is stored hashed). */
export const POST = handler(
  { permission: "cases:write", params: caseIdParamsSchema, body: createShareLinkSchema },
  async ({ user, params, body }) => {
    const caseRow = await loadCaseForOwner({ user, caseId: params.id, forChange: true });
    if (!caseRow.available) throw new AppError("conflict:case", OWNER_SUMMARY_UNAVAILABLE);
    const link = await createShareLink({ user, caseId: params.id, expiresInDays: body.expiresInDays });
    return {
      link: {
        id: link.id,
        url: `${env().APP_ORIGIN}${ownerPagePath(link.token)}`,
        expiresAt: link.expiresAt.toISOString(),
      },
    };
  },
);
