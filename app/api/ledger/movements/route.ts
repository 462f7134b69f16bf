import { handler } from "@/lib/server/handler";
import { listMovements, postManualMovement } from "@/lib/server/ledger";
import { manualMovementSchema, movementListQuerySchema } from "@/lib/contracts/ledger";

export const GET = handler(
  { permission: "ledger:read", query: movementListQuerySchema },
  async ({ user, query }) => {
    return {
      movements: await listMovements({
        shopId: user.shopId,
        cylinderId: query.cylinderId,
        limit: query.limit,
      }),
    };
  },
);

export const POST = handler(
  { permission: "ledger:write", body: manualMovementSchema },
  async ({ user, body }) => {
    const movement = await postManualMovement({ shopId: user.shopId, technicianId: user.id, input: body });
    return Response.json({ movement }, { status: 201 });
  },
);
