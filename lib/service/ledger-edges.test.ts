import { sayInUnits } from "@/lib/units/quantity";
import { describe, expect, it } from "vitest";
import {
  type Cylinder,
  type CylinderMovement,
  applyMovements,
  fillLevelCheck,
  movementProblems,
} from "./ledger";

// The edges of the cylinder ledger: each problem a movement list can have, said as the shop reads it, the
// fill message on both sides of the 80 % limit, and the replay in time order.
const tank: Cylinder = {
  id: "cyl-1",
  refrigerant: "R-134a",
  kind: "recovery",
  capacityG: 10_000,
  tareG: 7_000,
  initialNetG: 0,
};
const mv = (
  id: string,
  p: Partial<CylinderMovement> & Pick<CylinderMovement, "type" | "massG">,
): CylinderMovement => ({
  id,
  cylinderId: tank.id,
  at: "2026-03-02T09:00:00Z",
  technicianId: "tech-1",
  refrigerant: "R-134a",
  ...p,
});

describe("movementProblems: each problem in the shop's words", () => {
  it("flags a repeated id, a mass of 0 or not a number, and a time that is not one", () => {
    expect(
      movementProblems([
        mv("a", { type: "recovered_into", massG: 500 }),
        mv("a", { type: "recycled", massG: 500 }),
      ]),
    ).toEqual(["Movement a appears twice."]);
    expect(movementProblems([mv("b", { type: "charged_from", massG: 0 })])).toEqual([
      "Movement b: the mass must be a positive number of grams.",
    ]);
    expect(movementProblems([mv("c", { type: "adjustment", massG: Number.NaN })])).toEqual([
      "Movement c: the mass must be a positive number of grams.",
    ]);
    expect(movementProblems([mv("d", { type: "adjustment", massG: -40 })])).toEqual([]);
    expect(movementProblems([mv("e", { type: "recovered_into", massG: 500, at: "yesterday" })])).toEqual([
      'Movement e: "yesterday" is not a date and time.',
    ]);
  });

  it("asks where refrigerant was sent when the destination is blank", () => {
    expect(movementProblems([mv("f", { type: "sent_out", massG: 900, destination: "   " })])).toEqual([
      "Movement f: say where the refrigerant was sent.",
    ]);
    expect(
      movementProblems([mv("f", { type: "sent_out", massG: 900, destination: "Reclaim works" })]),
    ).toEqual([]);
  });

  it("refuses a correction of a correction, and one that differs in type or cylinder from what it cancels", () => {
    const original = mv("g", { type: "recovered_into", massG: 500 });
    const correction = mv("h", { type: "recovered_into", massG: 500, reverses: "g" });
    expect(movementProblems([original, correction])).toEqual([]);
    expect(
      movementProblems([
        original,
        correction,
        mv("i", { type: "recovered_into", massG: 500, reverses: "h" }),
      ]),
    ).toEqual(["Correction i cancels another correction; post a new movement instead."]);
    expect(movementProblems([original, { ...correction, type: "charged_from" }])).toEqual([
      "Correction h does not match the movement it cancels (g).",
    ]);
    expect(movementProblems([original, { ...correction, cylinderId: "cyl-2" }])).toEqual([
      "Correction h does not match the movement it cancels (g).",
    ]);
  });
});

describe("fillLevelCheck: the message on both sides of the limit", () => {
  it("says the room left up to the limit itself, and how far past it beyond", () => {
    const at = (netG: number) => fillLevelCheck(tank, netG);
    expect(at(8_000).verdict).toBe("ok");
    expect(sayInUnits(at(6_000).message)).toBe("60 % full; 2,000 g of room before the 80 % limit.");
    expect(at(9_000).verdict).toBe("over_limit");
    expect(sayInUnits(at(9_000).message)).toBe(
      "90 % full: 1,000 g past the 80 % limit. Stop filling this cylinder and change to an empty one.",
    );
  });
});

describe("applyMovements: the replay", () => {
  const belowEmpty = (problems: string[]) => problems.filter((p) => p.includes("less than nothing"));

  it("replays in time order, whatever order the list is in, and same-instant movements by id", () => {
    const recover = mv("a", { type: "recovered_into", massG: 1_000, at: "2026-03-02T09:00:00Z" });
    const charge = mv("b", { type: "charged_from", massG: 600, at: "2026-03-02T10:00:00Z" });
    expect(belowEmpty(applyMovements(tank, [charge, recover]).problems)).toEqual([]);
    const sameTime = { ...charge, at: recover.at };
    expect(belowEmpty(applyMovements(tank, [sameTime, recover]).problems)).toEqual([]);
    const chargeFirst = { ...sameTime, id: "0" };
    expect(belowEmpty(applyMovements(tank, [recover, chargeFirst]).problems)).toHaveLength(1);
  });

  it("lets a cylinder run to exactly empty, and says once that it went below", () => {
    const out = (id: string, massG: number) => mv(id, { type: "charged_from", massG });
    const full = { ...tank, initialNetG: 500 };
    expect(applyMovements(full, [out("a", 500)]).problems).toEqual([]);
    expect(applyMovements(full, [out("a", 500)]).netG).toBe(0);
    expect(
      applyMovements(full, [
        { ...out("a", 600), at: "2026-03-02T09:00:00Z" },
        { ...out("b", 100), at: "2026-03-02T10:00:00Z" },
      ]).problems,
    ).toEqual([
      "After movement a the cylinder would hold less than nothing: a movement is wrong or missing.",
    ]);
  });
});
