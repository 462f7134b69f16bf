import { refrigerantContaminated as contaminated } from "@/lib/service/identifier";
import {
  type StaticReading,
  staticPressureLeft,
  staticShowsNoCharge,
} from "@/lib/refrigerants/static-charge";
import type { InterviewAnswers } from "./answers";

export interface ShopSettings {
  altitudeM?: number;
}

export function altitudeFor(answers: InterviewAnswers, shop?: ShopSettings): number | undefined {
  return answers.conditions?.altitudeM ?? shop?.altitudeM;
}

/** The static reading in the shape the shared "empty system" test (and the findings engine) reads; null until taken. */
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

/**
 * Empty or near-empty: the static gauge reads about zero, or too far below saturation at ambient for
 * liquid to remain. The interview's one call to the shared test (lib/refrigerants/static-charge.ts).
 */
export function systemLooksEmpty(answers: InterviewAnswers, shop?: ShopSettings): boolean {
  const reading = staticReadingOf(answers, shop);
  return reading !== null && staticShowsNoCharge(reading);
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
