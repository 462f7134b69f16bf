import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { SERVICE_REFRIGERANT_IDS } from "@/lib/refrigerants/catalog";
import { specRowsToCsv } from "./export-csv";
import { parseSpecCsv } from "./parse-csv";
import type { SpecRow } from "./schema";

const sample: SpecRow[] = [
  {
    yearFrom: 2016,
    yearTo: 2019,
    make: "Ford",
    model: "Explorer",
    variant: "3.5L V6, tow",
    rearAc: true,
    refrigerant: "R-134a",
    labelChargeG: 1130,
    oilType: "PAG 46",
    totalOilMl: 270,
    compressorType: "variable_displacement",
  },
  {
    yearFrom: 2021,
    yearTo: 2024,
    make: "Toyota",
    model: "=Corolla",
    variant: "",
    rearAc: false,
    refrigerant: "R-1234yf",
    labelChargeG: 440,
    oilType: "PAG 46",
    totalOilMl: null,
  },
];

describe("specRowsToCsv", () => {
  it("writes the canonical header, yes/no for rear A/C, quotes and defused formulas", () => {
    const csv = specRowsToCsv(sample);
    const lines = csv.split("\r\n");
    expect(lines[0]).toBe(
      "year_from,year_to,make,model,variant,rear_ac,refrigerant,label_charge_g,oil_type,total_oil_ml,compressor_type",
    );
    expect(lines[1]).toBe(
      '2016,2019,Ford,Explorer,"3.5L V6, tow",yes,R-134a,1130,PAG 46,270,variable displacement',
    );
    expect(lines[2]).toBe(`2021,2024,Toyota,"'=Corolla",,no,R-1234yf,440,PAG 46,,`);
  });

  it("writes ounces and fluid ounces when asked (NIST SP 811: 1 oz = 28.349523125 g)", () => {
    const lines = specRowsToCsv(sample, { units: { charge: "oz", oil: "floz" } }).split("\r\n");
    expect(lines[0]).toContain("label_charge_oz");
    expect(lines[0]).toContain("total_oil_floz");
    expect(lines[1]).toContain(`,${Math.round((1130 / 28.349523125) * 100) / 100},`);
  });

  it("reads back what it wrote", () => {
    expect(parseSpecCsv(specRowsToCsv(sample)).rows.map((r) => r.values)).toEqual(sample);
  });

  const text = fc
    .string({ unit: fc.constantFrom(...'abcXYZ019 ,;"=-@é/'.split("")), minLength: 1, maxLength: 12 })
    .map((s) => s.trim())
    .filter((s) => s.length > 0);
  const row: fc.Arbitrary<SpecRow> = fc
    .record({
      yearFrom: fc.integer({ min: 1990, max: 2030 }),
      span: fc.integer({ min: 0, max: 8 }),
      make: text,
      model: text,
      variant: fc.oneof(fc.constant(""), text),
      rearAc: fc.boolean(),
      refrigerant: fc.constantFrom(...SERVICE_REFRIGERANT_IDS),
      labelChargeG: fc.integer({ min: 100, max: 3000 }),
      oilType: text,
      totalOilMl: fc.option(fc.integer({ min: 20, max: 1000 }), { nil: null }),
    })
    .map(({ span, ...r }) => ({ ...r, yearTo: r.yearFrom + span }));

  it.each([
    ["g", "mL"],
    ["oz", "floz"],
    ["lb", "mL"],
  ] as const)(
    "property: export in %s / %s then import gives the same rows (whole grams and millilitres)",
    (charge, oil) => {
      fc.assert(
        fc.property(fc.array(row, { minLength: 1, maxLength: 6 }), (rows) => {
          const back = parseSpecCsv(specRowsToCsv(rows, { units: { charge, oil } })).rows;
          expect(back.map((r) => r.values)).toEqual(rows);
        }),
      );
    },
  );
});
