export type { MassUnit, PressureUnit, TemperatureUnit, VolumeUnit } from "./factors";
export {
  massFromG,
  massToG,
  pressureFromKpa,
  pressureToKpa,
  temperatureDifferenceFromK,
  temperatureDifferenceToK,
  temperatureFromC,
  temperatureToC,
  volumeFromMl,
  volumeToMl,
} from "./convert";
export {
  absoluteToGaugeKpa,
  type BarometricSource,
  barometricKpa,
  gaugeToAbsoluteKpa,
  kpaAbsToVacuumInHg,
  STANDARD_ATMOSPHERE_KPA,
  standardBarometricKpa,
  vacuumInHgToKpaAbs,
} from "./barometric";
export { type ParsedQuantity, parseQuantity, type QuantityKind } from "./parse";
export {
  formatMass,
  formatPressure,
  formatTemperature,
  formatTemperatureDifference,
  formatVolume,
} from "./format";
