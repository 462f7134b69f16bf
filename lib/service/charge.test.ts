import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  chargeTolerance,
  chargeWithinTolerance,
  indefiniteArticle,
  recoveredAgainstLabel,
  targetCharge,
} from "./charge";

describe("recoveredAgainstLabel", () => {
  it("reports a recovered mass a quarter over the label as a 25 % overcharge (arithmetic; SAE J2788 95 % recovery band)", () => {
    const labelChargeG = 620;
    const recoveredChargeG = 775;
    const r = recoveredAgainstLabel({ labelChargeG, recoveredChargeG, refrigerant: "R-1234yf" });
    expect(r.verdict).toBe("over");
    expect(r.deltaG).toBe(155);
    expect(r.deltaPct).toBeCloseTo(25, 10);
    expect(r.sentence).toBe("Recovered 775 g against a 620 g label: 155 g (25 %) over — an overcharge.");
  });

  it("writes the thousands separator and the article for 800 g", () => {
    const r = recoveredAgainstLabel({ labelChargeG: 800, recoveredChargeG: 1000 });
    expect(r.sentence).toBe("Recovered 1,000 g against an 800 g label: 200 g (25 %) over — an overcharge.");
  });

  it("treats a shortfall up to 5 % as what recovery leaves behind (SAE J2788: ≥95 % recovered)", () => {
    const at5 = recoveredAgainstLabel({ labelChargeG: 800, recoveredChargeG: 760 });
    expect(at5.verdict).toBe("within");
    expect(at5.allowedShortfallG).toBeCloseTo(40, 10);
    expect(at5.sources.some((s) => s.includes("SAE J2788") && s.includes("95 %"))).toBe(true);
    const past5 = recoveredAgainstLabel({ labelChargeG: 800, recoveredChargeG: 759 });
    expect(past5.verdict).toBe("under");
    expect(past5.sentence).toContain("41 g (5.1 %) under");
    expect(past5.sentence).toContain("look for a leak");
  });

  it("allows an excess up to the ½ oz charge accuracy before calling an overcharge (SAE J2843 ½ oz, from memory)", () => {
    expect(recoveredAgainstLabel({ labelChargeG: 500, recoveredChargeG: 515 }).verdict).toBe("within");
    expect(recoveredAgainstLabel({ labelChargeG: 500, recoveredChargeG: 516 }).verdict).toBe("over");
  });

  it("honours a shop's own shortfall allowance", () => {
    const r = recoveredAgainstLabel({ labelChargeG: 1000, recoveredChargeG: 920, shortfallAllowancePct: 10 });
    expect(r.verdict).toBe("within");
    expect(recoveredAgainstLabel({ labelChargeG: 1000, recoveredChargeG: 920 }).verdict).toBe("under");
  });

  it("rejects impossible masses", () => {
    expect(() => recoveredAgainstLabel({ labelChargeG: 0, recoveredChargeG: 100 })).toThrow(RangeError);
    expect(() => recoveredAgainstLabel({ labelChargeG: 500, recoveredChargeG: -1 })).toThrow(RangeError);
    expect(() => recoveredAgainstLabel({ labelChargeG: Number.NaN, recoveredChargeG: 1 })).toThrow(
      RangeError,
    );
  });

  it("property: the verdict follows the delta and the band, and deltaPct scales deltaG", () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 100, max: 3000 }),
        fc.integer({ min: 0, max: 4000 }),
        (labelChargeG, recoveredChargeG) => {
          const r = recoveredAgainstLabel({ labelChargeG, recoveredChargeG });
          expect(r.deltaG).toBe(recoveredChargeG - labelChargeG);
          expect((r.deltaPct * labelChargeG) / 100).toBeCloseTo(r.deltaG, 6);
          if (r.verdict === "over") expect(r.deltaG).toBeGreaterThan(15);
          if (r.verdict === "under") expect(r.deltaG).toBeLessThan(-0.05 * labelChargeG);
          if (r.verdict === "within") {
            expect(r.deltaG).toBeLessThanOrEqual(15);
            expect(r.deltaG).toBeGreaterThanOrEqual(-0.05 * labelChargeG - 1e-9);
          }
        },
      ),
    );
  });
});

describe("chargeTolerance", () => {
  it("is ½ oz (15 g) for R-1234yf per SAE J2843, marked from memory", () => {
    const t = chargeTolerance("R-1234yf");
    expect(t.toleranceG).toBe(15);
    expect(t.source).toContain("SAE J2843");
    expect(t.source).toContain("from memory");
    expect(t.checked).toBe(false);
  });

  it("is 15 g for R-134a per SAE J2788, marked from memory", () => {
    const t = chargeTolerance("R-134a");
    expect(t.toleranceG).toBe(15);
    expect(t.source).toContain("SAE J2788");
    expect(t.source).toContain("from memory");
    expect(t.checked).toBe(false);
  });

  it("says plainly when no standard covers the refrigerant (R-744)", () => {
    expect(chargeTolerance("R-744").source).toContain("common practice");
  });

  it("½ oz is 14.17 g (NIST SP 811: 1 oz = 28.349523125 g), so 15 g is its rounding", () => {
    expect(Math.abs(28.349523125 / 2 - chargeTolerance("R-1234yf").toleranceG)).toBeLessThan(1);
  });
});

describe("chargeWithinTolerance", () => {
  it("a charge 20 g off target is outside tolerance (SAE J2843 ½ oz, from memory)", () => {
    const over = chargeWithinTolerance({ targetG: 540, chargedG: 560, refrigerant: "R-1234yf" });
    expect(over.within).toBe(false);
    expect(over.deltaG).toBe(20);
    expect(over.sentence).toContain("outside");
    expect(chargeWithinTolerance({ targetG: 540, chargedG: 520, refrigerant: "R-1234yf" }).within).toBe(
      false,
    );
  });

  it("a charge 10 g off target is inside tolerance (SAE J2788 ½ oz, from memory)", () => {
    const r = chargeWithinTolerance({ targetG: 680, chargedG: 670, refrigerant: "R-134a" });
    expect(r.within).toBe(true);
    expect(r.deltaG).toBe(-10);
    expect(r.sentence).toBe(
      "Charged 670 g against a 680 g target: 10 g under, inside the ±15 g a recharge machine must hold.",
    );
    expect(chargeWithinTolerance({ targetG: 680, chargedG: 690, refrigerant: "R-134a" }).within).toBe(true);
  });

  it("uses a shop's stricter tolerance when given and says so", () => {
    const r = chargeWithinTolerance({ targetG: 680, chargedG: 690, refrigerant: "R-134a", toleranceG: 5 });
    expect(r.within).toBe(false);
    expect(r.source).toBe("shop setting");
  });
});

describe("targetCharge", () => {
  it("charges to the label when only the label is known", () => {
    expect(targetCharge({ labelChargeG: 650 })).toEqual({ targetG: 650, basis: "label", warnings: [] });
  });

  it("prefers the maker's revised figure and notes it", () => {
    const t = targetCharge({ labelChargeG: 650, revisedChargeG: 620 });
    expect(t?.targetG).toBe(620);
    expect(t?.basis).toBe("revised");
    expect(t?.warnings).toHaveLength(1);
  });

  it("falls back to the spec table and flags a label that disagrees with it beyond 15 g", () => {
    expect(targetCharge({ specChargeG: 900 })?.basis).toBe("spec_table");
    const t = targetCharge({ labelChargeG: 700, specChargeG: 950, refrigerant: "R-134a" });
    expect(t?.targetG).toBe(700);
    expect(t?.warnings[0]).toContain("rear A/C");
    expect(targetCharge({ labelChargeG: 700, specChargeG: 710 })?.warnings).toEqual([]);
  });

  it("returns null when nothing is known", () => {
    expect(targetCharge({})).toBeNull();
  });
});

describe("indefiniteArticle", () => {
  it.each([
    ["800 g", "an"],
    ["8,000 g", "an"],
    ["18 g", "an"],
    ["11,500 g", "an"],
    ["1,000 g", "a"],
    ["180 g", "a"],
    ["620 g", "a"],
  ])("%s takes '%s'", (formatted, article) => {
    expect(indefiniteArticle(formatted)).toBe(article);
  });
});
