import { emailParamsSchema } from "@/lib/contracts/emails";
import { handler } from "@/lib/server/handler";
import { retryEmail } from "@/lib/server/outbound-email";

export const POST = handler(
  { permission: "cases:write", params: emailParamsSchema },
  async ({ user, params }) => ({
    email: await retryEmail({ user, caseId: params.id, emailId: params.emailId }),
  }),
);
