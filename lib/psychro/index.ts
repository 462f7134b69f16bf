import { STANDARD_ATMOSPHERE_KPA } from "@/lib/units/barometric";
import { psychrolibSi } from "./psychrolib-si";

// Air a vehicle meets, outside or at a vent; PsychroLib's iterations are checked across this span.
const AIR_RANGE_C = { min: -50, max: 80 } as const;

interface AirState {
  dryBulbC: number;
  relativeHumidityPct: number;
  /** Barometric pressure; standard sea-level atmosphere when omitted. */
  pressureKpa?: number;
}

function checked(a: AirState): { tempC: number; relHum: number; pressurePa: number } {
  if (!(a.dryBulbC >= AIR_RANGE_C.min && a.dryBulbC <= AIR_RANGE_C.max))
    throw new RangeError(`Air temperature must be between −${-AIR_RANGE_C.min} and ${AIR_RANGE_C.max} °C.`);
  if (!(a.relativeHumidityPct > 0 && a.relativeHumidityPct <= 100))
    throw new RangeError("Relative humidity must be above 0 % and at most 100 %.");
  const pressureKpa = a.pressureKpa ?? STANDARD_ATMOSPHERE_KPA;
  if (!(pressureKpa > 0) || !Number.isFinite(pressureKpa))
    throw new RangeError("Barometric pressure must be a positive number.");
  return { tempC: a.dryBulbC, relHum: a.relativeHumidityPct / 100, pressurePa: pressureKpa * 1000 };
}

/** Dew point, °C (ASHRAE Handbook—Fundamentals 2017 ch. 1). Air at the vents below it sheds water; fins below 0 °C ice. */
export function dewPointC(a: AirState): number {
  const { tempC, relHum } = checked(a);
  return outsideEquations(() => psychrolibSi().GetTDewPointFromRelHum(tempC, relHum));
}

/** Thermodynamic wet-bulb temperature, °C (ASHRAE Handbook—Fundamentals 2017 ch. 1). */
export function wetBulbC(a: AirState): number {
  const { tempC, relHum, pressurePa } = checked(a);
  return outsideEquations(() => psychrolibSi().GetTWetBulbFromRelHum(tempC, relHum, pressurePa));
}

/** PsychroLib throws a plain Error when air is too dry for its equations; callers get a RangeError like any bad input. */
function outsideEquations(compute: () => number): number {
  try {
    return compute();
  } catch (error) {
    throw new RangeError(
      `This air is outside the range of the psychrometric equations: ${(error as Error).message}`,
    );
  }
}
