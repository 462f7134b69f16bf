import { describe, expect, it } from "vitest";
import { MAX_KPA_GAUGE_BY_REFRIGERANT } from "@/lib/refrigerants/gauge-limits";
import { standardBarometricKpa } from "@/lib/units/barometric";
import { inputLimitMessage } from "./input-limits";
import { diagnosisInputSchema } from "./schema";

// The input rules at their exact edges: the local atmosphere (ISO 2533 standard atmosphere; ASHRAE
// Fundamentals ch. 1), each refrigerant's relief range (gauge-limits), and the cross-field checks that catch
// swapped hoses, swapped cut points and a misread scale. Each rejection names the field.
const base = { refrigerant: "R-134a", expansionDevice: "orifice_tube", ambientC: 25 } as const;
const issues = (input: Record<string, unknown>) => {
  const result = diagnosisInputSchema.safeParse({ ...base, ...input });
  return result.success ? [] : result.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`);
};

describe("pressures against the local atmosphere and the system's limit", () => {
  const fields = ["staticKpaGauge", "highKpaGauge", "lowKpaGauge", "lowCutOutKpaGauge", "lowCutInKpaGauge"];

  it("accepts a perfect vacuum at the site's altitude and nothing deeper, for every pressure", () => {
    const deepest = -standardBarometricKpa(2000);
    for (const field of fields) {
      expect(issues({ altitudeM: 2000, [field]: deepest }), field).toEqual([]);
      expect(issues({ altitudeM: 2000, [field]: deepest - 0.5 }), field).toEqual([
        `${field}: ${deepest - 0.5} kPa gauge is deeper than the local atmosphere allows (${deepest.toFixed(1)} kPa gauge at 2000 m)`,
      ]);
    }
    expect(issues({ lowKpaGauge: -101 })).toEqual([]);
    expect(issues({ lowKpaGauge: -101.3 })).toEqual([]);
  });

  it("accepts a pressure up to the refrigerant's limit and names the refrigerant past it", () => {
    const max = MAX_KPA_GAUGE_BY_REFRIGERANT["R-134a"];
    for (const field of fields) {
      expect(issues({ [field]: max }), field).toEqual([]);
      expect(issues({ [field]: max + 1 }), field).toEqual([
        `${field}: ${max + 1} kPa gauge is above what an R-134a system can hold (${max} kPa gauge)`,
      ]);
    }
    expect(issues({ refrigerant: "R-744", expansionDevice: "txv", highKpaGauge: max + 1 })).toEqual([]);
  });
});

describe("cross-field checks", () => {
  it("allows the high side up to 50 kPa under the low side (gauge error at rest) and flags more as swapped hoses", () => {
    expect(issues({ highKpaGauge: 300, lowKpaGauge: 350 })).toEqual([]);
    expect(issues({ highKpaGauge: 299, lowKpaGauge: 350 })).toEqual([
      "highKpaGauge: high side reads below low side while running: check that the hoses are on the right ports",
    ]);
    expect(issues({ highKpaGauge: 299 })).toEqual([]);
    expect(issues({ lowKpaGauge: 350 })).toEqual([]);
  });

  it("flags a cut-in below the cut-out as swapped, and allows them equal", () => {
    expect(issues({ lowCutOutKpaGauge: 150, lowCutInKpaGauge: 150 })).toEqual([]);
    expect(issues({ lowCutOutKpaGauge: 150, lowCutInKpaGauge: 149 })).toEqual([
      "lowCutInKpaGauge: the low side at cut-in reads below the low side at cut-out: the two look swapped",
    ]);
    expect(issues({ lowCutInKpaGauge: 10 })).toEqual([]);
    expect(issues({ lowCutOutKpaGauge: 400 })).toEqual([]);
  });

  it("allows a recovered mass up to three times the label and flags more as a misread scale or label", () => {
    expect(issues({ labelChargeG: 500, recoveredChargeG: 1500 })).toEqual([]);
    expect(issues({ labelChargeG: 500, recoveredChargeG: 1501 })).toEqual([
      "recoveredChargeG: recovered mass is more than three times the label charge: check the scale and the label value",
    ]);
    expect(issues({ recoveredChargeG: 5000 })).toEqual([]);
  });
});

describe("limits said in words", () => {
  it("says which limit was passed, in the reader's units", () => {
    expect(inputLimitMessage("ambientC", "max")).toMatch(/60 °C/);
    expect(
      inputLimitMessage("ambientC", "max", { pressure: "psi", temperature: "F", mass: "lb", volume: "floz" }),
    ).toMatch(/140 °F/);
    expect(inputLimitMessage("lowKpaGauge", "min")).not.toBe(inputLimitMessage("ambientC", "min"));
    expect(inputLimitMessage("labelChargeG", "min")).not.toBe(inputLimitMessage("ambientC", "min"));
    expect(inputLimitMessage("staticSoakMin", "min")).toBe(
      inputLimitMessage("labelChargeG", "min").replace("label charge", "soak time").replace("0 g", "0 min"),
    );
  });
});

describe("the kind of each cross-field refusal", () => {
  it("reports every pressure, cut-point and scale refusal as a custom issue on its field", () => {
    const codes = (input: Record<string, unknown>) => {
      const result = diagnosisInputSchema.safeParse({ ...base, ...input });
      return result.success ? [] : result.error.issues.map((i) => `${i.code} ${i.path.join(".")}`);
    };
    expect(codes({ lowKpaGauge: -90, altitudeM: 2000 })).toEqual(["custom lowKpaGauge"]);
    expect(codes({ highKpaGauge: MAX_KPA_GAUGE_BY_REFRIGERANT["R-134a"] + 1 })).toEqual([
      "custom highKpaGauge",
    ]);
    expect(codes({ highKpaGauge: 100, lowKpaGauge: 300 })).toEqual(["custom highKpaGauge"]);
    expect(codes({ lowCutOutKpaGauge: 300, lowCutInKpaGauge: 100 })).toEqual(["custom lowCutInKpaGauge"]);
    expect(codes({ labelChargeG: 500, recoveredChargeG: 1600 })).toEqual(["custom recoveredChargeG"]);
  });
});
