import { handler } from "@/lib/server/handler";
import { recordAudit } from "@/lib/server/audit";
import {
  deleteServiceRecord,
  getServiceCase,
  getServiceRecord,
  saveServiceRecord,
} from "@/lib/server/service-records";
import { caseParamsSchema } from "@/lib/contracts/cases";
import { serviceRecordDeleteQuerySchema, serviceRecordInputSchema } from "@/lib/contracts/service-records";

export const GET = handler(
  { permission: "cases:read", params: caseParamsSchema },
  async ({ user, params }) => {
    const serviceCase = await getServiceCase({ shopId: user.shopId, caseId: params.id });
    return { case: serviceCase, record: await getServiceRecord({ shopId: user.shopId, caseId: params.id }) };
  },
);

export const PUT = handler(
  { permission: "service:write", params: caseParamsSchema, body: serviceRecordInputSchema },
  async ({ user, params, body }) => {
    const saved = await saveServiceRecord({ user, caseId: params.id, input: body });
    await recordAudit({
      shopId: user.shopId,
      actorId: user.id,
      entity: "service_record",
      entityId: saved.record.id,
      action: `saved:${body.step}`,
      detail: { version: saved.record.version, ledgerPostings: saved.posted },
    });
    return saved;
  },
);

export const DELETE = handler(
  { permission: "service:write", params: caseParamsSchema, query: serviceRecordDeleteQuerySchema },
  async ({ user, params, query }) => {
    const result = await deleteServiceRecord({ user, caseId: params.id, version: query.version });
    await recordAudit({
      shopId: user.shopId,
      actorId: user.id,
      entity: "service_record",
      entityId: params.id,
      action: "deleted",
      detail: result,
    });
    return result;
  },
);
