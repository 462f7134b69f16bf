import { handler } from "@/lib/server/handler";
import { deleteServiceRecord, getServiceRecordView, saveServiceRecord } from "@/lib/server/service-records";
import { caseParamsSchema } from "@/lib/contracts/cases";
import { serviceRecordDeleteQuerySchema, serviceRecordInputSchema } from "@/lib/contracts/service-records";

export const GET = handler({ permission: "cases:read", params: caseParamsSchema }, async ({ user, params }) =>
  getServiceRecordView({ shopId: user.shopId, caseId: params.id }),
);

export const PUT = handler(
  { permission: "service:write", params: caseParamsSchema, body: serviceRecordInputSchema },
  async ({ user, params, body }) => saveServiceRecord({ user, caseId: params.id, input: body }),
);

export const DELETE = handler(
  { permission: "service:write", params: caseParamsSchema, query: serviceRecordDeleteQuerySchema },
  async ({ user, params, query }) => deleteServiceRecord({ user, caseId: params.id, version: query.version }),
);
