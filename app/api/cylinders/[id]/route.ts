import { handler } from "@/lib/server/handler";
import { setCylinderRetired } from "@/lib/server/ledger";
import { recordAudit } from "@/lib/server/audit";
import { cylinderParamsSchema, updateCylinderSchema } from "@/lib/contracts/cylinders";

export const PATCH = handler(
  { permission: "ledger:write", params: cylinderParamsSchema, body: updateCylinderSchema },
  async ({ user, params, body }) => {
    const cylinder = await setCylinderRetired({ shopId: user.shopId, id: params.id, retired: body.retired });
    await recordAudit({
      shopId: user.shopId,
      actorId: user.id,
      entity: "cylinder",
      entityId: cylinder.id,
      action: body.retired ? "retired" : "reactivated",
    });
    return { cylinder };
  },
);
