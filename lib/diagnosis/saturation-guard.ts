import {
  refrigerantInfo,
  type RefrigerantId,
  saturationPressure,
  SaturationRangeError,
  saturationTemperature,
} from "@/lib/refrigerants";

// Range checks before calling the physics core: out-of-table readings are routine here (R-744
// high sides, deep vacuum), and building an exception for each one is slow in a tight loop.
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

export function saturationPressureOrNull(refrigerant: RefrigerantId, tempC: number): number | null {
  if (!tempInTable(refrigerant, tempC)) return null;
  try {
    return saturationPressure(refrigerant, tempC);
  } catch (error) {
    if (error instanceof SaturationRangeError) return null;
    throw error;
  }
}
