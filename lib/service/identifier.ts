import { formatPercent } from "./format";

/**
 * The one purity limit (the interview, the service record and the findings engine all read it here):
 * identifiers meeting the SAE specification report refrigerant at 98 % or better as pure, and recycling
 * applies only to refrigerant identified at 98 % or better (SAE J2099, SAE J2912, covering R-134a and
 * R-1234yf); the same line for R-744 is common practice.
 */
export const PURITY_PASS_PCT = 98;

/** What the identifier reported; both optional, as the interview may not have it yet. */
export interface IdentifierReading {
  purityPct?: number | null;
  hydrocarbonFlagged?: boolean | null;
}

/**
 * The one test for a charge that must stay out of the shop's recovery machine: purity below the pass
 * mark, or hydrocarbon flagged. The same word everywhere: the charge is "contaminated".
 */
export function refrigerantContaminated(reading: IdentifierReading): boolean {
  const { purityPct, hydrocarbonFlagged } = reading;
  return (purityPct != null && purityPct < PURITY_PASS_PCT) || hydrocarbonFlagged === true;
}

export interface IdentifierCheck {
  pass: boolean;
  message: string;
  source: string;
}

/** The identifier's verdict before anything is connected to the shop's recovery machine. */
export function identifierCheck(input: { purityPct: number; airPct?: number | null }): IdentifierCheck {
  const { purityPct, airPct } = input;
  if (!Number.isFinite(purityPct) || purityPct < 0 || purityPct > 100)
    throw new RangeError(`purity must be 0–100 %, got ${purityPct}`);
  if (airPct != null && (!Number.isFinite(airPct) || airPct < 0 || airPct > 100))
    throw new RangeError(`air must be 0–100 %, got ${airPct}`);
  const pass = purityPct >= PURITY_PASS_PCT;
  const air = airPct != null ? ` (air ${formatPercent(airPct)})` : "";
  const message = pass
    ? `Purity ${formatPercent(purityPct)}${air}: pure enough to recover into the shop's machine.`
    : `Purity ${formatPercent(purityPct)}${air} is below ${PURITY_PASS_PCT} %: do not recover into the shop's machine. Use dedicated equipment or a separate, labelled cylinder, and tell the owner in writing.`;
  return { pass, message, source: `SAE J2099 and SAE J2912: ${PURITY_PASS_PCT} % purity` };
}
