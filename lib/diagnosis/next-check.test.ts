import { describe, expect, it } from "vitest";
import { diagnose } from "./diagnose";
import type { DiagnosisInput } from "./schema";
import { expectedShift } from "./next-check";

describe("expectedShift", () => {
  it("is zero for a check whose results weigh both suspects alike", () => {
    // static:normal and static:slightly_high move neither moisture nor an expansion valve stuck open.
    expect(
      expectedShift([["static:normal"], ["static:slightly_high"]], "moisture", "metering_stuck_open"),
    ).toBe(0);
  });

  it("equals the chance-weighted gap for a two-result check, by hand", () => {
    // condenser_fan_not_running: airflow +3.0, overcharge −0.3; condenser_fan_running: airflow −1.0, overcharge 0.
    const pAirflow = [
      Math.exp(3) / (Math.exp(3) + Math.exp(-1)),
      Math.exp(-1) / (Math.exp(3) + Math.exp(-1)),
    ];
    const pOvercharge = [Math.exp(-0.3) / (Math.exp(-0.3) + 1), 1 / (Math.exp(-0.3) + 1)];
    const expected =
      (0.5 * (pAirflow[0] ?? 0) + 0.5 * (pOvercharge[0] ?? 0)) * 3.3 +
      (0.5 * (pAirflow[1] ?? 0) + 0.5 * (pOvercharge[1] ?? 0)) * 1.0;
    expect(
      expectedShift(
        [["symptom:condenser_fan_not_running"], ["symptom:condenser_fan_running"]],
        "condenser_airflow",
        "overcharge",
      ),
    ).toBeCloseTo(expected, 12);
  });
});

describe("chooseNextCheck through diagnose", () => {
  const highHead = {
    refrigerant: "R-134a",
    expansionDevice: "orifice_tube",
    ambientC: 30,
    highKpaGauge: 1900,
    lowKpaGauge: 320,
  } as const;

  it("never suggests a check whose result is already in the input", () => {
    const steps: DiagnosisInput[] = [
      highHead,
      { ...highHead, symptoms: ["condenser_fan_running"] },
      { ...highHead, symptoms: ["condenser_fan_running", "water_spray_no_change"] },
      { ...highHead, symptoms: ["condenser_fan_running", "water_spray_no_change"], staticKpaGauge: 672 },
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
    expect(everything.nextCheck.instruction).toMatch(/replace the valve and the receiver-drier/);
  });
});
