import { describe, expect, it } from "vitest";
import { refrigerantInfo, saturationPressure } from "@/lib/refrigerants";
import { saturationTemperatureOrNull } from "@/lib/refrigerants/saturation-guard";
import { NEARLY_EMPTY_STATIC } from "@/lib/refrigerants/static-charge";
import { standardBarometricKpa } from "@/lib/units/barometric";
import { extractEvidence } from "./evidence";
import { soakQuality, staticReferenceC } from "./evidence-static";
import { STATIC_CHECK, STATIC_SOAK } from "./grading";
import { formatMessage } from "./messages";
import type { DiagnosisInput } from "./schema";

// The static check's rules as the grading table and the shared empty-system line state them; saturation
// from the physics core (R-134a: Tillner-Roth & Baehr 1994; R-744: Span & Wagner 1996).
const SEA_LEVEL_KPA = 101.325;
const base = { refrigerant: "R-134a", expansionDevice: "orifice_tube", ambientC: 25 } as const;
const soaked = { ...base, staticSoakC: 25, staticSoakMin: 120 } as const;
const atExcess = (excessK: number, input: DiagnosisInput = soaked) => ({
  ...input,
  staticKpaGauge: saturationPressure("R-134a", 25 + excessK) - SEA_LEVEL_KPA,
});
const staticObservation = (input: DiagnosisInput) =>
  extractEvidence(input).observations.find((o) => o.id.startsWith("static:"));
const said = (input: DiagnosisInput) => {
  const observation = staticObservation(input);
  return observation ? formatMessage(observation.message) : "";
};
const noteKeys = (input: DiagnosisInput) => extractEvidence(input).notes.map((n) => n.key);

describe("how far a soak can be trusted (grading table STATIC_SOAK)", () => {
  it("trusts a measured soak of the full time, and only that", () => {
    expect(soakQuality({ staticSoakC: 25, staticSoakMin: STATIC_SOAK.minMinutes })).toBe("measured");
    expect(soakQuality({ staticSoakC: 25, staticSoakMin: STATIC_SOAK.minMinutes - 1 })).toBe("short");
    expect(soakQuality({ staticSoakMin: STATIC_SOAK.minMinutes - 1 })).toBe("short");
    expect(soakQuality({ staticSoakMin: STATIC_SOAK.minMinutes })).toBe("unmeasured");
    expect(soakQuality({ staticSoakC: 25 })).toBe("unmeasured");
    expect(soakQuality({})).toBe("unmeasured");
  });

  it("judges at the parts' temperature when measured, else at the air's", () => {
    expect(staticReferenceC({ ambientC: 30, staticSoakC: 22 })).toBe(22);
    expect(staticReferenceC({ ambientC: 30 })).toBe(30);
  });
});

describe("the static sentences", () => {
  it("says which temperature was used, the soak time, and nothing about a weak soak when it was full", () => {
    expect(said(atExcess(5))).toBe(
      `Static pressure ${Math.round(saturationPressure("R-134a", 30) - SEA_LEVEL_KPA)} kPa gauge sits 5.0 K above saturation (564 kPa gauge) at the parts' soak temperature of 25.0 °C after 120 min of soak.`,
    );
  });

  it("says when the air stood in for the parts and the soak was not measured", () => {
    const input = atExcess(5, base);
    expect(said(input)).toMatch(
      /at the air temperature \(the parts' was not measured\) of 25\.0 °C — the soak was not measured, so this counts for less\.$/,
    );
    expect(staticObservation(input)?.strength).toBe(STATIC_SOAK.weakFactor);
  });

  it("says when the soak was short", () => {
    expect(said(atExcess(5, { ...soaked, staticSoakMin: 20 }))).toMatch(
      /after 20 min of soak — a short soak, so this counts for less; a longer soak and a repeat will settle it\.$/,
    );
  });

  it("counts no-liquid in full even after a short soak: a weak soak weakens the air check, not the charge", () => {
    const input = atExcess(-STATIC_CHECK.noLiquidBelowK - 1, { ...soaked, staticSoakMin: 10 });
    const observation = staticObservation(input);
    expect(observation?.id).toBe("static:no_liquid");
    expect(observation?.strength).toBe(1);
    expect(said(input)).toMatch(/sits 6\.0 K below saturation \(564 kPa gauge\)/);
  });

  it("states the tolerance on a normal reading", () => {
    expect(said(atExcess(0.5))).toMatch(/within 2\.0 K after 120 min of soak: no sign of air\.$/);
    expect(extractEvidence(atExcess(0.5)).computed.staticExcessK).toBeCloseTo(0.5, 3);
  });
});

describe("an empty system: under 70 kPa gauge or under half of saturation (shared empty-system line)", () => {
  // At 0 °C half of R-134a saturation is 146.4 kPa abs (45 kPa gauge): the 70 kPa gauge line is the higher.
  const cold = { ...base, ambientC: 0 } as const;
  it("holds the 70 kPa gauge line where half of saturation is lower, at sea level and at altitude", () => {
    for (const altitudeM of [0, 1500]) {
      const at = (staticKpaGauge: number) =>
        staticObservation({ ...cold, altitudeM, staticKpaGauge })?.id ?? "none";
      expect(at(NEARLY_EMPTY_STATIC.belowKpaGauge - 5)).toBe("static:empty");
      expect(at(NEARLY_EMPTY_STATIC.belowKpaGauge + 5)).not.toBe("static:empty");
    }
  });

  it("holds half of saturation where that is the higher line (25 °C: 332.7 kPa abs)", () => {
    const half = saturationPressure("R-134a", 25) * NEARLY_EMPTY_STATIC.belowFractionOfSaturation;
    expect(staticObservation({ ...soaked, staticKpaGauge: half - SEA_LEVEL_KPA - 2 })?.id).toBe(
      "static:empty",
    );
    expect(staticObservation({ ...soaked, staticKpaGauge: half - SEA_LEVEL_KPA + 2 })?.id).toBe(
      "static:no_liquid",
    );
  });

  it("says the saturation pressure beside an empty reading and counts the static group as read", () => {
    const extraction = extractEvidence({ ...soaked, staticKpaGauge: 20 });
    expect(extraction.observedGroups.has("static")).toBe(true);
    expect(extraction.computed.staticSaturationKpaAbs).toBeCloseTo(saturationPressure("R-134a", 25), 6);
    const observation = extraction.observations.find((o) => o.id === "static:empty");
    expect(observation && formatMessage(observation.message)).toBe(
      "Static pressure 20 kPa gauge at 25.0 °C, where saturation is 564 kPa gauge: the system is empty or nearly so.",
    );
  });

  it("still calls an R-744 system empty above its critical temperature, where the table ends", () => {
    const hot = { refrigerant: "R-744", expansionDevice: "txv", ambientC: 35, staticKpaGauge: 20 } as const;
    const extraction = extractEvidence(hot);
    const observation = extraction.observations.find((o) => o.id === "static:empty");
    expect(observation).toBeDefined();
    expect(observation?.message.values?.saturation).toBeUndefined();
    expect(extraction.computed.staticSaturationKpaAbs).toBeUndefined();
  });
});

describe("where the static check cannot judge", () => {
  it("says why an R-744 static above its critical temperature is not judged (Span & Wagner 1996)", () => {
    const input = {
      refrigerant: "R-744",
      expansionDevice: "txv",
      ambientC: 35,
      staticKpaGauge: 7000,
    } as const;
    const extraction = extractEvidence(input);
    expect(extraction.observations.some((o) => o.id.startsWith("static:"))).toBe(false);
    expect(extraction.observedGroups.has("static")).toBe(false);
    const note = extraction.notes.find((n) => n.key === "note:static_outside_table_co2");
    expect(note && formatMessage(note)).toBe(
      `Static pressure check not possible: 35.0 °C is outside the R-744 saturation table (CO2 has no liquid above about ${Math.round(refrigerantInfo("R-744").criticalTempC)} °C).`,
    );
  });

  it("says why a static reading past the critical pressure is not judged and counts no static group", () => {
    const input = { ...soaked, staticKpaGauge: 4500 } as const;
    const extraction = extractEvidence(input);
    expect(extraction.observations.some((o) => o.id.startsWith("static:"))).toBe(false);
    expect(extraction.observedGroups.has("static")).toBe(false);
    const note = extraction.notes.find((n) => n.key === "note:static_outside_table");
    expect(note && formatMessage(note)).toBe(
      "Static pressure check not possible: 25.0 °C is outside the R-134a saturation table.",
    );
  });

  it("says how warm the parts must be below −5 °C, judging nothing, not even an empty system", () => {
    const input = { ...base, ambientC: STATIC_CHECK.minReferenceC - 0.5, staticKpaGauge: 10 } as const;
    expect(staticObservation(input)).toBeUndefined();
    expect(noteKeys(input)).toContain("note:static_too_cold");
    const warmEnough = { ...input, ambientC: STATIC_CHECK.minReferenceC + 0.5 };
    expect(staticObservation(warmEnough)?.id).toBe("static:empty");
    expect(noteKeys(warmEnough)).not.toContain("note:static_too_cold");
  });

  it("keeps the absolute static pressure and the reference at altitude (ASHRAE Fundamentals ch. 1)", () => {
    const extraction = extractEvidence({ ...soaked, altitudeM: 1500, staticKpaGauge: 500 });
    expect(extraction.computed.staticKpaAbs).toBeCloseTo(500 + standardBarometricKpa(1500), 6);
    expect(extraction.computed.staticReferenceC).toBe(25);
    expect(extraction.computed.staticExcessKpa).toBeCloseTo(
      500 + standardBarometricKpa(1500) - saturationPressure("R-134a", 25),
      6,
    );
  });
});

describe("the static check exactly on its edges", () => {
  it("judges a reference of exactly −5 °C, and only colder is too cold", () => {
    const edge = { ...base, ambientC: STATIC_CHECK.minReferenceC, staticKpaGauge: 10 } as const;
    expect(staticObservation(edge)?.id).toBe("static:empty");
    expect(noteKeys(edge)).not.toContain("note:static_too_cold");
  });

  it("calls a static of exactly 70 kPa gauge not empty: the line is under 70 (at 0 °C, where it is the higher line)", () => {
    const edge = { ...base, ambientC: 0, staticKpaGauge: NEARLY_EMPTY_STATIC.belowKpaGauge } as const;
    expect(staticObservation(edge)?.id).toBe("static:no_liquid");
  });

  it("grades an excess of exactly 4 K and 7 K as the lower grade (grading table: up to 4, up to 7)", () => {
    // The parts' soak temperature is put exactly the excess under the reading's own saturation temperature.
    const staticKpaGauge = 900;
    const saturationC = saturationTemperatureOrNull("R-134a", staticKpaGauge + SEA_LEVEL_KPA)!;
    const at = (excessK: number) =>
      staticObservation({ ...soaked, staticSoakC: saturationC - excessK, staticKpaGauge })?.id;
    expect(at(STATIC_CHECK.highAboveK)).toBe("static:slightly_high");
    expect(at(STATIC_CHECK.veryHighAboveK)).toBe("static:high");
    expect(at(STATIC_CHECK.normalUpToK)).toBe("static:normal");
  });

  it("counts a judged static among the readings measured", () => {
    expect(extractEvidence(atExcess(0.5)).observedGroups.has("static")).toBe(true);
  });

  it("says so when the reference lies past the refrigerant's table (an input the schema would refuse)", () => {
    // R-134a's table ends at its critical temperature, 101.06 °C (Tillner-Roth & Baehr 1994).
    const input = { ...base, staticSoakC: 105, staticKpaGauge: 3000 } as const;
    expect(staticObservation(input)).toBeUndefined();
    const note = extractEvidence(input).notes.find((n) => n.key === "note:static_outside_table");
    expect(note && formatMessage(note)).toBe(
      "Static pressure check not possible: 105.0 °C is outside the R-134a saturation table.",
    );
  });
});
