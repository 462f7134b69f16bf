import { type MassUnit, type VolumeUnit, massToG, parseQuantity, volumeToMl } from "@/lib/units";

/** A leading apostrophe is how our export (and spreadsheets) defuse a formula; drop it on the way back in. */
export function cleanCell(raw: string | undefined): string {
  const t = (raw ?? "").trim();
  return /^'[=+\-@]/.test(t) ? t.slice(1) : t;
}

export function parseYear(text: string): number | null {
  return /^\d{4}$/.test(text) ? Number(text) : null;
}

/** "2015-2019", "2015 to 2019", "2015–2019" or a single "2017". */
export function parseYearRange(text: string): { from: number; to: number } | null {
  const single = parseYear(text);
  if (single !== null) return { from: single, to: single };
  const m = /^(\d{4})\s*(?:-|–|to|\.\.)\s*(\d{4})$/i.exec(text);
  return m ? { from: Number(m[1]), to: Number(m[2]) } : null;
}

const TRUE_WORDS = new Set([
  "yes",
  "y",
  "true",
  "1",
  "rear",
  "front+rear",
  "front and rear",
  "front & rear",
  "dual",
]);
const FALSE_WORDS = new Set(["no", "n", "false", "0", "front", "front only", "single", "none"]);

export function parseRearAc(text: string): boolean | null {
  const t = text.toLowerCase().replace(/\s+/g, " ");
  if (TRUE_WORDS.has(t)) return true;
  if (FALSE_WORDS.has(t)) return false;
  return null;
}

// In a comma-separated file "1,250" could be one and a quarter or twelve hundred and fifty:
// refuse to guess. Semicolon-separated files come from decimal-comma locales, so there it is 1.25.
const AMBIGUOUS_THOUSANDS = /^[1-9]\d{0,2}(,\d{3})+(\s*[^\d,.\s].*)?$/;

export type Measured<U extends string> = { valueInBase: number; unit: U } | { problem: string };

function declaredUnit<U extends string>(
  what: string,
  declared: (U | undefined)[],
): U | undefined | { problem: string } {
  const set = [...new Set(declared.filter((u): u is U => u !== undefined))];
  if (set.length > 1)
    return { problem: `${what}: the header and the unit column disagree (${set.join(" vs ")})` };
  return set[0];
}

/** A label charge cell in grams, honouring a unit in the cell, the row's unit column or the header. */
export function parseChargeCell(
  text: string,
  declared: (MassUnit | undefined)[],
  fallback: MassUnit,
  decimalComma = false,
): Measured<MassUnit> {
  if (!decimalComma && AMBIGUOUS_THOUSANDS.test(text))
    return { problem: `label charge "${text}": write numbers without a thousands separator` };
  const unit = declaredUnit("label charge", declared);
  if (typeof unit === "object") return unit;
  const q = parseQuantity(text, "mass", unit ?? fallback, { decimalMark: decimalComma ? "," : "." });
  if ("error" in q)
    return { problem: `label charge "${text}" is not a mass (for example 650, 1.4 kg or 23 oz)` };
  if (/[a-z]/i.test(text) && unit && q.unit !== unit) {
    return { problem: `label charge "${text}" is in ${q.unit} but the column says ${unit}` };
  }
  return { valueInBase: massToG(q.value, q.unit as MassUnit), unit: q.unit as MassUnit };
}

/** A total-oil cell in millilitres; "oz" in an oil cell means US fluid ounces. */
export function parseOilCell(
  text: string,
  declared: (VolumeUnit | undefined)[],
  fallback: VolumeUnit,
  decimalComma = false,
): Measured<VolumeUnit> {
  if (!decimalComma && AMBIGUOUS_THOUSANDS.test(text))
    return { problem: `total oil "${text}": write numbers without a thousands separator` };
  const unit = declaredUnit("total oil", declared);
  if (typeof unit === "object") return unit;
  const spelled = /fl/i.test(text) ? text : text.replace(/\boz\b/i, "fl oz");
  const q = parseQuantity(spelled, "volume", unit ?? fallback, { decimalMark: decimalComma ? "," : "." });
  if ("error" in q)
    return { problem: `total oil "${text}" is not a volume (for example 120, 120 mL or 4 fl oz)` };
  if (/[a-z]/i.test(text) && unit && q.unit !== unit) {
    return { problem: `total oil "${text}" is in ${q.unit} but the column says ${unit}` };
  }
  return { valueInBase: volumeToMl(q.value, q.unit as VolumeUnit), unit: q.unit as VolumeUnit };
}
