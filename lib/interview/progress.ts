import { availableSteps, routeFor, type InterviewRecord } from "./route";
import { groupForStep, type StepId } from "./steps";

export type StepStatus = "current" | "answered" | "skipped" | "needs_fixing" | "open" | "ahead";

export interface ProgressEntry {
  step: StepId;
  status: StepStatus;
  visited: boolean;
  /** Whether GOTO may open this step now. */
  canOpen: boolean;
}

/** One entry per step on the current route, for the progress strip. */
export function progressFor(
  record: InterviewRecord,
  current: StepId,
  visited: readonly StepId[],
): ProgressEntry[] {
  const available = availableSteps(record);
  return routeFor(record.answers, record.shop).map((step) => {
    const group = groupForStep[step];
    const canOpen = available.includes(step);
    let status: StepStatus;
    if (step === current) status = "current";
    else if (group !== null && (record.errors[group]?.length ?? 0) > 0) status = "needs_fixing";
    else if (group !== null && record.skipped.includes(group)) status = "skipped";
    else if (group !== null && record.answers[group] !== undefined) status = "answered";
    else status = canOpen ? "open" : "ahead";
    return { step, status, visited: visited.includes(step), canOpen };
  });
}
