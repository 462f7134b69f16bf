import { refrigerantCautionIds, ventingBanApplies } from "@/lib/cautions/by-refrigerant";
import { type Caution, type CautionId, cautionsById } from "@/lib/cautions/catalog";
import type { InterviewAnswers } from "./answers";
import { pressureLeft, refrigerantContaminated, systemLooksEmpty, type ShopSettings } from "./branches";
import type { StepId } from "./steps";

export type { Caution, CautionLevel } from "@/lib/cautions/catalog";

/**
 * The cautions in force, from the one catalogue (lib/cautions/catalog.ts), whose ids the findings
 * engine shares, so a screen showing both can merge them by id. The engine-running caution also
 * depends on the step on screen.
 */
export function cautionsFor(
  answers: InterviewAnswers,
  options: { shop?: ShopSettings; step?: StepId } = {},
): Caution[] {
  const ids: CautionId[] = ["eye_and_skin"];
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
  return cautionsById(ids);
}
