import { type Quantity, type QuantityKind, quantityMarker } from "@/lib/units/quantity";

/*
 * The service computations word their results once, with every measured number as a quantity marker
 * (lib/units/quantity.ts); the screen, message or page that shows a sentence says it in its reader's
 * units with sayInUnits. Nothing here bakes a unit into the text.
 */

const marker = (kind: QuantityKind, value: number, decimals?: Quantity["decimals"]): string =>
  quantityMarker(decimals === undefined ? { kind, value } : { kind, value, decimals });

/** A mass (grams), said without its sign: the sentence says "over" or "under". */
export const sayGrams = (massG: number): string => marker("mass", Math.abs(massG));

/** A volume of oil (millilitres), without its sign. */
export const sayMillilitres = (volumeMl: number): string => marker("volume", Math.abs(volumeMl));

/** A vacuum (stored as kPa absolute), said the way the reader's vacuum gauge shows it. */
export const sayVacuum = (kpaAbs: number): string => marker("vacuum", kpaAbs);

/** A change of a vacuum (kPa), said in the unit of the reader's vacuum gauge. */
export const sayVacuumChange = (kpa: number): string => marker("vacuum_change", kpa);

/** A temperature (°C). */
export const sayCelsius = (tempC: number): string => marker("temperature", tempC);

/** Plain number formatting for the unitless parts of a sentence (en-US grouping: "1,000"). */
const oneDecimal = new Intl.NumberFormat("en-US", { maximumFractionDigits: 1 });

export function formatPercent(pct: number): string {
  return `${oneDecimal.format(Math.abs(pct))} %`;
}

export function formatNumber(value: number, maxFractionDigits = 1): string {
  return new Intl.NumberFormat("en-US", { maximumFractionDigits: maxFractionDigits }).format(value);
}
