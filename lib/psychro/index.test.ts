import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { standardBarometricKpa } from "@/lib/units";
import { dewPointC, wetBulbC } from "./index";

// Saturation vapour pressure of water, ASHRAE Handbook—Fundamentals 2017, ch. 1, table 3 (over ice below 0 °C).
const WATER_SATURATION_PA = { "-5": 401.74, "5": 872.6, "25": 3169.7 } as const;

describe("dew point (ASHRAE Handbook—Fundamentals 2017 ch. 1)", () => {
  it("25 °C air holding the vapour of 5 °C saturated air has a 5 °C dew point (table 3)", () => {
    const relativeHumidityPct = (100 * WATER_SATURATION_PA["5"]) / WATER_SATURATION_PA["25"];
    expect(Math.abs(dewPointC({ dryBulbC: 25, relativeHumidityPct }) - 5)).toBeLessThan(0.05);
  });

  it("below freezing the dew point is a frost point, over ice (table 3 at −5 °C)", () => {
    const relativeHumidityPct = (100 * WATER_SATURATION_PA["-5"]) / WATER_SATURATION_PA["25"];
    expect(Math.abs(dewPointC({ dryBulbC: 25, relativeHumidityPct }) - -5)).toBeLessThan(0.05);
  });

  it("ASHRAE example 1: 40 °C dry bulb at 14 % relative humidity has a dew point near 7 °C (ch. 1, example 1)", () => {
    expect(Math.abs(dewPointC({ dryBulbC: 40, relativeHumidityPct: 14 }) - 7)).toBeLessThan(0.5);
  });

  it("does not depend on barometric pressure", () => {
    const atSea = dewPointC({ dryBulbC: 30, relativeHumidityPct: 60 });
    expect(
      dewPointC({ dryBulbC: 30, relativeHumidityPct: 60, pressureKpa: standardBarometricKpa(1500) }),
    ).toBeCloseTo(atSea, 9);
  });
});

describe("wet bulb (ASHRAE Handbook—Fundamentals 2017 ch. 1)", () => {
  it("ASHRAE example 1: 40 °C dry bulb at 14 % relative humidity, 101.325 kPa, has a 20 °C wet bulb (ch. 1, example 1)", () => {
    expect(Math.abs(wetBulbC({ dryBulbC: 40, relativeHumidityPct: 14 }) - 20)).toBeLessThan(0.5);
  });

  it("in saturated air, dew point, wet bulb and dry bulb coincide (ASHRAE Handbook—Fundamentals 2017 ch. 1, definitions)", () => {
    expect(wetBulbC({ dryBulbC: 22, relativeHumidityPct: 100 })).toBeCloseTo(22, 2);
    expect(dewPointC({ dryBulbC: 22, relativeHumidityPct: 100 })).toBeCloseTo(22, 2);
  });

  it("thinner air at altitude evaporates more readily, so the wet bulb is lower (psychrometer equation, ch. 1)", () => {
    const atSea = wetBulbC({ dryBulbC: 32, relativeHumidityPct: 40 });
    const atAltitude = wetBulbC({
      dryBulbC: 32,
      relativeHumidityPct: 40,
      pressureKpa: standardBarometricKpa(1500),
    });
    expect(atAltitude).toBeLessThan(atSea);
  });

  it("always lies between the dew point and the dry bulb", () => {
    fc.assert(
      fc.property(
        fc.double({ min: -10, max: 50, noNaN: true }),
        fc.double({ min: 1, max: 100, noNaN: true }),
        (dryBulbC, relativeHumidityPct) => {
          const dew = dewPointC({ dryBulbC, relativeHumidityPct });
          const wet = wetBulbC({ dryBulbC, relativeHumidityPct });
          expect(wet).toBeLessThanOrEqual(dryBulbC + 0.01);
          expect(wet).toBeGreaterThanOrEqual(dew - 0.01);
        },
      ),
      { numRuns: 1000 },
    );
  });
});

describe("inputs", () => {
  it("never throws anything but RangeError, whatever the numbers (property-based)", () => {
    fc.assert(
      fc.property(
        fc.double(),
        fc.double(),
        fc.option(fc.double(), { nil: undefined }),
        (dryBulbC, relativeHumidityPct, pressureKpa) => {
          for (const compute of [dewPointC, wetBulbC]) {
            try {
              expect(Number.isFinite(compute({ dryBulbC, relativeHumidityPct, pressureKpa }))).toBe(true);
            } catch (error) {
              expect(error).toBeInstanceOf(RangeError);
            }
          }
        },
      ),
      { numRuns: 1000 },
    );
  });

  it("refuses humidity outside (0, 100] % and impossible temperatures with a RangeError", () => {
    expect(() => dewPointC({ dryBulbC: 25, relativeHumidityPct: 0 })).toThrow(RangeError);
    expect(() => dewPointC({ dryBulbC: 25, relativeHumidityPct: 120 })).toThrow(RangeError);
    expect(() => wetBulbC({ dryBulbC: Number.NaN, relativeHumidityPct: 50 })).toThrow(RangeError);
    expect(() => wetBulbC({ dryBulbC: 95, relativeHumidityPct: 50 })).toThrow(RangeError);
    expect(() => wetBulbC({ dryBulbC: 25, relativeHumidityPct: 50, pressureKpa: 0 })).toThrow(RangeError);
  });
});
