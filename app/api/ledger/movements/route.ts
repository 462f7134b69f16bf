import { handler } from "@/lib/server/handler";
import { listMovementPage } from "@/lib/server/ledger";
import { postManualMovement } from "@/lib/server/ledger-post";
import { manualMovementSchema, movementListQuerySchema } from "@/lib/contracts/ledger";

export const GET = handler(
  { permission: "ledger:read", query: movementListQuerySchema },
  async ({ user, query }) => listMovementPage({ shopId: user.shopId, query }),
);

export const POST = handler(
  { permission: "ledger:write", body: manualMovementSchema },
  async ({ user, body }) => {
    const movement = await postManualMovement({ shopId: user.shopId, technicianId: user.id, input: body });
    return Response.json({ movement }, { status: 201 });
  },
);
