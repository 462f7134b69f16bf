import { GRAMS_PER_UNIT, KPA_PER_UNIT, MILLILITRES_PER_UNIT } from "./factors";

export type QuantityKind = "pressure" | "temperature" | "mass" | "volume";
export type ParsedQuantity =
  { value: number; unit: string; reference?: "gauge" | "absolute" } | { error: string };

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

const THOUSANDS_OR_DECIMAL = /(^|[^\d.,])[1-9]\d{0,2},\d{3}(?![\d,])/;

/** Reads what a technician types: "32 psi", "2,1 bar", "75F", "−5 °C", "1 lb 4 oz". A bare number takes defaultUnit. */
export function parseQuantity(
  text: string,
  kind: QuantityKind,
  defaultUnit: string,
  opts?: {
    /** "decimal" (default): "2,1" and "1,400" are decimal commas. "reject": "1,400" is refused as ambiguous. */
    ambiguousComma?: "decimal" | "reject";
  },
): ParsedQuantity {
  const cleaned = text
    .trim()
    .replace(/[\u2212\u2013]/g, "-")
    .replace(/(\d),(\d)/g, "$1.$2")
    .replace(/\s+/g, " ");
  // "1,400" could be 1400 or 1.4; where nothing else says which, a question beats a misread charge.
  if (opts?.ambiguousComma === "reject" && THOUSANDS_OR_DECIMAL.test(text)) {
    return {
      error: `“${text.trim()}” is ambiguous: write it without a thousands separator (1400) or with a decimal point (1.4).`,
    };
  }
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
