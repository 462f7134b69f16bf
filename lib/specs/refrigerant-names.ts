import type { RefrigerantId } from "@/lib/refrigerants";

// Spellings found on labels and in spreadsheets; ASHRAE 34 designations plus the chemical-class prefixes.
const SPELLINGS: Readonly<Record<string, RefrigerantId>> = {
  r134a: "R-134a",
  hfc134a: "R-134a",
  "134a": "R-134a",
  r1234yf: "R-1234yf",
  hfo1234yf: "R-1234yf",
  "1234yf": "R-1234yf",
  r744: "R-744",
  "744": "R-744",
  co2: "R-744",
  // Recognised so that a row naming R-12 is refused for what it is (lib/refrigerants/catalog.ts: not offered).
  r12: "R-12",
  cfc12: "R-12",
};

/** "R134a", "HFO-1234yf", "co2" → the catalogue id; null when we do not recognise it. */
export function parseRefrigerantName(text: string): RefrigerantId | null {
  const key = text.toLowerCase().replace(/[\s_\-–.₂]/g, (c) => (c === "₂" ? "2" : ""));
  return SPELLINGS[key] ?? null;
}
