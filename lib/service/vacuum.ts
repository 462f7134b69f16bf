import {
  type BarometricSource,
  barometricKpa,
  pressureFromKpa,
  pressureToKpa,
  vacuumInHgToKpaAbs,
} from "@/lib/units";
import { formatNumber, sayCelsius, sayVacuum, sayVacuumChange } from "./format";
import { SERVICE_SOURCES } from "./sources";
import { waterSaturationKpaAbs } from "./water-boiling";

/** The shop's temperature when none is entered: a heated workshop (common practice). */
export const DEFAULT_SHOP_C = 20;
/** The deeper target a micron gauge can prove: 500 microns of mercury (stationary-HVAC practice, common practice). */
export const MICRON_GAUGE_TARGET_MICRONS = 500;
// 1 micron of mercury = 1/1000 mmHg = 0.000133322 kPa (NIST SP 811 App. B: 1 mmHg = 133.3224 Pa).
const KPA_PER_MICRON = 0.0001333224;

/** altitude and/or the shop's barometer reading; a measured barometer wins */
export type Altitude = BarometricSource;

export interface EvacuationTarget {
  barometricKpa: number;
  /** the evacuation has reached its target only below this absolute pressure */
  maxKpaAbs: number;
  /** the deeper target a micron gauge can show */
  preferredKpaAbs: number;
  /** what a vacuum gauge reads at that target here (inHg below the local atmosphere) */
  minimumVacuumInHg: number;
  preferredVacuumInHg: number;
  /** the temperature the water-boiling target is for */
  shopC: number;
  sources: string[];
}

/**
 * Evacuation exists to boil moisture out, so the target is an absolute pressure: below water's
 * saturation pressure at the shop's temperature (2.34 kPa at 20 °C), not a fixed gauge reading — 28 inHg
 * at sea level is about 6.5 kPa absolute, where water does not boil until 37 °C. With a micron gauge the
 * target is the deeper 500 microns.
 */
export function evacuationTarget(
  at: Altitude & { shopC?: number; micronGauge?: boolean } = {},
): EvacuationTarget {
  const localKpa = barometricKpa(at);
  const shopC = at.shopC ?? DEFAULT_SHOP_C;
  const waterBoilsBelowKpaAbs = waterSaturationKpaAbs(shopC);
  const preferredKpaAbs = MICRON_GAUGE_TARGET_MICRONS * KPA_PER_MICRON;
  const maxKpaAbs = at.micronGauge ? preferredKpaAbs : waterBoilsBelowKpaAbs;
  return {
    barometricKpa: localKpa,
    maxKpaAbs,
    preferredKpaAbs,
    minimumVacuumInHg: pressureFromKpa(localKpa - maxKpaAbs, "inHg"),
    preferredVacuumInHg: pressureFromKpa(localKpa - preferredKpaAbs, "inHg"),
    shopC,
    sources: [
      SERVICE_SOURCES.waterBoiling,
      "target below water's saturation pressure at the shop's temperature, 20 °C when none is entered (common practice); 500 microns with a micron gauge (common practice)",
      SERVICE_SOURCES.standardAtmosphere,
      SERVICE_SOURCES.inchOfMercury,
    ],
  };
}

export interface EvacuationCheck {
  reached: boolean;
  waterBoils: boolean;
  waterBoilsBelowKpaAbs: number;
  messages: string[];
  sources: string[];
}

/** Deepest vacuum reached against the target: reached only where moisture can boil off. */
export function evaluateEvacuation(
  input: { deepestKpaAbs: number; ambientC?: number; micronGauge?: boolean } & Altitude,
): EvacuationCheck {
  const { deepestKpaAbs } = input;
  if (!Number.isFinite(deepestKpaAbs) || deepestKpaAbs < 0)
    throw new RangeError("deepestKpaAbs must be a non-negative absolute pressure");
  const target = evacuationTarget({ ...input, shopC: input.ambientC });
  const waterBoilsBelowKpaAbs = waterSaturationKpaAbs(target.shopC);
  const waterBoils = deepestKpaAbs < waterBoilsBelowKpaAbs;
  const reached = deepestKpaAbs < target.maxKpaAbs;
  // Said as the reader's vacuum gauge shows it (inHg below the local atmosphere, microns, kPa or mbar
  // absolute): the screen passes the shop's altitude with the reader's units.
  const reachedText = sayVacuum(deepestKpaAbs);
  const where = `at ${sayCelsius(target.shopC)} water boils below ${sayVacuum(waterBoilsBelowKpaAbs)}`;
  const messages: string[] = [];
  if (reached) {
    messages.push(
      input.micronGauge
        ? `Reached ${reachedText}: below the ${MICRON_GAUGE_TARGET_MICRONS}-micron target, so moisture can boil off.`
        : `Reached ${reachedText}: ${where}, so moisture can boil off.`,
    );
  } else {
    messages.push(
      input.micronGauge && waterBoils
        ? `Reached ${reachedText}: moisture can boil off, but the micron gauge's target is ${sayVacuum(target.maxKpaAbs)}. Keep evacuating.`
        : `Reached only ${reachedText}; ${where}. Keep evacuating; if it will not go deeper, look for a leak or a tired pump.`,
    );
  }
  return { reached, waterBoils, waterBoilsBelowKpaAbs, messages, sources: target.sources };
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
  const limitText = `${sayVacuumChange(limit.riseKpa)} in ${formatNumber(limit.perMinutes)} min`;
  const riseText = `${sayVacuumChange(Math.max(riseKpa, 0))} in ${formatNumber(minutes)} min`;
  const message =
    verdict === "pass"
      ? `Vacuum rose ${riseText}, within the shop's limit of ${limitText}: no gross leak. A vacuum hold cannot prove a small leak: leak-test under pressure after charging.`
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
