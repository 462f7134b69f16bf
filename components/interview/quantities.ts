import {
  ambiguityQuestion,
  massFromG,
  massToG,
  parseQuantity,
  pressureFromKpa,
  pressureToKpa,
  readNumberToken,
  temperatureFromC,
  temperatureToC,
  UNIT_CHOICES,
  UNIT_LABELS,
  volumeFromMl,
  volumeToMl,
  type MassUnit,
  type PressureUnit,
  type TemperatureUnit,
  type VolumeUnit,
} from "@/lib/units";
import type { QuantityKind, UnitPreferences } from "./unit-preferences";

export { UNIT_LABELS };

/** Why typed text is not (yet) a number: a plain message, or the question an ambiguous one needs. */
export type Unreadable = { message: string; ambiguous?: { decimal: number; thousands: number } };

/**
 * Text typed in the field's unit → the internal value. The digits are read by the person's locale
 * ("1,200" is 1200 g in en-US, a question in de-DE); a unit typed after them ("32 psi") wins over the
 * field's. Text that cannot be read stays text, so nothing typed is lost.
 */
export function readTyped(
  kind: QuantityKind | "plain",
  raw: string,
  units: UnitPreferences,
  locale?: string,
): { value: number } | { empty: true } | ({ text: string } & Unreadable) {
  const text = raw.trim();
  if (text === "") return { empty: true };
  if (kind === "plain") {
    const read = readNumberToken(text.replace(/^[+-]/, ""), locale);
    if ("value" in read && /^[+-]?[\d.,'’\s\u00a0\u202f]+$/.test(text))
      return { value: text.startsWith("-") ? -read.value : read.value };
    if ("ambiguous" in read)
      return { text: raw, message: ambiguityQuestion(read.ambiguous, locale), ambiguous: read.ambiguous };
    return { text: raw, message: `Could not read “${text}” as a number.` };
  }
  const q = parseQuantity(text, kind, units[kind], { locale });
  if ("error" in q)
    return { text: raw, message: q.error, ...(q.ambiguous ? { ambiguous: q.ambiguous } : {}) };
  switch (kind) {
    case "pressure":
      if (q.reference === "absolute")
        return { text: raw, message: "Give the gauge reading, not an absolute pressure." };
      return { value: round(pressureToKpa(q.value, q.unit as PressureUnit), 3) };
    case "temperature":
      return { value: round(temperatureToC(q.value, q.unit as TemperatureUnit), 3) };
    case "mass":
      return { value: round(massToG(q.value, q.unit as MassUnit), 2) };
    case "volume":
      return { value: round(volumeToMl(q.value, q.unit as VolumeUnit), 2) };
  }
}

/** The internal value, or the typed text when it is not a number (kept as the draft). */
export function toInternal(
  kind: QuantityKind | "plain",
  raw: string,
  units: UnitPreferences,
  locale?: string,
): number | string | undefined {
  const read = readTyped(kind, raw, units, locale);
  return "value" in read ? read.value : "empty" in read ? undefined : read.text;
}

/** An internal value → the text shown in the field's unit. */
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

/** What the typed digits are in the field's other units, for the line beside it: "= 35.0 °C". */
export function equivalents(kind: QuantityKind, internal: number, fieldUnit: string): string {
  const others = (UNIT_CHOICES[kind] as readonly string[]).filter((u) => u !== fieldUnit);
  const say = (unit: string) => {
    switch (kind) {
      case "pressure":
        return `${trim(pressureFromKpa(internal, unit as PressureUnit), unit === "bar" ? 2 : 1)} ${UNIT_LABELS[unit]}`;
      case "temperature":
        return `${temperatureFromC(internal, unit as TemperatureUnit).toFixed(1)} ${UNIT_LABELS[unit]}`;
      case "mass":
        return `${trim(massFromG(internal, unit as MassUnit), unit === "g" ? 0 : unit === "kg" ? 3 : 2)} ${UNIT_LABELS[unit]}`;
      case "volume":
        return `${trim(volumeFromMl(internal, unit as VolumeUnit), unit === "mL" ? 0 : 2)} ${UNIT_LABELS[unit]}`;
    }
  };
  return others.map(say).join(" · ");
}

function round(value: number, decimals: number): number {
  const f = 10 ** decimals;
  return Math.round(value * f) / f;
}

function trim(value: number, decimals: number): string {
  return String(round(value, decimals));
}
