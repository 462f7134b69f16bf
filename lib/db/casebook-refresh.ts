// No "server-only" here: the seed, the reindex script and the benchmark's data generator call it too.
import { Op, type Transaction } from "sequelize";
import { getModels } from "@/models";
import { CAUSE_IDS } from "@/lib/diagnosis/causes";
import { CASEBOOK_COMPRESSOR_TYPES } from "@/lib/contracts/casebook";
import { caseFeaturesFrom, presentFeatures } from "@/lib/casebook/features";
import { caseSearchText } from "@/lib/casebook/search-text";
import { shopIndexTerms } from "@/lib/casebook/words";
import { bumpCasebookVersion } from "./casebook-version";

const dayMs = 24 * 60 * 60 * 1000;
const causeIds = new Set<string>(CAUSE_IDS);
const compressorTypes = new Set<string>(CASEBOOK_COMPRESSOR_TYPES);

/** The leading suspect of a stored findings snapshot: the engine ranks its suspects best first. */
export function leadingSuspectOf(findings: unknown): string | null {
  const cause = (findings as { suspects?: { cause?: unknown }[] } | null)?.suspects?.[0]?.cause;
  return typeof cause === "string" && causeIds.has(cause) ? cause : null;
}

function compressorTypeOf(
  findings: unknown,
  vehicle: { electricCompressor?: boolean; compressorType?: string | null } | null,
): string | null {
  const named = (findings as { input?: { compressorType?: unknown } } | null)?.input?.compressorType;
  if (typeof named === "string" && named !== "unknown" && compressorTypes.has(named)) return named;
  if (vehicle?.compressorType && compressorTypes.has(vehicle.compressorType)) return vehicle.compressorType;
  return vehicle?.electricCompressor ? "electric" : null;
}

/**
 * Rewrites what the casebook keeps about one case: its search row and symptoms, its readings for similar
 * cases, and the comeback links to the same vehicle's cases on either side. Call it, inside the change's
 * transaction, after anything that changes a case's text, status, findings or outcome.
 */
export async function refreshCasebookEntry({
  shopId,
  caseId,
  transaction,
}: {
  shopId: number;
  caseId: number;
  transaction?: Transaction;
}): Promise<void> {
  const models = getModels();
  if (!transaction) {
    await models.sequelize.transaction((t) => refreshCasebookEntry({ shopId, caseId, transaction: t }));
    return;
  }
  const { Case, Vehicle, SignOff, ServiceRecord, CaseConfirmedCause, CaseRepair, Shop } = models;
  const { CasebookEntry, CasebookSymptom, CaseFeatures } = models;
  const options = { transaction, raw: true } as const;
  const row = await Case.findOne({ where: { id: caseId, shopId }, ...options });
  // Remembered casebook answers of this shop stop being served once this transaction commits (raised
  // last, so the counter's row lock is held for as short a time as the transaction allows).
  if (!row) return bumpCasebookVersion(models.sequelize, shopId, transaction); // rows go by ON DELETE CASCADE

  const [vehicle, reviews, record, causes, repairs, shop] = await Promise.all([
    row.vehicleId
      ? Vehicle.findOne({
          where: { id: row.vehicleId, shopId },
          attributes: [
            "make",
            "model",
            "year",
            "refrigerant",
            "expansionDevice",
            "electricCompressor",
            "compressorType",
          ],
          ...options,
        })
      : null,
    SignOff.findAll({
      where: { shopId, caseId },
      attributes: ["comment"],
      order: [["id", "ASC"]],
      ...options,
    }),
    ServiceRecord.findOne({
      where: { shopId, caseId },
      attributes: ["notes", "slowRecoveryNote"],
      ...options,
    }),
    CaseConfirmedCause.findAll({
      where: { shopId, caseId },
      attributes: ["cause"],
      order: [["id", "ASC"]],
      ...options,
    }),
    CaseRepair.findAll({
      where: { shopId, caseId },
      attributes: ["repairId"],
      order: [["id", "ASC"]],
      ...options,
    }),
    Shop.findByPk(shopId, { attributes: ["comebackWindowDays"], ...options }),
  ]);
  const windowMs = (shop?.comebackWindowDays ?? 90) * dayMs;
  const confirmedCauses = causes.map((c) => c.cause);
  const repairIds = repairs.map((r) => r.repairId);
  const refrigerant = vehicle?.refrigerant ?? null;
  const meteringDevice = vehicle?.expansionDevice ?? null;

  // Comebacks: the vehicle's last case closed within the window before this one opened, and the first
  // case opened within the window after this one closed.
  const [before, after] = await Promise.all([
    row.vehicleId
      ? Case.findOne({
          where: {
            shopId,
            vehicleId: row.vehicleId,
            id: { [Op.ne]: caseId },
            closedAt: { [Op.between]: [new Date(row.createdAt.getTime() - windowMs), row.createdAt] },
          },
          attributes: ["id"],
          order: [["closedAt", "DESC"]],
          ...options,
        })
      : null,
    row.vehicleId && row.closedAt
      ? Case.findOne({
          where: {
            shopId,
            vehicleId: row.vehicleId,
            id: { [Op.ne]: caseId },
            createdAt: { [Op.gt]: row.closedAt, [Op.lte]: new Date(row.closedAt.getTime() + windowMs) },
          },
          attributes: ["id"],
          order: [["createdAt", "ASC"]],
          ...options,
        })
      : null,
  ]);

  const searchText = caseSearchText({
    complaint: row.complaint,
    make: vehicle?.make ?? null,
    model: vehicle?.model ?? null,
    conclusionCause: row.conclusionCause ?? null,
    conclusionNotes: row.conclusionNotes ?? null,
    reviewNotes: reviews.map((r) => r.comment ?? "").filter(Boolean),
    serviceNotes: [record?.notes, record?.slowRecoveryNote].filter(Boolean).join("\n") || null,
    confirmedCauses,
    repairIds,
    confirmedRepair: row.confirmedRepair ?? null,
    repairNote: row.repairNote ?? null,
  });

  await CasebookEntry.upsert(
    {
      caseId,
      shopId,
      status: row.status,
      technicianId: row.technicianId,
      vehicleId: row.vehicleId,
      make: vehicle?.make ?? null,
      model: vehicle?.model ?? null,
      year: vehicle?.year ?? null,
      refrigerant,
      meteringDevice,
      compressorType: compressorTypeOf(row.findings, vehicle),
      leadingSuspect: leadingSuspectOf(row.findings),
      outcome: confirmedCauses[0] ?? null,
      openedAt: row.createdAt,
      closedAt: row.closedAt ?? null,
      comebackOfCaseId: before?.id ?? null,
      cameBackCaseId: after?.id ?? null,
      comeback: Boolean(before || after),
      searchText,
      searchTerms: shopIndexTerms(searchText, shopId),
      updatedAt: new Date(),
    },
    { transaction },
  );
  // The other side of each comeback link points back at this case.
  if (before)
    await CasebookEntry.update(
      { cameBackCaseId: caseId, comeback: true },
      {
        where: {
          shopId,
          caseId: before.id,
          [Op.or]: [{ cameBackCaseId: null }, { cameBackCaseId: { [Op.gt]: caseId } }],
        },
        transaction,
      },
    );
  if (after)
    await CasebookEntry.update(
      { comebackOfCaseId: caseId, comeback: true },
      { where: { shopId, caseId: after.id }, transaction },
    );

  await CasebookSymptom.destroy({ where: { shopId, caseId }, transaction });
  const symptoms = [...new Set((row.symptomTags ?? []).filter((s) => typeof s === "string"))];
  if (symptoms.length > 0)
    await CasebookSymptom.bulkCreate(
      symptoms.map((symptom) => ({ shopId, caseId, symptom: symptom.slice(0, 48) })),
      { transaction },
    );

  const features = caseFeaturesFrom(row.findings);
  if (row.findings && refrigerant && meteringDevice && presentFeatures(features).length > 0) {
    await CaseFeatures.upsert(
      {
        caseId,
        shopId,
        refrigerant,
        meteringDevice,
        closed: row.closedAt !== null && row.closedAt !== undefined,
        ...features,
        updatedAt: new Date(),
      },
      { transaction },
    );
  } else {
    await CaseFeatures.destroy({ where: { shopId, caseId }, transaction });
  }
  await bumpCasebookVersion(models.sequelize, shopId, transaction);
}

/** Rebuilds the casebook rows of every case (of one shop, or all), a batch of cases at a time. */
export async function reindexCasebook({
  shopId,
  batchSize = 200,
}: {
  shopId?: number;
  batchSize?: number;
} = {}): Promise<number> {
  const { Case } = getModels();
  let lastId = 0;
  let done = 0;
  for (;;) {
    const rows = await Case.findAll({
      where: { id: { [Op.gt]: lastId }, ...(shopId ? { shopId } : {}) },
      attributes: ["id", "shopId"],
      order: [["id", "ASC"]],
      limit: batchSize,
      raw: true,
    });
    if (rows.length === 0) return done;
    for (const r of rows) await refreshCasebookEntry({ shopId: r.shopId, caseId: r.id });
    done += rows.length;
    lastId = rows[rows.length - 1]!.id;
  }
}
