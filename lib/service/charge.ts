import type { RefrigerantId } from "@/lib/refrigerants";
import { formatPercent, sayGrams } from "./format";
import { SERVICE_SOURCES } from "./sources";

export type ChargeVerdict = "over" | "under" | "within";

export interface ChargeTolerance {
  toleranceG: number;
  source: string;
  /** true when the figure was checked against the standard's text, false when recalled or borrowed */
  checked: boolean;
}

/** Charge accuracy a recovery/recharge machine must hold for this refrigerant (±, grams). */
export function chargeTolerance(refrigerant: RefrigerantId): ChargeTolerance {
  switch (refrigerant) {
    case "R-1234yf":
      return { toleranceG: 15, source: SERVICE_SOURCES.j2843ChargeAccuracy, checked: false };
    case "R-134a":
      return { toleranceG: 15, source: SERVICE_SOURCES.j2788ChargeAccuracy, checked: false };
    default:
      return { toleranceG: 15, source: SERVICE_SOURCES.noChargeStandard, checked: false };
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
    chargeTolerance(input.refrigerant ?? "R-134a").toleranceG + (labelChargeG * limits.overMarginPct) / 100;
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

export interface RecoveredAgainstLabel {
  deltaG: number;
  deltaPct: number;
  verdict: ChargeVerdict;
  /** the shared verdict's finer grade (chargeDeviationVerdict) */
  grade: ChargeDeviationGrade;
  /** the band inside which the recovered mass is not evidence of anything */
  allowedShortfallG: number;
  allowedExcessG: number;
  sentence: string;
  sources: string[];
}

function assertMass(name: string, valueG: number, allowZero: boolean): void {
  if (!Number.isFinite(valueG) || valueG < 0 || (!allowZero && valueG === 0)) {
    throw new RangeError(
      `${name} must be a ${allowZero ? "non-negative" : "positive"} mass in grams, got ${valueG}`,
    );
  }
}

/** The service record's sentence for the shared verdict on what came out of the system. */
export function recoveredAgainstLabel(input: {
  labelChargeG: number;
  recoveredChargeG: number;
  refrigerant?: RefrigerantId;
  shortfallAllowancePct?: number;
}): RecoveredAgainstLabel {
  const deviation = chargeDeviationVerdict(input);
  const { deltaG, deltaPct, grade, overAboveG, allowedShortfallG } = deviation;
  const shortfallPct = input.shortfallAllowancePct ?? CHARGE_DEVIATION_LIMITS.recoveryShortfallPct;
  const tolerance = chargeTolerance(input.refrigerant ?? "R-134a");
  const verdict: ChargeVerdict =
    grade === "over" || grade === "well_over" ? "over" : grade === "within" ? "within" : "under";

  const head = `Recovered ${sayGrams(input.recoveredChargeG)} against a label charge of ${sayGrams(input.labelChargeG)}`;
  const size = `${sayGrams(deltaG)} (${formatPercent(deltaPct)})`;
  let sentence: string;
  if (verdict === "over") {
    sentence = `${head}: ${size} over — more than the machine's accuracy and recovery can explain: an overcharge.`;
  } else if (grade === "possible_slow_leak") {
    sentence = `${head}: ${size} under — more than recovery leaves behind (up to ${formatPercent(shortfallPct)}) but not by much: possibly a slow leak, so leak-test before recharging.`;
  } else if (verdict === "under") {
    sentence = `${head}: ${size} under — more than recovery leaves behind (up to ${formatPercent(shortfallPct)}), so the system was short of refrigerant: find the leak before recharging.`;
  } else if (deltaG === 0) {
    sentence = `${head}: exactly the label charge.`;
  } else {
    // Stryker disable next-line EqualityOperator: a delta of 0 took the branch above
    const side = deltaG > 0 ? "over" : "under";
    sentence = `${head}: ${size} ${side} — within what recovery leaves behind and the machine's accuracy, so not evidence of a leak or an overcharge.`;
  }
  return {
    deltaG,
    deltaPct,
    verdict,
    grade,
    allowedShortfallG,
    allowedExcessG: overAboveG,
    sentence,
    sources: [
      SERVICE_SOURCES.j2788Recovery,
      SERVICE_SOURCES.j2843Recovery,
      tolerance.source,
      "possible slow leak up to 12 % short: common practice; 3 % margin on top of the machine's accuracy: from memory",
    ],
  };
}

export interface ChargeCheck {
  within: boolean;
  deltaG: number;
  toleranceG: number;
  sentence: string;
  source: string;
}

/** Is the charged mass inside the machine accuracy the standards require? */
export function chargeWithinTolerance(input: {
  targetG: number;
  chargedG: number;
  refrigerant: RefrigerantId;
  toleranceG?: number;
}): ChargeCheck {
  assertMass("targetG", input.targetG, false);
  assertMass("chargedG", input.chargedG, true);
  const standard = chargeTolerance(input.refrigerant);
  const toleranceG = input.toleranceG ?? standard.toleranceG;
  if (!Number.isFinite(toleranceG) || toleranceG < 0)
    throw new RangeError(`toleranceG must be ≥ 0, got ${toleranceG}`);
  const deltaG = input.chargedG - input.targetG;
  const within = Math.abs(deltaG) <= toleranceG;
  const off = deltaG === 0 ? "on target" : `${sayGrams(deltaG)} ${deltaG > 0 ? "over" : "under"}`;
  const sentence = `Charged ${sayGrams(input.chargedG)} against a target of ${sayGrams(input.targetG)}: ${off}, ${
    within ? "inside" : "outside"
  } the ±${sayGrams(toleranceG)} a recharge machine must hold.${within ? "" : " Recover and recharge by weight."}`;
  return {
    within,
    deltaG,
    toleranceG,
    sentence,
    source: input.toleranceG === undefined ? standard.source : "shop setting",
  };
}

export type TargetBasis = "revised" | "label" | "spec_table";

export interface TargetCharge {
  targetG: number;
  basis: TargetBasis;
  warnings: string[];
}

/**
 * The mass to charge by weight. A maker's revised figure (service bulletin) wins over the
 * under-hood label; the shop's spec table is the fallback when the label is missing or
 * unreadable, and a disagreement between label and spec table is flagged, never averaged.
 */
export function targetCharge(input: {
  labelChargeG?: number | null;
  specChargeG?: number | null;
  revisedChargeG?: number | null;
  refrigerant?: RefrigerantId;
}): TargetCharge | null {
  // Stryker disable next-line LogicalOperator,StringLiteral: every refrigerant's tolerance is 15 g today, the default's included
  const toleranceG = chargeTolerance(input.refrigerant ?? "R-134a").toleranceG;
  const warnings: string[] = [];
  const { labelChargeG, specChargeG, revisedChargeG } = input;
  for (const [name, v] of Object.entries({ labelChargeG, specChargeG, revisedChargeG })) {
    if (v != null) assertMass(name, v, false);
  }
  if (labelChargeG != null && specChargeG != null && Math.abs(labelChargeG - specChargeG) > toleranceG) {
    warnings.push(
      `The label says ${sayGrams(labelChargeG)} but the spec table says ${sayGrams(specChargeG)}: check the variant (rear A/C?) and the label before charging.`,
    );
  }
  if (revisedChargeG != null) {
    warnings.push(
      "Charging to the maker's revised figure instead of the label: note the bulletin on the record.",
    );
    return { targetG: revisedChargeG, basis: "revised", warnings };
  }
  if (labelChargeG != null) return { targetG: labelChargeG, basis: "label", warnings };
  if (specChargeG != null) {
    warnings.push("No label charge recorded: the target comes from the shop's spec table.");
    return { targetG: specChargeG, basis: "spec_table", warnings };
  }
  return null;
}
