import "server-only";
import { getModels, type JsonObject } from "@/models";

/** Append-only trail of who changed what. */
export async function recordAudit({
  shopId,
  actorId,
  entity,
  entityId,
  action,
  detail,
}: {
  shopId: number;
  actorId: string | null;
  entity: string;
  entityId: string | number;
  action: string;
  detail?: JsonObject;
}): Promise<void> {
  const { AuditEvent } = getModels();
  await AuditEvent.create({ shopId, actorId, entity, entityId: String(entityId), action, detail: detail ?? null });
}
