import { describe, expect, it } from "vitest";
import { sayInUnits } from "@/lib/units/quantity";
import { unitsOfSystem } from "@/lib/units/reader";
import { sayServiceRecordSummary, summariseServiceRecord } from "./record-summary";

// 1 inHg = 3.386389 kPa (NIST SP 811, App. B).
const KPA_PER_INHG = 3.386389;

describe("summariseServiceRecord", () => {
  it("reports a recovered mass a quarter over the label as an overcharge of that size (SAE J2788 95 % recovery; ±15 g accuracy, from memory)", () => {
    const s = summariseServiceRecord({ refrigerant: "R-134a", labelChargeG: 800, recoveredChargeG: 1000 });
    expect(s.recovered?.verdict).toBe("over");
    expect(s.recovered?.deltaG).toBe(1000 - 800);
    expect(s.recovered?.deltaPct).toBeCloseTo(((1000 - 800) / 800) * 100, 6);
    expect(s.recovered?.sentence).toMatch(/overcharge/);
  });

  it("asks to add back the oil the recovery machine drained (US Army TM 5-3810-307-24-1-2 ch. 9)", () => {
    const drainedMl = 45;
    const s = summariseServiceRecord({ refrigerant: "R-134a", oilRemovedMl: drainedMl });
    expect(s.addBack?.totalMl).toBe(drainedMl);
    expect(s.addBack?.complete).toBe(true);
  });

  it("adds the shop's own allowance for a replaced part (common practice; shop-edited figure)", () => {
    const s = summariseServiceRecord(
      { refrigerant: "R-134a", oilRemovedMl: 20, partsReplaced: [{ part: "receiver_drier" }] },
      { allowancesMl: { receiver_drier: 25 } },
    );
    expect(s.addBack?.totalMl).toBe(20 + 25);
  });

  it("estimates the oil pulled out with liquid (common practice: about 4 % oil in circulating refrigerant) but asks for the measured amount", () => {
    const recoveredChargeG = 1500;
    const s = summariseServiceRecord({
      refrigerant: "R-134a",
      recoveredChargeG,
      oilPulled: true,
      oilRemovedMl: 20,
    });
    const expectedMl = (recoveredChargeG * 0.04) / 0.99; // PAG about 0.99 g/mL, from memory
    expect(s.pulledOil?.oilMl).toBeCloseTo(expectedMl, 6);
    expect(s.pulledOil?.sumpComparison).toBe("about_a_sump"); // 60–90 mL sump, common practice
    expect(s.addBack?.totalMl).toBe(20);
    expect(s.addBack?.warnings.join(" ")).toContain("far less");
    expect(
      summariseServiceRecord({ refrigerant: "R-134a", recoveredChargeG, oilPulled: false, oilRemovedMl: 20 })
        .pulledOil,
    ).toBeNull();
  });

  it("flags a charge 20 g off target as outside and 10 g off as inside the ½ oz SAE J2843 accuracy (from memory)", () => {
    const off20 = summariseServiceRecord({ refrigerant: "R-1234yf", targetG: 650, chargedG: 670 });
    const off10 = summariseServiceRecord({ refrigerant: "R-1234yf", targetG: 650, chargedG: 640 });
    expect(off20.charge?.within).toBe(false);
    expect(off10.charge?.within).toBe(true);
    expect(off20.charge?.source).toMatch(/J2843/);
  });

  it("takes the label as the target when none is typed, and the R-134a accuracy is marked from memory (SAE J2788)", () => {
    const s = summariseServiceRecord({ refrigerant: "R-134a", labelChargeG: 700, chargedG: 705 });
    expect(s.target?.targetG).toBe(700);
    expect(s.charge?.within).toBe(true);
    expect(s.charge?.source).toMatch(/from memory/);
  });

  it("fails a vacuum hold that loses more than 2 inHg in 5 minutes and passes one that loses 1 (US Army TM 5-2420-230-24-1 field practice)", () => {
    const startKpaAbs = 2.5;
    const fail = summariseServiceRecord({
      refrigerant: "R-134a",
      holdStartKpaAbs: startKpaAbs,
      holdEndKpaAbs: startKpaAbs + 2.5 * KPA_PER_INHG,
      holdMinutes: 5,
    });
    const pass = summariseServiceRecord({
      refrigerant: "R-134a",
      holdStartKpaAbs: startKpaAbs,
      holdEndKpaAbs: startKpaAbs + 1 * KPA_PER_INHG,
      holdMinutes: 5,
    });
    expect(fail.hold?.verdict).toBe("fail");
    expect(pass.hold?.verdict).toBe("pass");
  });

  it("compares the oil added with what the record asks for", () => {
    const s = summariseServiceRecord({ refrigerant: "R-134a", oilRemovedMl: 40, oilAddedMl: 70 });
    expect(s.oilAddedDeltaMl).toBe(30);
    expect(s.oilAddedSentence).toMatch(/too much/);
  });

  it("turns an impossible value into a problem line instead of throwing", () => {
    const s = summariseServiceRecord({
      refrigerant: "R-134a",
      oilRemovedMl: -5,
      holdStartKpaAbs: 3,
      holdEndKpaAbs: 4,
      holdMinutes: 0,
    });
    expect(s.addBack).toBeNull();
    expect(s.hold).toBeNull();
    expect(s.problems.length).toBe(2);
  });

  it("leaves every result empty on an empty record", () => {
    const s = summariseServiceRecord({ refrigerant: "R-1234yf" });
    expect([s.recovered, s.addBack, s.charge, s.hold, s.evacuation, s.target]).toEqual([
      null,
      null,
      null,
      null,
      null,
      null,
    ]);
    expect(s.problems).toEqual([]);
  });
});

describe("sayServiceRecordSummary", () => {
  it("says every line of the record in an imperial reader's units, with no metric unit left (NIST SP 811 factors)", () => {
    const imperial = unitsOfSystem("imperial");
    const at = { altitudeM: 0 };
    const s = summariseServiceRecord(
      {
        refrigerant: "R-134a",
        labelChargeG: 800,
        specChargeG: 1000,
        recoveredChargeG: 1000,
        oilPulled: true,
        oilRemovedMl: 10,
        oilAddedMl: 60,
        deepestKpaAbs: 10,
        holdStartKpaAbs: 2,
        holdEndKpaAbs: 12,
        holdMinutes: 3,
        chargedG: 760,
      },
      { altitudeM: 0 },
    );
    const said = sayServiceRecordSummary(s, (text) => sayInUnits(text, imperial, at));
    const lines = [
      said.recovered?.sentence,
      said.pulledOil?.sentence,
      said.oilAddedSentence,
      said.charge?.sentence,
      said.hold?.message,
      ...(said.evacuation?.messages ?? []),
      ...(said.hold?.warnings ?? []),
      ...(said.addBack?.warnings ?? []),
      ...(said.target?.warnings ?? []),
    ];
    expect(lines.every((l) => typeof l === "string" && l.length > 0)).toBe(true);
    const text = lines.join(" ");
    expect(text).not.toMatch(/\{\{|kPa|°C|\d g\b|mL/);
    // 1,000 g = 35.3 oz and 800 g = 28.2 oz; 10 kPa of rise = 2.95 inHg.
    expect(said.recovered?.sentence).toContain("Recovered 35.3 oz against a label charge of 28.2 oz");
    expect(said.hold?.message).toContain("2.95 inHg in 3 min");
    expect(said.target?.warnings[0]).toContain("28.2 oz but the spec table says 35.3 oz");
  });
});
