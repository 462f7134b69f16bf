import { describe, expect, it } from "vitest";
import { psychrolibSi } from "@/lib/psychro/psychrolib-si";
import { saturationPressure } from "@/lib/refrigerants";
import {
  absoluteToGaugeKpa,
  gaugeToAbsoluteKpa,
  kpaAbsToVacuumInHg,
  pressureToKpa,
  standardBarometricKpa,
  vacuumInHgToKpaAbs,
} from "./index";

describe("standard atmosphere (US Standard Atmosphere 1976; ASHRAE Handbook—Fundamentals 2017, ch. 1, table 1)", () => {
  it.each([
    [-500, 107.478],
    [0, 101.325],
    [500, 95.461],
    [1000, 89.875],
    [1500, 84.556],
    [4000, 61.64],
  ])("at %d m the barometer reads %d kPa", (altitudeM, kpa) => {
    expect(Math.abs(standardBarometricKpa(altitudeM) - kpa)).toBeLessThan(0.002);
  });

  it("computes exactly what psychrolib's GetStandardAtmPressure does, from -500 to 9000 m", () => {
    for (let altitudeM = -500; altitudeM <= 9000; altitudeM += 12.5)
      expect(standardBarometricKpa(altitudeM)).toBe(psychrolibSi().GetStandardAtmPressure(altitudeM) / 1000);
  });

  it("refuses altitudes no shop has", () => {
    expect(() => standardBarometricKpa(12000)).toThrow("Altitude must be between -500 and 9000 m.");
    expect(() => standardBarometricKpa(Number.NaN)).toThrow(RangeError);
  });

  it("about 1 inHg less atmosphere per 1000 ft of altitude (common practice)", () => {
    const dropInHg = (standardBarometricKpa(0) - standardBarometricKpa(304.8)) / pressureToKpa(1, "inHg");
    expect(dropInHg).toBeGreaterThan(0.9);
    expect(dropInHg).toBeLessThan(1.2);
  });
});

describe("gauge and absolute", () => {
  it("at sea level a gauge adds one standard atmosphere, 101.325 kPa", () => {
    expect(gaugeToAbsoluteKpa(0)).toBeCloseTo(101.325, 6);
    expect(absoluteToGaugeKpa(gaugeToAbsoluteKpa(564))).toBeCloseTo(564, 9);
  });

  it("the same R-134a system at 25 °C reads about 17 kPa higher on the gauge in a shop at 1500 m (Tillner-Roth & Baehr 1994 EOS; ASHRAE standard atmosphere)", () => {
    const absKpa = saturationPressure("R-134a", 25); // 665.381 kPa per the EOS
    const seaLevelGaugeKpa = absoluteToGaugeKpa(absKpa);
    const mountainGaugeKpa = absoluteToGaugeKpa(absKpa, { altitudeM: 1500 });
    expect(seaLevelGaugeKpa).toBeCloseTo(665.381 - 101.325, 0);
    expect(mountainGaugeKpa).toBeCloseTo(665.381 - 84.556, 0);
    expect(mountainGaugeKpa - seaLevelGaugeKpa).toBeCloseTo(101.325 - 84.556, 3);
  });

  it("a gauge reading converts to a lower absolute pressure in a mountain shop (standard atmosphere: 101.325 kPa at sea level, 84.556 kPa at 1500 m, ASHRAE Handbook—Fundamentals ch. 1 table 1)", () => {
    const readingKpaGauge = pressureToKpa(32, "psi");
    expect(
      gaugeToAbsoluteKpa(readingKpaGauge) - gaugeToAbsoluteKpa(readingKpaGauge, { altitudeM: 1500 }),
    ).toBeCloseTo(16.769, 2);
  });

  it("a measured barometric pressure wins over the altitude", () => {
    expect(gaugeToAbsoluteKpa(100, { altitudeM: 1500, barometricKpa: 99.1 })).toBeCloseTo(199.1, 9);
    expect(() => gaugeToAbsoluteKpa(100, { barometricKpa: -3 })).toThrow(RangeError);
    // no atmosphere at all is not a barometer reading either
    expect(() => gaugeToAbsoluteKpa(100, { barometricKpa: 0 })).toThrow(
      "Barometric pressure must be a positive number.",
    );
  });
});

describe("vacuum gauge in inHg", () => {
  it("a full vacuum at sea level reads 29.92 inHg (one standard atmosphere in conventional inHg, NIST SP 811)", () => {
    expect(kpaAbsToVacuumInHg(0)).toBeCloseTo(29.921, 3);
    expect(vacuumInHgToKpaAbs(29.921)).toBeCloseTo(0, 2);
  });

  it("the same 25 inHg vacuum is a deeper absolute vacuum at sea level than at 1500 m (ASHRAE Handbook—Fundamentals ch. 1 table 1; inHg: NIST SP 811)", () => {
    const seaLevel = vacuumInHgToKpaAbs(25);
    const mountain = vacuumInHgToKpaAbs(25, { altitudeM: 1500 });
    expect(seaLevel).toBeCloseTo(101.325 - 25 * 3.386389, 6);
    expect(seaLevel - mountain).toBeCloseTo(101.325 - 84.556, 2);
    expect(kpaAbsToVacuumInHg(mountain, { altitudeM: 1500 })).toBeCloseTo(25, 9);
  });
});
