import { describe, expect, it } from "vitest";
import { CHECKS } from "./checks";
import { diagnose } from "./diagnose";
import { extractEvidence } from "./evidence";
import { NEXT_CHECK } from "./grading";
import type { DiagnosisInput } from "./schema";
import { CAUSE_IDS, type CauseId } from "./causes";
import { expectedGain } from "./next-check";

describe("expectedGain (expected information about the ranking, nats)", () => {
  const shares = (entries: Partial<Record<CauseId, number>>) =>
    Float64Array.from(CAUSE_IDS, (c) => entries[c] ?? 0);

  it("is zero when the ranking is already certain, or when no result moves any cause", () => {
    const fan = [["symptom:condenser_fan_not_running"], ["symptom:condenser_fan_running"]] as const;
    expect(expectedGain(fan, shares({ overcharge: 1 }))).toBe(0);
    // static:normal and static:slightly_high say nothing about moisture or an expansion valve stuck open.
    expect(
      expectedGain(
        [["static:normal"], ["static:slightly_high"]],
        shares({ moisture: 0.5, metering_stuck_open: 0.5 }),
      ),
    ).toBeCloseTo(0, 12);
  });

  it("equals the entropy drop worked by hand for the fan check between airflow and overcharge", () => {
    // condenser_fan_not_running: airflow +3.0, overcharge −0.3; condenser_fan_running: airflow −1.0, overcharge 0.
    const pAirflow = [
      Math.exp(3) / (Math.exp(3) + Math.exp(-1)),
      Math.exp(-1) / (Math.exp(3) + Math.exp(-1)),
    ];
    const pOver = [Math.exp(-0.3) / (Math.exp(-0.3) + 1), 1 / (Math.exp(-0.3) + 1)];
    const h = (a: number, b: number) => -(a > 0 ? a * Math.log(a) : 0) - (b > 0 ? b * Math.log(b) : 0);
    let after = 0;
    for (const o of [0, 1]) {
      const chance = 0.5 * pAirflow[o]! + 0.5 * pOver[o]!;
      after += chance * h((0.5 * pAirflow[o]!) / chance, (0.5 * pOver[o]!) / chance);
    }
    expect(
      expectedGain(
        [["symptom:condenser_fan_not_running"], ["symptom:condenser_fan_running"]],
        shares({ condenser_airflow: 0.5, overcharge: 0.5 }),
      ),
    ).toBeCloseTo(Math.log(2) - after, 12);
  });

  it("weighs results by the current ranking: a result only an unlikely cause predicts counts for little", () => {
    const fan = [["symptom:condenser_fan_not_running"], ["symptom:condenser_fan_running"]] as const;
    const even = expectedGain(fan, shares({ condenser_airflow: 0.5, overcharge: 0.5 }));
    const lopsided = expectedGain(fan, shares({ condenser_airflow: 0.02, overcharge: 0.98 }));
    expect(lopsided).toBeLessThan(even);
  });
});

describe("chooseNextCheck through diagnose", () => {
  const highHead: DiagnosisInput & { ambientC: number } = {
    refrigerant: "R-134a",
    expansionDevice: "orifice_tube",
    ambientC: 30,
    highKpaGauge: 1900,
    lowKpaGauge: 320,
    symptoms: ["no_sealant_found"],
  };

  it("never suggests a check whose result is already in the input", () => {
    const steps: DiagnosisInput[] = [
      highHead,
      { ...highHead, symptoms: ["no_sealant_found", "condenser_fan_running"] },
      { ...highHead, symptoms: ["no_sealant_found", "condenser_fan_running", "water_spray_no_change"] },
      {
        ...highHead,
        symptoms: ["no_sealant_found", "condenser_fan_running", "water_spray_no_change"],
        staticKpaGauge: 672,
      },
    ];
    const chosen = steps.map((input) => diagnose(input).nextCheck.check);
    expect(chosen[1]).not.toBe("condenser_fan");
    expect(chosen[2]).not.toMatch(/^condenser_/);
    expect(chosen[3]).not.toMatch(/^condenser_|^static_pressure$/);
  });

  it("falls back to the leading suspect's confirming step when nothing is left to measure", () => {
    const everything = diagnose({
      refrigerant: "R-134a",
      expansionDevice: "txv",
      ambientC: 30,
      highKpaGauge: 1250,
      lowKpaGauge: 380,
      liquidLineC: 45,
      suctionLineC: 12,
      staticKpaGauge: 672,
      identifierPurityPct: 100,
      identifierAirPct: 0,
      labelChargeG: 650,
      recoveredChargeG: 640,
      chargedG: 650,
      ventC: 14,
      symptoms: [
        "suction_line_frosted",
        "condenser_fan_running",
        "water_spray_no_change",
        "low_side_steady",
        "txv_bulb_test_no_response",
        "liquid_line_even_temperature",
        "no_leak_found",
      ],
    });
    expect(everything.suspects[0]?.cause).toBe("metering_stuck_open");
    expect(everything.nextCheck.check).toBe("confirm");
    expect(everything.nextCheck.instruction).toMatch(/replace it and the receiver-drier/);
  });

  it("drops results the readings already exclude: a high side condensing above the air proves liquid (common practice)", () => {
    const liquid = diagnose({ ...highHead, symptoms: ["no_sealant_found"] });
    expect(liquid.computed.condensingC).toBeGreaterThan(highHead.ambientC);
    const staticCheck = CHECKS.find((c) => c.id === "static_pressure")!;
    const ctx = {
      input: highHead,
      extraction: extractEvidence(highHead),
      symptoms: new Set(highHead.symptoms ?? []),
      refrigerantContaminated: false,
      doNotRun: false,
      gapLogOdds: 0,
    };
    const outcomes = staticCheck.outcomes(ctx).flat();
    expect(outcomes).not.toContain("static:empty");
    expect(outcomes).not.toContain("static:no_liquid");
    expect(outcomes).toContain("static:very_high");
  });

  it("stops testing once the leader is clear and says to confirm and repair", () => {
    const clear = diagnose({
      refrigerant: "R-134a",
      expansionDevice: "orifice_tube",
      compressorType: "cycling_clutch",
      ambientC: 30,
      highKpaGauge: 2150,
      lowKpaGauge: 380,
      identifierPurityPct: 99.8,
      identifierAirPct: 0.1,
      symptoms: ["condenser_fan_not_running", "worse_at_idle", "high_pressure_cutout"],
    });
    expect(clear.suspects[0]?.cause).toBe("condenser_airflow");
    expect(clear.suspects[0]?.share).toBeGreaterThanOrEqual(NEXT_CHECK.leaderClearShare);
    expect(clear.nextCheck.check).toBe("confirm");
    expect(clear.nextCheck.reason).toMatch(
      /^Poor condenser airflow is clear, with \d+ % of the likelihood: confirm it and repair\.$/,
    );
  });

  it("looks for sealant before any hose goes on, then identifies before gauges (common practice)", () => {
    const bare = { refrigerant: "R-134a", expansionDevice: "orifice_tube", ambientC: 30, ventC: 20 } as const;
    expect(diagnose(bare).nextCheck.check).toBe("look_for_sealant");
    const noSealant = { ...bare, symptoms: ["no_sealant_found"] } satisfies DiagnosisInput;
    expect(diagnose(noSealant).nextCheck.check).toBe("identify_refrigerant");
    const onGauges = diagnose({ ...noSealant, highKpaGauge: 1300, lowKpaGauge: 250 });
    expect(["look_for_sealant", "identify_refrigerant"]).not.toContain(onGauges.nextCheck.check);
  });

  it("answers a high static on a short soak with a longer soak and a repeat, not a recovery", () => {
    const airish: DiagnosisInput = {
      refrigerant: "R-134a",
      expansionDevice: "txv",
      ambientC: 28,
      relativeHumidityPct: 50,
      highKpaGauge: 1850,
      lowKpaGauge: 320,
      staticKpaGauge: 760,
      staticSoakC: 28,
      staticSoakMin: 20,
      symptoms: ["no_sealant_found"],
    };
    const short = diagnose(airish);
    expect(short.suspects.slice(0, 2).map((s) => s.cause)).toContain("non_condensables");
    expect(short.nextCheck.check).toBe("static_repeat");
    expect(short.nextCheck.instruction).toMatch(/^Before recovering anything, let the system soak longer/);
    expect(diagnose({ ...airish, staticSoakMin: 120 }).nextCheck.check).not.toBe("static_repeat");
    expect(diagnose({ ...airish, identifierPurityPct: 99.5, identifierAirPct: 4 }).nextCheck.check).not.toBe(
      "static_repeat",
    );
  });

  it("phrases checks for the system in front of the technician", () => {
    const ctx = (input: DiagnosisInput) => ({
      input,
      extraction: extractEvidence(input),
      symptoms: new Set(input.symptoms ?? []),
      refrigerantContaminated: false,
      doNotRun: false,
      gapLogOdds: 0,
    });
    const say = (id: string, input: DiagnosisInput) =>
      CHECKS.find((c) => c.id === id)!.instruction(ctx(input));
    const hybrid = {
      refrigerant: "R-1234yf",
      expansionDevice: "txv",
      ambientC: 30,
      compressorType: "electric",
    } as const;
    expect(say("running_pressures", hybrid)).toMatch(/ready mode.*scan tool/);
    expect(say("running_pressures", hybrid)).not.toMatch(/rpm/);
    expect(say("static_pressure", hybrid)).toMatch(/^With the vehicle switched off \(not in ready mode\)/);
    expect(say("txv_bulb_test", hybrid)).toMatch(/block valve/);
    expect(say("recover_and_weigh", hybrid)).toMatch(/injects no oil/);
    const belt = { ...hybrid, compressorType: "cycling_clutch" } as const;
    expect(say("running_pressures", belt)).toMatch(/about 1,500 rpm/);
  });
});
