import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { CAUSE_IDS } from "./causes";
import { diagnose } from "./diagnose";
import { ENGINE_VERSION } from "./engine-version";
import { type DiagnosisInput, diagnosisInputSchema } from "./schema";
import { real, shopInput, validInput } from "./test-inputs";
import { propertyRuns } from "@/tests/support/property-runs";

describe("diagnose on any input the schema accepts (fast-check)", { timeout: 30_000 }, () => {
  it("returns every cause once, with shares in [0, 1] that sum to 1, sorted, never NaN, and cautions ending in deference", () => {
    fc.assert(
      fc.property(validInput, (input) => {
        const findings = diagnose(input);
        expect(findings.engineVersion).toBe(ENGINE_VERSION);
        expect(findings.suspects.map((s) => s.cause).sort()).toEqual([...CAUSE_IDS].sort());
        let total = 0;
        findings.suspects.forEach((s, i) => {
          expect(s.share >= 0 && s.share <= 1).toBe(true);
          total += s.share;
          if (i > 0) expect(s.share).toBeLessThanOrEqual(findings.suspects[i - 1]?.share ?? 1);
        });
        expect(total).toBeCloseTo(1, 9);
        expect(findings.measured.statement.length).toBeGreaterThan(10);
        expect(findings.cautions.length).toBeGreaterThanOrEqual(1);
        expect(findings.cautions.at(-1)?.id).toBe("defer_to_procedure");
        expect(findings.nextCheck.instruction.length).toBeGreaterThan(10);
        expect(JSON.stringify(findings)).not.toMatch(/NaN|null|Infinity/);
      }),
      { numRuns: propertyRuns(400) },
    );
  });

  it("is deterministic: the same readings give the same findings", () => {
    fc.assert(
      fc.property(validInput, (input) => {
        expect(diagnose(structuredClone(input))).toEqual(diagnose(input));
      }),
      { numRuns: propertyRuns(200) },
    );
  });

  it("never lowers non-condensables when the static-pressure excess rises (Dalton's law of partial pressures)", () => {
    const pair = fc.tuple(validInput, real(-101.3, 4500), real(-101.3, 4500));
    fc.assert(
      fc.property(pair, ([input, a, b]) => {
        const [lowKpa, highKpa] = a <= b ? [a, b] : [b, a];
        const lower = { ...input, staticKpaGauge: lowKpa };
        const higher = { ...input, staticKpaGauge: highKpa };
        fc.pre(
          diagnosisInputSchema.safeParse(lower).success && diagnosisInputSchema.safeParse(higher).success,
        );
        // The evidence for air (its log-odds), not its share: a share also moves with every other cause.
        const air = (i: DiagnosisInput) =>
          diagnose(i).suspects.find((s) => s.cause === "non_condensables")?.logOdds ?? Number.NaN;
        expect(air(higher)).toBeGreaterThanOrEqual(air(lower));
      }),
      { numRuns: propertyRuns(400) },
    );
  });

  it("puts contaminated refrigerant first whenever the identifier reads below 98 % (SAE J2099 / J2912)", () => {
    fc.assert(
      fc.property(validInput, real(0, 97.99), (input, purity) => {
        const findings = diagnose({ ...input, identifierPurityPct: purity });
        expect(findings.suspects[0]?.cause).toBe("contaminated_refrigerant");
        expect(findings.cautions.map((c) => c.id)).toContain("contaminated_do_not_recover");
      }),
      { numRuns: propertyRuns(200) },
    );
  });

  it("puts undercharge first and sends a pure system with a near-zero static down the repair path, which finds the leak before anything runs (common practice; SAE J2788 equipment range 10–50 °C)", () => {
    const emptyInput = fc.tuple(validInput, real(10, 50)).map(([input, ambientC]): DiagnosisInput => ({
      ...input,
      ambientC,
      staticKpaGauge: 10,
      staticSoakC: undefined,
      chargedG: undefined,
      identifierPurityPct: undefined,
      symptoms: (input.symptoms ?? []).filter(
        (s) =>
          s !== "identifier_flags_hydrocarbon" &&
          s !== "sealant_found" &&
          s !== "leak_found" &&
          s !== "no_leak_found",
      ),
    }));
    fc.assert(
      fc.property(emptyInput, (input) => {
        fc.pre(diagnosisInputSchema.safeParse(input).success);
        const findings = diagnose(input);
        expect(findings.suspects[0]?.cause).toBe("undercharge");
        expect(findings.doNotRun.active).toBe(true);
        expect(findings.nextCheck.check).toBe("repair_path");
        expect(findings.nextCheck.runsSystem).toBe(false);
      }),
      { numRuns: propertyRuns(200) },
    );
  });
});

describe("shares (fast-check)", { timeout: 30_000 }, () => {
  it("sum to 1 over all causes and rank the suspects, on shop-like inputs too", () => {
    fc.assert(
      fc.property(shopInput, (input) => {
        const { suspects } = diagnose(input);
        expect(suspects.reduce((sum, s) => sum + s.share, 0)).toBeCloseTo(1, 9);
        for (let i = 1; i < suspects.length; i++)
          expect(suspects[i]!.share).toBeLessThanOrEqual(suspects[i - 1]!.share);
      }),
      { numRuns: propertyRuns(400) },
    );
  });

  it("give a failed identification the whole share and mark every other cause not assessed (SAE J2099 / J2912)", () => {
    fc.assert(
      fc.property(shopInput, real(0, 97.9), (input, purity) => {
        const { suspects } = diagnose({ ...input, identifierPurityPct: purity });
        expect(suspects[0]).toMatchObject({ cause: "contaminated_refrigerant", share: 1, assessed: true });
        for (const s of suspects.slice(1)) expect(s).toMatchObject({ share: 0, assessed: false });
      }),
      { numRuns: propertyRuns(200) },
    );
  });
});

describe("monotone where the physics says so (fast-check)", { timeout: 30_000 }, () => {
  // The evidence for a cause (its log-odds): a share also moves with every other cause.
  const scoreOf = (input: DiagnosisInput, cause: string) =>
    diagnose(input).suspects.find((s) => s.cause === cause)?.logOdds ?? Number.NaN;

  it("never lowers overcharge nor raises undercharge as more refrigerant is recovered against the same label (charge by weight: TM 5-3805-291-23-1)", () => {
    const pair = fc.tuple(validInput, real(50, 3000), real(0, 1), real(0, 1));
    fc.assert(
      fc.property(pair, ([input, labelChargeG, a, b]) => {
        const [less, more] = (a <= b ? [a, b] : [b, a]).map((f) => f * labelChargeG * 2.9);
        const base = { ...input, labelChargeG, staticKpaGauge: undefined };
        const lower = { ...base, recoveredChargeG: less };
        const higher = { ...base, recoveredChargeG: more };
        fc.pre(
          diagnosisInputSchema.safeParse(lower).success && diagnosisInputSchema.safeParse(higher).success,
        );
        expect(scoreOf(higher, "overcharge")).toBeGreaterThanOrEqual(scoreOf(lower, "overcharge"));
        expect(scoreOf(higher, "undercharge")).toBeLessThanOrEqual(scoreOf(lower, "undercharge"));
      }),
      { numRuns: propertyRuns(300) },
    );
  });

  it("never lowers non-condensables as the identifier's air reading rises (SAE J2912 reports NCG weight %)", () => {
    fc.assert(
      fc.property(validInput, real(0, 100), real(0, 100), (input, a, b) => {
        const [less, more] = a <= b ? [a, b] : [b, a];
        expect(scoreOf({ ...input, identifierAirPct: more }, "non_condensables")).toBeGreaterThanOrEqual(
          scoreOf({ ...input, identifierAirPct: less }, "non_condensables"),
        );
      }),
      { numRuns: propertyRuns(300) },
    );
  });

  it("never raises contaminated refrigerant as the identifier's purity rises (SAE J2099 98 % mark), sealant aside: identifiers cannot see it", () => {
    fc.assert(
      fc.property(validInput, real(0, 100), real(0, 100), (input, a, b) => {
        fc.pre(!(input.symptoms ?? []).includes("sealant_found"));
        const [less, more] = a <= b ? [a, b] : [b, a];
        expect(
          scoreOf({ ...input, identifierPurityPct: more }, "contaminated_refrigerant"),
        ).toBeLessThanOrEqual(scoreOf({ ...input, identifierPurityPct: less }, "contaminated_refrigerant"));
      }),
      { numRuns: propertyRuns(300) },
    );
  });
});
