import { sendOwnerEmailSchema } from "@/lib/contracts/emails";
import { caseIdParamsSchema } from "@/lib/contracts/owner-summary";
import { handler } from "@/lib/server/handler";
import { caseEmails } from "@/lib/server/cases";
import { sendOwnerSummaryEmail } from "@/lib/server/outbound-email";

export const GET = handler(
  { permission: "cases:read", params: caseIdParamsSchema },
  async ({ user, params }) => caseEmails({ user, caseId: params.id }),
);

/** Sends the owner page by e-mail; the answer says whether it went or is waiting for a retry. */
export const POST = handler(
  { permission: "cases:write", params: caseIdParamsSchema, body: sendOwnerEmailSchema },
  async ({ user, params, body }) => ({
    email: await sendOwnerSummaryEmail({ user, caseId: params.id, input: body }),
  }),
);
