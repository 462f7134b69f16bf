import { describe, expect, it } from "vitest";
import type { CylinderMovement } from "./ledger";
import {
  type PlannedMovement,
  postingsForRecordChange,
  postingsForServiceRecord,
} from "./ledger-corrections";

// The edges of the ledger's corrections for an edited service record: a posting stays only when its
// cylinder, type, mass and refrigerant all still match; a leg of 0 g posts nothing.
const posted: CylinderMovement = {
  id: "p1",
  cylinderId: "cyl-a",
  type: "recovered_into",
  massG: 640,
  refrigerant: "R-134a",
  technicianId: "tech-1",
  at: "2026-05-04T09:00:00Z",
  serviceRecordId: "sr-1",
};
const wantedSame: PlannedMovement = {
  cylinderId: "cyl-a",
  type: "recovered_into",
  massG: 640,
  refrigerant: "R-134a",
  technicianId: "tech-1",
};
const change = (wanted: PlannedMovement) => {
  let n = 0;
  return postingsForRecordChange({
    serviceRecordId: "sr-1",
    posted: [posted],
    wanted: [wanted],
    at: "2026-05-05T09:00:00Z",
    technicianId: "tech-2",
    newId: () => `n${++n}`,
  });
};

describe("postingsForRecordChange: what still matches", () => {
  it("posts nothing for an unchanged leg", () => {
    expect(change(wantedSame)).toEqual([]);
  });

  it("cancels and reposts when only the cylinder, the type or the refrigerant changed", () => {
    for (const edit of [
      { cylinderId: "cyl-b" },
      { type: "charged_from" as const },
      { refrigerant: "R-1234yf" as const },
    ]) {
      const out = change({ ...wantedSame, ...edit });
      expect(out, JSON.stringify(edit)).toHaveLength(2);
      expect(out[0]).toMatchObject({ reverses: "p1", note: "service record changed", massG: 640 });
      expect(out[1]).toMatchObject({ ...edit, serviceRecordId: "sr-1" });
    }
  });
});

describe("postingsForServiceRecord: a leg of 0 g posts nothing", () => {
  it("posts a leg only when it moved refrigerant", () => {
    const legs = postingsForServiceRecord({
      refrigerant: "R-134a",
      technicianId: "tech-1",
      recovery: { cylinderId: "cyl-a", massG: 0 },
      recharge: { cylinderId: "cyl-s", massG: 600 },
    });
    expect(legs.map((l) => [l.type, l.massG])).toEqual([["charged_from", 600]]);
  });
});
