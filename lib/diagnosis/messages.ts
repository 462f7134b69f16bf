import {
  massFromG,
  type MassUnit,
  pressureFromKpa,
  temperatureDifferenceFromK,
  temperatureFromC,
  volumeFromMl,
  type VolumeUnit,
} from "@/lib/units";
import { plain } from "./format";
import { MESSAGE_TEMPLATES, type MessageKey } from "./message-templates";
import type { Quantity } from "./quantities";

export type { MessageKey } from "./message-templates";

/**
 * A sentence the engine wants to say, as a template key with its numbers as typed quantities and any
 * plain words (a refrigerant's name). formatMessage renders it in the reader's units.
 */
export interface Message {
  key: MessageKey;
  values?: Readonly<Record<string, Quantity>>;
  words?: Readonly<Record<string, string>>;
}

export interface ReaderUnits {
  pressure: "kPa" | "bar" | "MPa" | "psi";
  temperature: "C" | "F";
  mass: MassUnit;
  volume: VolumeUnit;
}

/** The engine's own units: the default rendering. */
export const SI_UNITS: ReaderUnits = { pressure: "kPa", temperature: "C", mass: "g", volume: "mL" };

const PRESSURE_SUFFIX: Record<ReaderUnits["pressure"], { gauge: string; abs: string; plain: string }> = {
  kPa: { gauge: "kPa gauge", abs: "kPa absolute", plain: "kPa" },
  bar: { gauge: "bar gauge", abs: "bar absolute", plain: "bar" },
  MPa: { gauge: "MPa gauge", abs: "MPa absolute", plain: "MPa" },
  psi: { gauge: "psig", abs: "psia", plain: "psi" },
};
const MASS_DECIMALS: Record<MassUnit, 0 | 1 | 2 | 3> = { g: 0, kg: 3, oz: 1, lb: 2 };

function pressureDecimals(value: number, unit: ReaderUnits["pressure"]): 0 | 1 | 2 | 3 {
  if (unit === "kPa") return 0;
  if (unit === "psi") return Math.abs(value) >= 100 ? 0 : 1;
  return unit === "bar" ? 2 : 3;
}

/** [number, unit] for one quantity in the reader's units. */
export function renderQuantity(q: Quantity, units: ReaderUnits = SI_UNITS): [string, string] {
  switch (q.kind) {
    case "pressure_gauge":
    case "pressure_abs":
    case "pressure_difference": {
      const value = pressureFromKpa(q.value, units.pressure);
      const suffix = PRESSURE_SUFFIX[units.pressure];
      const label =
        q.kind === "pressure_gauge" ? suffix.gauge : q.kind === "pressure_abs" ? suffix.abs : suffix.plain;
      // Plain digits, as the readings and every other screen say a pressure (lib/units/quantity.ts).
      return [plain(value, q.decimals ?? pressureDecimals(value, units.pressure), false), label];
    }
    case "temperature":
      return [
        plain(temperatureFromC(q.value, units.temperature), q.decimals ?? 1),
        units.temperature === "F" ? "°F" : "°C",
      ];
    case "temperature_difference":
      return units.temperature === "F"
        ? [plain(temperatureDifferenceFromK(q.value, "F"), q.decimals ?? 1), "°F"]
        : [plain(q.value, q.decimals ?? 1), "K"];
    case "mass":
      return [plain(massFromG(q.value, units.mass), q.decimals ?? MASS_DECIMALS[units.mass]), units.mass];
    case "volume":
      return units.volume === "floz"
        ? [plain(volumeFromMl(q.value, "floz"), q.decimals ?? 1), "fl oz"]
        : [plain(q.value, q.decimals ?? 0), "mL"];
    case "percent":
      return [plain(q.value, q.decimals ?? (Number.isInteger(q.value) ? 0 : 1)), "%"];
    case "duration":
      return [plain(q.value, q.decimals ?? 0), "min"];
  }
}

const PLACEHOLDER = /\{(@?)([a-zA-Z]+)(:n)?\}/g;
const OPTIONAL = /\[([^\]]*)\]/g;

function fill(template: string, message: Message, units: ReaderUnits, gap: string | null): string | null {
  let missing = false;
  const text = template.replace(PLACEHOLDER, (_, word: string, name: string, numberOnly?: string) => {
    const value = word ? message.words?.[name] : message.values?.[name];
    if (value === undefined) {
      missing = true;
      // Stryker disable next-line StringLiteral: with no gap the whole text is dropped, so what stands in for it is never read
      return gap ?? "";
    }
    if (typeof value === "string") return value;
    const [number, unit] = renderQuantity(value, units);
    return numberOnly ? number : `${number} ${unit}`;
  });
  return missing && gap === null ? null : text;
}

/**
 * The sentence in the reader's units. `[ … ]` in a template is said only when every value inside it
 * is present; a value missing elsewhere is a defect and shows as "…" rather than a crash.
 */
export function formatMessage(message: Message, units: ReaderUnits = SI_UNITS): string {
  const template = MESSAGE_TEMPLATES[message.key] ?? message.key;
  const withOptional = template.replace(
    OPTIONAL,
    (_, inner: string) => fill(inner, message, units, null) ?? "",
  );
  return fill(withOptional, message, units, "…") ?? withOptional;
}
