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
export {
  ambiguityQuestion,
  normaliseNumbers,
  numberConventions,
  readNumberToken,
  type ReadNumber,
} from "./number";
export {
  deepestVacuumInHg,
  formatVacuum,
  KPA_PER_VACUUM_UNIT,
  parseVacuum,
  VACUUM_EXAMPLES,
  vacuumFieldText,
  vacuumFromKpaAbs,
  type VacuumReading,
  type VacuumUnit,
} from "./vacuum";
export {
  isUnitOf,
  READER_QUANTITIES,
  type ReaderQuantity,
  type ReaderUnits,
  readerUnitsOf,
  UNIT_CHOICES,
  UNIT_LABELS,
  type UnitChoice,
  type UnitSystem,
  unitSystems,
  unitsOfSystem,
} from "./reader";
export {
  formatMassGrouped,
  formatQuantity,
  gaugeKpaQuantity,
  massGQuantity,
  type Quantity,
  type QuantityKind as MeasuredKind,
  quantityMarker,
  quantityParts,
  quantityRangeMarker,
  sayInUnits,
  SI_READER_UNITS,
  tempCQuantity,
  vacuumKpaAbsQuantity,
  volumeMlQuantity,
} from "./quantity";
