import { describe, expect, it } from "vitest";
import type { Cylinder, CylinderMovement } from "./ledger";
import { checkLedgerChange, fillSentence, ledgerMassUnit, ledgerRefusalMessage } from "./ledger-guard";

// The edges of the ledger guard: which lines count, which moment is the worst, a ledger already past a
// bound, and the wording for a supply cylinder. A recovery cylinder of 1,000 g stops at 800 g (80 %,
// common practice).
const small: Cylinder = {
  id: "rec",
  refrigerant: "R-134a",
  kind: "recovery",
  capacityG: 1_000,
  tareG: 500,
  initialNetG: 0,
};
const day = (d: number) => `2026-04-0${d}T10:00:00Z`;
let seq = 0;
const line = (
  p: Partial<CylinderMovement> & Pick<CylinderMovement, "type" | "massG">,
  cylinder: Cylinder = small,
): CylinderMovement => ({
  id: `e${++seq}`,
  cylinderId: cylinder.id,
  at: day(1),
  technicianId: "tech",
  refrigerant: "R-134a",
  ...p,
});
const text = { cylinderLabel: "REC-9", massUnit: "g" as const, timeZone: "UTC" };

describe("checkLedgerChange: which lines count", () => {
  it("leaves out a cancelled line at every moment, and lines of other cylinders", () => {
    const recovered = line({ type: "recovered_into", massG: 700, at: day(1) });
    const cancelled = line({ type: "recovered_into", massG: 700, at: day(5), reverses: recovered.id });
    expect(
      checkLedgerChange(
        small,
        [recovered, cancelled],
        [line({ type: "recovered_into", massG: 500, at: day(2) })],
      ),
    ).toBeNull();
    const other = line({ type: "recovered_into", massG: 700 }, { ...small, id: "other" });
    expect(checkLedgerChange(small, [other], [line({ type: "recovered_into", massG: 500 })])).toBeNull();
  });

  it("lets a change leave alone a moment the ledger already had past a bound", () => {
    // Day 1 already 100 g below empty (a wrong ledger); a recovery on day 3 moves towards the truth.
    const short = [line({ type: "charged_from", massG: 100, at: day(1) })];
    expect(
      checkLedgerChange(small, short, [line({ type: "recovered_into", massG: 50, at: day(3) })]),
    ).toBeNull();
    // Day 1 already 100 g past the 800 g safe fill; a charge on day 3 moves towards it.
    const over = [line({ type: "recovered_into", massG: 900, at: day(1) })];
    expect(
      checkLedgerChange(small, over, [line({ type: "charged_from", massG: 50, at: day(3) })]),
    ).toBeNull();
  });
});

describe("checkLedgerChange: the worst moment", () => {
  it("names the moment furthest below empty, with a limit of 0", () => {
    const existing = [
      line({ type: "recovered_into", massG: 1_000, at: day(1) }),
      line({ type: "charged_from", massG: 600, at: day(3) }),
    ];
    // taking 1,200 g on day 2 leaves −200 g that day and −800 g on day 3
    const refusal = checkLedgerChange(small, existing, [
      line({ type: "charged_from", massG: 1_200, at: day(2) }),
    ]);
    expect(refusal).toMatchObject({
      reason: "below_empty",
      afterG: -800,
      beforeG: 400,
      limitG: 0,
      now: true,
    });
  });

  it("names the moment furthest past the safe fill, with the safe fill as its limit", () => {
    const existing = [line({ type: "recovered_into", massG: 100, at: day(3) })];
    // 1,550 g on day 2 is 750 g past the 800 g safe fill that day, and with the 100 g of day 3 850 g past
    const refusal = checkLedgerChange(small, existing, [
      line({ type: "recovered_into", massG: 1_550, at: day(2) }),
    ]);
    expect(refusal).toMatchObject({
      reason: "over_fill",
      afterG: 1_650,
      beforeG: 100,
      limitG: 800,
      now: true,
    });
  });
});

describe("checkLedgerChange: the worst moment before a later, milder one", () => {
  it("keeps the deepest moment below empty even when a later one is shallower", () => {
    const existing = [line({ type: "recovered_into", massG: 500, at: day(3) })];
    // taking 800 g on day 2 leaves −800 g that day and −300 g on day 3
    const refusal = checkLedgerChange(small, existing, [
      line({ type: "charged_from", massG: 800, at: day(2) }),
    ]);
    expect(refusal).toMatchObject({ reason: "below_empty", afterG: -800, beforeG: 0, now: false });
    expect(refusal?.atIso).toBe(day(2).replace("Z", ".000Z"));
  });

  it("keeps the moment furthest past the safe fill even when a later one is nearer", () => {
    const existing = [line({ type: "charged_from", massG: 500, at: day(3) })];
    // 1,700 g on day 2 is 900 g past the 800 g safe fill that day and 400 g past on day 3
    const refusal = checkLedgerChange(small, existing, [
      line({ type: "recovered_into", massG: 1_700, at: day(2) }),
    ]);
    expect(refusal).toMatchObject({ reason: "over_fill", afterG: 1_700, beforeG: 0, now: false });
  });
});

describe("the guard's words", () => {
  it("refuses a supply cylinder past its capacity in its own words", () => {
    const supply: Cylinder = { ...small, kind: "supply", initialNetG: 900 };
    const refusal = checkLedgerChange(supply, [], [line({ type: "recovered_into", massG: 200 }, supply)]);
    expect(refusal).toMatchObject({ reason: "over_fill", limitG: 1_000 });
    expect(ledgerRefusalMessage(refusal!, text)).toBe(
      "Refused: REC-9 would be filled past its capacity of 1,000 g. It holds 900 g and this adds 200 g. Check the figure and the cylinder.",
    );
  });

  it("says a cylinder exactly at its limit has no room left, not that it is past it", () => {
    expect(fillSentence({ fillPct: 80, limitPct: 80, roomG: 0 }, "g")).toBe(
      "80 % full; 0 g of room before the 80 % limit.",
    );
  });

  it("weighs cylinders in pounds for a reader of ounces, and keeps a metric reader's unit", () => {
    expect(ledgerMassUnit("oz")).toBe("lb");
    expect(ledgerMassUnit("g")).toBe("g");
    expect(ledgerMassUnit("kg")).toBe("kg");
  });
});
