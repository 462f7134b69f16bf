import { handler } from "@/lib/server/handler";
import { listCases } from "@/lib/server/cases";
import { caseListQuerySchema } from "./schema";

export const GET = handler({ permission: "cases:read", query: caseListQuerySchema }, async ({ user, query }) => {
  return { cases: await listCases({ shopId: user.shopId, status: query.status }) };
});
