import { describe, expect, it } from "vitest";
import { wetBulbC } from "@/lib/psychro";
import { standardBarometricKpa } from "@/lib/units/barometric";
import { extractEvidence, ventColdLimitC } from "./evidence";
import { AIR_PCT, PURITY_PASS_PCT, VENT_C } from "./grading";
import { formatMessage } from "./messages";
import type { DiagnosisInput } from "./schema";

// The identifier, charge and vent grades as the grading table states them, at their exact edges where the
// edge is a round figure a technician types (a reading is what was typed, not a computed value).
const base = { refrigerant: "R-134a", expansionDevice: "orifice_tube", ambientC: 25 } as const;
const idsOf = (input: DiagnosisInput) => extractEvidence(input).observations.map((o) => o.id);
const find = (input: DiagnosisInput, prefix: string) =>
  extractEvidence(input).observations.find((o) => o.id.startsWith(prefix));
const sentence = (input: DiagnosisInput, prefix: string) => {
  const observation = find(input, prefix);
  return observation ? formatMessage(observation.message) : "";
};

describe("the metering device is always stated", () => {
  it("names the valve or the orifice tube", () => {
    expect(idsOf({ ...base, expansionDevice: "txv" })[0]).toBe("device:txv");
    expect(idsOf(base)[0]).toBe("device:orifice_tube");
  });
});

describe("the refrigerant identifier (SAE J2099 / J2912 98 % pass mark; air grades from memory)", () => {
  it("passes at exactly the pass mark and says both figures", () => {
    expect(sentence({ ...base, identifierPurityPct: PURITY_PASS_PCT }, "purity:")).toBe(
      "Identifier purity 98 % passes (98 % or better).",
    );
    expect(sentence({ ...base, identifierPurityPct: 90 }, "purity:")).toBe(
      "Identifier purity 90 % is below the 98 % pass mark.",
    );
    const extraction = extractEvidence({ ...base, identifierPurityPct: 99 });
    expect(extraction.observedGroups.has("purity")).toBe(true);
    expect(extraction.observations.find((o) => o.id === "purity:pass")?.strength).toBeUndefined();
  });

  it("lets a pass say nothing once sealant was found, and says why", () => {
    const input: DiagnosisInput = { ...base, identifierPurityPct: 99.5, symptoms: ["sealant_found"] };
    expect(find(input, "purity:")?.strength).toBe(0);
    expect(extractEvidence(input).notes.map((n) => n.key)).toContain("note:identifier_blind_to_sealant");
    const failed: DiagnosisInput = { ...input, identifierPurityPct: 90 };
    expect(find(failed, "purity:")?.strength).toBeUndefined();
    expect(extractEvidence(failed).notes.map((n) => n.key)).not.toContain("note:identifier_blind_to_sealant");
    const noSealant = { ...base, identifierPurityPct: 99.5 } as const;
    expect(extractEvidence(noSealant).notes.map((n) => n.key)).not.toContain(
      "note:identifier_blind_to_sealant",
    );
  });

  it("grades air at its exact edges: under 1 % none, 1 % up to 3 % some, 3 % and more high", () => {
    const air = (identifierAirPct: number) => find({ ...base, identifierAirPct }, "air:")?.id;
    expect(air(AIR_PCT.some - 0.01)).toBe("air:none");
    expect(air(AIR_PCT.some)).toBe("air:some");
    expect(air(AIR_PCT.high - 0.01)).toBe("air:some");
    expect(air(AIR_PCT.high)).toBe("air:high");
    expect(extractEvidence({ ...base, identifierAirPct: 0 }).observedGroups.has("air")).toBe(true);
    expect(sentence({ ...base, identifierAirPct: 4 }, "air:")).toBe(
      "Identifier shows 4 % air, well above trace level.",
    );
  });

  it("skips the pressure checks when the identifier or the technician flags a hydrocarbon, and says so", () => {
    const readings = { staticKpaGauge: 500, highKpaGauge: 1200, lowKpaGauge: 200 };
    const flagged: DiagnosisInput = { ...base, ...readings, symptoms: ["identifier_flags_hydrocarbon"] };
    const extraction = extractEvidence(flagged);
    expect(extraction.notes.map((n) => n.key)).toContain("note:mixed_skips_pt");
    expect(extraction.observedGroups.has("static")).toBe(false);
    expect(extraction.observedGroups.has("high_side")).toBe(false);
    expect(extraction.computed.highKpaAbs).toBeUndefined();
    expect(idsOf(flagged)).toContain("symptom:identifier_flags_hydrocarbon");
    const clean = extractEvidence({ ...base, ...readings, identifierPurityPct: 99 });
    expect(clean.notes.map((n) => n.key)).not.toContain("note:mixed_skips_pt");
    expect(clean.observedGroups.has("high_side")).toBe(true);
  });

  it("notes the limits of the checks on an R-744 system only", () => {
    const notes = (refrigerant: DiagnosisInput["refrigerant"]) =>
      extractEvidence({ ...base, refrigerant }).notes.map((n) => n.key);
    expect(notes("R-744")).toContain("note:r744_limited");
    expect(notes("R-134a")).not.toContain("note:r744_limited");
  });
});

describe("the recovered charge against the label (the service record's own verdict)", () => {
  const charge = (recoveredChargeG: number) => ({ ...base, labelChargeG: 680, recoveredChargeG });

  it("says the shortfall in grams and a rounded percent", () => {
    // 680 − 500 = 180 g, 26.5 % of the label, said as 26 %.
    const extraction = extractEvidence(charge(500));
    expect(extraction.computed.chargeDeltaG).toBe(-180);
    expect(extraction.computed.chargeDeltaPct).toBeCloseTo(-26.47, 2);
    expect(extraction.observedGroups.has("charge")).toBe(true);
    expect(sentence(charge(500), "charge:")).toMatch(
      /^Recovered 500 g against a label charge of 680 g: 180 g \(26 %\) short/,
    );
  });

  it("says an overcharge in grams and a rounded percent", () => {
    expect(sentence(charge(740), "charge:")).toBe(
      "Recovered 740 g against a label charge of 680 g: 60 g (9 %) over.",
    );
  });

  it("maps every grade of the verdict to its observation, in order from empty to well over", () => {
    const grades = [0, 200, 500, 620, 675, 740, 900].map((g) => find(charge(g), "charge:")?.id);
    expect(grades).toEqual([
      "charge:empty",
      "charge:very_low",
      "charge:low",
      "charge:slightly_low",
      "charge:ok",
      "charge:high",
      "charge:very_high",
    ]);
    expect(sentence(charge(675), "charge:")).toBe(
      "Recovered 675 g against a label charge of 680 g: within what recovery leaves and the machine's accuracy (−1 %).",
    );
  });

  it("says nothing about the charge without both the label and the recovered mass", () => {
    expect(find({ ...base, labelChargeG: 680 }, "charge:")).toBeUndefined();
    expect(find({ ...base, recoveredChargeG: 680 }, "charge:")).toBeUndefined();
    expect(extractEvidence({ ...base, labelChargeG: 680 }).observedGroups.has("charge")).toBe(false);
  });
});

describe("the centre vent (grading table VENT_C)", () => {
  // 12 °C at 40 %: the wet bulb is under the 15 °C reference, so the cold limit is the 8 °C base.
  const mild = { ...base, ambientC: 12, relativeHumidityPct: 40 } as const;
  const vent = (ventC: number) => find({ ...mild, ventC }, "vent:")?.id;

  it("grades at the exact edges: under 2 °C freezing, up to the cold limit cold, 7 K past it warm", () => {
    expect(vent(VENT_C.freezing - 0.1)).toBe("vent:freezing");
    expect(vent(VENT_C.freezing)).toBe("vent:cold");
    expect(vent(VENT_C.coldBaseC)).toBe("vent:cold");
    expect(vent(VENT_C.coldBaseC + 0.1)).toBe("vent:cool");
    expect(vent(VENT_C.coldBaseC + VENT_C.warmAboveColdK - 0.1)).toBe("vent:cool");
    expect(vent(VENT_C.coldBaseC + VENT_C.warmAboveColdK)).toBe("vent:warm");
  });

  it("says the humidity only when it was measured", () => {
    expect(sentence({ ...mild, ventC: 5 }, "vent:")).toBe(
      "Centre vent 5.0 °C at 12.0 °C ambient and 40 % humidity: cooling well (8.0 °C or colder expected).",
    );
    expect(sentence({ ...base, ambientC: 12, ventC: 5 }, "vent:")).toBe(
      "Centre vent 5.0 °C at 12.0 °C ambient: cooling well (8.0 °C or colder expected).",
    );
    const extraction = extractEvidence({ ...mild, ventC: 5 });
    expect(extraction.observedGroups.has("vent")).toBe(true);
    expect(extraction.computed.ventColdMaxC).toBe(VENT_C.coldBaseC);
    expect(extraction.computed.wetBulbC).toBeLessThan(VENT_C.wetBulbRefC);
  });

  it("counts unknown humidity as 50 % and bone-dry air as 1 % (ASHRAE Fundamentals ch. 1 psychrometrics)", () => {
    expect(ventColdLimitC({ ambientC: 38 })).toEqual(
      ventColdLimitC({ ambientC: 38, relativeHumidityPct: 50 }),
    );
    const dry = ventColdLimitC({ ambientC: 45, relativeHumidityPct: 0 });
    expect(dry).toEqual(ventColdLimitC({ ambientC: 45, relativeHumidityPct: 1 }));
    expect(dry.wetBulbC).not.toBeNull();
  });

  it("takes the wet bulb at the altitude's pressure and raises the limit 0.4 K per K above 15 °C", () => {
    const highUp = ventColdLimitC({ ambientC: 35, relativeHumidityPct: 70, altitudeM: 2000 });
    const wetBulb = wetBulbC({
      dryBulbC: 35,
      relativeHumidityPct: 70,
      pressureKpa: standardBarometricKpa(2000),
    });
    expect(highUp.wetBulbC).toBe(wetBulb);
    expect(highUp.coldMaxC).toBeCloseTo(
      VENT_C.coldBaseC + (wetBulb - VENT_C.wetBulbRefC) * VENT_C.riseKPerKWetBulb,
      9,
    );
    const seaLevel = ventColdLimitC({ ambientC: 35, relativeHumidityPct: 70 });
    expect(seaLevel.wetBulbC).not.toBe(wetBulb);
  });
});

describe("the vent limit outside the psychrometric range", () => {
  it("falls back to the mild-weather limit with no wet bulb when the air is past the psychrometric range", () => {
    // The psychrometric functions refuse air past their range (lib/psychro); the vent limit then stays at its base.
    const hot = ventColdLimitC({ ambientC: 250, relativeHumidityPct: 50 });
    expect(hot).toEqual({ coldMaxC: VENT_C.coldBaseC, wetBulbC: null });
    const extraction = extractEvidence({ ...base, ambientC: 250, ventC: 6 });
    expect(extraction.computed.wetBulbC).toBeUndefined();
    expect(extraction.computed.ventColdMaxC).toBe(VENT_C.coldBaseC);
    expect(extraction.observations.find((o) => o.id.startsWith("vent:"))?.id).toBe("vent:cold");
  });
});

describe("symptoms", () => {
  it("adds no symptom when none was reported", () => {
    expect(idsOf(base).filter((id) => id.startsWith("symptom:"))).toEqual([]);
  });

  it("adds each reported symptom once and leaves the clutch ones to the clutch rules", () => {
    const ids = idsOf({
      ...base,
      compressorType: "electric",
      symptoms: ["worse_at_idle", "clutch_rapid_cycling", "clutch_or_belt_slipping"],
    });
    expect(ids.filter((id) => id === "symptom:worse_at_idle")).toHaveLength(1);
    expect(ids).not.toContain("symptom:clutch_rapid_cycling");
    expect(ids).not.toContain("symptom:clutch_or_belt_slipping");
  });
});
