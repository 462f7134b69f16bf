import { staticShowsNoCharge } from "@/lib/refrigerants/static-charge";
import { chargeDeviationVerdict } from "@/lib/service/charge-verdict";
import { standardBarometricKpa } from "@/lib/units/barometric";
import { DO_NOT_RUN, STATIC_CHECK, STATIC_EMPTY, SUBCOOLING_K } from "./grading";
import { saturationPressureOrNull, saturationTemperatureOrNull } from "@/lib/refrigerants/saturation-guard";
import type { DiagnosisInput } from "./schema";

/**
 * Why the system must not be run. Running a compressor without its charge starves it of oil and pulls
 * air and moisture in through a low-side leak (common practice); an electric compressor must never be
 * energised without charge or in vacuum (from memory); the EU forbids refilling after an abnormal leak
 * until it is repaired (Directive 2006/40/EC Art. 7).
 */
export type DoNotRunReason =
  /** the static pressure is below saturation: no liquid is left */
  | "no_liquid"
  /** the charge was recovered and has not been put back */
  | "recovered_not_recharged"
  /** a leak was found and the charge is short */
  | "leak_with_short_charge"
  /** an electric compressor whose static reading is missing or cannot be judged */
  | "electric_static_unknown"
  /** an electric compressor whose static reading is below saturation */
  | "electric_static_low";

export interface DoNotRun {
  active: boolean;
  reasons: DoNotRunReason[];
}

/** A mass charged back counts as a recharge from half the label up (judgement: a partial charge is not one). */
export function recharged(input: Pick<DiagnosisInput, "chargedG" | "labelChargeG">): boolean {
  const { chargedG, labelChargeG } = input;
  // Stryker disable next-line ConditionalExpression: equivalent, !(undefined > 0) also returns false
  if (chargedG === undefined || !(chargedG > 0)) return false;
  return labelChargeG === undefined || chargedG >= labelChargeG * DO_NOT_RUN.rechargedFromFractionOfLabel;
}

export interface StaticDeficits {
  /** K below saturation at the air temperature (negative: above); Infinity when empty; null when not judged */
  airK: number | null;
  /** the same at the parts' measured soak temperature */
  soakK: number | null;
}

function deficitAt(
  input: DiagnosisInput,
  staticKpaAbs: number,
  barometricKpa: number,
  tempC: number,
): number | null {
  if (tempC < STATIC_CHECK.minReferenceC) return null;
  const saturationKpaAbs = saturationPressureOrNull(input.refrigerant, tempC);
  const emptyBelowKpaAbs = Math.max(
    STATIC_EMPTY.belowKpaGauge + barometricKpa,
    (saturationKpaAbs ?? 0) * STATIC_EMPTY.belowFractionOfSaturation,
  );
  if (staticKpaAbs < emptyBelowKpaAbs) return Infinity;
  if (saturationKpaAbs === null) return null;
  const staticSaturationC = saturationTemperatureOrNull(input.refrigerant, staticKpaAbs);
  return staticSaturationC === null ? null : tempC - staticSaturationC;
}

/**
 * How far the static reading sits below saturation at the air temperature and at the parts' soak
 * temperature. The do-not-run rule takes the worse of the two, so a temperature entered later can never
 * make an empty system look full; a deficit at the air temperature alone asks for a longer soak instead.
 */
export function staticDeficits(input: DiagnosisInput): StaticDeficits | null {
  if (input.staticKpaGauge === undefined) return null;
  const barometricKpa = standardBarometricKpa(input.altitudeM ?? 0);
  const staticKpaAbs = input.staticKpaGauge + barometricKpa;
  return {
    airK: deficitAt(input, staticKpaAbs, barometricKpa, input.ambientC),
    soakK:
      input.staticSoakC === undefined
        ? null
        : deficitAt(input, staticKpaAbs, barometricKpa, input.staticSoakC),
  };
}

function worstDeficitK(deficits: StaticDeficits | null): number | null {
  if (deficits === null) return null;
  const known = [deficits.airK, deficits.soakK].filter((d): d is number => d !== null);
  return known.length === 0 ? null : Math.max(...known);
}

function subcoolingNone(input: DiagnosisInput, barometricKpa: number): boolean {
  // Stryker disable next-line ConditionalExpression,LogicalOperator: equivalent, a missing reading gives NaN and false below
  if (input.highKpaGauge === undefined || input.liquidLineC === undefined) return false;
  const condensingC = saturationTemperatureOrNull(input.refrigerant, input.highKpaGauge + barometricKpa);
  return condensingC !== null && condensingC - input.liquidLineC <= SUBCOOLING_K[input.expansionDevice].none;
}

function recoveredShort(input: DiagnosisInput): boolean {
  if (input.labelChargeG === undefined || input.recoveredChargeG === undefined) return false;
  const { grade } = chargeDeviationVerdict({
    labelChargeG: input.labelChargeG,
    recoveredChargeG: input.recoveredChargeG,
    refrigerant: input.refrigerant,
  });
  return grade !== "within" && grade !== "over" && grade !== "well_over";
}

/**
 * The "do not run" state: no next check may run the system, and the next step is the repair path.
 * One rule for the findings, the interview and the server. Only a recharge lifts it once it holds,
 * except that a static reading showing liquid is what an electric compressor waits for.
 */
export function doNotRunState(input: DiagnosisInput): DoNotRun {
  if (recharged(input)) return { active: false, reasons: [] };
  const barometricKpa = standardBarometricKpa(input.altitudeM ?? 0);
  const reasons: DoNotRunReason[] = [];
  const deficitK = worstDeficitK(staticDeficits(input));
  // The shared empty-system test (the interview's branch) as well as the deficit at the soak temperature:
  // they draw the same line at the air temperature, and the shared one also reads a gauge at zero in the cold.
  const noLiquid =
    // Stryker disable next-line ConditionalExpression: equivalent, null > 5 is false
    (deficitK !== null && deficitK > STATIC_CHECK.noLiquidBelowK) ||
    staticShowsNoCharge({
      refrigerant: input.refrigerant,
      staticKpaGauge: input.staticKpaGauge,
      ambientC: input.ambientC,
      altitudeM: input.altitudeM,
    });
  if (noLiquid) reasons.push("no_liquid");
  if (input.recoveredChargeG !== undefined) reasons.push("recovered_not_recharged");
  // Stryker disable next-line ArrayDeclaration: equivalent, any other default still has no "leak_found"
  const symptoms = input.symptoms ?? [];
  if (
    symptoms.includes("leak_found") &&
    (noLiquid ||
      recoveredShort(input) ||
      symptoms.includes("bubbles_in_sight_glass") ||
      subcoolingNone(input, barometricKpa))
  ) {
    reasons.push("leak_with_short_charge");
  }
  if (input.compressorType === "electric") {
    if (deficitK === null) reasons.push("electric_static_unknown");
    else if (deficitK > DO_NOT_RUN.electricStaticBelowK) reasons.push("electric_static_low");
  }
  return { active: reasons.length > 0, reasons };
}
