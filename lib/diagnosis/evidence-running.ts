import { expectedBands, refrigerantInfo } from "@/lib/refrigerants";
import { CONDENSING_ABOVE_AMBIENT_K, HUMIDITY_SHIFT_MAX_K } from "@/lib/refrigerants/expected-bands";
import {
  saturationTemperatureOrNull as saturationOrNull,
  tempInTable,
} from "@/lib/refrigerants/saturation-guard";
import type { Extraction, SaturationBand } from "./evidence-types";
import type { ReadingObservationId } from "./observations";
import { gaugeKpa, kelvin, type Quantity, tempC } from "./quantities";
import type { DiagnosisInput } from "./schema";
import { standardBarometricKpa } from "@/lib/units/barometric";
import {
  CYCLING,
  FALLBACK_CONDENSING_OVER_AMBIENT_K,
  FALLBACK_EVAPORATING_C,
  HIGH_SIDE_FAR_K,
  LIFT_CLOSE_MARGIN_K,
  LOW_SIDE_FAR_BELOW_K,
  SUBCOOLING_K,
  SUPERHEAT_K,
  SUPERHEAT_LOAD,
} from "./grading";

function bandsFor(
  input: DiagnosisInput,
  barometricKpa: number,
): { high: SaturationBand; low: SaturationBand } {
  // Skip the call when the band would leave the table (R-744 above ~0 °C ambient): it would only return null.
  // Stryker disable next-line ArithmeticOperator: equivalent, a speed guard; expectedBands returns null wherever it skips
  const hottestC = input.ambientC + CONDENSING_ABOVE_AMBIENT_K.max + HUMIDITY_SHIFT_MAX_K;
  const bands = tempInTable(input.refrigerant, hottestC)
    ? expectedBands({
        refrigerant: input.refrigerant,
        ambientC: input.ambientC,
        relativeHumidityPct: input.relativeHumidityPct,
        meteringDevice: input.expansionDevice,
      })
    : null;
  if (bands) {
    const gauge = (b: typeof bands.high): SaturationBand => ({
      minSaturationC: b.minSaturationC,
      maxSaturationC: b.maxSaturationC,
      minKpaGauge: b.minKpaAbs - barometricKpa,
      maxKpaGauge: b.maxKpaAbs - barometricKpa,
    });
    return { high: gauge(bands.high), low: gauge(bands.low) };
  }
  return {
    high: {
      minSaturationC: input.ambientC + FALLBACK_CONDENSING_OVER_AMBIENT_K.min,
      maxSaturationC: input.ambientC + FALLBACK_CONDENSING_OVER_AMBIENT_K.max,
    },
    low: {
      minSaturationC: FALLBACK_EVAPORATING_C.min,
      maxSaturationC: FALLBACK_EVAPORATING_C.max,
    },
  };
}

function bandValues(band: SaturationBand, ambientC: number): Record<string, Quantity> {
  const values: Record<string, Quantity> = {
    bandMinSat: tempC(band.minSaturationC),
    bandMaxSat: tempC(band.maxSaturationC),
    ambient: tempC(ambientC),
  };
  // Stryker disable next-line LogicalOperator,ConditionalExpression: equivalent, bandsFor sets both edges or neither
  if (band.minKpaGauge !== undefined && band.maxKpaGauge !== undefined) {
    values.bandMin = gaugeKpa(band.minKpaGauge);
    values.bandMax = gaugeKpa(band.maxKpaGauge);
  }
  return values;
}

/** High side, low side, their lift, subcooling and superheat. Skipped when the refrigerant is not pure. */
export function addRunningEvidence(input: DiagnosisInput, barometricKpa: number, out: Extraction): void {
  const { refrigerant, ambientC } = input;
  const bands = bandsFor(input, barometricKpa);
  const words = { refrigerant };
  let condensingC: number | null = null;
  let evaporatingC: number | null = null;

  if (input.highKpaGauge !== undefined) {
    const highKpaAbs = input.highKpaGauge + barometricKpa;
    out.computed.highKpaAbs = highKpaAbs;
    out.computed.expectedHigh = bands.high;
    const critical = refrigerantInfo(refrigerant).criticalPressureKpaAbs;
    condensingC = highKpaAbs < critical ? saturationOrNull(refrigerant, highKpaAbs) : null;
    const high = gaugeKpa(input.highKpaGauge);
    if (condensingC === null) {
      if (highKpaAbs >= critical) {
        out.computed.highSideTranscritical = true;
        out.notes.push({ key: "note:transcritical", values: { high }, words });
      } else {
        out.notes.push({ key: "note:high_outside_table", values: { high }, words });
      }
    } else {
      out.computed.condensingC = condensingC;
      out.computed.condensingApproachK = condensingC - ambientC;
      out.observedGroups.add("high_side");
      const id: ReadingObservationId =
        condensingC < bands.high.minSaturationC - HIGH_SIDE_FAR_K.below
          ? "high_side:very_low"
          : condensingC < bands.high.minSaturationC
            ? "high_side:low"
            : condensingC <= bands.high.maxSaturationC
              ? "high_side:normal"
              : condensingC <= bands.high.maxSaturationC + HIGH_SIDE_FAR_K.above
                ? "high_side:high"
                : "high_side:very_high";
      out.observations.push({
        id,
        message: {
          key: id,
          values: { high, condensing: tempC(condensingC), ...bandValues(bands.high, ambientC) },
        },
      });
    }
  }

  if (input.lowKpaGauge !== undefined) {
    const lowKpaAbs = input.lowKpaGauge + barometricKpa;
    out.computed.lowKpaAbs = lowKpaAbs;
    out.computed.expectedLow = bands.low;
    evaporatingC = saturationOrNull(refrigerant, lowKpaAbs);
    if (evaporatingC !== null) out.computed.evaporatingC = evaporatingC;
    const low = gaugeKpa(input.lowKpaGauge);
    if (input.lowKpaGauge <= 0) {
      out.observedGroups.add("low_side");
      out.observations.push({ id: "low_side:vacuum", message: { key: "low_side:vacuum", values: { low } } });
    } else if (evaporatingC === null) {
      out.notes.push({ key: "note:low_outside_table", values: { low }, words });
    } else if (!snapshotInSwing(input, evaporatingC)) {
      out.observedGroups.add("low_side");
      const id: ReadingObservationId =
        evaporatingC < bands.low.minSaturationC - LOW_SIDE_FAR_BELOW_K
          ? "low_side:very_low"
          : evaporatingC < bands.low.minSaturationC
            ? "low_side:low"
            : evaporatingC <= bands.low.maxSaturationC
              ? "low_side:normal"
              : "low_side:high";
      const cycling = input.compressorType === "cycling_clutch";
      out.observations.push({
        id,
        // A cycling clutch swings the low side between cut-out and cut-in: one reading counts for half.
        ...(cycling ? { strength: CYCLING.snapshotStrength } : {}),
        message: {
          key: id,
          values: { low, evaporating: tempC(evaporatingC), ...bandValues(bands.low, ambientC) },
        },
      });
      if (cycling) out.notes.push({ key: "note:low_side_in_swing" });
    } else {
      out.notes.push({ key: "note:low_side_graded_at_cut_points" });
    }
  }

  // Physics before priors: a short charge lowers both sides, so a high low side with a low high side is
  // a compressor that is not pumping, whatever the odds of an undercharge.
  const graded = new Set(out.observations.map((o) => o.id));
  if (graded.has("low_side:high") && (graded.has("high_side:low") || graded.has("high_side:very_low"))) {
    out.observations.push({
      id: "pattern:compressor_not_pumping",
      message: {
        key: "pattern:compressor_not_pumping",
        values: { high: gaugeKpa(input.highKpaGauge ?? 0), low: gaugeKpa(input.lowKpaGauge ?? 0) },
      },
    });
  }

  if (condensingC !== null && evaporatingC !== null) {
    const liftK = condensingC - evaporatingC;
    out.computed.liftK = liftK;
    const smallestNormalLiftK = bands.high.minSaturationC - bands.low.maxSaturationC;
    const id = liftK < smallestNormalLiftK - LIFT_CLOSE_MARGIN_K ? "lift:close" : "lift:normal";
    out.observations.push({
      id,
      message: {
        key: id,
        values: { lift: kelvin(liftK), minLift: kelvin(smallestNormalLiftK), ambient: tempC(ambientC) },
      },
    });
  }

  if (condensingC !== null && input.liquidLineC !== undefined)
    addSubcooling(input, condensingC, input.liquidLineC, out);
  if (
    evaporatingC !== null &&
    // Stryker disable next-line ConditionalExpression: equivalent, an evaporating temperature implies a low side
    input.lowKpaGauge !== undefined &&
    input.lowKpaGauge > 0 &&
    input.suctionLineC !== undefined
  ) {
    addSuperheat(input, evaporatingC, input.suctionLineC, out);
  }
}

/**
 * On a cycling clutch with its cut-out and cut-in recorded, a single low-side reading inside the swing
 * says nothing more; one well below the cut-out does (the switch should have opened).
 */
function snapshotInSwing(input: DiagnosisInput, evaporatingC: number): boolean {
  // Stryker disable next-line ConditionalExpression: equivalent, a missing cut-out gives a null saturation below
  if (input.compressorType !== "cycling_clutch" || input.lowCutOutKpaGauge === undefined) return false;
  if (input.lowCutInKpaGauge === undefined) return false;
  const cutOutC = saturationOrNull(input.refrigerant, input.lowCutOutKpaGauge + barometricOf(input));
  return cutOutC !== null && evaporatingC >= cutOutC - CYCLING.marginK;
}

const barometricOf = (input: DiagnosisInput) => standardBarometricKpa(input.altitudeM ?? 0);

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
  const id: ReadingObservationId =
    subcoolingK <= t.none
      ? "subcooling:none"
      : subcoolingK < t.low
        ? "subcooling:low"
        : subcoolingK <= t.high
          ? "subcooling:normal"
          : subcoolingK <= t.veryHigh
            ? "subcooling:high"
            : "subcooling:very_high";
  out.observations.push({
    id,
    message: {
      key: id,
      values: {
        subcooling: kelvin(subcoolingK),
        liquid: tempC(liquidLineC),
        condensing: tempC(condensingC),
        typicalMin: kelvin(t.low),
        typicalMax: kelvin(t.high),
      },
    },
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
  // At high load a fixed orifice cannot keep the evaporator fed, so its outlet superheats more.
  const loadK =
    input.expansionDevice === "orifice_tube"
      ? Math.max(0, input.ambientC - SUPERHEAT_LOAD.fromC) * SUPERHEAT_LOAD.kPerK
      : 0;
  const id: ReadingObservationId =
    t.nearZero !== null && superheatK < t.nearZero
      ? "superheat:near_zero"
      : superheatK <= t.high + loadK
        ? "superheat:normal"
        : superheatK <= t.veryHigh + loadK
          ? "superheat:high"
          : "superheat:very_high";
  out.observations.push({
    id,
    message: {
      key: id,
      values: {
        superheat: kelvin(superheatK),
        suction: tempC(suctionLineC),
        evaporating: tempC(evaporatingC),
      },
      words: { device: input.expansionDevice === "txv" ? "an expansion-valve" : "an orifice-tube" },
    },
  });
}
