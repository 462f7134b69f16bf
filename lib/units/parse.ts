import { GRAMS_PER_UNIT, KPA_PER_UNIT, MILLILITRES_PER_UNIT } from "./factors";
import { ambiguityQuestion, normaliseNumbers } from "./number";

export type QuantityKind = "pressure" | "temperature" | "mass" | "volume";
export type ParsedQuantity =
  | { value: number; unit: string; reference?: "gauge" | "absolute" }
  /** ambiguous: the number could be either; a screen may offer both as buttons. */
  | { error: string; ambiguous?: { decimal: number; thousands: number } };

interface Alias {
  kind: QuantityKind;
  unit: string;
  reference?: "gauge" | "absolute";
}

const ALIASES: Record<string, Alias> = {};
function alias(kind: QuantityKind, unit: string, spellings: string[], reference?: "gauge" | "absolute") {
  for (const s of spellings) ALIASES[s] = { kind, unit, reference };
}
alias("pressure", "kPa", ["kpa"]);
alias("pressure", "kPa", ["kpag", "kpa g", "kpa(g)"], "gauge");
alias("pressure", "kPa", ["kpaa", "kpa abs", "kpa(a)"], "absolute");
alias("pressure", "bar", ["bar"]);
alias("pressure", "bar", ["barg", "bar g", "bar(g)"], "gauge");
alias("pressure", "bar", ["bara", "bar abs", "bar(a)"], "absolute");
alias("pressure", "MPa", ["mpa"]);
alias("pressure", "psi", ["psi", "lb/in2", "lbf/in2"]);
alias("pressure", "psi", ["psig"], "gauge");
alias("pressure", "psi", ["psia"], "absolute");
alias("pressure", "inHg", ["inhg", "in hg", '"hg', "in. hg"]);
alias("temperature", "C", ["c", "°c", "degc", "º c", "°", "º"]);
alias("temperature", "F", ["f", "°f", "degf", "ºf"]);
alias("temperature", "K", ["k", "kelvin"]);
alias("mass", "g", ["g", "gram", "grams"]);
alias("mass", "kg", ["kg", "kilogram", "kilograms"]);
alias("mass", "oz", ["oz", "ounce", "ounces"]);
alias("mass", "lb", ["lb", "lbs", "pound", "pounds"]);
alias("volume", "mL", ["ml", "cc", "cm3"]);
alias("volume", "floz", ["floz", "fl oz", "fl. oz", "fl.oz", "fl. oz."]);

const FACTORS: Partial<Record<QuantityKind, Record<string, number>>> = {
  pressure: KPA_PER_UNIT,
  mass: GRAMS_PER_UNIT,
  volume: MILLILITRES_PER_UNIT,
};

const EXAMPLES: Record<QuantityKind, string> = {
  pressure: "32 psi, 2.2 bar or 220 kPa",
  temperature: "24 °C or 75 F",
  mass: "650 g, 1.4 kg or 1 lb 4 oz",
  volume: "120 mL or 4 fl oz",
};

const PART = /([+-]?\d+(?:\.\d+)?|[+-]?\.\d+)\s*([^\d\s+-][^\d+-]*?)?\s*(?=[+-]?\d|[+-]?\.\d|$)/gy;

/**
 * Reads what a technician types: "32 psi", "2,1 bar", "75F", "−5 °C", "1 lb 4 oz", "1,200 g". A bare
 * number takes defaultUnit. Thousands separators and decimal commas follow the reader's locale
 * (number.ts); where the text could mean two numbers the answer is a question, never a guess.
 */
export function parseQuantity(
  text: string,
  kind: QuantityKind,
  defaultUnit: string,
  opts?: {
    /** The reader's locale (BCP 47); without one a point is the decimal mark and a comma groups thousands. */
    locale?: string;
    /** "reject": read as in a decimal-comma locale, so "1,400" is a question (spreadsheet cells of unknown origin). */
    ambiguousComma?: "reject";
    /** The decimal mark, where the source has said which it is (a semicolon-separated file uses a comma). */
    decimalMark?: "." | ",";
  },
): ParsedQuantity {
  const locale = opts?.ambiguousComma === "reject" ? "de" : (opts?.locale ?? "en");
  const numbers = normaliseNumbers(text.trim().replace(/[\u2212\u2013]/g, "-"), locale, opts?.decimalMark);
  if ("error" in numbers) return numbers;
  if ("ambiguous" in numbers) {
    const { decimal, thousands } = numbers.ambiguous;
    return {
      error: `“${numbers.ambiguous.text}” is ambiguous. ${ambiguityQuestion(numbers.ambiguous, opts?.locale)}`,
      ambiguous: { decimal, thousands },
    };
  }
  const cleaned = numbers.text.replace(/\s+/g, " ");
  const failure = {
    error: `Could not read “${text.trim()}” as a ${kind}. Try for example ${EXAMPLES[kind]}.`,
  };
  if (cleaned === "") return { error: `Enter a ${kind}, for example ${EXAMPLES[kind]}.` };
  const parts: { value: number; alias: Alias; spelled: boolean }[] = [];
  PART.lastIndex = 0;
  let consumed = 0;
  for (let match = PART.exec(cleaned); match !== null && match[0] !== ""; match = PART.exec(cleaned)) {
    consumed = PART.lastIndex;
    const spelled = (match[2] ?? "").trim().toLowerCase();
    const found = spelled === "" ? ALIASES[defaultUnit.toLowerCase()] : ALIASES[spelled];
    if (!found) return failure;
    if (found.kind !== kind)
      return { error: `“${match[2]?.trim() || defaultUnit}” is a ${found.kind} unit, not a ${kind} unit.` };
    parts.push({ value: Number(match[1]), alias: found, spelled: spelled !== "" });
  }
  if (parts.length === 0 || consumed !== cleaned.length) return failure;
  const last = parts[parts.length - 1]!;
  if (parts.length === 1) {
    return last.alias.reference
      ? { value: last.value, unit: last.alias.unit, reference: last.alias.reference }
      : { value: last.value, unit: last.alias.unit };
  }
  // Compound masses ("1 lb 4 oz", "2 kg 300 g") are summed in the last unit, which must be the smaller.
  const factors = FACTORS[kind];
  if (kind !== "mass" || !factors || parts.some((p) => p.value < 0 || !p.spelled)) return failure;
  for (let i = 1; i < parts.length; i++) {
    if (!(factors[parts[i - 1]!.alias.unit]! > factors[parts[i]!.alias.unit]!)) return failure;
  }
  const lastFactor = factors[last.alias.unit]!;
  const total = parts.reduce((sum, p) => sum + (p.value * factors[p.alias.unit]!) / lastFactor, 0);
  return { value: total, unit: last.alias.unit };
}
