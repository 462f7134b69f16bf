import { sayInUnits } from "@/lib/units/quantity";
import { unitsOfSystem } from "@/lib/units/reader";
import { describe, expect, it } from "vitest";
import { evacuationTarget, evaluateEvacuation, vacuumHoldTest } from "./vacuum";
import { waterSaturationKpaAbs } from "./water-boiling";

// The edges of the evacuation and hold rules: the limits themselves, each sentence, and the refusals.
const metric = unitsOfSystem("metric");
const microns = { ...metric, vacuum: "micron" } as const;

describe("evacuation: the target's edges and sentences", () => {
  it("reads the 500-micron target as 29.90 inHg of vacuum at sea level (1 µmHg = 0.133322 Pa, 1 inHg = 3.386389 kPa: NIST SP 811)", () => {
    expect(evacuationTarget({ altitudeM: 0 }).preferredVacuumInHg).toBeCloseTo(
      (101.325 - 500 * 0.000133322) / 3.386389,
      3,
    );
  });

  it("labels its own judgements as common practice among its sources", () => {
    const { sources } = evacuationTarget({ altitudeM: 0 });
    expect(sources).toHaveLength(4);
    expect(sources.some((s) => /500 microns with a micron gauge \(common practice\)/.test(s))).toBe(true);
  });

  it("has not reached the target at water's saturation pressure itself, only below it", () => {
    const atLine = evaluateEvacuation({ deepestKpaAbs: waterSaturationKpaAbs(20), altitudeM: 0 });
    expect(atLine.reached).toBe(false);
    expect(atLine.waterBoils).toBe(false);
    const perfect = evaluateEvacuation({ deepestKpaAbs: 0, altitudeM: 0 });
    expect(perfect.reached).toBe(true);
    expect(perfect.waterBoils).toBe(true);
  });

  it("says why a reached vacuum is enough, and keeps a micron gauge evacuating while water cannot boil", () => {
    expect(sayInUnits(evaluateEvacuation({ deepestKpaAbs: 2, altitudeM: 0 }).messages[0]!, metric)).toBe(
      "Reached 2 kPa abs: at 20.0 °C water boils below 2.34 kPa abs, so moisture can boil off.",
    );
    expect(
      sayInUnits(evaluateEvacuation({ deepestKpaAbs: 0.05, micronGauge: true }).messages[0]!, microns),
    ).toBe("Reached 375 microns: below the 500-micron target, so moisture can boil off.");
    expect(evaluateEvacuation({ deepestKpaAbs: 10, micronGauge: true }).messages[0]).toMatch(
      /^Reached only /,
    );
  });

  it("refuses a vacuum below zero absolute or not a number", () => {
    for (const bad of [-0.1, Number.NaN])
      expect(() => evaluateEvacuation({ deepestKpaAbs: bad }), String(bad)).toThrow(
        "deepestKpaAbs must be a non-negative absolute pressure",
      );
  });
});

describe("vacuum hold: the limit's edges", () => {
  const limit = { riseKpa: 1, perMinutes: 5 };
  const hold = (startKpaAbs: number, endKpaAbs: number, minutes: number, l = limit) =>
    vacuumHoldTest({ startKpaAbs, endKpaAbs, minutes, limit: l });

  it("passes a rise of exactly the limit, says both figures, and gives the rate per minute", () => {
    const r = hold(3, 4, 5);
    expect(r.verdict).toBe("pass");
    expect(sayInUnits(r.message, metric)).toBe(
      "Vacuum rose 1.00 kPa in 5 min, within the shop's limit of 1.00 kPa in 5 min: no gross leak. A vacuum hold cannot prove a small leak: leak-test under pressure after charging.",
    );
    expect(hold(3, 5, 10).riseKpaPerMin).toBeCloseTo(0.2, 12);
    expect(r.sources.length).toBeGreaterThan(0);
  });

  it("warns of a short hold only below the limit's time, and of a deepening vacuum only when it fell", () => {
    expect(hold(3, 3, 5).warnings).toEqual([]);
    expect(hold(3, 3.1, 4.9).warnings).toHaveLength(1);
  });

  it("takes 0 kPa absolute and a limit of no rise, and refuses the rest by name", () => {
    expect(hold(0, 0.5, 5).verdict).toBe("pass");
    expect(hold(3, 3, 5, { riseKpa: 0, perMinutes: 5 }).verdict).toBe("pass");
    expect(() => hold(3, Number.NaN, 5)).toThrow("hold pressures must be non-negative kPa absolute");
    expect(() => hold(3, 4, -1)).toThrow("the hold must last a positive number of minutes");
    for (const bad of [
      { riseKpa: -1, perMinutes: 5 },
      { riseKpa: 1, perMinutes: 0 },
      { riseKpa: Number.NaN, perMinutes: 5 },
    ])
      expect(() => hold(3, 4, 5, bad), JSON.stringify(bad)).toThrow(
        "the hold limit must be a non-negative rise over a positive time",
      );
  });
});

describe("water's saturation pressure: the range it is computed for", () => {
  it("takes 0 to 200 °C and refuses the rest by name", () => {
    expect(waterSaturationKpaAbs(0)).toBeGreaterThan(0);
    expect(waterSaturationKpaAbs(200)).toBeGreaterThan(waterSaturationKpaAbs(100));
    for (const bad of [-0.1, 200.1, Number.NaN])
      expect(() => waterSaturationKpaAbs(bad), String(bad)).toThrow(
        `Water saturation pressure is computed for 0–200 °C only, got ${bad} °C`,
      );
  });
});
