import { handler } from "@/lib/server/handler";
import { resetPassword } from "@/lib/server/passwords";
import { userParamsSchema } from "@/lib/contracts/users";

/** The owner resets a person's password; the answer carries the temporary one, this once. */
export const POST = handler(
  { permission: "users:manage", params: userParamsSchema },
  async ({ user, params, responseHeaders }) => {
    responseHeaders.set("Cache-Control", "no-store");
    return resetPassword({ actor: user, userId: params.id });
  },
);
