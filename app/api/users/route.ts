import { handler } from "@/lib/server/handler";
import { listUsers } from "@/lib/server/users";

// People join a shop by invitation: POST /api/invitations.
export const GET = handler({ permission: "users:manage" }, async ({ user }) => {
  return { users: await listUsers({ shopId: user.shopId }) };
});
