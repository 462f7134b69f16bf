import { describe, expect, it } from "vitest";
import { normalisePlate, phoneDigits, plateError } from "./plate";

describe("plates and phone numbers as the search compares them", () => {
  it("leaves out spaces, dashes and dots and upper-cases letters", () => {
    expect(normalisePlate(" 7kj-214 ")).toBe("7KJ214");
    expect(normalisePlate("hb.12 ab")).toBe("HB12AB");
  });

  it("refuses signs and over-long plates with a reason", () => {
    expect(plateError("7KJ214")).toBeNull();
    expect(plateError("7KJ/214")).toBe("A plate has letters and digits only.");
    expect(plateError("ABCDEFGHIJKLM")).toMatch(/at most 12/);
  });

  it("keeps only the digits of a phone number", () => {
    expect(phoneDigits("(902) 555-0147")).toBe("9025550147");
    expect(phoneDigits("+1 902.555.0147")).toBe("19025550147");
  });
});
