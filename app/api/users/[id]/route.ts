import { handler } from "@/lib/server/handler";
import { updateUser } from "@/lib/server/users";
import { recordAudit } from "@/lib/server/audit";
import { updateUserSchema, userParamsSchema } from "@/lib/contracts/users";

export const PATCH = handler(
  { permission: "users:manage", params: userParamsSchema, body: updateUserSchema },
  async ({ user, params, body }) => {
    const updated = await updateUser({ shopId: user.shopId, userId: params.id, actorId: user.id, ...body });
    await recordAudit({
      shopId: user.shopId,
      actorId: user.id,
      entity: "user",
      entityId: updated.id,
      action: "update",
      detail: body,
    });
    return { user: updated };
  },
);
