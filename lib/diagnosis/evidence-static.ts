import { refrigerantInfo } from "@/lib/refrigerants";
import type { Extraction } from "./evidence-types";
import { saturationPressureOrNull, saturationTemperatureOrNull } from "@/lib/refrigerants/saturation-guard";
import { gaugeKpa, kelvin, minutes, type Quantity, tempC } from "./quantities";
import type { DiagnosisInput } from "./schema";
import { STATIC_CHECK, STATIC_EMPTY, STATIC_SOAK } from "./grading";
import type { ReadingObservationId } from "./observations";

export type SoakQuality = "measured" | "short" | "unmeasured";

/**
 * How far the static reading can be trusted: the parts' own temperature measured after a soak of
 * STATIC_SOAK.minMinutes or more is "measured"; a shorter soak, or the air temperature standing in for
 * the parts', counts for STATIC_SOAK.weakFactor of the evidence.
 */
export function soakQuality(input: Pick<DiagnosisInput, "staticSoakC" | "staticSoakMin">): SoakQuality {
  // Stryker disable next-line ConditionalExpression: equivalent, undefined < minMinutes is false
  if (input.staticSoakMin !== undefined && input.staticSoakMin < STATIC_SOAK.minMinutes) return "short";
  return input.staticSoakC !== undefined && input.staticSoakMin !== undefined ? "measured" : "unmeasured";
}

/** The temperature the static pressure is judged at: the parts' soak temperature, else the air's. */
export const staticReferenceC = (input: Pick<DiagnosisInput, "ambientC" | "staticSoakC">): number =>
  input.staticSoakC ?? input.ambientC;

/**
 * Engine-off static pressure against saturation at the temperature the parts soaked to, graded as a
 * temperature difference (Tsat of the reading − soak temperature): a kelvin means the same at 15 °C and
 * at 40 °C, where 35 kPa is 2.3 K and 1.3 K of R-134a saturation (Tillner-Roth & Baehr 1994).
 */
export function addStaticEvidence(input: DiagnosisInput, barometricKpa: number, out: Extraction): void {
  if (input.staticKpaGauge === undefined) return;
  const staticKpaAbs = input.staticKpaGauge + barometricKpa;
  out.computed.staticKpaAbs = staticKpaAbs;
  const referenceC = staticReferenceC(input);
  out.computed.staticReferenceC = referenceC;
  const reference = tempC(referenceC);
  const staticGauge = gaugeKpa(input.staticKpaGauge);
  const quality = soakQuality(input);
  const strength = quality === "measured" ? 1 : STATIC_SOAK.weakFactor;
  const soak = {
    what:
      input.staticSoakC === undefined
        ? "air temperature (the parts' was not measured)"
        : "parts' soak temperature",
    weak:
      quality === "measured"
        ? ""
        : quality === "short"
          ? " — a short soak, so this counts for less; a longer soak and a repeat will settle it"
          : " — the soak was not measured, so this counts for less",
  };
  const soakValues: Record<string, Quantity> =
    input.staticSoakMin === undefined ? {} : { soakTime: minutes(input.staticSoakMin) };

  const tooCold = referenceC < STATIC_CHECK.minReferenceC;
  const saturationKpaAbs = tooCold ? null : saturationPressureOrNull(input.refrigerant, referenceC);
  // Either condition means next to nothing is left (common practice); the 70 kPa one holds even where
  // the tables end (R-744 near its critical point).
  const emptyBelowKpaAbs = Math.max(
    STATIC_EMPTY.belowKpaGauge + barometricKpa,
    (saturationKpaAbs ?? 0) * STATIC_EMPTY.belowFractionOfSaturation,
  );
  if (!tooCold && staticKpaAbs < emptyBelowKpaAbs) {
    out.observedGroups.add("static");
    const values: Record<string, Quantity> = { static: staticGauge, reference };
    if (saturationKpaAbs !== null) {
      out.computed.staticSaturationKpaAbs = saturationKpaAbs;
      values.saturation = gaugeKpa(saturationKpaAbs - barometricKpa);
    }
    out.observations.push({ id: "static:empty", message: { key: "static:empty", values } });
    return;
  }
  if (saturationKpaAbs === null) {
    out.notes.push(
      tooCold
        ? { key: "note:static_too_cold", values: { reference, coldest: tempC(STATIC_CHECK.minReferenceC) } }
        : input.refrigerant === "R-744"
          ? {
              key: "note:static_outside_table_co2",
              values: {
                ambient: reference,
                critical: { ...tempC(refrigerantInfo("R-744").criticalTempC), decimals: 0 },
              },
            }
          : {
              key: "note:static_outside_table",
              values: { ambient: reference },
              words: { refrigerant: input.refrigerant },
            },
    );
    return;
  }
  out.computed.staticSaturationKpaAbs = saturationKpaAbs;
  out.computed.staticExcessKpa = staticKpaAbs - saturationKpaAbs;
  const saturation = gaugeKpa(saturationKpaAbs - barometricKpa);
  out.observedGroups.add("static");

  const staticSaturationC = saturationTemperatureOrNull(input.refrigerant, staticKpaAbs);
  if (staticSaturationC === null) {
    out.notes.push({
      key: "note:static_outside_table",
      values: { ambient: reference },
      words: { refrigerant: input.refrigerant },
    });
    out.observedGroups.delete("static");
    return;
  }
  const excessK = staticSaturationC - referenceC;
  out.computed.staticExcessK = excessK;
  const id: ReadingObservationId =
    excessK < -STATIC_CHECK.noLiquidBelowK
      ? "static:no_liquid"
      : excessK <= STATIC_CHECK.normalUpToK
        ? "static:normal"
        : excessK <= STATIC_CHECK.highAboveK
          ? "static:slightly_high"
          : excessK <= STATIC_CHECK.veryHighAboveK
            ? "static:high"
            : "static:very_high";
  out.observations.push({
    id,
    // A short or unmeasured soak weakens what the reading says about air, not whether liquid is left.
    strength: id === "static:no_liquid" ? 1 : strength,
    message: {
      key: id,
      values: {
        static: staticGauge,
        reference,
        saturation,
        excess: kelvin(Math.abs(excessK)),
        tolerance: kelvin(STATIC_CHECK.normalUpToK),
        ...soakValues,
      },
      words: soak,
    },
  });
}
