import { describe, expect, it } from "vitest";
import { normaliseVin, vinCheckDigit, vinCheckDigitMatches, vinFormatError } from "./vin";

describe("VIN checks (49 CFR 565.15)", () => {
  it("computes the check digit of the worked example 1M8GDM9AXKP042788 as X (49 CFR 565.15 example)", () => {
    expect(vinCheckDigit("1M8GDM9AXKP042788")).toBe("X");
    expect(vinCheckDigitMatches("1M8GDM9AXKP042788")).toBe(true);
  });

  it("flags a transposed character through the check digit", () => {
    expect(vinCheckDigitMatches("1M8GDM9AXKP042787")).toBe(false);
  });

  it("rejects I, O and Q, wrong lengths and punctuation with plain messages (ISO 3779)", () => {
    expect(vinFormatError("1M8GDM9AXKP04278O")).toMatch(/I, O or Q/);
    expect(vinFormatError("1M8GDM9AXKP0427")).toMatch(/17 characters; this one has 15/);
    expect(vinFormatError("1M8GDM9AXKP04278*")).toMatch(/only letters and digits/);
    expect(vinFormatError("1M8GDM9AXKP042788")).toBeNull();
  });

  it("normalises spaces, dashes and lower case", () => {
    expect(normaliseVin(" 1m8gdm9a-xkp 042788 ")).toBe("1M8GDM9AXKP042788");
  });
});
