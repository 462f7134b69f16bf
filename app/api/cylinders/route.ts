import { handler } from "@/lib/server/handler";
import { createCylinder, listCylinderPage } from "@/lib/server/ledger";
import { createCylinderSchema, cylinderListQuerySchema } from "@/lib/contracts/cylinders";

export const GET = handler(
  { permission: "ledger:read", query: cylinderListQuerySchema },
  async ({ user, query }) => listCylinderPage({ shopId: user.shopId, query }),
);

export const POST = handler(
  { permission: "ledger:write", body: createCylinderSchema },
  async ({ user, body }) => {
    const cylinder = await createCylinder({ shopId: user.shopId, actorId: user.id, input: body });
    return Response.json({ cylinder }, { status: 201 });
  },
);
