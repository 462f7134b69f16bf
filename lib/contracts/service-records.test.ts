import { describe, expect, it } from "vitest";
import { serviceRecordInputSchema } from "./service-records";

function issues(input: Record<string, unknown>) {
  const r = serviceRecordInputSchema.safeParse({ baseVersion: 0, ...input });
  return r.success ? [] : r.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`);
}

describe("service record: a mass needs its cylinder from the step that asks for it", () => {
  it("saves the identification step with a recovered mass brought over from the interview and no cylinder yet", () => {
    expect(issues({ step: "identify", recoveredChargeG: 454, purityPct: 99.5 })).toEqual([]);
  });

  it("refuses the recovery step, and every later one, with a recovered mass and no cylinder", () => {
    for (const step of ["recovery", "evacuation", "oil", "recharge", "final"]) {
      expect(issues({ step, recoveredChargeG: 454 })).toEqual([
        "recoveryCylinderId: Choose the recovery cylinder the refrigerant went into: the ledger needs it.",
      ]);
    }
  });

  it("lets a recovered mass of zero stand without a cylinder: nothing went into one", () => {
    expect(issues({ step: "final", recoveredChargeG: 0 })).toEqual([]);
  });

  it("asks for the charging cylinder from the recharge step on, not before", () => {
    expect(issues({ step: "oil", chargedG: 540 })).toEqual([]);
    expect(issues({ step: "recharge", chargedG: 540 })).toEqual([
      "chargeCylinderId: Choose the cylinder the charge came from: the ledger needs it.",
    ]);
    expect(issues({ step: "recharge", chargedG: 540, chargeCylinderId: 3 })).toEqual([]);
  });
});
