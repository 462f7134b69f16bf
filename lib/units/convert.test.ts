import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  massFromG,
  massToG,
  pressureFromKpa,
  pressureToKpa,
  temperatureDifferenceFromK,
  temperatureDifferenceToK,
  temperatureFromC,
  temperatureToC,
  volumeFromMl,
  volumeToMl,
} from "./index";

describe("conversion factors (NIST SP 811, appendix B)", () => {
  it("pound-force per square inch = 6.894757 kPa", () =>
    expect(pressureToKpa(1, "psi")).toBeCloseTo(6.894757, 6));
  it("inch of mercury (conventional) = 3.386389 kPa", () =>
    expect(pressureToKpa(1, "inHg")).toBeCloseTo(3.386389, 6));
  it("bar = 100 kPa and MPa = 1000 kPa (SI definitions)", () => {
    expect(pressureToKpa(2.1, "bar")).toBeCloseTo(210, 9);
    expect(pressureToKpa(3, "MPa")).toBeCloseTo(3000, 9);
  });
  it("pound (avoirdupois) = 453.59237 g exactly, ounce = 28.349523 g", () => {
    expect(massToG(1, "lb")).toBeCloseTo(453.59237, 9);
    expect(massToG(1, "oz")).toBeCloseTo(28.349523, 6);
    expect(massToG(1.4, "kg")).toBeCloseTo(1400, 9);
  });
  it("US fluid ounce = 29.57353 mL", () => expect(volumeToMl(1, "floz")).toBeCloseTo(29.57353, 5));
  it("°F and K to °C by definition: 32 °F = 0 °C, −40 °F = −40 °C, 0 °C = 273.15 K", () => {
    expect(temperatureToC(32, "F")).toBeCloseTo(0, 9);
    expect(temperatureToC(-40, "F")).toBeCloseTo(-40, 9);
    expect(temperatureToC(212, "F")).toBeCloseTo(100, 9);
    expect(temperatureToC(273.15, "K")).toBeCloseTo(0, 9);
    expect(temperatureFromC(37, "F")).toBeCloseTo(98.6, 9);
  });
  it("a temperature difference converts without the offset: 9 °F of superheat is 5 K", () => {
    expect(temperatureDifferenceToK(9, "F")).toBeCloseTo(5, 9);
    expect(temperatureDifferenceFromK(5, "F")).toBeCloseTo(9, 9);
    expect(temperatureDifferenceToK(5, "K")).toBe(5);
  });
  it("an unknown unit is refused rather than guessed", () => {
    expect(() => pressureToKpa(1, "atm" as never)).toThrow(RangeError);
    expect(() => massToG(1, "toString" as never)).toThrow(RangeError);
  });
  it("the refusal says which quantity and which unit, in both directions", () => {
    const cases: [(value: number, unit: never) => number, string][] = [
      [pressureToKpa, "pressure"],
      [pressureFromKpa, "pressure"],
      [temperatureToC, "temperature"],
      [temperatureFromC, "temperature"],
      [temperatureDifferenceToK, "temperature difference"],
      [temperatureDifferenceFromK, "temperature difference"],
      [massToG, "mass"],
      [massFromG, "mass"],
      [volumeToMl, "volume"],
      [volumeFromMl, "volume"],
    ];
    for (const [convert, kind] of cases)
      expect(() => convert(1, "furlong" as never)).toThrow(`Unknown ${kind} unit "furlong".`);
  });
});

describe("round trips (property-based)", () => {
  const value = fc.double({ min: -1e6, max: 1e6, noNaN: true });
  const close = (a: number, b: number): void => {
    expect(Math.abs(a - b)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(b)));
  };

  it("pressure", () => {
    fc.assert(
      fc.property(value, fc.constantFrom("kPa", "bar", "MPa", "psi", "inHg" as const), (v, u) => {
        close(pressureFromKpa(pressureToKpa(v, u), u), v);
      }),
    );
  });
  it("temperature", () => {
    fc.assert(
      fc.property(value, fc.constantFrom("C", "F", "K" as const), (v, u) => {
        close(temperatureFromC(temperatureToC(v, u), u), v);
      }),
    );
  });
  it("temperature difference", () => {
    fc.assert(
      fc.property(value, fc.constantFrom("K", "F" as const), (v, u) => {
        close(temperatureDifferenceFromK(temperatureDifferenceToK(v, u), u), v);
      }),
    );
  });
  it("mass", () => {
    fc.assert(
      fc.property(value, fc.constantFrom("g", "kg", "oz", "lb" as const), (v, u) => {
        close(massFromG(massToG(v, u), u), v);
      }),
    );
  });
  it("volume", () => {
    fc.assert(
      fc.property(value, fc.constantFrom("mL", "floz" as const), (v, u) => {
        close(volumeFromMl(volumeToMl(v, u), u), v);
      }),
    );
  });
  it("a temperature difference equals the difference of two converted temperatures", () => {
    fc.assert(
      fc.property(
        fc.double({ min: -100, max: 200, noNaN: true }),
        fc.double({ min: -100, max: 200, noNaN: true }),
        (a, b) => {
          close(temperatureToC(a, "F") - temperatureToC(b, "F"), temperatureDifferenceToK(a - b, "F"));
        },
      ),
    );
  });
});
