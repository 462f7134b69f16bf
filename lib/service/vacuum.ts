import {
  type BarometricSource,
  barometricKpa,
  pressureFromKpa,
  pressureToKpa,
  vacuumInHgToKpaAbs,
} from "@/lib/units";
import { formatNumber } from "./format";
import { SERVICE_SOURCES } from "./sources";
import { waterSaturationKpaAbs } from "./water-boiling";

const SEA_LEVEL_KPA = 101.325;
/** US Army TM 5-3805-296-23-4 WP 0248: 28–29 inHg vacuum at sea level. */
export const SEA_LEVEL_TARGET_VACUUM_INHG = { minimum: 28, preferred: 29 } as const;

/** altitude and/or the shop's barometer reading; a measured barometer wins */
export type Altitude = BarometricSource;

export interface EvacuationTarget {
  barometricKpa: number;
  /** the evacuation has reached its target at or below this absolute pressure */
  maxKpaAbs: number;
  preferredKpaAbs: number;
  /** what a vacuum gauge reads at that target here (inHg below the local atmosphere) */
  minimumVacuumInHg: number;
  preferredVacuumInHg: number;
  sources: string[];
}

/**
 * The sea-level target is an absolute pressure in disguise: 28 inHg below 29.92 inHg.
 * Keeping that absolute pressure at altitude reproduces the manual's allowance of roughly one
 * inch of mercury for every 1000 ft of altitude from the standard atmosphere, not a fixed rule.
 */
export function evacuationTarget(at: Altitude = {}): EvacuationTarget {
  const localKpa = barometricKpa(at);
  const maxKpaAbs = SEA_LEVEL_KPA - pressureToKpa(SEA_LEVEL_TARGET_VACUUM_INHG.minimum, "inHg");
  const preferredKpaAbs = SEA_LEVEL_KPA - pressureToKpa(SEA_LEVEL_TARGET_VACUUM_INHG.preferred, "inHg");
  return {
    barometricKpa: localKpa,
    maxKpaAbs,
    preferredKpaAbs,
    minimumVacuumInHg: pressureFromKpa(localKpa - maxKpaAbs, "inHg"),
    preferredVacuumInHg: pressureFromKpa(localKpa - preferredKpaAbs, "inHg"),
    sources: [
      SERVICE_SOURCES.vacuumTarget,
      SERVICE_SOURCES.standardAtmosphere,
      SERVICE_SOURCES.inchOfMercury,
    ],
  };
}

export interface EvacuationCheck {
  reached: boolean;
  /** null when no ambient temperature was given */
  waterBoils: boolean | null;
  waterBoilsBelowKpaAbs: number | null;
  messages: string[];
  sources: string[];
}

/** Deepest vacuum reached against the target, and whether moisture can boil off at it. */
export function evaluateEvacuation(
  input: { deepestKpaAbs: number; ambientC?: number } & Altitude,
): EvacuationCheck {
  const { deepestKpaAbs } = input;
  if (!Number.isFinite(deepestKpaAbs) || deepestKpaAbs < 0)
    throw new RangeError("deepestKpaAbs must be a non-negative absolute pressure");
  const target = evacuationTarget(input);
  const reached = deepestKpaAbs <= target.maxKpaAbs;
  const messages: string[] = [];
  const reachedInHg = formatNumber(pressureFromKpa(target.barometricKpa - deepestKpaAbs, "inHg"));
  messages.push(
    reached
      ? `Reached ${reachedInHg} inHg of vacuum (${formatNumber(deepestKpaAbs, 2)} kPa absolute): at or past the target of ${formatNumber(target.minimumVacuumInHg)} inHg here.`
      : `Reached only ${reachedInHg} inHg of vacuum (${formatNumber(deepestKpaAbs, 2)} kPa absolute); the target here is ${formatNumber(target.minimumVacuumInHg)} inHg. Keep evacuating; if it will not go deeper, look for a leak or a tired pump.`,
  );
  let waterBoils: boolean | null = null;
  let waterBoilsBelowKpaAbs: number | null = null;
  const sources = [...target.sources];
  if (input.ambientC !== undefined) {
    waterBoilsBelowKpaAbs = waterSaturationKpaAbs(input.ambientC);
    waterBoils = deepestKpaAbs < waterBoilsBelowKpaAbs;
    sources.push(SERVICE_SOURCES.waterBoiling);
    if (!waterBoils) {
      messages.push(
        `At ${formatNumber(input.ambientC)} °C water only boils below ${formatNumber(waterBoilsBelowKpaAbs, 2)} kPa absolute: moisture will not leave at this vacuum. Go deeper, or warm the system and evacuate longer.`,
      );
    }
  }
  return { reached, waterBoils, waterBoilsBelowKpaAbs, messages, sources };
}

export interface HoldLimit {
  riseKpa: number;
  perMinutes: number;
}

/** TM 5-2420-230-24-1 / TM 5-3805-296-23-4 field practice: no more than 2 inHg lost in 5 minutes. */
export const DEFAULT_HOLD_LIMIT: HoldLimit = { riseKpa: pressureToKpa(2, "inHg"), perMinutes: 5 };

export interface VacuumHoldResult {
  verdict: "pass" | "fail";
  riseKpa: number;
  allowedRiseKpa: number;
  riseKpaPerMin: number;
  message: string;
  warnings: string[];
  sources: string[];
}

/** Compare the rise over the hold with the shop's limit, scaled to the hold's length. */
export function vacuumHoldTest(input: {
  startKpaAbs: number;
  endKpaAbs: number;
  minutes: number;
  limit?: HoldLimit;
}): VacuumHoldResult {
  const { startKpaAbs, endKpaAbs, minutes } = input;
  const limit = input.limit ?? DEFAULT_HOLD_LIMIT;
  if (![startKpaAbs, endKpaAbs].every((p) => Number.isFinite(p) && p >= 0))
    throw new RangeError("hold pressures must be non-negative kPa absolute");
  if (!(Number.isFinite(minutes) && minutes > 0))
    throw new RangeError("the hold must last a positive number of minutes");
  if (!(limit.riseKpa >= 0 && limit.perMinutes > 0))
    throw new RangeError("the hold limit must be a non-negative rise over a positive time");

  const riseKpa = endKpaAbs - startKpaAbs;
  const allowedRiseKpa = (limit.riseKpa * minutes) / limit.perMinutes;
  const verdict = riseKpa <= allowedRiseKpa ? "pass" : "fail";
  const limitText = `${formatNumber(pressureFromKpa(limit.riseKpa, "inHg"))} inHg in ${formatNumber(limit.perMinutes)} min`;
  const riseText = `${formatNumber(Math.max(riseKpa, 0), 2)} kPa (${formatNumber(pressureFromKpa(Math.max(riseKpa, 0), "inHg"), 2)} inHg) in ${formatNumber(minutes)} min`;
  const message =
    verdict === "pass"
      ? `Vacuum rose ${riseText}, within the shop's limit of ${limitText}: the system holds.`
      : `Vacuum rose ${riseText}, faster than the shop's limit of ${limitText}: a leak or moisture boiling off. Find the leak with a detector (a vacuum does not locate leaks) or evacuate longer if moisture is suspected, then repeat the hold.`;
  const warnings: string[] = [];
  if (minutes < limit.perMinutes)
    warnings.push(
      `The hold lasted less than ${formatNumber(limit.perMinutes)} min; a short hold can hide a slow leak.`,
    );
  if (riseKpa < 0)
    warnings.push(
      "The vacuum deepened during the hold: check that the pump was isolated and the gauge had settled.",
    );
  return {
    verdict,
    riseKpa,
    allowedRiseKpa,
    riseKpaPerMin: riseKpa / minutes,
    message,
    warnings,
    sources: [SERVICE_SOURCES.vacuumHold, SERVICE_SOURCES.inchOfMercury],
  };
}

/** The same hold test from gauge readings in inHg of vacuum, as most gauges show it. */
export function vacuumHoldFromGauge(
  input: { startVacuumInHg: number; endVacuumInHg: number; minutes: number; limit?: HoldLimit } & Altitude,
): VacuumHoldResult {
  const at = { barometricKpa: barometricKpa(input) };
  const [startKpaAbs, endKpaAbs] = [input.startVacuumInHg, input.endVacuumInHg].map((inHg) => {
    const kpaAbs = vacuumInHgToKpaAbs(inHg, at);
    if (kpaAbs < 0) {
      throw new RangeError(
        `${formatNumber(inHg)} inHg is deeper than a perfect vacuum where the atmosphere is ${formatNumber(pressureFromKpa(at.barometricKpa, "inHg"))} inHg: check the gauge's zero and the shop's altitude.`,
      );
    }
    return kpaAbs;
  }) as [number, number];
  return vacuumHoldTest({
    startKpaAbs,
    endKpaAbs,
    minutes: input.minutes,
    limit: input.limit,
  });
}
