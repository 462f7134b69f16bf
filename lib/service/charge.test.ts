import { sayInUnits } from "@/lib/units/quantity";
import { unitsOfSystem } from "@/lib/units/reader";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  CHARGE_DEVIATION_LIMITS,
  chargeDeviationVerdict,
  chargeTolerance,
  chargeWithinTolerance,
  recoveredAgainstLabel,
  targetCharge,
} from "./charge";

const imperial = unitsOfSystem("imperial");

describe("recoveredAgainstLabel", () => {
  it("reports a recovered mass a quarter over the label as a 25 % overcharge (arithmetic; SAE J2788 95 % recovery band)", () => {
    const labelChargeG = 620;
    const recoveredChargeG = 775;
    const r = recoveredAgainstLabel({ labelChargeG, recoveredChargeG, refrigerant: "R-1234yf" });
    expect(r.verdict).toBe("over");
    expect(r.deltaG).toBe(155);
    expect(r.deltaPct).toBeCloseTo(25, 10);
    expect(r.grade).toBe("well_over");
    expect(sayInUnits(r.sentence)).toBe(
      "Recovered 775 g against a label charge of 620 g: 155 g (25 %) over — more than the machine's accuracy and recovery can explain: an overcharge.",
    );
    // The same sentence to an imperial reader: 1 oz = 28.349523125 g (NIST SP 811), so 775 g = 27.3 oz.
    expect(sayInUnits(r.sentence, imperial)).toBe(
      "Recovered 27.3 oz against a label charge of 21.9 oz: 5.5 oz (25 %) over — more than the machine's accuracy and recovery can explain: an overcharge.",
    );
  });

  it("carries its masses as quantities, said with the thousands separator (common practice)", () => {
    const r = recoveredAgainstLabel({ labelChargeG: 800, recoveredChargeG: 1000 });
    expect(r.sentence).not.toMatch(/\d g\b/);
    expect(sayInUnits(r.sentence)).toMatch(
      /^Recovered 1,000 g against a label charge of 800 g: 200 g \(25 %\) over — /,
    );
  });

  it("treats a shortfall up to 5 % as what recovery leaves behind (SAE J2788: ≥95 % recovered)", () => {
    const at5 = recoveredAgainstLabel({ labelChargeG: 800, recoveredChargeG: 760 });
    expect(at5.verdict).toBe("within");
    expect(at5.allowedShortfallG).toBeCloseTo(40, 10);
    expect(at5.sources.some((s) => s.includes("SAE J2788") && s.includes("95 %"))).toBe(true);
    const past5 = recoveredAgainstLabel({ labelChargeG: 800, recoveredChargeG: 759 });
    expect(past5.verdict).toBe("under");
    expect(past5.grade).toBe("possible_slow_leak");
    expect(sayInUnits(past5.sentence)).toContain("41 g (5.1 %) under");
    expect(past5.sentence).toContain("possibly a slow leak");
  });

  it("allows an excess up to the ½ oz charge accuracy plus a 3 % margin before calling an overcharge (SAE J2843 ½ oz and the margin from memory)", () => {
    expect(recoveredAgainstLabel({ labelChargeG: 500, recoveredChargeG: 530 }).verdict).toBe("within");
    expect(recoveredAgainstLabel({ labelChargeG: 500, recoveredChargeG: 531 }).verdict).toBe("over");
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
          const overAboveG = 15 + 0.03 * labelChargeG;
          if (r.verdict === "over") expect(r.deltaG).toBeGreaterThan(overAboveG);
          if (r.verdict === "under") expect(r.deltaG).toBeLessThan(-0.05 * labelChargeG);
          if (r.verdict === "within") {
            expect(r.deltaG).toBeLessThanOrEqual(overAboveG + 1e-9);
            expect(r.deltaG).toBeGreaterThanOrEqual(-0.05 * labelChargeG - 1e-9);
          }
        },
      ),
    );
  });
});

describe("chargeDeviationVerdict: one rule for the findings and the service record", () => {
  const grade = (labelChargeG: number, recoveredChargeG: number) =>
    chargeDeviationVerdict({ labelChargeG, recoveredChargeG }).grade;

  it("does not call 20 g over a 600 g label an overcharge: inside ±15 g machine accuracy (SAE J2788, from memory) plus 3 % (from memory)", () => {
    expect(grade(600, 620)).toBe("within");
    expect(grade(600, 633)).toBe("within");
    expect(grade(600, 634)).toBe("over");
  });

  it("calls 40 g short of 600 g a possible slow leak to test for, not a certain leak (common practice)", () => {
    expect(grade(600, 560)).toBe("possible_slow_leak");
  });

  it("grades each boundary on both sides: 5 % (SAE J2788 95 % recovery), 12 % (common practice), 35 % and 85 % (from memory), 15 % over (common practice)", () => {
    const { possibleSlowLeakPct, veryShortPct, emptyPct, wellOverPct } = CHARGE_DEVIATION_LIMITS;
    expect(grade(1000, 950)).toBe("within");
    expect(grade(1000, 949)).toBe("possible_slow_leak");
    expect(grade(1000, 1000 - possibleSlowLeakPct * 10)).toBe("possible_slow_leak");
    expect(grade(1000, 1000 - possibleSlowLeakPct * 10 - 1)).toBe("short");
    expect(grade(1000, 1000 - veryShortPct * 10)).toBe("short");
    expect(grade(1000, 1000 - veryShortPct * 10 - 1)).toBe("very_short");
    expect(grade(1000, 1000 - emptyPct * 10)).toBe("very_short");
    expect(grade(1000, 1000 - emptyPct * 10 - 1)).toBe("empty");
    expect(grade(1000, 1000 + wellOverPct * 10)).toBe("over");
    expect(grade(1000, 1000 + wellOverPct * 10 + 1)).toBe("well_over");
  });

  it("never grades more refrigerant as less (property)", () => {
    const order = ["empty", "very_short", "short", "possible_slow_leak", "within", "over", "well_over"];
    fc.assert(
      fc.property(fc.integer({ min: 50, max: 3000 }), fc.nat(6000), fc.nat(6000), (label, a, b) => {
        const [less, more] = a <= b ? [a, b] : [b, a];
        expect(order.indexOf(grade(label, more))).toBeGreaterThanOrEqual(order.indexOf(grade(label, less)));
      }),
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
    expect(sayInUnits(r.sentence)).toBe(
      "Charged 670 g against a target of 680 g: 10 g under, inside the ±15 g a recharge machine must hold.",
    );
    // 1 oz = 28.349523125 g (NIST SP 811): 670 g = 23.6 oz, 15 g = 0.5 oz.
    expect(sayInUnits(r.sentence, imperial)).toBe(
      "Charged 23.6 oz against a target of 24.0 oz: 0.4 oz under, inside the ±0.5 oz a recharge machine must hold.",
    );
    expect(chargeWithinTolerance({ targetG: 680, chargedG: 690, refrigerant: "R-134a" }).within).toBe(true);
  });

  it("holds exactly ±15 g as inside and anything past it as outside (SAE J2788 ½ oz, from memory)", () => {
    expect(chargeWithinTolerance({ targetG: 600, chargedG: 615, refrigerant: "R-134a" }).within).toBe(true);
    expect(chargeWithinTolerance({ targetG: 600, chargedG: 585, refrigerant: "R-134a" }).within).toBe(true);
    expect(chargeWithinTolerance({ targetG: 600, chargedG: 615.1, refrigerant: "R-134a" }).within).toBe(
      false,
    );
    expect(chargeWithinTolerance({ targetG: 600, chargedG: 584.9, refrigerant: "R-134a" }).within).toBe(
      false,
    );
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
