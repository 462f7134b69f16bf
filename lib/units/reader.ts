import type { MassUnit, VolumeUnit } from "./factors";
import type { VacuumUnit } from "./vacuum-format";

/** The units one reader sees every number in; each person sets them once on their profile. */
export interface ReaderUnits {
  pressure: "kPa" | "bar" | "psi";
  temperature: "C" | "F";
  mass: MassUnit;
  volume: VolumeUnit;
  vacuum: VacuumUnit;
}
export type ReaderQuantity = keyof ReaderUnits;
export const READER_QUANTITIES = ["pressure", "temperature", "mass", "volume", "vacuum"] as const;

export const unitSystems = ["metric", "imperial"] as const;
export type UnitSystem = (typeof unitSystems)[number];

/** The units a field offers, per quantity, in the order its buttons show. */
export const UNIT_CHOICES = {
  pressure: ["kPa", "bar", "psi"],
  temperature: ["C", "F"],
  mass: ["g", "kg", "oz", "lb"],
  volume: ["mL", "floz"],
  vacuum: ["inHg", "kPa", "mbar", "micron"],
} as const satisfies { [K in ReaderQuantity]: readonly ReaderUnits[K][] };

export const UNIT_LABELS: Record<string, string> = {
  C: "°C",
  F: "°F",
  floz: "fl oz",
  micron: "microns",
  inHg: "inHg",
  mbar: "mbar",
  kPa: "kPa",
  bar: "bar",
  psi: "psi",
  g: "g",
  kg: "kg",
  oz: "oz",
  lb: "lb",
  mL: "mL",
};

export function unitsOfSystem(system: UnitSystem): ReaderUnits {
  return system === "imperial"
    ? { pressure: "psi", temperature: "F", mass: "oz", volume: "floz", vacuum: "inHg" }
    : { pressure: "kPa", temperature: "C", mass: "g", volume: "mL", vacuum: "kPa" };
}

/** What a person chose on their profile: a system, and any quantity they read differently. */
export interface UnitChoice {
  system?: UnitSystem;
  pressure?: ReaderUnits["pressure"];
  temperature?: ReaderUnits["temperature"];
  mass?: ReaderUnits["mass"];
  volume?: ReaderUnits["volume"];
  vacuum?: ReaderUnits["vacuum"];
}

/** A person's units: their own choice over their system, their system over the shop's. */
export function readerUnitsOf(choice: UnitChoice | null | undefined, shopSystem: UnitSystem): ReaderUnits {
  const base = unitsOfSystem(choice?.system ?? shopSystem);
  const units = { ...base };
  for (const quantity of READER_QUANTITIES) {
    const chosen = choice?.[quantity];
    if (chosen !== undefined && (UNIT_CHOICES[quantity] as readonly string[]).includes(chosen))
      (units as Record<ReaderQuantity, string>)[quantity] = chosen;
  }
  return units;
}

export function isUnitOf<K extends ReaderQuantity>(quantity: K, unit: string): unit is ReaderUnits[K] {
  return (UNIT_CHOICES[quantity] as readonly string[]).includes(unit);
}
