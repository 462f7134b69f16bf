export { CAUSE_IDS, CAUSE_LABELS, CAUSE_SHORT_NAMES, CAUSE_TITLES, type CauseId } from "./causes";
export { SYMPTOM_IDS, SYMPTOM_LABELS, type SymptomId } from "./symptoms";
export { diagnosisInputSchema, type DiagnosisInput } from "./schema";
export { diagnose, type Findings, type Suspect } from "./diagnose";
export { ENGINE_VERSION, ENGINE_SEMVER } from "./engine-version";
export type { NextCheck } from "./next-check";
export type { Caution, CautionId } from "./cautions";
export type { ComputedValues } from "./evidence-types";
export type { EvidenceItem } from "./scoring";
export { CAUSE_PRIORS, LIKELIHOOD_TABLE, RANKING_GATES } from "./likelihood-table";
export {
  formatMessage,
  type Message,
  type MessageKey,
  type ReaderUnits,
  renderQuantity,
  SI_UNITS,
} from "./messages";
export type { Quantity, QuantityKind } from "./quantities";
export { type DoNotRun, type DoNotRunReason, doNotRunState, recharged, staticDeficits } from "./do-not-run";
export { type Measured, READING_GROUP_LABELS } from "./measured";
export { INPUT_LIMITS, inputLimitMessage, type LimitedField } from "./input-limits";
export {
  apportion,
  firstScreenRanking,
  type FirstScreenRanking,
  LEADING_RULE,
  leadingCount,
  type RankedCause,
  REASONS_RULE,
  type Reasons,
  strongestReasons,
} from "./first-screen";
