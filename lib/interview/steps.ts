/** The interview's steps and the answer group each one asks. */
export const stepIds = [
  "complaint",
  "system",
  "conditions",
  "static",
  "running",
  "behaviour",
  "leakFinding",
  "identification",
  "chargeAudit",
  "recoveryHeld",
  "findings",
] as const;
export type StepId = (typeof stepIds)[number];

export const groupIds = [
  "complaint",
  "system",
  "conditions",
  "static",
  "running",
  "behaviour",
  "identification",
  "chargeAudit",
  "leakFinding",
] as const;
export type GroupId = (typeof groupIds)[number];

/** The answer group a step collects; `recoveryHeld` still records the charge audit, `findings` asks nothing. */
export const groupForStep: Record<StepId, GroupId | null> = {
  complaint: "complaint",
  system: "system",
  conditions: "conditions",
  static: "static",
  running: "running",
  behaviour: "behaviour",
  leakFinding: "leakFinding",
  identification: "identification",
  chargeAudit: "chargeAudit",
  recoveryHeld: "chargeAudit",
  findings: null,
};

/** Groups that may be skipped; a skip lowers the findings' confidence instead of blocking. */
export const optionalGroups: readonly GroupId[] = [
  "static",
  "running",
  "behaviour",
  "identification",
  "chargeAudit",
  "leakFinding",
];

export function isStepId(value: unknown): value is StepId {
  return typeof value === "string" && (stepIds as readonly string[]).includes(value);
}

export function isGroupId(value: unknown): value is GroupId {
  return typeof value === "string" && (groupIds as readonly string[]).includes(value);
}

export function isOptionalGroup(group: GroupId): boolean {
  return optionalGroups.includes(group);
}

/**
 * Each step's one name, in the trade's words where it has them: the step's heading, its entry in the
 * progress strip, and what the browser tests look for. The id is the machine's state name.
 */
export const STEP_LABELS: Readonly<Record<StepId, string>> = {
  complaint: "Complaint",
  system: "Vehicle system",
  conditions: "Conditions",
  static: "Static pressure",
  running: "Running readings",
  behaviour: "Behaviour",
  leakFinding: "Leak search",
  identification: "Refrigerant identification",
  chargeAudit: "Charge audit",
  recoveryHeld: "Recovery on hold",
  findings: "Findings",
};
