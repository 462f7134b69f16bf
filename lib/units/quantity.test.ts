import { describe, expect, it } from "vitest";
import {
  formatQuantity,
  gaugeKpaQuantity,
  massGQuantity,
  quantityMarker,
  sayInUnits,
  tempCQuantity,
  vacuumKpaAbsQuantity,
} from "./quantity";
import { readerUnitsOf, unitsOfSystem } from "./reader";

const imperial = unitsOfSystem("imperial");

describe("formatQuantity says a quantity in the reader's units (NIST SP 811 factors)", () => {
  it("gauge pressure, temperature, mass, vacuum", () => {
    expect(formatQuantity(gaugeKpaQuantity(206.843))).toBe("207 kPa gauge");
    expect(formatQuantity(gaugeKpaQuantity(206.843), imperial)).toBe("30.0 psig");
    expect(formatQuantity(tempCQuantity(55), imperial)).toBe("131.0 °F");
    expect(formatQuantity(tempCQuantity(-40), imperial)).toBe("−40.0 °F");
    expect(formatQuantity(massGQuantity(1200), imperial)).toBe("42.3 oz");
    expect(formatQuantity(vacuumKpaAbsQuantity(20), imperial, { altitudeM: 0 })).toBe("24.02 inHg vacuum");
    expect(formatQuantity({ kind: "temperature_difference", value: 5 }, imperial)).toBe("9.0 °F");
  });

  it("groups thousands in masses and volumes, as scales and labels show them (common practice)", () => {
    expect(formatQuantity(massGQuantity(4660))).toBe("4,660 g");
    expect(formatQuantity(massGQuantity(-99_340))).toBe("−99,340 g");
    expect(formatQuantity(massGQuantity(999))).toBe("999 g");
    // 1 oz = 28.349523125 g (NIST SP 811): 40,000 g = 1,411.0 oz.
    expect(formatQuantity(massGQuantity(40_000), imperial)).toBe("1,411.0 oz");
    expect(formatQuantity({ kind: "volume", value: 1250 })).toBe("1,250 mL");
    // Pressures keep their plain digits: a gauge face has no separator.
    expect(formatQuantity(gaugeKpaQuantity(1500))).toBe("1500 kPa gauge");
  });

  it("says a change of vacuum in the unit of the reader's vacuum gauge (NIST SP 811: 1 inHg = 3.386389 kPa, 1 micron = 101.325/760 000 kPa)", () => {
    const rise = { kind: "vacuum_change", value: 3.386389 } as const;
    expect(formatQuantity(rise, imperial)).toBe("1.00 inHg");
    expect(formatQuantity(rise)).toBe("3.39 kPa");
    expect(
      formatQuantity({ kind: "vacuum_change", value: 0.0666612 }, { ...imperial, vacuum: "micron" }),
    ).toBe("500 microns");
    expect(formatQuantity(rise, { ...imperial, vacuum: "mbar" })).toBe("33.9 mbar");
  });

  it("says a limit message in the reader's units", () => {
    const message = `Ambient: above ${quantityMarker(tempCQuantity(55, 0))} is not a reading we can use`;
    expect(sayInUnits(message)).toBe("Ambient: above 55 °C is not a reading we can use");
    expect(sayInUnits(message, imperial)).toBe("Ambient: above 131 °F is not a reading we can use");
    expect(
      sayInUnits(`under ${quantityMarker(massGQuantity(50))}`, readerUnitsOf({ mass: "oz" }, "metric")),
    ).toBe("under 1.8 oz");
  });

  it("takes a person's choice over their system, and their system over the shop's", () => {
    expect(readerUnitsOf(null, "imperial")).toEqual(imperial);
    expect(readerUnitsOf({ system: "metric", pressure: "psi" }, "imperial")).toMatchObject({
      pressure: "psi",
      temperature: "C",
    });
    expect(readerUnitsOf({ pressure: "atm" as never }, "metric").pressure).toBe("kPa");
  });
});
