import { create, createUnitDependencies, unitDependencies } from "mathjs";
import type { MassUnit, PressureUnit, TemperatureUnit, UnitFactors, VolumeUnit } from "./factors";

/**
 * The conversion factors, worked out with mathjs units. mathjs is the source of truth; the numbers
 * it produces are written into factors.ts so the browser does not download mathjs (about 90 kB
 * gzip) to multiply by constants. factors.test.ts holds the two equal, digit for digit.
 */
export function factorsFromMathjs(): UnitFactors {
  // A private mathjs instance, so defining inHg never touches anyone else's.
  const math = create({
    createUnitDependencies: createUnitDependencies!,
    unitDependencies: unitDependencies!,
  });
  // Inch of mercury, conventional: 3.386389 kPa (NIST SP 811, appendix B.8).
  math.createUnit("inHg", "3.386389 kPa");
  const factor = (from: string, to: string) => math.unit(1, from).toNumber(to);

  const pressure: Record<PressureUnit, number> = {
    kPa: 1,
    bar: factor("bar", "kPa"),
    MPa: factor("MPa", "kPa"),
    psi: factor("psi", "kPa"),
    inHg: factor("inHg", "kPa"),
  };
  const mass: Record<MassUnit, number> = {
    g: 1,
    kg: factor("kg", "g"),
    oz: factor("oz", "g"),
    lb: factor("lb", "g"),
  };
  // US fluid ounce.
  const volume: Record<VolumeUnit, number> = { mL: 1, floz: factor("floz", "mL") };
  const mathjsTemperature: Record<TemperatureUnit, string> = { C: "degC", F: "degF", K: "K" };
  const temperature = Object.fromEntries(
    (Object.keys(mathjsTemperature) as TemperatureUnit[]).map((u) => {
      const offset = math.unit(0, mathjsTemperature[u]).toNumber("degC");
      const scale = math.unit(1, mathjsTemperature[u]).toNumber("degC") - offset;
      return [u, { scale, offset }];
    }),
  ) as Record<TemperatureUnit, { scale: number; offset: number }>;
  return {
    KPA_PER_UNIT: pressure,
    GRAMS_PER_UNIT: mass,
    MILLILITRES_PER_UNIT: volume,
    TEMPERATURE_TO_C: temperature,
    KELVIN_PER_DIFFERENCE_UNIT: { K: 1, F: temperature.F.scale },
  };
}
