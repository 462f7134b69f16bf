import { describe, expect, it } from "vitest";
import { extractEvidence, ventColdLimitC } from "./evidence";
import { formatMessage } from "./messages";
import type { DiagnosisInput } from "./schema";
import { saturationPressure } from "@/lib/refrigerants";
import { STATIC_CHECK, STATIC_SOAK, SUBCOOLING_K, SUPERHEAT_K, SUPERHEAT_LOAD, VENT_C } from "./grading";

// Saturation values: R-134a from the Tillner-Roth & Baehr (1994) equation of state, J. Phys. Chem. Ref. Data 23, 657;
// R-1234yf from Richter, McLinden & Lemmon (2011), J. Chem. Eng. Data 56, 3254. Gauge = absolute − 101.325 kPa.
const R134A_SAT_KPA_ABS = { 0: 292.803, 25: 665.381, 50: 1317.905, 60: 1681.784 } as const;
const R1234YF_SAT_KPA_ABS = { 30: 783.511 } as const;
const SEA_LEVEL_KPA = 101.325;
const gauge = (kpaAbs: number) => kpaAbs - SEA_LEVEL_KPA;

const ids = (input: DiagnosisInput) => extractEvidence(input).observations.map((o) => o.id);
const r134aOrifice = { refrigerant: "R-134a", expansionDevice: "orifice_tube", ambientC: 25 } as const;

describe("static pressure against saturation at the soak temperature", () => {
  const soaked = { ...r134aOrifice, staticSoakC: 25, staticSoakMin: 120 } as const;
  // A static reading whose saturation temperature sits `excessK` above the 25 °C soak.
  const atExcess = (excessK: number) => ({
    ...soaked,
    staticKpaGauge: gauge(saturationPressure("R-134a", 25 + excessK)),
  });

  it("grades a reading at R-134a saturation for 25 °C as normal (Tillner-Roth & Baehr 1994: 665.4 kPa abs)", () => {
    const extraction = extractEvidence({ ...soaked, staticKpaGauge: gauge(R134A_SAT_KPA_ABS[25]) + 6 });
    expect(extraction.computed.staticExcessKpa).toBeCloseTo(6, 0);
    expect(extraction.computed.staticExcessK).toBeCloseTo(0.3, 1);
    expect(extraction.observations.map((o) => o.id)).toContain("static:normal");
  });

  it("grades the excess in kelvin on both sides of each step: 2, 4 and 7 K (grading table; saturation from Tillner-Roth & Baehr 1994)", () => {
    expect(ids(atExcess(STATIC_CHECK.normalUpToK - 0.05))).toContain("static:normal");
    expect(ids(atExcess(STATIC_CHECK.normalUpToK + 0.05))).toContain("static:slightly_high");
    expect(ids(atExcess(STATIC_CHECK.highAboveK - 0.05))).toContain("static:slightly_high");
    expect(ids(atExcess(STATIC_CHECK.highAboveK + 0.05))).toContain("static:high");
    expect(ids(atExcess(STATIC_CHECK.veryHighAboveK - 0.05))).toContain("static:high");
    expect(ids(atExcess(STATIC_CHECK.veryHighAboveK + 0.05))).toContain("static:very_high");
    expect(ids(atExcess(-STATIC_CHECK.noLiquidBelowK + 0.05))).toContain("static:normal");
    expect(ids(atExcess(-STATIC_CHECK.noLiquidBelowK - 0.05))).toContain("static:no_liquid");
  });

  it("reads the same 35 kPa excess as normal at a 40 °C soak (about 1.3 K) and as air at 15 °C (about 2.2 K) (Tillner-Roth & Baehr 1994 slope)", () => {
    const at = (soakC: number) =>
      extractEvidence({
        ...r134aOrifice,
        ambientC: soakC,
        staticSoakC: soakC,
        staticSoakMin: 120,
        staticKpaGauge: gauge(saturationPressure("R-134a", soakC)) + 35,
      });
    expect(at(40).computed.staticExcessK).toBeCloseTo(1.3, 1);
    expect(at(40).observations.map((o) => o.id)).toContain("static:normal");
    expect(at(15).computed.staticExcessK).toBeCloseTo(2.2, 1);
    expect(at(15).observations.map((o) => o.id)).toContain("static:slightly_high");
  });

  it("judges at the parts' soak temperature, not the air's, and says so", () => {
    const extraction = extractEvidence({
      ...r134aOrifice,
      ambientC: 32,
      staticSoakC: 25,
      staticSoakMin: 240,
      staticKpaGauge: gauge(R134A_SAT_KPA_ABS[25]),
    });
    expect(extraction.computed.staticReferenceC).toBe(25);
    const observation = extraction.observations.find((o) => o.id === "static:normal");
    expect(observation && formatMessage(observation.message)).toMatch(
      /^Static pressure 564 kPa gauge matches saturation \(564 kPa gauge\) at the parts' soak temperature of 25\.0 °C within 2\.0 K after 240 min of soak: no sign of air\.$/,
    );
  });

  it("counts a short or unmeasured soak for half, and says so (grading table: 60 min, from memory)", () => {
    const high = atExcess(5);
    const strength = (input: DiagnosisInput) =>
      extractEvidence(input).observations.find((o) => o.id === "static:high")?.strength ?? 1;
    expect(strength(high)).toBe(1);
    expect(strength({ ...high, staticSoakMin: STATIC_SOAK.minMinutes - 1 })).toBe(STATIC_SOAK.weakFactor);
    expect(strength({ ...high, staticSoakMin: STATIC_SOAK.minMinutes })).toBe(1);
    expect(strength({ ...high, staticSoakMin: undefined })).toBe(STATIC_SOAK.weakFactor);
    const short = extractEvidence({ ...high, staticSoakMin: 20 }).observations.find(
      (o) => o.id === "static:high",
    );
    expect(short && formatMessage(short.message)).toMatch(/a short soak, so this counts for less/);
  });

  it("uses R-1234yf's own curve (Richter, McLinden & Lemmon 2011: 783.5 kPa abs at 30 °C)", () => {
    const extraction = extractEvidence({
      refrigerant: "R-1234yf",
      expansionDevice: "txv",
      ambientC: 30,
      staticKpaGauge: gauge(R1234YF_SAT_KPA_ABS[30]),
    });
    expect(extraction.computed.staticSaturationKpaAbs).toBeCloseTo(R1234YF_SAT_KPA_ABS[30], 0);
    expect(extraction.computed.staticExcessK).toBeCloseTo(0, 1);
  });

  it("calls a static reading empty under 70 kPa gauge or under half of saturation, either one (common practice)", () => {
    // 25 °C: half of 665.4 kPa abs is 332.7 kPa abs, 231 kPa gauge, well above 70 kPa gauge.
    expect(ids({ ...soaked, staticKpaGauge: 69 })).toContain("static:empty");
    expect(ids({ ...soaked, staticKpaGauge: 225 })).toContain("static:empty");
    expect(ids({ ...soaked, staticKpaGauge: 240 })).toContain("static:no_liquid");
    // At 5 °C half of saturation (349.2 kPa abs, EOS) is 73 kPa gauge: the 70 kPa condition alone still counts.
    expect(ids({ ...r134aOrifice, ambientC: 5, staticKpaGauge: 69 })).toContain("static:empty");
  });

  it("does not judge a static reading below −5 °C, where full and nearly empty read alike (grading table)", () => {
    const cold = extractEvidence({ ...r134aOrifice, ambientC: -10, staticKpaGauge: 60 });
    expect(cold.observations.some((o) => o.id.startsWith("static:"))).toBe(false);
    expect(cold.notes.map((n) => formatMessage(n)).join(" ")).toMatch(/warm to above −5\.0 °C/);
  });
});

describe("running pressures, subcooling and superheat", () => {
  it("reads the condensing temperature from the high side (Tillner-Roth & Baehr 1994: 50 °C at 1317.9 kPa abs)", () => {
    const extraction = extractEvidence({
      ...r134aOrifice,
      ambientC: 30,
      highKpaGauge: gauge(R134A_SAT_KPA_ABS[50]),
    });
    expect(extraction.computed.condensingC).toBeCloseTo(50, 1);
    expect(extraction.computed.condensingApproachK).toBeCloseTo(20, 1);
    expect(extraction.observations.map((o) => o.id)).toContain("high_side:normal");
  });

  it("works out subcooling from the 60 °C saturation point (1681.8 kPa abs, Tillner-Roth & Baehr 1994)", () => {
    const extraction = extractEvidence({
      ...r134aOrifice,
      ambientC: 35,
      highKpaGauge: gauge(R134A_SAT_KPA_ABS[60]),
      liquidLineC: 50,
    });
    expect(extraction.computed.subcoolingK).toBeCloseTo(10, 1);
    const subcooling = extraction.observations.find((o) => o.id.startsWith("subcooling:"));
    expect(subcooling && formatMessage(subcooling.message)).toMatch(
      /^Subcooling 10\.0 K \(liquid line 50\.0 °C against 60\.0 °C condensing\)/,
    );
  });

  it("judges the same 6 K superheat normal on a TXV system and high on an orifice-tube system (from memory: orifice evaporators run near 0 K)", () => {
    const reading = { ambientC: 25, lowKpaGauge: gauge(R134A_SAT_KPA_ABS[0]), suctionLineC: 6 };
    const txv = extractEvidence({ ...r134aOrifice, ...reading, expansionDevice: "txv" });
    expect(txv.computed.superheatK).toBeCloseTo(6, 1);
    expect(txv.observations.map((o) => o.id)).toContain("superheat:normal");
    expect(ids({ ...r134aOrifice, ...reading })).toContain("superheat:high");
  });

  it("calls a low side at or below 0 kPa gauge a vacuum and skips superheat there", () => {
    const extraction = extractEvidence({ ...r134aOrifice, lowKpaGauge: -20, suctionLineC: 10 });
    expect(extraction.observations.map((o) => o.id)).toContain("low_side:vacuum");
    expect(extraction.computed.superheatK).toBeUndefined();
  });

  it("uses the barometric pressure for the altitude (ASHRAE Fundamentals ch. 1 eq. 3: 84.56 kPa at 1,500 m)", () => {
    const extraction = extractEvidence({ ...r134aOrifice, altitudeM: 1500, highKpaGauge: 1000 });
    expect(extraction.computed.barometricKpa).toBeCloseTo(84.56, 1);
    expect(extraction.computed.highKpaAbs).toBeCloseTo(1084.56, 1);
  });

  it("says an R-744 high side above the critical pressure is transcritical instead of failing", () => {
    const extraction = extractEvidence({
      refrigerant: "R-744",
      expansionDevice: "txv",
      ambientC: 35,
      highKpaGauge: 9500,
      lowKpaGauge: 3400,
      liquidLineC: 40,
    });
    expect(extraction.computed.highSideTranscritical).toBe(true);
    expect(extraction.computed.subcoolingK).toBeUndefined();
    expect(extraction.notes.map((n) => formatMessage(n)).join(" ")).toMatch(/transcritical/);
    expect(extraction.observedGroups.has("high_side")).toBe(false);
  });
});

describe("identifier, charge and vent", () => {
  it("fails purity below 98 % and passes at 98 % (SAE J2099 / J2912 pass mark), skipping pressure–temperature checks on a fail", () => {
    expect(ids({ ...r134aOrifice, identifierPurityPct: 98 })).toContain("purity:pass");
    const failed = extractEvidence({
      ...r134aOrifice,
      identifierPurityPct: 97.9,
      staticKpaGauge: 800,
      highKpaGauge: 1500,
    });
    expect(failed.observations.map((o) => o.id)).toContain("purity:fail");
    expect(failed.observations.some((o) => o.id.startsWith("static:") || o.id.startsWith("high_side:"))).toBe(
      false,
    );
    expect(failed.notes.map((n) => formatMessage(n)).join(" ")).toMatch(/pure refrigerant/);
  });

  it("states the charge deviation in grams and percent (25 % over for 850 g against 680 g)", () => {
    const extraction = extractEvidence({ ...r134aOrifice, labelChargeG: 680, recoveredChargeG: 850 });
    expect(extraction.computed.chargeDeltaPct).toBeCloseTo(25, 6);
    const charge = extraction.observations.find((o) => o.id === "charge:very_high");
    expect(charge && formatMessage(charge.message)).toBe(
      "Recovered 850 g against a label charge of 680 g: 170 g (25 %) over, a clear overcharge.",
    );
  });

  it("grades the centre vent against 3–8 °C in mild weather (common practice)", () => {
    expect(ids({ ...r134aOrifice, ambientC: 21, relativeHumidityPct: 50, ventC: 6 })).toContain("vent:cold");
    expect(ids({ ...r134aOrifice, ambientC: 21, relativeHumidityPct: 50, ventC: 18 })).toContain("vent:warm");
  });

  it("raises the vent target with the air's wet bulb, humidity's latent load included (ASHRAE Fundamentals ch. 1 psychrometrics; 0.4 K per K from memory)", () => {
    // 35 °C at 80 %: wet bulb about 31.9 °C (ASHRAE Fundamentals ch. 1), so 8 + 0.4 × 16.9 ≈ 14.7 °C.
    const humid = extractEvidence({ ...r134aOrifice, ambientC: 35, relativeHumidityPct: 80, ventC: 13 });
    expect(humid.computed.wetBulbC).toBeCloseTo(31.9, 0);
    expect(humid.computed.ventColdMaxC).toBeCloseTo(14.7, 0);
    expect(humid.observations.map((o) => o.id)).toContain("vent:cold");
    const dry = extractEvidence({ ...r134aOrifice, ambientC: 35, relativeHumidityPct: 20, ventC: 13 });
    expect(dry.observations.map((o) => o.id)).toContain("vent:cool");
    const limit = (relativeHumidityPct: number) =>
      ventColdLimitC({ ambientC: 30, relativeHumidityPct }).coldMaxC;
    expect(limit(80)).toBeGreaterThan(limit(50));
    expect(limit(50)).toBeGreaterThan(limit(20));
    expect(ventColdLimitC({ ambientC: 12, relativeHumidityPct: 40 }).coldMaxC).toBe(VENT_C.coldBaseC);
  });

  it("treats about 10 K of subcooling as normal on a valve system, 4–12 K (from memory)", () => {
    const valve = {
      ...r134aOrifice,
      expansionDevice: "txv",
      ambientC: 32,
      highKpaGauge: gauge(R134A_SAT_KPA_ABS[50]),
    } as const;
    expect(ids({ ...valve, liquidLineC: 40 })).toContain("subcooling:normal");
    expect(ids({ ...valve, liquidLineC: 50 - SUBCOOLING_K.txv.high - 0.1 })).toContain("subcooling:high");
    expect(ids({ ...valve, liquidLineC: 50 - SUBCOOLING_K.txv.low + 0.1 })).toContain("subcooling:low");
  });

  it("allows an orifice-tube evaporator more superheat at high load: 0.5 K per K above 30 °C (common practice; figures from memory)", () => {
    const orifice = (ambientC: number, superheatK: number) =>
      ids({ ...r134aOrifice, ambientC, lowKpaGauge: gauge(R134A_SAT_KPA_ABS[0]), suctionLineC: superheatK });
    expect(orifice(30, 6)).toContain("superheat:high");
    expect(orifice(42, 6)).toContain("superheat:normal");
    expect(orifice(42, SUPERHEAT_K.orifice_tube.high + 12 * SUPERHEAT_LOAD.kPerK + 0.1)).toContain(
      "superheat:high",
    );
  });
});

describe("symptom sentences", () => {
  it("reports interview answers and check results in readable sentences", () => {
    const texts = extractEvidence({
      ...r134aOrifice,
      symptoms: ["recent_service_elsewhere", "worse_at_idle", "leak_found"],
    }).observations.map((o) => formatMessage(o.message));
    expect(texts).toEqual(
      expect.arrayContaining([
        "Reported: A/C was serviced elsewhere recently.",
        "Reported: cooling worse at idle than at road speed.",
        "Checked: leak found.",
      ]),
    );
  });
});
