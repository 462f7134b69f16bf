import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { type Cylinder, type CylinderMovement, activeMovements, movementEffectG } from "./ledger";
import { checkLedgerChange, fillSentence, ledgerRefusalMessage, safeFillG } from "./ledger-guard";
import { propertyRuns } from "@/tests/support/property-runs";

const recovery: Cylinder = {
  id: "rec",
  refrigerant: "R-134a",
  kind: "recovery",
  capacityG: 22_700,
  tareG: 7_300,
  initialNetG: 4_660,
};
const supply: Cylinder = { ...recovery, id: "sup", kind: "supply", capacityG: 13_600, initialNetG: 13_600 };

let seq = 0;
const line = (
  cylinder: Cylinder,
  p: Partial<CylinderMovement> & Pick<CylinderMovement, "type" | "massG">,
): CylinderMovement => ({
  id: `g${++seq}`,
  cylinderId: cylinder.id,
  at: "2026-11-10T15:00:00Z",
  technicianId: "tech",
  refrigerant: "R-134a",
  ...p,
});
const text = { cylinderLabel: "REC-1", massUnit: "g" as const, timeZone: "Europe/Lisbon" };

describe("safeFillG", () => {
  it("stops a recovery cylinder at 80 % of its capacity (common practice) and a supply cylinder at 100 %", () => {
    expect(safeFillG(recovery)).toBe(18_160);
    expect(safeFillG(supply)).toBe(13_600);
  });
});

describe("checkLedgerChange", () => {
  it("refuses sending out 5 kg from a cylinder holding 4,660 g, with both figures", () => {
    const refusal = checkLedgerChange(recovery, [], [line(recovery, { type: "sent_out", massG: 5_000 })]);
    expect(refusal).toMatchObject({ reason: "below_empty", now: true, beforeG: 4_660, afterG: -340 });
    expect(ledgerRefusalMessage(refusal!, text)).toBe(
      "Refused: REC-1 would go below empty. It holds 4,660 g and this takes out 5,000 g. " +
        "Weigh the cylinder; if the scale disagrees with the ledger, post a weighed correction first.",
    );
  });

  it("accepts taking out exactly what is there, and refuses one gram more", () => {
    expect(checkLedgerChange(recovery, [], [line(recovery, { type: "sent_out", massG: 4_660 })])).toBeNull();
    expect(
      checkLedgerChange(recovery, [], [line(recovery, { type: "sent_out", massG: 4_661 })]),
    ).not.toBeNull();
  });

  it("accepts filling a recovery cylinder to 80 % and refuses a gram past it, in the reader's units", () => {
    const toLimit = 18_160 - 4_660;
    expect(
      checkLedgerChange(recovery, [], [line(recovery, { type: "recovered_into", massG: toLimit })]),
    ).toBeNull();
    const refusal = checkLedgerChange(
      recovery,
      [],
      [line(recovery, { type: "recovered_into", massG: toLimit + 1 })],
    );
    expect(refusal).toMatchObject({ reason: "over_fill", limitG: 18_160, afterG: 18_161 });
    // 1 lb = 453.59237 g (NIST SP 811): 4,660 g = 10.27 lb; 13,501 g = 29.76 lb; 18,160 g = 40.04 lb.
    expect(ledgerRefusalMessage(refusal!, { ...text, massUnit: "lb" })).toBe(
      "Refused: REC-1 would be filled past its safe fill of 40.04 lb (80 % of 50.04 lb). " +
        "It holds 10.27 lb and this adds 29.76 lb. Overfilled cylinders can burst: recover into another cylinder with room.",
    );
  });

  it("checks a backdated line against the contents on its day, and names that day on the shop's calendar", () => {
    const existing = [
      line(recovery, {
        type: "sent_out",
        massG: 4_000,
        at: "2026-11-01T10:00:00Z",
        destination: "Reclaimer",
      }),
      line(recovery, { type: "recovered_into", massG: 3_000, at: "2026-11-20T10:00:00Z" }),
    ];
    // Now: 4,660 − 4,000 + 3,000 = 3,660 g, but from 1 to 20 Nov it held only 660 g.
    const backdated = line(recovery, { type: "charged_from", massG: 1_000, at: "2026-11-05T23:30:00Z" });
    const refusal = checkLedgerChange(recovery, existing, [backdated]);
    expect(refusal).toMatchObject({ reason: "below_empty", now: false, beforeG: 660, afterG: -340 });
    // 23:30 UTC on 5 Nov is already 6 Nov in Auckland (IANA time zone rules).
    expect(ledgerRefusalMessage(refusal!, { ...text, timeZone: "Pacific/Auckland" })).toMatch(
      /below empty on 6 Nov 2026\. It held 660 g and this takes out 1,000 g\./,
    );
    const today = line(recovery, { type: "charged_from", massG: 1_000, at: "2026-11-25T10:00:00Z" });
    expect(checkLedgerChange(recovery, existing, [today])).toBeNull();
  });

  it("lets a change pull a wrong ledger back towards the truth, but never further past a bound", () => {
    const wrong = [line(recovery, { type: "sent_out", massG: 99_000, destination: "Reclaimer" })];
    expect(
      checkLedgerChange(recovery, wrong, [line(recovery, { type: "recovered_into", massG: 500 })]),
    ).toBeNull();
    expect(
      checkLedgerChange(recovery, wrong, [line(recovery, { type: "charged_from", massG: 1 })]),
    ).toMatchObject({ reason: "below_empty" });
    const undo = line(recovery, { type: "sent_out", massG: 99_000, reverses: wrong[0]!.id });
    expect(checkLedgerChange(recovery, wrong, [undo])).toBeNull();
  });

  it("judges an edited figure once: cancelling 800 g and posting 820 g adds 20 g", () => {
    const nearlyFull: Cylinder = { ...recovery, initialNetG: 17_000 };
    const old = line(nearlyFull, { type: "recovered_into", massG: 800, at: "2026-11-02T09:00:00Z" });
    const cancel = line(nearlyFull, { type: "recovered_into", massG: 800, reverses: old.id });
    const edited = line(nearlyFull, { type: "recovered_into", massG: 820, at: "2026-11-02T09:00:00Z" });
    // 17,800 g held; 17,820 g is still inside the 18,160 g safe fill.
    expect(checkLedgerChange(nearlyFull, [old], [cancel, edited])).toBeNull();
    const tooMuch = { ...edited, id: "g-too-much", massG: 1_200 };
    expect(checkLedgerChange(nearlyFull, [old], [cancel, tooMuch])).toMatchObject({
      reason: "over_fill",
      beforeG: 17_800,
      afterG: 18_200,
    });
  });

  it("refuses cancelling a recovery whose refrigerant has since been charged out", () => {
    const empty: Cylinder = { ...supply, initialNetG: 0, kind: "supply" };
    const added = line(empty, {
      type: "adjustment",
      massG: 2_000,
      at: "2026-11-01T08:00:00Z",
      note: "weighed",
    });
    const used = line(empty, { type: "charged_from", massG: 1_500, at: "2026-11-03T08:00:00Z" });
    const cancel = line(empty, { type: "adjustment", massG: 2_000, reverses: added.id });
    expect(checkLedgerChange(empty, [added, used], [cancel])).toMatchObject({
      reason: "below_empty",
      beforeG: 500,
      afterG: -1_500,
    });
  });

  it("property: whatever is tried, in whatever order and date, the accepted ledger never leaves 0 … safe fill", () => {
    const limitG = safeFillG(recovery);
    let accepted = 0;
    let refusedTotal = 0;
    const attempt = fc.record({
      kind: fc.constantFrom("recovered_into", "charged_from", "sent_out", "adjustment", "recycled", "undo"),
      massG: fc.integer({ min: 1, max: 25_000 }),
      negative: fc.boolean(),
      day: fc.integer({ min: 1, max: 28 }),
      pick: fc.nat(),
    });
    const numRuns = propertyRuns(300);
    fc.assert(
      fc.property(fc.array(attempt, { minLength: 1, maxLength: 40 }), (attempts) => {
        const ledger: CylinderMovement[] = [];
        let refused = 0;
        for (const a of attempts) {
          let next: CylinderMovement;
          if (a.kind === "undo") {
            const open = activeMovements(ledger);
            if (open.length === 0) continue;
            const target = open[a.pick % open.length]!;
            next = { ...target, id: `u${++seq}`, reverses: target.id, at: "2026-11-29T12:00:00Z" };
          } else {
            next = line(recovery, {
              type: a.kind,
              massG: a.kind === "adjustment" && a.negative ? -a.massG : a.massG,
              at: `2026-11-${String(a.day).padStart(2, "0")}T12:00:00Z`,
            });
          }
          if (checkLedgerChange(recovery, ledger, [next])) refused++;
          else ledger.push(next);
        }
        accepted += ledger.length;
        refusedTotal += refused;
        // Replay what was accepted; lines dated the same moment are applied together, as the guard sees them.
        const byMoment = new Map<number, number>();
        for (const m of activeMovements(ledger)) {
          const at = Date.parse(m.at);
          byMoment.set(at, (byMoment.get(at) ?? 0) + movementEffectG(m));
        }
        let netG = recovery.initialNetG;
        for (const at of [...byMoment.keys()].sort((x, y) => x - y)) {
          netG += byMoment.get(at)!;
          expect(netG).toBeGreaterThanOrEqual(0);
          expect(netG).toBeLessThanOrEqual(limitG);
        }
      }),
      { numRuns },
    );
    // Both branches ran: the property is not satisfied by refusing everything or by refusing nothing.
    // both branches must be exercised: more than one acceptance and one refusal per run on average
    expect(accepted).toBeGreaterThan(numRuns);
    expect(refusedTotal).toBeGreaterThan(numRuns);
  });
});

describe("fillSentence", () => {
  it("words the fill in the reader's unit (NIST SP 811: 1 lb = 453.59237 g)", () => {
    expect(fillSentence({ fillPct: 50, limitPct: 80, roomG: 6_000 }, "g")).toBe(
      "50 % full; 6,000 g of room before the 80 % limit.",
    );
    expect(fillSentence({ fillPct: 81, limitPct: 80, roomG: -227 }, "lb")).toBe(
      "81 % full: 0.50 lb past the 80 % limit. Stop filling this cylinder and change to an empty one.",
    );
  });
});
