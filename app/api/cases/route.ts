import { handler } from "@/lib/server/handler";
import { createCase, listCases } from "@/lib/server/cases";
import { caseListQuerySchema, createCaseSchema } from "@/lib/contracts/cases";

export const GET = handler(
  { permission: "cases:read", query: caseListQuerySchema },
  async ({ user, query }) => {
    return listCases({ shopId: user.shopId, status: query.status, limit: query.limit, offset: query.offset });
  },
);

export const POST = handler({ permission: "cases:write", body: createCaseSchema }, async ({ user, body }) => {
  const created = await createCase({ shopId: user.shopId, technicianId: user.id, input: body });
  return Response.json({ case: created }, { status: 201 });
});
