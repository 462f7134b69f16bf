import { handler } from "@/lib/server/handler";
import { withdrawInvitation } from "@/lib/server/invitations";
import { invitationParamsSchema } from "@/lib/contracts/invitations";

/** Withdraw an open invitation: its link stops working. */
export const DELETE = handler(
  { permission: "users:manage", params: invitationParamsSchema },
  async ({ user, params }) => {
    await withdrawInvitation({ shopId: user.shopId, actorId: user.id, id: params.id });
    return { ok: true };
  },
);
