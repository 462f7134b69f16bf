import { describe, expect, it } from "vitest";
import { chargeAuditAnswersSchema } from "@/lib/interview/answers";
import { VEHICLE_CHARGE_MASS_MAX_G } from "./case-figures";
import { serviceRecordInputSchema } from "./service-records";

// A mass typed in the interview is shown, editable, in the service record and the other way round:
// both must take and refuse the same masses.

const interviewTakes = (field: "recoveredChargeG" | "chargedG", massG: number) =>
  chargeAuditAnswersSchema.safeParse({ recovered: true, [field]: massG }).success;

const recordTakes = (field: "recoveredChargeG" | "chargedG", massG: number) => {
  const r = serviceRecordInputSchema.safeParse({ baseVersion: 0, step: "identify", [field]: massG });
  return r.success || !r.error.issues.some((i) => i.path[0] === field);
};

describe("one limit for a vehicle's recovered and charged mass", () => {
  it("is the service record's 10,000 g", () => {
    expect(VEHICLE_CHARGE_MASS_MAX_G).toBe(10_000);
  });

  for (const field of ["recoveredChargeG", "chargedG"] as const) {
    it(`${field}: the interview and the service record take the limit and refuse a gram more`, () => {
      for (const massG of [0, 6500, VEHICLE_CHARGE_MASS_MAX_G]) {
        expect(interviewTakes(field, massG), `interview ${massG} g`).toBe(true);
        expect(recordTakes(field, massG), `record ${massG} g`).toBe(true);
      }
      expect(interviewTakes(field, VEHICLE_CHARGE_MASS_MAX_G + 1)).toBe(false);
      expect(recordTakes(field, VEHICLE_CHARGE_MASS_MAX_G + 1)).toBe(false);
    });
  }
});
