import { refrigerantCautionIds, ventingBanApplies } from "@/lib/cautions/refrigerant-rules";
import type { CautionId } from "@/lib/cautions/catalog";
import type { InterviewAnswers } from "./answers";
import { pressureLeft, refrigerantContaminated, systemLooksEmpty, type ShopSettings } from "./branches";
import type { StepId } from "./steps";

/**
 * Every caution the interview's steps can show. The server renders these from the catalogue
 * (lib/cautions/catalog.ts) once per page; the phone only decides, from the answers, which of them
 * are in force, so the catalogue's texts and sources never travel in the interview's script.
 */
export const INTERVIEW_CAUTION_IDS = [
  "eye_and_skin",
  "never_vent",
  "flammable_r1234yf",
  "r744_pressure",
  "co2_asphyxiation",
  "high_voltage_compressor",
  "dielectric_oil",
  "recover_slowly_accumulator",
  "empty_system",
  "repair_before_refill",
  "leak_test_gas",
  "engine_running",
  "hydrocarbon_flammable",
  "contaminated_do_not_recover",
  "identify_before_recovery",
  "defer_to_procedure",
] as const satisfies readonly CautionId[];

export type InterviewCautionId = (typeof INTERVIEW_CAUTION_IDS)[number];

/** A caution in force, named by its catalogue id. */
export interface CautionRef {
  id: InterviewCautionId;
}

/** The ids of the cautions in force, most general first, deferring to the maker's procedure last. */
export function cautionIdsFor(
  answers: InterviewAnswers,
  options: { shop?: ShopSettings; step?: StepId } = {},
): InterviewCautionId[] {
  const ids: InterviewCautionId[] = ["eye_and_skin"];
  const system = answers.system;
  if (ventingBanApplies(system?.refrigerant)) ids.push("never_vent");
  if (system?.refrigerant) ids.push(...refrigerantCautionIds(system.refrigerant));
  if (system?.compressorType === "electric") ids.push("high_voltage_compressor", "dielectric_oil");
  if (system?.expansionDevice === "orifice_tube") ids.push("recover_slowly_accumulator");

  const empty = systemLooksEmpty(answers, options.shop);
  if (empty) ids.push("empty_system", "repair_before_refill", "leak_test_gas");
  else if (options.step === "running" || options.step === "behaviour") ids.push("engine_running");

  if (answers.identification?.hydrocarbonFlagged) ids.push("hydrocarbon_flammable");
  if (refrigerantContaminated(answers)) ids.push("contaminated_do_not_recover");
  else if (answers.identification?.purityPct === undefined && (!empty || pressureLeft(answers))) {
    const recovering = answers.chargeAudit?.recovered === true;
    const atRecovery = options.step === "chargeAudit" || options.step === "recoveryHeld";
    if (recovering || atRecovery) ids.push("identify_before_recovery");
  }
  ids.push("defer_to_procedure");
  return ids;
}
