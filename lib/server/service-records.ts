import "server-only";
import { UniqueConstraintError, type Transaction } from "sequelize";
import type { User } from "lucia";
import { getModels, type PartReplacedJson } from "@/models";
import { AppError } from "@/lib/errors";
import type { RefrigerantId } from "@/lib/refrigerants";
import type { ExpansionDevice } from "@/lib/vehicles/expansion-devices";
import { activeMovements } from "@/lib/service/ledger";
import { postingsForRecordChange, postingsForServiceRecord } from "@/lib/service/ledger-corrections";
import { vacuumHoldTest } from "@/lib/service/vacuum";
import type {
  ServiceCaseContext,
  ServiceRecordDeleteResponse,
  ServiceRecordDto,
  ServiceRecordInput,
  ServiceRecordSaveResponse,
} from "@/lib/contracts/service-records";
import { listCylinders, toLedgerMovement } from "./ledger";

const RECORD_FIELDS = [
  "specEntryId",
  "labelChargeG",
  "purityPct",
  "airPct",
  "recoveredG",
  "recoveryCylinderId",
  "oilDrainedMl",
  "oilPulled",
  "slowRecoveryNote",
  "deepestKpaAbs",
  "holdStartKpaAbs",
  "holdEndKpaAbs",
  "holdMinutes",
  "oilAddedType",
  "oilAddedMl",
  "targetG",
  "chargedG",
  "chargeCylinderId",
  "notes",
] as const;

export async function getServiceCase({
  shopId,
  caseId,
  transaction,
}: {
  shopId: number;
  caseId: number;
  transaction?: Transaction;
}): Promise<ServiceCaseContext> {
  const { Case, Vehicle } = getModels();
  const row = await Case.findOne({
    where: { id: caseId, shopId },
    include: [{ model: Vehicle }],
    transaction,
  });
  if (!row) throw new AppError("not_found:case", "No such case in this shop.");
  const c = row.get({ plain: true }) as unknown as {
    id: number;
    status: string;
    technicianId: string;
    vehicleId: number | null;
    Vehicle: Record<string, unknown> | null;
  };
  const v = c.Vehicle as {
    year: number;
    make: string;
    model: string;
    engine: string | null;
    refrigerant: RefrigerantId;
    expansionDevice: ExpansionDevice;
    electricCompressor: boolean;
    labelChargeG: number | null;
    oilType: string | null;
  } | null;
  return {
    id: c.id,
    status: c.status,
    technicianId: c.technicianId,
    vehicleId: c.vehicleId,
    vehicle: v ? `${v.year} ${v.make} ${v.model}${v.engine ? ` ${v.engine}` : ""}` : null,
    make: v?.make ?? null,
    model: v?.model ?? null,
    year: v?.year ?? null,
    engine: v?.engine ?? null,
    refrigerant: v?.refrigerant ?? null,
    expansionDevice: v?.expansionDevice ?? null,
    electricCompressor: Boolean(v?.electricCompressor),
    labelChargeG: v?.labelChargeG ?? null,
    oilType: v?.oilType ?? null,
  };
}

export async function getServiceRecord({
  shopId,
  caseId,
  transaction,
}: {
  shopId: number;
  caseId: number;
  transaction?: Transaction;
}): Promise<ServiceRecordDto | null> {
  const { ServiceRecord, ReadingSet, User } = getModels();
  const row = await ServiceRecord.findOne({
    where: { shopId, caseId },
    include: [{ model: User, as: "technician", attributes: ["name"] }],
    transaction,
  });
  if (!row) return null;
  const r = row.get({ plain: true }) as unknown as ServiceRecordDto & {
    technician: { name: string };
    partsReplaced: PartReplacedJson[];
    recoveryStartedAt: Date | null;
    recoveryEndedAt: Date | null;
    updatedAt: Date;
  };
  const final = r.finalReadingSetId
    ? await ReadingSet.findOne({ where: { id: r.finalReadingSetId, shopId, caseId }, raw: true, transaction })
    : null;
  const n = (v: unknown) => (v === null || v === undefined ? null : Number(v));
  const out: ServiceRecordDto = {
    id: r.id,
    version: r.version,
    step: r.step,
    technicianId: r.technicianId,
    technician: r.technician.name,
    refrigerant: r.refrigerant,
    holdPassed: r.holdPassed === null ? null : Boolean(r.holdPassed),
    finalReadingSetId: r.finalReadingSetId ?? null,
    updatedAt: new Date(r.updatedAt).toISOString(),
    recoveryStartedAt: r.recoveryStartedAt ? new Date(r.recoveryStartedAt).toISOString() : null,
    recoveryEndedAt: r.recoveryEndedAt ? new Date(r.recoveryEndedAt).toISOString() : null,
    partsReplaced: (r.partsReplaced ?? []).map((p) => ({
      part: p.part as ServiceRecordDto["partsReplaced"][number]["part"],
      count: p.count,
      measuredMl: p.measuredMl,
    })),
    finalAmbientC: n(final?.ambientC),
    finalHighKpaGauge: n(final?.highKpaGauge),
    finalLowKpaGauge: n(final?.lowKpaGauge),
    finalVentC: n(final?.ventC),
    oilPulled: Boolean(r.oilPulled),
  };
  for (const f of RECORD_FIELDS)
    if (f !== "oilPulled") (out as Record<string, unknown>)[f] = (r as Record<string, unknown>)[f] ?? null;
  return out;
}

async function checkCylinder(opts: {
  shopId: number;
  id: number | null | undefined;
  field: string;
  wantRecovery: boolean;
  refrigerant: RefrigerantId;
  previousId: number | null;
  transaction: Transaction;
}) {
  if (!opts.id) return;
  const c = await getModels().Cylinder.findOne({
    where: { id: opts.id, shopId: opts.shopId },
    raw: true,
    transaction: opts.transaction,
  });
  const fail = (message: string) => {
    throw new AppError("bad_request:service_record", message, { fieldErrors: { [opts.field]: [message] } });
  };
  if (!c) return fail("Not a cylinder of this shop.");
  if (c.refrigerant !== opts.refrigerant)
    fail(
      `That cylinder holds ${c.refrigerant}; this vehicle uses ${opts.refrigerant}. Never mix refrigerants.`,
    );
  if (opts.wantRecovery && c.kind !== "recovery") fail("Recover only into a recovery cylinder.");
  if (!opts.wantRecovery && c.kind === "recovery")
    fail("Charge only from a virgin or recycled-refrigerant cylinder, never from a recovery cylinder.");
  if (c.retiredAt && c.id !== opts.previousId) fail("That cylinder is retired.");
}

function holdPassed(input: ServiceRecordInput): boolean | null {
  const { holdStartKpaAbs: start, holdEndKpaAbs: end, holdMinutes: minutes } = input;
  if (start == null || end == null || minutes == null) return null;
  return vacuumHoldTest({ startKpaAbs: start, endKpaAbs: end, minutes }).verdict === "pass";
}

/** Only the case's technician or an owner/senior changes a record someone has started. */
function mayEdit(user: User, technicianId: string) {
  if (user.role === "owner" || user.role === "senior" || user.id === technicianId) return;
  throw new AppError(
    "forbidden:service_record",
    "Only the technician who started this record, or a senior, can change it.",
  );
}

/**
 * Save the record at the version the screen last loaded, and in the same transaction bring the
 * ledger in line: postings that no longer match are cancelled by correction rows, new ones posted.
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
  const { sequelize, ServiceRecord, ReadingSet, SpecEntry } = getModels();
  const shopId = user.shopId;
  try {
    return await sequelize.transaction(async (transaction) => {
      const serviceCase = await getServiceCase({ shopId, caseId, transaction });
      if (serviceCase.status === "closed")
        throw new AppError("conflict:case", "This case is closed; its service record can no longer change.");
      if (!serviceCase.refrigerant)
        throw new AppError("conflict:case", "Record the vehicle on the case before its service record.");
      const existing = await ServiceRecord.findOne({ where: { shopId, caseId }, transaction });
      if (existing) mayEdit(user, existing.technicianId);
      else if (input.baseVersion !== 0)
        throw new AppError(
          "conflict:service_record",
          "This record was removed on another screen. Reload; what you typed here is kept on this device.",
        );
      if (existing && existing.version !== input.baseVersion) {
        throw new AppError(
          "conflict:service_record",
          `This record was changed on another screen at ${existing.updatedAt.toISOString().slice(11, 16)} UTC. Reload to see it; what you typed here is kept on this device.`,
        );
      }
      const refrigerant = existing?.refrigerant ?? serviceCase.refrigerant;
      if (
        input.specEntryId &&
        !(await SpecEntry.findOne({
          where: { id: input.specEntryId, shopId },
          attributes: ["id"],
          transaction,
        }))
      ) {
        throw new AppError("bad_request:service_record", "That spec row is not in this shop's table.", {
          fieldErrors: { specEntryId: ["Not a row of this shop's spec table."] },
        });
      }
      await checkCylinder({
        shopId,
        id: input.recoveryCylinderId,
        field: "recoveryCylinderId",
        wantRecovery: true,
        refrigerant,
        previousId: existing?.recoveryCylinderId ?? null,
        transaction,
      });
      await checkCylinder({
        shopId,
        id: input.chargeCylinderId,
        field: "chargeCylinderId",
        wantRecovery: false,
        refrigerant,
        previousId: existing?.chargeCylinderId ?? null,
        transaction,
      });

      const values = {
        step: input.step,
        specEntryId: input.specEntryId ?? null,
        labelChargeG: input.labelChargeG ?? null,
        purityPct: input.purityPct ?? null,
        airPct: input.airPct ?? null,
        recoveryStartedAt: input.recoveryStartedAt ? new Date(input.recoveryStartedAt) : null,
        recoveryEndedAt: input.recoveryEndedAt ? new Date(input.recoveryEndedAt) : null,
        recoveredG: input.recoveredG ?? null,
        recoveryCylinderId: input.recoveryCylinderId ?? null,
        oilDrainedMl: input.oilDrainedMl ?? null,
        oilPulled: input.oilPulled,
        slowRecoveryNote: input.slowRecoveryNote || null,
        deepestKpaAbs: input.deepestKpaAbs ?? null,
        holdStartKpaAbs: input.holdStartKpaAbs ?? null,
        holdEndKpaAbs: input.holdEndKpaAbs ?? null,
        holdMinutes: input.holdMinutes ?? null,
        holdPassed: holdPassed(input),
        oilAddedType: input.oilAddedType || null,
        oilAddedMl: input.oilAddedMl ?? null,
        partsReplaced: input.partsReplaced.map((p) => ({
          part: p.part,
          count: p.count,
          measuredMl: p.measuredMl ?? null,
        })),
        targetG: input.targetG ?? null,
        chargedG: input.chargedG ?? null,
        chargeCylinderId: input.chargeCylinderId ?? null,
        notes: input.notes || null,
      };

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
        if (affected !== 1)
          throw new AppError(
            "conflict:service_record",
            "This record was changed on another screen. Reload to see it; what you typed here is kept on this device.",
          );
      }

      const finals = [input.finalAmbientC, input.finalHighKpaGauge, input.finalLowKpaGauge, input.finalVentC];
      if (finals.some((v) => v != null)) {
        const reading = {
          ambientC: input.finalAmbientC ?? null,
          highKpaGauge: input.finalHighKpaGauge ?? null,
          lowKpaGauge: input.finalLowKpaGauge ?? null,
          ventC: input.finalVentC ?? null,
        };
        const linked = record.finalReadingSetId
          ? await ReadingSet.findOne({ where: { id: record.finalReadingSetId, shopId, caseId }, transaction })
          : null;
        if (linked) await linked.update(reading, { transaction });
        else {
          const created = await ReadingSet.create(
            { ...reading, shopId, caseId, kind: "final" },
            { transaction },
          );
          await ServiceRecord.update(
            { finalReadingSetId: created.id },
            { where: { id: record.id, shopId }, transaction },
          );
        }
      }

      const posted = await postLedger({
        shopId,
        caseId,
        recordId: record.id,
        technicianId: record.technicianId,
        refrigerant,
        input,
        transaction,
      });
      const warnings = (await listCylinders({ shopId, transaction }))
        .filter((c) => c.id === input.recoveryCylinderId || c.id === input.chargeCylinderId)
        .flatMap((c) => c.problems.map((p) => `${c.label}: ${p}`));
      const saved = await getServiceRecord({ shopId, caseId, transaction });
      return { record: saved as ServiceRecordDto, posted, warnings };
    });
  } catch (error) {
    if (error instanceof UniqueConstraintError)
      throw new AppError(
        "conflict:service_record",
        "This record was started on another screen. Reload; what you typed here is kept on this device.",
      );
    throw error;
  }
}

async function postLedger(opts: {
  shopId: number;
  caseId: number;
  recordId: number;
  technicianId: string;
  refrigerant: RefrigerantId;
  input: ServiceRecordInput | null;
  transaction: Transaction;
}) {
  const { RefrigerantMovement } = getModels();
  const { shopId, caseId, recordId, technicianId, refrigerant, input, transaction } = opts;
  const mine = await RefrigerantMovement.findAll({
    where: { shopId, serviceRecordId: recordId },
    raw: true,
    transaction,
    lock: transaction.LOCK.UPDATE,
  });
  const posted = activeMovements(
    (mine as unknown as Parameters<typeof toLedgerMovement>[0][]).map(toLedgerMovement),
  );
  const wanted = input
    ? postingsForServiceRecord({
        refrigerant,
        technicianId,
        recovery:
          input.recoveryCylinderId && input.recoveredG
            ? { cylinderId: String(input.recoveryCylinderId), massG: input.recoveredG }
            : null,
        recharge:
          input.chargeCylinderId && input.chargedG
            ? { cylinderId: String(input.chargeCylinderId), massG: input.chargedG }
            : null,
      })
    : [];
  const now = new Date();
  let n = 0;
  const changes = postingsForRecordChange({
    serviceRecordId: String(recordId),
    posted,
    wanted,
    at: now.toISOString(),
    technicianId,
    newId: () => `new-${++n}`,
  });
  for (const m of changes) {
    const recoveredAt =
      m.type === "recovered_into" && !m.reverses && input?.recoveryEndedAt
        ? new Date(input.recoveryEndedAt)
        : now;
    await RefrigerantMovement.create(
      {
        shopId,
        caseId,
        serviceRecordId: recordId,
        cylinderId: Number(m.cylinderId),
        technicianId: m.technicianId,
        type: m.type,
        refrigerant: m.refrigerant,
        massG: m.massG,
        occurredAt: recoveredAt,
        reversesId: m.reverses ? Number(m.reverses) : null,
        note: m.note ?? null,
      },
      { transaction },
    );
  }
  return changes.length;
}

/** Remove the record; every posting it made is cancelled by a correction row, so the ledger stays whole. */
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
    await getServiceCase({ shopId, caseId, transaction });
    const record = await ServiceRecord.findOne({ where: { shopId, caseId }, transaction });
    if (!record) throw new AppError("not_found:service_record", "This case has no service record.");
    mayEdit(user, record.technicianId);
    if (record.version !== version)
      throw new AppError(
        "conflict:service_record",
        "This record was changed on another screen. Reload before removing it.",
      );
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
    return { corrections };
  });
}
