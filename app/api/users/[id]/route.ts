import { handler } from "@/lib/server/handler";
import { updateUser } from "@/lib/server/users";
import { updateUserSchema, userParamsSchema } from "@/lib/contracts/users";

export const PATCH = handler(
  { permission: "users:manage", params: userParamsSchema, body: updateUserSchema },
  async ({ user, params, body }) => ({
    user: await updateUser({ shopId: user.shopId, userId: params.id, actorId: user.id, ...body }),
  }),
);
