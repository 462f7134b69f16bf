import type { RefrigerantId } from "./catalog";
import { SaturationRangeError } from "./range-error";
import { saturationPressure } from "./saturation";
import type { ExpansionDevice } from "@/lib/vehicles/expansion-devices";

export interface PressureBand {
  minKpaAbs: number;
  maxKpaAbs: number;
  minSaturationC: number;
  maxSaturationC: number;
}

/**
 * A working system condenses some kelvin above the air crossing the condenser: the air warms on its
 * way through, and the refrigerant must sit above the warmed air to reject heat. 14…30 K matches the
 * published R-134a quick-check table (US Army TM 5-3805-291-23-1, WP 0018, Table 1), which corresponds
 * to about ambient + 14…32 K; see expected-bands.test.ts.
 */
export const CONDENSING_ABOVE_AMBIENT_K = { min: 14, max: 30 } as const;

/**
 * The evaporator runs just above freezing so its fins do not ice: a cycling switch opens near
 * −4 °C saturation (≈ 22 psig R-134a) and a steady system sits a few kelvin above 0 °C
 * (common practice).
 */
export const EVAPORATING_C = { min: -4, max: 8 } as const;

/**
 * Below this ambient a running-pressure check says little: the evaporator load is small, the two bands
 * would meet, and many systems lock the compressor out near freezing (common practice).
 */
export const EXPECTED_BANDS_MIN_AMBIENT_C = 10;

/**
 * A fixed orifice feeds a fixed flow, so on an orifice-tube system the evaporator's pressure follows the
 * load: its upper edge rises this much per kelvin of ambient above EVAPORATING_RISE_FROM_C (common
 * practice for the rise, from memory for the figures). An expansion valve holds the evaporator steadier.
 */
export const EVAPORATING_RISE = { fromC: 30, kPerK: 0.4 } as const;

/** Humid air loads the evaporator with condensing moisture, raising both sides; dry air lowers them (common practice). */
export const HUMIDITY_SHIFT_MAX_K = 2;
const NEUTRAL_RELATIVE_HUMIDITY_PCT = 50;

export function humidityShiftK(relativeHumidityPct: number | undefined): number {
  if (relativeHumidityPct === undefined || !Number.isFinite(relativeHumidityPct)) return 0;
  const fraction = (relativeHumidityPct - NEUTRAL_RELATIVE_HUMIDITY_PCT) / NEUTRAL_RELATIVE_HUMIDITY_PCT;
  return HUMIDITY_SHIFT_MAX_K * Math.min(1, Math.max(-1, fraction));
}

/**
 * Expected running pressures for this ambient, built from the saturation tables.
 * null when the tables cannot say: ambient under EXPECTED_BANDS_MIN_AMBIENT_C, or R-744 at an ambient where its high side runs transcritical.
 */
export function expectedBands(a: {
  refrigerant: RefrigerantId;
  ambientC: number;
  relativeHumidityPct?: number;
  /** orifice_tube lets the low side's upper edge rise with load; absent or txv holds it */
  meteringDevice?: ExpansionDevice;
}): { high: PressureBand; low: PressureBand } | null {
  if (!Number.isFinite(a.ambientC) || a.ambientC < EXPECTED_BANDS_MIN_AMBIENT_C) return null;
  const shiftK = humidityShiftK(a.relativeHumidityPct);
  const loadRiseK =
    a.meteringDevice === "orifice_tube"
      ? Math.max(0, a.ambientC - EVAPORATING_RISE.fromC) * EVAPORATING_RISE.kPerK
      : 0;
  try {
    return {
      high: band(
        a.refrigerant,
        a.ambientC + CONDENSING_ABOVE_AMBIENT_K.min + shiftK,
        a.ambientC + CONDENSING_ABOVE_AMBIENT_K.max + shiftK,
      ),
      low: band(a.refrigerant, EVAPORATING_C.min + shiftK, EVAPORATING_C.max + shiftK + loadRiseK),
    };
  } catch (error) {
    if (error instanceof SaturationRangeError) return null;
    throw error;
  }
}

function band(refrigerant: RefrigerantId, minSaturationC: number, maxSaturationC: number): PressureBand {
  return {
    minKpaAbs: saturationPressure(refrigerant, minSaturationC),
    maxKpaAbs: saturationPressure(refrigerant, maxSaturationC),
    minSaturationC,
    maxSaturationC,
  };
}
