import { createActor, type Actor, type InspectionEvent } from "xstate";
import type { InterviewAnswers } from "@/lib/interview/answers";
import type { GroupId } from "@/lib/interview/steps";
import { interviewMachine } from "./interview";
import type { InterviewInput } from "./interview-context";
import { viewOf } from "./interview-view";

/* Shared by the machine's tests; not a test file itself. */

export type InterviewActor = Actor<typeof interviewMachine>;

export function startInterview(
  input?: InterviewInput,
  inspect?: (event: InspectionEvent) => void,
): InterviewActor {
  return createActor(interviewMachine, { input, inspect }).start();
}

/** True for the machine's fall-back move, taken when an answer pushes the step on screen off the route. */
export function isFallBack(event: InspectionEvent): boolean {
  return (
    event.type === "@xstate.microstep" &&
    event._transitions.some((t) => t.source.key === "interview" && t.eventType === "")
  );
}

export function stepOf(actor: InterviewActor): string {
  return String(actor.getSnapshot().value);
}

export function answer(actor: InterviewActor, group: GroupId, values: unknown): void {
  actor.send({ type: "ANSWER", group, values });
}

/** Answers the step on screen from `answers` and presses NEXT (SKIP when `answers` has nothing for it); returns the steps passed. */
export function walk(actor: InterviewActor, answers: InterviewAnswers, maxSteps = 20): string[] {
  const passed = [stepOf(actor)];
  for (let i = 0; i < maxSteps && stepOf(actor) !== "findings"; i += 1) {
    const group = viewOf(actor.getSnapshot()).group;
    if (group === null) break;
    const values = answers[group];
    if (values === undefined) actor.send({ type: "SKIP" });
    else {
      answer(actor, group, values);
      actor.send({ type: "NEXT" });
    }
    if (stepOf(actor) === passed[passed.length - 1]) break;
    passed.push(stepOf(actor));
  }
  return passed;
}
