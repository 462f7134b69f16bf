import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { gaugeToAbsoluteKpa, pressureToKpa } from "@/lib/units";
import {
  chargeDeviation,
  condensingApproachK,
  SaturationRangeError,
  saturationPressure,
  staticCheck,
  subcoolingK,
  superheatK,
} from "./index";
import { propertyRuns } from "@/tests/support/property-runs";

const psig = (value: number) => gaugeToAbsoluteKpa(pressureToKpa(value, "psi"));

describe("subcooling, superheat and condensing approach", () => {
  // R-134a at 1016.593 kPa saturates at 40 °C (Tillner-Roth & Baehr 1994 EOS).
  it("subcooling is Tsat(high side) minus liquid line (Tillner-Roth & Baehr 1994 EOS for Tsat)", () => {
    expect(subcoolingK({ refrigerant: "R-134a", highKpaAbs: 1016.593, liquidLineC: 34 })).toBeCloseTo(6, 1);
  });

  // R-1234yf at 315.821 kPa saturates at 0 °C (Richter, McLinden & Lemmon 2011 EOS).
  it("superheat is suction line minus Tsat(low side) (Richter 2011 EOS for Tsat)", () => {
    expect(superheatK({ refrigerant: "R-1234yf", lowKpaAbs: 315.821, suctionLineC: 7.5 })).toBeCloseTo(
      7.5,
      1,
    );
  });

  it("condensing approach is Tsat(high side) minus ambient (Tillner-Roth & Baehr 1994 EOS for Tsat)", () => {
    expect(condensingApproachK({ refrigerant: "R-134a", highKpaAbs: 1681.784, ambientC: 35 })).toBeCloseTo(
      25,
      1,
    );
  });

  // 1016.593 kPa saturates R-134a at 40 °C (Tillner-Roth & Baehr 1994 EOS): a 45 °C liquid line is 5 K above it.
  it("a liquid line warmer than saturation gives negative subcooling (flash gas), not an error", () => {
    expect(subcoolingK({ refrigerant: "R-134a", highKpaAbs: 1016.593, liquidLineC: 45 })).toBeLessThan(0);
  });

  it("out-of-table pressures raise the range error for the caller to explain", () => {
    expect(() => superheatK({ refrigerant: "R-134a", lowKpaAbs: 20, suctionLineC: 10 })).toThrow(
      SaturationRangeError,
    );
  });
});

describe("trade checks (common practice)", () => {
  it("an R-134a high-pressure cut-out near 3.0 MPa gauge (≈440 psig) means condensing near 87 °C (common practice; Tsat from Tillner-Roth & Baehr 1994)", () => {
    const cutOutKpaAbs = gaugeToAbsoluteKpa(3000);
    const tsatC = condensingApproachK({ refrigerant: "R-134a", highKpaAbs: cutOutKpaAbs, ambientC: 0 });
    expect(tsatC).toBeGreaterThan(85);
    expect(tsatC).toBeLessThan(90);
    expect(
      Math.abs(condensingApproachK({ refrigerant: "R-134a", highKpaAbs: psig(440), ambientC: 0 }) - 87),
    ).toBeLessThan(2);
  });

  it("an R-134a low-side cycling switch opening at 22–25 psig saturates just under 0 °C, so the evaporator air side stays just above freezing (common practice)", () => {
    for (const opening of [22, 25]) {
      const tsatC = superheatK({ refrigerant: "R-134a", lowKpaAbs: psig(opening), suctionLineC: 0 }) * -1;
      expect(tsatC).toBeGreaterThan(-5);
      expect(tsatC).toBeLessThan(0);
    }
  });
});

describe("static pressure check (engine off, soaked to ambient)", () => {
  it("a static pressure at saturation is valid with about zero excess (Tillner-Roth & Baehr 1994 EOS: 25 °C → 665.381 kPa)", () => {
    const check = staticCheck({ refrigerant: "R-134a", staticKpaAbs: 665.381, ambientC: 25 });
    expect(check.kind).toBe("valid");
    if (check.kind !== "valid") return;
    expect(check.saturationKpaAbs).toBeCloseTo(665.381, 0);
    expect(Math.abs(check.excessKpa)).toBeLessThan(0.5);
  });

  // R-1234yf saturates at 682.582 kPa at 25 °C (Richter, McLinden & Lemmon 2011 EOS); air adds its own partial
  // pressure on top (Dalton's law; a textbook), so 120 kPa more is an excess of 120 kPa.
  it("a static pressure above saturation reports the excess (non-condensables suspected)", () => {
    const check = staticCheck({ refrigerant: "R-1234yf", staticKpaAbs: 682.582 + 120, ambientC: 25 });
    expect(check).toMatchObject({ kind: "valid" });
    if (check.kind === "valid") expect(check.excessKpa).toBeCloseTo(120, 0);
  });

  // R-134a saturates at 665.381 kPa at 25 °C (Tillner-Roth & Baehr 1994 EOS): 300 kPa abs is less than half of it, so
  // no liquid is left to fix the pressure (common practice).
  it("far below saturation: no liquid present — check not valid", () => {
    const check = staticCheck({ refrigerant: "R-134a", staticKpaAbs: 300, ambientC: 25 });
    expect(check.kind).toBe("no_liquid");
    if (check.kind === "no_liquid") {
      expect(check.message).toMatch(/no liquid present — check not valid/);
      expect(check.excessKpa).toBeLessThan(-300);
    }
  });

  it("a few kPa under saturation (a cooler corner of the car) still counts as liquid present", () => {
    expect(
      staticCheck({ refrigerant: "R-134a", staticKpaAbs: saturationPressure("R-134a", 23), ambientC: 25 })
        .kind,
    ).toBe("valid");
  });

  it("R-744 above its critical point cannot be checked (Span & Wagner 1996)", () => {
    const check = staticCheck({ refrigerant: "R-744", staticKpaAbs: 7000, ambientC: 35 });
    expect(check.kind).toBe("out_of_range");
    if (check.kind === "out_of_range") expect(check.message).toMatch(/critical point/);
  });

  it("near the bottom of the table the no-liquid threshold falls back to the table's edge instead of throwing", () => {
    expect(staticCheck({ refrigerant: "R-134a", staticKpaAbs: 30, ambientC: -38 }).kind).toBe("no_liquid");
    expect(staticCheck({ refrigerant: "R-134a", staticKpaAbs: 60, ambientC: -38 }).kind).toBe("valid");
  });

  it("never throws for any finite reading", () => {
    fc.assert(
      fc.property(
        fc.constantFrom("R-134a", "R-1234yf", "R-744", "R-12" as const),
        fc.double({ min: -50, max: 20000, noNaN: true }),
        fc.double({ min: -80, max: 80, noNaN: true }),
        (refrigerant, staticKpaAbs, ambientC) => {
          const check = staticCheck({ refrigerant, staticKpaAbs, ambientC });
          expect(["valid", "no_liquid", "out_of_range"]).toContain(check.kind);
        },
      ),
      { numRuns: propertyRuns(2000) },
    );
  });
});

describe("charge deviation", () => {
  it("is recovered minus label, in grams and per cent of the label", () => {
    expect(chargeDeviation({ labelChargeG: 650, recoveredChargeG: 520 })).toEqual({
      deltaG: -130,
      deltaPct: -20,
    });
    expect(chargeDeviation({ labelChargeG: 500, recoveredChargeG: 550 })).toEqual({
      deltaG: 50,
      deltaPct: 10,
    });
  });

  it("refuses a label charge that is not a positive mass", () => {
    expect(() => chargeDeviation({ labelChargeG: 0, recoveredChargeG: 100 })).toThrow(RangeError);
    expect(() => chargeDeviation({ labelChargeG: Number.NaN, recoveredChargeG: 100 })).toThrow(RangeError);
  });
});
