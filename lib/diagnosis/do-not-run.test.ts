import { describe, expect, it } from "vitest";
import { saturationPressure } from "@/lib/refrigerants";
import {
  EMPTY_STATIC_MAX_KPA_GAUGE,
  NEARLY_EMPTY_STATIC,
  staticShowsNoCharge,
} from "@/lib/refrigerants/static-charge";
import { diagnose } from "./diagnose";
import { doNotRunState, recharged } from "./do-not-run";
import { GRADING } from "./grading";
import type { DiagnosisInput } from "./schema";

// Saturation from the Tillner-Roth & Baehr (1994) R-134a equation of state, as bundled; gauge at sea level.
const gaugeAt = (tempC: number) => saturationPressure("R-134a", tempC) - 101.325;
const base = { refrigerant: "R-134a", expansionDevice: "orifice_tube", ambientC: 25 } as const;

describe("the do-not-run state (common practice; Directive 2006/40/EC Art. 7; electric compressors from memory)", () => {
  it("holds with no liquid left: static more than 5 K below saturation, or empty", () => {
    expect(doNotRunState({ ...base, staticKpaGauge: gaugeAt(19.9) }).reasons).toEqual(["no_liquid"]);
    expect(doNotRunState({ ...base, staticKpaGauge: gaugeAt(20.1) }).active).toBe(false);
    expect(doNotRunState({ ...base, staticKpaGauge: 30 }).reasons).toEqual(["no_liquid"]);
  });

  it("holds wherever the interview's shared empty-system test holds, a gauge at zero in the cold included", () => {
    // Below −5 °C the engine does not judge a static reading, but a gauge at zero is empty at any temperature.
    const cold = { ...base, ambientC: -10 };
    expect(staticShowsNoCharge({ refrigerant: "R-134a", staticKpaGauge: 0, ambientC: -10 })).toBe(true);
    expect(doNotRunState({ ...cold, staticKpaGauge: 0 }).reasons).toEqual(["no_liquid"]);
    expect(doNotRunState({ ...cold, staticKpaGauge: gaugeAt(-10) }).active).toBe(false);
    expect(staticShowsNoCharge({ refrigerant: "R-134a", staticKpaGauge: EMPTY_STATIC_MAX_KPA_GAUGE })).toBe(
      true,
    );
    // The engine's "empty" grade is the shared module's line, not a copy of it.
    expect(GRADING.STATIC_EMPTY).toBe(NEARLY_EMPTY_STATIC);
  });

  it("holds once a recovered mass is entered, until the system is recharged with at least half the label", () => {
    const recovered = { ...base, labelChargeG: 600, recoveredChargeG: 590 };
    expect(doNotRunState(recovered).reasons).toEqual(["recovered_not_recharged"]);
    expect(doNotRunState({ ...recovered, chargedG: 299 }).active).toBe(true);
    expect(doNotRunState({ ...recovered, chargedG: 300 }).active).toBe(false);
    expect(recharged({ chargedG: 10 })).toBe(true);
    expect(recharged({ chargedG: 0 })).toBe(false);
  });

  it("holds when a leak is found and the charge is short by weight, by sight glass or by subcooling", () => {
    const leak = { ...base, symptoms: ["leak_found"] } as const satisfies DiagnosisInput;
    expect(doNotRunState(leak).active).toBe(false);
    expect(doNotRunState({ ...leak, symptoms: ["leak_found", "bubbles_in_sight_glass"] }).reasons).toEqual([
      "leak_with_short_charge",
    ]);
    // 800 kPa gauge R-134a condenses at about 35.6 °C: a 36 °C liquid line is no subcooling at all.
    expect(doNotRunState({ ...leak, highKpaGauge: 800, liquidLineC: 36 }).reasons).toEqual([
      "leak_with_short_charge",
    ]);
    expect(doNotRunState({ ...leak, highKpaGauge: 800, liquidLineC: 30 }).active).toBe(false);
    expect(doNotRunState({ ...leak, labelChargeG: 600, recoveredChargeG: 500, chargedG: 600 }).active).toBe(
      false,
    );
  });

  it("holds for an electric compressor until a static reading within 2 K of saturation shows its charge", () => {
    const electric = { ...base, compressorType: "electric" } as const;
    expect(doNotRunState(electric).reasons).toEqual(["electric_static_unknown"]);
    expect(doNotRunState({ ...electric, staticKpaGauge: gaugeAt(22.9) }).reasons).toEqual([
      "electric_static_low",
    ]);
    expect(doNotRunState({ ...electric, staticKpaGauge: gaugeAt(23.1) }).active).toBe(false);
    // Too cold to judge is as good as no reading.
    expect(doNotRunState({ ...electric, ambientC: -10, staticKpaGauge: 90 }).reasons).toEqual([
      "electric_static_unknown",
    ]);
  });

  it("takes the cautious temperature: a static at saturation for colder parts is still low against the shop air", () => {
    const coldParts = { ...base, staticKpaGauge: gaugeAt(12), staticSoakC: 12, staticSoakMin: 30 };
    expect(doNotRunState(coldParts).reasons).toEqual(["no_liquid"]);
    const findings = diagnose(coldParts);
    expect(findings.nextCheck.check).toBe("static_repeat");
    expect(findings.nextCheck.runsSystem).toBe(false);
    expect(findings.nextCheck.instruction).toMatch(/let the parts warm to the shop's temperature/);
  });
});

describe("findings in the do-not-run state", () => {
  it("sends the technician down the repair path, never to a running test, with the empty-system caution", () => {
    const findings = diagnose({ ...base, staticKpaGauge: 150, staticSoakC: 25, staticSoakMin: 240 });
    expect(findings.nextCheck.check).toBe("repair_path");
    expect(findings.nextCheck.runsSystem).toBe(false);
    expect(findings.nextCheck.reason).toBe(
      "Do not run the system: the static pressure shows no liquid left.",
    );
    expect(findings.nextCheck.instruction).toBe(
      "Identify the refrigerant (SAE J2912 type) before any machine is connected; recover whatever is left with certified equipment and weigh it; find the leak with dry nitrogen or an approved tracer gas (SAE J2970), as the maker's procedure allows, and repair it; replace the receiver-drier or accumulator if the system was opened or wet; evacuate below water's boiling pressure and hold the vacuum; recharge by weight to the label; only then run the test.",
    );
    expect(findings.cautions.map((c) => c.id)).toContain("empty_system");
  });

  it("does not send an overcharged system that was recovered to look for a leak", () => {
    const findings = diagnose({
      ...base,
      highKpaGauge: 1650,
      lowKpaGauge: 330,
      labelChargeG: 650,
      recoveredChargeG: 820,
      symptoms: ["high_pressure_cutout"],
    });
    expect(findings.suspects[0]?.cause).toBe("overcharge");
    expect(findings.nextCheck.check).toBe("repair_path");
    expect(findings.nextCheck.instruction).not.toMatch(/leak/);
    expect(findings.nextCheck.instruction).toMatch(/^Replace the receiver-drier or accumulator/);
  });

  it("asks an electric-compressor system for its static first, engine off, with the electric caution", () => {
    const findings = diagnose({ ...base, expansionDevice: "txv", compressorType: "electric" });
    expect(findings.nextCheck.check).toBe("static_pressure");
    expect(findings.nextCheck.runsSystem).toBe(false);
    expect(findings.cautions.map((c) => c.id)).toEqual(
      expect.arrayContaining(["high_voltage_compressor", "electric_never_without_charge", "empty_system"]),
    );
    const electric = findings.cautions.find((c) => c.id === "electric_never_without_charge");
    expect(electric?.text).toMatch(
      /never energise it without a liquid charge or while the system is in vacuum/,
    );
  });
});
