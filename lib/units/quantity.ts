import type { BarometricSource } from "./barometric";
import {
  massFromG,
  pressureFromKpa,
  temperatureDifferenceFromK,
  temperatureFromC,
  volumeFromMl,
} from "./convert";
import { groupThousands } from "./group";
import type { MassUnit } from "./factors";
import { type ReaderUnits, UNIT_LABELS, unitsOfSystem } from "./reader";
import { formatVacuum, KPA_PER_VACUUM_UNIT } from "./vacuum-format";

/**
 * A number with what it measures, in the internal unit of its kind. Computations return these; the
 * edge (a screen, a CSV, a message) says them in the reader's units with formatQuantity.
 */
export type QuantityKind =
  /** kPa above the local atmosphere */
  | "pressure_gauge"
  /** kPa absolute */
  | "pressure_abs"
  /** a difference of pressures, kPa */
  | "pressure_difference"
  /** a vacuum, stored as kPa absolute and said the way the reader's vacuum gauge shows it */
  | "vacuum"
  /** a change of a vacuum (kPa), said in the unit of the reader's vacuum gauge */
  | "vacuum_change"
  /** °C */
  | "temperature"
  /** K */
  | "temperature_difference"
  /** g */
  | "mass"
  /** mL */
  | "volume"
  | "percent"
  /** minutes */
  | "duration";

export interface Quantity {
  value: number;
  kind: QuantityKind;
  decimals?: 0 | 1 | 2 | 3;
}

/** The engine's own units, and the default where nobody has chosen. */
export const SI_READER_UNITS: ReaderUnits = unitsOfSystem("metric");

function fixed(value: number, decimals: number, group = false): string {
  const text = value.toFixed(decimals);
  if (Number(text) === 0) return (0).toFixed(decimals);
  const grouped = group ? groupThousands(text) : text;
  return grouped.startsWith("-") ? `−${grouped.slice(1)}` : grouped;
}

const PRESSURE_SUFFIX: Record<ReaderUnits["pressure"], { gauge: string; abs: string; plain: string }> = {
  kPa: { gauge: "kPa gauge", abs: "kPa absolute", plain: "kPa" },
  bar: { gauge: "bar gauge", abs: "bar absolute", plain: "bar" },
  psi: { gauge: "psig", abs: "psia", plain: "psi" },
};
const MASS_DECIMALS = { g: 0, kg: 3, oz: 1, lb: 2 } as const;
const VACUUM_CHANGE_DECIMALS = { inHg: 2, kPa: 2, mbar: 1, micron: 0 } as const;

function pressureDecimals(value: number, unit: ReaderUnits["pressure"]): number {
  if (unit === "kPa") return 0;
  if (unit === "psi") return Math.abs(value) >= 100 ? 0 : 1;
  return 2;
}

/** [number, unit] for one quantity in the reader's units. */
export function quantityParts(
  q: Quantity,
  units: ReaderUnits = SI_READER_UNITS,
  at?: BarometricSource,
): [string, string] {
  switch (q.kind) {
    case "pressure_gauge":
    case "pressure_abs":
    case "pressure_difference": {
      const value = pressureFromKpa(q.value, units.pressure);
      const suffix = PRESSURE_SUFFIX[units.pressure];
      const label =
        q.kind === "pressure_gauge" ? suffix.gauge : q.kind === "pressure_abs" ? suffix.abs : suffix.plain;
      return [fixed(value, q.decimals ?? pressureDecimals(value, units.pressure)), label];
    }
    case "vacuum": {
      const text = formatVacuum(q.value, units.vacuum, at);
      const space = text.indexOf(" ");
      return [text.slice(0, space), text.slice(space + 1)];
    }
    case "vacuum_change": {
      const value = q.value / KPA_PER_VACUUM_UNIT[units.vacuum];
      const decimals = q.decimals ?? VACUUM_CHANGE_DECIMALS[units.vacuum];
      return [fixed(value, decimals, true), UNIT_LABELS[units.vacuum] ?? units.vacuum];
    }
    case "temperature":
      return [
        fixed(temperatureFromC(q.value, units.temperature), q.decimals ?? 1),
        units.temperature === "F" ? "°F" : "°C",
      ];
    case "temperature_difference":
      return units.temperature === "F"
        ? [fixed(temperatureDifferenceFromK(q.value, "F"), q.decimals ?? 1), "°F"]
        : [fixed(q.value, q.decimals ?? 1), "K"];
    case "mass":
      return [
        fixed(massFromG(q.value, units.mass), q.decimals ?? MASS_DECIMALS[units.mass], true),
        units.mass,
      ];
    case "volume":
      return units.volume === "floz"
        ? [fixed(volumeFromMl(q.value, "floz"), q.decimals ?? 1, true), "fl oz"]
        : [fixed(q.value, q.decimals ?? 0, true), "mL"];
    case "percent":
      return [fixed(q.value, q.decimals ?? (Number.isInteger(q.value) ? 0 : 1)), "%"];
    case "duration":
      return [fixed(q.value, q.decimals ?? 0), "min"];
  }
}

/** One quantity as the reader says it: "206.8 kPa gauge" is "30.0 psig" to an imperial reader. */
export function formatQuantity(
  q: Quantity,
  units: ReaderUnits = SI_READER_UNITS,
  at?: BarometricSource,
): string {
  const [number, unit] = quantityParts(q, units, at);
  return unit === "%" ? `${number} %` : `${number} ${unit}`;
}

/**
 * A mass for reading in one mass unit, with thousands separators: "12,500 g", "27.56 lb". A field's
 * text that is read back keeps formatMass (ungrouped); CSVs write plain numbers.
 */
export function formatMassGrouped(massG: number, unit: MassUnit): string {
  return formatQuantity({ kind: "mass", value: massG }, { ...SI_READER_UNITS, mass: unit });
}

/*
 * Messages written once (a schema's limit, a rule's sentence) carry their numbers as markers, so each
 * reader sees them in their own units: `above ${quantityMarker(tempC(55))} is not a reading` says
 * "above 55.0 °C" or "above 131.0 °F".
 */
const MARKER = /\{\{q:([a-z_]+):(-?\d+(?:\.\d+)?(?:e-?\d+)?)(?::([0-3]))?\}\}/g;

export function quantityMarker(q: Quantity): string {
  return `{{q:${q.kind}:${q.value}${q.decimals === undefined ? "" : `:${q.decimals}`}}}`;
}

const RANGE_MARKER = /\{\{r:([a-z_]+):(-?[\d.e-]+):(-?[\d.e-]+)(?::([0-3]))?\}\}/g;

/** A range said once with its unit: "1200–1500 kPa gauge", "174–218 psig". */
export function quantityRangeMarker(
  kind: QuantityKind,
  low: number,
  high: number,
  decimals?: 0 | 1 | 2 | 3,
): string {
  return `{{r:${kind}:${low}:${high}${decimals === undefined ? "" : `:${decimals}`}}}`;
}

/** Whether a text still carries quantity or range markers (a sentence not yet said in anyone's units). */
export function hasQuantityMarkers(text: string): boolean {
  return /\{\{[qr]:[a-z_]+:/.test(text);
}

/** A message with quantity markers, said in the reader's units (SI when no reader is known). */
export function sayInUnits(
  message: string,
  units: ReaderUnits = SI_READER_UNITS,
  at?: BarometricSource,
): string {
  const withRanges = message.replace(
    RANGE_MARKER,
    (_, kind: string, low: string, high: string, decimals?: string) => {
      const d = decimals === undefined ? {} : { decimals: Number(decimals) as 0 | 1 | 2 | 3 };
      const [from] = quantityParts({ kind: kind as QuantityKind, value: Number(low), ...d }, units, at);
      const [to, unit] = quantityParts({ kind: kind as QuantityKind, value: Number(high), ...d }, units, at);
      return `${from}–${to} ${unit}`;
    },
  );
  return withRanges.replace(MARKER, (_, kind: string, value: string, decimals?: string) =>
    formatQuantity(
      {
        kind: kind as QuantityKind,
        value: Number(value),
        ...(decimals === undefined ? {} : { decimals: Number(decimals) as 0 | 1 | 2 | 3 }),
      },
      units,
      at,
    ),
  );
}

export const gaugeKpaQuantity = (value: number): Quantity => ({ value, kind: "pressure_gauge" });
export const tempCQuantity = (value: number, decimals?: 0 | 1): Quantity =>
  decimals === undefined ? { value, kind: "temperature" } : { value, kind: "temperature", decimals };
export const massGQuantity = (value: number): Quantity => ({ value, kind: "mass" });
export const volumeMlQuantity = (value: number): Quantity => ({ value, kind: "volume" });
export const vacuumKpaAbsQuantity = (value: number): Quantity => ({ value, kind: "vacuum" });
