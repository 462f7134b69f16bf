import type { RefrigerantId } from "@/lib/refrigerants";

/*
 * The verdict on a recovered mass against the label, without the sentences and sources the service
 * record prints with it (charge.ts): the interview's live readout and the do-not-run rule run this on
 * the phone, and the service record and the findings engine reach the same function through charge.ts.
 */

export type ChargeVerdict = "over" | "under" | "within";

/**
 * Charge accuracy a recovery/recharge machine must hold for this refrigerant (±, grams): SAE J2843 for
 * R-1234yf, SAE J2788 for R-134a (both from memory), and for any other refrigerant the same ½ oz by
 * analogy (common practice). chargeTolerance (charge.ts) gives the source of each figure with it.
 */
export function chargeToleranceG(refrigerant: RefrigerantId): number {
  switch (refrigerant) {
    case "R-1234yf":
      return 15;
    case "R-134a":
      return 15;
    default:
      return 15;
  }
}

/**
 * How far a recovered mass may sit from the label before it means something. One table for the
 * findings engine and the service record, so both say the same about the same weighing.
 */
export const CHARGE_DEVIATION_LIMITS = {
  /** SAE J2788 (and J2843, from memory): recovery equipment need take out only 95 %; a shortfall this size is what recovery leaves. */
  recoveryShortfallPct: 5,
  /** Short by more than recovery leaves but no more than this: a possible slow leak to test for (common practice). */
  possibleSlowLeakPct: 12,
  /** Short by more than this: a large loss (from memory). */
  veryShortPct: 35,
  /** Short by more than this: next to nothing came out (from memory). */
  emptyPct: 85,
  /** On top of the machine's charge accuracy before an excess is an overcharge: scale and hose losses (from memory). */
  overMarginPct: 3,
  /** An excess beyond this share of the label is a clear overcharge, as after a top-off (common practice). */
  wellOverPct: 15,
} as const;

/** Recovery machines leave some refrigerant behind: SAE J2788 (and J2843, from memory) only require 95 % out. */
export const DEFAULT_RECOVERY_SHORTFALL_PCT = CHARGE_DEVIATION_LIMITS.recoveryShortfallPct;

export type ChargeDeviationGrade =
  "empty" | "very_short" | "short" | "possible_slow_leak" | "within" | "over" | "well_over";

export interface ChargeDeviation {
  /** recovered − label; negative means refrigerant is missing */
  deltaG: number;
  deltaPct: number;
  grade: ChargeDeviationGrade;
  /** an excess above this is an overcharge: the machine's accuracy plus the margin */
  overAboveG: number;
  /** a shortfall up to this is what recovery leaves behind */
  allowedShortfallG: number;
}

/**
 * The one verdict on a recovered mass against the label. An excess counts as an overcharge only beyond
 * the machine's charge accuracy plus a margin; a shortfall within the recovery allowance is nothing, up
 * to 12 % a possible slow leak to test for, beyond that a real shortage.
 */
export function chargeDeviationVerdict(input: {
  labelChargeG: number;
  recoveredChargeG: number;
  refrigerant?: RefrigerantId;
  shortfallAllowancePct?: number;
}): ChargeDeviation {
  const { labelChargeG, recoveredChargeG } = input;
  assertMass("labelChargeG", labelChargeG, false);
  assertMass("recoveredChargeG", recoveredChargeG, true);
  const allowancePct = input.shortfallAllowancePct ?? CHARGE_DEVIATION_LIMITS.recoveryShortfallPct;
  if (!Number.isFinite(allowancePct) || allowancePct < 0 || allowancePct >= 100) {
    throw new RangeError(`shortfallAllowancePct must be between 0 and 100, got ${allowancePct}`);
  }
  const limits = CHARGE_DEVIATION_LIMITS;
  const deltaG = recoveredChargeG - labelChargeG;
  const deltaPct = (deltaG / labelChargeG) * 100;
  const overAboveG =
    // Stryker disable next-line LogicalOperator,StringLiteral: every refrigerant's tolerance is 15 g today, the default's included
    chargeToleranceG(input.refrigerant ?? "R-134a") + (labelChargeG * limits.overMarginPct) / 100;
  const allowedShortfallG = (labelChargeG * allowancePct) / 100;
  const shortPct = -deltaPct;
  const grade: ChargeDeviationGrade =
    deltaG > overAboveG
      ? deltaPct > limits.wellOverPct
        ? "well_over"
        : "over"
      : -deltaG <= allowedShortfallG
        ? "within"
        : shortPct <= Math.max(limits.possibleSlowLeakPct, allowancePct)
          ? "possible_slow_leak"
          : shortPct <= limits.veryShortPct
            ? "short"
            : shortPct <= limits.emptyPct
              ? "very_short"
              : "empty";
  return { deltaG, deltaPct, grade, overAboveG, allowedShortfallG };
}

export function assertMass(name: string, valueG: number, allowZero: boolean): void {
  if (!Number.isFinite(valueG) || valueG < 0 || (!allowZero && valueG === 0)) {
    throw new RangeError(
      `${name} must be a ${allowZero ? "non-negative" : "positive"} mass in grams, got ${valueG}`,
    );
  }
}

/** Over, under or within: the grade as the service record's sentence and the interview's readout word it. */
export function chargeVerdictOf(grade: ChargeDeviationGrade): ChargeVerdict {
  return grade === "over" || grade === "well_over" ? "over" : grade === "within" ? "within" : "under";
}
