import { describe, expect, it } from "vitest";
import { inputLimitMessage } from "./input-limits";
import { diagnosisInputSchema } from "./schema";

const base = { refrigerant: "R-134a", expansionDevice: "orifice_tube", ambientC: 27 } as const;
const messages = (value: unknown) => {
  const result = diagnosisInputSchema.safeParse(value);
  return result.success ? [] : result.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`);
};

describe("diagnosisInputSchema", () => {
  it("accepts the three required fields alone", () => {
    expect(diagnosisInputSchema.safeParse(base).success).toBe(true);
  });

  it("accepts a low side in vacuum down to a perfect vacuum at sea level (standard atmosphere 101.325 kPa, ISO 2533)", () => {
    expect(diagnosisInputSchema.safeParse({ ...base, lowKpaGauge: -101.3 }).success).toBe(true);
    expect(messages({ ...base, lowKpaGauge: -101.4 })[0]).toMatch(/perfect vacuum/);
  });

  it("rejects a gauge vacuum deeper than the local atmosphere at altitude (ASHRAE Fundamentals ch. 1 standard atmosphere: about 79.5 kPa at 2,000 m)", () => {
    expect(messages({ ...base, altitudeM: 2000, lowKpaGauge: -90 }).join()).toMatch(
      /deeper than the local atmosphere/,
    );
    expect(diagnosisInputSchema.safeParse({ ...base, altitudeM: 2000, lowKpaGauge: -79 }).success).toBe(true);
  });

  it("rejects impossible values with a message naming the field", () => {
    expect(messages({ ...base, ambientC: 95 })[0]).toMatch(/^ambientC: .*above 60 °C/);
    expect(messages({ ...base, relativeHumidityPct: 120 })[0]).toBe(
      "relativeHumidityPct: relative humidity above 100 % is not plausible",
    );
    expect(messages({ ...base, recoveredChargeG: -5 })[0]).toMatch(/cannot be negative/);
    expect(messages({ ...base, labelChargeG: 0 })[0]).toMatch(/above 0 g/);
    expect(messages({ ...base, identifierPurityPct: 101 })[0]).toMatch(/purity/);
    expect(messages({ ...base, refrigerant: "R-22" })[0]).toMatch(/refrigerant must be/);
    expect(messages({ ...base, symptoms: ["smells_funny"] })[0]).toMatch(/unknown symptom/);
    expect(messages({ ...base, ventC: Number.NaN }).length).toBe(1);
  });

  it("keeps its limits as quantities, so a screen can say them in the reader's units (60 °C = 140 °F, NIST SP 811)", () => {
    const imperial = { pressure: "psi", temperature: "F", mass: "oz", volume: "floz" } as const;
    expect(inputLimitMessage("ambientC", "max")).toBe("ambient temperature above 60 °C is not plausible");
    expect(inputLimitMessage("ambientC", "max", imperial)).toBe(
      "ambient temperature above 140 °F is not plausible",
    );
    expect(inputLimitMessage("lowKpaGauge", "min", imperial)).toBe(
      "low-side pressure cannot be below a perfect vacuum (−14.7 psig)",
    );
    expect(inputLimitMessage("recoveredChargeG", "max", imperial)).toBe(
      "recovered mass above 352.7 oz is not plausible",
    );
  });

  it("rejects HFC pressures past the relief-valve range but allows R-744 high sides (from memory: CO2 high sides run to ~13 MPa)", () => {
    expect(messages({ ...base, highKpaGauge: 6000 })[0]).toMatch(/above what an R-134a system can hold/);
    expect(
      diagnosisInputSchema.safeParse({ ...base, refrigerant: "R-744", highKpaGauge: 11000 }).success,
    ).toBe(true);
  });

  it("rejects a high side reading well below the low side (hoses swapped) and a recovered mass far above the label", () => {
    expect(messages({ ...base, highKpaGauge: 200, lowKpaGauge: 600 })[0]).toMatch(/hoses/);
    expect(messages({ ...base, labelChargeG: 500, recoveredChargeG: 1600 })[0]).toMatch(/three times/);
  });
});
