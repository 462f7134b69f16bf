import { fleschKincaid } from "flesch-kincaid";
import { syllable } from "syllable";

// Flesch–Kincaid grade (Kincaid et al., 1975) of owner-facing text. Numbers and unit symbols are
// read out as words first ("570 g" → "five hundred seventy grams"), so that figures cannot lower
// the grade by counting as words without syllables.

const ONES = [
  "zero",
  "one",
  "two",
  "three",
  "four",
  "five",
  "six",
  "seven",
  "eight",
  "nine",
  "ten",
  "eleven",
  "twelve",
  "thirteen",
  "fourteen",
  "fifteen",
  "sixteen",
  "seventeen",
  "eighteen",
  "nineteen",
];
const TENS = ["", "", "twenty", "thirty", "forty", "fifty", "sixty", "seventy", "eighty", "ninety"];

function wholeInWords(n: number): string {
  if (n < 20) return ONES[n]!;
  if (n < 100) return `${TENS[Math.floor(n / 10)]}${n % 10 ? ` ${ONES[n % 10]}` : ""}`;
  if (n < 1000) return `${ONES[Math.floor(n / 100)]} hundred${n % 100 ? ` ${wholeInWords(n % 100)}` : ""}`;
  return `${wholeInWords(Math.floor(n / 1000))} thousand${n % 1000 ? ` ${wholeInWords(n % 1000)}` : ""}`;
}

function numberInWords(text: string): string {
  const [whole = "0", fraction] = text.replace(/,/g, "").split(".");
  const words = wholeInWords(Number(whole));
  return fraction ? `${words} point ${[...fraction].map((d) => ONES[Number(d)]).join(" ")}` : words;
}

const UNITS: [RegExp, string][] = [
  [/°C\b/g, "degrees Celsius"],
  [/°F\b/g, "degrees Fahrenheit"],
  [/\bfl oz\b/g, "fluid ounces"],
  [/(\d)\s*kg\b/g, "$1 kilograms"],
  [/(\d)\s*g\b/g, "$1 grams"],
  [/(\d)\s*oz\b/g, "$1 ounces"],
  [/(\d)\s*lb\b/g, "$1 pounds"],
  [/(\d)\s*mL\b/g, "$1 millilitres"],
  [/\bA\/C\b/g, "A C"],
  [/R-(\d+)([a-z]*)/g, "R $1 $2"],
];

export function readAloud(text: string): string {
  let out = text;
  for (const [pattern, words] of UNITS) out = out.replace(pattern, words);
  return out.replace(/\d[\d,]*(?:\.\d+)?/g, (n) => numberInWords(n));
}

export interface ReadingCounts {
  sentence: number;
  word: number;
  syllable: number;
}

/** Sentences end at . ! ? or a line break (titles and list items are sentences of their own). */
export function readingCounts(text: string): ReadingCounts {
  const spoken = readAloud(text);
  const sentences = spoken.split(/[.!?]+(?=\s|$)|\n+/).filter((s) => /[A-Za-z]/.test(s));
  const words = spoken.match(/[A-Za-z][A-Za-z'’-]*/g) ?? [];
  return {
    sentence: sentences.length,
    word: words.length,
    syllable: words.reduce((sum, w) => sum + Math.max(1, syllable(w)), 0),
  };
}

export function fleschKincaidGrade(text: string): number {
  return fleschKincaid({ ...readingCounts(text) });
}
