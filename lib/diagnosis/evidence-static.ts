import { staticCheck } from "@/lib/refrigerants";
import type { Extraction } from "./evidence-types";
import { saturationPressureOrNull } from "./saturation-guard";
import { gaugeKpa, kpaDifference, tempC } from "./quantities";
import type { DiagnosisInput } from "./schema";
import { EMPTY_BELOW_FRACTION_OF_SATURATION, EMPTY_BELOW_KPA_GAUGE, STATIC_EXCESS_KPA } from "./grading";

// CO2 has no liquid above its critical temperature, 30.98 °C (Span & Wagner 1996).
const R744_CRITICAL_C = 30.98;

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
  const ambient = tempC(input.ambientC);
  const staticGauge = gaugeKpa(input.staticKpaGauge);
  if (staticKpaAbs < emptyBelowKpaAbs) {
    out.observedGroups.add("static");
    out.observations.push({
      id: "static:empty",
      message: { key: "static:empty", values: { static: staticGauge, ambient } },
    });
    return;
  }
  if (saturationKpaAbs === null) {
    out.notes.push(
      input.refrigerant === "R-744"
        ? {
            key: "note:static_outside_table_co2",
            values: { ambient, critical: { ...tempC(R744_CRITICAL_C), decimals: 0 } },
          }
        : {
            key: "note:static_outside_table",
            values: { ambient },
            words: { refrigerant: input.refrigerant },
          },
    );
    return;
  }
  const check = staticCheck({ refrigerant: input.refrigerant, staticKpaAbs, ambientC: input.ambientC });
  if (check.kind === "out_of_range") {
    out.notes.push({
      key: "note:static_outside_table",
      values: { ambient },
      words: { refrigerant: input.refrigerant },
    });
    return;
  }
  out.computed.staticSaturationKpaAbs = check.saturationKpaAbs;
  out.computed.staticExcessKpa = check.excessKpa;
  out.observedGroups.add("static");
  const saturation = gaugeKpa(check.saturationKpaAbs - barometricKpa);
  const values = { static: staticGauge, ambient, saturation };
  if (check.kind === "no_liquid") {
    out.observations.push({
      id: "static:no_liquid",
      message: { key: "static:no_liquid", values: { ...values, below: kpaDifference(-check.excessKpa) } },
    });
    return;
  }
  const excess = check.excessKpa;
  const id =
    excess <= STATIC_EXCESS_KPA.slight
      ? "static:normal"
      : excess <= STATIC_EXCESS_KPA.high
        ? "static:slightly_high"
        : excess <= STATIC_EXCESS_KPA.veryHigh
          ? "static:high"
          : "static:very_high";
  out.observations.push({
    id,
    message: {
      key: id,
      values: {
        ...values,
        excess: kpaDifference(excess),
        tolerance: kpaDifference(STATIC_EXCESS_KPA.slight),
      },
    },
  });
}
