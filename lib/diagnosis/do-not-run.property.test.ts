import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { CHECKS } from "./checks";
import { diagnose } from "./diagnose";
import { doNotRunState } from "./do-not-run";
import { type DiagnosisInput, diagnosisInputSchema } from "./schema";
import { SYMPTOM_IDS } from "./symptoms";
import { real, shopInput, validInput } from "./test-inputs";
import { propertyRuns } from "@/tests/support/property-runs";

const RUNNING_CHECKS = new Set<string>(CHECKS.filter((c) => c.runsSystem).map((c) => c.id));

/** Inputs pushed into the do-not-run state by one of its four conditions, on top of anything else. */
const inDoNotRun: fc.Arbitrary<DiagnosisInput> = fc
  .tuple(
    fc.oneof(validInput, shopInput),
    fc.constantFrom("no_liquid", "recovered", "leak_short", "electric"),
    real(0, 1),
  )
  .map(([input, condition, x]): DiagnosisInput => {
    const noRecharge = { ...input, chargedG: undefined };
    switch (condition) {
      case "no_liquid":
        return { ...noRecharge, ambientC: Math.max(input.ambientC, 5), staticKpaGauge: x * 60 };
      case "recovered":
        return { ...noRecharge, recoveredChargeG: x * (input.labelChargeG ?? 800) };
      case "leak_short":
        return {
          ...noRecharge,
          symptoms: [
            ...new Set([...(input.symptoms ?? []), "leak_found" as const, "bubbles_in_sight_glass" as const]),
          ],
        };
      default:
        return { ...noRecharge, compressorType: "electric", staticKpaGauge: undefined };
    }
  })
  .filter((input) => diagnosisInputSchema.safeParse(input).success);

type ReadingField = Exclude<
  keyof DiagnosisInput,
  | "refrigerant"
  | "expansionDevice"
  | "ambientC"
  | "relativeHumidityPct"
  | "altitudeM"
  | "compressorType"
  | "chargedG"
  | "symptoms"
>;

/** One reading a technician might enter next, as the fields it fills (the static check comes with its soak). */
const nextReading: fc.Arbitrary<{ fields: Partial<DiagnosisInput>; symptom?: (typeof SYMPTOM_IDS)[number] }> =
  fc.oneof(
    fc
      .record({ staticKpaGauge: real(-101, 1500), staticSoakC: real(-10, 50), staticSoakMin: real(0, 600) })
      .map((fields) => ({ fields })),
    real(-101, 3000).map((v) => ({ fields: { highKpaGauge: v } })),
    real(-101, 900).map((v) => ({ fields: { lowKpaGauge: v } })),
    fc
      .tuple(real(-101, 400), real(0, 300))
      .map(([out, rise]) => ({ fields: { lowCutOutKpaGauge: out, lowCutInKpaGauge: out + rise } })),
    real(-40, 110).map((v) => ({ fields: { liquidLineC: v } })),
    real(-50, 80).map((v) => ({ fields: { suctionLineC: v } })),
    real(-30, 60).map((v) => ({ fields: { ventC: v } })),
    real(50, 3000).map((v) => ({ fields: { labelChargeG: v } })),
    real(0, 3000).map((v) => ({ fields: { recoveredChargeG: v } })),
    real(0, 100).map((v) => ({ fields: { identifierPurityPct: v } })),
    real(0, 100).map((v) => ({ fields: { identifierAirPct: v } })),
    fc.constantFrom(...SYMPTOM_IDS).map((symptom) => ({ fields: {}, symptom })),
  );

describe("the do-not-run state (fast-check)", { timeout: 30_000 }, () => {
  it("never offers a check that runs the system while the state holds", () => {
    const numRuns = propertyRuns(400);
    let held = 0;
    fc.assert(
      fc.property(inDoNotRun, (input) => {
        const findings = diagnose(input);
        expect(findings.doNotRun.active).toBe(true);
        held += 1;
        expect(findings.nextCheck.runsSystem).toBe(false);
        expect(RUNNING_CHECKS.has(findings.nextCheck.check)).toBe(false);
        expect(findings.cautions.map((c) => c.id)).toContain("empty_system");
      }),
      { numRuns },
    );
    expect(held).toBeGreaterThan(numRuns * 0.75);
  });

  it("is never lifted by entering a reading, only by a recharge (the static check on an electric compressor excepted: that reading is what it waits for)", () => {
    const numRuns = propertyRuns(600);
    let checked = 0;
    fc.assert(
      fc.property(inDoNotRun, nextReading, (input, reading) => {
        const fields = Object.keys(reading.fields) as ReadingField[];
        // Entering means filling what was empty.
        fc.pre(fields.every((f) => input[f] === undefined));
        fc.pre(reading.symptom === undefined || !(input.symptoms ?? []).includes(reading.symptom));
        const staticOnElectric = fields.includes("staticKpaGauge") && input.compressorType === "electric";
        fc.pre(!staticOnElectric);
        const next: DiagnosisInput = {
          ...input,
          ...reading.fields,
          ...(reading.symptom ? { symptoms: [...(input.symptoms ?? []), reading.symptom] } : {}),
        };
        fc.pre(diagnosisInputSchema.safeParse(next).success);
        checked += 1;
        expect(doNotRunState(next).active).toBe(true);
        expect(diagnose(next).nextCheck.runsSystem).toBe(false);
      }),
      { numRuns },
    );
    expect(checked).toBeGreaterThan(numRuns / 3);
  });

  it("is lifted by a recharge of at least half the label", () => {
    fc.assert(
      fc.property(inDoNotRun, real(0.5, 1.2), (input, fraction) => {
        const chargedG = (input.labelChargeG ?? 700) * fraction;
        const next = { ...input, chargedG };
        fc.pre(diagnosisInputSchema.safeParse(next).success);
        expect(doNotRunState(next).active).toBe(false);
      }),
      { numRuns: propertyRuns(200) },
    );
  });
});
