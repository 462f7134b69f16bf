import type { RefrigerantId } from "./catalog";
import { SaturationRangeError } from "./range-error";
import { saturationPressure, saturationTemperature } from "./saturation";

/** Condenser subcooling, K: Tsat(high side) − liquid-line temperature. Throws SaturationRangeError outside the table. */
export function subcoolingK(a: {
  refrigerant: RefrigerantId;
  highKpaAbs: number;
  liquidLineC: number;
}): number {
  return saturationTemperature(a.refrigerant, a.highKpaAbs) - a.liquidLineC;
}

/** Evaporator superheat, K: suction-line temperature − Tsat(low side). */
export function superheatK(a: {
  refrigerant: RefrigerantId;
  lowKpaAbs: number;
  suctionLineC: number;
}): number {
  return a.suctionLineC - saturationTemperature(a.refrigerant, a.lowKpaAbs);
}

/** Condensing approach, K: Tsat(high side) − ambient. */
export function condensingApproachK(a: {
  refrigerant: RefrigerantId;
  highKpaAbs: number;
  ambientC: number;
}): number {
  return saturationTemperature(a.refrigerant, a.highKpaAbs) - a.ambientC;
}

export type StaticCheck =
  | { kind: "valid"; saturationKpaAbs: number; excessKpa: number }
  | { kind: "no_liquid"; saturationKpaAbs: number; excessKpa: number; message: string }
  | { kind: "out_of_range"; message: string };

/**
 * With liquid present, a soaked system's pressure is set by its coldest part, which after a proper
 * soak is within a few kelvin of ambient. A static pressure below saturation at ambient minus this
 * spread cannot come from liquid at all: the system holds vapour only.
 */
export const STATIC_SOAK_SPREAD_K = 5;

/** Engine-off static pressure against saturation at ambient: an excess suggests non-condensables. */
export function staticCheck(a: {
  refrigerant: RefrigerantId;
  staticKpaAbs: number;
  ambientC: number;
}): StaticCheck {
  let saturationKpaAbs: number;
  try {
    saturationKpaAbs = saturationPressure(a.refrigerant, a.ambientC);
  } catch (error) {
    if (!(error instanceof SaturationRangeError)) throw error;
    return { kind: "out_of_range", message: `Static pressure check not possible: ${error.message}` };
  }
  const excessKpa = a.staticKpaAbs - saturationKpaAbs;
  const noLiquidBelowKpaAbs = saturationPressureOrLowest(a.refrigerant, a.ambientC - STATIC_SOAK_SPREAD_K);
  if (a.staticKpaAbs < noLiquidBelowKpaAbs) {
    return {
      kind: "no_liquid",
      saturationKpaAbs,
      excessKpa,
      message:
        "Static pressure is far below saturation at this ambient temperature: no liquid present — check not valid. The system holds vapour only (low charge or empty); weigh the charge rather than judging non-condensables here.",
    };
  }
  return { kind: "valid", saturationKpaAbs, excessKpa };
}

function saturationPressureOrLowest(refrigerant: RefrigerantId, tempC: number): number {
  try {
    return saturationPressure(refrigerant, tempC);
  } catch (error) {
    if (!(error instanceof SaturationRangeError) || error.limit !== "below") throw error;
    return saturationPressure(refrigerant, error.limitValue);
  }
}

/** Recovered minus label charge; negative means refrigerant is missing. Throws RangeError unless the label charge is above zero. */
export function chargeDeviation(a: { labelChargeG: number; recoveredChargeG: number }): {
  deltaG: number;
  deltaPct: number;
} {
  if (!(a.labelChargeG > 0) || !Number.isFinite(a.labelChargeG))
    throw new RangeError("The label charge must be a positive mass.");
  const deltaG = a.recoveredChargeG - a.labelChargeG;
  return { deltaG, deltaPct: (deltaG / a.labelChargeG) * 100 };
}

export { EXPECTED_BANDS_MIN_AMBIENT_C, expectedBands, type PressureBand } from "./expected-bands";
