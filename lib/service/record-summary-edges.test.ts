import { sayInUnits } from "@/lib/units/quantity";
import { describe, expect, it } from "vitest";
import { sayServiceRecordSummary, summariseServiceRecord } from "./record-summary";

// The service record's summary while the technician is halfway through: each result appears only once
// every figure it needs is typed (a half-typed number is no figure), and none of them turns into a
// problem line before then.
const base = { refrigerant: "R-134a" } as const;

describe("summariseServiceRecord: a result only once its figures are in", () => {
  it("takes a half-typed number (not a number) as not typed yet", () => {
    const s = summariseServiceRecord({ ...base, labelChargeG: 600, recoveredChargeG: Number.NaN });
    expect(s.recovered).toBeNull();
    expect(s.problems).toEqual([]);
  });

  it("compares the recovered mass only with a label above 0, and says nothing for a recovered mass alone", () => {
    expect(summariseServiceRecord({ ...base, recoveredChargeG: 500 })).toMatchObject({
      recovered: null,
      problems: [],
    });
    const zero = summariseServiceRecord({ ...base, labelChargeG: 0, recoveredChargeG: 500 });
    expect(zero.recovered).toBeNull();
    // the label of 0 is refused once, by the target it would give
    expect(zero.problems).toEqual(["labelChargeG must be a positive mass in grams, got 0"]);
  });

  it("warns when the add-back passes the spec's total oil", () => {
    const s = summariseServiceRecord({ ...base, oilRemovedMl: 60, specTotalOilMl: 50 });
    expect(s.addBack?.warnings.some((w) => w.includes("more than the system's total oil"))).toBe(true);
  });

  it("compares the oil added only with an add-back, and calls within 5 mL a match (common practice)", () => {
    const alone = summariseServiceRecord({ ...base, oilAddedMl: 50 });
    expect(alone.oilAddedSentence).toBeNull();
    const said = (oilAddedMl: number) =>
      sayInUnits(summariseServiceRecord({ ...base, oilRemovedMl: 40, oilAddedMl }).oilAddedSentence ?? "");
    expect(said(45)).toBe("Added 45 mL: matches the 40 mL the record asks for.");
    expect(said(35)).toBe("Added 35 mL: matches the 40 mL the record asks for.");
    expect(said(34)).toBe("Added 34 mL against 40 mL asked for: 6 mL short.");
    expect(said(46)).toBe("Added 46 mL against 40 mL asked for: 6 mL too much.");
  });

  it("checks the oil added against the compressor and the spec, and a blank oil type not at all", () => {
    const oil = (oilAddedType: string, specOilType?: string, compressorDrive?: "electric") =>
      summariseServiceRecord({ ...base, oilAddedType, specOilType }, { compressorDrive }).oilWarnings.map(
        (w) => w.id,
      );
    expect(oil("PAG 46")).toEqual([]);
    expect(oil("PAG 46", undefined, "electric")).toEqual(["pag_in_electric"]);
    expect(oil("PAG 46", "POE")).toEqual(["differs_from_spec"]);
    expect(oil("   ", undefined, "electric")).toEqual([]);
  });

  it("charges against a typed target above 0, else the label, and checks nothing until the charge is in", () => {
    const label = { ...base, labelChargeG: 600 };
    expect(summariseServiceRecord({ ...label, chargedG: 600 }).charge?.within).toBe(true);
    expect(summariseServiceRecord({ ...label, targetG: 0, chargedG: 600 }).charge?.within).toBe(true);
    expect(summariseServiceRecord({ ...label, targetG: 0, chargedG: 600 }).problems).toEqual([]);
    expect(summariseServiceRecord({ ...label, targetG: 640, chargedG: 600 }).charge?.within).toBe(false);
    expect(summariseServiceRecord(label)).toMatchObject({ charge: null, problems: [] });
  });

  it("judges the deepest vacuum at the shop's altitude, and a hold only with start, end and minutes", () => {
    expect(summariseServiceRecord({ ...base, deepestKpaAbs: 2 }, { altitudeM: 0 }).evacuation?.reached).toBe(
      true,
    );
    expect(summariseServiceRecord({ ...base, holdStartKpaAbs: 3, holdEndKpaAbs: 4 })).toMatchObject({
      hold: null,
      problems: [],
    });
    expect(summariseServiceRecord({ ...base, holdStartKpaAbs: 3, holdMinutes: 5 })).toMatchObject({
      hold: null,
      problems: [],
    });
    expect(summariseServiceRecord({ ...base, holdEndKpaAbs: 4, holdMinutes: 5 })).toMatchObject({
      hold: null,
      problems: [],
    });
  });
});

describe("sayServiceRecordSummary: every line said, empty results left empty", () => {
  it("says the add-back's warnings and the evacuation's messages, and leaves them null when absent", () => {
    const s = summariseServiceRecord({ ...base, oilRemovedMl: 60, specTotalOilMl: 50, deepestKpaAbs: 2 });
    const said = sayServiceRecordSummary(s, (t) => `«${t}»`);
    expect(said.addBack?.warnings.every((w) => w.startsWith("«"))).toBe(true);
    expect(said.addBack?.totalMl).toBe(60);
    expect(said.evacuation?.messages.every((m) => m.startsWith("«"))).toBe(true);
    expect(said.evacuation?.reached).toBe(true);
    const empty = sayServiceRecordSummary(summariseServiceRecord(base), (t) => t);
    expect(empty.addBack).toBeNull();
    expect(empty.evacuation).toBeNull();
  });
});
