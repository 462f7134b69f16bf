import { describe, expect, it } from "vitest";
import { saturationPressure } from "@/lib/refrigerants";
import { extractEvidence } from "./evidence";
import { CYCLING } from "./grading";
import { formatMessage } from "./messages";
import type { DiagnosisInput } from "./schema";

// Saturation from the Tillner-Roth & Baehr (1994) R-134a equation of state, as bundled; gauge at sea level.
const gaugeAt = (tempC: number) => saturationPressure("R-134a", tempC) - 101.325;
const cycling = {
  refrigerant: "R-134a",
  expansionDevice: "orifice_tube",
  compressorType: "cycling_clutch",
  ambientC: 24,
} as const;
const ids = (input: DiagnosisInput) => extractEvidence(input).observations.map((o) => o.id);
const notes = (input: DiagnosisInput) =>
  extractEvidence(input)
    .notes.map((n) => formatMessage(n))
    .join(" ");

describe("a clutch that never switches off (common practice; thresholds from memory)", () => {
  const neverCycles: DiagnosisInput = {
    ...cycling,
    lowKpaGauge: gaugeAt(-9),
    symptoms: ["clutch_not_cycling"],
  };

  it("points to icing on a cycling clutch in mild weather with the low side below the cut-out", () => {
    expect(ids(neverCycles)).toContain("symptom:clutch_not_cycling");
  });

  it("is normal on a variable-displacement or electric compressor, at high load, or with the low side above the cut-out", () => {
    const inputs: DiagnosisInput[] = [
      { ...neverCycles, compressorType: "variable_displacement" },
      { ...neverCycles, compressorType: "electric" },
      { ...neverCycles, compressorType: undefined },
      { ...neverCycles, ambientC: CYCLING.mildAmbientMaxC + 1 },
      { ...neverCycles, lowKpaGauge: gaugeAt(CYCLING.cutOutC.min + 0.5) },
      { ...neverCycles, lowKpaGauge: undefined },
    ];
    for (const input of inputs) {
      expect(ids(input)).not.toContain("symptom:clutch_not_cycling");
    }
    expect(ids({ ...neverCycles, ambientC: CYCLING.mildAmbientMaxC })).toContain(
      "symptom:clutch_not_cycling",
    );
    expect(notes({ ...neverCycles, compressorType: "variable_displacement" })).toMatch(
      /normal on a variable-displacement compressor/,
    );
    expect(notes({ ...neverCycles, ambientC: 38 })).toMatch(
      /At 38\.0 °C the load keeps a cycling clutch engaged/,
    );
  });

  it("does not count a clutch or belt answer on an electric compressor, and halves rapid cycling on a variable one", () => {
    const electric: DiagnosisInput = {
      ...cycling,
      compressorType: "electric",
      symptoms: ["clutch_or_belt_slipping"],
    };
    expect(ids(electric)).not.toContain("symptom:clutch_or_belt_slipping");
    expect(notes(electric)).toMatch(/scan tool/);
    const variable = extractEvidence({
      ...cycling,
      compressorType: "variable_displacement",
      symptoms: ["clutch_rapid_cycling"],
    });
    expect(variable.observations.find((o) => o.id === "symptom:clutch_rapid_cycling")?.strength).toBe(0.5);
  });
});

describe("low side at cut-out and cut-in (switch opens near 22–25 psig, closes near 45–47 psig R-134a: common practice)", () => {
  const points = (cutOutC: number, cutInC: number) => ({
    ...cycling,
    lowCutOutKpaGauge: gaugeAt(cutOutC),
    lowCutInKpaGauge: gaugeAt(cutInC),
  });
  const { cutOutC, cutInC, marginK } = CYCLING;

  it("grades the cut-out and the cut-in on both sides of each limit", () => {
    expect(ids(points(-3, 10))).toContain("cycling:normal");
    expect(ids(points(cutOutC.min - marginK + 0.1, 10))).toContain("cycling:normal");
    expect(ids(points(cutOutC.min - marginK - 0.1, 10))).toContain("cycling:opens_late");
    expect(ids(points(cutOutC.max + marginK - 0.1, 10))).toContain("cycling:normal");
    expect(ids(points(cutOutC.max + marginK + 0.1, 10))).toContain("cycling:opens_early");
    expect(ids(points(-3, cutInC.max + marginK - 0.1))).toContain("cycling:normal");
    expect(ids(points(-3, cutInC.max + marginK + 0.1))).toContain("cycling:closes_late");
  });

  it("grades those, not a low-side reading taken anywhere in the swing, unless it sits well below the cut-out", () => {
    const inSwing = { ...points(-3, 10), lowKpaGauge: gaugeAt(-3.5) };
    expect(ids(inSwing).some((id) => id.startsWith("low_side:"))).toBe(false);
    const below = { ...points(-3, 10), lowKpaGauge: gaugeAt(-12) };
    expect(ids(below).some((id) => id.startsWith("low_side:"))).toBe(true);
    const snapshotOnly = extractEvidence({ ...cycling, lowKpaGauge: gaugeAt(-3.5) });
    expect(snapshotOnly.observations.find((o) => o.id.startsWith("low_side:"))?.strength).toBe(
      CYCLING.snapshotStrength,
    );
  });

  it("ignores cut-out and cut-in on a compressor that does not cycle its clutch", () => {
    const variable = { ...points(-12, 10), compressorType: "variable_displacement" } as const;
    expect(ids(variable).some((id) => id.startsWith("cycling:"))).toBe(false);
    expect(notes(variable)).toMatch(/applies to a cycling clutch only/);
  });
});
