import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { VAPOUR_PRESSURE_EQUATIONS, wagnerPressureKpaAbs } from "@/data/refrigerants/equations";
import { SATURATION_TABLES } from "./catalog";
import {
  REFRIGERANT_IDS,
  refrigerantInfo,
  SaturationRangeError,
  saturationPressure,
  saturationTemperature,
} from "./index";
import { propertyRuns } from "@/tests/support/property-runs";

const RUNS = { numRuns: propertyRuns(2000) };
const refrigerant = fc.constantFrom(...REFRIGERANT_IDS);
const inRangeTemp = refrigerant.chain((id) => {
  const { minTempC, maxTempC } = refrigerantInfo(id);
  return fc.record({ id: fc.constant(id), tempC: fc.double({ min: minTempC, max: maxTempC, noNaN: true }) });
});

describe("saturation lookups, property-based", () => {
  it("saturationTemperature(saturationPressure(T)) returns T within 0.01 K over the whole range", () => {
    fc.assert(
      fc.property(inRangeTemp, ({ id, tempC }) => {
        expect(Math.abs(saturationTemperature(id, saturationPressure(id, tempC)) - tempC)).toBeLessThan(0.01);
      }),
      RUNS,
    );
  });

  it("the round trip from pressure is just as tight", () => {
    const inRangePressure = refrigerant.chain((id) => {
      const { minTempC, maxTempC } = refrigerantInfo(id);
      const low = saturationPressure(id, minTempC);
      const high = saturationPressure(id, maxTempC);
      return fc.record({
        id: fc.constant(id),
        pressureKpaAbs: fc.double({ min: low, max: high, noNaN: true }),
      });
    });
    fc.assert(
      fc.property(inRangePressure, ({ id, pressureKpaAbs }) => {
        const back = saturationPressure(id, saturationTemperature(id, pressureKpaAbs));
        expect(Math.abs(back / pressureKpaAbs - 1)).toBeLessThan(1e-5);
      }),
      RUNS,
    );
  });

  it("round trips at and either side of every grid node, where interval look-up is most fragile", () => {
    for (const id of REFRIGERANT_IDS) {
      const { minTempC, maxTempC } = refrigerantInfo(id);
      for (const nodeC of SATURATION_TABLES[id].tempC) {
        for (const offsetK of [-1e-7, 0, 1e-7]) {
          const tempC = Math.min(maxTempC, Math.max(minTempC, nodeC + offsetK));
          expect(Math.abs(saturationTemperature(id, saturationPressure(id, tempC)) - tempC)).toBeLessThan(
            1e-4,
          );
        }
      }
    }
  });

  it("pressure rises strictly with temperature", () => {
    fc.assert(
      fc.property(inRangeTemp, fc.double({ min: 1e-4, max: 150, noNaN: true }), ({ id, tempC }, stepK) => {
        const higherC = tempC + stepK;
        if (higherC > refrigerantInfo(id).maxTempC) return;
        expect(saturationPressure(id, higherC)).toBeGreaterThan(saturationPressure(id, tempC));
      }),
      RUNS,
    );
  });

  const equations = new Map(VAPOUR_PRESSURE_EQUATIONS.map((eq) => [eq.id, eq]));
  const tableError = (id: (typeof REFRIGERANT_IDS)[number], tempC: number) =>
    Math.abs(saturationPressure(id, tempC) / wagnerPressureKpaAbs(equations.get(id)!, tempC + 273.15) - 1);

  it("the table adds far less than 0.01 % to the published equation anywhere in range (each equation's paper)", () => {
    fc.assert(
      fc.property(inRangeTemp, ({ id, tempC }) => {
        expect(tableError(id, tempC)).toBeLessThan(1e-5);
      }),
      RUNS,
    );
  });

  // Away from the critical point the curve is smooth and the cubic is near exact; a straight line
  // between grid points would add about 7e-7 here.
  it("more than 20 K below the critical point the table adds under 1e-8 relative", () => {
    const workingRange = refrigerant.chain((id) => {
      const { minTempC, maxTempC } = refrigerantInfo(id);
      return fc.record({
        id: fc.constant(id),
        tempC: fc.double({ min: minTempC, max: maxTempC - 20, noNaN: true }),
      });
    });
    fc.assert(
      fc.property(workingRange, ({ id, tempC }) => {
        expect(tableError(id, tempC)).toBeLessThan(1e-8);
      }),
      RUNS,
    );
  });

  it("no number other than NaN throws anything but SaturationRangeError, and results are finite", () => {
    const anyNumber = fc.oneof(
      fc.double({ noNaN: true }),
      fc.double({ min: -100, max: 200, noNaN: true }),
      fc.double({ min: -100, max: 10000, noNaN: true }),
    );
    fc.assert(
      fc.property(refrigerant, anyNumber, (id, value) => {
        for (const lookup of [saturationPressure, saturationTemperature]) {
          try {
            expect(Number.isFinite(lookup(id, value))).toBe(true);
          } catch (error) {
            expect(error).toBeInstanceOf(SaturationRangeError);
          }
        }
      }),
      RUNS,
    );
  });
});
