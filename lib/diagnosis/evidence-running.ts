import { expectedBands, refrigerantInfo } from "@/lib/refrigerants";
import { CONDENSING_ABOVE_AMBIENT_K, HUMIDITY_SHIFT_MAX_K } from "@/lib/refrigerants/expected-bands";
import { saturationTemperatureOrNull as saturationOrNull, tempInTable } from "./saturation-guard";
import type { Extraction, SaturationBand } from "./evidence-types";
import { degC, kelvin, kpaGauge, plain } from "./format";
import type { DiagnosisInput } from "./schema";
import {
  FALLBACK_CONDENSING_OVER_AMBIENT_K,
  FALLBACK_EVAPORATING_C,
  HIGH_SIDE_FAR_K,
  LIFT_CLOSE_MARGIN_K,
  LOW_SIDE_FAR_BELOW_K,
  SUBCOOLING_K,
  SUPERHEAT_K,
} from "./grading";

function bandsFor(
  input: DiagnosisInput,
  barometricKpa: number,
): { high: SaturationBand; low: SaturationBand; fromTables: boolean } {
  // Skip the call when the band would leave the table (R-744 above ~0 °C ambient): it would only return null.
  const hottestC = input.ambientC + CONDENSING_ABOVE_AMBIENT_K.max + HUMIDITY_SHIFT_MAX_K;
  const bands = tempInTable(input.refrigerant, hottestC)
    ? expectedBands({
        refrigerant: input.refrigerant,
        ambientC: input.ambientC,
        relativeHumidityPct: input.relativeHumidityPct,
      })
    : null;
  if (bands) {
    const gauge = (b: typeof bands.high): SaturationBand => ({
      minSaturationC: b.minSaturationC,
      maxSaturationC: b.maxSaturationC,
      minKpaGauge: b.minKpaAbs - barometricKpa,
      maxKpaGauge: b.maxKpaAbs - barometricKpa,
    });
    return { high: gauge(bands.high), low: gauge(bands.low), fromTables: true };
  }
  return {
    high: {
      minSaturationC: input.ambientC + FALLBACK_CONDENSING_OVER_AMBIENT_K.min,
      maxSaturationC: input.ambientC + FALLBACK_CONDENSING_OVER_AMBIENT_K.max,
    },
    low: { minSaturationC: FALLBACK_EVAPORATING_C.min, maxSaturationC: FALLBACK_EVAPORATING_C.max },
    fromTables: false,
  };
}

function bandText(band: SaturationBand): string {
  const saturation = `${plain(band.minSaturationC, 1)}–${degC(band.maxSaturationC)} saturation`;
  if (band.minKpaGauge === undefined || band.maxKpaGauge === undefined) return saturation;
  return `${plain(band.minKpaGauge, 0)}–${kpaGauge(band.maxKpaGauge)} (${saturation})`;
}

/** High side, low side, their lift, subcooling and superheat. Skipped when the refrigerant is not pure. */
export function addRunningEvidence(input: DiagnosisInput, barometricKpa: number, out: Extraction): void {
  const { refrigerant, ambientC } = input;
  const bands = bandsFor(input, barometricKpa);
  const at = `for ${degC(ambientC)} ambient`;
  let condensingC: number | null = null;
  let evaporatingC: number | null = null;

  if (input.highKpaGauge !== undefined) {
    const highKpaAbs = input.highKpaGauge + barometricKpa;
    out.computed.highKpaAbs = highKpaAbs;
    out.computed.expectedHigh = bands.high;
    const critical = refrigerantInfo(refrigerant).criticalPressureKpaAbs;
    condensingC = highKpaAbs < critical ? saturationOrNull(refrigerant, highKpaAbs) : null;
    if (condensingC === null) {
      if (highKpaAbs >= critical) {
        out.computed.highSideTranscritical = true;
        out.notes.push(
          `High side ${kpaGauge(input.highKpaGauge)} is above the critical pressure of ${refrigerant}: the gas cooler runs transcritical, so there is no condensing temperature or subcooling to judge.`,
        );
      } else {
        out.notes.push(
          `High side ${kpaGauge(input.highKpaGauge)} is outside the saturation table for ${refrigerant}; it was not graded.`,
        );
      }
      out.confidenceFactor *= 0.6;
    } else {
      out.computed.condensingC = condensingC;
      out.computed.condensingApproachK = condensingC - ambientC;
      out.observedGroups.add("high_side");
      const lead = `High side ${kpaGauge(input.highKpaGauge)} (condensing at ${degC(condensingC)})`;
      const expected = `the expected ${bandText(bands.high)} ${at}`;
      if (condensingC < bands.high.minSaturationC - HIGH_SIDE_FAR_K.below)
        out.observations.push({ id: "high_side:very_low", text: `${lead} is far below ${expected}.` });
      else if (condensingC < bands.high.minSaturationC)
        out.observations.push({ id: "high_side:low", text: `${lead} is below ${expected}.` });
      else if (condensingC <= bands.high.maxSaturationC)
        out.observations.push({ id: "high_side:normal", text: `${lead} is inside ${expected}.` });
      else if (condensingC <= bands.high.maxSaturationC + HIGH_SIDE_FAR_K.above)
        out.observations.push({ id: "high_side:high", text: `${lead} is above ${expected}.` });
      else out.observations.push({ id: "high_side:very_high", text: `${lead} is far above ${expected}.` });
    }
  }

  if (input.lowKpaGauge !== undefined) {
    const lowKpaAbs = input.lowKpaGauge + barometricKpa;
    out.computed.lowKpaAbs = lowKpaAbs;
    out.computed.expectedLow = bands.low;
    evaporatingC = saturationOrNull(refrigerant, lowKpaAbs);
    if (evaporatingC !== null) out.computed.evaporatingC = evaporatingC;
    const expected = `the expected ${bandText(bands.low)}`;
    if (input.lowKpaGauge <= 0) {
      out.observedGroups.add("low_side");
      out.observations.push({
        id: "low_side:vacuum",
        text: `Low side ${kpaGauge(input.lowKpaGauge)} is at or below atmospheric pressure (vacuum) while running.`,
      });
    } else if (evaporatingC === null) {
      out.notes.push(
        `Low side ${kpaGauge(input.lowKpaGauge)} is outside the saturation table for ${refrigerant}; it was not graded.`,
      );
    } else {
      out.observedGroups.add("low_side");
      const lead = `Low side ${kpaGauge(input.lowKpaGauge)} (evaporating at ${degC(evaporatingC)})`;
      if (evaporatingC < bands.low.minSaturationC - LOW_SIDE_FAR_BELOW_K)
        out.observations.push({ id: "low_side:very_low", text: `${lead} is far below ${expected}.` });
      else if (evaporatingC < bands.low.minSaturationC)
        out.observations.push({ id: "low_side:low", text: `${lead} is below ${expected}.` });
      else if (evaporatingC <= bands.low.maxSaturationC)
        out.observations.push({ id: "low_side:normal", text: `${lead} is inside ${expected}.` });
      else out.observations.push({ id: "low_side:high", text: `${lead} is above ${expected}.` });
    }
  }

  if (condensingC !== null && evaporatingC !== null) {
    const liftK = condensingC - evaporatingC;
    out.computed.liftK = liftK;
    const smallestNormalLiftK = bands.high.minSaturationC - bands.low.maxSaturationC;
    if (liftK < smallestNormalLiftK - LIFT_CLOSE_MARGIN_K) {
      out.observations.push({
        id: "lift:close",
        text: `High and low side are close together: the compressor lifts only ${kelvin(liftK)} of saturation temperature (at least ${kelvin(smallestNormalLiftK)} expected ${at}).`,
      });
    } else {
      out.observations.push({
        id: "lift:normal",
        text: `The compressor lifts ${kelvin(liftK)} of saturation temperature, a normal spread between the sides.`,
      });
    }
  }

  if (condensingC !== null && input.liquidLineC !== undefined)
    addSubcooling(input, condensingC, input.liquidLineC, out);
  if (
    evaporatingC !== null &&
    input.lowKpaGauge !== undefined &&
    input.lowKpaGauge > 0 &&
    input.suctionLineC !== undefined
  ) {
    addSuperheat(input, evaporatingC, input.suctionLineC, out);
  }
}

function addSubcooling(
  input: DiagnosisInput,
  condensingC: number,
  liquidLineC: number,
  out: Extraction,
): void {
  const subcoolingK = condensingC - liquidLineC;
  out.computed.subcoolingK = subcoolingK;
  out.observedGroups.add("subcooling");
  const t = SUBCOOLING_K[input.expansionDevice];
  const lead = `Subcooling ${kelvin(subcoolingK)} (liquid line ${degC(liquidLineC)} against ${degC(condensingC)} condensing)`;
  if (subcoolingK <= t.none)
    out.observations.push({
      id: "subcooling:none",
      text: `${lead}: no liquid leaves the condenser with a margin.`,
    });
  else if (subcoolingK < t.low)
    out.observations.push({
      id: "subcooling:low",
      text: `${lead} is below the typical ${t.low}–${t.high} K.`,
    });
  else if (subcoolingK <= t.high)
    out.observations.push({
      id: "subcooling:normal",
      text: `${lead} is within the typical ${t.low}–${t.high} K.`,
    });
  else if (subcoolingK <= t.veryHigh)
    out.observations.push({
      id: "subcooling:high",
      text: `${lead} is above the typical ${t.low}–${t.high} K: liquid is backing up in the condenser.`,
    });
  else
    out.observations.push({
      id: "subcooling:very_high",
      text: `${lead} is far above the typical ${t.low}–${t.high} K: liquid is backing up in the condenser.`,
    });
}

function addSuperheat(
  input: DiagnosisInput,
  evaporatingC: number,
  suctionLineC: number,
  out: Extraction,
): void {
  const superheatK = suctionLineC - evaporatingC;
  out.computed.superheatK = superheatK;
  out.observedGroups.add("superheat");
  const t = SUPERHEAT_K[input.expansionDevice];
  const lead = `Superheat ${kelvin(superheatK)} (suction line ${degC(suctionLineC)} against ${degC(evaporatingC)} evaporating)`;
  const device = input.expansionDevice === "txv" ? "an expansion-valve" : "an orifice-tube";
  if (t.nearZero !== null && superheatK < t.nearZero)
    out.observations.push({
      id: "superheat:near_zero",
      text: `${lead}: the evaporator is flooding, unusual for ${device} system.`,
    });
  else if (superheatK <= t.high)
    out.observations.push({ id: "superheat:normal", text: `${lead} is normal for ${device} system.` });
  else if (superheatK <= t.veryHigh)
    out.observations.push({
      id: "superheat:high",
      text: `${lead} is high for ${device} system: the evaporator is starved.`,
    });
  else
    out.observations.push({
      id: "superheat:very_high",
      text: `${lead} is very high for ${device} system: the evaporator is badly starved.`,
    });
}
