import "server-only";
import type { Transaction } from "sequelize";
import { getModels, type JsonObject } from "@/models";

/** Append-only trail of who changed what. */
export async function recordAudit({
  shopId,
  actorId,
  entity,
  entityId,
  action,
  detail,
  transaction,
}: {
  shopId: number;
  actorId: string | null;
  entity: string;
  entityId: string | number;
  action: string;
  detail?: JsonObject;
  /** The change's own transaction, so the trail and the change commit or roll back together. */
  transaction?: Transaction;
}): Promise<void> {
  const { AuditEvent } = getModels();
  await AuditEvent.create(
    { shopId, actorId, entity, entityId: String(entityId), action, detail: detail ?? null },
    { transaction },
  );
}
