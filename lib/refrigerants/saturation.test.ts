import { describe, expect, it } from "vitest";
import { sayInUnits, unitsOfSystem } from "@/lib/units";
import { refrigerantInfo, SaturationRangeError, saturationPressure, saturationTemperature } from "./index";

const relativeError = (actual: number, expected: number) => Math.abs(actual / expected - 1);
const TOLERANCE = 0.001; // 0.1 %, the tolerance the issue sets against the reference equations of state
// The vapour-pressure equations follow their equation of state far closer than that; a wrong coefficient or critical point shows here first.
const EQUATION_FIDELITY = 0.0002;

// Saturation pressures, kPa absolute, evaluated with each refrigerant's reference Helmholtz equation of
// state (phase equilibrium solved with the published coefficients; NIST REFPROP and the ASHRAE tables
// use the same equations, from memory).
const REFERENCE_EOS: Record<
  "R-134a" | "R-1234yf" | "R-744" | "R-12",
  { source: string; points: [number, number][] }
> = {
  "R-134a": {
    source: "Tillner-Roth & Baehr 1994 EOS, J. Phys. Chem. Ref. Data 23, 657",
    points: [
      [-40, 51.209],
      [-20, 132.735],
      [0, 292.803],
      [20, 571.707],
      [25, 665.381],
      [40, 1016.593],
      [60, 1681.784],
      [80, 2633.203],
      [100, 3972.379],
    ],
  },
  "R-1234yf": {
    source: "Richter, McLinden & Lemmon 2011 EOS, J. Chem. Eng. Data 56, 3254",
    points: [
      [-40, 62.367],
      [-20, 150.921],
      [0, 315.821],
      [20, 591.721],
      [25, 682.582],
      [40, 1018.393],
      [60, 1641.882],
      [80, 2519.445],
      [90, 3080.332],
    ],
  },
  "R-744": {
    source: "Span & Wagner 1996 EOS, J. Phys. Chem. Ref. Data 25, 1509",
    points: [
      [-40, 1004.496],
      [-20, 1969.628],
      [0, 3485.141],
      [20, 5729.053],
      [30, 7213.687],
    ],
  },
  "R-12": {
    source: "Marx, Pruß & Wagner 1992 EOS, VDI Fortschr.-Ber. 19/57",
    points: [
      [-40, 64.087],
      [-20, 150.7],
      [0, 308.146],
      [20, 566.416],
      [40, 958.823],
      [60, 1521.946],
      [80, 2297.464],
      [100, 3339.869],
    ],
  },
};

describe("saturation pressure against the reference equations of state (within 0.1 %; 0.02 % equation fidelity)", () => {
  for (const [refrigerant, { source, points }] of Object.entries(REFERENCE_EOS)) {
    for (const [tempC, pressureKpaAbs] of points) {
      it(`${refrigerant} at ${tempC} °C is ${pressureKpaAbs} kPa (${source})`, () => {
        const id = refrigerant as keyof typeof REFERENCE_EOS;
        expect(relativeError(saturationPressure(id, tempC), pressureKpaAbs)).toBeLessThan(TOLERANCE);
        expect(relativeError(saturationPressure(id, tempC), pressureKpaAbs)).toBeLessThan(EQUATION_FIDELITY);
      });
      // At −40 °C the reference value can sit a hair under the table's own lower edge, so the reverse check starts above it.
      if (tempC <= -40) continue;
      it(`${refrigerant}: ${pressureKpaAbs} kPa saturates at ${tempC} °C within 0.02 K (${source})`, () => {
        const id = refrigerant as keyof typeof REFERENCE_EOS;
        expect(Math.abs(saturationTemperature(id, pressureKpaAbs) - tempC)).toBeLessThan(0.02);
      });
    }
  }
});

describe("saturation pressure against published tables printed by the equations' authors", () => {
  // Tillner-Roth & Baehr 1994, Table 8 (kelvin grid, printed to five digits).
  it.each([
    [250, 115.61],
    [300, 702.82],
    [350, 2461.1],
    [374, 4041.6],
  ])("R-134a at %d K is %d kPa (Tillner-Roth & Baehr 1994, Table 8)", (tempK, pressureKpaAbs) => {
    expect(relativeError(saturationPressure("R-134a", tempK - 273.15), pressureKpaAbs)).toBeLessThan(
      TOLERANCE,
    );
  });

  // Span & Wagner 1996, Table 34.
  it.each([
    [240, 1282.5],
    [260, 2418.8],
    [280, 4160.7],
    [300, 6713.1],
    [304, 7355.5],
  ])("R-744 at %d K is %d kPa (Span & Wagner 1996, Table 34)", (tempK, pressureKpaAbs) => {
    expect(relativeError(saturationPressure("R-744", tempK - 273.15), pressureKpaAbs)).toBeLessThan(
      TOLERANCE,
    );
  });
});

describe("fixed points", () => {
  it("R-134a boils at −26.07 °C at one atmosphere (Tillner-Roth & Baehr 1994 EOS)", () => {
    expect(saturationTemperature("R-134a", 101.325)).toBeCloseTo(-26.07, 1);
    expect(Math.abs(saturationTemperature("R-134a", 101.325) - -26.074)).toBeLessThan(0.01);
    expect(Math.abs(refrigerantInfo("R-134a").normalBoilingPointC! - -26.074)).toBeLessThan(0.01);
  });

  it("R-1234yf boils at −29.49 °C at one atmosphere (Richter, McLinden & Lemmon 2011 EOS)", () => {
    expect(Math.abs(saturationTemperature("R-1234yf", 101.325) - -29.485)).toBeLessThan(0.01);
    expect(Math.abs(refrigerantInfo("R-1234yf").normalBoilingPointC! - -29.485)).toBeLessThan(0.01);
  });

  it("R-12 boils at −29.75 °C at one atmosphere (Marx, Pruß & Wagner 1992 EOS)", () => {
    expect(Math.abs(saturationTemperature("R-12", 101.325) - -29.752)).toBeLessThan(0.02);
  });

  it("R-744 has no normal boiling point: one atmosphere is below its triple point (Span & Wagner 1996)", () => {
    expect(refrigerantInfo("R-744").normalBoilingPointC).toBeNull();
    expect(() => saturationTemperature("R-744", 101.325)).toThrow(SaturationRangeError);
  });

  const CRITICAL_POINTS = [
    ["R-134a", 374.21, 4059.28, "NIST REFPROP critical point for the Tillner-Roth & Baehr 1994 EOS"],
    ["R-1234yf", 367.85, 3382.2, "Richter, McLinden & Lemmon 2011"],
    ["R-744", 304.1282, 7377.3, "Span & Wagner 1996"],
    ["R-12", 385.12, 4136.1, "Marx, Pruß & Wagner 1992"],
  ] as const;
  for (const [id, tempK, pressureKpaAbs, source] of CRITICAL_POINTS) {
    it(`${id} critical point ${tempK} K / ${pressureKpaAbs} kPa (${source})`, () => {
      const info = refrigerantInfo(id);
      expect(info.criticalTempC).toBeCloseTo(tempK - 273.15, 3);
      expect(info.criticalPressureKpaAbs).toBeCloseTo(pressureKpaAbs, 1);
      expect(info.maxTempC).toBeCloseTo(tempK - 273.15, 3);
      expect(relativeError(saturationPressure(id, info.maxTempC), pressureKpaAbs)).toBeLessThan(1e-6);
    });
  }

  it("R-744 stops at its critical point, 30.978 °C (Span & Wagner 1996)", () => {
    expect(() => saturationPressure("R-744", 30.97)).not.toThrow();
    expect(() => saturationPressure("R-744", 31)).toThrow(SaturationRangeError);
    expect(() => saturationTemperature("R-744", 7400)).toThrow(SaturationRangeError);
  });

  it("R-134a and R-1234yf curves cross near 41 °C; R-1234yf is higher below, lower above (TRB 1994 and Richter 2011 EOS)", () => {
    let low = 20;
    let high = 60;
    const difference = (t: number) => saturationPressure("R-134a", t) - saturationPressure("R-1234yf", t);
    expect(difference(low)).toBeLessThan(0);
    expect(difference(high)).toBeGreaterThan(0);
    while (high - low > 1e-6) {
      const mid = (low + high) / 2;
      if (difference(mid) < 0) low = mid;
      else high = mid;
    }
    expect(low).toBeGreaterThan(40);
    expect(low).toBeLessThan(42);
  });

  it("only R-1234yf is flammable (ASHRAE Standard 34 groups: A2L vs A1; from memory)", () => {
    expect(refrigerantInfo("R-1234yf")).toMatchObject({ flammable: true, safetyClass: "A2L" });
    for (const id of ["R-134a", "R-744", "R-12"] as const)
      expect(refrigerantInfo(id)).toMatchObject({ flammable: false, safetyClass: "A1" });
  });
});

describe("out-of-range readings", () => {
  it("below the table, a message a technician can act on", () => {
    const error = (() => {
      try {
        saturationPressure("R-134a", -45);
      } catch (e) {
        return e;
      }
    })();
    expect(error).toBeInstanceOf(SaturationRangeError);
    expect(error).toBeInstanceOf(RangeError);
    expect(error).toMatchObject({ refrigerant: "R-134a", quantity: "temperature", limit: "below" });
    expect(sayInUnits((error as Error).message)).toBe("Below −40 °C the tables for R-134a do not apply.");
    // The message carries its limit as a quantity: an imperial reader is told °F, not °C.
    expect(sayInUnits((error as Error).message, unitsOfSystem("imperial"))).toBe(
      "Below −40 °F the tables for R-134a do not apply.",
    );
    expect((error as SaturationRangeError).limitQuantity).toEqual({
      kind: "temperature",
      value: -40,
      decimals: 0,
    });
  });

  it("a pressure below the table is said in the reader's pressure and temperature units", () => {
    const error = (() => {
      try {
        saturationTemperature("R-134a", 1);
      } catch (e) {
        return e as SaturationRangeError;
      }
    })()!;
    expect(error.limitQuantity.kind).toBe("pressure_abs");
    const imperial = sayInUnits(error.message, unitsOfSystem("imperial"));
    expect(imperial).toMatch(
      /^Below \d+(\.\d)? psia the tables for R-134a do not apply \(a saturation temperature under −40 °F\)\.$/,
    );
    expect(imperial).not.toMatch(/kPa|°C/);
    expect(sayInUnits(error.message)).toMatch(
      /^Below \d+(\.\d)? kPa absolute the tables for R-134a do not apply \(a saturation temperature under −40 °C\)\.$/,
    );
  });

  it("above the critical point, says why there is no saturation", () => {
    expect(() => saturationPressure("R-744", 35)).toThrow(/R-744 is past its critical point/);
    expect(() => saturationTemperature("R-1234yf", 3500)).toThrow(
      expect.objectContaining({ quantity: "pressure", limit: "above" }),
    );
  });

  it("a pressure under the table's lowest saturation pressure (or a vacuum) is below range", () => {
    for (const p of [50, 0, -10]) {
      expect(() => saturationTemperature("R-134a", p)).toThrow(
        expect.objectContaining({ refrigerant: "R-134a", quantity: "pressure", limit: "below" }),
      );
    }
  });

  it("NaN is not a reading: plain RangeError, not a saturation range error", () => {
    expect(() => saturationPressure("R-134a", Number.NaN)).toThrow(RangeError);
    expect(() => saturationPressure("R-134a", Number.NaN)).not.toThrow(SaturationRangeError);
    expect(() => saturationTemperature("R-134a", Number.NaN)).not.toThrow(SaturationRangeError);
  });
});
