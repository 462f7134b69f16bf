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
