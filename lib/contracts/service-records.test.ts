import { describe, expect, it } from "vitest";
import { sayInUnits } from "@/lib/units/quantity";
import { unitsOfSystem } from "@/lib/units/reader";
import { SERVICE_STEP_OF_FIELD, SERVICE_STEPS, serviceRecordInputSchema } from "./service-records";

function issues(input: Record<string, unknown>) {
  const r = serviceRecordInputSchema.safeParse({ baseVersion: 0, ...input });
  return r.success ? [] : r.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`);
}

// A save sends the step the record resumes at: saving the identification step sends "recovery",
// saving the recovery step sends "evacuation", and the last step sends "final" again.
describe("service record: a mass needs its cylinder once the step that asks for the cylinder is saved", () => {
  it("saves the identification step with a recovered mass brought over from the interview and no cylinder yet", () => {
    expect(issues({ step: "identify", recoveredChargeG: 454, purityPct: 99.5 })).toEqual([]);
    expect(issues({ step: "recovery", recoveredChargeG: 454, purityPct: 99.5 })).toEqual([]);
  });

  it("refuses the recovery step's save, and every later one, with a recovered mass and no cylinder", () => {
    for (const step of ["evacuation", "oil", "recharge", "final"]) {
      expect(issues({ step, recoveredChargeG: 454 })).toEqual([
        "recoveryCylinderId: Choose the recovery cylinder the refrigerant went into: the ledger needs it.",
      ]);
    }
    expect(issues({ step: "evacuation", recoveredChargeG: 454, recoveryCylinderId: 4 })).toEqual([]);
  });

  it("lets a recovered mass of zero stand without a cylinder: nothing went into one", () => {
    expect(issues({ step: "final", recoveredChargeG: 0 })).toEqual([]);
  });

  it("asks for the charging cylinder when the recharge step is saved, not before", () => {
    expect(issues({ step: "recharge", chargedG: 540 })).toEqual([]);
    expect(issues({ step: "final", chargedG: 540 })).toEqual([
      "chargeCylinderId: Choose the cylinder the charge came from: the ledger needs it.",
    ]);
    expect(issues({ step: "final", chargedG: 540, chargeCylinderId: 3 })).toEqual([]);
  });

  it("places each cylinder on the step that shows its mass", () => {
    expect(SERVICE_STEP_OF_FIELD.recoveryCylinderId).toBe(SERVICE_STEP_OF_FIELD.recoveredChargeG);
    expect(SERVICE_STEP_OF_FIELD.chargeCylinderId).toBe(SERVICE_STEP_OF_FIELD.chargedG);
    for (const step of Object.values(SERVICE_STEP_OF_FIELD)) expect(SERVICE_STEPS).toContain(step);
  });
});

describe("service record: limit messages carry their figures as quantities", () => {
  function limitMessage(input: Record<string, unknown>) {
    const r = serviceRecordInputSchema.safeParse({ baseVersion: 0, step: "final", ...input });
    if (r.success) throw new Error("expected a refusal");
    return r.error.issues[0]!.message;
  }

  it("says a mass limit in grams to a metric reader and in ounces to an imperial one", () => {
    const message = limitMessage({ labelChargeG: 6000 });
    expect(sayInUnits(message)).toBe("Label charge cannot be above 5,000 g.");
    // 5,000 g / 28.349523125 g per oz (NIST SP 811) = 176.4 oz
    expect(sayInUnits(message, unitsOfSystem("imperial"))).toMatch(
      /^Label charge cannot be above 176\.4 oz\.$/,
    );
  });

  it("says a temperature limit in °F to an imperial reader", () => {
    // 60 °C = 140 °F
    expect(sayInUnits(limitMessage({ finalAmbientC: 61 }), unitsOfSystem("imperial"))).toMatch(
      /140(\.0)? °F/,
    );
  });

  it("keeps plain units for percent and minutes", () => {
    expect(limitMessage({ purityPct: 101 })).toBe("Purity cannot be above 100 %.");
    expect(limitMessage({ holdMinutes: 0.1 })).toBe("Hold time cannot be below 0.5 min.");
  });
});
