import { describe, expect, it } from "vitest";
import { diagnose } from "./diagnose";
import { formatMessage, type Message } from "./messages";
import { HEALTHY_CASES } from "./fixtures/healthy";
import { REAL_SHARE } from "./grading";
import { extractEvidence } from "./evidence";
import { scoreCauses, weightOf } from "./scoring";

const said = (messages: readonly Message[]) => messages.map((m) => formatMessage(m)).join(" ");
import type { DiagnosisInput } from "./schema";

const rank = (input: DiagnosisInput, cause: string) =>
  diagnose(input).suspects.findIndex((s) => s.cause === cause);

describe("trade check values (common practice)", () => {
  it("ranks overcharge first for a recovered mass 25 % over the label with high-pressure cut-outs at 30 °C", () => {
    for (const refrigerant of ["R-134a", "R-1234yf"] as const) {
      for (const expansionDevice of ["orifice_tube", "txv"] as const) {
        const findings = diagnose({
          refrigerant,
          expansionDevice,
          ambientC: 30,
          labelChargeG: 800,
          recoveredChargeG: 1000,
          symptoms: ["high_pressure_cutout"],
        });
        expect(findings.suspects[0]?.cause).toBe("overcharge");
        expect(said(findings.suspects[0]?.evidenceFor ?? [])).toMatch(/200 g \(25 %\) over/);
      }
    }
  });

  it("ranks air low when the identifier reads 100 % pure with no air, however high the head pressure", () => {
    for (let highKpaGauge = 1500; highKpaGauge <= 3000; highKpaGauge += 250) {
      const findings = diagnose({
        refrigerant: "R-134a",
        expansionDevice: "orifice_tube",
        ambientC: 30,
        highKpaGauge,
        lowKpaGauge: 300,
        identifierPurityPct: 100,
        identifierAirPct: 0,
        symptoms: ["high_pressure_cutout", "gauge_needle_flutter"],
      });
      const air = findings.suspects.find((s) => s.cause === "non_condensables");
      expect(air?.share).toBeLessThan(0.1);
      expect(findings.suspects.findIndex((s) => s.cause === "non_condensables")).toBeGreaterThanOrEqual(2);
      expect(said(air?.evidenceAgainst ?? [])).toMatch(/0 % air/);
    }
  });

  it("ranks no refrigerant fault first for readings inside the quick-check band with a cold vent (TM 5-3805-291-23-1 Table 1)", () => {
    for (const ambientC of [22, 27, 32, 37]) {
      const findings = diagnose({
        refrigerant: "R-134a",
        expansionDevice: "orifice_tube",
        ambientC,
        highKpaGauge: 0,
        lowKpaGauge: 0,
        ventC: 6,
      });
      expect(findings.suspects[0]?.cause).not.toBe("no_refrigerant_fault"); // zero readings are not in band
      const inBand = diagnose({
        refrigerant: "R-134a",
        expansionDevice: "orifice_tube",
        ambientC,
        highKpaGauge:
          (findings.computed.expectedHigh?.minKpaGauge ?? 0) * 0.5 +
          (findings.computed.expectedHigh?.maxKpaGauge ?? 0) * 0.5,
        lowKpaGauge:
          (findings.computed.expectedLow?.minKpaGauge ?? 0) * 0.5 +
          (findings.computed.expectedLow?.maxKpaGauge ?? 0) * 0.5,
        ventC: 6,
      });
      expect(inBand.suspects[0]?.cause).toBe("no_refrigerant_fault");
    }
  });
});

describe("separating the known confusions", () => {
  const lowSides = {
    refrigerant: "R-134a",
    expansionDevice: "txv",
    ambientC: 30,
    highKpaGauge: 1000,
    lowKpaGauge: 120,
    suctionLineC: 15,
  } as const;
  it("uses subcooling to split undercharge (low) from a metering restriction (high) (common practice)", () => {
    expect(diagnose({ ...lowSides, liquidLineC: 41 }).suspects[0]?.cause).toBe("undercharge");
    expect(
      diagnose({ ...lowSides, liquidLineC: 28, symptoms: ["frost_at_metering_device"] }).suspects[0]?.cause,
    ).toBe("metering_restriction");
  });

  const highHead = {
    refrigerant: "R-134a",
    expansionDevice: "orifice_tube",
    ambientC: 30,
    highKpaGauge: 1900,
    lowKpaGauge: 320,
  } as const;
  it("splits overcharge, air and condenser airflow by static check, identifier and fan (SAE J2912; common practice)", () => {
    expect(
      diagnose({ ...highHead, staticKpaGauge: 800, identifierPurityPct: 99.5, identifierAirPct: 4 })
        .suspects[0]?.cause,
    ).toBe("non_condensables");
    expect(
      diagnose({ ...highHead, staticKpaGauge: 672, labelChargeG: 700, recoveredChargeG: 860 }).suspects[0]
        ?.cause,
    ).toBe("overcharge");
    expect(
      diagnose({ ...highHead, staticKpaGauge: 672, symptoms: ["condenser_fan_not_running", "worse_at_idle"] })
        .suspects[0]?.cause,
    ).toBe("condenser_airflow");
  });

  it("lets physics outvote the priors: a high low side with a low high side all but excludes undercharge (common practice)", () => {
    const notPumping = {
      refrigerant: "R-134a",
      expansionDevice: "orifice_tube",
      ambientC: 30,
      highKpaGauge: 800,
      lowKpaGauge: 330,
      ventC: 19,
    } as const;
    const findings = diagnose(notPumping);
    expect(findings.suspects[0]?.cause).toBe("weak_compressor");
    const under = findings.suspects.find((s) => s.cause === "undercharge");
    expect(under?.evidenceAgainst.map((m) => m.key)).toContain("pattern:compressor_not_pumping");
    expect(weightOf("pattern:compressor_not_pumping", "undercharge")).toBeLessThanOrEqual(-4);
    // Even weighed 60 % short, the compressor stays ahead: the weight alone cannot make a short charge raise the low side.
    expect(diagnose({ ...notPumping, labelChargeG: 700, recoveredChargeG: 280 }).suspects[0]?.cause).toBe(
      "weak_compressor",
    );
  });

  it("does not let high subcooling count against air: air raises the head and the gauge's subcooling with it (Dalton's law; common practice)", () => {
    for (const grade of ["subcooling:high", "subcooling:very_high"] as const)
      expect(weightOf(grade, "non_condensables")).toBeGreaterThanOrEqual(0);
    // A clearly high static counts against a plain overcharge, which leaves the static at saturation.
    expect(weightOf("static:high", "overcharge")).toBeLessThan(0);
    expect(weightOf("static:very_high", "overcharge")).toBeLessThan(weightOf("static:high", "overcharge"));
  });

  it("sends a close call between overcharge and air to the static check, then the identifier (common practice)", () => {
    const close = diagnose({
      ...highHead,
      liquidLineC: 52,
      lowKpaGauge: 360,
      symptoms: ["gauge_needle_flutter"],
    });
    const leaders = close.suspects
      .slice(0, 2)
      .map((s) => s.cause)
      .sort();
    expect(leaders).toEqual(["non_condensables", "overcharge"]);
    expect(close.nextCheck.check).toBe("static_pressure");
    // A static a little over saturation leaves them level: the identifier's air reading is next.
    const withStatic = diagnose({
      ...highHead,
      liquidLineC: 52,
      lowKpaGauge: 360,
      staticKpaGauge: 730,
      staticSoakC: 30,
      staticSoakMin: 120,
      symptoms: ["gauge_needle_flutter"],
    });
    expect(
      withStatic.suspects
        .slice(0, 2)
        .map((s) => s.cause)
        .sort(),
    ).toEqual(["non_condensables", "overcharge"]);
    expect(withStatic.nextCheck.check).toBe("identify_refrigerant");
  });

  it("asks for the charge by weight before condemning a compressor, and follows the weight (common practice)", () => {
    // Pressures close together with the low side inside its band: a weak compressor or a severe undercharge.
    const close = {
      refrigerant: "R-134a",
      expansionDevice: "orifice_tube",
      ambientC: 30,
      highKpaGauge: 800,
      lowKpaGauge: 280,
      ventC: 19,
    } as const;
    expect(diagnose({ ...close, labelChargeG: 700 }).nextCheck.check).toBe("recover_and_weigh");
    expect(diagnose({ ...close, labelChargeG: 700, recoveredChargeG: 690 }).suspects[0]?.cause).toBe(
      "weak_compressor",
    );
    expect(diagnose({ ...close, labelChargeG: 700, recoveredChargeG: 250 }).suspects[0]?.cause).toBe(
      "undercharge",
    );
  });

  it("splits moisture (swinging low side) from icing (steady low side, clutch not cycling) (common practice)", () => {
    const fading = {
      refrigerant: "R-134a",
      expansionDevice: "orifice_tube",
      ambientC: 30,
      highKpaGauge: 1250,
      lowKpaGauge: 110,
    } as const;
    const undecided = diagnose({
      ...fading,
      symptoms: ["cooling_fades_then_returns", "evaporator_airflow_drops"],
    });
    expect(
      undecided.suspects
        .slice(0, 2)
        .map((s) => s.cause)
        .sort(),
    ).toEqual(["evaporator_icing", "moisture"]);
    expect(undecided.nextCheck.check).toBe("watch_low_side");
    expect(
      diagnose({ ...fading, symptoms: ["cooling_fades_then_returns", "low_side_swings_to_vacuum"] })
        .suspects[0]?.cause,
    ).toBe("moisture");
    expect(
      diagnose({
        ...fading,
        symptoms: ["cooling_fades_then_returns", "low_side_steady", "clutch_not_cycling"],
      }).suspects[0]?.cause,
    ).toBe("evaporator_icing");
  });
});

describe("the weights move the ranking the way the signatures say (kills sign mutations the gates would hide)", () => {
  const logOddsOf = (input: DiagnosisInput, cause: string, gates = true) =>
    (gates
      ? scoreCauses(extractEvidence(input).observations)
      : scoreCauses(extractEvidence(input).observations, [])
    ).find((s) => s.cause === cause)?.logOdds ?? Number.NaN;
  const base = { refrigerant: "R-134a", expansionDevice: "orifice_tube", ambientC: 30 } as const;

  it("a failed identifier raises contaminated refrigerant before any gate acts (SAE J2099 98 % mark)", () => {
    expect(
      logOddsOf({ ...base, identifierPurityPct: 90 }, "contaminated_refrigerant", false),
    ).toBeGreaterThan(logOddsOf(base, "contaminated_refrigerant", false) + 1);
  });

  it("pressures close together raise a weak compressor against the same reading with a normal lift (common practice)", () => {
    // 800 kPa gauge condenses at 35.6 °C and 280 kPa gauge evaporates at 7.5 °C (Tillner-Roth & Baehr 1994):
    // a 28 K lift where the bands for 30 °C allow no less than 36 K.
    const close = { ...base, highKpaGauge: 800, lowKpaGauge: 280 } as const;
    const ids = extractEvidence(close).observations.map((o) => o.id);
    expect(ids).toContain("lift:close");
    const withoutLift = scoreCauses(
      extractEvidence(close).observations.filter((o) => o.id !== "lift:close"),
      [],
    ).find((s) => s.cause === "weak_compressor")?.logOdds;
    expect(logOddsOf(close, "weak_compressor", false)).toBeGreaterThan((withoutLift ?? 0) + 1);
  });
});

describe("oil and sealant have evidence of their own", () => {
  const running = {
    refrigerant: "R-134a",
    expansionDevice: "orifice_tube",
    compressorType: "cycling_clutch",
    ambientC: 28,
    relativeHumidityPct: 50,
    highKpaGauge: 1150,
    lowKpaGauge: 200,
    ventC: 8,
  } as const;

  it("puts oil loss first for a noisy compressor after a part was swapped without oil (TM 5-3810-307-24-1-2 ch. 9; common practice)", () => {
    const leader = (symptoms: DiagnosisInput["symptoms"]) =>
      diagnose({ ...running, symptoms }).suspects[0]?.cause;
    expect(leader(["compressor_noise", "part_replaced_no_oil_added"])).toBe("oil_loss");
    expect(leader(["compressor_noise", "oil_short_at_drain"])).toBe("oil_loss");
    expect(leader(["compressor_noise", "part_replaced_oil_added", "oil_normal_at_drain"])).not.toBe(
      "oil_loss",
    );
    expect(weightOf("symptom:part_replaced_no_oil_added", "oil_loss")).toBeGreaterThan(0);
    expect(weightOf("symptom:oil_normal_at_drain", "oil_loss")).toBeLessThan(0);
  });

  it("puts contaminated refrigerant first when sealant is found, even past an identifier that cannot see it (common practice)", () => {
    const findings = diagnose({
      ...running,
      identifierPurityPct: 99.4,
      identifierAirPct: 0.2,
      symptoms: ["sealant_found"],
    });
    expect(findings.suspects[0]?.cause).toBe("contaminated_refrigerant");
    expect(findings.cautions.map((c) => c.id)).toContain("sealant_in_system");
    expect(said(findings.notes)).toMatch(/cannot see sealant/);
  });
});

describe("gates, next check and cautions", () => {
  it("puts contaminated refrigerant first on a failed identifier, with the do-not-recover caution (SAE J2099/J2912)", () => {
    const findings = diagnose({
      refrigerant: "R-134a",
      expansionDevice: "orifice_tube",
      ambientC: 28,
      labelChargeG: 700,
      recoveredChargeG: 80,
      identifierPurityPct: 90,
      symptoms: ["leak_found", "bubbles_in_sight_glass", "oil_residue_at_fitting"],
    });
    expect(findings.suspects[0]?.cause).toBe("contaminated_refrigerant");
    expect(findings.cautions.map((c) => c.id)).toContain("contaminated_do_not_recover");
    expect(findings.nextCheck.instruction).toMatch(/J2851/);
  });

  it("puts undercharge first on an empty system and sends the technician to find the leak", () => {
    const findings = diagnose({
      refrigerant: "R-1234yf",
      expansionDevice: "txv",
      ambientC: 22,
      staticKpaGauge: 10,
      symptoms: ["condenser_fan_not_running", "compressor_noise", "recent_service_elsewhere"],
    });
    expect(findings.suspects[0]?.cause).toBe("undercharge");
    expect(findings.doNotRun).toEqual({ active: true, reasons: ["no_liquid"] });
    expect(findings.nextCheck.check).toBe("repair_path");
    expect(findings.nextCheck.instruction).toMatch(
      /find the leak with dry nitrogen or an approved tracer gas/,
    );
    expect(findings.nextCheck.instruction).toMatch(
      /recharge by weight to the label; only then run the test\.$/,
    );
    expect(findings.cautions.map((c) => c.id)).toEqual(
      expect.arrayContaining(["empty_system", "flammable_r1234yf", "repair_before_refill"]),
    );
  });

  it("shows repair cautions only for the leader or a cause with a real share, worded as conditions", () => {
    const repairCautions = ["repair_before_refill", "moisture_and_acid", "charge_by_weight"];
    for (const c of HEALTHY_CASES.filter((h) => !h.doNotRun)) {
      const findings = diagnose(c.input);
      expect(findings.suspects[0]?.cause, c.id).toBe("no_refrigerant_fault");
      for (const id of repairCautions)
        expect(
          findings.cautions.map((x) => x.id),
          c.id,
        ).not.toContain(id);
    }
    const leak = diagnose({
      refrigerant: "R-134a",
      expansionDevice: "orifice_tube",
      ambientC: 29,
      highKpaGauge: 900,
      lowKpaGauge: 120,
      liquidLineC: 38,
      symptoms: ["clutch_rapid_cycling"],
    });
    const refill = leak.cautions.find((c) => c.id === "repair_before_refill");
    expect(refill?.text).toMatch(/^If a leak is confirmed, repair it before refilling/);
    const trailing = leak.suspects.filter((s) => s.cause !== "undercharge" && s.share < REAL_SHARE);
    expect(trailing.map((s) => s.cause)).toContain("moisture");
    expect(leak.cautions.map((c) => c.id)).not.toContain("moisture_and_acid");
  });

  it("ends the cautions with deference to the maker's procedure, local codes and certified practice", () => {
    const findings = diagnose({
      refrigerant: "R-134a",
      expansionDevice: "txv",
      ambientC: 25,
      compressorType: "electric",
    });
    expect(findings.cautions.at(-1)?.id).toBe("defer_to_procedure");
    expect(findings.cautions.at(-1)?.text).toMatch(
      /maker's service procedure.*local codes.*certified practice/,
    );
    expect(findings.cautions.map((c) => c.id)).toEqual(
      expect.arrayContaining(["eye_and_skin", "never_vent", "high_voltage_compressor"]),
    );
  });

  it("says in one plain statement how much of the case was measured", () => {
    const sparse = diagnose({
      refrigerant: "R-134a",
      expansionDevice: "orifice_tube",
      ambientC: 30,
      highKpaGauge: 1900,
    });
    expect(sparse.measured.groups).toEqual(["high_side"]);
    expect(sparse.measured.statement).toBe(
      "Measured 1 of the 9 key readings (high side); not yet measured: low side, subcooling, superheat, static pressure, recovered charge, identifier purity, identifier air and centre vent.",
    );
    const none = diagnose({ refrigerant: "R-134a", expansionDevice: "orifice_tube", ambientC: 30 });
    expect(none.measured.statement).toMatch(/^None of the 9 key readings/);
  });

  it("phrases the next check as an instruction and names the two suspects it separates", () => {
    const findings = diagnose({
      refrigerant: "R-134a",
      expansionDevice: "orifice_tube",
      ambientC: 30,
      highKpaGauge: 1900,
      lowKpaGauge: 320,
      symptoms: ["no_sealant_found"],
    });
    expect(findings.nextCheck.separates).toEqual(findings.suspects.slice(0, 2).map((s) => s.cause));
    expect(findings.nextCheck.instruction).toMatch(/^[A-Z][a-z]+/);
    expect(findings.nextCheck.expectedGainNats).toBeGreaterThan(0);
  });

  it("handles R-744 running readings: says the high side is transcritical and leaves it unmeasured", () => {
    const findings = diagnose({
      refrigerant: "R-744",
      expansionDevice: "txv",
      ambientC: 35,
      highKpaGauge: 9500,
      lowKpaGauge: 3400,
      liquidLineC: 40,
      ventC: 8,
    });
    expect(said(findings.notes)).toMatch(/transcritical/);
    expect(findings.measured.missing).toContain("high_side");
    expect(findings.cautions.map((c) => c.id)).toContain("r744_pressure");
  });

  it("puts every piece of evidence that moved a suspect into its for/against lists", () => {
    const findings = diagnose({
      refrigerant: "R-134a",
      expansionDevice: "orifice_tube",
      ambientC: 24,
      staticKpaGauge: 660,
      staticSoakC: 24,
      staticSoakMin: 180,
    });
    const air = findings.suspects.find((s) => s.cause === "non_condensables");
    expect(said(air?.evidenceFor.slice(0, 1) ?? [])).toMatch(
      /^Static pressure 660 kPa gauge sits 5\.\d K above saturation \(544 kPa gauge\) at the parts' soak temperature of 24\.0 °C after 180 min of soak\.$/,
    );
    for (const s of findings.suspects)
      expect(s.evidenceFor.length + s.evidenceAgainst.length).toBe(s.evidence.length);
    expect(
      rank(
        {
          refrigerant: "R-134a",
          expansionDevice: "orifice_tube",
          ambientC: 24,
          staticKpaGauge: 660,
          staticSoakC: 24,
          staticSoakMin: 180,
        },
        "non_condensables",
      ),
    ).toBe(0);
  });
});
