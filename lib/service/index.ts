export { SERVICE_SOURCES, type ServiceSourceId } from "./sources";
export {
  type ChargeCheck,
  type ChargeTolerance,
  type ChargeVerdict,
  DEFAULT_RECOVERY_SHORTFALL_PCT,
  type RecoveredAgainstLabel,
  type TargetBasis,
  type TargetCharge,
  chargeTolerance,
  chargeWithinTolerance,
  recoveredAgainstLabel,
  targetCharge,
} from "./charge";
export {
  DEFAULT_OIL_MASS_FRACTION_PCT,
  DEFAULT_PAG_DENSITY_G_PER_ML,
  DEFAULT_PART_OIL_ALLOWANCES_ML,
  DEFAULT_SUMP_ML,
  type OilAddBack,
  type OilLine,
  type OilPulledEstimate,
  type PartOilAllowancesMl,
  REPLACED_PART_IDS,
  REPLACED_PART_LABELS,
  type ReplacedPart,
  type ReplacedPartId,
  type SumpComparison,
  estimateOilPulledMl,
  oilToAddBack,
  partOilAllowancesSchema,
} from "./oil";
export {
  type CompressorDrive,
  type OilFamily,
  type OilWarning,
  oilFamily,
  oilSuitsCompressor,
} from "./oil-type";
export {
  type Altitude,
  DEFAULT_HOLD_LIMIT,
  type EvacuationCheck,
  type EvacuationTarget,
  type HoldLimit,
  DEFAULT_SHOP_C,
  MICRON_GAUGE_TARGET_MICRONS,
  type VacuumHoldResult,
  evacuationTarget,
  evaluateEvacuation,
  vacuumHoldFromGauge,
  vacuumHoldTest,
} from "./vacuum";
export { waterSaturationKpaAbs } from "./water-boiling";
export {
  type CautionContext,
  SERVICE_CAUTIONS,
  type ServiceCaution,
  type ServiceStep,
  cautionsFor,
} from "./cautions";
export {
  type Cylinder,
  type CylinderMovement,
  type CylinderState,
  type FillLevel,
  MOVEMENT_TYPES,
  type MovementType,
  RECOVERY_CYLINDER_FILL_LIMIT_PCT,
  activeMovements,
  applyMovements,
  fillLevelCheck,
  movementEffectG,
  movementProblems,
} from "./ledger";
export {
  type PlannedMovement,
  postingsForRecordChange,
  postingsForServiceRecord,
} from "./ledger-corrections";
export {
  MONTHLY_REPORT_CSV_COLUMNS,
  monthlyReportCsvColumns,
  type MonthlyReportRow,
  monthInTimeZone,
  monthlyReport,
  toCsv,
} from "./ledger-report";
export {
  type IdentifierCheck,
  identifierCheck,
  type IdentifierReading,
  PURITY_PASS_PCT,
  refrigerantContaminated,
} from "./identifier";
export {
  type ServiceRecordContext,
  type ServiceRecordSummary,
  type ServiceRecordValues,
  summariseServiceRecord,
} from "./record-summary";
