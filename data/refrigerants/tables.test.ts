import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { buildSaturationTable, serializeSaturationTable } from "./build-table";
import { VAPOUR_PRESSURE_EQUATIONS, wagnerPressureKpaAbs } from "./equations";

const directory = join(process.cwd(), "data", "refrigerants");

describe("bundled saturation tables", () => {
  for (const eq of VAPOUR_PRESSURE_EQUATIONS) {
    describe(eq.id, () => {
      const committedText = readFileSync(join(directory, eq.fileName), "utf8");
      const committed = JSON.parse(committedText) as ReturnType<typeof buildSaturationTable>;

      it("matches a fresh in-memory regeneration (run `npm run data:refrigerants` after changing an equation)", () => {
        const fresh = buildSaturationTable(eq);
        expect(committed).toEqual(fresh);
        expect(committedText).toBe(serializeSaturationTable(fresh));
      });

      it("carries its metadata: equation, source, critical point, range and step", () => {
        expect(committed.source).toMatch(/\b(19|20)\d\d\b/);
        expect(committed.provenance).toMatch(/vapour-pressure equation/);
        expect(committed.minTempC).toBe(committed.tempC[0]);
        expect(committed.maxTempC).toBe(committed.tempC.at(-1));
        expect(committed.maxTempC).toBeCloseTo(eq.criticalTempK - 273.15, 4);
        expect(committed.pressureKpaAbs.at(-1)).toBeCloseTo(eq.criticalPressureKpaAbs, 3);
        expect(committed.stepK).toBeGreaterThan(0);
      });

      it("has strictly rising temperatures and pressures on an even grid", () => {
        for (let i = 1; i < committed.tempC.length; i++) {
          expect(committed.tempC[i]!).toBeGreaterThan(committed.tempC[i - 1]!);
          expect(committed.pressureKpaAbs[i]!).toBeGreaterThan(committed.pressureKpaAbs[i - 1]!);
          if (i < committed.tempC.length - 1)
            expect(committed.tempC[i]! - committed.tempC[i - 1]!).toBeCloseTo(committed.stepK, 9);
        }
      });

      it("stores the equation's values to ten significant digits", () => {
        committed.tempC.forEach((tempC, i) => {
          const exact = wagnerPressureKpaAbs(eq, tempC + 273.15);
          expect(Math.abs(committed.pressureKpaAbs[i]! / exact - 1)).toBeLessThan(1e-9);
        });
      });
    });
  }
});
