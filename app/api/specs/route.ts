import { handler } from "@/lib/server/handler";
import { createSpec, listSpecs } from "@/lib/server/specs";
import { specInputSchema, specListQuerySchema } from "@/lib/contracts/specs";

export const GET = handler(
  { permission: "specs:read", query: specListQuerySchema },
  async ({ user, query }) => {
    return { specs: await listSpecs({ shopId: user.shopId, q: query.q }) };
  },
);

export const POST = handler({ permission: "specs:edit", body: specInputSchema }, async ({ user, body }) => {
  const spec = await createSpec({ shopId: user.shopId, actorId: user.id, input: body });
  return Response.json({ spec }, { status: 201 });
});
