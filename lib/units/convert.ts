import {
  GRAMS_PER_UNIT,
  KELVIN_PER_DIFFERENCE_UNIT,
  KPA_PER_UNIT,
  type MassUnit,
  MILLILITRES_PER_UNIT,
  type PressureUnit,
  TEMPERATURE_TO_C,
  type TemperatureUnit,
  type VolumeUnit,
} from "./factors";

function known<T>(table: Readonly<Record<string, T>>, unit: string, kind: string): T {
  const entry = Object.hasOwn(table, unit) ? table[unit] : undefined;
  if (entry === undefined) throw new RangeError(`Unknown ${kind} unit "${unit}".`);
  return entry;
}

/** A plain unit conversion; for a vacuum gauge in inHg use vacuumInHgToKpaAbs. */
export function pressureToKpa(value: number, unit: PressureUnit): number {
  return value * known(KPA_PER_UNIT, unit, "pressure");
}

export function pressureFromKpa(kpa: number, unit: PressureUnit): number {
  return kpa / known(KPA_PER_UNIT, unit, "pressure");
}

export function temperatureToC(value: number, unit: TemperatureUnit): number {
  const { scale, offset } = known(TEMPERATURE_TO_C, unit, "temperature");
  return value * scale + offset;
}

export function temperatureFromC(c: number, unit: TemperatureUnit): number {
  const { scale, offset } = known(TEMPERATURE_TO_C, unit, "temperature");
  return (c - offset) / scale;
}

/** A temperature difference (superheat, subcooling, approach): no offset. */
export function temperatureDifferenceToK(value: number, unit: "K" | "F"): number {
  return value * known(KELVIN_PER_DIFFERENCE_UNIT, unit, "temperature difference");
}

export function temperatureDifferenceFromK(k: number, unit: "K" | "F"): number {
  return k / known(KELVIN_PER_DIFFERENCE_UNIT, unit, "temperature difference");
}

export function massToG(value: number, unit: MassUnit): number {
  return value * known(GRAMS_PER_UNIT, unit, "mass");
}

export function massFromG(g: number, unit: MassUnit): number {
  return g / known(GRAMS_PER_UNIT, unit, "mass");
}

export function volumeToMl(value: number, unit: VolumeUnit): number {
  return value * known(MILLILITRES_PER_UNIT, unit, "volume");
}

export function volumeFromMl(ml: number, unit: VolumeUnit): number {
  return ml / known(MILLILITRES_PER_UNIT, unit, "volume");
}
