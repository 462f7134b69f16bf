import {
  massFromG,
  massToG,
  pressureFromKpa,
  pressureToKpa,
  temperatureFromC,
  temperatureToC,
  volumeFromMl,
  volumeToMl,
} from "@/lib/units";
import type { QuantityKind, UnitPreferences } from "./unit-preferences";

/** Text typed in the technician's unit → the internal value; text that is not a number stays text so nothing is lost. */
export function toInternal(
  kind: QuantityKind | "plain",
  raw: string,
  units: UnitPreferences,
): number | string | undefined {
  const text = raw.trim().replace(",", ".");
  if (text === "") return undefined;
  const value = Number(text);
  if (!Number.isFinite(value)) return raw;
  switch (kind) {
    case "pressure":
      return round(pressureToKpa(value, units.pressure), 3);
    case "temperature":
      return round(temperatureToC(value, units.temperature), 3);
    case "mass":
      return round(massToG(value, units.mass), 2);
    case "volume":
      return round(volumeToMl(value, units.volume), 2);
    default:
      return value;
  }
}

/** An internal value → the text shown in the technician's unit. */
export function fromInternal(kind: QuantityKind | "plain", value: unknown, units: UnitPreferences): string {
  if (value === undefined || value === null) return "";
  if (typeof value !== "number") return String(value);
  switch (kind) {
    case "pressure":
      return trim(pressureFromKpa(value, units.pressure), units.pressure === "bar" ? 2 : 1);
    case "temperature":
      return trim(temperatureFromC(value, units.temperature), 1);
    case "mass":
      return trim(massFromG(value, units.mass), units.mass === "g" ? 0 : 2);
    case "volume":
      return trim(volumeFromMl(value, units.volume), units.volume === "mL" ? 0 : 1);
    default:
      return String(value);
  }
}

/** The same quantity in the other unit system, for the line under the input. */
export function otherSystem(kind: QuantityKind, value: number): string {
  switch (kind) {
    case "pressure":
      return `${trim(pressureFromKpa(value, "psi"), 1)} psi · ${trim(value, 0)} kPa · ${trim(value / 100, 2)} bar`;
    case "temperature":
      return `${trim(value, 1)} °C · ${trim(temperatureFromC(value, "F"), 1)} °F`;
    case "mass":
      return `${trim(value, 0)} g · ${trim(massFromG(value, "oz"), 2)} oz · ${trim(massFromG(value, "lb"), 3)} lb`;
    case "volume":
      return `${trim(value, 0)} mL · ${trim(volumeFromMl(value, "floz"), 2)} fl oz`;
  }
}

export const UNIT_LABELS: Record<string, string> = {
  C: "°C",
  F: "°F",
  floz: "fl oz",
  kPa: "kPa",
  bar: "bar",
  psi: "psi",
  g: "g",
  kg: "kg",
  oz: "oz",
  lb: "lb",
  mL: "mL",
};

function round(value: number, decimals: number): number {
  const f = 10 ** decimals;
  return Math.round(value * f) / f;
}

function trim(value: number, decimals: number): string {
  return String(round(value, decimals));
}
