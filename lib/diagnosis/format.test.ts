import { describe, expect, it } from "vitest";
import { degC, grams, kelvin, pct, plain } from "./format";

describe("evidence number formatting", () => {
  it("groups thousands unless told not to (pressures are said with plain digits)", () => {
    expect(plain(1849.6, 0)).toBe("1,850");
    expect(plain(1849.6, 0, false)).toBe("1850");
  });
  it("writes negative values with a minus sign, not a hyphen", () => {
    expect(degC(-3.25)).toBe("−3.3 °C");
    expect(kelvin(-0.04)).toBe("0.0 K");
  });
  it("keeps whole percentages whole and grams whole", () => {
    expect(pct(25)).toBe("25 %");
    expect(pct(97.5)).toBe("97.5 %");
    expect(grams(1124.6)).toBe("1,125 g");
  });
});

describe("evidence number formatting edge cases", () => {
  it("agrees with Number.prototype.toFixed on ordinary values and pads fractions", () => {
    for (const value of [0, 0.05, 1.04, 12.5, 999.96, 1000, 123456.7, 1234567]) {
      expect(degC(value).replace(/,/g, "")).toBe(`${value.toFixed(1)} °C`);
    }
    expect(grams(1000000)).toBe("1,000,000 g");
    expect(grams(1001)).toBe("1,001 g");
  });
});

describe("thousands grouping at the edges of each group", () => {
  it("pads a group to three digits from 0 up to 99, and not from 100", () => {
    expect(grams(1009)).toBe("1,009 g");
    expect(grams(1010)).toBe("1,010 g");
    expect(grams(1099)).toBe("1,099 g");
    expect(grams(1100)).toBe("1,100 g");
    expect(grams(1_000_005)).toBe("1,000,005 g");
  });
});
