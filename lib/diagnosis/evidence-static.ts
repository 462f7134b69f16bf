import { staticCheck } from "@/lib/refrigerants";
import type { Extraction } from "./evidence-types";
import { saturationPressureOrNull } from "./saturation-guard";
import { degC, kpa, kpaGauge } from "./format";
import type { DiagnosisInput } from "./schema";
import { EMPTY_BELOW_FRACTION_OF_SATURATION, EMPTY_BELOW_KPA_GAUGE, STATIC_EXCESS_KPA } from "./grading";

/** Engine-off static pressure against saturation at ambient: empty, no liquid, or how much excess. */
export function addStaticEvidence(input: DiagnosisInput, barometricKpa: number, out: Extraction): void {
  if (input.staticKpaGauge === undefined) return;
  const staticKpaAbs = input.staticKpaGauge + barometricKpa;
  out.computed.staticKpaAbs = staticKpaAbs;
  const saturationKpaAbs = saturationPressureOrNull(input.refrigerant, input.ambientC);
  const emptyBelowKpaAbs = Math.min(
    EMPTY_BELOW_KPA_GAUGE + barometricKpa,
    saturationKpaAbs === null ? Infinity : saturationKpaAbs * EMPTY_BELOW_FRACTION_OF_SATURATION,
  );
  if (staticKpaAbs < emptyBelowKpaAbs) {
    out.observedGroups.add("static");
    out.observations.push({
      id: "static:empty",
      text: `Static pressure ${kpaGauge(input.staticKpaGauge)} at ${degC(input.ambientC)}: the system is empty or nearly so.`,
    });
    return;
  }
  if (saturationKpaAbs === null) {
    out.notes.push(
      `Static pressure check not possible: ${degC(input.ambientC)} is outside the ${input.refrigerant} saturation table${input.refrigerant === "R-744" ? " (CO2 has no liquid above about 31 °C)" : ""}.`,
    );
    return;
  }
  const check = staticCheck({ refrigerant: input.refrigerant, staticKpaAbs, ambientC: input.ambientC });
  if (check.kind === "out_of_range") {
    out.notes.push(check.message);
    return;
  }
  out.computed.staticSaturationKpaAbs = check.saturationKpaAbs;
  out.computed.staticExcessKpa = check.excessKpa;
  out.observedGroups.add("static");
  const saturationGauge = kpaGauge(check.saturationKpaAbs - barometricKpa);
  if (check.kind === "no_liquid") {
    out.observations.push({
      id: "static:no_liquid",
      text: `Static pressure ${kpaGauge(input.staticKpaGauge)} is ${kpa(-check.excessKpa)} below saturation (${saturationGauge}) at ${degC(input.ambientC)}: no liquid left, so the air check is not valid.`,
    });
    return;
  }
  const excess = check.excessKpa;
  const lead = `Static pressure ${kpaGauge(input.staticKpaGauge)}`;
  if (excess <= STATIC_EXCESS_KPA.slight) {
    out.observations.push({
      id: "static:normal",
      text: `${lead} matches saturation at ${degC(input.ambientC)} (${saturationGauge}) within ${kpa(STATIC_EXCESS_KPA.slight)}: no sign of air.`,
    });
  } else {
    const id =
      excess <= STATIC_EXCESS_KPA.high
        ? "static:slightly_high"
        : excess <= STATIC_EXCESS_KPA.veryHigh
          ? "static:high"
          : "static:very_high";
    out.observations.push({
      id,
      text: `${lead} is ${kpa(excess)} above saturation at ${degC(input.ambientC)} (${saturationGauge}).`,
    });
  }
}
