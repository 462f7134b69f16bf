import { describe, expect, it } from "vitest";
import { saturationPressure } from "@/lib/refrigerants";
import { CAUSE_IDS, type CauseId } from "./causes";
import { CHECKS, type CheckContext, type CheckId, liquidProven } from "./checks";
import { type DoNotRun, doNotRunState } from "./do-not-run";
import { extractEvidence } from "./evidence";
import { NEXT_CHECK } from "./grading";
import { chooseNextCheck, confirmingStep, type Ranked } from "./next-check";
import type { DiagnosisInput } from "./schema";
import type { SymptomId } from "./symptoms";

// The order of work the next check follows (common practice; SAE J2843/J2912 for identifying before
// connecting equipment; Directive 2006/40/EC Art. 7 for repair before refill), checked rule by rule on a
// ranking given directly, so each rule is seen without the likelihood table in between.
const SEA_LEVEL_KPA = 101.325;
const base = { refrigerant: "R-134a", expansionDevice: "orifice_tube", ambientC: 30 } as const;
const ctxOf = (input: DiagnosisInput, extra: Partial<CheckContext> = {}): CheckContext => ({
  input,
  extraction: extractEvidence(input),
  symptoms: new Set<SymptomId>(input.symptoms ?? []),
  refrigerantContaminated: false,
  doNotRun: false,
  gapLogOdds: 5,
  ...extra,
});
const check = (id: CheckId) => {
  const found = CHECKS.find((c) => c.id === id);
  if (!found) throw new Error(id);
  return found;
};
const ranking = (...entries: [CauseId, number][]): Ranked[] =>
  entries.map(([cause, share]) => ({ cause, share }));
const idle: DoNotRun = { active: false, reasons: [] };
/** readings that put a hose on already, so the sealant and identifier rules stay out of the way */
const hosed: DiagnosisInput = {
  ...base,
  identifierPurityPct: 99.5,
  identifierAirPct: 0.2,
  symptoms: ["no_sealant_found"],
};

describe("what settles each cause (the signature table's confirming test)", () => {
  const step = (cause: CauseId, input: DiagnosisInput = base) => confirmingStep(cause, ctxOf(input));

  it("says for every cause a step that ends in a repair, the charge always by weight", () => {
    for (const cause of CAUSE_IDS) expect(step(cause).length, cause).toBeGreaterThan(40);
    for (const cause of ["overcharge", "undercharge", "non_condensables", "moisture"] as const)
      expect(step(cause)).toMatch(/by weight/);
    expect(step("undercharge")).toMatch(/repair the leak.*prove a vacuum hold/);
    expect(step("non_condensables")).toMatch(/evacuate for at least 30 minutes/);
    expect(step("moisture")).toMatch(/replace the receiver-drier or accumulator/);
    expect(step("high_side_restriction")).toMatch(/condenser, drier and liquid line/);
    expect(step("metering_stuck_open")).toMatch(/sensing element/);
    expect(step("oil_loss")).toMatch(/drain and measure the compressor's oil/);
    expect(step("no_refrigerant_fault")).toMatch(/blend-door/);
    expect(step("contaminated_refrigerant")).toMatch(/SAE J2851/);
  });

  it("names the metering device in front of the technician", () => {
    expect(step("metering_restriction", { ...base, expansionDevice: "txv" })).toMatch(
      /^Recover and inspect the expansion valve/,
    );
    expect(step("metering_restriction")).toMatch(/^Recover and inspect the orifice tube/);
  });

  it("fits the compressor: high-voltage procedure for an electric one, control valve for a variable one, clutch gap otherwise", () => {
    expect(step("weak_compressor", { ...base, compressorType: "electric" })).toMatch(
      /high-voltage procedure/,
    );
    expect(step("weak_compressor", { ...base, compressorType: "variable_displacement" })).toMatch(
      /displacement-control valve/,
    );
    expect(step("weak_compressor", { ...base, compressorType: "cycling_clutch" })).toMatch(/clutch air gap/);
    expect(step("weak_compressor")).toMatch(/clutch air gap/);
    expect(step("evaporator_icing", { ...base, compressorType: "cycling_clutch" })).toMatch(/cycling switch/);
    expect(step("evaporator_icing", { ...base, compressorType: "electric" })).toMatch(/temperature sensor/);
    expect(step("condenser_airflow", { ...base, compressorType: "electric" })).toMatch(/in ready mode\.$/);
    expect(step("condenser_airflow")).toMatch(/at idle\.$/);
  });
});

describe("each check's instruction fits the system", () => {
  const electric = ctxOf({ ...base, compressorType: "electric" });
  const belt = ctxOf({ ...base, expansionDevice: "txv" });

  it("runs an electric compressor in ready mode and a belt-driven one on the engine", () => {
    for (const id of [
      "condenser_fan",
      "vent_temperature",
      "running_pressures",
      "cycling_points",
      "condenser_water_spray",
      "watch_low_side",
      "txv_bulb_test",
      "liquid_line_survey",
    ] as const) {
      expect(check(id).instruction(electric), id).toMatch(/ready mode \(high-voltage system on\)/);
      expect(check(id).instruction(belt), id).toMatch(/engine warm, about 1,500 rpm/);
      expect(check(id).runsSystem, id).toBe(true);
    }
    expect(check("running_pressures").instruction(electric)).toMatch(/inverter data with a scan tool\.$/);
    expect(check("running_pressures").instruction(belt)).toMatch(/high and low side\.$/);
    expect(check("static_pressure").instruction(electric)).toMatch(
      /^With the vehicle switched off \(not in ready mode\)/,
    );
    expect(check("static_pressure").instruction(belt)).toMatch(/^With the engine off, let the system settle/);
  });

  it("recovers without injecting oil on an electric compressor and slowly past an accumulator", () => {
    const weigh = check("recover_and_weigh");
    expect(weigh.instruction(ctxOf({ ...base, compressorType: "electric" }))).toMatch(
      /certified equipment that injects no oil \(dedicated to electric compressors\), slowly/,
    );
    expect(weigh.instruction(belt)).toBe(
      "Recover the charge with certified equipment; weigh it against the label charge and measure the oil that came out.",
    );
    expect(check("suction_line_temperature").instruction(belt)).toMatch(/at the evaporator outlet/);
    expect(check("suction_line_temperature").instruction(ctxOf(base))).toMatch(/at the accumulator outlet/);
  });

  it("leaves the compressor off for the checks that need no running system", () => {
    for (const id of [
      "look_for_sealant",
      "identify_refrigerant",
      "static_pressure",
      "recover_and_weigh",
      "drain_compressor_oil",
      "leak_test",
    ] as const)
      expect(check(id).runsSystem, id).toBe(false);
    for (const id of [
      "look_for_sealant",
      "condenser_fan",
      "vent_temperature",
      "liquid_line_survey",
      "drain_compressor_oil",
    ] as const)
      expect(check(id).connectsHose, id).toBe(false);
    for (const id of [
      "identify_refrigerant",
      "static_pressure",
      "running_pressures",
      "recover_and_weigh",
      "leak_test",
    ] as const)
      expect(check(id).connectsHose, id).toBe(true);
    expect(check("leak_test").instruction(belt)).toMatch(/SAE J2970.*SAE J2791\/J2913.*SAE J2297/);
    expect(check("identify_refrigerant").instruction(belt)).toMatch(/SAE J2912/);
    expect(check("look_for_sealant").instruction(belt)).toMatch(
      /^Before any hose goes on, look for leak sealant/,
    );
    expect(check("drain_compressor_oil").instruction(belt)).toMatch(/graduated container/);
    expect(check("liquid_line_temperature").instruction(belt)).toMatch(/subcooling\.$/);
  });
});

describe("when each check is offered", () => {
  const available = (id: CheckId, input: DiagnosisInput, extra: Partial<CheckContext> = {}) =>
    check(id).available(ctxOf(input, extra));
  const contaminated = { refrigerantContaminated: true };

  it("offers no gauge or recovery work on a contaminated charge", () => {
    for (const id of [
      "static_pressure",
      "running_pressures",
      "liquid_line_temperature",
      "suction_line_temperature",
      "condenser_water_spray",
      "watch_low_side",
      "liquid_line_survey",
      "recover_and_weigh",
    ] as const) {
      expect(available(id, { ...base, expansionDevice: "txv", labelChargeG: 600 }), id).toBe(true);
      expect(available(id, { ...base, expansionDevice: "txv", labelChargeG: 600 }, contaminated), id).toBe(
        false,
      );
    }
    expect(available("cycling_points", { ...base, compressorType: "cycling_clutch" }, contaminated)).toBe(
      false,
    );
    expect(available("txv_bulb_test", { ...base, expansionDevice: "txv" }, contaminated)).toBe(false);
  });

  it("offers each reading only until it is taken", () => {
    expect(available("identify_refrigerant", { ...base, identifierPurityPct: 99 })).toBe(false);
    expect(available("identify_refrigerant", { ...base, recoveredChargeG: 500 })).toBe(false);
    expect(available("identify_refrigerant", base)).toBe(true);
    expect(available("static_pressure", { ...base, staticKpaGauge: 600 })).toBe(false);
    expect(available("static_pressure", { ...base, recoveredChargeG: 500 })).toBe(false);
    expect(available("vent_temperature", { ...base, ventC: 6 })).toBe(false);
    expect(available("vent_temperature", base)).toBe(true);
    expect(available("running_pressures", { ...base, highKpaGauge: 1200 })).toBe(true);
    expect(available("running_pressures", { ...base, lowKpaGauge: 200 })).toBe(true);
    expect(available("running_pressures", { ...base, highKpaGauge: 1200, lowKpaGauge: 200 })).toBe(false);
    expect(available("liquid_line_temperature", { ...base, liquidLineC: 40 })).toBe(false);
    expect(available("suction_line_temperature", { ...base, suctionLineC: 8 })).toBe(false);
    expect(available("recover_and_weigh", base)).toBe(false);
    expect(available("recover_and_weigh", { ...base, labelChargeG: 600, recoveredChargeG: 500 })).toBe(false);
    expect(available("drain_compressor_oil", base)).toBe(false);
    expect(available("drain_compressor_oil", { ...base, recoveredChargeG: 500 })).toBe(true);
    expect(
      available("drain_compressor_oil", {
        ...base,
        recoveredChargeG: 500,
        symptoms: ["oil_normal_at_drain"],
      }),
    ).toBe(false);
  });

  it("asks a yes-or-no check only until either answer is in", () => {
    const pairs: [CheckId, SymptomId, SymptomId][] = [
      ["look_for_sealant", "sealant_found", "no_sealant_found"],
      ["condenser_fan", "condenser_fan_running", "condenser_fan_not_running"],
      ["condenser_water_spray", "water_spray_drops_head_pressure", "water_spray_no_change"],
      ["watch_low_side", "low_side_swings_to_vacuum", "low_side_steady"],
      ["liquid_line_survey", "liquid_line_temperature_drop", "liquid_line_even_temperature"],
      ["leak_test", "leak_found", "no_leak_found"],
      ["txv_bulb_test", "txv_bulb_test_responds", "txv_bulb_test_no_response"],
    ];
    const valve = { ...base, expansionDevice: "txv" } as const;
    for (const [id, yes, no] of pairs) {
      expect(available(id, valve), id).toBe(true);
      expect(available(id, { ...valve, symptoms: [yes] }), `${id} ${yes}`).toBe(false);
      expect(available(id, { ...valve, symptoms: [no] }), `${id} ${no}`).toBe(false);
      const outcomes = check(id).outcomes(ctxOf(valve));
      expect(outcomes, id).toEqual([[`symptom:${yes}`], [`symptom:${no}`]]);
    }
  });

  it("drains the compressor's oil once the charge is out, until it is found short or normal", () => {
    const recoveredInput = { ...base, recoveredChargeG: 500 };
    for (const answer of ["oil_short_at_drain", "oil_normal_at_drain"] as const)
      expect(available("drain_compressor_oil", { ...recoveredInput, symptoms: [answer] }), answer).toBe(
        false,
      );
    expect(check("drain_compressor_oil").outcomes(ctxOf(recoveredInput))).toEqual([
      ["symptom:oil_short_at_drain"],
      ["symptom:oil_normal_at_drain"],
    ]);
  });

  it("offers the valve's bulb test only on a valve system and the cut points only on a cycling clutch", () => {
    expect(available("txv_bulb_test", base)).toBe(false);
    expect(available("cycling_points", base)).toBe(false);
    const clutch = { ...base, compressorType: "cycling_clutch" } as const;
    expect(available("cycling_points", clutch)).toBe(true);
    expect(available("cycling_points", { ...clutch, lowCutOutKpaGauge: 150 })).toBe(true);
    expect(available("cycling_points", { ...clutch, lowCutInKpaGauge: 300 })).toBe(true);
    expect(available("cycling_points", { ...clutch, lowCutOutKpaGauge: 150, lowCutInKpaGauge: 300 })).toBe(
      false,
    );
  });

  it("offers no subcooling on a transcritical R-744 high side (Span & Wagner 1996)", () => {
    const co2 = { refrigerant: "R-744", expansionDevice: "txv", ambientC: 35, highKpaGauge: 9500 } as const;
    expect(available("liquid_line_temperature", co2)).toBe(false);
    expect(available("liquid_line_temperature", { ...co2, highKpaGauge: 5000 })).toBe(true);
  });
});

describe("what each check can come back with", () => {
  const outcomes = (id: CheckId, input: DiagnosisInput) =>
    check(id)
      .outcomes(ctxOf(input))
      .map((o) => o.join("+"));
  const condensing50 = saturationPressure("R-134a", 50) - SEA_LEVEL_KPA;

  it("rules out an empty static and an empty recovery once a running high side proves liquid", () => {
    const proven = { ...base, highKpaGauge: condensing50, labelChargeG: 600 };
    expect(liquidProven(ctxOf(proven))).toBe(true);
    expect(outcomes("static_pressure", proven)).not.toContain("static:empty");
    expect(outcomes("static_pressure", proven)).not.toContain("static:no_liquid");
    expect(outcomes("static_pressure", proven)).toContain("static:normal");
    expect(outcomes("static_pressure", base)).toContain("static:empty");
    expect(outcomes("recover_and_weigh", proven)).not.toContain("charge:empty");
    expect(outcomes("recover_and_weigh", { ...base, labelChargeG: 600 })).toContain("charge:empty");
    // A high side that condenses at the air temperature or below proves nothing.
    const flat = { ...base, highKpaGauge: saturationPressure("R-134a", base.ambientC) - SEA_LEVEL_KPA };
    expect(liquidProven(ctxOf(flat))).toBe(false);
    expect(liquidProven(ctxOf(base))).toBe(false);
  });

  it("rules out an empty recovery once the static showed liquid", () => {
    const withLiquid = {
      ...base,
      labelChargeG: 600,
      staticKpaGauge: saturationPressure("R-134a", 30) - SEA_LEVEL_KPA,
    };
    expect(outcomes("recover_and_weigh", withLiquid)).not.toContain("charge:empty");
    const empty = { ...base, labelChargeG: 600, staticKpaGauge: 10 };
    expect(outcomes("recover_and_weigh", empty)).toContain("charge:empty");
    // 10 K below saturation at the soak temperature, yet above the empty line: no liquid is left, so the
    // recovery may still come back empty.
    const noLiquid = {
      ...base,
      labelChargeG: 600,
      staticKpaGauge: saturationPressure("R-134a", 20) - SEA_LEVEL_KPA,
    };
    expect(extractEvidence(noLiquid).observations.map((o) => o.id)).toContain("static:no_liquid");
    expect(outcomes("recover_and_weigh", noLiquid)).toContain("charge:empty");
  });

  it("asks only for the side still missing, both sides together otherwise", () => {
    expect(outcomes("running_pressures", { ...base, lowKpaGauge: 200 })).toEqual([
      "high_side:very_low",
      "high_side:low",
      "high_side:normal",
      "high_side:high",
      "high_side:very_high",
    ]);
    expect(outcomes("running_pressures", { ...base, highKpaGauge: 1200 })).toHaveLength(5);
    expect(outcomes("running_pressures", { ...base, highKpaGauge: 1200 })[0]).toBe("low_side:vacuum");
    const both = outcomes("running_pressures", base);
    expect(both).toHaveLength(25);
    expect(both).toContain("high_side:high+low_side:high");
  });

  it("leaves near-zero superheat out of an orifice-tube system's results: its evaporator floods by design", () => {
    expect(outcomes("suction_line_temperature", base)).toEqual([
      "superheat:normal",
      "superheat:high",
      "superheat:very_high",
    ]);
    expect(outcomes("suction_line_temperature", { ...base, expansionDevice: "txv" })).toContain(
      "superheat:near_zero",
    );
    expect(outcomes("identify_refrigerant", base)).toEqual([
      "purity:fail",
      "purity:pass+air:none",
      "purity:pass+air:some",
      "purity:pass+air:high",
    ]);
    expect(outcomes("vent_temperature", base)).toEqual([
      "vent:freezing",
      "vent:cold",
      "vent:cool",
      "vent:warm",
    ]);
    expect(outcomes("cycling_points", base)).toHaveLength(4);
    expect(outcomes("liquid_line_temperature", base)).toHaveLength(5);
  });
});

describe("choosing the next check, rule by rule", () => {
  it("deals with a failed identification or found sealant before anything else", () => {
    const failed = chooseNextCheck(
      ctxOf(base, { refrigerantContaminated: true }),
      ranking(["overcharge", 0.5]),
      idle,
    );
    expect(failed).toMatchObject({
      check: "confirm",
      separates: ["contaminated_refrigerant"],
      runsSystem: false,
      expectedGainNats: 0,
    });
    expect(failed.reason).toBe(
      "The refrigerant failed identification: deal with it before any further test.",
    );
    expect(failed.instruction).toMatch(/SAE J2851/);
    const sealant = chooseNextCheck(
      ctxOf({ ...base, symptoms: ["sealant_found"] }),
      ranking(["overcharge", 0.5]),
      idle,
    );
    expect(sealant.reason).toBe("Sealant was found: deal with it before any further test.");
  });

  it("refuses an empty ranking", () => {
    expect(() => chooseNextCheck(ctxOf(base), [], idle)).toThrow(/at least one suspect/);
  });

  it("asks an electric compressor without a static for one, engine off", () => {
    const input = { ...base, compressorType: "electric" } as const;
    const next = chooseNextCheck(ctxOf(input), ranking(["undercharge", 0.4]), doNotRunState(input));
    expect(next.check).toBe("static_pressure");
    expect(next.runsSystem).toBe(false);
    expect(next.reason).toMatch(
      /^Do not run the system: .*\. A static reading with liquid shows it has a charge\.$/,
    );
    expect(next.separates).toEqual(["undercharge"]);
  });

  it("sends a static that is low only against the air to a repeat once the parts have warmed", () => {
    // Parts soaked to 20 °C in a 30 °C shop, static at saturation for 20 °C: 10 K low against the air only.
    const input = {
      ...base,
      staticSoakC: 20,
      staticSoakMin: 90,
      staticKpaGauge: saturationPressure("R-134a", 20) - SEA_LEVEL_KPA,
    };
    const state = doNotRunState(input);
    expect(state.reasons).toEqual(["no_liquid"]);
    const next = chooseNextCheck(ctxOf(input), ranking(["undercharge", 0.6]), state);
    expect(next.check).toBe("static_repeat");
    expect(next.instruction).toMatch(/^Leave the engine off and let the parts warm/);
    expect(next.reason).toMatch(/low only against the air temperature/);
    expect(next.runsSystem).toBe(false);
    // Low against the parts as well: the repair path, never a repeat.
    const low = { ...input, staticKpaGauge: saturationPressure("R-134a", 10) - SEA_LEVEL_KPA };
    expect(chooseNextCheck(ctxOf(low), ranking(["undercharge", 0.6]), doNotRunState(low)).check).toBe(
      "repair_path",
    );
    // A recovered charge is not waiting for warm parts.
    const recovered = { ...input, recoveredChargeG: 200 };
    expect(
      chooseNextCheck(ctxOf(recovered), ranking(["undercharge", 0.6]), doNotRunState(recovered)).check,
    ).toBe("repair_path");
  });

  it("repeats a high static after a short soak before recovering, unless the identifier measured the air", () => {
    const input = {
      ...hosed,
      identifierAirPct: undefined,
      staticSoakMin: 20,
      staticKpaGauge: saturationPressure("R-134a", 36) - SEA_LEVEL_KPA,
    };
    const pair = ranking(["overcharge", 0.45], ["non_condensables", 0.4]);
    const next = chooseNextCheck(ctxOf(input), pair, idle);
    expect(next.check).toBe("static_repeat");
    expect(next.instruction).toMatch(/^Before recovering anything, let the system soak longer/);
    expect(next.separates).toEqual(["overcharge", "non_condensables"]);
    expect(chooseNextCheck(ctxOf({ ...input, identifierAirPct: 0.5 }), pair, idle).check).not.toBe(
      "static_repeat",
    );
    expect(
      chooseNextCheck(ctxOf({ ...input, staticSoakC: 30, staticSoakMin: 90 }), pair, idle).check,
    ).not.toBe("static_repeat");
    expect(
      chooseNextCheck(ctxOf(input), ranking(["overcharge", 0.45], ["undercharge", 0.4]), idle).check,
    ).not.toBe("static_repeat");
  });

  it("weighs the charge before condemning a compressor", () => {
    const input = { ...hosed, labelChargeG: 600 };
    const next = chooseNextCheck(
      ctxOf(input),
      ranking(["weak_compressor", 0.9], ["undercharge", 0.05]),
      idle,
    );
    expect(next.check).toBe("recover_and_weigh");
    expect(next.reason).toBe("Confirm the charge by weight before condemning the compressor.");
    expect(next.separates).toEqual(["weak_compressor", "undercharge"]);
  });

  it("confirms a leader from 80 % of the likelihood, says its share, and runs the system only where the step does", () => {
    const clear = chooseNextCheck(
      ctxOf(hosed),
      ranking(["overcharge", NEXT_CHECK.leaderClearShare], ["undercharge", 0.1]),
      idle,
    );
    expect(clear.check).toBe("confirm");
    expect(clear.reason).toBe("Overcharge is clear, with 80 % of the likelihood: confirm it and repair.");
    expect(clear.runsSystem).toBe(false);
    expect(clear.separates).toEqual(["overcharge"]);
    const airflow = chooseNextCheck(ctxOf(hosed), ranking(["condenser_airflow", 0.85]), idle);
    expect(airflow.runsSystem).toBe(true);
    expect(airflow.reason).toMatch(/^Poor condenser airflow is clear, with 85 %/);
    const justShort = chooseNextCheck(
      ctxOf(hosed),
      ranking(["overcharge", NEXT_CHECK.leaderClearShare - 0.01], ["undercharge", 0.19]),
      idle,
    );
    expect(justShort.check).not.toBe("confirm");
  });

  it("looks for sealant, then identifies the refrigerant, before the first hose goes on", () => {
    const first = chooseNextCheck(ctxOf(base), ranking(["overcharge", 0.9]), idle);
    expect(first.check).toBe("look_for_sealant");
    expect(first.reason).toBe(
      "Look for sealant before any hose goes on: it ruins gauges and recovery equipment.",
    );
    const noSealant: DiagnosisInput = { ...base, symptoms: ["no_sealant_found"] };
    const second = chooseNextCheck(ctxOf(noSealant), ranking(["overcharge", 0.9]), idle);
    expect(second.check).toBe("identify_refrigerant");
    expect(second.reason).toMatch(/^Identify the refrigerant before gauges or a machine go on/);
    // A confirming step that needs no hose goes ahead.
    expect(chooseNextCheck(ctxOf(base), ranking(["condenser_airflow", 0.9]), idle).check).toBe("confirm");
    // Once a hose reading is in, the order no longer applies.
    expect(
      chooseNextCheck(ctxOf({ ...base, highKpaGauge: 1200 }), ranking(["overcharge", 0.9]), idle).check,
    ).toBe("confirm");
  });

  it("settles a close call between overcharge and air with the static check or the identifier", () => {
    const input: DiagnosisInput = {
      ...base,
      identifierPurityPct: 99.5,
      symptoms: ["no_sealant_found"],
      highKpaGauge: 1900,
    };
    const close = (gapLogOdds: number, ...order: CauseId[]) =>
      chooseNextCheck(ctxOf(input, { gapLogOdds }), ranking([order[0]!, 0.45], [order[1]!, 0.4]), idle);
    const next = close(NEXT_CHECK.closePairLogOdds - 0.01, "overcharge", "non_condensables");
    expect(next.check).toBe("static_pressure");
    expect(next.reason).toBe(
      "Overcharge and air look alike on the gauges; the static check tells them apart.",
    );
    expect(close(0.5, "non_condensables", "overcharge").check).toBe("static_pressure");
    const withStatic = { ...input, identifierPurityPct: undefined, staticKpaGauge: 700 } as const;
    const identifier = chooseNextCheck(
      ctxOf(withStatic, { gapLogOdds: 0.5 }),
      ranking(["overcharge", 0.45], ["non_condensables", 0.4]),
      idle,
    );
    expect(identifier.check).toBe("identify_refrigerant");
    expect(identifier.reason).toBe(
      "Overcharge and air look alike on the gauges; the identifier tells them apart.",
    );
  });

  it("otherwise takes the check that tells the most, and says what it separates", () => {
    const input = { ...hosed, highKpaGauge: 1900, lowKpaGauge: 300 } as const;
    const two = chooseNextCheck(ctxOf(input), ranking(["overcharge", 0.5], ["condenser_airflow", 0.5]), idle);
    expect(two.reason).toBe("Best separates overcharge from poor condenser airflow.");
    expect(two.expectedGainNats).toBeGreaterThan(NEXT_CHECK.minUsefulGainNats);
    const one = chooseNextCheck(ctxOf(input), ranking(["overcharge", 0.5]), idle);
    expect(one.reason).toBe("Tells the most about overcharge.");
  });

  it("confirms the leader directly when no check is left that tells anything", () => {
    const everything = {
      ...hosed,
      highKpaGauge: 1200,
      lowKpaGauge: 250,
      staticKpaGauge: 700,
      ventC: 6,
      liquidLineC: 40,
      suctionLineC: 8,
      labelChargeG: 600,
      recoveredChargeG: 600,
      symptoms: [
        "no_sealant_found",
        "condenser_fan_running",
        "water_spray_no_change",
        "low_side_steady",
        "liquid_line_even_temperature",
        "no_leak_found",
        "oil_normal_at_drain",
      ],
    } satisfies DiagnosisInput;
    const next = chooseNextCheck(
      ctxOf(everything),
      ranking(["no_refrigerant_fault", 0.5], ["moisture", 0.3]),
      idle,
    );
    expect(next.check).toBe("confirm");
    expect(next.reason).toBe(
      "No remaining check separates the leading suspects; confirm no refrigerant-circuit fault directly.",
    );
    expect(next.runsSystem).toBe(true);
  });
});

describe("choosing the next check: what each rule leaves to the others", () => {
  it("recovers and weighs an overcharge before recharging, the leak comes first only for an undercharge", () => {
    const step = confirmingStep("overcharge", ctxOf(base));
    expect(step).toMatch(/^Recover the charge, weigh it against the label/);
    expect(step).not.toMatch(/leak/);
  });

  it("names only the cause it confirms, and a single suspect alone", () => {
    const input = { ...hosed, highKpaGauge: 1900, lowKpaGauge: 300 } as const;
    expect(chooseNextCheck(ctxOf(input), ranking(["overcharge", 0.5]), idle).separates).toEqual([
      "overcharge",
    ]);
    // the sealant and identifier rules keep the suspect they were asked about
    expect(chooseNextCheck(ctxOf(base), ranking(["overcharge", 0.9]), idle).separates).toEqual([
      "overcharge",
    ]);
    const everything = {
      ...hosed,
      highKpaGauge: 1200,
      lowKpaGauge: 250,
      staticKpaGauge: 700,
      ventC: 6,
      liquidLineC: 40,
      suctionLineC: 8,
      labelChargeG: 600,
      recoveredChargeG: 600,
      symptoms: [
        "no_sealant_found",
        "condenser_fan_running",
        "water_spray_no_change",
        "low_side_steady",
        "liquid_line_even_temperature",
        "no_leak_found",
        "oil_normal_at_drain",
      ],
    } satisfies DiagnosisInput;
    expect(
      chooseNextCheck(ctxOf(everything), ranking(["no_refrigerant_fault", 0.5], ["moisture", 0.3]), idle)
        .separates,
    ).toEqual(["no_refrigerant_fault"]);
  });

  it("keeps to the repair path in the do-not-run state unless a static alone can lift it", () => {
    // An electric compressor with no static and a leak found with bubbles in the sight glass: a static
    // with liquid would not lift the leak, so no static is asked for.
    const leaking = {
      ...base,
      compressorType: "electric",
      symptoms: ["leak_found", "bubbles_in_sight_glass"],
    } satisfies DiagnosisInput;
    const state = doNotRunState(leaking);
    expect(state.reasons).toEqual(["leak_with_short_charge", "electric_static_unknown"]);
    const next = chooseNextCheck(ctxOf(leaking), ranking(["undercharge", 0.6]), state);
    expect(next.check).toBe("repair_path");
    expect(next.runsSystem).toBe(false);
    expect(next.separates).toEqual(["undercharge"]);
  });

  it("repeats an electric compressor's static that is low only against the air, and says which suspect", () => {
    // Parts soaked to 28 °C in a 30 °C shop, static at saturation for 27 °C: 3 K low against the air
    // (over the 2 K an electric compressor allows), 1 K against the parts.
    const input = {
      ...base,
      compressorType: "electric",
      staticSoakC: 28,
      staticSoakMin: 90,
      staticKpaGauge: saturationPressure("R-134a", 27) - SEA_LEVEL_KPA,
    } satisfies DiagnosisInput;
    const state = doNotRunState(input);
    expect(state.reasons).toEqual(["electric_static_low"]);
    const next = chooseNextCheck(ctxOf(input), ranking(["undercharge", 0.6]), state);
    expect(next.check).toBe("static_repeat");
    expect(next.separates).toEqual(["undercharge"]);
    const low = { ...input, staticKpaGauge: saturationPressure("R-134a", 10) - SEA_LEVEL_KPA };
    const repair = chooseNextCheck(ctxOf(low), ranking(["undercharge", 0.6]), doNotRunState(low));
    expect(repair.check).toBe("repair_path");
    expect(repair.separates).toEqual(["undercharge"]);
  });

  it("repeats any static above saturation on a short soak, from slightly high to very high", () => {
    const pair = ranking(["overcharge", 0.45], ["non_condensables", 0.4]);
    // 3 K, 6 K and 10 K over saturation at the 30 °C air the soak is judged against
    for (const [overK, grade] of [
      [3, "static:slightly_high"],
      [6, "static:high"],
      [10, "static:very_high"],
    ] as const) {
      const input = {
        ...hosed,
        identifierAirPct: undefined,
        staticSoakMin: 20,
        staticKpaGauge: saturationPressure("R-134a", 30 + overK) - SEA_LEVEL_KPA,
      };
      expect(extractEvidence(input).observations.map((o) => o.id)).toContain(grade);
      const next = chooseNextCheck(ctxOf(input), pair, idle);
      expect(next.check, grade).toBe("static_repeat");
      expect(next.reason, grade).toBe(
        "The static pressure sits above saturation, but after a short or unmeasured soak: repeat it before condemning the charge.",
      );
    }
  });

  it("weighs the charge first only when the compressor leads", () => {
    const input = { ...hosed, labelChargeG: 600 };
    const next = chooseNextCheck(ctxOf(input), ranking(["overcharge", 0.9], ["undercharge", 0.05]), idle);
    expect(next.check).toBe("confirm");
    expect(next.reason).toMatch(/^Overcharge is clear/);
  });

  it("settles only overcharge against air by the close-call rule, in either order, below its gap", () => {
    const input: DiagnosisInput = {
      ...base,
      identifierPurityPct: 99.5,
      symptoms: ["no_sealant_found"],
      highKpaGauge: 1900,
    };
    const closeRule = /look alike on the gauges/;
    const reasonFor = (gapLogOdds: number, first: CauseId, second: CauseId) =>
      chooseNextCheck(ctxOf(input, { gapLogOdds }), ranking([first, 0.45], [second, 0.4]), idle).reason;
    expect(reasonFor(0.5, "non_condensables", "overcharge")).toMatch(closeRule);
    expect(reasonFor(0.5, "overcharge", "non_condensables")).toMatch(closeRule);
    expect(reasonFor(0.5, "overcharge", "undercharge")).not.toMatch(closeRule);
    expect(reasonFor(0.5, "non_condensables", "undercharge")).not.toMatch(closeRule);
    expect(reasonFor(0.5, "undercharge", "overcharge")).not.toMatch(closeRule);
    expect(reasonFor(0.5, "condenser_airflow", "non_condensables")).not.toMatch(closeRule);
    // at the gap itself the two are no longer close
    expect(reasonFor(NEXT_CHECK.closePairLogOdds, "overcharge", "non_condensables")).not.toMatch(closeRule);
    expect(
      chooseNextCheck(ctxOf(input, { gapLogOdds: 0.5 }), ranking(["overcharge", 0.45]), idle).reason,
    ).not.toMatch(closeRule);
    // with the static and the identifier both in, the check that tells the most decides
    const both = { ...input, staticKpaGauge: 700 };
    const next = chooseNextCheck(
      ctxOf(both, { gapLogOdds: 0.5 }),
      ranking(["overcharge", 0.45], ["non_condensables", 0.4]),
      idle,
    );
    expect(next.reason).toBe("Best separates overcharge from air in the system.");
  });

  it("keeps the close-call rule's own reason when the identifier it picks is also the first hose", () => {
    const input: DiagnosisInput = { ...base, symptoms: ["no_sealant_found"] };
    const next = chooseNextCheck(
      ctxOf(input, { gapLogOdds: 0.5 }),
      ranking(["overcharge", 0.45], ["non_condensables", 0.4]),
      idle,
    );
    expect(next.check).toBe("identify_refrigerant");
    expect(next.reason).toBe("Overcharge and air look alike on the gauges; the identifier tells them apart.");
  });
});
