import { describe, expect, it } from "vitest";
import { summariseServiceRecord } from "./record";
import { type ServiceContext, type ServiceRecordInput, serviceContextSchema, serviceRecordSchema } from "./record-schema";

const yfContext: ServiceContext = {
  refrigerant: "R-1234yf",
  labelChargeG: 620,
  expansionDevice: "txv",
  electricCompressor: false,
  specOilType: "PAG 46",
  totalSystemOilMl: 140,
  altitudeM: 0,
  ambientC: 24,
};

const clean: ServiceRecordInput = {
  identifier: { purityPct: 99.4, airPct: 0.6 },
  recovery: { recoveredG: 600, oilDrainedMl: 15, cylinderId: "rrr-yf-1" },
  evacuation: { deepestKpaAbs: 2.0, hold: { startKpaAbs: 2.0, endKpaAbs: 4.5, minutes: 10 } },
  oil: { type: "PAG 46", addedMl: 15 },
  recharge: { targetG: 620, chargedG: 628, cylinderId: "rrr-yf-1" },
};

describe("summariseServiceRecord", () => {
  it("a clean job needs no attention and posts its recovery and recharge to the ledger", () => {
    const s = summariseServiceRecord(clean, yfContext, { technicianId: "tech-marisol" });
    expect(s.attention).toEqual([]);
    expect(s.identifier?.pass).toBe(true);
    expect(s.recovered?.verdict).toBe("within"); // 3.2 % short: inside the SAE J2843 95 % recovery band
    expect(s.oilToAddBack?.totalMl).toBe(15); // what was drained goes back (TM 5-3810-307-24-1-2 ch. 9)
    expect(s.evacuation?.waterBoils).toBe(true); // 2.0 kPa is below water's ≈2.98 kPa at 24 °C (ASHRAE ch. 1)
    expect(s.hold?.verdict).toBe("pass");
    expect(s.charge?.within).toBe(true); // 8 g over: inside ½ oz (SAE J2843)
    expect(s.postings.map((p) => [p.type, p.massG])).toEqual([
      ["recovered_into", 600],
      ["charged_from", 628],
    ]);
    expect(s.cautions.map((c) => c.id)).toContain("r1234yf-equipment-only");
  });

  it("a recovered mass a quarter over the label comes up as an overcharge", () => {
    const s = summariseServiceRecord({ recovery: { recoveredG: 775, oilDrainedMl: 10 } }, yfContext);
    expect(s.recovered?.verdict).toBe("over");
    expect(s.attention[0]).toBe("Recovered 775 g against a 620 g label: 155 g (25 %) over — an overcharge.");
  });

  it("a failed purity check stops recovery into the shop's machine (SAE J2099 / J2912, 98 %)", () => {
    const s = summariseServiceRecord({ identifier: { purityPct: 95 }, recovery: { recoveredG: 600, oilDrainedMl: 5, cylinderId: "rrr-yf-1" } }, yfContext);
    expect(s.identifier?.pass).toBe(false);
    expect(s.attention[0]).toContain("do not recover into the shop's machine");
    expect(s.attention[1]).toContain("failed identification");
  });

  it("oil pulled with liquid raises the add-back to the 4 % estimate (common practice) and a short top-up is flagged", () => {
    const s = summariseServiceRecord(
      { recovery: { recoveredG: 1400, oilDrainedMl: 20, oilPulledWithLiquid: true }, oil: { type: "PAG 46", addedMl: 20 } },
      { ...yfContext, labelChargeG: 1400 },
    );
    expect(s.oilPulled?.oilMl).toBeCloseTo((1400 * 0.04) / 0.99, 6);
    expect(s.oilToAddBack?.totalMl).toBeCloseTo((1400 * 0.04) / 0.99, 6);
    expect(s.oilAdded?.matches).toBe(false);
    expect(s.attention.some((a) => a.includes("short"))).toBe(true);
  });

  it("PAG oil in an electric compressor is a danger line and the high-voltage cautions appear", () => {
    const s = summariseServiceRecord({ oil: { type: "PAG 46", addedMl: 10 } }, { ...yfContext, electricCompressor: true, specOilType: "POE" });
    expect(s.oilWarnings.map((w) => w.id)).toContain("pag_in_electric");
    expect(s.cautions.map((c) => c.id)).toEqual(expect.arrayContaining(["high-voltage-compressor", "dielectric-oil"]));
  });

  it("a failing hold and an off-target charge both need attention", () => {
    const s = summariseServiceRecord(
      { evacuation: { deepestKpaAbs: 2.5, hold: { startKpaAbs: 2.5, endKpaAbs: 12, minutes: 5 } }, recharge: { targetG: 620, chargedG: 600 } },
      yfContext,
    );
    expect(s.hold?.verdict).toBe("fail");
    expect(s.charge?.within).toBe(false);
    expect(s.attention.filter((a) => a.includes("a leak or moisture") || a.includes("outside"))).toHaveLength(2);
  });

  it("flags a charge aimed at something other than the label", () => {
    const s = summariseServiceRecord({ recharge: { targetG: 700, chargedG: 700 } }, yfContext);
    expect(s.attention.join(" ")).toContain("label figure is 620 g");
  });
});

describe("serviceRecordSchema", () => {
  it("accepts a record with only the first steps done", () => {
    expect(serviceRecordSchema.safeParse({ identifier: { purityPct: 99 } }).success).toBe(true);
    expect(serviceRecordSchema.safeParse({}).success).toBe(true);
  });

  it("rejects impossible values", () => {
    expect(serviceRecordSchema.safeParse({ recovery: { recoveredG: -5, oilDrainedMl: 0 } }).success).toBe(false);
    expect(serviceRecordSchema.safeParse({ identifier: { purityPct: 130 } }).success).toBe(false);
    expect(serviceRecordSchema.safeParse({ recovery: { recoveredG: 500, oilDrainedMl: 5, startedAt: "yesterday" } }).success).toBe(false);
    expect(serviceContextSchema.safeParse({ refrigerant: "R-22" }).success).toBe(false);
  });
});
