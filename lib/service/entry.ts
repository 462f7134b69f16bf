import {
  type MassUnit,
  type PressureUnit,
  type TemperatureUnit,
  type VolumeUnit,
  massToG,
  parseQuantity,
  parseVacuum,
  pressureToKpa,
  temperatureToC,
  type VacuumUnit,
  volumeToMl,
} from "@/lib/units";

/** What a typed entry reads as: empty, a value in internal units, or a message for the technician. */
export type Entry = { empty: true } | { value: number } | { error: string };

const EMPTY: Entry = { empty: true };

/**
 * What a mass field says under it: the unit a number alone is read in (readMassG's default), and
 * examples in the reader's own system of any other unit that may be typed after the number.
 */
export function massEntryHint(unit: MassUnit): string {
  const imperial = unit === "oz" || unit === "lb";
  return `Type ${unit === "g" ? "grams" : unit} or add a unit: ${imperial ? "23 oz, 1 lb 7 oz" : "650 g, 1.4 kg"}.`;
}

/** "650", "1.4 kg", "1 lb 7 oz" → grams (whole grams, as the ledger stores them). */
export function readMassG(text: string, defaultUnit: MassUnit = "g", locale?: string): Entry {
  if (text.trim() === "") return EMPTY;
  const q = parseQuantity(text, "mass", defaultUnit, { locale });
  if ("error" in q) return q;
  if (q.value < 0) return { error: "A mass cannot be negative." };
  return { value: Math.round(massToG(q.value, q.unit as MassUnit)) };
}

/** "45", "45 mL", "1.5 fl oz" → millilitres (whole). A bare "oz" on an oil volume means fluid ounces. */
export function readVolumeMl(text: string, defaultUnit: VolumeUnit = "mL", locale?: string): Entry {
  if (text.trim() === "") return EMPTY;
  const spelled = /fl/i.test(text) ? text : text.replace(/\boz\b/i, "fl oz");
  const q = parseQuantity(spelled, "volume", defaultUnit, { locale });
  if ("error" in q) return q;
  if (q.value < 0) return { error: "A volume cannot be negative." };
  return { value: Math.round(volumeToMl(q.value, q.unit as VolumeUnit)) };
}

/**
 * A vacuum reading → kPa absolute, to 0.01 Pa so microns come back as typed. Inches of mercury are read
 * as a compound gauge shows them, below the local atmosphere (so the shop's altitude matters); kPa and
 * mbar as absolute, the way electronic gauges show them; microns of mercury as a micron gauge shows them.
 */
export function readVacuumKpaAbs(
  text: string,
  opts: { altitudeM?: number; defaultUnit?: VacuumUnit; locale?: string } = {},
): Entry {
  if (text.trim() === "") return EMPTY;
  const read = parseVacuum(text, opts.defaultUnit ?? "inHg", {
    at: { altitudeM: opts.altitudeM ?? 0 },
    locale: opts.locale,
  });
  if ("error" in read) return { error: read.error };
  return { value: Math.round(read.kpaAbs * 100_000) / 100_000 };
}

/** A gauge pressure ("210 kPa", "32 psi") → kPa gauge. */
export function readGaugeKpa(text: string, defaultUnit: PressureUnit = "kPa", locale?: string): Entry {
  if (text.trim() === "") return EMPTY;
  const q = parseQuantity(text, "pressure", defaultUnit, { locale });
  if ("error" in q) return q;
  if (q.reference === "absolute") return { error: "Give the gauge reading, not an absolute pressure." };
  return { value: Math.round(pressureToKpa(q.value, q.unit as PressureUnit) * 100) / 100 };
}

export function readTemperatureC(text: string, defaultUnit: TemperatureUnit = "C", locale?: string): Entry {
  if (text.trim() === "") return EMPTY;
  const q = parseQuantity(text, "temperature", defaultUnit, { locale });
  if ("error" in q) return q;
  return { value: Math.round(temperatureToC(q.value, q.unit as TemperatureUnit) * 100) / 100 };
}

/** A plain number with optional unit word dropped ("99.2", "99.2 %", "5 min"). */
export function readPlainNumber(text: string, what: string): Entry {
  const t = text
    .trim()
    .replace(/\s*(%|min|minutes?)$/i, "")
    .replace(",", ".");
  if (t === "") return EMPTY;
  const n = Number(t);
  return Number.isFinite(n) ? { value: n } : { error: `Could not read “${text.trim()}” as ${what}.` };
}
