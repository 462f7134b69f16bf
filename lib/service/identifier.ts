import { formatPercent } from "./format";

/** SAE J2099 / SAE J2912: an identifier reading of 98 % or more of the expected refrigerant counts as pure. */
export const IDENTIFIER_PURITY_PASS_PCT = 98;

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
  const pass = purityPct >= IDENTIFIER_PURITY_PASS_PCT;
  const air = airPct != null ? ` (air ${formatPercent(airPct)})` : "";
  const message = pass
    ? `Purity ${formatPercent(purityPct)}${air}: pure enough to recover into the shop's machine.`
    : `Purity ${formatPercent(purityPct)}${air} is below ${IDENTIFIER_PURITY_PASS_PCT} %: do not recover into the shop's machine. Use dedicated equipment or a separate, labelled cylinder, and tell the owner in writing.`;
  return { pass, message, source: "SAE J2099 and SAE J2912: 98 % purity" };
}
