import fc from "fast-check";
import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import {
  type Cylinder,
  type CylinderMovement,
  activeMovements,
  applyMovements,
  fillLevelCheck,
  movementProblems,
} from "./ledger";
import { postingsForRecordChange, postingsForServiceRecord } from "./ledger-corrections";
import { monthInTimeZone, monthlyReport, toCsv } from "./ledger-report";
import { formatMassGrouped } from "@/lib/units";
import { propertyRuns } from "@/tests/support/property-runs";

const tank: Cylinder = {
  id: "cyl-rec-1",
  refrigerant: "R-134a",
  kind: "recovery",
  capacityG: 20_000,
  tareG: 8_200,
  initialNetG: 1_500,
};

let seq = 0;
const mv = (p: Partial<CylinderMovement> & Pick<CylinderMovement, "type" | "massG">): CylinderMovement => ({
  id: `m${++seq}`,
  cylinderId: tank.id,
  at: "2026-11-10T15:00:00Z",
  technicianId: "tech-ines",
  refrigerant: "R-134a",
  ...p,
});

describe("applyMovements", () => {
  it("adds recoveries, subtracts charges and shipments, leaves recycling neutral", () => {
    const moves = [
      mv({ type: "recovered_into", massG: 740 }),
      mv({ type: "recovered_into", massG: 615 }),
      mv({ type: "recycled", massG: 1_355 }),
      mv({ type: "charged_from", massG: 680 }),
      mv({ type: "sent_out", massG: 400, destination: "Prairie Reclaim Co., 12 Depot Rd" }),
      mv({ type: "adjustment", massG: -35, note: "weighed" }),
    ];
    const s = applyMovements(tank, moves);
    expect(s.netG).toBe(1_500 + 740 + 615 - 680 - 400 - 35);
    expect(s.grossG).toBe(s.netG + 8_200);
    expect(s.problems).toEqual([]);
  });

  it("ignores other cylinders' movements and flags a refrigerant that does not belong", () => {
    const s = applyMovements(tank, [
      mv({ type: "recovered_into", massG: 500, cylinderId: "other" }),
      mv({ type: "recovered_into", massG: 200, refrigerant: "R-1234yf" }),
    ]);
    expect(s.netG).toBe(1_700);
    expect(s.problems.join(" ")).toContain("R-1234yf");
  });

  it("flags a ledger that would go below empty", () => {
    const s = applyMovements(tank, [mv({ type: "charged_from", massG: 1_600 })]);
    expect(s.problems.join(" ")).toContain("less than nothing");
  });

  it("flags a recovery cylinder filled past 80 % (common practice)", () => {
    expect(applyMovements(tank, [mv({ type: "recovered_into", massG: 14_500 })]).fill.verdict).toBe("ok"); // exactly 16,000 g = 80 %
    const over = applyMovements(tank, [mv({ type: "recovered_into", massG: 14_501 })]);
    expect(over.fill.verdict).toBe("over_limit");
    expect(over.problems.at(-1)).toContain("80 %");
  });
});

describe("fillLevelCheck", () => {
  it("gives the room left before the limit", () => {
    const f = fillLevelCheck(tank, 10_000);
    expect(f.fillPct).toBe(50);
    expect(f.roomG).toBe(6_000);
    expect(f.source).toContain("80 %");
    expect(fillLevelCheck({ ...tank, kind: "supply" }, 19_000).verdict).toBe("ok");
  });
});

describe("corrections", () => {
  const record = {
    refrigerant: "R-134a" as const,
    technicianId: "tech-ines",
    recovery: { cylinderId: tank.id, massG: 740 },
    recharge: null,
  };
  let n = 0;
  const newId = () => `c${++n}`;

  it("posts a service record's recovery and recharge", () => {
    expect(
      postingsForServiceRecord({ ...record, recharge: { cylinderId: "cyl-supply-2", massG: 650 } }).map(
        (p) => p.type,
      ),
    ).toEqual(["recovered_into", "charged_from"]);
  });

  it("an edited record cancels its old posting and posts the new figure; the ledger follows", () => {
    const first = postingsForRecordChange({
      serviceRecordId: "sr1",
      posted: [],
      wanted: postingsForServiceRecord(record),
      at: "2026-11-10T15:00:00Z",
      technicianId: "tech-ines",
      newId,
    });
    expect(first).toHaveLength(1);
    const edited = postingsForServiceRecord({ ...record, recovery: { cylinderId: tank.id, massG: 705 } });
    const second = postingsForRecordChange({
      serviceRecordId: "sr1",
      posted: activeMovements(first),
      wanted: edited,
      at: "2026-11-11T09:00:00Z",
      technicianId: "tech-ola",
      newId,
    });
    expect(second.map((m) => [m.type, m.massG, Boolean(m.reverses)])).toEqual([
      ["recovered_into", 740, true],
      ["recovered_into", 705, false],
    ]);
    const all = [...first, ...second];
    expect(movementProblems(all)).toEqual([]);
    expect(applyMovements(tank, all).netG).toBe(1_500 + 705);
    expect(activeMovements(all).map((m) => m.massG)).toEqual([705]);
  });

  it("re-saving an unchanged record posts nothing; deleting it cancels everything", () => {
    const first = postingsForRecordChange({
      serviceRecordId: "sr2",
      posted: [],
      wanted: postingsForServiceRecord(record),
      at: "2026-11-10T15:00:00Z",
      technicianId: "tech-ines",
      newId,
    });
    expect(
      postingsForRecordChange({
        serviceRecordId: "sr2",
        posted: first,
        wanted: postingsForServiceRecord(record),
        at: "2026-11-12T09:00:00Z",
        technicianId: "tech-ines",
        newId,
      }),
    ).toEqual([]);
    const removal = postingsForRecordChange({
      serviceRecordId: "sr2",
      posted: first,
      wanted: [],
      at: "2026-11-12T09:00:00Z",
      technicianId: "tech-ines",
      newId,
    });
    expect(applyMovements(tank, [...first, ...removal]).netG).toBe(1_500);
  });

  it("refuses corrections that cancel twice, cancel nothing or do not match", () => {
    const a = mv({ type: "recovered_into", massG: 300 });
    expect(
      movementProblems([
        a,
        mv({ type: "recovered_into", massG: 300, reverses: a.id }),
        mv({ type: "recovered_into", massG: 300, reverses: a.id }),
      ]).join(" "),
    ).toContain("more than once");
    expect(
      movementProblems([mv({ type: "charged_from", massG: 10, reverses: "ghost" })]).join(" "),
    ).toContain("not in the ledger");
    expect(
      movementProblems([a, mv({ type: "recovered_into", massG: 299, reverses: a.id })]).join(" "),
    ).toContain("does not match");
    expect(movementProblems([mv({ type: "sent_out", massG: 100 })]).join(" ")).toContain(
      "where the refrigerant was sent",
    );
    // A correction cancels the shipment; it names no facility of its own.
    const shipped = mv({ type: "sent_out", massG: 100, destination: "Prairie Reclaim Co." });
    expect(movementProblems([shipped, mv({ type: "sent_out", massG: 100, reverses: shipped.id })])).toEqual(
      [],
    );
  });
});

describe("monthlyReport", () => {
  it("groups by the month on the shop's wall, not UTC (IANA time zone rules)", () => {
    expect(monthInTimeZone("2026-11-01T03:30:00Z", "America/Chicago")).toBe("2026-10"); // 22:30 CDT on 31 Oct
    expect(monthInTimeZone("2026-11-01T03:30:00Z", "UTC")).toBe("2026-11");
    expect(monthInTimeZone("2026-11-30T23:30:00Z", "Europe/Berlin")).toBe("2026-12");
  });

  it("property: the mid-month shortcut agrees with the IANA rules in far-off zones", () => {
    const zones = [
      "Pacific/Kiritimati",
      "Etc/GMT+12",
      "Asia/Kathmandu",
      "America/St_Johns",
      "Australia/Lord_Howe",
      "America/Chicago",
    ];
    fc.assert(
      fc.property(
        fc.integer({ min: Date.UTC(2000, 0, 1), max: Date.UTC(2040, 0, 1) }),
        fc.constantFrom(...zones),
        (ms, timeZone) => {
          const parts = new Intl.DateTimeFormat("en-CA", {
            timeZone,
            year: "numeric",
            month: "2-digit",
          }).formatToParts(new Date(ms));
          const expected = `${parts.find((p) => p.type === "year")?.value}-${parts.find((p) => p.type === "month")?.value}`;
          expect(monthInTimeZone(new Date(ms).toISOString(), timeZone)).toBe(expected);
        },
      ),
      { numRuns: propertyRuns(2000) },
    );
  });

  it("totals recovered, recycled and charged per month × technician × refrigerant", () => {
    const moves = [
      mv({ type: "recovered_into", massG: 700, at: "2026-10-05T14:00:00Z" }),
      mv({ type: "recovered_into", massG: 650, at: "2026-10-20T14:00:00Z" }),
      mv({ type: "charged_from", massG: 640, at: "2026-10-20T15:00:00Z" }),
      mv({ type: "recycled", massG: 1_350, at: "2026-10-28T15:00:00Z" }),
      mv({ type: "recovered_into", massG: 520, at: "2026-11-02T15:00:00Z", technicianId: "tech-ola" }),
      mv({
        type: "recovered_into",
        massG: 480,
        at: "2026-11-03T15:00:00Z",
        refrigerant: "R-1234yf",
        cylinderId: "yf-1",
      }),
    ];
    const rows = monthlyReport(moves, { timeZone: "America/Chicago" });
    expect(
      rows.map((r) => [r.month, r.technicianId, r.refrigerant, r.recoveredG, r.recycledG, r.chargedG]),
    ).toEqual([
      ["2026-10", "tech-ines", "R-134a", 1_350, 1_350, 640],
      ["2026-11", "tech-ines", "R-1234yf", 480, 0, 0],
      ["2026-11", "tech-ola", "R-134a", 520, 0, 0],
    ]);
  });

  it("counts a correction against the month of the movement it cancels", () => {
    const a = mv({ type: "recovered_into", massG: 900, at: "2026-10-30T14:00:00Z" });
    const fix = mv({
      type: "recovered_into",
      massG: 900,
      at: "2026-11-04T14:00:00Z",
      reverses: a.id,
      technicianId: "tech-ola",
    });
    const rows = monthlyReport([a, fix], { timeZone: "UTC" });
    expect(rows).toHaveLength(1);
    expect(rows[0]?.month).toBe("2026-10");
    expect(rows[0]?.recoveredG).toBe(0);
    expect(rows[0]?.corrections).toBe(1);
    expect(toCsv(rows).split("\r\n")[1]).toBe("2026-10,tech-ines,R-134a,0,0,0,0,0,1");
  });

  it("property: report totals equal the sum of the movements still in force, and the cylinder follows them", () => {
    const types = ["recovered_into", "charged_from", "recycled", "sent_out", "adjustment"] as const;
    const arb = fc.array(
      fc.record({
        type: fc.constantFrom(...types),
        massG: fc.integer({ min: 1, max: 2_000 }),
        negative: fc.boolean(),
        day: fc.integer({ min: 0, max: 120 }),
        tech: fc.constantFrom("tech-ines", "tech-ola"),
        cancel: fc.boolean(),
      }),
      { maxLength: 40 },
    );
    fc.assert(
      fc.property(arb, (specs) => {
        const base = Date.parse("2026-08-01T12:00:00Z");
        const moves: CylinderMovement[] = [];
        specs.forEach((s, i) => {
          const m: CylinderMovement = {
            id: `p${i}`,
            cylinderId: tank.id,
            type: s.type,
            massG: s.type === "adjustment" && s.negative ? -s.massG : s.massG,
            at: new Date(base + s.day * 86_400_000).toISOString(),
            technicianId: s.tech,
            refrigerant: "R-134a",
            destination: s.type === "sent_out" ? "Prairie Reclaim Co." : undefined,
          };
          moves.push(m);
          if (s.cancel)
            moves.push({
              ...m,
              id: `r${i}`,
              at: new Date(base + (s.day + 3) * 86_400_000).toISOString(),
              reverses: m.id,
            });
        });
        const live = activeMovements(moves);
        const sumOf = (t: (typeof types)[number]) =>
          live.filter((m) => m.type === t).reduce((a, m) => a + m.massG, 0);
        const rows = monthlyReport(moves, { timeZone: "America/Denver" });
        const total = (k: "recoveredG" | "recycledG" | "chargedG" | "sentOutG" | "adjustmentG") =>
          rows.reduce((a, r) => a + r[k], 0);
        expect(total("recoveredG")).toBe(sumOf("recovered_into"));
        expect(total("recycledG")).toBe(sumOf("recycled"));
        expect(total("chargedG")).toBe(sumOf("charged_from"));
        expect(total("sentOutG")).toBe(sumOf("sent_out"));
        expect(total("adjustmentG")).toBe(sumOf("adjustment"));
        expect(applyMovements(tank, moves).netG).toBe(
          tank.initialNetG +
            sumOf("recovered_into") -
            sumOf("charged_from") -
            sumOf("sent_out") +
            sumOf("adjustment"),
        );
        expect(movementProblems(moves)).toEqual([]);
      }),
    );
  });
});

describe("toCsv", () => {
  const rows = monthlyReport(
    [
      mv({ type: "recovered_into", massG: 700, at: "2026-10-05T14:00:00Z", technicianId: "t1" }),
      mv({ type: "charged_from", massG: 650, at: "2026-10-05T15:00:00Z", technicianId: "t2" }),
    ],
    { timeZone: "UTC" },
  );

  it("writes a header and quotes names with commas and quotes (RFC 4180)", () => {
    const csv = toCsv(rows, { technicianNames: { t1: 'Okafor, "Chi" N.', t2: "Lena Brandt" } });
    const lines = csv.split("\r\n");
    expect(lines[0]).toBe(
      "month,technician,refrigerant,recovered_g,recycled_g,charged_g,sent_out_g,adjustment_g,corrections",
    );
    expect(lines[1]).toBe('2026-10,"Okafor, ""Chi"" N.",R-134a,700,0,0,0,0,0');
    const back = Papa.parse<string[]>(csv, { skipEmptyLines: true }).data;
    expect(back[1]?.[1]).toBe('Okafor, "Chi" N.');
    expect(back[2]).toEqual(["2026-10", "Lena Brandt", "R-134a", "0", "0", "650", "0", "0", "0"]);
  });

  it("writes every mass in the reader's unit with the unit in each column's name (NIST SP 811: 1 lb = 453.59237 g, 1 oz = 28.349523125 g)", () => {
    const lines = toCsv(rows, { massUnit: "lb" }).split("\r\n");
    expect(lines[0]).toBe(
      "month,technician,refrigerant,recovered_lb,recycled_lb,charged_lb,sent_out_lb,adjustment_lb,corrections",
    );
    // 700 g = 1.543 lb, 650 g = 1.433 lb, to the hundredth a cylinder scale reads.
    expect(lines[1]).toBe("2026-10,t1,R-134a,1.54,0,0,0,0,0");
    expect(lines[2]).toBe("2026-10,t2,R-134a,0,0,1.43,0,0,0");
    const ounces = toCsv(rows, { massUnit: "oz" }).split("\r\n");
    expect(ounces[0]).toContain("recovered_oz");
    // 700 g = 24.69 oz.
    expect(ounces[1]).toBe("2026-10,t1,R-134a,24.7,0,0,0,0,0");
    expect(toCsv(rows).split("\r\n")[0]).not.toMatch(/_lb|_oz/);
  });

  it("writes masses of a thousand and more as plain numbers, though the screen groups them", () => {
    const big = monthlyReport([mv({ type: "recovered_into", massG: 12_500, at: "2026-10-05T14:00:00Z" })], {
      timeZone: "UTC",
    });
    const line = toCsv(big).split("\r\n")[1]!;
    expect(line).toMatch(/,12500,/);
    expect(Papa.parse<string[]>(toCsv(big), { skipEmptyLines: true }).data[1]).toHaveLength(9);
    expect(formatMassGrouped(12_500, "g")).toBe("12,500 g");
  });

  it("defuses a name a spreadsheet would run as a formula (OWASP CSV injection)", () => {
    const csv = toCsv(rows, { technicianNames: { t1: "=HYPERLINK(1)" } });
    expect(csv).toContain("'=HYPERLINK(1)");
  });
});
