import { sayInUnits } from "@/lib/units/quantity";
import { unitsOfSystem } from "@/lib/units/reader";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  DEFAULT_PART_OIL_ALLOWANCES_ML,
  estimateOilPulledMl,
  oilToAddBack,
  partOilAllowancesSchema,
} from "./oil";

describe("oilToAddBack", () => {
  it("asks to add back exactly the oil removed during recovery (TM 5-3810-307-24-1-2 ch. 9)", () => {
    const r = oilToAddBack({ drainedDuringRecoveryMl: 22 });
    expect(r.totalMl).toBe(22);
    expect(r.complete).toBe(true);
    expect(r.lines[0]?.source).toContain("TM 5-3810-307");
  });

  it("adds each replaced part's allowance from the table (common practice, from memory)", () => {
    const r = oilToAddBack({
      drainedDuringRecoveryMl: 15,
      replacedParts: [{ part: "condenser" }, { part: "receiver_drier" }, { part: "hose", count: 2 }],
    });
    const expected =
      15 +
      (DEFAULT_PART_OIL_ALLOWANCES_ML.condenser ?? Number.NaN) +
      (DEFAULT_PART_OIL_ALLOWANCES_ML.receiver_drier ?? Number.NaN) +
      2 * (DEFAULT_PART_OIL_ALLOWANCES_ML.hose ?? Number.NaN);
    expect(r.totalMl).toBe(expected);
    expect(r.lines.map((l) => l.label)).toEqual([
      "Drained during recovery",
      "Condenser",
      "Receiver-drier",
      "Hose or line × 2",
    ]);
    expect(r.lines[1]?.source).toContain("common practice");
  });

  it("uses the shop's edited allowances and a measured figure over any allowance", () => {
    const r = oilToAddBack({
      drainedDuringRecoveryMl: 10,
      replacedParts: [{ part: "evaporator" }, { part: "accumulator", measuredMl: 85 }],
      allowancesMl: { evaporator: 45 },
    });
    expect(r.totalMl).toBe(10 + 45 + 85);
  });

  it("keeps the total open until a replaced compressor has been drained and measured", () => {
    const open = oilToAddBack({ drainedDuringRecoveryMl: 12, replacedParts: [{ part: "compressor" }] });
    expect(open.complete).toBe(false);
    expect(open.totalMl).toBe(12);
    expect(open.warnings.join(" ")).toContain("measure");
    const done = oilToAddBack({
      drainedDuringRecoveryMl: 12,
      replacedParts: [{ part: "compressor", measuredMl: 70 }],
    });
    expect(done.complete).toBe(true);
    expect(done.totalMl).toBe(82);
  });

  it("adds back the measured amount, never the estimate; warns only when the bottle holds far less than the estimate (TM 5-3810-307-24-1-2 ch. 9: add back what was drained)", () => {
    const far = oilToAddBack({ drainedDuringRecoveryMl: 8, estimatedPulledMl: 30 });
    expect(far.totalMl).toBe(8);
    expect(far.warnings).toHaveLength(1);
    expect(far.warnings[0]).toContain("oil separator");
    const near = oilToAddBack({ drainedDuringRecoveryMl: 20, estimatedPulledMl: 30 });
    expect(near.totalMl).toBe(20);
    expect(near.warnings).toHaveLength(0);
    expect(oilToAddBack({ drainedDuringRecoveryMl: 15, estimatedPulledMl: 30 }).warnings).toHaveLength(0);
    expect(oilToAddBack({ drainedDuringRecoveryMl: 14.9, estimatedPulledMl: 30 }).warnings).toHaveLength(1);
    expect(oilToAddBack({ drainedDuringRecoveryMl: 40, estimatedPulledMl: 30 }).totalMl).toBe(40);
  });

  it("warns when the add-back exceeds the system's total oil", () => {
    const r = oilToAddBack({
      drainedDuringRecoveryMl: 60,
      replacedParts: [{ part: "evaporator" }],
      totalSystemOilMl: 100,
    });
    expect(r.warnings.some((w) => w.includes("more than the system's total oil"))).toBe(true);
  });

  it("rejects negative volumes and part counts", () => {
    expect(() => oilToAddBack({ drainedDuringRecoveryMl: -1 })).toThrow(RangeError);
    expect(() =>
      oilToAddBack({ drainedDuringRecoveryMl: 1, replacedParts: [{ part: "hose", count: 0 }] }),
    ).toThrow(RangeError);
  });

  it("property: with fixed allowances the total is the sum of its lines and never below what was drained", () => {
    const fixedParts = ["condenser", "evaporator", "accumulator", "receiver_drier", "hose"] as const;
    fc.assert(
      fc.property(
        fc.integer({ min: 0, max: 300 }),
        fc.array(fc.record({ part: fc.constantFrom(...fixedParts), count: fc.integer({ min: 1, max: 3 }) }), {
          maxLength: 5,
        }),
        (drainedDuringRecoveryMl, replacedParts) => {
          const r = oilToAddBack({ drainedDuringRecoveryMl, replacedParts });
          const manual = replacedParts.reduce(
            (s, p) => s + (DEFAULT_PART_OIL_ALLOWANCES_ML[p.part] ?? 0) * p.count,
            drainedDuringRecoveryMl,
          );
          expect(r.totalMl).toBe(manual);
          expect(r.totalMl).toBeGreaterThanOrEqual(drainedDuringRecoveryMl);
        },
      ),
    );
  });
});

describe("partOilAllowancesSchema", () => {
  it("accepts a shop's edits and rejects unknown parts or absurd volumes", () => {
    expect(partOilAllowancesSchema.safeParse({ condenser: 40, compressor: null }).success).toBe(true);
    expect(partOilAllowancesSchema.safeParse({ muffler: 10 }).success).toBe(false);
    expect(partOilAllowancesSchema.safeParse({ hose: -5 }).success).toBe(false);
    expect(partOilAllowancesSchema.safeParse({ hose: 5000 }).success).toBe(false);
  });
});

describe("estimateOilPulledMl", () => {
  it("takes 4 % of the liquid mass as oil (common practice) at 0.99 g/mL PAG (from memory)", () => {
    const r = estimateOilPulledMl({ liquidRecoveredG: 900 });
    expect(r.oilMassG).toBeCloseTo(36, 10);
    expect(r.oilMl).toBeCloseTo(36 / 0.99, 10);
    expect(r.sumpComparison).toBe("less_than_sump");
    expect(sayInUnits(r.sentence)).toBe(
      "About 36 mL of oil left with 900 g of liquid — less than a compressor sump holds (60–90 mL).",
    );
    // 1 US fl oz = 29.5735295625 mL, 1 oz = 28.349523125 g (NIST SP 811).
    expect(sayInUnits(r.sentence, unitsOfSystem("imperial"))).toBe(
      "About 1.2 fl oz of oil left with 31.7 oz of liquid — less than a compressor sump holds (2.0–3.0 fl oz).",
    );
    expect(r.sources.join(" ")).toContain("common practice");
  });

  it("compares with a 60–90 mL compressor sump (common practice)", () => {
    expect(estimateOilPulledMl({ liquidRecoveredG: 1800 }).sumpComparison).toBe("about_a_sump"); // 72.7 mL
    expect(estimateOilPulledMl({ liquidRecoveredG: 2500 }).sumpComparison).toBe("more_than_sump"); // 101 mL
    expect(estimateOilPulledMl({ liquidRecoveredG: 1460 }).sumpComparison).toBe("less_than_sump"); // 59.0 mL
  });

  // The oil estimate is a fixed mass fraction of the liquid (common practice), so it scales linearly.
  it("property: the estimate grows in proportion to the liquid recovered", () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 5000, noNaN: true }), (liquidRecoveredG) => {
        const one = estimateOilPulledMl({ liquidRecoveredG }).oilMl;
        const two = estimateOilPulledMl({ liquidRecoveredG: 2 * liquidRecoveredG }).oilMl;
        expect(two).toBeCloseTo(2 * one, 8);
      }),
    );
  });

  it("rejects a negative mass", () => {
    expect(() => estimateOilPulledMl({ liquidRecoveredG: -10 })).toThrow(RangeError);
  });
});
