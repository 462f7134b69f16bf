import type { Message } from "./messages";
import type { ObservationId, ReadingGroup } from "./observations";

export interface Observation {
  id: ObservationId;
  /** What was seen, with its numbers as quantities (formatMessage renders it). */
  message: Message;
  /** How much of the table's weight this reading earns, (0, 1]; 1 when absent (a short soak weakens it). */
  strength?: number;
}

export interface SaturationBand {
  minSaturationC: number;
  maxSaturationC: number;
  minKpaGauge?: number;
  maxKpaGauge?: number;
}

/** Values derived from the physics core that the engine used; absent when a reading was missing. */
export interface ComputedValues {
  barometricKpa: number;
  highKpaAbs?: number;
  lowKpaAbs?: number;
  staticKpaAbs?: number;
  condensingC?: number;
  evaporatingC?: number;
  condensingApproachK?: number;
  liftK?: number;
  subcoolingK?: number;
  superheatK?: number;
  staticSaturationKpaAbs?: number;
  staticExcessKpa?: number;
  /** Tsat(static) − the temperature the static is judged at, K */
  staticExcessK?: number;
  /** the parts' soak temperature, or the air's when that was not measured */
  staticReferenceC?: number;
  expectedHigh?: SaturationBand;
  expectedLow?: SaturationBand;
  /** the coldest a working system's centre vent should read for this air, and the air's wet bulb, °C */
  ventColdMaxC?: number;
  wetBulbC?: number;
  chargeDeltaG?: number;
  chargeDeltaPct?: number;
  highSideTranscritical?: boolean;
  /** saturation temperatures of the low side at clutch cut-out and cut-in, °C */
  cutOutC?: number;
  cutInC?: number;
}

export interface Extraction {
  observations: Observation[];
  /** Facts that moved no score but matter to the reader (a skipped check, a transcritical high side). */
  notes: Message[];
  computed: ComputedValues;
  /** Reading groups that were measured and usable. */
  observedGroups: Set<ReadingGroup>;
}
