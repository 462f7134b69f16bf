import type { RefrigerantId } from "@/lib/refrigerants";
import { formatPercent, sayGrams } from "./format";
import { SERVICE_SOURCES } from "./sources";
import {
  assertMass,
  CHARGE_DEVIATION_LIMITS,
  chargeDeviationVerdict,
  chargeToleranceG,
  chargeVerdictOf,
  type ChargeDeviationGrade,
  type ChargeVerdict,
} from "./charge-verdict";

export {
  CHARGE_DEVIATION_LIMITS,
  chargeDeviationVerdict,
  DEFAULT_RECOVERY_SHORTFALL_PCT,
  type ChargeDeviation,
  type ChargeDeviationGrade,
  type ChargeVerdict,
} from "./charge-verdict";

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
      return {
        toleranceG: chargeToleranceG(refrigerant),
        source: SERVICE_SOURCES.j2843ChargeAccuracy,
        checked: false,
      };
    case "R-134a":
      return {
        toleranceG: chargeToleranceG(refrigerant),
        source: SERVICE_SOURCES.j2788ChargeAccuracy,
        checked: false,
      };
    default:
      return {
        toleranceG: chargeToleranceG(refrigerant),
        source: SERVICE_SOURCES.noChargeStandard,
        checked: false,
      };
  }
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
  const verdict: ChargeVerdict = chargeVerdictOf(grade);

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
