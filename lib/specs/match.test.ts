import { describe, expect, it } from "vitest";
import { matchSpecRows } from "./match";
import type { SpecRow } from "./schema";

const row = (p: Partial<SpecRow>): SpecRow => ({
  yearFrom: 2016,
  yearTo: 2019,
  make: "Ford",
  model: "Explorer",
  variant: "",
  rearAc: false,
  refrigerant: "R-134a",
  labelChargeG: 765,
  oilType: "PAG 46",
  totalOilMl: 210,
  ...p,
});

const table: SpecRow[] = [
  row({}),
  row({ rearAc: true, labelChargeG: 1130 }),
  row({ yearFrom: 2020, yearTo: 2024, refrigerant: "R-1234yf", labelChargeG: 680 }),
  row({ make: "Chevrolet", model: "Silverado", yearFrom: 2014, yearTo: 2018, labelChargeG: 740 }),
  row({
    make: "Chevrolet",
    model: "Silverado 1500",
    variant: "5.3L V8",
    yearFrom: 2014,
    yearTo: 2018,
    labelChargeG: 710,
  }),
  row({
    make: "Toyota",
    model: "Camry",
    variant: "2.5L",
    yearFrom: 2018,
    yearTo: 2021,
    refrigerant: "R-1234yf",
    labelChargeG: 500,
  }),
  row({
    make: "Toyota",
    model: "Camry",
    variant: "2.5L Hybrid",
    yearFrom: 2018,
    yearTo: 2021,
    refrigerant: "R-1234yf",
    labelChargeG: 470,
  }),
];

describe("matchSpecRows", () => {
  it("offers both the front-only and the front-and-rear rows when the vehicle does not say", () => {
    const m = matchSpecRows({ year: 2018, make: "FORD", model: "explorer" }, table);
    expect(m.map((x) => x.row.labelChargeG).sort()).toEqual([1130, 765]);
    expect(m.every((x) => x.reasons.some((r) => r.includes("check")))).toBe(true);
  });

  it("puts the variant with the vehicle's rear A/C first", () => {
    const m = matchSpecRows({ year: 2018, make: "Ford", model: "Explorer", rearAc: true }, table);
    expect(m[0]?.row.labelChargeG).toBe(1130);
    expect(m).toHaveLength(2);
  });

  it("keeps to the year range", () => {
    expect(
      matchSpecRows({ year: 2021, make: "Ford", model: "Explorer" }, table).map((x) => x.row.labelChargeG),
    ).toEqual([680]);
    expect(matchSpecRows({ year: 2015, make: "Ford", model: "Explorer" }, table)).toEqual([]);
  });

  it("prefers the exact model to a shorter one that covers it", () => {
    const m = matchSpecRows(
      { year: 2016, make: "Chevrolet", model: "Silverado 1500", engine: "5.3L V8" },
      table,
    );
    expect(m.map((x) => x.row.labelChargeG)).toEqual([710, 740]);
    expect(
      matchSpecRows({ year: 2016, make: "Chevrolet", model: "Silverado" }, table).map(
        (x) => x.row.labelChargeG,
      ),
    ).toEqual([740]);
  });

  it("ranks the engine variant that matches the vehicle's engine first", () => {
    const hybrid = matchSpecRows({ year: 2019, make: "Toyota", model: "Camry", engine: "2.5 hybrid" }, table);
    expect(hybrid[0]?.row.labelChargeG).toBe(470);
    expect(hybrid).toHaveLength(2);
  });

  it("does not match another make or model", () => {
    expect(matchSpecRows({ year: 2018, make: "Ford", model: "Expedition" }, table)).toEqual([]);
    expect(matchSpecRows({ year: 2018, make: "Lincoln", model: "Explorer" }, table)).toEqual([]);
  });
});
