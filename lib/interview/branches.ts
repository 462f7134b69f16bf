import { staticCheck } from "@/lib/refrigerants/derived";
import { gaugeToAbsoluteKpa } from "@/lib/units";
import type { InterviewAnswers } from "./answers";

export interface ShopSettings {
  altitudeM?: number;
}

/*
 * A static gauge at or below about 0 kPa means there is no charge left to test or recover.
 * The 7 kPa (about 1 psi) allows for the resolution of a service gauge (common practice).
 */
export const EMPTY_STATIC_MAX_KPA_GAUGE = 7;

/*
 * Identifiers meeting the SAE specification report refrigerant at 98 % or better as pure, and recycling applies
 * only to refrigerant identified at ≥ 98 % (SAE J2099, which covers R-134a and R-1234yf); the same line for
 * is common practice.
 */
export const PURITY_MIN_PCT = 98;

export function altitudeFor(answers: InterviewAnswers, shop?: ShopSettings): number | undefined {
  return answers.conditions?.altitudeM ?? shop?.altitudeM;
}

/** Empty or near-empty: the static gauge reads about zero, or too far below saturation at ambient for liquid to remain. */
export function systemLooksEmpty(answers: InterviewAnswers, shop?: ShopSettings): boolean {
  const staticKpaGauge = answers.static?.staticKpaGauge;
  if (staticKpaGauge === undefined) return false;
  if (staticKpaGauge <= EMPTY_STATIC_MAX_KPA_GAUGE) return true;
  const refrigerant = answers.system?.refrigerant;
  const ambientC = answers.conditions?.ambientC;
  if (refrigerant === undefined || ambientC === undefined) return false;
  try {
    const altitudeM = altitudeFor(answers, shop);
    const staticKpaAbs = gaugeToAbsoluteKpa(
      staticKpaGauge,
      altitudeM === undefined ? undefined : { altitudeM },
    );
    return staticCheck({ refrigerant, staticKpaAbs, ambientC }).kind === "no_liquid";
  } catch {
    // Outside what the tables cover: the reading cannot tell us the system is empty.
    return false;
  }
}

/** Some refrigerant vapour is still in the system, so it must be identified before anything is recovered. */
export function pressureLeft(answers: InterviewAnswers): boolean {
  const staticKpaGauge = answers.static?.staticKpaGauge;
  return staticKpaGauge !== undefined && staticKpaGauge > EMPTY_STATIC_MAX_KPA_GAUGE;
}

export function purityFailed(answers: InterviewAnswers): boolean {
  const purityPct = answers.identification?.purityPct;
  return purityPct !== undefined && purityPct < PURITY_MIN_PCT;
}

/** Below the purity line, or flagged as holding hydrocarbon: the charge must stay out of the shop's recovery machine. */
export function refrigerantContaminated(answers: InterviewAnswers): boolean {
  return purityFailed(answers) || answers.identification?.hydrocarbonFlagged === true;
}
