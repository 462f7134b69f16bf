export { REFRIGERANT_IDS, type RefrigerantId, type RefrigerantInfo, isRefrigerantId, refrigerantInfo } from "./catalog";
export { SaturationRangeError, type SaturationLimit, type SaturationQuantity } from "./range-error";
export { saturationPressure, saturationTemperature } from "./saturation";
