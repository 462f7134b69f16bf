import type { Extraction } from "./evidence-types";
import { CYCLING } from "./grading";
import type { ReadingObservationId } from "./observations";
import { gaugeKpa, tempC } from "./quantities";
import { saturationTemperatureOrNull } from "@/lib/refrigerants/saturation-guard";
import type { DiagnosisInput } from "./schema";
import { SYMPTOM_LABELS } from "./symptoms";

/** Symptoms about the clutch and belt that this module reads in the light of the compressor type. */
export const CLUTCH_SYMPTOMS = new Set([
  "clutch_not_cycling",
  "clutch_rapid_cycling",
  "clutch_or_belt_slipping",
]);

/**
 * Clutch evidence only where it applies. A clutch that never switches off is normal on a
 * variable-displacement or electric compressor and at high load; it points to icing only on a
 * cycling-clutch system in mild weather with the low side below a cycling switch's cut-out. On a cycling
 * clutch, the low side at cut-out and at cut-in is graded against the switch's usual points (common
 * practice: opens near 22–25 psig, closes near 45–47 psig R-134a; the same evaporator temperatures for
 * R-1234yf, computed).
 */
export function addClutchEvidence(input: DiagnosisInput, barometricKpa: number, out: Extraction): void {
  const symptoms = new Set(input.symptoms ?? []);
  const type = input.compressorType;
  const ambient = tempC(input.ambientC);
  const evaporatingC = out.computed.evaporatingC;

  if (symptoms.has("clutch_not_cycling")) {
    if (type === "variable_displacement") out.notes.push({ key: "note:never_cycles_variable" });
    else if (type === "electric") out.notes.push({ key: "note:never_cycles_electric" });
    else if (type === undefined) out.notes.push({ key: "note:never_cycles_type_unknown" });
    else if (input.ambientC > CYCLING.mildAmbientMaxC)
      out.notes.push({
        key: "note:never_cycles_high_load",
        values: { ambient, mildMax: tempC(CYCLING.mildAmbientMaxC) },
      });
    else if (evaporatingC === undefined && !(input.lowKpaGauge !== undefined && input.lowKpaGauge <= 0))
      out.notes.push({ key: "note:never_cycles_low_side_unknown" });
    else if (evaporatingC !== undefined && evaporatingC >= CYCLING.cutOutC.min)
      out.notes.push({
        key: "note:never_cycles_low_side_above",
        values: { evaporating: tempC(evaporatingC), cutOut: tempC(CYCLING.cutOutC.min) },
      });
    else
      out.observations.push({
        id: "symptom:clutch_not_cycling",
        message: {
          key: "clutch:never_cycles_icing",
          values: { ambient, cutOut: tempC(CYCLING.cutOutC.min) },
        },
      });
  }

  for (const symptom of ["clutch_rapid_cycling", "clutch_or_belt_slipping"] as const) {
    if (!symptoms.has(symptom)) continue;
    if (type === "electric") {
      out.notes.push({
        key: "note:no_clutch_electric",
        words: { symptom: SYMPTOM_LABELS[symptom].toLowerCase() },
      });
      continue;
    }
    // A variable-displacement compressor cycles its clutch only for protection: half the weight.
    const strength =
      symptom === "clutch_rapid_cycling" && type === "variable_displacement"
        ? CYCLING.variableRapidCyclingStrength
        : 1;
    const id = `symptom:${symptom}` as const;
    out.observations.push({ id, message: { key: id }, ...(strength < 1 ? { strength } : {}) });
  }

  if (input.lowCutOutKpaGauge === undefined || input.lowCutInKpaGauge === undefined) return;
  if (type !== "cycling_clutch") {
    out.notes.push({ key: "note:cycling_points_not_cycling" });
    return;
  }
  const cutOutC = saturationTemperatureOrNull(input.refrigerant, input.lowCutOutKpaGauge + barometricKpa);
  const cutInC = saturationTemperatureOrNull(input.refrigerant, input.lowCutInKpaGauge + barometricKpa);
  if (cutOutC === null || cutInC === null) return;
  out.computed.cutOutC = cutOutC;
  out.computed.cutInC = cutInC;
  out.observedGroups.add("cycling");
  const { marginK } = CYCLING;
  const id: ReadingObservationId =
    cutOutC < CYCLING.cutOutC.min - marginK
      ? "cycling:opens_late"
      : cutOutC > CYCLING.cutOutC.max + marginK
        ? "cycling:opens_early"
        : cutInC > CYCLING.cutInC.max + marginK
          ? "cycling:closes_late"
          : "cycling:normal";
  out.observations.push({
    id,
    message: {
      key: id,
      values: {
        cutOut: gaugeKpa(input.lowCutOutKpaGauge),
        cutIn: gaugeKpa(input.lowCutInKpaGauge),
        cutOutSat: tempC(cutOutC),
        cutInSat: tempC(cutInC),
        cutOutMin: tempC(CYCLING.cutOutC.min),
        cutOutMax: tempC(CYCLING.cutOutC.max),
        cutInMin: tempC(CYCLING.cutInC.min),
        cutInMax: tempC(CYCLING.cutInC.max),
      },
    },
  });
}
