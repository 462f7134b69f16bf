import { describe, expect, it } from "vitest";
import { identifierCheck, refrigerantContaminated } from "./identifier";

describe("identifierCheck (SAE J2099 / SAE J2912: 98 % pass mark)", () => {
  it("passes at 98 % and fails just below", () => {
    expect(identifierCheck({ purityPct: 98 }).pass).toBe(true);
    const fail = identifierCheck({ purityPct: 97.9, airPct: 1.2 });
    expect(fail.pass).toBe(false);
    expect(fail.message).toBe(
      "Purity 97.9 % (air 1.2 %) is below 98 %: do not recover into the shop's machine. Use dedicated equipment or a separate, labelled cylinder, and tell the owner in writing.",
    );
  });

  it("rejects readings outside 0–100 %", () => {
    expect(() => identifierCheck({ purityPct: 101 })).toThrow(RangeError);
    expect(() => identifierCheck({ purityPct: 99, airPct: -1 })).toThrow(RangeError);
  });
});

describe("refrigerantContaminated (SAE J2099 98 % pass mark; hydrocarbon flag per SAE J2912)", () => {
  it("is true below 98 % or with a hydrocarbon flag, false at 98 % or with nothing read yet", () => {
    expect(refrigerantContaminated({ purityPct: 97.9 })).toBe(true);
    expect(refrigerantContaminated({ purityPct: 98 })).toBe(false);
    expect(refrigerantContaminated({ purityPct: 99.5, hydrocarbonFlagged: true })).toBe(true);
    expect(refrigerantContaminated({ purityPct: null, hydrocarbonFlagged: false })).toBe(false);
    expect(refrigerantContaminated({})).toBe(false);
  });
});
