import { handler } from "@/lib/server/handler";
import { deleteSpec, updateSpec } from "@/lib/server/specs";
import { specInputSchema, specParamsSchema } from "@/lib/contracts/specs";

export const PUT = handler(
  { permission: "specs:edit", params: specParamsSchema, body: specInputSchema },
  async ({ user, params, body }) => ({
    spec: await updateSpec({ shopId: user.shopId, actorId: user.id, id: params.id, input: body }),
  }),
);

export const DELETE = handler(
  { permission: "specs:edit", params: specParamsSchema },
  async ({ user, params }) => {
    await deleteSpec({ shopId: user.shopId, actorId: user.id, id: params.id });
    return { ok: true };
  },
);
