import "server-only";
import { QueryTypes } from "sequelize";
import { getModels } from "@/models";
import { AppError } from "@/lib/errors";
import type {
  CaseFeatureValues,
  ConfirmedCauseId,
  SimilarCase,
  SimilarCasesResponse,
} from "@/lib/contracts/casebook";
import {
  BOUNDING_STEPS,
  FEATURE_COLUMNS,
  FEATURE_SCALES,
  MISSING_FEATURE_PENALTY,
  draftFeaturesFrom,
  presentFeatures,
} from "@/lib/casebook/features";
import { sortSavedAnswers } from "@/lib/interview/validate";
import { diagnosisInputFor } from "@/lib/interview/to-diagnosis-input";
import { neighbourSummary } from "@/lib/casebook/summary";
import type { Replacements } from "./filters";
import { vehicleLabel } from "./search";
import { interviewRecordWithFigures } from "../case-figures";

type FeatureRow = Partial<Record<(typeof FEATURE_COLUMNS)[keyof typeof FEATURE_COLUMNS], number | null>> & {
  features_case_id?: number | null;
};
type NeighbourRow = { case_id: number; distance: number } & FeatureRow;

const FEATURE_SELECT = [
  "f.case_id AS features_case_id",
  ...Object.values(FEATURE_COLUMNS).map((c) => `f.${c}`),
].join(", ");

function featuresOf(row: FeatureRow): CaseFeatureValues {
  const values = {} as CaseFeatureValues;
  for (const [key, column] of Object.entries(FEATURE_COLUMNS) as [
    keyof CaseFeatureValues,
    keyof FeatureRow,
  ][])
    values[key] = row[column] === null || row[column] === undefined ? null : Number(row[column]);
  return values;
}

/** A case without stored readings (a draft): what its interview holds so far, on its route. */
async function draftFeatures(shopId: number, caseId: number): Promise<CaseFeatureValues> {
  const { Case, Shop } = getModels();
  const [row, shop] = await Promise.all([
    Case.findOne({ where: { id: caseId, shopId }, attributes: ["answers", "vehicleId"], raw: true }),
    Shop.findByPk(shopId, { attributes: ["altitudeM"], raw: true }),
  ]);
  const record = row
    ? await interviewRecordWithFigures({
        shopId,
        caseId,
        vehicleId: row.vehicleId ?? null,
        interviewRecord: row.answers,
      })
    : null;
  const saved = (record as { answers?: unknown } | null)?.answers;
  const settings = { altitudeM: shop?.altitudeM ?? undefined };
  const input = saved ? diagnosisInputFor(sortSavedAnswers(saved, settings).answers, settings) : null;
  return draftFeaturesFrom(input);
}

/**
 * The nearest closed cases as SQL: the same refrigerant and metering device through the index
 * case_features_nearest, optionally boxed to a few steps on condensing and evaporating temperature (a range
 * on indexed columns), then ordered by the normalised distance. Only k rows ever leave the database.
 */
export function nearestSql(
  features: CaseFeatureValues,
  bounded: boolean,
): { sql: string; replacements: Replacements } {
  const replacements: Replacements = {};
  const keys = presentFeatures(features);
  const terms = keys.map((key) => {
    replacements[key] = features[key] as number;
    const column = `f.${FEATURE_COLUMNS[key]}`;
    return `COALESCE(POW((${column} - :${key}) / ${FEATURE_SCALES[key]}, 2), ${MISSING_FEATURE_PENALTY ** 2})`;
  });
  const box: string[] = [];
  if (bounded)
    for (const key of ["condensingC", "evaporatingC"] as const) {
      const value = features[key];
      if (value === null) continue;
      const reach = BOUNDING_STEPS * FEATURE_SCALES[key];
      box.push(`f.${FEATURE_COLUMNS[key]} BETWEEN :${key}Low AND :${key}High`);
      replacements[`${key}Low`] = value - reach;
      replacements[`${key}High`] = value + reach;
    }
  const columns = Object.values(FEATURE_COLUMNS)
    .map((c) => `f.${c}`)
    .join(", ");
  const sql = `SELECT f.case_id, SQRT((${terms.join(" + ")}) / ${keys.length}) AS distance, ${columns}
  FROM case_features f
 WHERE f.shop_id = :shopId AND f.refrigerant = :refrigerant AND f.metering_device = :device
   AND f.closed = 1 AND f.case_id <> :caseId${box.map((b) => `\n   AND ${b}`).join("")}
 ORDER BY distance, f.case_id
 LIMIT :k`;
  return { sql, replacements };
}

/** The closed cases of the shop nearest to this case in their readings, with what each turned out to be. */
export async function similarCases({
  shopId,
  caseId,
  k = 10,
}: {
  shopId: number;
  caseId: number;
  k?: number;
}): Promise<SimilarCasesResponse> {
  const { sequelize, Case } = getModels();
  // The case's system and stored readings in one read; a draft has no stored readings yet.
  const [own] = await sequelize.query<
    { refrigerant: string | null; metering_device: string | null } & FeatureRow
  >(
    `SELECT e.refrigerant, e.metering_device, ${FEATURE_SELECT}
       FROM casebook_entry e LEFT JOIN case_features f ON f.shop_id = e.shop_id AND f.case_id = e.case_id
      WHERE e.shop_id = :shopId AND e.case_id = :caseId`,
    { replacements: { shopId, caseId }, type: QueryTypes.SELECT },
  );
  if (!own) {
    // Not in the casebook's rows (yet): the case itself says whether it exists in this shop.
    const exists = await Case.count({ where: { id: caseId, shopId } });
    if (!exists) throw new AppError("not_found:case", "No such case in this shop.");
  }
  const refrigerant = own?.refrigerant ?? null;
  const meteringDevice = own?.metering_device ?? null;
  const empty = (unavailable: string, features: CaseFeatureValues | null = null): SimilarCasesResponse => ({
    unavailable,
    refrigerant,
    meteringDevice,
    features,
    neighbours: [],
    summary: null,
  });
  if (!refrigerant || !meteringDevice) return empty("The case has no vehicle, so its system is not known.");
  const features = own?.features_case_id ? featuresOf(own) : await draftFeatures(shopId, caseId);
  if (presentFeatures(features).length === 0)
    return empty("Similar cases appear once the running readings are in.", features);

  const base: Replacements = {
    shopId,
    caseId,
    refrigerant,
    device: meteringDevice,
    k,
  };
  const run = async (bounded: boolean) => {
    const { sql, replacements } = nearestSql(features, bounded);
    return sequelize.query<NeighbourRow>(sql, {
      replacements: { ...base, ...replacements },
      type: QueryTypes.SELECT,
    });
  };
  let nearest = await run(true);
  // Too few inside the box: a wider look, still one shop's closed cases of this system and k rows out.
  if (nearest.length < k) nearest = await run(false);
  if (nearest.length === 0) return { ...empty("", features), unavailable: null };

  const ids = nearest.map((n) => n.case_id);
  const outcomes = await sequelize.query<{
    case_id: number;
    opened_at: Date;
    closed_at: Date | null;
    make: string | null;
    model: string | null;
    year: number | null;
    causes: string | null;
    repairs: string | null;
  }>(
    `SELECT e.case_id, e.opened_at, e.closed_at, e.make, e.model, e.year,
            (SELECT GROUP_CONCAT(cc.cause ORDER BY cc.id SEPARATOR ',') FROM case_confirmed_cause cc
              WHERE cc.shop_id = e.shop_id AND cc.case_id = e.case_id) AS causes,
            (SELECT GROUP_CONCAT(cr.repair_id ORDER BY cr.id SEPARATOR ',') FROM case_repair cr
              WHERE cr.shop_id = e.shop_id AND cr.case_id = e.case_id) AS repairs
       FROM casebook_entry e WHERE e.shop_id = :shopId AND e.case_id IN (:ids)`,
    { replacements: { shopId, ids }, type: QueryTypes.SELECT },
  );
  const byId = new Map(outcomes.map((e) => [e.case_id, e]));
  const neighbours: SimilarCase[] = nearest.map((n) => {
    const e = byId.get(n.case_id);
    return {
      caseId: n.case_id,
      distance: Math.round(Number(n.distance) * 1000) / 1000,
      vehicle: e ? vehicleLabel(e) : null,
      openedAt: e ? new Date(e.opened_at).toISOString() : "",
      closedAt: e?.closed_at ? new Date(e.closed_at).toISOString() : null,
      confirmedCauses: (e?.causes ? e.causes.split(",") : []) as ConfirmedCauseId[],
      repairIds: e?.repairs ? e.repairs.split(",") : [],
      features: featuresOf(n),
    };
  });
  return {
    unavailable: null,
    refrigerant,
    meteringDevice,
    features,
    neighbours,
    summary: neighbourSummary(neighbours),
  };
}
