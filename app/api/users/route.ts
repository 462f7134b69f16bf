import { handler } from "@/lib/server/handler";
import { createUser, listUsers } from "@/lib/server/users";
import { recordAudit } from "@/lib/server/audit";
import { createUserSchema } from "@/lib/contracts/users";

export const GET = handler({ permission: "users:manage" }, async ({ user }) => {
  return { users: await listUsers({ shopId: user.shopId }) };
});

export const POST = handler(
  { permission: "users:manage", body: createUserSchema },
  async ({ user, body }) => {
    const created = await createUser({ shopId: user.shopId, ...body });
    await recordAudit({
      shopId: user.shopId,
      actorId: user.id,
      entity: "user",
      entityId: created.id,
      action: "create",
      detail: { role: created.role },
    });
    return Response.json({ user: created }, { status: 201 });
  },
);
