import { refrigerantInfo, type RefrigerantId } from "./catalog";
import { SaturationRangeError } from "./range-error";
import { saturationPressure, saturationTemperature } from "./saturation";

// Range checks before calling the saturation functions: out-of-table readings are routine (R-744 high
// sides, deep vacuum), and building an exception for each one is slow on every keystroke and in the
// findings engine's loops.
const LIMITS = new Map<
  RefrigerantId,
  { minTempC: number; maxTempC: number; minKpaAbs: number; maxKpaAbs: number }
>();

function limitsOf(refrigerant: RefrigerantId) {
  let limits = LIMITS.get(refrigerant);
  if (!limits) {
    const info = refrigerantInfo(refrigerant);
    limits = {
      minTempC: info.minTempC,
      maxTempC: info.maxTempC,
      minKpaAbs: saturationPressure(refrigerant, info.minTempC),
      maxKpaAbs: saturationPressure(refrigerant, info.maxTempC),
    };
    LIMITS.set(refrigerant, limits);
  }
  return limits;
}

export function tempInTable(refrigerant: RefrigerantId, tempC: number): boolean {
  const limits = limitsOf(refrigerant);
  return tempC >= limits.minTempC && tempC <= limits.maxTempC;
}

/** Saturation temperature, °C, or null outside the table. */
export function saturationTemperatureOrNull(
  refrigerant: RefrigerantId,
  pressureKpaAbs: number,
): number | null {
  const limits = limitsOf(refrigerant);
  if (!(pressureKpaAbs >= limits.minKpaAbs && pressureKpaAbs <= limits.maxKpaAbs)) return null;
  try {
    return saturationTemperature(refrigerant, pressureKpaAbs);
  } catch (error) {
    if (error instanceof SaturationRangeError) return null;
    throw error;
  }
}

/** Saturation pressure, kPa absolute, or null outside the table. */
export function saturationPressureOrNull(refrigerant: RefrigerantId, tempC: number): number | null {
  if (!tempInTable(refrigerant, tempC)) return null;
  try {
    return saturationPressure(refrigerant, tempC);
  } catch (error) {
    if (error instanceof SaturationRangeError) return null;
    throw error;
  }
}
