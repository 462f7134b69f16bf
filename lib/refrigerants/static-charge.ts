import { gaugeToAbsoluteKpa } from "@/lib/units/barometric";
import type { RefrigerantId } from "./catalog";
import { staticCheck } from "./derived";

/*
 * The one home of the "empty system" test on an engine-off (static) reading. The interview routes an
 * empty system to the leak search with it and shows the do-not-run caution by it; the findings engine's
 * do-not-run rule is to call the same predicate (or move its own test here), so that the screens, the
 * findings and the server can never disagree about whether a system may be run.
 */

/**
 * At or below this the gauge reads about zero: nothing is left to recover or identify, whatever the
 * tables say. 7 kPa (about 1 psi) allows for a service gauge's resolution (common practice).
 */
export const EMPTY_STATIC_MAX_KPA_GAUGE = 7;

/**
 * Next to nothing left, as the findings engine grades a static reading "empty": under about 70 kPa gauge
 * (10 psig), or under half the saturation pressure at the temperature the parts soaked to; either
 * condition (common practice). The 70 kPa line holds even where the tables end (R-744 near its critical
 * point). A system this empty also reads "no charge" above, except where the air is far below freezing.
 */
export const NEARLY_EMPTY_STATIC = { belowKpaGauge: 70, belowFractionOfSaturation: 0.5 } as const;

/** A static reading as the findings engine's input carries it, so the engine can pass its own input. */
export interface StaticReading {
  refrigerant: RefrigerantId;
  /** absent until the static reading is taken: then nothing can be said */
  staticKpaGauge?: number;
  /** °C; without it only the gauge-zero test can be made */
  ambientC?: number;
  /** the shop's or the case's altitude, m; sea level when absent */
  altitudeM?: number;
}

/**
 * The system holds no liquid charge: the static gauge reads about zero, or the pressure is too far below
 * saturation at ambient for any liquid to remain (staticCheck's no-liquid line). Such a system must not
 * be run: the compressor's oil travels with the refrigerant (common practice).
 */
export function staticShowsNoCharge(reading: StaticReading): boolean {
  if (reading.staticKpaGauge === undefined) return false;
  if (reading.staticKpaGauge <= EMPTY_STATIC_MAX_KPA_GAUGE) return true;
  if (reading.ambientC === undefined) return false;
  try {
    const staticKpaAbs = gaugeToAbsoluteKpa(
      reading.staticKpaGauge,
      reading.altitudeM === undefined ? undefined : { altitudeM: reading.altitudeM },
    );
    return (
      staticCheck({ refrigerant: reading.refrigerant, staticKpaAbs, ambientC: reading.ambientC }).kind ===
      "no_liquid"
    );
  } catch {
    // Outside what the tables (or the altitude formula) cover: the reading cannot tell us the system is empty.
    return false;
  }
}

/** Some refrigerant is still in the system (the gauge reads above about zero), so it is identified and recovered. */
export function staticPressureLeft(reading: Pick<StaticReading, "staticKpaGauge">): boolean {
  return reading.staticKpaGauge !== undefined && reading.staticKpaGauge > EMPTY_STATIC_MAX_KPA_GAUGE;
}
