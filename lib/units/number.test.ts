import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { ambiguityQuestion, numberConventions, readNumberToken } from "./number";

describe("readNumberToken reads numbers the way people write them (common practice)", () => {
  it.each([
    ["1,200", "en-US", 1200],
    ["1,200.5", "en-US", 1200.5],
    ["1,2", "en-US", 1.2],
    ["1.200", "en-US", 1.2],
    ["1.200,5", "de-DE", 1200.5],
    ["1,2", "de-DE", 1.2],
    ["0,500", "de-DE", 0.5],
    ["1.25", "de-DE", 1.25],
    ["1 200", "fr-FR", 1200],
    ["1'200", "de-CH", 1200],
    ["1,200,000", "en-GB", 1200000],
    ["1.200.000", "de-DE", 1200000],
  ] as const)("%s in %s is %d", (text, locale, value) => {
    expect(readNumberToken(text, locale)).toEqual({ value });
  });

  it("asks about a comma or point before three digits where the comma is the decimal mark", () => {
    expect(readNumberToken("1,200", "de-DE")).toEqual({
      ambiguous: { text: "1,200", decimal: 1.2, thousands: 1200 },
    });
    expect(readNumberToken("1.200", "fr-FR")).toMatchObject({ ambiguous: { decimal: 1.2, thousands: 1200 } });
    expect(ambiguityQuestion({ decimal: 1.2, thousands: 1200 }, "en-US")).toMatch(/1\.2 or 1,200/);
  });

  it("takes a declared decimal mark without asking", () => {
    expect(readNumberToken("1,250", "de-DE", ",")).toEqual({ value: 1.25 });
    expect(readNumberToken("1.250", "de-DE", ",")).toEqual({ value: 1250 });
  });

  it("refuses broken grouping rather than guess", () => {
    expect(readNumberToken("1,20,0", "en-US")).toHaveProperty("error");
    expect(readNumberToken("1.2.3,4", "de-DE")).toHaveProperty("error");
  });

  it("reads back what the locale itself writes, for any value with a fraction", () => {
    fc.assert(
      fc.property(
        fc.constantFrom("en-US", "de-DE", "fr-FR", "en-IN", "es-ES", "pt-BR"),
        fc.integer({ min: 0, max: 99_999_999 }),
        fc.integer({ min: 1, max: 9 }),
        (locale, whole, tenth) => {
          const value = whole + tenth / 10;
          const text = new Intl.NumberFormat(locale, { minimumFractionDigits: 1, maximumFractionDigits: 1 })
            .format(value)
            .replace(/\u202f|\u00a0/g, " ");
          // en-IN groups in twos above a thousand; we read only groups of three, and say so.
          const read = readNumberToken(text, locale);
          if ("value" in read) expect(read.value).toBeCloseTo(value, 6);
          else expect(locale === "en-IN" && whole >= 100_000).toBe(true);
        },
      ),
    );
  });

  it("finds each locale's marks", () => {
    expect(numberConventions("de-DE").decimal).toBe(",");
    expect(numberConventions("en-US").decimal).toBe(".");
    expect(numberConventions("not a locale").decimal).toBe(".");
  });
});
