import { type BarometricSource, barometricKpa, STANDARD_ATMOSPHERE_KPA } from "./barometric";
import { KPA_PER_UNIT } from "./factors";
import { groupThousands } from "./group";

// Saying a stored vacuum in the reader's unit: what every screen needs (lib/units/quantity.ts). Reading
// a typed one is vacuum.ts, which the screens that take a vacuum load.

/**
 * A vacuum reading as the technician's gauge shows it: inches of mercury below the local atmosphere
 * (an analogue compound gauge), kPa or mbar absolute (an electronic gauge), or microns of mercury
 * absolute (a micron gauge). Stored as kPa absolute.
 */
export type VacuumUnit = "inHg" | "kPa" | "mbar" | "micron";

/**
 * kPa per unit. 1 mbar = 0.1 kPa; 1 micron of mercury = 1 millitorr, a standard atmosphere over 760 000 (NIST SP 811,
 * appendix B: 1 torr = 101 325/760 Pa); inHg is the conventional inch of mercury (factors.ts).
 */
export const KPA_PER_VACUUM_UNIT: Readonly<Record<VacuumUnit, number>> = {
  inHg: KPA_PER_UNIT.inHg,
  kPa: 1,
  mbar: 0.1,
  micron: STANDARD_ATMOSPHERE_KPA / 760_000,
};

export function round(value: number, decimals: number): number {
  const f = 10 ** decimals;
  return Math.round(value * f) / f;
}

const LABEL: Record<VacuumUnit, string> = {
  inHg: "inHg vacuum",
  kPa: "kPa abs",
  mbar: "mbar abs",
  micron: "microns",
};

/** Below about 2000 microns an inHg dial no longer tells readings apart; a micron gauge does (common practice). */
export const MICRON_RANGE_KPA_ABS = 2000 * KPA_PER_VACUUM_UNIT.micron;

/** The number of a vacuum in a unit; inHg is the depth below the local atmosphere, never a pressure above zero. */
export function vacuumFromKpaAbs(kpaAbs: number, unit: VacuumUnit, at?: BarometricSource): number {
  if (unit === "inHg") return Math.max(0, barometricKpa(at) - kpaAbs) / KPA_PER_UNIT.inHg;
  return kpaAbs / KPA_PER_VACUUM_UNIT[unit];
}

const DECIMALS: Record<VacuumUnit, number> = { inHg: 2, kPa: 2, mbar: 1, micron: 0 };

/**
 * A stored vacuum in the reader's unit: "29.92 inHg vacuum", "0.27 kPa abs", "500 microns". A deep
 * vacuum an inHg dial cannot resolve is said in microns too, so 500 and 1000 microns never read alike.
 */
export function formatVacuum(kpaAbs: number, unit: VacuumUnit, at?: BarometricSource): string {
  const text = (u: VacuumUnit) =>
    `${groupThousands(String(round(vacuumFromKpaAbs(kpaAbs, u, at), DECIMALS[u])))} ${LABEL[u]}`;
  if (unit !== "micron" && kpaAbs < MICRON_RANGE_KPA_ABS) return `${text(unit)} (${text("micron")})`;
  return text(unit);
}
