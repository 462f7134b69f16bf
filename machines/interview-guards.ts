import * as branches from "@/lib/interview/branches";
import { availableSteps, furthestStep, groupSettled } from "@/lib/interview/route";
import { groupForStep, isOptionalGroup, type GroupId, type StepId } from "@/lib/interview/steps";
import type { InterviewContext } from "./interview-context";

/* Small pure predicates; interview.ts wires them into the machine. */

/** The group holds a valid answer or was skipped, and no invalid draft is waiting. */
export function groupReady(context: InterviewContext, group: GroupId): boolean {
  return groupSettled(context, group);
}

/** Static pressure at about 0 kPa gauge, or too far below saturation at ambient for liquid to remain. */
export function systemLooksEmpty(context: InterviewContext): boolean {
  return branches.systemLooksEmpty(context.answers, context.shop);
}

/** Some vapour remains in an empty-looking system, so it is identified (and recovered) before repair. */
export function pressureLeft(context: InterviewContext): boolean {
  return branches.pressureLeft(context.answers);
}

/** Identifier purity below the pass mark (lib/service/identifier.ts) or a hydrocarbon flag. */
export function refrigerantContaminated(context: InterviewContext): boolean {
  return branches.refrigerantContaminated(context.answers);
}

export function currentStepOptional(context: InterviewContext): boolean {
  const group = groupForStep[context.step];
  return group !== null && isOptionalGroup(group);
}

/** GOTO opens only a step on the current route that every earlier step has been answered (or skipped) for. */
export function mayOpen(context: InterviewContext, step: StepId): boolean {
  return availableSteps(context).includes(step);
}

export function resumesAt(context: InterviewContext, step: StepId): boolean {
  return context.resumeStep === step;
}

/** After an answer re-routes the interview past the step on screen, fall back to the furthest step still open. */
export function mustFallBackTo(context: InterviewContext, step: StepId): boolean {
  return !mayOpen(context, context.step) && furthestStep(context) === step;
}
