import "server-only";
import { UniqueConstraintError, type Transaction } from "sequelize";
import type { User } from "lucia";
import { getModels } from "@/models";
import { AppError } from "@/lib/errors";
import type { ServiceRecordInput, ServiceRecordSaveResponse } from "@/lib/contracts/service-records";
import { RECORD_CONFLICT, serviceRecordRefusal } from "@/lib/service/record-rules";
import { formatShopTime } from "@/lib/units/clock";
import { sayInUnits } from "@/lib/units/quantity";
import { recordAudit } from "../audit";
import { listCylinders } from "../ledger";
import { getShop } from "../shops";
import { checkNamedRows } from "./checks";
import { postLedger } from "./ledger-posting";
import { finalReadingColumns, recordColumns } from "./mapping";
import { getServiceCase, getServiceRecord } from "./read";
import { figuresBeforeRecordSave, saveRecordFigures } from "../case-figures";

/** Links or updates the record's final reading set, when any final reading was entered. */
async function saveFinalReading(opts: {
  shopId: number;
  caseId: number;
  record: { id: number; finalReadingSetId?: number | null };
  input: ServiceRecordInput;
  transaction: Transaction;
}) {
  const { ReadingSet, ServiceRecord } = getModels();
  const { shopId, caseId, record, transaction } = opts;
  const reading = finalReadingColumns(opts.input);
  if (!reading) return;
  const linked = record.finalReadingSetId
    ? await ReadingSet.findOne({ where: { id: record.finalReadingSetId, shopId, caseId }, transaction })
    : null;
  if (linked) await linked.update(reading, { transaction });
  else {
    const created = await ReadingSet.create({ ...reading, shopId, caseId, kind: "final" }, { transaction });
    await ServiceRecord.update(
      { finalReadingSetId: created.id },
      { where: { id: record.id, shopId }, transaction },
    );
  }
}

/**
 * Saves the record at the version the screen last loaded. In one transaction: the rules, the row,
 * its final reading, the ledger postings that bring the ledger in line, and the audit row.
 */
export async function saveServiceRecord({
  user,
  caseId,
  input,
}: {
  user: User;
  caseId: number;
  input: ServiceRecordInput;
}): Promise<ServiceRecordSaveResponse> {
  const { sequelize, ServiceRecord } = getModels();
  const shopId = user.shopId;
  const shop = await getShop({ shopId });
  try {
    return await sequelize.transaction(async (transaction) => {
      // The case row is locked first (as the interview's save does), with the figures as they stood.
      const figures = await figuresBeforeRecordSave({ shopId, caseId, transaction });
      const serviceCase = await getServiceCase({ shopId, caseId, transaction });
      const existing = await ServiceRecord.findOne({ where: { shopId, caseId }, transaction });
      const refusal = serviceRecordRefusal("save", user, {
        caseStatus: serviceCase.status,
        refrigerant: serviceCase.refrigerant,
        startedBy: existing ? { id: existing.technicianId } : null,
      });
      if (refusal) throw new AppError(refusal.code, refusal.message);
      if (!existing && input.baseVersion !== 0)
        throw new AppError("conflict:service_record", RECORD_CONFLICT.removed);
      if (existing && existing.version !== input.baseVersion)
        throw new AppError(
          "conflict:service_record",
          RECORD_CONFLICT.changed(formatShopTime(existing.updatedAt, shop)),
        );

      // The vehicle is recorded (the rules checked it); a started record keeps the refrigerant it began with.
      const refrigerant = existing?.refrigerant ?? serviceCase.refrigerant!;
      await checkNamedRows({ shopId, input, refrigerant, previous: existing, transaction });

      // The label charge is kept on the vehicle (saveRecordFigures writes it there), never a copy here.
      const values = { ...recordColumns(input), labelChargeG: null };
      let record = existing;
      if (!record) {
        record = await ServiceRecord.create(
          { ...values, shopId, caseId, technicianId: user.id, refrigerant },
          { transaction },
        );
      } else {
        const [affected] = await ServiceRecord.update(
          { ...values, version: input.baseVersion + 1 },
          { where: { id: record.id, shopId, version: input.baseVersion }, transaction },
        );
        if (affected !== 1) throw new AppError("conflict:service_record", RECORD_CONFLICT.changed());
      }
      await saveFinalReading({ shopId, caseId, record, input, transaction });

      const posted = await postLedger({
        shopId,
        caseId,
        recordId: record.id,
        technicianId: record.technicianId,
        refrigerant,
        input,
        transaction,
      });
      const touched = [input.recoveryCylinderId, input.chargeCylinderId].filter((id): id is number => !!id);
      // Kept with their quantity markers: the answer says them in SI and sends the marked form beside it.
      const markedWarnings = (
        await listCylinders({ shopId, ids: touched, transaction, say: (text) => text })
      ).flatMap((c) => c.problems.map((p) => `${c.label}: ${p}`));
      await saveRecordFigures({
        user,
        caseRow: figures.caseRow,
        before: figures.before,
        entered: { labelChargeG: input.labelChargeG ?? null },
        transaction,
      });
      const saved = await getServiceRecord({ shopId, caseId, transaction });
      if (!saved) throw new AppError("conflict:service_record", RECORD_CONFLICT.removed);
      await recordAudit({
        shopId,
        actorId: user.id,
        entity: "service_record",
        entityId: saved.id,
        action: `saved:${input.step}`,
        detail: { version: saved.version, ledgerPostings: posted },
        transaction,
      });
      return {
        record: saved,
        posted,
        warnings: markedWarnings.map((w) => sayInUnits(w)),
        markedWarnings,
      };
    });
  } catch (error) {
    if (error instanceof UniqueConstraintError)
      throw new AppError("conflict:service_record", RECORD_CONFLICT.started);
    throw error;
  }
}
