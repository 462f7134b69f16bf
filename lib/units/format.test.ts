import { describe, expect, it } from "vitest";
import {
  absoluteToGaugeKpa,
  formatMass,
  formatPressure,
  formatTemperature,
  formatTemperatureDifference,
  formatVolume,
  pressureToKpa,
} from "./index";

describe("formatting for the technician", () => {
  it("pressure: whole psi and kPa above 100, two decimals of bar, gauge or absolute labelled (psi per NIST SP 811)", () => {
    expect(formatPressure(1206.6, "psi", { gauge: true })).toBe("175 psig");
    expect(formatPressure(101.325, "psi", { gauge: false })).toBe("14.7 psia");
    expect(formatPressure(564.056, "kPa", { gauge: true })).toBe("564 kPa (gauge)");
    expect(formatPressure(210, "bar")).toBe("2.10 bar");
    expect(formatPressure(3000, "MPa", { gauge: true })).toBe("3.000 MPa (gauge)");
    expect(formatPressure(-67.7, "kPa")).toBe("−67.7 kPa");
  });

  it("switches to fewer decimals at exactly 100 kPa, psi or bar, and shows a vacuum gauge in inHg to 0.1", () => {
    expect(formatPressure(100, "kPa")).toBe("100 kPa");
    expect(formatPressure(99.94, "kPa")).toBe("99.9 kPa");
    expect(formatPressure(pressureToKpa(100, "psi"), "psi", { gauge: true })).toBe("100 psig");
    expect(formatPressure(10000, "bar")).toBe("100.0 bar");
    expect(formatPressure(15000, "bar")).toBe("150.0 bar");
    expect(formatPressure(pressureToKpa(28, "inHg"), "inHg")).toBe("28.0 inHg");
    expect(formatPressure(pressureToKpa(28, "inHg"), "inHg", { gauge: true })).toBe("28.0 inHg");
  });

  it("an absolute internal pressure is shown as gauge after converting it first", () => {
    // R-134a at 25 °C: 665.381 kPa abs (Tillner-Roth & Baehr 1994 EOS) − 101.325 = 564.056 kPa = 81.81 psi.
    expect(formatPressure(absoluteToGaugeKpa(665.381), "psi", { gauge: true })).toBe("81.8 psig");
  });

  it("temperature to one decimal, no negative zero", () => {
    expect(formatTemperature(23.889, "C")).toBe("23.9 °C");
    expect(formatTemperature(23.889, "F")).toBe("75.0 °F");
    expect(formatTemperature(-0.01, "C")).toBe("0.0 °C");
    expect(formatTemperature(-26.07, "C")).toBe("−26.1 °C");
    expect(formatTemperature(0, "K")).toBe("273.1 K");
  });

  it("temperature differences carry no offset: 5 K is 9 °F", () => {
    expect(formatTemperatureDifference(5, "F")).toBe("9.0 °F");
    expect(formatTemperatureDifference(5, "K")).toBe("5.0 K");
  });

  it("mass and volume", () => {
    expect(formatMass(680, "oz")).toBe("24.0 oz");
    expect(formatMass(680, "lb")).toBe("1.50 lb");
    expect(formatMass(680, "kg")).toBe("0.680 kg");
    expect(formatMass(680.4, "g")).toBe("680 g");
    expect(formatVolume(120, "floz")).toBe("4.1 fl oz");
    expect(formatVolume(120, "mL")).toBe("120 mL");
  });
});
