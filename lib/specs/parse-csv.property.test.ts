import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { matchSpecRows } from "./match";
import { parseSpecCsv } from "./parse-csv";

const HEADER =
  "year_from,year_to,make,model,variant,rear_ac,refrigerant,label_charge_g,oil_type,total_oil_ml";
const messy = fc.string({
  unit: fc.constantFrom(...'0123456789,;"\n\r\t abcR-.=ézkglbozml'.split("")),
  maxLength: 400,
});

describe("parseSpecCsv on anything a user might upload", () => {
  it("property: never throws, and a row has values only when every cell was read and its lines increase", () => {
    fc.assert(
      fc.property(
        fc.oneof(
          messy,
          messy.map((body) => `${HEADER}\n${body}`),
        ),
        (text) => {
          const r = parseSpecCsv(text);
          let lastLine = 0;
          for (const row of r.rows) {
            expect(row.line).toBeGreaterThan(lastLine);
            lastLine = row.line;
            if (row.values) {
              expect(row.values.labelChargeG).toBeGreaterThanOrEqual(100);
              expect(row.values.labelChargeG).toBeLessThanOrEqual(3000);
              expect(row.values.yearFrom).toBeLessThanOrEqual(row.values.yearTo);
            } else {
              expect(row.problems.length).toBeGreaterThan(0);
            }
          }
        },
      ),
      { numRuns: 500 },
    );
  });

  it("property: matching never throws and only returns rows of the vehicle's make and year", () => {
    const rows = parseSpecCsv(
      [
        HEADER,
        "2016,2019,Ford,Explorer,,no,R-134a,765,PAG 46,210",
        "2016,2019,Ford,Explorer,,yes,R-134a,1130,PAG 46,270",
        "2014,2018,Chevrolet,Silverado,5.3L V8,no,R-134a,740,PAG 150,",
      ].join("\n"),
    ).rows.flatMap((r) => (r.values ? [r.values] : []));
    fc.assert(
      fc.property(
        fc.integer({ min: 1900, max: 2100 }),
        fc.string(),
        fc.string(),
        fc.option(fc.string()),
        (year, make, model, engine) => {
          for (const m of matchSpecRows({ year, make, model, engine }, rows)) {
            expect(m.row.yearFrom).toBeLessThanOrEqual(year);
            expect(m.row.yearTo).toBeGreaterThanOrEqual(year);
          }
        },
      ),
    );
  });
});
