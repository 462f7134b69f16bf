import { create, createUnitDependencies, unitDependencies } from "mathjs";

export type PressureUnit = "kPa" | "bar" | "MPa" | "psi" | "inHg";
export type TemperatureUnit = "C" | "F" | "K";
export type MassUnit = "g" | "kg" | "oz" | "lb";
export type VolumeUnit = "mL" | "floz";

// A private mathjs instance, so defining inHg never touches anyone else's.
const math = create({ createUnitDependencies: createUnitDependencies!, unitDependencies: unitDependencies! });
// Inch of mercury, conventional: 3.386389 kPa (NIST SP 811, appendix B.8).
math.createUnit("inHg", "3.386389 kPa");

const factor = (from: string, to: string) => math.unit(1, from).toNumber(to);

/** Conversion factors worked out once with mathjs units; the hot path multiplies plain numbers. */
export const KPA_PER_UNIT: Readonly<Record<PressureUnit, number>> = {
  kPa: 1,
  bar: factor("bar", "kPa"),
  MPa: factor("MPa", "kPa"),
  psi: factor("psi", "kPa"),
  inHg: factor("inHg", "kPa"),
};

export const GRAMS_PER_UNIT: Readonly<Record<MassUnit, number>> = {
  g: 1,
  kg: factor("kg", "g"),
  oz: factor("oz", "g"),
  lb: factor("lb", "g"),
};

/** US fluid ounce. */
export const MILLILITRES_PER_UNIT: Readonly<Record<VolumeUnit, number>> = {
  mL: 1,
  floz: factor("floz", "mL"),
};

const MATHJS_TEMPERATURE: Record<TemperatureUnit, string> = { C: "degC", F: "degF", K: "K" };

/** °C = scale · value + offset */
export const TEMPERATURE_TO_C: Readonly<Record<TemperatureUnit, { scale: number; offset: number }>> =
  Object.fromEntries(
    (Object.keys(MATHJS_TEMPERATURE) as TemperatureUnit[]).map((u) => {
      const offset = math.unit(0, MATHJS_TEMPERATURE[u]).toNumber("degC");
      const scale = math.unit(1, MATHJS_TEMPERATURE[u]).toNumber("degC") - offset;
      return [u, { scale, offset }];
    }),
  ) as Record<TemperatureUnit, { scale: number; offset: number }>;

/** Kelvin per unit of temperature difference (no offset). */
export const KELVIN_PER_DIFFERENCE_UNIT: Readonly<Record<"K" | "F", number>> = {
  K: 1,
  F: TEMPERATURE_TO_C.F.scale,
};
