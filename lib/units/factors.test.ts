import { describe, expect, it } from "vitest";
import * as constants from "./factors";
import { factorsFromMathjs } from "./mathjs-factors";

describe("unit conversion factors", () => {
  it("are exactly the numbers mathjs units give", () => {
    const {
      KPA_PER_UNIT,
      GRAMS_PER_UNIT,
      MILLILITRES_PER_UNIT,
      TEMPERATURE_TO_C,
      KELVIN_PER_DIFFERENCE_UNIT,
    } = constants;
    expect({
      KPA_PER_UNIT,
      GRAMS_PER_UNIT,
      MILLILITRES_PER_UNIT,
      TEMPERATURE_TO_C,
      KELVIN_PER_DIFFERENCE_UNIT,
    }).toEqual(factorsFromMathjs());
  });

  it("match the exact definitions in NIST SP 811 appendix B", () => {
    // 1 lb = 0.45359237 kg and 1 oz = 28.349523125 g exactly; 1 psi = 6.894757 kPa (to 7 digits); 1 US fl oz = 29.57353 mL.
    expect(constants.GRAMS_PER_UNIT.lb).toBe(453.59237);
    expect(constants.GRAMS_PER_UNIT.oz).toBeCloseTo(28.349523125, 12);
    expect(constants.KPA_PER_UNIT.psi).toBeCloseTo(6.894757, 6);
    expect(constants.MILLILITRES_PER_UNIT.floz).toBeCloseTo(29.57353, 5);
    // 0 °C = 273.15 K; 1 °F difference = 5/9 K (ITS-90 and SP 811).
    expect(constants.TEMPERATURE_TO_C.K.offset).toBe(-273.15);
    expect(constants.KELVIN_PER_DIFFERENCE_UNIT.F).toBeCloseTo(5 / 9, 12);
  });
});
