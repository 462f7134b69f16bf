/**
 * Reads a typed number the way the person wrote it: thousands separators and decimal commas by
 * their locale, and a question where the text could honestly mean two numbers ("1,200" where a comma
 * is the decimal mark: 1.2 or 1200?).
 */
export type ReadNumber =
  { value: number } | { ambiguous: { text: string; decimal: number; thousands: number } } | { error: string };

export interface NumberConventions {
  decimal: "." | ",";
  /** The locale's own grouping mark ("," in en, "." in de, a space in fr). */
  group: string;
}

const cache = new Map<string, NumberConventions>();

/** The locale's decimal and grouping marks, from the runtime's own locale data. */
export function numberConventions(locale?: string): NumberConventions {
  const key = locale ?? "";
  const known = cache.get(key);
  if (known) return known;
  let decimal: "." | "," = ".";
  let group = ",";
  try {
    const parts = new Intl.NumberFormat(locale || undefined).formatToParts(12345.6);
    decimal = parts.find((p) => p.type === "decimal")?.value === "," ? "," : ".";
    group = parts.find((p) => p.type === "group")?.value ?? (decimal === "," ? "." : ",");
  } catch {
    // An unknown locale tag reads as the default: a decimal point.
  }
  const conventions = { decimal, group };
  cache.set(key, conventions);
  return conventions;
}

/** A run of digits with separators; a group of three after a space counts only when it is one. */
export const NUMBER_TOKEN = /(?:\d{1,3}(?:(?:[\u00a0\u202f\u2009 ']|’)\d{3})+|\d+)(?:[.,]\d+)*|[.,]\d+/g;

/**
 * One number token ("1,200", "1.200,5", "1 200", "0,75") → its value, or the two readings when the
 * locale cannot tell them apart. No sign, no unit: parseQuantity handles those around it.
 */
export function readNumberToken(token: string, locale?: string, decimalMark?: "." | ","): ReadNumber {
  const text = token.replace(/[’']/g, "'");
  const grouped = text.replace(/(\d)['\u00a0\u202f\u2009 ](?=\d{3}(?!\d))/g, "$1");
  if (grouped !== text && /['\s]/.test(grouped)) return { error: `Could not read “${token}” as a number.` };
  const marks = grouped.match(/[.,]/g) ?? [];
  if (marks.length === 0) return { value: Number(grouped) };
  const { decimal } = numberConventions(locale);
  const dots = marks.filter((m) => m === ".").length;
  const commas = marks.length - dots;
  if (dots > 0 && commas > 0) {
    // Both marks: the last one is the decimal mark, the other groups thousands.
    const last = grouped.lastIndexOf(".") > grouped.lastIndexOf(",") ? "." : ",";
    const other = last === "." ? "," : ".";
    const [whole = "", fraction = ""] = grouped.split(last);
    if (grouped.split(last).length !== 2 || !validGroups(whole, other))
      return { error: `Could not read “${token}” as a number.` };
    return { value: Number(`${whole.split(other).join("")}.${fraction}`) };
  }
  const mark = dots > 0 ? "." : ",";
  if (marks.length > 1) {
    // "1,200,000" or "1.200.000": only thousands groups make sense.
    return validGroups(grouped, mark)
      ? { value: Number(grouped.split(mark).join("")) }
      : { error: `Could not read “${token}” as a number.` };
  }
  const [whole = "", fraction = ""] = grouped.split(mark);
  const asDecimal = Number(`${whole || "0"}.${fraction}`);
  // A thousands group is exactly three digits after one to three digits that do not start with 0.
  const couldGroup = fraction.length === 3 && /^[1-9]\d{0,2}$/.test(whole);
  if (!couldGroup) return { value: asDecimal };
  const asThousands = Number(`${whole}${fraction}`);
  // A file or form that has said which mark is the decimal one leaves nothing to ask.
  if (decimalMark) return { value: mark === decimalMark ? asDecimal : asThousands };
  if (decimal === ".") return mark === "," ? { value: asThousands } : { value: asDecimal };
  // Where the comma is the decimal mark, a phone keypad still offers a point: either mark may be either.
  return { ambiguous: { text: token, decimal: asDecimal, thousands: asThousands } };
}

function validGroups(whole: string, mark: string): boolean {
  const groups = whole.split(mark);
  return (
    /^\d{1,3}$/.test(groups[0] ?? "") &&
    !(groups[0]!.startsWith("0") && groups.length > 1) &&
    groups.slice(1).every((g) => /^\d{3}$/.test(g))
  );
}

/** The question a screen asks for an ambiguous number, with both readings in the reader's locale. */
export function ambiguityQuestion(a: { decimal: number; thousands: number }, locale?: string): string {
  const say = (n: number) =>
    new Intl.NumberFormat(locale || undefined, { maximumFractionDigits: 6 }).format(n);
  return `Did you mean ${say(a.decimal)} or ${say(a.thousands)}? Type it without the separator, or tap one.`;
}

/**
 * Rewrites every number in a typed text to plain digits with a decimal point ("1.200,5 kg" →
 * "1200.5 kg"), so the unit reader never sees a locale's marks. Stops at the first ambiguous one.
 */
export function normaliseNumbers(
  text: string,
  locale?: string,
  decimalMark?: "." | ",",
):
  { text: string } | { ambiguous: { text: string; decimal: number; thousands: number } } | { error: string } {
  let out = "";
  let at = 0;
  NUMBER_TOKEN.lastIndex = 0;
  for (let m = NUMBER_TOKEN.exec(text); m !== null; m = NUMBER_TOKEN.exec(text)) {
    const read = readNumberToken(m[0], locale, decimalMark);
    if (!("value" in read)) return read;
    out += text.slice(at, m.index) + String(read.value);
    at = m.index + m[0].length;
  }
  return { text: out + text.slice(at) };
}
