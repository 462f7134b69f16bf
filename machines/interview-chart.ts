import type { GroupId, StepId } from "@/lib/interview/steps";
import type { InterviewContext } from "./interview-context";
import * as guards from "./interview-guards";

/*
 * The interview's moves as data: for each step, where NEXT and BACK lead and on what condition. One
 * chart, read by two runners that must agree: interview.ts builds the xstate machine from it (the
 * model the machine's tests and path walks explore), and interview-runner.ts runs it on the phone
 * without the xstate library. interview-runner.test.ts drives both with the same generated events and
 * fails on any difference in step, context or the moves on offer.
 */

/** A condition on the context: a branch rule, its negation, or "this group is settled". */
export type Condition =
  | "systemLooksEmpty"
  | "pressureLeft"
  | "refrigerantContaminated"
  | { not: "pressureLeft" }
  | { ready: GroupId };

/** Taken when every condition holds; the first such move of a list wins. */
export interface Move {
  when: readonly Condition[];
  target: StepId;
}

const ready = (group: GroupId): Condition => ({ ready: group });
const after = (group: GroupId, target: StepId): Move[] => [{ when: [ready(group)], target }];

export const NEXT_MOVES: Readonly<Record<StepId, readonly Move[]>> = {
  complaint: after("complaint", "system"),
  system: after("system", "conditions"),
  conditions: after("conditions", "static"),
  static: [
    { when: [ready("static"), "systemLooksEmpty"], target: "leakFinding" },
    { when: [ready("static")], target: "running" },
  ],
  running: after("running", "behaviour"),
  behaviour: after("behaviour", "identification"),
  leakFinding: [
    { when: [ready("leakFinding"), "pressureLeft"], target: "identification" },
    { when: [ready("leakFinding")], target: "findings" },
  ],
  identification: [
    { when: [ready("identification"), "refrigerantContaminated"], target: "recoveryHeld" },
    { when: [ready("identification")], target: "chargeAudit" },
  ],
  chargeAudit: after("chargeAudit", "findings"),
  recoveryHeld: after("chargeAudit", "findings"),
  findings: [],
};

const back = (target: StepId): Move[] => [{ when: [], target }];

export const BACK_MOVES: Readonly<Record<StepId, readonly Move[]>> = {
  complaint: [],
  system: back("complaint"),
  conditions: back("system"),
  static: back("conditions"),
  running: back("static"),
  behaviour: back("running"),
  leakFinding: back("static"),
  identification: [
    { when: ["systemLooksEmpty"], target: "leakFinding" },
    { when: [], target: "behaviour" },
  ],
  chargeAudit: back("identification"),
  recoveryHeld: back("identification"),
  findings: [
    { when: ["systemLooksEmpty", { not: "pressureLeft" }], target: "leakFinding" },
    { when: ["refrigerantContaminated"], target: "recoveryHeld" },
    { when: [], target: "chargeAudit" },
  ],
};

export function holds(condition: Condition, context: InterviewContext): boolean {
  if (typeof condition === "string") return guards[condition](context);
  if ("not" in condition) return !guards[condition.not](context);
  return guards.groupReady(context, condition.ready);
}

/** The first move whose conditions all hold, if any. */
export function firstMove(moves: readonly Move[], context: InterviewContext): Move | undefined {
  return moves.find((move) => move.when.every((condition) => holds(condition, context)));
}
