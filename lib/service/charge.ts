import type { RefrigerantId } from "@/lib/refrigerants";
import { formatGrams, formatPercent } from "./format";
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

/** Recovery machines leave some refrigerant behind: SAE J2788 (and J2843, from memory) only require 95 % out. */
export const DEFAULT_RECOVERY_SHORTFALL_PCT = 5;

export interface RecoveredAgainstLabel {
  deltaG: number;
  deltaPct: number;
  verdict: ChargeVerdict;
  /** the band inside which the recovered mass is not evidence of anything */
  allowedShortfallG: number;
  allowedExcessG: number;
  sentence: string;
  sources: string[];
}

/** "an 800 g", "an 18 g", "a 1,000 g" */
export function indefiniteArticle(formatted: string): "a" | "an" {
  const leadingGroup = formatted.split(/[ ,]/)[0] ?? "";
  return leadingGroup.startsWith("8") || leadingGroup === "11" || leadingGroup === "18" ? "an" : "a";
}

function assertMass(name: string, valueG: number, allowZero: boolean): void {
  if (!Number.isFinite(valueG) || valueG < 0 || (!allowZero && valueG === 0)) {
    throw new RangeError(
      `${name} must be a ${allowZero ? "non-negative" : "positive"} mass in grams, got ${valueG}`,
    );
  }
}

/**
 * Compare what came out of the system with the label charge. A shortfall up to the
 * recovery allowance is what any compliant machine leaves behind; an excess beyond the
 * charge accuracy means more went in than the label asks for.
 */
export function recoveredAgainstLabel(input: {
  labelChargeG: number;
  recoveredChargeG: number;
  refrigerant?: RefrigerantId;
  shortfallAllowancePct?: number;
}): RecoveredAgainstLabel {
  const { labelChargeG, recoveredChargeG } = input;
  assertMass("labelChargeG", labelChargeG, false);
  assertMass("recoveredChargeG", recoveredChargeG, true);
  const shortfallPct = input.shortfallAllowancePct ?? DEFAULT_RECOVERY_SHORTFALL_PCT;
  if (!Number.isFinite(shortfallPct) || shortfallPct < 0 || shortfallPct >= 100) {
    throw new RangeError(`shortfallAllowancePct must be between 0 and 100, got ${shortfallPct}`);
  }
  const tolerance = chargeTolerance(input.refrigerant ?? "R-134a");
  const deltaG = recoveredChargeG - labelChargeG;
  const deltaPct = (deltaG / labelChargeG) * 100;
  const allowedShortfallG = (labelChargeG * shortfallPct) / 100;
  const allowedExcessG = tolerance.toleranceG;
  const verdict: ChargeVerdict =
    deltaG > allowedExcessG ? "over" : deltaG < -allowedShortfallG ? "under" : "within";

  const label = formatGrams(labelChargeG);
  const head = `Recovered ${formatGrams(recoveredChargeG)} against ${indefiniteArticle(label)} ${label} label`;
  const size = `${formatGrams(deltaG)} (${formatPercent(deltaPct)})`;
  let sentence: string;
  if (verdict === "over") {
    sentence = `${head}: ${size} over — an overcharge.`;
  } else if (verdict === "under") {
    sentence = `${head}: ${size} under — more than recovery leaves behind (up to ${formatPercent(shortfallPct)}), so the system was short of refrigerant: look for a leak.`;
  } else if (deltaG === 0) {
    sentence = `${head}: exactly the label charge.`;
  } else {
    const side = deltaG > 0 ? "over" : "under";
    sentence = `${head}: ${size} ${side} — within what recovery leaves behind and the machine's accuracy, so not evidence of a leak or an overcharge.`;
  }
  return {
    deltaG,
    deltaPct,
    verdict,
    allowedShortfallG,
    allowedExcessG,
    sentence,
    sources: [SERVICE_SOURCES.j2788Recovery, SERVICE_SOURCES.j2843Recovery, tolerance.source],
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
  const target = formatGrams(input.targetG);
  const off = deltaG === 0 ? "on target" : `${formatGrams(deltaG)} ${deltaG > 0 ? "over" : "under"}`;
  const sentence = `Charged ${formatGrams(input.chargedG)} against ${indefiniteArticle(target)} ${target} target: ${off}, ${
    within ? "inside" : "outside"
  } the ±${formatGrams(toleranceG)} a recharge machine must hold.${within ? "" : " Recover and recharge by weight."}`;
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
  const toleranceG = chargeTolerance(input.refrigerant ?? "R-134a").toleranceG;
  const warnings: string[] = [];
  const { labelChargeG, specChargeG, revisedChargeG } = input;
  for (const [name, v] of Object.entries({ labelChargeG, specChargeG, revisedChargeG })) {
    if (v != null) assertMass(name, v, false);
  }
  if (labelChargeG != null && specChargeG != null && Math.abs(labelChargeG - specChargeG) > toleranceG) {
    warnings.push(
      `The label says ${formatGrams(labelChargeG)} but the spec table says ${formatGrams(specChargeG)}: check the variant (rear A/C?) and the label before charging.`,
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
