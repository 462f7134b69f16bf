import { handler } from "@/lib/server/handler";
import { inviteUser, listInvitations } from "@/lib/server/invitations";
import { inviteUserSchema } from "@/lib/contracts/invitations";

/** The shop's open invitations. */
export const GET = handler({ permission: "users:manage" }, async ({ user }) => {
  return { invitations: await listInvitations({ shopId: user.shopId }) };
});

/** Add a person: mail an invitation. The answer never says whether the address is used elsewhere. */
export const POST = handler(
  { permission: "users:manage", body: inviteUserSchema },
  async ({ user, body }) => {
    const sent = await inviteUser({ shopId: user.shopId, actorId: user.id, ...body });
    return Response.json(sent, { status: 201 });
  },
);
