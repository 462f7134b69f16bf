import { describe, expect, it } from "vitest";
import { parseSpecCsv } from "./parse-csv";
import type { SpecRow } from "./schema";

// NIST SP 811 (2008) App. B exact factors, written out here so the test does not lean on lib/units.
const G_PER_OZ = 28.349523125;
const G_PER_LB = 453.59237;
const ML_PER_FLOZ = 29.5735295625;

const HEADER =
  "year_from,year_to,make,model,variant,rear_ac,refrigerant,label_charge_g,oil_type,total_oil_ml";

describe("parseSpecCsv: the optional compressor_type column", () => {
  it("reads cycling clutch, variable and electric, leaves an empty cell out, and names an unknown word", () => {
    const csv = [
      `${HEADER},compressor_type`,
      "2016,2019,Ford,Explorer,3.5L V6,no,R-134a,765,PAG 46,210,cycling clutch",
      "2016,2019,Ford,Explorer,3.5L V6,yes,R-134a,1130,PAG 46,270,Variable displacement",
      "2021,2024,Toyota,Prius,,no,R-1234yf,440,POE,,electric",
      "2021,2024,Toyota,Corolla,,no,R-1234yf,440,PAG 46,,",
      "2021,2024,Toyota,Camry,,no,R-1234yf,440,PAG 46,,turbo",
    ].join("\n");
    const r = parseSpecCsv(csv);
    expect(r.rows.map((x) => x.values?.compressorType)).toEqual([
      "cycling_clutch",
      "variable_displacement",
      "electric",
      undefined,
      undefined,
    ]);
    expect(r.rows[4]?.problems.join(" ")).toMatch(/compressor_type "turbo"/);
  });
});

describe("parseSpecCsv: good rows", () => {
  it("reads every column of well-formed rows with their line numbers", () => {
    const csv = [
      HEADER,
      "2016,2019,Ford,Explorer,3.5L V6,no,R-134a,765,PAG 46,210",
      "2016,2019,Ford,Explorer,3.5L V6,yes,R-134a,1130,PAG 46,270",
      "2021,2024,Toyota,Corolla,,no,R-1234yf,440,PAG 46,",
    ].join("\n");
    const r = parseSpecCsv(csv);
    expect(r.fileProblems).toEqual([]);
    expect(r.rows.map((x) => x.line)).toEqual([2, 3, 4]);
    expect(r.rows.every((x) => x.problems.length === 0)).toBe(true);
    expect(r.rows[0]?.values).toEqual({
      yearFrom: 2016,
      yearTo: 2019,
      make: "Ford",
      model: "Explorer",
      variant: "3.5L V6",
      rearAc: false,
      refrigerant: "R-134a",
      labelChargeG: 765,
      oilType: "PAG 46",
      totalOilMl: 210,
    } satisfies SpecRow);
    expect(r.rows[1]?.values?.rearAc).toBe(true);
    expect(r.rows[2]?.values?.totalOilMl).toBeNull();
    expect(r.rows[2]?.values?.variant).toBe("");
  });

  it("converts a header unit suffix: label_charge_oz and total_oil_floz (NIST SP 811 factors)", () => {
    const csv =
      "year_from,year_to,make,model,rear_ac,refrigerant,label_charge_oz,oil_type,total_oil_floz\n2012,2015,Honda,Civic,no,134a,21.5,PAG 46,4.5";
    const v = parseSpecCsv(csv).rows[0]?.values;
    expect(v?.labelChargeG).toBe(Math.round(21.5 * G_PER_OZ));
    expect(v?.totalOilMl).toBe(Math.round(4.5 * ML_PER_FLOZ));
    expect(v?.refrigerant).toBe("R-134a");
  });

  it("converts per-row unit columns and units written in the cell", () => {
    const csv = [
      "year_from,year_to,make,model,rear_ac,refrigerant,label_charge,charge_unit,oil_type,total_oil,oil_unit",
      "2010,2014,Chevrolet,Tahoe,yes,R134a,1.6,lb,PAG 150,5,fl oz",
      "2018,2022,Kia,Niro,no,HFO-1234yf,0.55 kg,,POE,4 oz,",
      "2018,2022,Kia,Soul,no,R-1234yf,1 lb 4 oz,,PAG 46,120 mL,",
    ].join("\n");
    const rows = parseSpecCsv(csv).rows;
    expect(rows.map((r) => r.problems)).toEqual([[], [], []]);
    expect(rows[0]?.values?.labelChargeG).toBe(Math.round(1.6 * G_PER_LB));
    expect(rows[0]?.values?.totalOilMl).toBe(Math.round(5 * ML_PER_FLOZ));
    expect(rows[1]?.values?.labelChargeG).toBe(550);
    expect(rows[1]?.values?.totalOilMl).toBe(Math.round(4 * ML_PER_FLOZ));
    expect(rows[2]?.values?.labelChargeG).toBe(Math.round(20 * G_PER_OZ));
  });

  it("uses the caller's default units for bare numbers", () => {
    const csv =
      "years,make,model,rear_ac,refrigerant,label_charge,oil_type,total_oil\n2015-2018,Subaru,Outback,no,R-134a,19,PAG 46,4";
    const v = parseSpecCsv(csv, { units: { charge: "oz", oil: "floz" } }).rows[0]?.values;
    expect(v?.labelChargeG).toBe(Math.round(19 * G_PER_OZ));
    expect(v?.yearFrom).toBe(2015);
    expect(v?.yearTo).toBe(2018);
  });

  it("reads semicolon files with decimal commas, a byte-order mark and CRLF line ends", () => {
    const csv =
      "\uFEFFyear;make;model;rear_ac;refrigerant;label_charge_kg;oil_type\r\n2019;Škoda;Octavia;no;R-1234yf;0,525;PAG 46\r\n";
    const r = parseSpecCsv(csv);
    expect(r.delimiter).toBe(";");
    expect(r.rows[0]?.problems).toEqual([]);
    expect(r.rows[0]?.values?.labelChargeG).toBe(525);
    expect(r.rows[0]?.values?.make).toBe("Škoda");
    expect(parseSpecCsv(csv.replace("0,525", "1,250")).rows[0]?.values?.labelChargeG).toBe(1250);
  });

  it("counts physical lines past quoted cells that span lines and past blank lines", () => {
    const csv = `${HEADER}\n2016,2019,Ford,Explorer,"3.5L V6\nwith tow package",no,R-134a,765,PAG 46,210\n\n2016,2019,Ford,Explorer,2.3L,no,R-134a,740,PAG 46,210`;
    expect(parseSpecCsv(csv).rows.map((r) => r.line)).toEqual([2, 5]);
  });

  it("counts lines in files that end lines with a lone carriage return", () => {
    const csv = `${HEADER}\r2016,2019,Ford,Explorer,,no,R-134a,765,PAG 46,210\r2016,2019,Ford,Explorer,,yes,R-134a,1130,PAG 46,270`;
    const r = parseSpecCsv(csv);
    expect(r.rows.map((x) => x.line)).toEqual([2, 3]);
    expect(r.rows.every((x) => x.problems.length === 0)).toBe(true);
  });

  it("counts lines in a file that mixes lone carriage returns with CR LF (rows pasted from two exports)", () => {
    const row1 = "2016,2019,Ford,Explorer,,no,R-134a,765,PAG 46,210";
    const row2 = "2016,2019,Ford,Explorer,,yes,R-134a,1130,PAG 46,270";
    for (const csv of [`${HEADER}\r${row1}\r\n${row2}`, `${HEADER}\r\n${row1}\r${row2}\n`]) {
      const r = parseSpecCsv(csv);
      expect(r.rows.map((x) => x.line)).toEqual([2, 3]);
      expect(r.rows.map((x) => x.values?.labelChargeG)).toEqual([765, 1130]);
    }
  });

  it("lists columns it does not use", () => {
    expect(
      parseSpecCsv(`${HEADER},notes\n2016,2019,Ford,Explorer,,no,R-134a,765,PAG 46,210,ok`).ignoredColumns,
    ).toEqual(["notes"]);
  });
});

describe("parseSpecCsv: bad rows", () => {
  const bad = (row: string) => parseSpecCsv(`${HEADER}\n${row}`).rows[0]!;

  it.each([
    ["2016,2019,,Explorer,,no,R-134a,765,PAG 46,210", "make is missing"],
    ["2016,2019,Ford,Explorer,,no,R-134a,abc,PAG 46,210", 'label charge "abc" is not a mass'],
    ["2019,2016,Ford,Explorer,,no,R-134a,765,PAG 46,210", "the first year is after the last (2019 to 2016)"],
    ["201x,2019,Ford,Explorer,,no,R-134a,765,PAG 46,210", 'year_from "201x" is not a four-digit year'],
    ["2016,2019,Ford,Explorer,,no,R-22,765,PAG 46,210", 'unknown refrigerant "R-22"'],
    ["1990,1993,Ford,Explorer,,no,R-12,765,PAG 46,210", "R-12 is not covered"],
    ["2016,2019,Ford,Explorer,,no,R-134a,50,PAG 46,210", "label charge 50 g is outside 100–3000 g"],
    ["2016,2019,Ford,Explorer,,no,R-134a,3400,PAG 46,210", "label charge 3400 g is outside 100–3000 g"],
    ['2016,2019,Ford,Explorer,,no,R-134a,"1,250",PAG 46,210', "without a thousands separator"],
    ["2016,2019,Ford,Explorer,,maybe,R-134a,765,PAG 46,210", 'rear_ac "maybe"'],
    ["2016,2019,Ford,Explorer,,no,R-134a,765,,210", "oil_type is missing"],
    ["2016,2019,Ford,Explorer,,no,R-134a,765,PAG 46,5000", "total oil 5000 mL is outside"],
    ["2016,2019,Ford,Explorer,,no,R-134a,765 oz,PAG 46,210", "is in oz but the column says g"],
  ])("%s → %s", (row, expected) => {
    const r = bad(row);
    expect(r.values).toBeUndefined();
    expect(r.problems.join(" | ")).toContain(expected);
  });

  it("reports a header without required columns on the file and on every row", () => {
    const r = parseSpecCsv(
      "year_from,year_to,make,model,rear_ac,refrigerant,label_charge_g\n2016,2019,Ford,Explorer,no,R-134a,765",
    );
    expect(r.fileProblems).toEqual(["Missing column: oil_type."]);
    expect(r.rows[0]?.problems[0]).toBe("missing column: oil_type");
    expect(r.rows[0]?.values).toBeUndefined();
  });

  it("reports a row cut short and a row with too many cells", () => {
    const r = parseSpecCsv(
      `${HEADER}\n2016,2019,Ford,Explorer,,no,R-134a\n2016,2019,Ford,Explorer,,no,R-134a,765,PAG 46,210,extra`,
    );
    expect(r.rows[0]?.problems.join(" ")).toContain("missing columns: label_charge, oil_type");
    expect(r.rows[1]?.problems.join(" ")).toContain("more cells than the header");
  });

  it("refuses a file with nothing in it, or too many rows", () => {
    expect(parseSpecCsv(" \n").fileProblems).toEqual(["The file is empty."]);
    const many = [
      HEADER,
      ...Array.from({ length: 4 }, (_, i) => `2016,2019,Ford,Model ${i},,no,R-134a,765,PAG 46,210`),
    ].join("\n");
    const r = parseSpecCsv(many, { maxRows: 3 });
    expect(r.rows).toHaveLength(3);
    expect(r.fileProblems[0]).toContain("at most 3");
  });
});

describe("parseSpecCsv: duplicates", () => {
  it("flags a repeat of make + model + variant + years + rear A/C, ignoring case and punctuation", () => {
    const csv = [
      HEADER,
      "2015,2020,Ford,F-150,2.7L EcoBoost,no,R-134a,907,PAG 46,250",
      "2015,2020,FORD,f150,2.7l ecoboost,no,R-134a,907,PAG 46,250",
      "2015,2020,Ford,F-150,2.7L EcoBoost,no,R-134a,850,PAG 46,250",
    ].join("\n");
    const rows = parseSpecCsv(csv).rows;
    expect(rows[0]?.problems).toEqual([]);
    expect(rows[1]?.problems).toEqual(["duplicate of line 2"]);
    expect(rows[2]?.problems).toEqual(["duplicate of line 2 with a different charge (907 g there)"]);
  });

  it("does not treat front-only and front-and-rear of the same model as duplicates", () => {
    const csv = [
      HEADER,
      "2016,2019,Ford,Explorer,,no,R-134a,765,PAG 46,210",
      "2016,2019,Ford,Explorer,,yes,R-134a,1130,PAG 46,270",
    ].join("\n");
    expect(parseSpecCsv(csv).rows.map((r) => r.problems)).toEqual([[], []]);
  });

  it("warns about overlapping years for the same variant without blocking", () => {
    const csv = [
      HEADER,
      "2016,2019,Ford,Explorer,,no,R-134a,765,PAG 46,210",
      "2018,2021,Ford,Explorer,,no,R-134a,740,PAG 46,210",
    ].join("\n");
    const rows = parseSpecCsv(csv).rows;
    expect(rows[1]?.problems).toEqual([]);
    expect(rows[1]?.warnings[0]).toContain("years overlap line 2");
  });

  it("flags a row already in the shop's table", () => {
    const existing: SpecRow[] = [
      {
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
      },
    ];
    const r = parseSpecCsv(`${HEADER}\n2016,2019,ford,EXPLORER,,no,R-134a,765,PAG 46,210`, { existing });
    expect(r.rows[0]?.problems).toEqual(["already in the spec table"]);
  });
});
