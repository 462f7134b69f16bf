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
  caseFeaturesFrom,
  presentFeatures,
} from "@/lib/casebook/features";
import { neighbourSummary } from "@/lib/casebook/summary";
import type { Replacements } from "./filters";
import { vehicleLabel } from "./search";

type NeighbourRow = { case_id: number; distance: number } & Record<string, number | null>;

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
  const { sequelize, Case, Vehicle } = getModels();
  const row = await Case.findOne({
    where: { id: caseId, shopId },
    attributes: ["id", "vehicleId", "computed", "findings", "answers"],
    raw: true,
  });
  if (!row) throw new AppError("not_found:case", "No such case in this shop.");
  const vehicle = row.vehicleId
    ? await Vehicle.findOne({
        where: { id: row.vehicleId, shopId },
        attributes: ["refrigerant", "expansionDevice"],
        raw: true,
      })
    : null;
  const empty = (unavailable: string, features: CaseFeatureValues | null = null): SimilarCasesResponse => ({
    unavailable,
    refrigerant: vehicle?.refrigerant ?? null,
    meteringDevice: vehicle?.expansionDevice ?? null,
    features,
    neighbours: [],
    summary: null,
  });
  if (!vehicle) return empty("The case has no vehicle, so its system is not known.");
  // A draft has no findings yet: its ambient is still in the interview's answers.
  const draftAmbient = (row.answers as { answers?: { conditions?: { ambientC?: unknown } } } | null)?.answers
    ?.conditions?.ambientC;
  const features = caseFeaturesFrom(row.computed, row.findings ?? { input: { ambientC: draftAmbient } });
  if (presentFeatures(features).length === 0)
    return empty("Similar cases appear once the running readings are in.", features);

  const base: Replacements = {
    shopId,
    caseId,
    refrigerant: vehicle.refrigerant,
    device: vehicle.expansionDevice,
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
  const [entries, causes, repairs] = await Promise.all([
    sequelize.query<{
      case_id: number;
      opened_at: Date;
      closed_at: Date | null;
      make: string | null;
      model: string | null;
      year: number | null;
    }>(
      "SELECT case_id, opened_at, closed_at, make, model, year FROM casebook_entry WHERE shop_id = :shopId AND case_id IN (:ids)",
      { replacements: { shopId, ids }, type: QueryTypes.SELECT },
    ),
    sequelize.query<{ case_id: number; cause: string }>(
      "SELECT case_id, cause FROM case_confirmed_cause WHERE shop_id = :shopId AND case_id IN (:ids) ORDER BY id",
      { replacements: { shopId, ids }, type: QueryTypes.SELECT },
    ),
    sequelize.query<{ case_id: number; repair_id: string }>(
      "SELECT case_id, repair_id FROM case_repair WHERE shop_id = :shopId AND case_id IN (:ids) ORDER BY id",
      { replacements: { shopId, ids }, type: QueryTypes.SELECT },
    ),
  ]);
  const entryById = new Map(entries.map((e) => [e.case_id, e]));
  const neighbours: SimilarCase[] = nearest.map((n) => {
    const e = entryById.get(n.case_id);
    return {
      caseId: n.case_id,
      distance: Math.round(Number(n.distance) * 1000) / 1000,
      vehicle: e ? vehicleLabel(e) : null,
      openedAt: e ? new Date(e.opened_at).toISOString() : "",
      closedAt: e?.closed_at ? new Date(e.closed_at).toISOString() : null,
      confirmedCauses: causes.filter((c) => c.case_id === n.case_id).map((c) => c.cause as ConfirmedCauseId),
      repairIds: repairs.filter((r) => r.case_id === n.case_id).map((r) => r.repair_id),
      features: {
        condensingC: n.condensing_c ?? null,
        evaporatingC: n.evaporating_c ?? null,
        subcoolingK: n.subcooling_k ?? null,
        superheatK: n.superheat_k ?? null,
        approachK: n.approach_k ?? null,
        ambientC: n.ambient_c ?? null,
        chargeDeviationPct: n.charge_deviation_pct ?? null,
      },
    };
  });
  return {
    unavailable: null,
    refrigerant: vehicle.refrigerant,
    meteringDevice: vehicle.expansionDevice,
    features,
    neighbours,
    summary: neighbourSummary(neighbours),
  };
}
