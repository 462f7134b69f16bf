import { handler } from "@/lib/server/handler";
import { deleteSpec, updateSpec } from "@/lib/server/specs";
import { recordAudit } from "@/lib/server/audit";
import { specInputSchema, specParamsSchema } from "@/lib/contracts/specs";

export const PUT = handler(
  { permission: "specs:edit", params: specParamsSchema, body: specInputSchema },
  async ({ user, params, body }) => {
    const spec = await updateSpec({ shopId: user.shopId, id: params.id, input: body });
    await recordAudit({
      shopId: user.shopId,
      actorId: user.id,
      entity: "spec_entry",
      entityId: spec.id,
      action: "updated",
    });
    return { spec };
  },
);

export const DELETE = handler(
  { permission: "specs:edit", params: specParamsSchema },
  async ({ user, params }) => {
    await deleteSpec({ shopId: user.shopId, id: params.id });
    await recordAudit({
      shopId: user.shopId,
      actorId: user.id,
      entity: "spec_entry",
      entityId: params.id,
      action: "deleted",
    });
    return { ok: true };
  },
);
