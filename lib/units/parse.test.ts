import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  formatMass,
  formatPressure,
  formatTemperature,
  formatVolume,
  massToG,
  parseQuantity,
  pressureToKpa,
  temperatureToC,
  volumeToMl,
} from "./index";
import { propertyRuns } from "@/tests/support/property-runs";

describe("parseQuantity reads what a technician types", () => {
  it.each([
    ["32 psi", "pressure", { value: 32, unit: "psi" }],
    ["32psig", "pressure", { value: 32, unit: "psi", reference: "gauge" }],
    ["14.7 psia", "pressure", { value: 14.7, unit: "psi", reference: "absolute" }],
    ["2.1 bar", "pressure", { value: 2.1, unit: "bar" }],
    ["2,1 bar", "pressure", { value: 2.1, unit: "bar" }],
    ["1.45 MPa", "pressure", { value: 1.45, unit: "MPa" }],
    ["220 kPa", "pressure", { value: 220, unit: "kPa" }],
    ["28 inHg", "pressure", { value: 28, unit: "inHg" }],
    ["29.5 in Hg", "pressure", { value: 29.5, unit: "inHg" }],
    ["75F", "temperature", { value: 75, unit: "F" }],
    ["75 °F", "temperature", { value: 75, unit: "F" }],
    ["−5 °C", "temperature", { value: -5, unit: "C" }],
    ["-12.5C", "temperature", { value: -12.5, unit: "C" }],
    ["300 K", "temperature", { value: 300, unit: "K" }],
    ["650 g", "mass", { value: 650, unit: "g" }],
    ["1.4 kg", "mass", { value: 1.4, unit: "kg" }],
    ["1 lb 4 oz", "mass", { value: 20, unit: "oz" }],
    ["1lb4oz", "mass", { value: 20, unit: "oz" }],
    ["2 lbs", "mass", { value: 2, unit: "lb" }],
    ["120 mL", "volume", { value: 120, unit: "mL" }],
    ["4 fl oz", "volume", { value: 4, unit: "floz" }],
    ["4.5 floz", "volume", { value: 4.5, unit: "floz" }],
  ] as const)("%s", (text, kind, expected) => {
    expect(parseQuantity(text, kind, "kPa")).toEqual(expected);
  });

  it("reads thousands separators and decimal marks by the reader's locale (common practice)", () => {
    // A mass field once read "1,200" as 1.2 g and refused it.
    expect(parseQuantity("1,200", "mass", "g", { locale: "en-US" })).toEqual({ value: 1200, unit: "g" });
    expect(parseQuantity("1,200 g", "mass", "g")).toEqual({ value: 1200, unit: "g" });
    expect(parseQuantity("1.200,5 g", "mass", "g", { locale: "de-DE" })).toEqual({
      value: 1200.5,
      unit: "g",
    });
    expect(parseQuantity("1,200.5 g", "mass", "g", { locale: "de-DE" })).toEqual({
      value: 1200.5,
      unit: "g",
    });
    expect(parseQuantity("1 200 g", "mass", "g", { locale: "fr-FR" })).toEqual({ value: 1200, unit: "g" });
    expect(parseQuantity("1\u202f200 g", "mass", "g", { locale: "fr-FR" })).toEqual({
      value: 1200,
      unit: "g",
    });
    expect(parseQuantity("1’200 g", "mass", "g", { locale: "de-CH" })).toEqual({ value: 1200, unit: "g" });
    expect(parseQuantity("2,1 bar", "pressure", "kPa", { locale: "en-US" })).toEqual({
      value: 2.1,
      unit: "bar",
    });
    expect(parseQuantity("-5,5 °C", "temperature", "C", { locale: "de" })).toEqual({
      value: -5.5,
      unit: "C",
    });
  });

  it("asks where a locale with decimal commas leaves a number truly ambiguous", () => {
    for (const text of ["1,200 g", "1.200 g"]) {
      const asked = parseQuantity(text, "mass", "g", { locale: "de-DE" });
      expect(asked).toMatchObject({ ambiguous: { decimal: 1.2, thousands: 1200 } });
      expect("error" in asked && asked.error).toMatch(/Did you mean 1,2 or 1\.200\?/);
    }
    const refused = parseQuantity("1,400 g", "mass", "g", { ambiguousComma: "reject" });
    expect("error" in refused && refused.error).toMatch(/ambiguous/);
  });

  it("a decimal mark is accepted where it cannot be a thousands separator, even where ambiguity is asked about", () => {
    const reject = { ambiguousComma: "reject" } as const;
    expect(parseQuantity("0,125 kg", "mass", "g", reject)).toEqual({ value: 0.125, unit: "kg" });
    expect(parseQuantity("1,45 MPa", "pressure", "kPa", reject)).toEqual({ value: 1.45, unit: "MPa" });
    expect(parseQuantity("1,4000 kg", "mass", "g", reject)).toEqual({ value: 1.4, unit: "kg" });
    expect(parseQuantity("12,5 kg", "mass", "g", { locale: "de" })).toEqual({ value: 12.5, unit: "kg" });
  });

  it("a bare number takes the default unit", () => {
    expect(parseQuantity("180", "pressure", "psi")).toEqual({ value: 180, unit: "psi" });
    expect(parseQuantity(" 24 ", "temperature", "C")).toEqual({ value: 24, unit: "C" });
  });

  it("sums a compound mass in its smaller unit, consistent with the separate conversions (NIST SP 811 factors)", () => {
    const parsed = parseQuantity("2 kg 300 g", "mass", "g");
    expect(parsed).toEqual({ value: 2300, unit: "g" });
    const pounds = parseQuantity("1 lb 8 oz", "mass", "g");
    if (!("value" in pounds)) throw new Error(pounds.error);
    expect(massToG(pounds.value, "oz")).toBeCloseTo(massToG(1.5, "lb"), 9);
  });

  it.each([
    ["", "pressure", /Enter a pressure/],
    ["abc", "pressure", /Could not read “abc” as a pressure/],
    ["32 furlongs", "pressure", /Could not read/],
    ["75 F", "pressure", /is a temperature unit, not a pressure unit/],
    ["32 psi 4", "pressure", /Could not read/],
    ["30 psi 2 bar", "pressure", /Could not read/],
    ["4 oz 1 lb", "mass", /Could not read/],
    ["1 lb 4", "mass", /Could not read/],
    ["1 lb -4 oz", "mass", /Could not read/],
  ] as const)("refuses %j with a helpful message", (text, kind, message) => {
    const parsed = parseQuantity(text, kind, kind === "mass" ? "g" : "psi");
    expect(parsed).toHaveProperty("error");
    if ("error" in parsed) expect(parsed.error).toMatch(message);
  });

  it("reads units typed with doubled spaces or a tab between their words", () => {
    expect(parseQuantity("220 kPa  abs", "pressure", "psi")).toEqual({
      value: 220,
      unit: "kPa",
      reference: "absolute",
    });
    expect(parseQuantity("4 fl\t oz", "volume", "mL")).toEqual({ value: 4, unit: "floz" });
  });

  it("quotes what was typed, without its surrounding spaces, and says the expected kind of unit", () => {
    expect(parseQuantity("  abc ", "pressure", "psi")).toEqual({
      error: "Could not read “abc” as a pressure. Try for example 32 psi, 2.2 bar or 220 kPa.",
    });
    const ambiguous = parseQuantity(" 1,400 ", "mass", "g", { ambiguousComma: "reject" });
    expect("error" in ambiguous && ambiguous.error).toMatch(/^“1,400” is ambiguous/);
    expect(parseQuantity("75 F", "pressure", "psi")).toEqual({
      error: "“F” is a temperature unit, not a pressure unit.",
    });
    // a bare number takes the default unit, so a default of the wrong kind is named
    expect(parseQuantity("180", "pressure", "C")).toEqual({
      error: "“C” is a temperature unit, not a pressure unit.",
    });
  });

  it("refuses text it cannot read to the end, or at all, for every kind", () => {
    for (const kind of ["pressure", "temperature", "mass", "volume"] as const) {
      expect(parseQuantity("abc", kind, "g")).toHaveProperty("error");
      expect(parseQuantity("2.1 bar 3-", kind, "bar")).toHaveProperty("error");
    }
  });

  it("sums only masses, largest unit first, each unit once; zero in the smaller unit is fine", () => {
    expect(parseQuantity("2 bar 30 psi", "pressure", "psi")).toHaveProperty("error");
    expect(parseQuantity("1 lb 4 lb", "mass", "g")).toHaveProperty("error");
    expect(parseQuantity("1 lb 0 oz", "mass", "g")).toEqual({ value: 16, unit: "oz" });
  });

  it("never throws on any text", () => {
    fc.assert(
      fc.property(
        fc.string(),
        fc.constantFrom("pressure", "temperature", "mass", "volume" as const),
        (text, kind) => {
          const parsed = parseQuantity(text, kind, "psi");
          if ("value" in parsed) expect(Number.isFinite(parsed.value)).toBe(true);
        },
      ),
      { numRuns: propertyRuns(3000) },
    );
  });
});

describe("format then parse gives the value back to the shown precision", () => {
  it("pressure", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 5000, noNaN: true }),
        fc.constantFrom("kPa", "bar", "MPa", "psi" as const),
        (kpa, unit) => {
          const parsed = parseQuantity(formatPressure(kpa, unit), "pressure", "kPa");
          if (!("value" in parsed)) throw new Error(parsed.error);
          expect(parsed.unit).toBe(unit);
          expect(Math.abs(pressureToKpa(parsed.value, unit) - kpa)).toBeLessThanOrEqual(
            pressureToKpa(0.5, unit) + 1e-9,
          );
        },
      ),
    );
  });

  it("temperature", () => {
    fc.assert(
      fc.property(
        fc.double({ min: -60, max: 150, noNaN: true }),
        fc.constantFrom("C", "F", "K" as const),
        (c, unit) => {
          const parsed = parseQuantity(formatTemperature(c, unit), "temperature", "C");
          if (!("value" in parsed)) throw new Error(parsed.error);
          expect(
            Math.abs(temperatureToC(parsed.value, parsed.unit as "C" | "F" | "K") - c),
          ).toBeLessThanOrEqual(0.05 + 1e-9);
        },
      ),
    );
  });

  it("mass and volume", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 5000, noNaN: true }),
        fc.constantFrom("g", "kg", "oz", "lb" as const),
        (g, unit) => {
          const parsed = parseQuantity(formatMass(g, unit), "mass", "g");
          if (!("value" in parsed)) throw new Error(parsed.error);
          expect(Math.abs(massToG(parsed.value, unit) - g)).toBeLessThanOrEqual(
            massToG(unit === "g" ? 0.5 : unit === "oz" ? 0.05 : 0.005, unit) + 1e-9,
          );
        },
      ),
    );
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 1000, noNaN: true }),
        fc.constantFrom("mL", "floz" as const),
        (ml, unit) => {
          const parsed = parseQuantity(formatVolume(ml, unit), "volume", "mL");
          if (!("value" in parsed)) throw new Error(parsed.error);
          expect(Math.abs(volumeToMl(parsed.value, unit) - ml)).toBeLessThanOrEqual(
            volumeToMl(unit === "mL" ? 0.5 : 0.05, unit) + 1e-9,
          );
        },
      ),
    );
  });
});
