import { describe, expect, it } from "vitest";
import {
  readGaugeKpa,
  readMassG,
  readPlainNumber,
  readTemperatureC,
  readVacuumKpaAbs,
  readVolumeMl,
} from "./entry";

describe("service record entries", () => {
  it("reads masses in g, kg, oz and lb (NIST SP 811 App. B: 1 oz = 28.349523125 g, 1 lb = 453.59237 g)", () => {
    expect(readMassG("650")).toEqual({ value: 650 });
    expect(readMassG("1.4 kg")).toEqual({ value: 1400 });
    expect(readMassG("23 oz")).toEqual({ value: Math.round(23 * 28.349523125) });
    expect(readMassG("1 lb 7 oz")).toEqual({ value: Math.round(453.59237 + 7 * 28.349523125) });
    expect(readMassG("24", "oz")).toEqual({ value: Math.round(24 * 28.349523125) });
    expect(readMassG("")).toEqual({ empty: true });
    expect(readMassG("lots")).toHaveProperty("error");
    expect(readMassG("-5")).toHaveProperty("error");
  });

  it("reads oil in mL and US fluid ounces, a bare oz meaning fl oz (NIST SP 811: 1 US fl oz = 29.5735295625 mL)", () => {
    expect(readVolumeMl("45")).toEqual({ value: 45 });
    expect(readVolumeMl("2 fl oz")).toEqual({ value: Math.round(2 * 29.5735295625) });
    expect(readVolumeMl("2 oz")).toEqual({ value: Math.round(2 * 29.5735295625) });
    expect(readVolumeMl("2 kg")).toHaveProperty("error");
  });

  it("reads inHg as vacuum below the local atmosphere (NIST SP 811: 1 inHg = 3.386389 kPa; US Standard Atmosphere 1976 at sea level 101.325 kPa)", () => {
    const r = readVacuumKpaAbs("29 inHg", { altitudeM: 0 });
    expect("value" in r && r.value).toBeCloseTo(101.325 - 29 * 3.386389, 2);
    expect(readVacuumKpaAbs("0.2 kPa")).toEqual({ value: 0.2 });
    expect(readVacuumKpaAbs("31 inHg")).toHaveProperty("error");
  });

  it("gives the same inHg reading a higher absolute pressure at altitude (US Standard Atmosphere 1976: about 84.6 kPa at 1500 m)", () => {
    const sea = readVacuumKpaAbs("20 inHg", { altitudeM: 0 });
    const high = readVacuumKpaAbs("20 inHg", { altitudeM: 1500 });
    if (!("value" in sea) || !("value" in high)) throw new Error("expected values");
    expect(sea.value - high.value).toBeCloseTo(101.325 - 84.56, 0);
  });

  it("reads gauge pressures and temperatures in the shop's units (NIST SP 811: 1 psi = 6.894757 kPa)", () => {
    expect(readGaugeKpa("32 psi")).toEqual({ value: Math.round(32 * 6.894757 * 100) / 100 });
    expect(readTemperatureC("77", "F")).toEqual({ value: 25 });
    expect(readPlainNumber("99.2 %", "a percentage")).toEqual({ value: 99.2 });
    expect(readPlainNumber("abc", "a percentage")).toHaveProperty("error");
  });
});

describe("vacuum at altitude", () => {
  it("refuses 25 inHg at 1500 m, where the whole atmosphere is about 25 inHg (US Standard Atmosphere 1976: 84.56 kPa)", () => {
    expect(readVacuumKpaAbs("25 inHg", { altitudeM: 1500 })).toHaveProperty("error");
  });
});
