import { handler } from "@/lib/server/handler";
import { createSpec, listSpecPage } from "@/lib/server/specs";
import { specInputSchema, specListQuerySchema } from "@/lib/contracts/specs";

export const GET = handler(
  { permission: "specs:read", query: specListQuerySchema },
  async ({ user, query }) => {
    return listSpecPage({ shopId: user.shopId, q: query.q, limit: query.limit, offset: query.offset });
  },
);

export const POST = handler({ permission: "specs:edit", body: specInputSchema }, async ({ user, body }) => {
  const spec = await createSpec({ shopId: user.shopId, actorId: user.id, input: body });
  return Response.json({ spec }, { status: 201 });
});
