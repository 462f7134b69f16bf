import { refrigerantContaminated as contaminated } from "@/lib/service/identifier";
import {
  type StaticReading,
  staticPressureLeft,
  staticShowsNoCharge,
} from "@/lib/refrigerants/static-charge";
import { doNotRunState } from "@/lib/diagnosis/do-not-run";
import type { InterviewAnswers } from "./answers";
import { altitudeFor, type ShopSettings, toDiagnosisInput } from "./engine-input";

export { altitudeFor, type ShopSettings } from "./engine-input";

/**
 * The system must not be run: the findings engine's do-not-run rule (lib/diagnosis/do-not-run.ts), which
 * applies the shared empty-system test (lib/refrigerants/static-charge.ts) among its reasons, on what is
 * known when the branch is taken — the system, the conditions and the static check. So no liquid left,
 * or an electric compressor whose charge the static has not shown, sends the interview to the leak search
 * instead of the running readings. One rule for the interview and the findings.
 */
/** The static reading in the shape the shared "empty system" test reads; null until taken. */
export function staticReadingOf(answers: InterviewAnswers, shop?: ShopSettings): StaticReading | null {
  const staticKpaGauge = answers.static?.staticKpaGauge;
  if (staticKpaGauge === undefined) return null;
  const refrigerant = answers.system?.refrigerant;
  const reading: StaticReading = {
    // Without the refrigerant only the gauge-zero test applies; R-134a stands in and is never read then.
    refrigerant: refrigerant ?? "R-134a",
    staticKpaGauge,
    ambientC: refrigerant === undefined ? undefined : answers.conditions?.ambientC,
  };
  const altitudeM = altitudeFor(answers, shop);
  if (altitudeM !== undefined) reading.altitudeM = altitudeM;
  return reading;
}

export function systemLooksEmpty(answers: InterviewAnswers, shop?: ShopSettings): boolean {
  // Before the system step is complete the engine cannot be asked; the gauge-zero test still can.
  const reading = staticReadingOf(answers, shop);
  if (reading !== null && staticShowsNoCharge(reading)) return true;
  const input = toDiagnosisInput(
    { system: answers.system, conditions: answers.conditions, static: answers.static },
    shop,
  );
  return input !== null && doNotRunState(input).active;
}

/** Some refrigerant vapour is still in the system, so it must be identified before anything is recovered. */
export function pressureLeft(answers: InterviewAnswers): boolean {
  return staticPressureLeft({ staticKpaGauge: answers.static?.staticKpaGauge });
}

/** Identifier purity below the pass mark (lib/service/identifier.ts). */
export function purityFailed(answers: InterviewAnswers): boolean {
  const purityPct = answers.identification?.purityPct;
  return purityPct !== undefined && contaminated({ purityPct });
}

/** Below the purity line, or flagged as holding hydrocarbon: the charge must stay out of the shop's recovery machine. */
export function refrigerantContaminated(answers: InterviewAnswers): boolean {
  return contaminated(answers.identification ?? {});
}
