import { describe, expect, it } from "vitest";
import { CAUSE_IDS } from "./causes";
import { diagnose } from "./diagnose";
import { type ConfusionPair, WORKED_CASES } from "./fixtures";
import { diagnosisInputSchema } from "./schema";

const PAIRS: Record<ConfusionPair, readonly string[]> = {
  undercharge_vs_metering_restriction: ["undercharge", "metering_restriction"],
  overcharge_vs_air_vs_airflow: ["overcharge", "non_condensables", "condenser_airflow"],
  weak_compressor_vs_severe_undercharge: ["weak_compressor", "undercharge"],
  moisture_vs_icing: ["moisture", "evaporator_icing"],
};

describe("worked cases", () => {
  it("has at least 30 cases with unique ids, each naming its source", () => {
    expect(WORKED_CASES.length).toBeGreaterThanOrEqual(30);
    expect(new Set(WORKED_CASES.map((c) => c.id)).size).toBe(WORKED_CASES.length);
    for (const c of WORKED_CASES) expect(c.source.trim().length, c.id).toBeGreaterThan(10);
  });

  it("covers every cause twice, both refrigerants and both expansion devices", () => {
    for (const cause of CAUSE_IDS)
      expect(WORKED_CASES.filter((c) => c.expectedLeader === cause).length, cause).toBeGreaterThanOrEqual(2);
    for (const refrigerant of ["R-134a", "R-1234yf"])
      expect(WORKED_CASES.some((c) => c.input.refrigerant === refrigerant)).toBe(true);
    for (const device of ["orifice_tube", "txv"])
      expect(WORKED_CASES.some((c) => c.input.expansionDevice === device)).toBe(true);
  });

  it("has every side of each known confusion", () => {
    for (const [pair, causes] of Object.entries(PAIRS)) {
      for (const cause of causes)
        expect(
          WORKED_CASES.some((c) => c.pair === pair && c.expectedLeader === cause),
          `${pair}: ${cause}`,
        ).toBe(true);
    }
  });

  for (const c of WORKED_CASES) {
    it(`${c.id}: ${c.expectedLeader} first (${c.source})`, () => {
      expect(diagnosisInputSchema.safeParse(c.input).success).toBe(true);
      const findings = diagnose(c.input);
      expect(findings.suspects[0]?.cause).toBe(c.expectedLeader);
      expect(findings.suspects[0]?.evidenceFor.length).toBeGreaterThan(0);
    });
  }
});
