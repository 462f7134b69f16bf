import type { InterviewAnswers } from "./answers";
import { pressureLeft, refrigerantContaminated, systemLooksEmpty, type ShopSettings } from "./branches";
import { groupForStep, type GroupId, type StepId } from "./steps";
import type { AnswerIssue } from "./issues";

/** What routing needs to know about an interview in progress. */
export interface InterviewRecord {
  answers: InterviewAnswers;
  skipped: readonly GroupId[];
  errors: Partial<Record<GroupId, AnswerIssue[]>>;
  shop: ShopSettings;
}

/** The steps this interview goes through, in order, given what has been answered so far. */
export function routeFor(answers: InterviewAnswers, shop?: ShopSettings): StepId[] {
  const route: StepId[] = ["complaint", "system", "conditions", "static"];
  const chargeStep: StepId = refrigerantContaminated(answers) ? "recoveryHeld" : "chargeAudit";
  if (systemLooksEmpty(answers, shop)) {
    route.push("leakFinding");
    if (pressureLeft(answers)) route.push("identification", chargeStep);
  } else {
    route.push("running", "behaviour", "identification", chargeStep);
  }
  route.push("findings");
  return route;
}

/** A group is settled when it holds a valid answer or was skipped, with no invalid draft waiting. */
export function groupSettled(record: InterviewRecord, group: GroupId): boolean {
  if ((record.errors[group]?.length ?? 0) > 0) return false;
  return record.answers[group] !== undefined || record.skipped.includes(group);
}

function stepSettled(record: InterviewRecord, step: StepId): boolean {
  const group = groupForStep[step];
  return group !== null && (record.answers[group] !== undefined || record.skipped.includes(group));
}

/** The route up to and including the first step not yet answered: the steps a technician may open. */
export function availableSteps(record: InterviewRecord): StepId[] {
  const available: StepId[] = [];
  for (const step of routeFor(record.answers, record.shop)) {
    available.push(step);
    if (!stepSettled(record, step)) break;
  }
  return available;
}

/** The furthest step the technician may open. */
export function furthestStep(record: InterviewRecord): StepId {
  const available = availableSteps(record);
  return available[available.length - 1] ?? "complaint";
}

/** Only the answers of groups on the current route count towards findings. */
export function answersOnRoute(answers: InterviewAnswers, shop?: ShopSettings): InterviewAnswers {
  const onRoute: InterviewAnswers = {};
  for (const step of routeFor(answers, shop)) {
    const group = groupForStep[step];
    if (group !== null && answers[group] !== undefined) {
      (onRoute as Record<GroupId, unknown>)[group] = answers[group];
    }
  }
  return onRoute;
}
