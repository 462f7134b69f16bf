import { sayInUnits } from "@/lib/units/quantity";
import { describe, expect, it } from "vitest";
import {
  chargeDeviationVerdict,
  chargeTolerance,
  chargeWithinTolerance,
  recoveredAgainstLabel,
  targetCharge,
} from "./charge";

// The edges of the charge rules: what each sentence says on each side of the verdict, and the inputs each
// function refuses (a mass must be a finite number of grams; the label and the target above zero).
describe("recoveredAgainstLabel: one sentence per verdict", () => {
  const said = (labelChargeG: number, recoveredChargeG: number) =>
    sayInUnits(recoveredAgainstLabel({ labelChargeG, recoveredChargeG }).sentence);

  it("says a shortfall past the slow-leak band is a short system, with the default 5 % allowance", () => {
    // 200 g short of 1,000 g: 20 %, past the 12 % slow-leak band (common practice)
    const r = recoveredAgainstLabel({ labelChargeG: 1000, recoveredChargeG: 800 });
    expect(r.grade).toBe("short");
    expect(r.verdict).toBe("under");
    expect(sayInUnits(r.sentence)).toBe(
      "Recovered 800 g against a label charge of 1,000 g: 200 g (20 %) under — more than recovery leaves behind (up to 5 %), so the system was short of refrigerant: find the leak before recharging.",
    );
    expect(said(1000, 940)).toBe(
      "Recovered 940 g against a label charge of 1,000 g: 60 g (6 %) under — more than recovery leaves behind (up to 5 %) but not by much: possibly a slow leak, so leak-test before recharging.",
    );
  });

  it("says exactly the label, and a small difference on its own side, as no evidence", () => {
    expect(said(600, 600)).toBe("Recovered 600 g against a label charge of 600 g: exactly the label charge.");
    expect(said(600, 610)).toBe(
      "Recovered 610 g against a label charge of 600 g: 10 g (1.7 %) over — within what recovery leaves behind and the machine's accuracy, so not evidence of a leak or an overcharge.",
    );
    expect(said(600, 580)).toBe(
      "Recovered 580 g against a label charge of 600 g: 20 g (3.3 %) under — within what recovery leaves behind and the machine's accuracy, so not evidence of a leak or an overcharge.",
    );
  });

  it("cites the recovery standards, the machine's accuracy for R-134a when no refrigerant is given, and labels the rest", () => {
    const r = recoveredAgainstLabel({ labelChargeG: 600, recoveredChargeG: 600 });
    expect(r.sources).toContain(chargeTolerance("R-134a").source);
    expect(r.sources).not.toContain(chargeTolerance("R-744").source);
    expect(r.sources.some((s) => /slow leak up to 12 % short: common practice/.test(s))).toBe(true);
    expect(r.sources.some((s) => /3 % margin .*: from memory/.test(s))).toBe(true);
  });

  it("says no standard covers the machine's accuracy for a refrigerant outside them", () => {
    expect(chargeTolerance("R-744").checked).toBe(false);
    const r = recoveredAgainstLabel({ labelChargeG: 600, recoveredChargeG: 600, refrigerant: "R-744" });
    expect(r.sources).toContain(chargeTolerance("R-744").source);
  });
});

describe("chargeDeviationVerdict: the inputs it refuses", () => {
  const verdict = (labelChargeG: number, recoveredChargeG: number, shortfallAllowancePct?: number) =>
    chargeDeviationVerdict({ labelChargeG, recoveredChargeG, shortfallAllowancePct });

  it("names the mass it refuses", () => {
    expect(() => verdict(0, 100)).toThrow("labelChargeG must be a positive mass in grams, got 0");
    expect(() => verdict(500, -1)).toThrow("recoveredChargeG must be a non-negative mass in grams, got -1");
    expect(verdict(500, 0).grade).toBe("empty");
  });

  it("takes a shortfall allowance from 0 up to, not including, 100 %", () => {
    expect(verdict(1000, 1000, 0).grade).toBe("within");
    expect(verdict(1000, 999, 0).grade).toBe("possible_slow_leak");
    expect(verdict(1000, 10, 99).grade).toBe("within");
    for (const bad of [-1, 100, Number.NaN, Number.POSITIVE_INFINITY])
      expect(() => verdict(1000, 900, bad), String(bad)).toThrow(
        `shortfallAllowancePct must be between 0 and 100, got ${bad}`,
      );
  });
});

describe("chargeWithinTolerance: the edges", () => {
  const check = (targetG: number, chargedG: number, toleranceG?: number) =>
    chargeWithinTolerance({ targetG, chargedG, refrigerant: "R-134a", toleranceG });

  it("says on target, over and under, and asks for a recovery only when outside", () => {
    expect(sayInUnits(check(600, 600).sentence)).toBe(
      "Charged 600 g against a target of 600 g: on target, inside the ±15 g a recharge machine must hold.",
    );
    expect(sayInUnits(check(600, 610).sentence)).toBe(
      "Charged 610 g against a target of 600 g: 10 g over, inside the ±15 g a recharge machine must hold.",
    );
    expect(sayInUnits(check(600, 570).sentence)).toBe(
      "Charged 570 g against a target of 600 g: 30 g under, outside the ±15 g a recharge machine must hold. Recover and recharge by weight.",
    );
  });

  it("refuses a target of 0 but takes a charge of 0, and a tolerance from 0 up", () => {
    expect(() => check(0, 100)).toThrow("targetG must be a positive mass in grams, got 0");
    expect(check(600, 0).within).toBe(false);
    expect(() => check(600, -1)).toThrow("chargedG must be a non-negative mass in grams, got -1");
    expect(check(600, 600, 0).within).toBe(true);
    expect(check(600, 601, 0).within).toBe(false);
    for (const bad of [-1, Number.NaN])
      expect(() => check(600, 600, bad), String(bad)).toThrow(`toleranceG must be ≥ 0, got ${bad}`);
  });
});

describe("targetCharge: the edges", () => {
  it("refuses a figure of 0 or below from any of its sources, naming it", () => {
    expect(() => targetCharge({ labelChargeG: 0 })).toThrow("labelChargeG must be a positive mass");
    expect(() => targetCharge({ specChargeG: -5 })).toThrow("specChargeG must be a positive mass");
    expect(() => targetCharge({ revisedChargeG: Number.NaN })).toThrow(
      "revisedChargeG must be a positive mass",
    );
  });

  it("flags a disagreement only when label and spec table both exist and differ by more than 15 g", () => {
    expect(targetCharge({ labelChargeG: 700, specChargeG: 715 })?.warnings).toEqual([]);
    expect(targetCharge({ labelChargeG: 700, specChargeG: 716 })?.warnings).toHaveLength(1);
    expect(targetCharge({ labelChargeG: 700 })?.warnings).toEqual([]);
    // a figure the form sends as null is no figure: no disagreement to flag
    expect(targetCharge({ labelChargeG: 700, specChargeG: null })?.warnings).toEqual([]);
    expect(targetCharge({ labelChargeG: null, specChargeG: 900 })?.warnings).toEqual([
      "No label charge recorded: the target comes from the shop's spec table.",
    ]);
    expect(targetCharge({ specChargeG: 900 })?.warnings).toEqual([
      "No label charge recorded: the target comes from the shop's spec table.",
    ]);
    expect(targetCharge({ labelChargeG: 650, revisedChargeG: 620 })?.warnings).toEqual([
      "Charging to the maker's revised figure instead of the label: note the bulletin on the record.",
    ]);
  });
});
