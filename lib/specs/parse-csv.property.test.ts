import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { propertyRuns } from "@/tests/support/property-runs";
import { matchSpecRows } from "./match";
import { parseSpecCsv } from "./parse-csv";
import { LABEL_CHARGE_RANGE_G, type SpecRow } from "./schema";

const HEADER =
  "year_from,year_to,make,model,variant,rear_ac,refrigerant,label_charge_g,oil_type,total_oil_ml";
const messy = fc.string({
  unit: fc.constantFrom(...'0123456789,;"\n\r\t abcR-.=ézkglbozml'.split("")),
  maxLength: 400,
});

// Rows a spreadsheet could hold, written the way a CSV export writes them. Random characters alone almost
// never make a readable row, so this generator builds rows from the columns' own vocabulary.
const goodRow = fc.record({
  yearFrom: fc.integer({ min: 1990, max: 2025 }),
  yearTo: fc.integer({ min: 1990, max: 2033 }),
  make: fc.constantFrom("Ford", "Toyota", "Škoda", "Mazda"),
  model: fc.constantFrom("Explorer", "Corolla", "Octavia", "CX-5"),
  variant: fc.constantFrom("", "3.5L V6", "2.0, hybrid", 'the "tow" pack'),
  rearAc: fc.boolean(),
  refrigerant: fc.constantFrom("R-134a", "R-1234yf"),
  labelChargeG: fc.integer({ min: LABEL_CHARGE_RANGE_G.min, max: LABEL_CHARGE_RANGE_G.max }),
  oilType: fc.constantFrom("PAG 46", "PAG 100", "POE"),
  totalOilMl: fc.option(fc.integer({ min: 20, max: 1000 }), { nil: null }),
});
type GoodRow = typeof goodRow extends fc.Arbitrary<infer T> ? T : never;

/** One cell that no reading of the column accepts, and the column it goes in. */
const badCell = fc.constantFrom(
  { column: 0, text: "201x" },
  { column: 2, text: "" },
  { column: 5, text: "maybe" },
  { column: 6, text: "R-22" },
  { column: 6, text: "R-12" },
  { column: 7, text: "50" },
  { column: 7, text: "abc" },
  { column: 7, text: "1,250" },
  { column: 8, text: "" },
  { column: 9, text: "5000" },
  // a quoted cell may span lines in CSV, but a variant is one line of text: the row is refused, and the
  // rows after it still get their physical line numbers
  { column: 4, text: "line one\nline two" },
);

const quote = (cell: string) => (/[",\n\r]/.test(cell) ? `"${cell.replace(/"/g, '""')}"` : cell);
const cellsOf = (r: GoodRow): string[] => [
  String(r.yearFrom),
  String(Math.max(r.yearFrom, r.yearTo)),
  r.make,
  r.model,
  r.variant,
  r.rearAc ? "yes" : "no",
  r.refrigerant,
  String(r.labelChargeG),
  r.oilType,
  r.totalOilMl === null ? "" : String(r.totalOilMl),
];

const line = fc.oneof(
  goodRow.map((row) => ({ kind: "good" as const, row })),
  fc.tuple(goodRow, badCell).map(([row, bad]) => ({ kind: "bad" as const, row, bad })),
  fc.constant({ kind: "blank" as const }),
);
/** A whole file: the header, then rows, each line ended by \n, \r\n or a lone \r, mixed as pasted files are. */
const specFile = fc
  .array(fc.tuple(line, fc.constantFrom("\n", "\r\n", "\r")), { minLength: 1, maxLength: 8 })
  .chain((lines) => fc.tuple(fc.constant(lines), fc.constantFrom("\n", "\r\n", "\r")));

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
      // a lone \r before a \r\n once gave two rows the same line
      { numRuns: propertyRuns(500), examples: [["0\r0\r\n0"]] },
    );
  });

  it("property: reads every well-formed row's values on its physical line, and refuses a row with a bad cell", () => {
    const numRuns = propertyRuns(500);
    let filesWithValues = 0;
    fc.assert(
      fc.property(specFile, ([lines, headerEnd]) => {
        let text = `${HEADER}${headerEnd}`;
        let physicalLine = 2;
        const expected: { line: number; good?: SpecRow; bad?: boolean }[] = [];
        let previousEnd = headerEnd;
        for (const [entry, end] of lines) {
          if (entry.kind === "blank") {
            // a lone \r then a blank line's \n would read as one \r\n: keep that blank line a lone \r too
            previousEnd = previousEnd === "\r" ? "\r" : end;
            text += previousEnd;
            physicalLine += 1;
            continue;
          }
          previousEnd = end;
          const cells = cellsOf(entry.row);
          if (entry.kind === "bad") cells[entry.bad.column] = entry.bad.text;
          text += cells.map(quote).join(",") + end;
          const r = entry.row;
          expected.push(
            entry.kind === "bad"
              ? { line: physicalLine, bad: true }
              : {
                  line: physicalLine,
                  good: {
                    yearFrom: r.yearFrom,
                    yearTo: Math.max(r.yearFrom, r.yearTo),
                    make: r.make,
                    model: r.model,
                    variant: r.variant,
                    rearAc: r.rearAc,
                    refrigerant: r.refrigerant,
                    labelChargeG: r.labelChargeG,
                    oilType: r.oilType,
                    totalOilMl: r.totalOilMl,
                  },
                },
          );
          physicalLine += 1 + cells.join("").split("\n").length - 1;
        }
        const parsed = parseSpecCsv(text);
        expect(parsed.fileProblems).toEqual([]);
        expect(parsed.rows.map((row) => row.line)).toEqual(expected.map((e) => e.line));
        parsed.rows.forEach((row, i) => {
          const want = expected[i]!;
          if (want.bad) {
            expect(row.values).toBeUndefined();
            expect(row.problems.length).toBeGreaterThan(0);
          } else expect(row.values).toEqual(want.good);
        });
        if (parsed.rows.some((row) => row.values)) filesWithValues += 1;
      }),
      { numRuns },
    );
    // The values assertion must actually run: most files hold at least one well-formed row.
    expect(filesWithValues).toBeGreaterThan(numRuns / 2);
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
