import { sayInUnits } from "@/lib/units/quantity";
import { describe, expect, it } from "vitest";
import { estimateOilPulledMl, oilToAddBack } from "./oil";
import { SERVICE_SOURCES } from "./sources";

// The edges of the oil rules: each line of the add-back as the record shows it, the warnings on either
// side of their limits, and the inputs refused with the name of the figure at fault.
describe("oilToAddBack: its lines, warnings and refusals", () => {
  it("lists a measured part as measured and a compressor not yet drained as open, with its instruction", () => {
    const r = oilToAddBack({
      drainedDuringRecoveryMl: 10,
      replacedParts: [{ part: "accumulator", measuredMl: 85 }, { part: "compressor" }],
    });
    expect(r.lines).toEqual([
      { label: "Drained during recovery", volumeMl: 10, source: SERVICE_SOURCES.oilAddBack },
      { label: "Accumulator (drained and measured)", volumeMl: 85, source: "measured" },
      { label: "Compressor (drain and measure)", volumeMl: null, source: SERVICE_SOURCES.partOilAllowance },
    ]);
    expect(r.warnings).toEqual([
      "Drain the removed compressor and measure its oil; the total is not final until then.",
    ]);
  });

  it("warns of more than the system's oil only past its total, and only when the total is known", () => {
    const withTotal = (totalSystemOilMl?: number) =>
      oilToAddBack({ drainedDuringRecoveryMl: 100, totalSystemOilMl }).warnings;
    expect(withTotal(undefined)).toEqual([]);
    expect(withTotal(100)).toEqual([]);
    expect(withTotal(99)).toHaveLength(1);
  });

  it("names the figure it refuses", () => {
    expect(() => oilToAddBack({ drainedDuringRecoveryMl: -1 })).toThrow(
      "drainedDuringRecoveryMl must be a non-negative volume in mL, got -1",
    );
    expect(() => oilToAddBack({ drainedDuringRecoveryMl: 1, estimatedPulledMl: -1 })).toThrow(
      "estimatedPulledMl must be a non-negative volume in mL, got -1",
    );
    expect(() =>
      oilToAddBack({ drainedDuringRecoveryMl: 1, replacedParts: [{ part: "hose", measuredMl: -2 }] }),
    ).toThrow("measuredMl for hose must be a non-negative volume in mL, got -2");
    expect(() =>
      oilToAddBack({ drainedDuringRecoveryMl: 1, replacedParts: [{ part: "hose", count: 1.5 }] }),
    ).toThrow("count for hose must be a positive whole number");
  });
});

describe("estimateOilPulledMl: the sump's edges and the inputs it refuses", () => {
  // At 1 g/mL, 4 % of the liquid mass gives whole millilitres: 1,500 g → 60 mL, 2,250 g → 90 mL.
  const at = (liquidRecoveredG: number) => estimateOilPulledMl({ liquidRecoveredG, oilDensityGPerMl: 1 });

  it("counts both ends of the 60–90 mL sump as about a sump (common practice)", () => {
    expect(at(1500).sumpComparison).toBe("about_a_sump");
    expect(at(2250).sumpComparison).toBe("about_a_sump");
    expect(at(1475).sumpComparison).toBe("less_than_sump");
    expect(at(2275).sumpComparison).toBe("more_than_sump");
  });

  it("says what to do about a whole sump's worth and more", () => {
    expect(sayInUnits(at(1500).sentence)).toBe(
      "About 60 mL of oil left with 1,500 g of liquid — about what a whole compressor sump holds (60–90 mL): add it back before running the compressor.",
    );
    expect(sayInUnits(at(2500).sentence)).toBe(
      "About 100 mL of oil left with 2,500 g of liquid — more than a compressor sump holds (60–90 mL): check the compressor for oil starvation and measure what drained.",
    );
  });

  it("takes no liquid as no oil, and refuses impossible figures by name", () => {
    expect(at(0).oilMl).toBe(0);
    expect(() => at(-1)).toThrow("liquidRecoveredG must be a non-negative mass in grams, got -1");
    const est = (extra: object) => () => estimateOilPulledMl({ liquidRecoveredG: 900, ...extra });
    expect(est({ oilMassFractionPct: 0 })().oilMl).toBe(0);
    expect(est({ oilMassFractionPct: 99 })).not.toThrow();
    for (const bad of [-1, 100, Number.NaN])
      expect(est({ oilMassFractionPct: bad }), String(bad)).toThrow("oilMassFractionPct must be in [0, 100)");
    for (const bad of [0, Number.NaN])
      expect(est({ oilDensityGPerMl: bad }), String(bad)).toThrow("oilDensityGPerMl must be positive");
    expect(est({ sumpMl: { minMl: 70, maxMl: 70 } })().sumpComparison).toBe("less_than_sump");
    for (const bad of [
      { minMl: 0, maxMl: 90 },
      { minMl: 90, maxMl: 60 },
    ])
      expect(est({ sumpMl: bad }), JSON.stringify(bad)).toThrow("sumpMl must be a positive range");
  });
});
