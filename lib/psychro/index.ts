import { psychrolibSi } from "./psychrolib-si";

const STANDARD_ATMOSPHERE_KPA = 101.325;

interface AirState {
  dryBulbC: number;
  relativeHumidityPct: number;
  /** Barometric pressure; standard sea-level atmosphere when omitted. */
  pressureKpa?: number;
}

function checked(a: AirState): { tempC: number; relHum: number; pressurePa: number } {
  if (!Number.isFinite(a.dryBulbC) || a.dryBulbC < -100 || a.dryBulbC > 200)
    throw new RangeError("Air temperature must be between −100 and 200 °C.");
  if (!(a.relativeHumidityPct > 0 && a.relativeHumidityPct <= 100))
    throw new RangeError("Relative humidity must be above 0 % and at most 100 %.");
  const pressureKpa = a.pressureKpa ?? STANDARD_ATMOSPHERE_KPA;
  if (!(pressureKpa > 0) || !Number.isFinite(pressureKpa))
    throw new RangeError("Barometric pressure must be a positive number.");
  return { tempC: a.dryBulbC, relHum: a.relativeHumidityPct / 100, pressurePa: pressureKpa * 1000 };
}

/** Dew point, °C (ASHRAE Handbook—Fundamentals ch. 1, via PsychroLib). Air at the vents below it sheds water; fins below 0 °C ice. */
export function dewPointC(a: AirState): number {
  const { tempC, relHum } = checked(a);
  return psychrolibSi().GetTDewPointFromRelHum(tempC, relHum);
}

/** Thermodynamic wet-bulb temperature, °C (ASHRAE Handbook—Fundamentals ch. 1, via PsychroLib). */
export function wetBulbC(a: AirState): number {
  const { tempC, relHum, pressurePa } = checked(a);
  return psychrolibSi().GetTWetBulbFromRelHum(tempC, relHum, pressurePa);
}
