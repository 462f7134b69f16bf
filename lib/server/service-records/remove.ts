import "server-only";
import type { User } from "lucia";
import { getModels } from "@/models";
import { AppError } from "@/lib/errors";
import type { ServiceRecordDeleteResponse } from "@/lib/contracts/service-records";
import { RECORD_CONFLICT, serviceRecordRefusal } from "@/lib/service/record-rules";
import { recordAudit } from "../audit";
import { postLedger } from "./ledger-posting";
import { getServiceCase } from "./read";

/**
 * Removes the record; every posting it made is cancelled by a correction row, so the ledger stays
 * whole, and the audit row names the record that was removed, in the same transaction.
 */
export async function deleteServiceRecord({
  user,
  caseId,
  version,
}: {
  user: User;
  caseId: number;
  version: number;
}): Promise<ServiceRecordDeleteResponse> {
  const { sequelize, ServiceRecord } = getModels();
  const shopId = user.shopId;
  return sequelize.transaction(async (transaction) => {
    const serviceCase = await getServiceCase({ shopId, caseId, transaction });
    const record = await ServiceRecord.findOne({ where: { shopId, caseId }, transaction });
    if (!record) throw new AppError("not_found:service_record", "This case has no service record.");
    const refusal = serviceRecordRefusal("remove", user, {
      caseStatus: serviceCase.status,
      refrigerant: serviceCase.refrigerant,
      startedBy: { id: record.technicianId },
    });
    if (refusal) throw new AppError(refusal.code, refusal.message);
    if (record.version !== version)
      throw new AppError("conflict:service_record", RECORD_CONFLICT.beforeRemoving);
    const corrections = await postLedger({
      shopId,
      caseId,
      recordId: record.id,
      technicianId: record.technicianId,
      refrigerant: record.refrigerant,
      input: null,
      transaction,
    });
    await record.destroy({ transaction });
    const result = { corrections };
    await recordAudit({
      shopId,
      actorId: user.id,
      entity: "service_record",
      entityId: record.id,
      action: "deleted",
      detail: { ...result, caseId },
      transaction,
    });
    return result;
  });
}
