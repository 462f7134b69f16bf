import { describe, expect, it } from "vitest";
import type { InterviewAnswers } from "./answers";
import { cautionsFor } from "./cautions";
import { contaminatedAnswers, emptySystemAnswers, exampleAnswers } from "./example-answers";

const ids = (answers: InterviewAnswers, options?: Parameters<typeof cautionsFor>[1]) =>
  cautionsFor(answers, options).map((c) => c.id);
const withSystem = (system: Partial<NonNullable<InterviewAnswers["system"]>>): InterviewAnswers => ({
  ...exampleAnswers,
  system: { ...exampleAnswers.system, ...system },
});

describe("cautionsFor", () => {
  it("always opens with eye and skin protection and closes by deferring to local rules and the maker", () => {
    const list = ids({});
    expect(list[0]).toBe("eye_and_skin");
    expect(list.at(-1)).toBe("defer_to_procedure");
  });

  it("gives every caution a level, plain text and the basis it rests on", () => {
    for (const caution of cautionsFor({
      ...contaminatedAnswers,
      system: { ...contaminatedAnswers.system, compressorType: "electric" },
    })) {
      expect(caution.text.length).toBeGreaterThan(20);
      expect(caution.source.length).toBeGreaterThan(5);
      expect(["danger", "warning", "notice"]).toContain(caution.level);
    }
  });

  it("adds the flammability caution for R-1234yf only (ASHRAE 34 class A2L)", () => {
    expect(ids(withSystem({ refrigerant: "R-1234yf" }))).toContain("flammable_r1234yf");
    expect(ids(withSystem({ refrigerant: "R-134a" }))).not.toContain("flammable_r1234yf");
  });

  it("adds the high-pressure caution for R-744 and leaves out the HFC venting ban", () => {
    const co2 = ids(withSystem({ refrigerant: "R-744" }));
    expect(co2).toContain("r744_pressure");
    expect(co2).not.toContain("never_vent");
    expect(ids(withSystem({ refrigerant: "R-134a" }))).toContain("never_vent");
  });

  it("adds high-voltage and dielectric-oil cautions for an electric compressor only", () => {
    expect(ids(withSystem({ compressorType: "electric" }))).toEqual(
      expect.arrayContaining(["high_voltage_compressor", "dielectric_oil"]),
    );
    const belt = ids(withSystem({ compressorType: "variable_displacement" }));
    expect(belt).not.toContain("high_voltage_compressor");
    expect(belt).not.toContain("dielectric_oil");
  });

  it("reminds an orifice-tube system to recover slowly (common practice), not a TXV system", () => {
    expect(ids(withSystem({ expansionDevice: "orifice_tube" }))).toContain("recover_slowly_accumulator");
    expect(ids(withSystem({ expansionDevice: "txv" }))).not.toContain("recover_slowly_accumulator");
  });

  it("warns against running an empty system and against pressurising with air", () => {
    expect(ids(emptySystemAnswers)).toEqual(
      expect.arrayContaining(["empty_system", "repair_before_refill", "leak_test_gas"]),
    );
    expect(ids(exampleAnswers)).not.toContain("empty_system");
  });

  it("shows the engine-running caution on the running steps of a charged system only", () => {
    expect(ids(exampleAnswers, { step: "running" })).toContain("engine_running");
    expect(ids(exampleAnswers, { step: "identification" })).not.toContain("engine_running");
    expect(ids(emptySystemAnswers, { step: "running" })).not.toContain("engine_running");
  });

  it("keeps a charge under 98 % purity (SAE J2099) out of the shop's recovery machine", () => {
    expect(ids(contaminatedAnswers)).toContain("contaminated_do_not_recover");
    expect(ids(exampleAnswers)).not.toContain("contaminated_do_not_recover");
  });

  it("treats a hydrocarbon flag as flammable and contaminated", () => {
    const flagged: InterviewAnswers = {
      ...exampleAnswers,
      identification: { purityPct: 99, hydrocarbonFlagged: true },
    };
    expect(ids(flagged)).toEqual(
      expect.arrayContaining(["hydrocarbon_flammable", "contaminated_do_not_recover"]),
    );
  });

  it("asks for identification before recovery when the charge is being recovered unidentified", () => {
    const unidentified: InterviewAnswers = { ...exampleAnswers, identification: {} };
    expect(ids(unidentified)).toContain("identify_before_recovery");
    expect(ids({ ...unidentified, chargeAudit: { recovered: false } })).not.toContain(
      "identify_before_recovery",
    );
    expect(ids({ ...unidentified, chargeAudit: undefined }, { step: "chargeAudit" })).toContain(
      "identify_before_recovery",
    );
    expect(ids(exampleAnswers, { step: "chargeAudit" })).not.toContain("identify_before_recovery");
  });
});
