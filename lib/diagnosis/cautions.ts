import { type Caution as CatalogueCaution, type CautionId, cautionsById } from "@/lib/cautions/catalog";
import type { CauseId } from "./causes";
import type { ObservationId } from "./observations";
import { REAL_SHARE } from "./grading";
import type { DiagnosisInput } from "./schema";

export type { CautionId };

/** A caution as the catalogue words it; a repair caution in its conditional wording (ifSuspected). */
export type Caution = CatalogueCaution;

/** The repair cautions the findings name while the cause is a suspect: shown in their conditional wording. */
const REPAIR_CAUTIONS: ReadonlySet<CautionId> = new Set<CautionId>([
  "charge_by_weight",
  "repair_before_refill",
  "moisture_and_acid",
]);

/**
 * The cautions for this case. Safety cautions follow the system and the state; repair cautions follow the
 * leading cause or one holding a real share (REAL_SHARE), never a cause trailing at a few percent, and are
 * worded as conditions.
 */
export function collectCautions(a: {
  input: DiagnosisInput;
  observations: ReadonlySet<ObservationId>;
  ranking: readonly { cause: CauseId; share: number }[];
  refrigerantContaminated: boolean;
  doNotRun: boolean;
}): Caution[] {
  const { input, observations, ranking, refrigerantContaminated, doNotRun } = a;
  const leader = ranking[0]?.cause;
  const real = (cause: CauseId) =>
    !refrigerantContaminated &&
    (cause === leader || (ranking.find((r) => r.cause === cause)?.share ?? 0) >= REAL_SHARE);
  const ids: CautionId[] = ["eye_and_skin"];
  // CO2 release is governed by the maker's procedure rather than the HFC venting bans.
  if (input.refrigerant !== "R-744") ids.push("never_vent");
  if (input.refrigerant === "R-1234yf") ids.push("flammable_r1234yf");
  if (input.refrigerant === "R-744") ids.push("r744_pressure");
  if (input.compressorType === "electric")
    ids.push("high_voltage_compressor", "electric_never_without_charge");
  if (refrigerantContaminated) ids.push("contaminated_do_not_recover");
  if (observations.has("symptom:identifier_flags_hydrocarbon")) ids.push("hydrocarbon_flammable");
  if (observations.has("symptom:sealant_found")) ids.push("sealant_in_system");
  if (observations.has("high_side:very_high") || observations.has("symptom:high_pressure_cutout"))
    ids.push("head_pressure_high");
  if (doNotRun) ids.push("empty_system");
  if (input.expansionDevice === "orifice_tube") ids.push("recover_slowly_accumulator");
  if (real("overcharge") || real("undercharge") || doNotRun) ids.push("charge_by_weight");
  if (real("undercharge")) ids.push("repair_before_refill");
  if (real("moisture")) ids.push("moisture_and_acid");
  ids.push("defer_to_procedure");
  // On a system that must not be run the recharge by weight is certain, not a condition.
  const conditional = (id: CautionId) => REPAIR_CAUTIONS.has(id) && !(doNotRun && id === "charge_by_weight");
  return cautionsById(ids).map((c) =>
    conditional(c.id) && c.ifSuspected !== undefined ? { ...c, text: c.ifSuspected } : c,
  );
}
