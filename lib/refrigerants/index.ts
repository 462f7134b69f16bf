export {
  REFRIGERANT_IDS,
  REFRIGERANT_LABELS,
  type RefrigerantId,
  type RefrigerantInfo,
  SERVICE_REFRIGERANT_IDS,
  type ServiceRefrigerantId,
  isRefrigerantId,
  isServiceRefrigerant,
  refrigerantInfo,
} from "./catalog";
export { SaturationRangeError, type SaturationLimit, type SaturationQuantity } from "./range-error";
export { saturationPressure, saturationTemperature } from "./saturation";
export {
  chargeDeviation,
  condensingApproachK,
  EXPECTED_BANDS_MIN_AMBIENT_C,
  expectedBands,
  type PressureBand,
  STATIC_SOAK_SPREAD_K,
  type StaticCheck,
  staticCheck,
  subcoolingK,
  superheatK,
} from "./derived";
