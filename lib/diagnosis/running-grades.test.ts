import { describe, expect, it } from "vitest";
import { saturationPressure } from "@/lib/refrigerants";
import { CONDENSING_ABOVE_AMBIENT_K, EVAPORATING_C, humidityShiftK } from "@/lib/refrigerants/expected-bands";
import { extractEvidence } from "./evidence";
import {
  CYCLING,
  FALLBACK_CONDENSING_OVER_AMBIENT_K,
  FALLBACK_EVAPORATING_C,
  HIGH_SIDE_FAR_K,
  LIFT_CLOSE_MARGIN_K,
  LOW_SIDE_FAR_BELOW_K,
  SUBCOOLING_K,
  SUPERHEAT_K,
  SUPERHEAT_LOAD,
} from "./grading";
import { formatMessage } from "./messages";
import type { DiagnosisInput } from "./schema";

// Each grade of the running readings on both sides of each of its edges, the edges taken from the grading
// table and the expected bands (condensing ambient + 14…30 K, evaporating −4…8 °C at neutral humidity).
// Pressures come from the physics core's saturation curve (R-134a: Tillner-Roth & Baehr 1994), so a
// reading `satC` is the gauge pressure that saturates at satC at sea level (101.325 kPa, ISO 2533).
const SEA_LEVEL_KPA = 101.325;
const atSat = (satC: number) => saturationPressure("R-134a", satC) - SEA_LEVEL_KPA;
const AMBIENT_C = 30;
const base = {
  refrigerant: "R-134a",
  expansionDevice: "orifice_tube",
  ambientC: AMBIENT_C,
  relativeHumidityPct: 50,
} as const satisfies DiagnosisInput;
const idsOf = (input: DiagnosisInput) => extractEvidence(input).observations.map((o) => o.id);
const gradeOf = (input: DiagnosisInput, group: string) =>
  idsOf(input).filter((id) => id.startsWith(`${group}:`));
const EPS = 0.1;

describe("the high side against its band, both sides of every edge", () => {
  const min = AMBIENT_C + CONDENSING_ABOVE_AMBIENT_K.min;
  const max = AMBIENT_C + CONDENSING_ABOVE_AMBIENT_K.max;
  const high = (satC: number) => gradeOf({ ...base, highKpaGauge: atSat(satC) }, "high_side");

  it.each([
    [min - HIGH_SIDE_FAR_K.below - EPS, "high_side:very_low"],
    [min - HIGH_SIDE_FAR_K.below + EPS, "high_side:low"],
    [min - EPS, "high_side:low"],
    [min + EPS, "high_side:normal"],
    [max - EPS, "high_side:normal"],
    [max + EPS, "high_side:high"],
    [max + HIGH_SIDE_FAR_K.above - EPS, "high_side:high"],
    [max + HIGH_SIDE_FAR_K.above + EPS, "high_side:very_high"],
  ])("condensing at %f °C grades %s", (satC, id) => {
    expect(high(satC)).toEqual([id]);
  });

  it("states the band in pressure and temperature, and the condensing approach over the air", () => {
    const extraction = extractEvidence({ ...base, highKpaGauge: atSat(50) });
    expect(extraction.computed.highKpaAbs).toBeCloseTo(atSat(50) + SEA_LEVEL_KPA, 6);
    expect(extraction.computed.condensingC).toBeCloseTo(50, 3);
    expect(extraction.computed.condensingApproachK).toBeCloseTo(50 - AMBIENT_C, 3);
    expect(extraction.computed.expectedHigh?.minSaturationC).toBe(min);
    expect(extraction.computed.expectedHigh?.maxSaturationC).toBe(max);
    expect(extraction.computed.expectedHigh?.minKpaGauge).toBeCloseTo(atSat(min), 6);
    expect(extraction.computed.expectedHigh?.maxKpaGauge).toBeCloseTo(atSat(max), 6);
    expect(extraction.observedGroups.has("high_side")).toBe(true);
    const observation = extraction.observations.find((o) => o.id === "high_side:normal");
    expect(observation?.message.values?.bandMin?.value).toBeCloseTo(atSat(min), 6);
    expect(observation?.message.values?.bandMax?.value).toBeCloseTo(atSat(max), 6);
    expect(observation?.message.values?.bandMinSat?.value).toBe(min);
    expect(observation?.message.values?.bandMaxSat?.value).toBe(max);
    expect(observation?.message.values?.ambient?.value).toBe(AMBIENT_C);
    expect(observation?.message.values?.condensing?.value).toBeCloseTo(50, 3);
  });

  it("leaves a high side under the table's bottom (a vacuum there) ungraded with a note, not as transcritical", () => {
    // The R-134a table starts at −40 °C, 51.2 kPa abs (Tillner-Roth & Baehr 1994): −60 kPa gauge is below it.
    const extraction = extractEvidence({ ...base, highKpaGauge: -60 });
    expect(gradeOf({ ...base, highKpaGauge: -60 }, "high_side")).toEqual([]);
    expect(extraction.observedGroups.has("high_side")).toBe(false);
    expect(extraction.computed.highSideTranscritical).toBeUndefined();
    expect(extraction.notes.map((n) => n.key)).toContain("note:high_outside_table");
    expect(extraction.notes.map((n) => n.key)).not.toContain("note:transcritical");
  });
});

describe("the low side against its band, both sides of every edge", () => {
  const low = (satC: number, extra: Partial<DiagnosisInput> = {}) =>
    gradeOf({ ...base, lowKpaGauge: atSat(satC), ...extra }, "low_side");

  it.each([
    [EVAPORATING_C.min - LOW_SIDE_FAR_BELOW_K - EPS, "low_side:very_low"],
    [EVAPORATING_C.min - LOW_SIDE_FAR_BELOW_K + EPS, "low_side:low"],
    [EVAPORATING_C.min - EPS, "low_side:low"],
    [EVAPORATING_C.min + EPS, "low_side:normal"],
    [EVAPORATING_C.max - EPS, "low_side:normal"],
    [EVAPORATING_C.max + EPS, "low_side:high"],
  ])("evaporating at %f °C grades %s", (satC, id) => {
    expect(low(satC)).toEqual([id]);
  });

  it("calls exactly atmospheric pressure (0 kPa gauge) a vacuum and works out no superheat from it", () => {
    const extraction = extractEvidence({ ...base, lowKpaGauge: 0, suctionLineC: 10 });
    expect(gradeOf({ ...base, lowKpaGauge: 0 }, "low_side")).toEqual(["low_side:vacuum"]);
    expect(extraction.observedGroups.has("low_side")).toBe(true);
    expect(extraction.computed.superheatK).toBeUndefined();
    expect(extraction.computed.lowKpaAbs).toBeCloseTo(SEA_LEVEL_KPA, 6);
  });

  it("works out superheat from a low side just above atmospheric pressure", () => {
    const extraction = extractEvidence({ ...base, lowKpaGauge: 1, suctionLineC: 0 });
    expect(extraction.computed.superheatK).toBeDefined();
    expect(extraction.computed.evaporatingC).toBeLessThan(-20);
  });

  it("states the low band in pressure and keeps the evaporating temperature", () => {
    const extraction = extractEvidence({ ...base, lowKpaGauge: atSat(2) });
    expect(extraction.computed.evaporatingC).toBeCloseTo(2, 3);
    expect(extraction.computed.expectedLow?.minKpaGauge).toBeCloseTo(atSat(EVAPORATING_C.min), 6);
    expect(extraction.computed.expectedLow?.maxKpaGauge).toBeCloseTo(atSat(EVAPORATING_C.max), 6);
    expect(extraction.observedGroups.has("low_side")).toBe(true);
    const observation = extraction.observations.find((o) => o.id === "low_side:normal");
    expect(observation?.strength).toBeUndefined();
    expect(observation?.message.values?.evaporating?.value).toBeCloseTo(2, 3);
    expect(observation?.message.values?.bandMin?.value).toBeCloseTo(atSat(EVAPORATING_C.min), 6);
  });
});

describe("a cycling clutch's low side (grading table CYCLING)", () => {
  const cycling = { ...base, compressorType: "cycling_clutch" } as const;
  const cutOut = atSat(-3);
  const cutIn = atSat(10);

  it("counts one reading for half and says the low side swings", () => {
    const extraction = extractEvidence({ ...cycling, lowKpaGauge: atSat(2) });
    const observation = extraction.observations.find((o) => o.id === "low_side:normal");
    expect(observation?.strength).toBe(CYCLING.snapshotStrength);
    expect(extraction.notes.map((n) => n.key)).toContain("note:low_side_in_swing");
  });

  it("does not grade a reading inside the recorded swing a second time", () => {
    const extraction = extractEvidence({
      ...cycling,
      lowKpaGauge: atSat(-3 - CYCLING.marginK + EPS),
      lowCutOutKpaGauge: cutOut,
      lowCutInKpaGauge: cutIn,
    });
    expect(extraction.observations.some((o) => o.id.startsWith("low_side:"))).toBe(false);
    expect(extraction.notes.map((n) => n.key)).toContain("note:low_side_graded_at_cut_points");
    expect(extraction.notes.map((n) => n.key)).not.toContain("note:low_side_in_swing");
  });

  it("grades a reading below the cut-out by more than the margin: the switch should have opened", () => {
    const extraction = extractEvidence({
      ...cycling,
      lowKpaGauge: atSat(-3 - CYCLING.marginK - EPS),
      lowCutOutKpaGauge: cutOut,
      lowCutInKpaGauge: cutIn,
    });
    expect(extraction.observations.map((o) => o.id)).toContain("low_side:low");
  });

  it("grades the reading as one point of the swing when the cut-in or the cut-out is missing", () => {
    for (const points of [{ lowCutOutKpaGauge: cutOut }, { lowCutInKpaGauge: cutIn }]) {
      const extraction = extractEvidence({ ...cycling, lowKpaGauge: atSat(2), ...points });
      expect(extraction.observations.find((o) => o.id === "low_side:normal")?.strength).toBe(
        CYCLING.snapshotStrength,
      );
    }
  });

  it("grades a steady compressor's low side in full even with cut points recorded", () => {
    const extraction = extractEvidence({
      ...base,
      compressorType: "variable_displacement",
      lowKpaGauge: atSat(2),
      lowCutOutKpaGauge: cutOut,
      lowCutInKpaGauge: cutIn,
    });
    const observation = extraction.observations.find((o) => o.id === "low_side:normal");
    expect(observation).toBeDefined();
    expect(observation?.strength).toBeUndefined();
    expect(extraction.notes.map((n) => n.key)).not.toContain("note:low_side_in_swing");
  });
});

describe("the compressor's lift and the not-pumping pattern", () => {
  const smallestNormalLiftK = AMBIENT_C + CONDENSING_ABOVE_AMBIENT_K.min - EVAPORATING_C.max; // 44 − 8 = 36 K at 30 °C
  const lift = (condensingC: number, evaporatingC: number) =>
    extractEvidence({ ...base, highKpaGauge: atSat(condensingC), lowKpaGauge: atSat(evaporatingC) });

  it("calls the sides close from the margin under the smallest normal lift, not before", () => {
    const closeLimitK = smallestNormalLiftK - LIFT_CLOSE_MARGIN_K;
    const liftIds = (condensingC: number, evaporatingC: number) =>
      lift(condensingC, evaporatingC)
        .observations.map((o) => o.id)
        .filter((id) => id.startsWith("lift:"));
    expect(liftIds(5 + closeLimitK - EPS, 5)).toEqual(["lift:close"]);
    expect(liftIds(5 + closeLimitK + EPS, 5)).toEqual(["lift:normal"]);
    const extraction = lift(50, 2);
    expect(extraction.computed.liftK).toBeCloseTo(48, 3);
    const observation = extraction.observations.find((o) => o.id === "lift:normal");
    expect(observation?.message.values?.minLift?.value).toBeCloseTo(smallestNormalLiftK, 9);
    expect(observation?.message.values?.lift?.value).toBeCloseTo(48, 3);
  });

  it("reads a high low side with a low or very low high side as a compressor not pumping", () => {
    const pattern = (condensingC: number, evaporatingC: number) =>
      idsOf({ ...base, highKpaGauge: atSat(condensingC), lowKpaGauge: atSat(evaporatingC) }).includes(
        "pattern:compressor_not_pumping",
      );
    expect(pattern(40, 12)).toBe(true); // high side low, low side high
    expect(pattern(30, 12)).toBe(true); // high side very low, low side high
    expect(pattern(50, 12)).toBe(false); // high side normal
    expect(pattern(40, 5)).toBe(false); // low side normal
    const extraction = extractEvidence({ ...base, highKpaGauge: atSat(40), lowKpaGauge: atSat(12) });
    const observation = extraction.observations.find((o) => o.id === "pattern:compressor_not_pumping");
    expect(observation?.message.values?.high?.value).toBeCloseTo(atSat(40), 6);
    expect(observation?.message.values?.low?.value).toBeCloseTo(atSat(12), 6);
  });
});

describe("subcooling grades per metering device, both sides of every edge", () => {
  const condensingC = 50;
  const subcooling = (device: "txv" | "orifice_tube", subcoolingK: number) =>
    gradeOf(
      {
        ...base,
        expansionDevice: device,
        highKpaGauge: atSat(condensingC),
        liquidLineC: condensingC - subcoolingK,
      },
      "subcooling",
    );

  for (const device of ["txv", "orifice_tube"] as const) {
    const t = SUBCOOLING_K[device];
    it.each([
      [t.none - EPS, "subcooling:none"],
      [t.none + EPS, "subcooling:low"],
      [t.low - EPS, "subcooling:low"],
      [t.low + EPS, "subcooling:normal"],
      [t.high - EPS, "subcooling:normal"],
      [t.high + EPS, "subcooling:high"],
      [t.veryHigh - EPS, "subcooling:high"],
      [t.veryHigh + EPS, "subcooling:very_high"],
    ])(`${device}: %f K grades %s`, (subcoolingK, id) => {
      expect(subcooling(device, subcoolingK)).toEqual([id]);
    });
  }

  it("states the typical range of the device beside the reading", () => {
    const extraction = extractEvidence({
      ...base,
      expansionDevice: "txv",
      highKpaGauge: atSat(condensingC),
      liquidLineC: 42,
    });
    expect(extraction.observedGroups.has("subcooling")).toBe(true);
    const observation = extraction.observations.find((o) => o.id === "subcooling:normal");
    expect(observation?.message.values?.typicalMin?.value).toBe(SUBCOOLING_K.txv.low);
    expect(observation?.message.values?.typicalMax?.value).toBe(SUBCOOLING_K.txv.high);
    expect(observation?.message.values?.liquid?.value).toBe(42);
  });
});

describe("superheat grades per metering device and load, both sides of every edge", () => {
  const evaporatingC = 2;
  const superheat = (device: "txv" | "orifice_tube", superheatK: number, ambientC = AMBIENT_C) =>
    gradeOf(
      {
        ...base,
        ambientC,
        expansionDevice: device,
        lowKpaGauge: atSat(evaporatingC),
        suctionLineC: evaporatingC + superheatK,
      },
      "superheat",
    );

  it("grades an expansion-valve system's superheat at 2, 10 and 20 K whatever the load", () => {
    const t = SUPERHEAT_K.txv;
    for (const ambientC of [AMBIENT_C, 40]) {
      expect(superheat("txv", t.nearZero - EPS, ambientC)).toEqual(["superheat:near_zero"]);
      expect(superheat("txv", t.nearZero + EPS, ambientC)).toEqual(["superheat:normal"]);
      expect(superheat("txv", t.high - EPS, ambientC)).toEqual(["superheat:normal"]);
      expect(superheat("txv", t.high + EPS, ambientC)).toEqual(["superheat:high"]);
      expect(superheat("txv", t.veryHigh - EPS, ambientC)).toEqual(["superheat:high"]);
      expect(superheat("txv", t.veryHigh + EPS, ambientC)).toEqual(["superheat:very_high"]);
    }
  });

  it("never calls an orifice-tube system's near-zero superheat a fault: its evaporator floods by design", () => {
    expect(superheat("orifice_tube", 0)).toEqual(["superheat:normal"]);
    expect(superheat("orifice_tube", -1)).toEqual(["superheat:normal"]);
  });

  it("grades an orifice-tube system's superheat at its own edges, raised with the load above 30 °C", () => {
    const t = SUPERHEAT_K.orifice_tube;
    for (const ambientC of [20, AMBIENT_C, 40]) {
      const loadK = Math.max(0, ambientC - SUPERHEAT_LOAD.fromC) * SUPERHEAT_LOAD.kPerK;
      expect(superheat("orifice_tube", t.high + loadK - EPS, ambientC)).toEqual(["superheat:normal"]);
      expect(superheat("orifice_tube", t.high + loadK + EPS, ambientC)).toEqual(["superheat:high"]);
      expect(superheat("orifice_tube", t.veryHigh + loadK - EPS, ambientC)).toEqual(["superheat:high"]);
      expect(superheat("orifice_tube", t.veryHigh + loadK + EPS, ambientC)).toEqual(["superheat:very_high"]);
    }
  });

  it("names the metering device in its sentence and keeps the figures", () => {
    const sentence = (device: "txv" | "orifice_tube") => {
      const extraction = extractEvidence({
        ...base,
        expansionDevice: device,
        lowKpaGauge: atSat(evaporatingC),
        suctionLineC: evaporatingC + 3,
      });
      expect(extraction.computed.superheatK).toBeCloseTo(3, 3);
      expect(extraction.observedGroups.has("superheat")).toBe(true);
      const observation = extraction.observations.find((o) => o.id.startsWith("superheat:"));
      expect(observation?.message.values?.suction?.value).toBe(evaporatingC + 3);
      expect(observation?.message.values?.evaporating?.value).toBeCloseTo(evaporatingC, 3);
      return observation ? formatMessage(observation.message) : "";
    };
    expect(sentence("txv")).toMatch(/for an expansion-valve system/);
    expect(sentence("orifice_tube")).toMatch(/for an orifice-tube system/);
  });
});

describe("bands without the tables", () => {
  it("falls back to ambient + 14…30 K and −4…8 °C below the tables' 10 °C ambient, in temperature only", () => {
    const extraction = extractEvidence({
      ...base,
      ambientC: 5,
      highKpaGauge: atSat(25),
      lowKpaGauge: atSat(0),
    });
    expect(extraction.computed.expectedHigh).toEqual({
      minSaturationC: 5 + FALLBACK_CONDENSING_OVER_AMBIENT_K.min,
      maxSaturationC: 5 + FALLBACK_CONDENSING_OVER_AMBIENT_K.max,
    });
    expect(extraction.computed.expectedLow).toEqual({
      minSaturationC: FALLBACK_EVAPORATING_C.min,
      maxSaturationC: FALLBACK_EVAPORATING_C.max,
    });
    const high = extraction.observations.find((o) => o.id === "high_side:normal");
    expect(high?.message.values?.bandMin).toBeUndefined();
    expect(high?.message.values?.bandMinSat?.value).toBe(5 + FALLBACK_CONDENSING_OVER_AMBIENT_K.min);
  });

  it("uses the fallback for R-744 when its band would run past the critical point (Span & Wagner 1996)", () => {
    const extraction = extractEvidence({
      refrigerant: "R-744",
      expansionDevice: "txv",
      ambientC: 0,
      highKpaGauge: 5000,
    });
    expect(extraction.computed.expectedHigh).toEqual({
      minSaturationC: FALLBACK_CONDENSING_OVER_AMBIENT_K.min,
      maxSaturationC: FALLBACK_CONDENSING_OVER_AMBIENT_K.max,
    });
    expect(extraction.observations.map((o) => o.id)).toContain("high_side:normal");
  });
});

describe("exactly on an edge (the grading table's edges are inclusive where it says 'up to')", () => {
  // The reading's saturation temperature is taken from the physics core first, then the edge is put exactly
  // on it: through the ambient for the high side's band (edges ambient + 14 and + 30 K, far 10 K below and
  // 8 K above), and through the line temperature for subcooling and superheat. Temperatures between 32 and
  // 64 °C keep these sums exact in binary floating point.
  const condensingOf = (highKpaGauge: number) =>
    extractEvidence({ ...base, highKpaGauge }).computed.condensingC!;

  it("grades a high side exactly on each band edge as the inner grade", () => {
    const high = atSat(52);
    const c = condensingOf(high);
    const at = (ambientC: number) =>
      gradeOf({ ...base, ambientC, relativeHumidityPct: undefined, highKpaGauge: high }, "high_side");
    // c = ambient + 14 − 10: the far edge below belongs to "low".
    expect(at(c - CONDENSING_ABOVE_AMBIENT_K.min + HIGH_SIDE_FAR_K.below)).toEqual(["high_side:low"]);
    // c = ambient + 14: the lower edge belongs to "normal".
    expect(at(c - CONDENSING_ABOVE_AMBIENT_K.min)).toEqual(["high_side:normal"]);
    // c = ambient + 30: the upper edge belongs to "normal".
    expect(at(c - CONDENSING_ABOVE_AMBIENT_K.max)).toEqual(["high_side:normal"]);
    // c = ambient + 30 + 8: the far edge above belongs to "high".
    expect(at(c - CONDENSING_ABOVE_AMBIENT_K.max - HIGH_SIDE_FAR_K.above)).toEqual(["high_side:high"]);
  });

  it("calls a lift exactly at the margin under the smallest normal lift normal: only less is close", () => {
    const valve = { ...base, expansionDevice: "txv", relativeHumidityPct: undefined } as const;
    const sides = { highKpaGauge: atSat(45), lowKpaGauge: atSat(2) };
    const liftK = extractEvidence({ ...valve, ...sides }).computed.liftK!;
    // Smallest normal lift = (ambient + 14) − 8 on a valve system at neutral humidity; the margin is 5 K.
    const ambientC = liftK - (CONDENSING_ABOVE_AMBIENT_K.min - EVAPORATING_C.max - LIFT_CLOSE_MARGIN_K);
    const extraction = extractEvidence({ ...valve, ...sides, ambientC });
    const lift = extraction.observations.find((o) => o.id.startsWith("lift:"));
    expect(lift?.message.values?.minLift?.value).toBe(liftK + LIFT_CLOSE_MARGIN_K);
    expect(lift?.id).toBe("lift:normal");
  });

  it("grades subcooling exactly on each edge as the lower grade", () => {
    const c = condensingOf(atSat(50));
    for (const device of ["txv", "orifice_tube"] as const) {
      const t = SUBCOOLING_K[device];
      const at = (k: number) =>
        gradeOf(
          { ...base, expansionDevice: device, highKpaGauge: atSat(50), liquidLineC: c - k },
          "subcooling",
        );
      expect(at(t.none)).toEqual(["subcooling:none"]);
      expect(at(t.low)).toEqual(["subcooling:normal"]);
      expect(at(t.high)).toEqual(["subcooling:normal"]);
      expect(at(t.veryHigh)).toEqual(["subcooling:high"]);
    }
  });

  it("grades superheat exactly on each edge", () => {
    // A low side evaporating near 33 °C is no working system, but superheat is graded on its own.
    const low = atSat(33);
    const e = extractEvidence({ ...base, lowKpaGauge: low }).computed.evaporatingC!;
    const at = (device: "txv" | "orifice_tube", k: number) =>
      gradeOf({ ...base, expansionDevice: device, lowKpaGauge: low, suctionLineC: e + k }, "superheat");
    expect(at("txv", SUPERHEAT_K.txv.nearZero)).toEqual(["superheat:normal"]);
    expect(at("txv", SUPERHEAT_K.txv.high)).toEqual(["superheat:normal"]);
    expect(at("txv", SUPERHEAT_K.txv.veryHigh)).toEqual(["superheat:high"]);
  });

  it("reads a high side exactly at the critical pressure as transcritical (Span & Wagner 1996: 7,377.3 kPa abs)", () => {
    const critical = 7377.3;
    const highKpaGauge = critical - SEA_LEVEL_KPA;
    const input = { refrigerant: "R-744", expansionDevice: "txv", ambientC: 25, highKpaGauge } as const;
    const extraction = extractEvidence(input);
    expect(extraction.computed.highKpaAbs).toBe(critical);
    expect(extraction.computed.highSideTranscritical).toBe(true);
    expect(extraction.computed.condensingC).toBeUndefined();
    expect(extraction.notes.map((n) => n.key)).toContain("note:transcritical");
  });
});

describe("what the running notes say", () => {
  const noteText = (input: DiagnosisInput, key: string) => {
    const note = extractEvidence(input).notes.find((n) => n.key === key);
    return note ? formatMessage(note) : "";
  };

  it("names the refrigerant and the reading when a side cannot be graded", () => {
    expect(noteText({ ...base, highKpaGauge: -60 }, "note:high_outside_table")).toBe(
      "High side −60 kPa gauge is outside the saturation table for R-134a; it was not graded.",
    );
    // Above the critical pressure no saturation temperature exists (Tillner-Roth & Baehr 1994: 4,059.3 kPa abs).
    expect(noteText({ ...base, lowKpaGauge: 4000 }, "note:low_outside_table")).toBe(
      "Low side 4000 kPa gauge is outside the saturation table for R-134a; it was not graded.",
    );
    expect(gradeOf({ ...base, lowKpaGauge: 4000 }, "low_side")).toEqual([]);
    expect(
      noteText(
        { refrigerant: "R-744", expansionDevice: "txv", ambientC: 35, highKpaGauge: 9500 },
        "note:transcritical",
      ),
    ).toMatch(/^High side 9500 kPa gauge is above the critical pressure of R-744/);
  });

  it("says a vacuum on the low side in its own sentence", () => {
    const observation = extractEvidence({ ...base, lowKpaGauge: -20 }).observations.find(
      (o) => o.id === "low_side:vacuum",
    );
    expect(observation?.message.key).toBe("low_side:vacuum");
    expect(observation && formatMessage(observation.message)).toBe(
      "Low side −20 kPa gauge is at or below atmospheric pressure (vacuum) while running.",
    );
  });

  it("works out no lift from one side alone", () => {
    expect(gradeOf({ ...base, highKpaGauge: atSat(50) }, "lift")).toEqual([]);
    expect(gradeOf({ ...base, lowKpaGauge: atSat(2) }, "lift")).toEqual([]);
    expect(extractEvidence({ ...base, highKpaGauge: atSat(50) }).computed.liftK).toBeUndefined();
  });

  it("grades a cycling clutch's low side when the cut-out is off the table, as one point of the swing", () => {
    const extraction = extractEvidence({
      ...base,
      compressorType: "cycling_clutch",
      lowKpaGauge: atSat(2),
      lowCutOutKpaGauge: -60,
      lowCutInKpaGauge: atSat(10),
    });
    expect(extraction.observations.find((o) => o.id === "low_side:normal")?.strength).toBe(
      CYCLING.snapshotStrength,
    );
  });
});

describe("the low side exactly on its band's edges", () => {
  // The low band's edges move with the humidity (expected-bands: up to 2 K at the extremes). For a reading's
  // own evaporating temperature, find the humidity that puts an edge exactly on it: the shift changes far
  // more finely with the humidity than the temperatures' last digit, so an exact match exists nearby.
  const valve = { ...base, expansionDevice: "txv" } as const;
  const humidityPutting = (edgeC: (shiftK: number) => number, targetC: number, guessPct: number) => {
    for (let k = 0; k < 20000; k++) {
      for (const sign of [1, -1]) {
        const pct = guessPct + sign * k * 4e-15 * guessPct;
        if (edgeC(humidityShiftK(pct)) === targetC) return pct;
      }
    }
    throw new Error(`no humidity puts the edge on ${targetC}`);
  };
  const gradeAtEdge = (satC: number, edgeC: (shiftK: number) => number) => {
    const lowKpaGauge = atSat(satC);
    const e = extractEvidence({ ...valve, lowKpaGauge }).computed.evaporatingC!;
    const guess = 50 + 25 * (e - edgeC(0));
    const relativeHumidityPct = humidityPutting(edgeC, e, guess);
    const extraction = extractEvidence({ ...valve, relativeHumidityPct, lowKpaGauge });
    return extraction.observations.filter((o) => o.id.startsWith("low_side:")).map((o) => o.id);
  };

  it("takes the lower edge and the far edge below as the inner grade, and the upper edge as normal", () => {
    expect(gradeAtEdge(-3.5, (s) => EVAPORATING_C.min + s)).toEqual(["low_side:normal"]);
    expect(gradeAtEdge(-11.5, (s) => EVAPORATING_C.min + s - LOW_SIDE_FAR_BELOW_K)).toEqual(["low_side:low"]);
    expect(gradeAtEdge(8.5, (s) => EVAPORATING_C.max + s + 0)).toEqual(["low_side:normal"]);
  });
});
