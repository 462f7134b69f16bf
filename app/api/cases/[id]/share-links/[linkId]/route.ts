import { shareLinkParamsSchema } from "@/lib/contracts/owner-summary";
import { handler } from "@/lib/server/handler";
import { revokeShareLink } from "@/lib/server/share-links";

/** Revoke: the link answers "no longer valid" from now on. */
export const DELETE = handler(
  { permission: "cases:write", params: shareLinkParamsSchema },
  async ({ user, params }) => revokeShareLink({ user, caseId: params.id, linkId: params.linkId }),
);
