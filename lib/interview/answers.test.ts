import { describe, expect, it } from "vitest";
import {
  answerSchemas,
  chargeAuditAnswersSchema,
  complaintAnswersSchema,
  conditionsAnswersSchema,
  runningAnswersSchema,
  staticAnswersSchema,
  systemAnswersSchema,
  behaviourAnswersSchema,
  leakFindingAnswersSchema,
} from "./answers";
import { interviewAnswersSchema } from "./checked-answers";
import type { InterviewAnswers } from "./answers";
import { crossCheck } from "./cross-checks";
import { exampleAnswers } from "./example-answers";
import { validateGroup, sortSavedAnswers } from "./validate";

const messages = (result: { success: boolean; error?: { issues: { message: string }[] } }) =>
  result.error?.issues.map((i) => i.message) ?? [];

describe("question group schemas", () => {
  it("accept every group of the example case", () => {
    for (const [group, schema] of Object.entries(answerSchemas)) {
      const values = exampleAnswers[group as keyof typeof exampleAnswers];
      if (values === undefined) continue;
      expect(schema.safeParse(values).success, group).toBe(true);
    }
  });

  it("require the complaint and trim it, up to 2000 characters", () => {
    expect(complaintAnswersSchema.safeParse({ ownerWords: "   " }).success).toBe(false);
    expect(complaintAnswersSchema.parse({ ownerWords: "  warm at idle " }).ownerWords).toBe("warm at idle");
    expect(complaintAnswersSchema.safeParse({ ownerWords: "x".repeat(2000) }).success).toBe(true);
    expect(messages(complaintAnswersSchema.safeParse({ ownerWords: "x".repeat(2001) }))).toEqual([
      "Keep the complaint under 2000 characters",
    ]);
  });

  it("require refrigerant, device and the compressor type; label charge and oil are optional", () => {
    expect(
      systemAnswersSchema.safeParse({
        refrigerant: "R-1234yf",
        expansionDevice: "txv",
        compressorType: "electric",
      }).success,
    ).toBe(true);
    const missing = systemAnswersSchema.safeParse({ refrigerant: "R-1234yf", expansionDevice: "txv" });
    expect(messages(missing)).toEqual(["Choose the compressor type, or 'not known'"]);
    // Answers saved before the question was asked said only whether the compressor was electric.
    const older = { refrigerant: "R-1234yf", expansionDevice: "txv", electricCompressor: true };
    expect(systemAnswersSchema.parse(older)).toMatchObject({ compressorType: "electric" });
    expect(systemAnswersSchema.parse({ ...older, electricCompressor: false })).toMatchObject({
      compressorType: "unknown",
    });
    expect(
      messages(
        systemAnswersSchema.safeParse({
          refrigerant: "R-22",
          expansionDevice: "txv",
          compressorType: "unknown",
        }),
      ),
    ).toEqual(["Choose the refrigerant on the label"]);
  });

  it("require ambient temperature only; humidity, altitude and engine speed are optional", () => {
    expect(conditionsAnswersSchema.safeParse({ ambientC: 21 }).success).toBe(true);
    expect(conditionsAnswersSchema.safeParse({}).success).toBe(false);
    expect(conditionsAnswersSchema.safeParse({ ambientC: 21, relativeHumidityPct: 101 }).success).toBe(false);
    expect(conditionsAnswersSchema.safeParse({ ambientC: 21, engineRpm: 1500.5 }).success).toBe(false);
  });

  it("let the static pressure be left out, and refuse a gauge below a full vacuum (101.325 kPa, ISO 2533 standard atmosphere)", () => {
    expect(staticAnswersSchema.safeParse({}).success).toBe(true);
    expect(staticAnswersSchema.safeParse({ staticKpaGauge: -101.3 }).success).toBe(true);
    expect(messages(staticAnswersSchema.safeParse({ staticKpaGauge: -102 }))[0]).toMatch(/full vacuum/);
  });

  it("flag a low side above the high side in plain words, on the low-side field", () => {
    const result = runningAnswersSchema.safeParse({ highKpaGauge: 300, lowKpaGauge: 900 });
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]?.path).toEqual(["lowKpaGauge"]);
    expect(result.error?.issues[0]?.message).toBe(
      "The low side reads above the high side — check the hose connections",
    );
  });

  it("allow equalised gauges that disagree by a few psi (common practice), and every running reading on its own", () => {
    expect(runningAnswersSchema.safeParse({ highKpaGauge: 600, lowKpaGauge: 630 }).success).toBe(true);
    expect(runningAnswersSchema.safeParse({ lowKpaGauge: 900 }).success).toBe(true);
    expect(runningAnswersSchema.safeParse({}).success).toBe(true);
  });

  it("accept each listed behaviour once", () => {
    expect(behaviourAnswersSchema.safeParse({ symptoms: [] }).success).toBe(true);
    expect(
      behaviourAnswersSchema.safeParse({ symptoms: ["compressor_noise", "compressor_noise"] }).success,
    ).toBe(false);
    expect(behaviourAnswersSchema.safeParse({ symptoms: ["leak_found"] }).success).toBe(false);
  });

  it("refuse a recovered mass on a charge marked not recovered", () => {
    expect(chargeAuditAnswersSchema.safeParse({ recovered: false, oilRemovedMl: 0 }).success).toBe(true);
    const result = chargeAuditAnswersSchema.safeParse({ recovered: false, recoveredChargeG: 400 });
    expect(result.error?.issues[0]?.path).toEqual(["recoveredChargeG"]);
  });

  it("require a leak-search method", () => {
    expect(leakFindingAnswersSchema.safeParse({ whereFound: "condenser" }).success).toBe(false);
    expect(
      leakFindingAnswersSchema.safeParse({ method: "electronic_detector", whereFound: "condenser" }).success,
    ).toBe(true);
  });
});

describe("checks across groups", () => {
  it("refuse an R-134a static pressure an HFC system cannot hold (relief near 3.1–3.8 MPa, from memory) but accept it for R-744", () => {
    const hfc = { ...exampleAnswers, static: { staticKpaGauge: 5600 } };
    const co2 = { ...hfc, system: { ...exampleAnswers.system, refrigerant: "R-744" as const } };
    const result = interviewAnswersSchema.safeParse(hfc);
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]?.path).toEqual(["static", "staticKpaGauge"]);
    expect(interviewAnswersSchema.safeParse(co2).success).toBe(true);
  });

  it("refuse a recovered mass over three times the label charge (common practice)", () => {
    const answers = { ...exampleAnswers, chargeAudit: { recovered: true, recoveredChargeG: 1800 } };
    expect(interviewAnswersSchema.safeParse(answers).success).toBe(false);
    expect(validateGroup("chargeAudit", answers.chargeAudit, exampleAnswers)).toMatchObject({ ok: false });
    expect(
      validateGroup("chargeAudit", { recovered: true, recoveredChargeG: 1700 }, exampleAnswers),
    ).toMatchObject({ ok: true });
  });

  it("refuse a gauge below the local full vacuum: about −83.5 kPa gauge at 1600 m (ISO 2533 standard atmosphere)", () => {
    const high: InterviewAnswers = {
      ...exampleAnswers,
      conditions: { ambientC: 20, altitudeM: 1600 },
      running: { lowKpaGauge: -90 },
    };
    const result = interviewAnswersSchema.safeParse(high);
    expect(result.error?.issues[0]?.path).toEqual(["running", "lowKpaGauge"]);
    expect(result.error?.issues[0]?.message).toMatch(/full vacuum \(-83\.[0-9] kPa at 1600 m\)/);
    expect(interviewAnswersSchema.safeParse({ ...high, running: { lowKpaGauge: -83 } }).success).toBe(true);
    expect(interviewAnswersSchema.safeParse({ ...high, conditions: { ambientC: 20 } }).success).toBe(true);
  });

  it("use the shop's altitude for that floor when the conditions give none", () => {
    const answers: InterviewAnswers = { conditions: { ambientC: 20 }, static: { staticKpaGauge: -90 } };
    expect(crossCheck(answers)).toEqual({});
    expect(crossCheck(answers, { altitudeM: 1600 }).static?.[0]?.field).toBe("staticKpaGauge");
    expect(validateGroup("static", answers.static, answers, { altitudeM: 1600 })).toMatchObject({
      ok: false,
    });
  });

  it("accept an interview with no groups at all", () => {
    expect(interviewAnswersSchema.safeParse({}).success).toBe(true);
  });
});

describe("sortSavedAnswers", () => {
  it("keeps valid groups as answers and invalid ones as drafts with their messages", () => {
    const saved = { ...exampleAnswers, running: { highKpaGauge: 300, lowKpaGauge: 900 }, stray: 1 };
    const sorted = sortSavedAnswers(saved);
    expect(sorted.answers.running).toBeUndefined();
    expect(sorted.answers.system).toEqual(exampleAnswers.system);
    expect(sorted.drafts.running).toEqual(saved.running);
    expect(sorted.errors.running?.[0]).toEqual({
      field: "lowKpaGauge",
      message: "The low side reads above the high side — check the hose connections",
    });
  });

  it("returns nothing for something that is not a saved interview", () => {
    expect(sortSavedAnswers(null)).toEqual({ answers: {}, drafts: {}, errors: {} });
    expect(sortSavedAnswers("complaint")).toEqual({ answers: {}, drafts: {}, errors: {} });
  });
});
