import { describe, expect, it } from "vitest";
import { saturationPressure } from "@/lib/refrigerants";
import { STATIC_SOAK_SPREAD_K } from "@/lib/refrigerants/derived";
import { EMPTY_STATIC_MAX_KPA_GAUGE } from "@/lib/refrigerants/static-charge";
import { PURITY_PASS_PCT } from "@/lib/service/identifier";
import { doNotRunState } from "@/lib/diagnosis/do-not-run";
import { barometricKpa } from "@/lib/units";
import type { InterviewAnswers } from "./answers";
import { pressureLeft, purityFailed, refrigerantContaminated, systemLooksEmpty } from "./branches";

const SEA_LEVEL_KPA = 101.325; // ISO 2533 standard atmosphere

function soaked(
  refrigerant: "R-134a" | "R-1234yf" | "R-744",
  ambientC: number,
  staticKpaGauge?: number,
): InterviewAnswers {
  return {
    system: { refrigerant, expansionDevice: "txv", compressorType: "variable_displacement" },
    conditions: { ambientC },
    static: staticKpaGauge === undefined ? {} : { staticKpaGauge },
  };
}

describe("systemLooksEmpty", () => {
  it("is false for a full R-134a system at saturation at 25 °C (665.4 kPa abs, Tillner-Roth & Baehr 1994)", () => {
    expect(systemLooksEmpty(soaked("R-134a", 25, 665.4 - SEA_LEVEL_KPA))).toBe(false);
  });

  it("is true for R-134a at 25 °C holding half its saturation pressure (vapour only, Tillner-Roth & Baehr 1994)", () => {
    expect(systemLooksEmpty(soaked("R-134a", 25, 665.4 / 2 - SEA_LEVEL_KPA))).toBe(true);
  });

  it("is false for a full R-1234yf system at 30 °C (783.5 kPa abs, Richter, McLinden & Lemmon 2011) and true at 400 kPa abs", () => {
    expect(systemLooksEmpty(soaked("R-1234yf", 30, 783.5 - SEA_LEVEL_KPA))).toBe(false);
    expect(systemLooksEmpty(soaked("R-1234yf", 30, 400 - SEA_LEVEL_KPA))).toBe(true);
  });

  it("is false for a full R-744 system at 20 °C (5729 kPa abs, Span & Wagner 1996)", () => {
    expect(systemLooksEmpty(soaked("R-744", 20, 5729 - SEA_LEVEL_KPA))).toBe(false);
  });

  it("follows the engine's do-not-run rule: empty under 70 kPa gauge or under half of saturation (common practice)", () => {
    expect(systemLooksEmpty(soaked("R-134a", 25, 0))).toBe(true);
    expect(systemLooksEmpty(soaked("R-134a", 25, EMPTY_STATIC_MAX_KPA_GAUGE + 1))).toBe(true);
    expect(systemLooksEmpty(soaked("R-134a", 25, -60))).toBe(true);
    expect(systemLooksEmpty(soaked("R-134a", 5, 69))).toBe(true);
    // The same answers the findings engine sees: one rule for the interview's branch and the findings.
    const answers = soaked("R-134a", 25, 300);
    expect(systemLooksEmpty(answers)).toBe(
      doNotRunState({
        refrigerant: "R-134a",
        expansionDevice: "txv",
        compressorType: "variable_displacement",
        ambientC: 25,
        staticKpaGauge: 300,
      }).active,
    );
  });

  it("keeps an electric compressor off the running readings until a static shows its charge (from memory)", () => {
    const electric = (staticKpaGauge?: number): InterviewAnswers => ({
      ...soaked("R-1234yf", 25, staticKpaGauge),
      system: { refrigerant: "R-1234yf", expansionDevice: "txv", compressorType: "electric" },
    });
    expect(systemLooksEmpty(electric())).toBe(true);
    expect(systemLooksEmpty(electric(682.6 - SEA_LEVEL_KPA))).toBe(false);
  });

  it("is false when the static pressure was not taken on a belt-driven compressor", () => {
    expect(systemLooksEmpty(soaked("R-134a", 25))).toBe(false);
    expect(systemLooksEmpty({})).toBe(false);
  });

  it("is false when the ambient is outside the tables (R-744 is supercritical above 30.98 °C, Span & Wagner 1996)", () => {
    expect(systemLooksEmpty(soaked("R-744", 38, 3000))).toBe(false);
  });

  it("uses the altitude: the same gauge reading is empty high up and not at sea level (barometric pressure, ISO 2533)", () => {
    // Just above the no-liquid line at sea level; 1600 m of altitude takes about 18 kPa off the atmosphere.
    const lineKpaAbs = saturationPressure("R-134a", 25 - STATIC_SOAK_SPREAD_K);
    const gauge = lineKpaAbs - SEA_LEVEL_KPA + 5;
    const answers = soaked("R-134a", 25, gauge);
    expect(barometricKpa({ altitudeM: 1600 })).toBeLessThan(SEA_LEVEL_KPA - 10);
    expect(systemLooksEmpty(answers)).toBe(false);
    expect(systemLooksEmpty(answers, { altitudeM: 1600 })).toBe(true);
    expect(systemLooksEmpty({ ...answers, conditions: { ambientC: 25, altitudeM: 1600 } })).toBe(true);
    expect(
      systemLooksEmpty({ ...answers, conditions: { ambientC: 25, altitudeM: 0 } }, { altitudeM: 1600 }),
    ).toBe(false);
  });
});

describe("pressureLeft", () => {
  it("is true above about 0 kPa gauge and false at or below it, or with no reading", () => {
    expect(pressureLeft({ static: { staticKpaGauge: 150 } })).toBe(true);
    expect(pressureLeft({ static: { staticKpaGauge: EMPTY_STATIC_MAX_KPA_GAUGE } })).toBe(false);
    expect(pressureLeft({ static: {} })).toBe(false);
  });
});

describe("purityFailed and refrigerantContaminated", () => {
  it("fail below 98 % purity (SAE J2099 identifier threshold) and pass at 98 %", () => {
    expect(PURITY_PASS_PCT).toBe(98);
    expect(purityFailed({ identification: { purityPct: 97.9 } })).toBe(true);
    expect(purityFailed({ identification: { purityPct: 98 } })).toBe(false);
    expect(purityFailed({ identification: {} })).toBe(false);
  });

  it("count a hydrocarbon flag as contamination even at high purity", () => {
    expect(refrigerantContaminated({ identification: { purityPct: 99, hydrocarbonFlagged: true } })).toBe(
      true,
    );
    expect(refrigerantContaminated({ identification: { purityPct: 99, hydrocarbonFlagged: false } })).toBe(
      false,
    );
    expect(refrigerantContaminated({ identification: { purityPct: 90 } })).toBe(true);
  });
});
