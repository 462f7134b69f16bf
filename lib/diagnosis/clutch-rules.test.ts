import { describe, expect, it } from "vitest";
import { saturationPressure } from "@/lib/refrigerants";
import { extractEvidence } from "./evidence";
import { CYCLING } from "./grading";
import { formatMessage } from "./messages";
import type { DiagnosisInput } from "./schema";
import { SYMPTOM_LABELS } from "./symptoms";

// The clutch rules by compressor type (grading table CYCLING; common practice for the switch points), each
// branch with the note it leaves, so a reader learns why an answer did or did not count.
const gaugeAt = (tempC: number) => saturationPressure("R-134a", tempC) - 101.325;
const cycling: DiagnosisInput = {
  refrigerant: "R-134a",
  expansionDevice: "orifice_tube",
  compressorType: "cycling_clutch",
  ambientC: 24,
};
const noteKeys = (input: DiagnosisInput) => extractEvidence(input).notes.map((n) => n.key);
const find = (input: DiagnosisInput, id: string) =>
  extractEvidence(input).observations.find((o) => o.id === id);

const neverCycles: DiagnosisInput = { ...cycling, symptoms: ["clutch_not_cycling"] };

describe("a clutch that never switches off", () => {
  const never: DiagnosisInput = { ...cycling, symptoms: ["clutch_not_cycling"] };

  it("leaves one note naming why it did not count, per compressor type and condition", () => {
    expect(noteKeys({ ...never, compressorType: "variable_displacement" })).toContain(
      "note:never_cycles_variable",
    );
    expect(noteKeys({ ...never, compressorType: "electric" })).toContain("note:never_cycles_electric");
    expect(noteKeys({ ...never, compressorType: undefined })).toContain("note:never_cycles_type_unknown");
    expect(
      noteKeys({ ...never, ambientC: CYCLING.mildAmbientMaxC + 0.5, lowKpaGauge: gaugeAt(-9) }),
    ).toContain("note:never_cycles_high_load");
    expect(noteKeys(never)).toContain("note:never_cycles_low_side_unknown");
    expect(noteKeys({ ...never, lowKpaGauge: gaugeAt(CYCLING.cutOutC.min) })).toContain(
      "note:never_cycles_low_side_above",
    );
    for (const input of [never, { ...never, compressorType: "electric" as const }])
      expect(find(input, "symptom:clutch_not_cycling")).toBeUndefined();
  });

  it("says the ambient and the mild-weather limit, or the evaporating temperature against the cut-out", () => {
    const hot = extractEvidence({ ...never, ambientC: 35 }).notes.find(
      (n) => n.key === "note:never_cycles_high_load",
    );
    expect(hot?.values?.ambient?.value).toBe(35);
    expect(hot?.values?.mildMax?.value).toBe(CYCLING.mildAmbientMaxC);
    const above = extractEvidence({ ...never, lowKpaGauge: gaugeAt(2) }).notes.find(
      (n) => n.key === "note:never_cycles_low_side_above",
    );
    expect(above?.values?.evaporating?.value).toBeCloseTo(2, 3);
    expect(above?.values?.cutOut?.value).toBe(CYCLING.cutOutC.min);
  });

  it("counts as icing with the low side in vacuum or below the cut-out, in mild weather", () => {
    for (const lowKpaGauge of [0, -10, gaugeAt(CYCLING.cutOutC.min - 0.1)]) {
      const observation = find({ ...never, lowKpaGauge }, "symptom:clutch_not_cycling");
      expect(observation?.message.key, String(lowKpaGauge)).toBe("clutch:never_cycles_icing");
      expect(observation?.message.values?.cutOut?.value).toBe(CYCLING.cutOutC.min);
      expect(observation?.message.values?.ambient?.value).toBe(24);
    }
  });
});

describe("a clutch that never switches off, with the low side past the saturation table", () => {
  it("counts a deep vacuum as icing even where no evaporating temperature can be read from it", () => {
    const deep = { ...neverCycles, lowKpaGauge: -95 };
    expect(extractEvidence(deep).computed.evaporatingC).toBeUndefined();
    expect(find(deep, "symptom:clutch_not_cycling")?.message.key).toBe("clutch:never_cycles_icing");
    expect(noteKeys({ ...neverCycles, lowKpaGauge: undefined })).toContain(
      "note:never_cycles_low_side_unknown",
    );
  });

  it("needs both cut points before it says anything about them", () => {
    const variable = { ...cycling, compressorType: "variable_displacement" } as const;
    expect(noteKeys({ ...variable, lowCutOutKpaGauge: gaugeAt(-3) })).not.toContain(
      "note:cycling_points_not_cycling",
    );
    expect(noteKeys({ ...variable, lowCutInKpaGauge: gaugeAt(10) })).not.toContain(
      "note:cycling_points_not_cycling",
    );
  });
});

describe("clutch cycling fast and a slipping clutch or belt", () => {
  it("counts both in full on a cycling clutch, and a slipping belt in full on a variable compressor", () => {
    const both: DiagnosisInput = {
      ...cycling,
      symptoms: ["clutch_rapid_cycling", "clutch_or_belt_slipping"],
    };
    expect(find(both, "symptom:clutch_rapid_cycling")?.strength).toBeUndefined();
    expect(find(both, "symptom:clutch_or_belt_slipping")?.strength).toBeUndefined();
    const variable = { ...both, compressorType: "variable_displacement" as const };
    expect(find(variable, "symptom:clutch_rapid_cycling")?.strength).toBe(
      CYCLING.variableRapidCyclingStrength,
    );
    expect(find(variable, "symptom:clutch_or_belt_slipping")?.strength).toBeUndefined();
  });

  it("says on an electric compressor, in the answer's own words, that there is no clutch", () => {
    const extraction = extractEvidence({
      ...cycling,
      compressorType: "electric",
      symptoms: ["clutch_rapid_cycling"],
    });
    const note = extraction.notes.find((n) => n.key === "note:no_clutch_electric");
    expect(note?.words?.symptom).toBe(SYMPTOM_LABELS.clutch_rapid_cycling.toLowerCase());
    expect(extraction.observations.some((o) => o.id === "symptom:clutch_rapid_cycling")).toBe(false);
  });
});

describe("the cut points", () => {
  const points = (cutOut: number, cutIn: number): DiagnosisInput => ({
    ...cycling,
    lowCutOutKpaGauge: cutOut,
    lowCutInKpaGauge: cutIn,
  });

  it("keeps their saturation temperatures and counts the cycling group as read", () => {
    const extraction = extractEvidence(points(gaugeAt(-3), gaugeAt(10)));
    expect(extraction.computed.cutOutC).toBeCloseTo(-3, 3);
    expect(extraction.computed.cutInC).toBeCloseTo(10, 3);
    expect(extraction.observedGroups.has("cycling")).toBe(true);
    const observation = extraction.observations.find((o) => o.id === "cycling:normal");
    expect(observation?.message.values?.cutOut?.value).toBeCloseTo(gaugeAt(-3), 6);
    expect(observation?.message.values?.cutIn?.value).toBeCloseTo(gaugeAt(10), 6);
    expect(observation?.message.values?.cutInMax?.value).toBe(CYCLING.cutInC.max);
    expect(observation?.message.values?.cutOutMax?.value).toBe(CYCLING.cutOutC.max);
    expect(observation && formatMessage(observation.message)).not.toMatch(/…/);
  });

  it("needs both points, and grades nothing when either is off the table", () => {
    expect(
      extractEvidence({ ...cycling, lowCutOutKpaGauge: gaugeAt(-3) }).observedGroups.has("cycling"),
    ).toBe(false);
    // The R-134a table starts at 51.2 kPa abs (−40 °C): −60 kPa gauge is below it.
    for (const input of [points(-60, gaugeAt(10)), points(gaugeAt(-3), -60)]) {
      const extraction = extractEvidence(input);
      expect(extraction.observedGroups.has("cycling")).toBe(false);
      expect(extraction.observations.some((o) => o.id.startsWith("cycling:"))).toBe(false);
    }
  });

  it("notes cut points recorded on a compressor that does not cycle its clutch", () => {
    expect(noteKeys({ ...points(gaugeAt(-3), gaugeAt(10)), compressorType: "electric" })).toContain(
      "note:cycling_points_not_cycling",
    );
    expect(noteKeys(points(gaugeAt(-3), gaugeAt(10)))).not.toContain("note:cycling_points_not_cycling");
  });
});
