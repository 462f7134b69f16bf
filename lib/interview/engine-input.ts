import type { DiagnosisInput, SymptomId } from "@/lib/diagnosis";
import type { InterviewAnswers } from "./answers";

export interface ShopSettings {
  altitudeM?: number;
}

export function altitudeFor(answers: InterviewAnswers, shop?: ShopSettings): number | undefined {
  return answers.conditions?.altitudeM ?? shop?.altitudeM;
}

/**
 * The findings engine's input from the interview's answers, or null until the refrigerant,
 * the expansion device and the ambient temperature are known. Missing or skipped readings
 * stay absent so the engine says what was not measured rather than guessing.
 */
export function toDiagnosisInput(answers: InterviewAnswers, shop?: ShopSettings): DiagnosisInput | null {
  const { system, conditions } = answers;
  if (system === undefined || conditions === undefined) return null;
  const altitudeM = altitudeFor(answers, shop);
  const charge = answers.chargeAudit;
  const fields: DiagnosisInput = {
    refrigerant: system.refrigerant,
    expansionDevice: system.expansionDevice,
    compressorType: system.compressorType === "unknown" ? undefined : system.compressorType,
    ambientC: conditions.ambientC,
    relativeHumidityPct: conditions.relativeHumidityPct,
    altitudeM,
    staticKpaGauge: answers.static?.staticKpaGauge,
    staticSoakC: answers.static?.staticSoakC,
    staticSoakMin: answers.static?.staticSoakMin,
    highKpaGauge: answers.running?.highKpaGauge,
    lowKpaGauge: answers.running?.lowKpaGauge,
    lowCutOutKpaGauge: answers.running?.lowCutOutKpaGauge,
    lowCutInKpaGauge: answers.running?.lowCutInKpaGauge,
    liquidLineC: answers.running?.liquidLineC,
    suctionLineC: answers.running?.suctionLineC,
    ventC: answers.running?.ventC,
    labelChargeG: system.labelChargeG,
    recoveredChargeG: charge?.recovered ? charge.recoveredChargeG : undefined,
    chargedG: charge?.chargedG,
    identifierPurityPct: answers.identification?.purityPct,
    identifierAirPct: answers.identification?.airPct,
    symptoms: symptomsFrom(answers),
  };
  // Absent, not undefined: the input is stored as JSON with the case and compared in tests.
  return Object.fromEntries(
    Object.entries(fields).filter(([, value]) => value !== undefined),
  ) as DiagnosisInput;
}

/**
 * Ticked behaviours plus what the sealant look, the identifier, the leak search and the charge audit
 * found; absent when none of those was asked.
 */
function symptomsFrom(answers: InterviewAnswers): SymptomId[] | undefined {
  const { behaviour, identification, leakFinding, chargeAudit } = answers;
  const sealantSeen = answers.static?.sealantSeen;
  const asked =
    behaviour !== undefined ||
    sealantSeen !== undefined ||
    identification?.hydrocarbonFlagged !== undefined ||
    leakFinding?.whereFound !== undefined ||
    chargeAudit?.partReplaced !== undefined ||
    chargeAudit?.compressorOil !== undefined;
  if (!asked) return undefined;
  const symptoms: SymptomId[] = [...(behaviour?.symptoms ?? [])];
  if (sealantSeen !== undefined) symptoms.push(sealantSeen ? "sealant_found" : "no_sealant_found");
  if (identification?.hydrocarbonFlagged) symptoms.push("identifier_flags_hydrocarbon");
  // "Not found yet" is a search still under way, not a clean result at the detector's most
  // sensitive setting (which is what the engine's no_leak_found means): it moves no score.
  if (leakFinding?.whereFound !== undefined && leakFinding.whereFound !== "not_found_yet")
    symptoms.push("leak_found");
  if (chargeAudit?.partReplaced === "with_oil") symptoms.push("part_replaced_oil_added");
  if (chargeAudit?.partReplaced === "without_oil") symptoms.push("part_replaced_no_oil_added");
  if (chargeAudit?.compressorOil === "short") symptoms.push("oil_short_at_drain");
  if (chargeAudit?.compressorOil === "about_right") symptoms.push("oil_normal_at_drain");
  return symptoms;
}
