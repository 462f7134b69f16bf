import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { diagnosisInputSchema } from "@/lib/diagnosis";
import type { InterviewAnswers } from "./answers";
import { interviewAnswersSchema } from "./checked-answers";
import { behaviourSymptomIds, leakPlaceChoices } from "./choices";
import { crossCheck } from "./cross-checks";
import { emptySystemAnswers, exampleAnswers } from "./example-answers";
import { diagnosisInputFor, toDiagnosisInput } from "./to-diagnosis-input";
import { propertyRuns } from "@/tests/support/property-runs";

describe("toDiagnosisInput", () => {
  it("is null until refrigerant, expansion device and ambient are known", () => {
    expect(toDiagnosisInput({})).toBeNull();
    expect(toDiagnosisInput({ system: exampleAnswers.system })).toBeNull();
    expect(toDiagnosisInput({ conditions: exampleAnswers.conditions })).toBeNull();
    expect(
      toDiagnosisInput({ system: exampleAnswers.system, conditions: exampleAnswers.conditions }),
    ).not.toBeNull();
  });

  it("carries every reading across in internal units", () => {
    expect(toDiagnosisInput(exampleAnswers)).toEqual({
      refrigerant: "R-134a",
      expansionDevice: "orifice_tube",
      compressorType: "variable_displacement",
      ambientC: 32,
      relativeHumidityPct: 55,
      staticKpaGauge: 715,
      highKpaGauge: 1550,
      lowKpaGauge: 210,
      liquidLineC: 48,
      suctionLineC: 7,
      ventC: 9,
      labelChargeG: 570,
      recoveredChargeG: 530,
      identifierPurityPct: 99.6,
      identifierAirPct: 0.4,
      symptoms: ["cooling_fades_then_returns"],
    });
  });

  it("takes the altitude from the conditions, else from the shop", () => {
    const { system, conditions } = exampleAnswers;
    expect(toDiagnosisInput({ system, conditions }, { altitudeM: 1600 })?.altitudeM).toBe(1600);
    expect(
      toDiagnosisInput({ system, conditions: { ...conditions, altitudeM: 20 } }, { altitudeM: 1600 })
        ?.altitudeM,
    ).toBe(20);
    expect(toDiagnosisInput({ system, conditions })).not.toHaveProperty("altitudeM");
  });

  it("leaves skipped readings out rather than filling them in", () => {
    const input = toDiagnosisInput({ system: exampleAnswers.system, conditions: exampleAnswers.conditions });
    expect(Object.keys(input ?? {}).sort()).toEqual([
      "ambientC",
      "compressorType",
      "expansionDevice",
      "labelChargeG",
      "refrigerant",
      "relativeHumidityPct",
    ]);
  });

  it("tells the engine the compressor is electric when the system answer says so", () => {
    const electric: InterviewAnswers = {
      ...exampleAnswers,
      system: { ...exampleAnswers.system, compressorType: "electric" },
    };
    expect(toDiagnosisInput(electric)?.compressorType).toBe("electric");
    const unknown: InterviewAnswers = {
      ...exampleAnswers,
      system: { ...exampleAnswers.system, compressorType: "unknown" },
    };
    expect(toDiagnosisInput(unknown)).not.toHaveProperty("compressorType");
  });

  it("carries the soak, the clutch points, the sealant look and what is known of the oil to the engine", () => {
    const answers: InterviewAnswers = {
      ...exampleAnswers,
      static: { staticKpaGauge: 715, staticSoakC: 30, staticSoakMin: 90, sealantSeen: false },
      running: { ...exampleAnswers.running, lowCutOutKpaGauge: 150, lowCutInKpaGauge: 310 },
      chargeAudit: {
        recovered: true,
        recoveredChargeG: 530,
        partReplaced: "without_oil",
        compressorOil: "short",
      },
    };
    const input = toDiagnosisInput(answers);
    expect(input).toMatchObject({
      staticSoakC: 30,
      staticSoakMin: 90,
      lowCutOutKpaGauge: 150,
      lowCutInKpaGauge: 310,
    });
    expect(input?.symptoms).toEqual(
      expect.arrayContaining(["no_sealant_found", "part_replaced_no_oil_added", "oil_short_at_drain"]),
    );
    const withOil: InterviewAnswers = {
      ...answers,
      static: { ...answers.static, sealantSeen: true },
      chargeAudit: { recovered: false, partReplaced: "with_oil", compressorOil: "about_right" },
    };
    expect(toDiagnosisInput(withOil)?.symptoms).toEqual(
      expect.arrayContaining(["sealant_found", "part_replaced_oil_added", "oil_normal_at_drain"]),
    );
  });

  it("ignores a recovered mass when the charge was not recovered", () => {
    const answers: InterviewAnswers = { ...exampleAnswers, chargeAudit: { recovered: false } };
    expect(toDiagnosisInput(answers)).not.toHaveProperty("recoveredChargeG");
  });

  it("reports the leak search and the identifier's hydrocarbon flag as symptoms", () => {
    expect(toDiagnosisInput(emptySystemAnswers)?.symptoms).toEqual(["leak_found"]);
    const notFound: InterviewAnswers = {
      ...emptySystemAnswers,
      leakFinding: { method: "electronic_detector", whereFound: "not_found_yet" },
    };
    // A search still under way is no evidence either way.
    expect(toDiagnosisInput(notFound)?.symptoms).toEqual([]);
    const flagged: InterviewAnswers = {
      ...exampleAnswers,
      identification: { purityPct: 95, hydrocarbonFlagged: true },
    };
    expect(toDiagnosisInput(flagged)?.symptoms).toEqual([
      "cooling_fades_then_returns",
      "identifier_flags_hydrocarbon",
    ]);
  });

  it("diagnosisInputFor leaves out readings from steps the route no longer takes", () => {
    const emptied: InterviewAnswers = { ...exampleAnswers, static: { staticKpaGauge: 0 } };
    expect(toDiagnosisInput(emptied)).toHaveProperty("highKpaGauge", 1550);
    const input = diagnosisInputFor(emptied);
    expect(input).not.toHaveProperty("highKpaGauge");
    expect(input).not.toHaveProperty("identifierPurityPct");
    expect(input).toHaveProperty("staticKpaGauge", 0);
    expect(diagnosisInputFor(exampleAnswers)).toEqual(toDiagnosisInput(exampleAnswers));
  });

  it("gives the findings engine an input it accepts for any valid set of answers (property)", () => {
    const opt = <T>(arb: fc.Arbitrary<T>) => fc.option(arb, { nil: undefined });
    const num = (min: number, max: number) => fc.double({ min, max, noNaN: true });
    const answers = fc.record({
      system: fc.record({
        refrigerant: fc.constantFrom("R-134a", "R-1234yf", "R-744"),
        expansionDevice: fc.constantFrom("orifice_tube", "txv"),
        compressorType: fc.constantFrom("cycling_clutch", "variable_displacement", "electric", "unknown"),
        labelChargeG: opt(num(50, 5000)),
      }),
      conditions: fc.record({
        ambientC: num(-30, 55),
        relativeHumidityPct: opt(num(0, 100)),
        altitudeM: opt(num(-450, 5000)),
      }),
      static: fc.record({ staticKpaGauge: opt(num(-101.325, 16000)) }),
      running: fc.record({
        highKpaGauge: opt(num(-101.325, 16000)),
        lowKpaGauge: opt(num(-101.325, 16000)),
        liquidLineC: opt(num(-40, 110)),
        suctionLineC: opt(num(-40, 80)),
        ventC: opt(num(-30, 60)),
      }),
      behaviour: fc.record({ symptoms: fc.uniqueArray(fc.constantFrom(...behaviourSymptomIds)) }),
      identification: fc.record({
        purityPct: opt(num(0, 100)),
        airPct: opt(num(0, 100)),
        hydrocarbonFlagged: opt(fc.boolean()),
      }),
      chargeAudit: fc.record({ recovered: fc.boolean(), recoveredChargeG: opt(num(0, 6000)) }),
      leakFinding: fc.record({
        method: fc.constant("uv_dye" as const),
        whereFound: opt(fc.constantFrom(...leakPlaceChoices)),
      }),
    });
    const shop = fc.record({ altitudeM: opt(num(-450, 5000)) });
    const numRuns = propertyRuns(400);
    let checked = 0;
    fc.assert(
      fc.property(answers, shop, (candidate, shopSettings) => {
        const parsed = interviewAnswersSchema.safeParse(candidate);
        // Only answers the interview itself would accept, with the shop's altitude as the machine checks them.
        if (!parsed.success || Object.keys(crossCheck(parsed.data, shopSettings)).length > 0) return;
        checked += 1;
        const input = toDiagnosisInput(parsed.data, shopSettings);
        const result = diagnosisInputSchema.safeParse(input);
        expect(result.error?.issues ?? []).toEqual([]);
      }),
      { numRuns },
    );
    expect(checked).toBeGreaterThan(numRuns / 4);
  });
});
