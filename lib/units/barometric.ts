import { KPA_PER_UNIT } from "./factors";

export interface BarometricSource {
  altitudeM?: number;
  /** A measured barometric pressure wins over the altitude estimate. */
  barometricKpa?: number;
}

/** One standard atmosphere, kPa: the barometric pressure at sea level (ISO 2533 standard atmosphere). */
export const STANDARD_ATMOSPHERE_KPA = 101.325;

// The standard-atmosphere formula is meant for the troposphere; shops sit well inside these bounds.
const ALTITUDE_RANGE_M = { min: -500, max: 9000 } as const;

/**
 * Standard-atmosphere barometric pressure, kPa (US Standard Atmosphere 1976; ASHRAE Handbook—Fundamentals
 * 2017 ch. 1 eq. 3): p = 101.325 · (1 − 2.25577·10⁻⁵ · Z)^5.2559, Z in metres. Written out here rather
 * than taken from psychrolib, which computes the same expression, so that the interview's screen does
 * not carry the whole psychrometric library for one line (barometric.test.ts compares the two).
 */
export function standardBarometricKpa(altitudeM: number): number {
  if (!(altitudeM >= ALTITUDE_RANGE_M.min && altitudeM <= ALTITUDE_RANGE_M.max)) {
    throw new RangeError(`Altitude must be between ${ALTITUDE_RANGE_M.min} and ${ALTITUDE_RANGE_M.max} m.`);
  }
  return (101325 * Math.pow(1 - 2.25577e-5 * altitudeM, 5.2559)) / 1000;
}

export function barometricKpa(at?: BarometricSource): number {
  if (at?.barometricKpa !== undefined) {
    if (!(at.barometricKpa > 0) || !Number.isFinite(at.barometricKpa))
      throw new RangeError("Barometric pressure must be a positive number.");
    return at.barometricKpa;
  }
  return standardBarometricKpa(at?.altitudeM ?? 0);
}

export function gaugeToAbsoluteKpa(gaugeKpa: number, at?: BarometricSource): number {
  return gaugeKpa + barometricKpa(at);
}

export function absoluteToGaugeKpa(absKpa: number, at?: BarometricSource): number {
  return absKpa - barometricKpa(at);
}

/** A vacuum gauge reads inches of mercury below the local atmosphere. */
export function vacuumInHgToKpaAbs(inHgVacuum: number, at?: BarometricSource): number {
  return barometricKpa(at) - inHgVacuum * KPA_PER_UNIT.inHg;
}

export function kpaAbsToVacuumInHg(absKpa: number, at?: BarometricSource): number {
  return (barometricKpa(at) - absKpa) / KPA_PER_UNIT.inHg;
}
