import type { DiagnosisInput, SymptomId } from "@/lib/diagnosis";
import type { InterviewAnswers } from "./answers";
import { altitudeFor, type ShopSettings } from "./branches";
import { answersOnRoute } from "./route";

/**
 * The findings engine's input from the interview's answers, or null until the refrigerant,
 * the expansion device and the ambient temperature are known. Missing or skipped readings
 * stay absent so the engine lowers its confidence rather than guessing.
 */
export function toDiagnosisInput(answers: InterviewAnswers, shop?: ShopSettings): DiagnosisInput | null {
  const { system, conditions } = answers;
  if (system === undefined || conditions === undefined) return null;
  const altitudeM = altitudeFor(answers, shop);
  const charge = answers.chargeAudit;
  const fields: DiagnosisInput = {
    refrigerant: system.refrigerant,
    expansionDevice: system.expansionDevice,
    ambientC: conditions.ambientC,
    relativeHumidityPct: conditions.relativeHumidityPct,
    altitudeM,
    staticKpaGauge: answers.static?.staticKpaGauge,
    highKpaGauge: answers.running?.highKpaGauge,
    lowKpaGauge: answers.running?.lowKpaGauge,
    liquidLineC: answers.running?.liquidLineC,
    suctionLineC: answers.running?.suctionLineC,
    ventC: answers.running?.ventC,
    labelChargeG: system.labelChargeG,
    recoveredChargeG: charge?.recovered ? charge.recoveredChargeG : undefined,
    identifierPurityPct: answers.identification?.purityPct,
    identifierAirPct: answers.identification?.airPct,
    compressorType: system.electricCompressor ? "electric" : undefined,
    symptoms: symptomsFrom(answers),
  };
  // Absent, not undefined: the input is stored as JSON with the case and compared in tests.
  return Object.fromEntries(
    Object.entries(fields).filter(([, value]) => value !== undefined),
  ) as DiagnosisInput;
}

/**
 * The input the findings should be computed from: only the answers on the current route count, so
 * running readings left over from before a system proved empty do not reach the engine. The screen
 * (viewOf) and the server should both use this.
 */
export function diagnosisInputFor(answers: InterviewAnswers, shop?: ShopSettings): DiagnosisInput | null {
  return toDiagnosisInput(answersOnRoute(answers, shop), shop);
}

/** Ticked behaviours plus what the identifier and the leak search found; absent when none of those was asked. */
function symptomsFrom(answers: InterviewAnswers): SymptomId[] | undefined {
  const { behaviour, identification, leakFinding } = answers;
  const asked =
    behaviour !== undefined ||
    identification?.hydrocarbonFlagged !== undefined ||
    leakFinding?.whereFound !== undefined;
  if (!asked) return undefined;
  const symptoms: SymptomId[] = [...(behaviour?.symptoms ?? [])];
  if (identification?.hydrocarbonFlagged) symptoms.push("identifier_flags_hydrocarbon");
  // "Not found yet" is a search still under way, not a clean result at the detector's most
  // sensitive setting (which is what the engine's no_leak_found means): it moves no score.
  if (leakFinding?.whereFound !== undefined && leakFinding.whereFound !== "not_found_yet")
    symptoms.push("leak_found");
  return symptoms;
}
