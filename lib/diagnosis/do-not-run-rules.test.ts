import { describe, expect, it } from "vitest";
import { saturationPressure } from "@/lib/refrigerants";
import { standardBarometricKpa } from "@/lib/units/barometric";
import { doNotRunState, recharged, staticDeficits } from "./do-not-run";
import { DO_NOT_RUN, STATIC_CHECK, SUBCOOLING_K } from "./grading";
import type { DiagnosisInput } from "./schema";

// Each condition of the do-not-run rule on both sides of its line (grading table DO_NOT_RUN and
// STATIC_CHECK; the shared empty-system line). Safety first: the state must hold wherever the system may
// have no liquid charge, and a line moved the wrong way would let a technician run it.
const SEA_LEVEL_KPA = 101.325;
const base = { refrigerant: "R-134a", expansionDevice: "orifice_tube", ambientC: 25 } as const;
/** the static gauge pressure whose saturation temperature sits `deficitK` under `atC` (R-134a, sea level) */
const staticBelow = (deficitK: number, atC = 25) =>
  saturationPressure("R-134a", atC - deficitK) - SEA_LEVEL_KPA;
const reasons = (input: DiagnosisInput) => doNotRunState(input).reasons;

describe("a recharge (half the label or more, judgement)", () => {
  it("counts from exactly half the label, and any positive mass when the label is unknown", () => {
    expect(recharged({ chargedG: 340, labelChargeG: 680 })).toBe(true);
    expect(recharged({ chargedG: 339, labelChargeG: 680 })).toBe(false);
    expect(recharged({ chargedG: 50 })).toBe(true);
    expect(recharged({ chargedG: 0 })).toBe(false);
    expect(recharged({ chargedG: 0, labelChargeG: 0 })).toBe(false);
    expect(recharged({ labelChargeG: 680 })).toBe(false);
  });

  it("lifts every reason at once, and nothing else does", () => {
    const empty: DiagnosisInput = {
      ...base,
      staticKpaGauge: 0,
      recoveredChargeG: 100,
      symptoms: ["leak_found"],
    };
    expect(doNotRunState(empty)).toEqual({
      active: true,
      reasons: ["no_liquid", "recovered_not_recharged", "leak_with_short_charge"],
    });
    expect(doNotRunState({ ...empty, labelChargeG: 680, chargedG: 680 })).toEqual({
      active: false,
      reasons: [],
    });
  });
});

describe("no liquid left: more than 5 K under saturation at the worse of the air and the soak temperature", () => {
  it("draws the line at the grading table's no-liquid figure, on both sides", () => {
    const over = STATIC_CHECK.noLiquidBelowK + 0.1;
    const under = STATIC_CHECK.noLiquidBelowK - 0.1;
    expect(reasons({ ...base, staticKpaGauge: staticBelow(over) })).toContain("no_liquid");
    expect(reasons({ ...base, staticKpaGauge: staticBelow(under) })).not.toContain("no_liquid");
    expect(doNotRunState({ ...base, staticKpaGauge: staticBelow(under) }).active).toBe(false);
  });

  it("works out the deficit at the air and at the soak temperature separately", () => {
    const deficits = staticDeficits({ ...base, staticSoakC: 20, staticKpaGauge: staticBelow(1) });
    expect(deficits?.airK).toBeCloseTo(1, 3);
    expect(deficits?.soakK).toBeCloseTo(1 - 5, 3);
    expect(staticDeficits({ ...base, staticKpaGauge: staticBelow(1) })?.soakK).toBeNull();
    expect(staticDeficits(base)).toBeNull();
  });

  it("takes the worse temperature: cold parts do not excuse a reading low against warm air, nor the other way", () => {
    // Saturation at the 25 °C air less 6 K is 19 °C: above saturation for parts soaked to 15 °C.
    const lowForAir = { ...base, staticSoakC: 15, staticKpaGauge: staticBelow(6) };
    expect(reasons(lowForAir)).toContain("no_liquid");
    // Parts soaked to 35 °C on a 25 °C day: 6 K under the parts' saturation, 4 K above the air's.
    const lowForParts = { ...base, staticSoakC: 35, staticKpaGauge: staticBelow(6, 35) };
    expect(staticDeficits(lowForParts)?.airK).toBeCloseTo(-4, 3);
    expect(reasons(lowForParts)).toContain("no_liquid");
  });

  it("calls an empty system an infinite deficit, at altitude too (ASHRAE Fundamentals ch. 1 barometric pressure)", () => {
    // 25 °C: the empty line is half of saturation, 332.7 kPa abs; at 0 °C it is 70 kPa gauge.
    expect(staticDeficits({ ...base, staticKpaGauge: 200 })?.airK).toBe(Infinity);
    const cold = { ...base, ambientC: 0, altitudeM: 1500 } as const;
    expect(staticDeficits({ ...cold, staticKpaGauge: 60 })?.airK).toBe(Infinity);
    expect(staticDeficits({ ...cold, staticKpaGauge: 80 })?.airK).not.toBe(Infinity);
    const barometricKpa = standardBarometricKpa(1500);
    expect(barometricKpa).toBeLessThan(SEA_LEVEL_KPA);
  });

  it("does not judge a deficit below −5 °C, or past the table, but still reads a gauge at zero as empty", () => {
    const frozen = { ...base, ambientC: STATIC_CHECK.minReferenceC - 1, staticKpaGauge: 0 } as const;
    expect(staticDeficits(frozen)).toEqual({ airK: null, soakK: null });
    expect(reasons(frozen)).toContain("no_liquid");
    expect(staticDeficits({ ...frozen, ambientC: STATIC_CHECK.minReferenceC })?.airK).toBe(Infinity);
    // R-744 above its critical temperature (Span & Wagner 1996): no saturation to compare with.
    const hotCo2 = {
      refrigerant: "R-744",
      expansionDevice: "txv",
      ambientC: 35,
      staticKpaGauge: 7000,
    } as const;
    expect(staticDeficits(hotCo2)?.airK).toBeNull();
    // A static past the critical pressure has no saturation temperature either.
    expect(staticDeficits({ ...base, staticKpaGauge: 4500 })?.airK).toBeNull();
  });
});

describe("a leak with a short charge (Directive 2006/40/EC Art. 7: no refill before the repair)", () => {
  const leak: DiagnosisInput = { ...base, symptoms: ["leak_found"] };

  it("holds on a short recovered charge and not on one within tolerance or over", () => {
    expect(reasons({ ...leak, labelChargeG: 680, recoveredChargeG: 500 })).toContain(
      "leak_with_short_charge",
    );
    for (const recoveredChargeG of [680, 740, 900])
      expect(reasons({ ...leak, labelChargeG: 680, recoveredChargeG })).not.toContain(
        "leak_with_short_charge",
      );
    expect(reasons({ ...leak, recoveredChargeG: 500 })).not.toContain("leak_with_short_charge");
  });

  it("holds on bubbles in the sight glass or no subcooling, and not on a leak alone", () => {
    expect(reasons({ ...leak, symptoms: ["leak_found", "bubbles_in_sight_glass"] })).toContain(
      "leak_with_short_charge",
    );
    expect(reasons(leak)).toEqual([]);
    expect(reasons({ ...base, symptoms: ["bubbles_in_sight_glass"] })).toEqual([]);
    const high = saturationPressure("R-134a", 50) - SEA_LEVEL_KPA;
    const none = SUBCOOLING_K.orifice_tube.none;
    expect(reasons({ ...leak, highKpaGauge: high, liquidLineC: 50 - none + 0.1 })).toContain(
      "leak_with_short_charge",
    );
    expect(reasons({ ...leak, highKpaGauge: high, liquidLineC: 50 - none - 0.1 })).not.toContain(
      "leak_with_short_charge",
    );
    expect(reasons({ ...leak, highKpaGauge: high })).toEqual([]);
    expect(reasons({ ...leak, liquidLineC: 20 })).toEqual([]);
    // A high side off the table gives no subcooling to judge.
    expect(reasons({ ...leak, highKpaGauge: -60, liquidLineC: 20 })).toEqual([]);
  });

  it("holds on a leak with no liquid left", () => {
    expect(reasons({ ...leak, staticKpaGauge: 0 })).toEqual(["no_liquid", "leak_with_short_charge"]);
  });
});

describe("an electric compressor waits for a static within 2 K of saturation (from memory)", () => {
  const electric = { ...base, compressorType: "electric" } as const;
  it("holds with no static, or one that cannot be judged, and says which", () => {
    expect(reasons(electric)).toEqual(["electric_static_unknown"]);
    expect(reasons({ ...electric, ambientC: STATIC_CHECK.minReferenceC - 1, staticKpaGauge: 150 })).toEqual([
      "electric_static_unknown",
    ]);
  });

  it("draws the line at the grading table's figure, on both sides", () => {
    const low = DO_NOT_RUN.electricStaticBelowK + 0.1;
    const ok = DO_NOT_RUN.electricStaticBelowK - 0.1;
    expect(reasons({ ...electric, staticKpaGauge: staticBelow(low) })).toEqual(["electric_static_low"]);
    expect(doNotRunState({ ...electric, staticKpaGauge: staticBelow(ok) })).toEqual({
      active: false,
      reasons: [],
    });
  });

  it("does not hold a belt-driven compressor to the electric rule", () => {
    expect(reasons({ ...base, compressorType: "cycling_clutch" })).toEqual([]);
    expect(reasons({ ...base, staticKpaGauge: staticBelow(DO_NOT_RUN.electricStaticBelowK + 1) })).toEqual(
      [],
    );
  });
});
