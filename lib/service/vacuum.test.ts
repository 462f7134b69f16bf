import fc from "fast-check";
import psychrolib from "psychrolib";
import { describe, expect, it } from "vitest";
import { kpaAbsToVacuumInHg, pressureToKpa } from "@/lib/units";
import {
  DEFAULT_HOLD_LIMIT,
  evacuationTarget,
  evaluateEvacuation,
  vacuumHoldFromGauge,
  vacuumHoldTest,
} from "./vacuum";
import { waterSaturationKpaAbs } from "./water-boiling";

const FT_TO_M = 0.3048; // NIST SP 811 App. B: 1 ft = 0.3048 m exactly

describe("evacuationTarget", () => {
  it("is 28 inHg of vacuum at sea level, i.e. about 6.5 kPa absolute (TM 5-3805-296-23-4 WP 0248; NIST SP 811 inHg)", () => {
    const t = evacuationTarget({ altitudeM: 0 });
    expect(t.minimumVacuumInHg).toBeCloseTo(28, 6);
    expect(t.preferredVacuumInHg).toBeCloseTo(29, 6);
    expect(t.maxKpaAbs).toBeCloseTo(101.325 - 28 * 3.386389, 6);
  });

  it.each([
    [1000, 27],
    [2000, 26],
    [3000, 25],
    [5000, 23],
  ])(
    "at %i ft it is about 1 inHg less per 1000 ft (TM 5-3805-296-23-4 WP 0248), within 0.25 inHg",
    (feet, manualInHg) => {
      expect(
        Math.abs(evacuationTarget({ altitudeM: feet * FT_TO_M }).minimumVacuumInHg - manualInHg),
      ).toBeLessThan(0.25);
    },
  );

  it("at 1500 m uses the standard atmosphere of 84.556 kPa (ASHRAE Handbook—Fundamentals ch. 1 table 1)", () => {
    const t = evacuationTarget({ altitudeM: 1500 });
    expect(t.barometricKpa).toBeCloseTo(84.556, 2);
    expect(t.minimumVacuumInHg).toBeCloseTo((84.556 - t.maxKpaAbs) / 3.386389, 2);
  });

  it("prefers the shop's barometer reading over the altitude", () => {
    expect(evacuationTarget({ altitudeM: 1500, barometricKpa: 99 }).barometricKpa).toBe(99);
  });
});

describe("waterSaturationKpaAbs", () => {
  it.each([
    [20, 2.3392],
    [25, 3.1699],
    [30, 4.247],
    [40, 7.3849],
  ])("at %i °C is %f kPa within 0.1 % (IAPWS-95, Wagner & Pruß 2002 — from memory)", (tempC, kpa) => {
    expect(Math.abs(waterSaturationKpaAbs(tempC) / kpa - 1)).toBeLessThan(0.001);
  });

  it("agrees with the psychrolib package's GetSatVapPres over 1–99 °C (both ASHRAE Handbook—Fundamentals 2017 ch. 1 eq. 6)", () => {
    psychrolib.SetUnitSystem(psychrolib.SI);
    for (let tempC = 1; tempC < 100; tempC += 7) {
      expect(
        Math.abs(waterSaturationKpaAbs(tempC) / (psychrolib.GetSatVapPres(tempC) / 1000) - 1),
      ).toBeLessThan(1e-6);
    }
  });

  it.each([
    [100, 28],
    [90, 28.5],
    [81, 28.8],
    [70, 29.2],
  ])(
    "water boils at %i °F under about %f inHg of vacuum at sea level (TM 5-3805-296-23-4 WP 0248 table), within 0.1 inHg",
    (tempF, inHg) => {
      const tempC = ((tempF - 32) * 5) / 9;
      expect(
        Math.abs(kpaAbsToVacuumInHg(waterSaturationKpaAbs(tempC), { altitudeM: 0 }) - inHg),
      ).toBeLessThan(0.1);
    },
  );

  it("refuses temperatures outside the equation's range", () => {
    expect(() => waterSaturationKpaAbs(-5)).toThrow(RangeError);
  });
});

describe("evaluateEvacuation", () => {
  it("passes a vacuum deeper than the target and fails a shallow one", () => {
    expect(evaluateEvacuation({ deepestKpaAbs: 3, altitudeM: 0 }).reached).toBe(true);
    const shallow = evaluateEvacuation({ deepestKpaAbs: 10, altitudeM: 0 });
    expect(shallow.reached).toBe(false);
    expect(shallow.messages[0]).toContain("Keep evacuating");
  });

  it("warns that moisture will not boil at 21 °C with 3 kPa absolute (water boils below ≈2.49 kPa, ASHRAE ch. 1)", () => {
    const r = evaluateEvacuation({ deepestKpaAbs: 3, altitudeM: 0, ambientC: 21 });
    expect(r.reached).toBe(true);
    expect(r.waterBoils).toBe(false);
    expect(r.waterBoilsBelowKpaAbs).toBeCloseTo(2.487, 2);
    expect(r.messages[1]).toContain("moisture will not leave");
    expect(evaluateEvacuation({ deepestKpaAbs: 1.5, altitudeM: 0, ambientC: 21 }).waterBoils).toBe(true);
  });
});

describe("vacuumHoldTest", () => {
  it("the default limit is 2 inHg in 5 min (TM 5-2420-230-24-1; TM 5-3805-296-23-4 WP 0248)", () => {
    expect(DEFAULT_HOLD_LIMIT.riseKpa).toBeCloseTo(2 * 3.386389, 6);
    expect(DEFAULT_HOLD_LIMIT.perMinutes).toBe(5);
  });

  it("passes a rise of 1.5 inHg in 5 min and fails 2.5 inHg with a leak-or-moisture message", () => {
    const start = 4;
    const pass = vacuumHoldTest({ startKpaAbs: start, endKpaAbs: start + 1.5 * 3.386389, minutes: 5 });
    expect(pass.verdict).toBe("pass");
    const fail = vacuumHoldTest({ startKpaAbs: start, endKpaAbs: start + 2.5 * 3.386389, minutes: 5 });
    expect(fail.verdict).toBe("fail");
    expect(fail.message).toContain("a leak or moisture");
    expect(fail.riseKpa).toBeCloseTo(2.5 * 3.386389, 9);
  });

  it("scales the limit with the hold's length and warns about short holds", () => {
    const rise = 3 * 3.386389;
    expect(vacuumHoldTest({ startKpaAbs: 3, endKpaAbs: 3 + rise, minutes: 10 }).verdict).toBe("pass");
    expect(vacuumHoldTest({ startKpaAbs: 3, endKpaAbs: 3 + rise, minutes: 5 }).verdict).toBe("fail");
    expect(vacuumHoldTest({ startKpaAbs: 3, endKpaAbs: 3.5, minutes: 2 }).warnings[0]).toContain(
      "less than 5 min",
    );
  });

  it("applies the shop's own stricter limit", () => {
    const limit = { riseKpa: pressureToKpa(1, "inHg"), perMinutes: 5 };
    expect(vacuumHoldTest({ startKpaAbs: 3, endKpaAbs: 3 + 1.5 * 3.386389, minutes: 5, limit }).verdict).toBe(
      "fail",
    );
  });

  it("notes a vacuum that deepened during the hold", () => {
    const r = vacuumHoldTest({ startKpaAbs: 5, endKpaAbs: 4, minutes: 5 });
    expect(r.verdict).toBe("pass");
    expect(r.warnings.join(" ")).toContain("deepened");
  });

  it("rejects impossible inputs", () => {
    expect(() => vacuumHoldTest({ startKpaAbs: 3, endKpaAbs: 4, minutes: 0 })).toThrow(RangeError);
    expect(() => vacuumHoldTest({ startKpaAbs: -1, endKpaAbs: 4, minutes: 5 })).toThrow(RangeError);
  });
});

describe("vacuumHoldFromGauge", () => {
  it("reads a 29.0 → 27.5 inHg hold over 5 min at sea level as a pass", () => {
    const r = vacuumHoldFromGauge({ startVacuumInHg: 29, endVacuumInHg: 27.5, minutes: 5, altitudeM: 0 });
    expect(r.verdict).toBe("pass");
    expect(r.riseKpa).toBeCloseTo(1.5 * 3.386389, 6);
  });

  it("says plainly when a reading is deeper than the local atmosphere allows", () => {
    expect(() =>
      vacuumHoldFromGauge({ startVacuumInHg: 29.5, endVacuumInHg: 29, minutes: 5, altitudeM: 1500 }),
    ).toThrow(/check the gauge/);
  });

  it("property: the rise does not depend on the altitude the gauge was read at (same barometer for both readings)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 3000, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 5, noNaN: true }),
        (altitudeM, depthFraction, lossInHg) => {
          const startVacuumInHg = kpaAbsToVacuumInHg(0.5 + depthFraction * 20, { altitudeM });
          const r = vacuumHoldFromGauge({
            startVacuumInHg,
            endVacuumInHg: startVacuumInHg - lossInHg,
            minutes: 5,
            altitudeM,
          });
          expect(r.riseKpa).toBeCloseTo(lossInHg * 3.386389, 6);
          if (Math.abs(lossInHg - 2) > 1e-6) expect(r.verdict).toBe(lossInHg < 2 ? "pass" : "fail");
        },
      ),
    );
  });
});
