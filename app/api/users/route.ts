import { handler } from "@/lib/server/handler";
import { listUsers } from "@/lib/server/users";
import { userListQuerySchema } from "@/lib/contracts/users";

// People join a shop by invitation: POST /api/invitations.
export const GET = handler(
  { permission: "users:manage", query: userListQuerySchema },
  async ({ user, query }) => listUsers({ shopId: user.shopId, limit: query.limit, offset: query.offset }),
);
