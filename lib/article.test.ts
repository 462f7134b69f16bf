import { describe, expect, it } from "vitest";
import { REFRIGERANT_IDS } from "@/lib/refrigerants/catalog";
import { indefiniteArticle, withArticle } from "./article";

describe("a or an, by how the next word is spoken", () => {
  it("says an before every refrigerant name: the R is spoken 'ar'", () => {
    expect(withArticle("R-134a")).toBe("an R-134a");
    expect(withArticle("R-1234yf")).toBe("an R-1234yf");
    expect(withArticle("R-12")).toBe("an R-12");
    for (const id of REFRIGERANT_IDS) expect(indefiniteArticle(id), id).toBe("an");
  });

  it("says an before numbers spoken with a vowel: eight…, eleven, eighteen", () => {
    for (const n of [
      "8 g",
      "80 g",
      "800 g",
      "8,000 g",
      "11 °C",
      "18 °C",
      "11,000 g",
      "18,500 g",
      "11000 g",
      "8.5 oz",
    ])
      expect(indefiniteArticle(n), n).toBe("an");
  });

  it("says a before the other numbers", () => {
    for (const n of [
      "1 lb",
      "110 g",
      "180 g",
      "1,100 g",
      "1,800 g",
      "1800 g",
      "650 g",
      "24 °C",
      "−8 °C",
      "0.8 kg",
    ])
      expect(indefiniteArticle(n), n).toBe("a");
  });

  it("goes by the first letter of a word", () => {
    expect(withArticle("orifice tube")).toBe("an orifice tube");
    expect(withArticle("TXV")).toBe("a TXV");
  });
});
