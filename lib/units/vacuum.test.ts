import { describe, expect, it } from "vitest";
import { standardBarometricKpa } from "./barometric";
import { deepestVacuumInHg, formatVacuum, parseVacuum, vacuumFieldText } from "./vacuum";

const seaLevel = { altitudeM: 0 };

describe("parseVacuum reads a vacuum as the gauge shows it", () => {
  it("takes inHg as a depth below the local atmosphere, with or without a minus sign", () => {
    const read = parseVacuum("29.9 inHg", "kPa", { at: seaLevel });
    // 101.325 − 29.9 × 3.386389 = 0.0726 kPa absolute (NIST SP 811 inch of mercury).
    expect(read).toMatchObject({ value: 29.9, unit: "inHg" });
    if (!("kpaAbs" in read)) throw new Error(read.error);
    expect(read.kpaAbs).toBeCloseTo(101.325 - 29.9 * 3.386389, 6);
    expect(read.readAs).toMatch(/below the local atmosphere/);
    expect(parseVacuum("-29.9", "inHg", { at: seaLevel })).toMatchObject({ value: 29.9, unit: "inHg" });
  });

  it("takes microns, kPa and mbar as absolute pressures (NIST SP 811: 1 torr = 101325/760 Pa)", () => {
    const microns = parseVacuum("500 microns", "inHg");
    if (!("kpaAbs" in microns)) throw new Error(microns.error);
    expect(microns.kpaAbs).toBeCloseTo(0.0666612, 6);
    expect(microns.readAs).toMatch(/micron/);
    expect(parseVacuum("500", "micron")).toMatchObject({ value: 500, unit: "micron" });
    expect(parseVacuum("0.4 kPa abs", "inHg")).toMatchObject({ kpaAbs: 0.4, unit: "kPa" });
    expect(parseVacuum("4 mbar", "inHg")).toMatchObject({ unit: "mbar" });
    expect(parseVacuum("1,500 microns", "inHg", { locale: "en-US" })).toMatchObject({ value: 1500 });
  });

  it("refuses a reading deeper than the air at the shop's altitude allows, and says why", () => {
    // At 1600 m the standard atmosphere is about 83.5 kPa, 24.7 inHg (US Standard Atmosphere 1976).
    const high = { altitudeM: 1600 };
    expect(deepestVacuumInHg(high)).toBeCloseTo(standardBarometricKpa(1600) / 3.386389, 9);
    const refused = parseVacuum("29.5 inHg", "inHg", { at: high });
    expect("error" in refused && refused.error).toMatch(/deeper vacuum than the air here allows.*24\.7 inHg/);
    expect(parseVacuum("24.5 inHg", "inHg", { at: high })).toHaveProperty("kpaAbs");
  });

  it("refuses a positive pressure and a negative absolute one", () => {
    expect(parseVacuum("120 kPa", "inHg", { at: seaLevel })).toHaveProperty("error");
    expect(parseVacuum("-5 kPa", "inHg")).toHaveProperty("error");
    expect(parseVacuum("30 psi", "inHg")).toHaveProperty("error");
  });

  it("shows a deep vacuum as a vacuum, never as a pressure above zero, and in microns where a dial cannot tell", () => {
    expect(formatVacuum(20, "inHg", seaLevel)).toBe("24.02 inHg vacuum");
    expect(formatVacuum(0.0666612, "inHg", seaLevel)).toBe(
      "29.90 inHg vacuum (500 microns)".replace("29.90", "29.9"),
    );
    expect(formatVacuum(0.0666612, "micron")).toBe("500 microns");
    // Shown with thousands separators; the field's own text stays as typed, without them.
    expect(formatVacuum(0.1999836, "micron")).toBe("1,500 microns");
    expect(formatVacuum(0.1999836, "inHg", seaLevel)).toMatch(/ \(1,500 microns\)$/);
    expect(vacuumFieldText(0.1999836, "micron", seaLevel)).toBe("1500 microns");
    expect(vacuumFieldText(0.06666, "inHg", seaLevel)).toBe("500 microns");
    expect(vacuumFieldText(0.07197, "micron", seaLevel)).toBe("29.9 inHg");
    expect(vacuumFieldText(0.35, "inHg", seaLevel)).toBe("0.35 kPa");
    const inHg = parseVacuum(vacuumFieldText(20, "inHg", seaLevel), "kPa", { at: seaLevel });
    expect("kpaAbs" in inHg && inHg.kpaAbs).toBeCloseTo(20, 2);
  });
});
