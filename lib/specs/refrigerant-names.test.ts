import { describe, expect, it } from "vitest";
import { parseRefrigerantName } from "./refrigerant-names";

describe("parseRefrigerantName (ASHRAE 34 designations)", () => {
  it.each([
    ["R-134a", "R-134a"],
    ["r134a", "R-134a"],
    ["HFC-134a", "R-134a"],
    ["R-1234yf", "R-1234yf"],
    ["HFO 1234yf", "R-1234yf"],
    ["CO2", "R-744"],
    ["CO₂", "R-744"],
    ["R-744", "R-744"],
    ["R-12", "R-12"],
    ["R-22", null],
    ["", null],
  ])("%s → %s", (text, id) => {
    expect(parseRefrigerantName(text)).toBe(id);
  });
});
