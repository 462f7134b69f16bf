export type PressureUnit = "kPa" | "bar" | "MPa" | "psi" | "inHg";
export type TemperatureUnit = "C" | "F" | "K";
export type MassUnit = "g" | "kg" | "oz" | "lb";
export type VolumeUnit = "mL" | "floz";

export interface UnitFactors {
  KPA_PER_UNIT: Readonly<Record<PressureUnit, number>>;
  GRAMS_PER_UNIT: Readonly<Record<MassUnit, number>>;
  MILLILITRES_PER_UNIT: Readonly<Record<VolumeUnit, number>>;
  /** °C = scale · value + offset */
  TEMPERATURE_TO_C: Readonly<Record<TemperatureUnit, { scale: number; offset: number }>>;
  /** Kelvin per unit of temperature difference (no offset). */
  KELVIN_PER_DIFFERENCE_UNIT: Readonly<Record<"K" | "F", number>>;
}

// The numbers mathjs gives (mathjs-factors.ts), kept as constants so the browser need not load mathjs;
// factors.test.ts fails if the two ever differ. The hot path multiplies plain numbers.
export const KPA_PER_UNIT: UnitFactors["KPA_PER_UNIT"] = {
  kPa: 1,
  bar: 100,
  MPa: 1000,
  psi: 6.89475729276459,
  inHg: 3.386389,
};
export const GRAMS_PER_UNIT: UnitFactors["GRAMS_PER_UNIT"] = {
  g: 1,
  kg: 1000,
  oz: 28.349523125,
  lb: 453.59237,
};
/** US fluid ounce. */
export const MILLILITRES_PER_UNIT: UnitFactors["MILLILITRES_PER_UNIT"] = { mL: 1, floz: 29.573529562500003 };
export const TEMPERATURE_TO_C: UnitFactors["TEMPERATURE_TO_C"] = {
  C: { scale: 1, offset: 0 },
  F: { scale: 0.5555555555555571, offset: -17.77777777777778 },
  K: { scale: 1, offset: -273.15 },
};
export const KELVIN_PER_DIFFERENCE_UNIT: UnitFactors["KELVIN_PER_DIFFERENCE_UNIT"] = {
  K: 1,
  F: TEMPERATURE_TO_C.F.scale,
};
