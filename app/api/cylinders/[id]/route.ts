import { handler } from "@/lib/server/handler";
import { setCylinderRetired } from "@/lib/server/ledger";
import { cylinderParamsSchema, updateCylinderSchema } from "@/lib/contracts/cylinders";

export const PATCH = handler(
  { permission: "ledger:write", params: cylinderParamsSchema, body: updateCylinderSchema },
  async ({ user, params, body }) => ({
    cylinder: await setCylinderRetired({
      shopId: user.shopId,
      actorId: user.id,
      id: params.id,
      retired: body.retired,
    }),
  }),
);
