import { standardBarometricKpa } from "@/lib/units/barometric";
import { refrigerantInfo, type RefrigerantId } from "./catalog";
import { saturationTemperatureOrNull } from "./saturation-guard";

/*
 * The one path from a running reading set to its physics: saturation temperatures on each side, the
 * condensing approach, the compressor's lift, subcooling and superheat. The interview's live readouts
 * and the findings engine both take their numbers from here, so the screen and the findings agree.
 */

/** One running reading set in internal units: kPa gauge, °C; every reading optional. */
export interface RunningReadings {
  refrigerant: RefrigerantId;
  /** the case's or the shop's altitude, m; sea level when absent */
  altitudeM?: number;
  ambientC?: number;
  highKpaGauge?: number;
  lowKpaGauge?: number;
  liquidLineC?: number;
  suctionLineC?: number;
}

/** What the readings give; a value is absent when a reading is missing or lies outside the tables. */
export interface RunningPhysics {
  barometricKpa: number;
  highKpaAbs?: number;
  lowKpaAbs?: number;
  /** the high side is at or above the critical pressure: no condensing temperature, no subcooling */
  highSideTranscritical?: boolean;
  /** Tsat(high side), °C */
  condensingC?: number;
  /** Tsat(low side), °C */
  evaporatingC?: number;
  /** condensing temperature over the air, K */
  condensingApproachK?: number;
  /** condensing minus evaporating temperature: what the compressor lifts, K */
  liftK?: number;
  /** Tsat(high side) − liquid-line temperature, K */
  subcoolingK?: number;
  /** suction-line temperature − Tsat(low side), K */
  superheatK?: number;
}

const finite = (value: number | undefined): value is number => value !== undefined && Number.isFinite(value);

/**
 * The physics of a running reading set. Gauge readings become absolute with the standard atmosphere at
 * the altitude (US Standard Atmosphere 1976 through lib/units); saturation comes from the bundled tables.
 * Throws RangeError only for an altitude outside the standard atmosphere's range.
 */
export function runningPhysics(r: RunningReadings): RunningPhysics {
  const barometricKpa = standardBarometricKpa(r.altitudeM ?? 0);
  const out: RunningPhysics = { barometricKpa };
  if (finite(r.highKpaGauge)) {
    const highKpaAbs = r.highKpaGauge + barometricKpa;
    out.highKpaAbs = highKpaAbs;
    if (highKpaAbs >= refrigerantInfo(r.refrigerant).criticalPressureKpaAbs) out.highSideTranscritical = true;
    else {
      const condensingC = saturationTemperatureOrNull(r.refrigerant, highKpaAbs);
      if (condensingC !== null) out.condensingC = condensingC;
    }
  }
  if (finite(r.lowKpaGauge)) {
    const lowKpaAbs = r.lowKpaGauge + barometricKpa;
    out.lowKpaAbs = lowKpaAbs;
    const evaporatingC = saturationTemperatureOrNull(r.refrigerant, lowKpaAbs);
    if (evaporatingC !== null) out.evaporatingC = evaporatingC;
  }
  const { condensingC, evaporatingC } = out;
  if (condensingC !== undefined) {
    if (finite(r.ambientC)) out.condensingApproachK = condensingC - r.ambientC;
    if (finite(r.liquidLineC)) out.subcoolingK = condensingC - r.liquidLineC;
  }
  if (evaporatingC !== undefined && finite(r.suctionLineC)) out.superheatK = r.suctionLineC - evaporatingC;
  if (condensingC !== undefined && evaporatingC !== undefined) out.liftK = condensingC - evaporatingC;
  return out;
}
