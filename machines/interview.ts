import { and, assign, not, raise, setup } from "xstate";
import { stepIds, type GroupId, type StepId } from "@/lib/interview/steps";
import { applyAnswer, applyEnterStep, applySkip, applyTyping } from "./interview-actions";
import {
  createInterviewContext,
  type InterviewContext,
  type InterviewEvent,
  type InterviewInput,
} from "./interview-context";
import * as guards from "./interview-guards";
import { BACK_MOVES, NEXT_MOVES, type Condition, type Move } from "./interview-chart";

const enter = (step: StepId) => ({ type: "enterStep", params: { step } }) as const;

type GuardRef =
  | "systemLooksEmpty"
  | "pressureLeft"
  | "refrigerantContaminated"
  | { type: "groupReady"; params: { group: GroupId } }
  | ReturnType<typeof not>;

function guardOf(condition: Condition): GuardRef {
  if (typeof condition === "string") return condition;
  if ("not" in condition) return not(condition.not);
  return { type: "groupReady", params: { group: condition.ready } };
}

/** A move of the chart (interview-chart.ts) as an xstate transition. */
function transitionOf(move: Move) {
  const [only, ...more] = move.when.map(guardOf);
  const guard = only === undefined ? undefined : more.length === 0 ? only : and([only, ...more]);
  return guard === undefined ? { target: move.target } : { guard, target: move.target };
}

type StepMoves = { NEXT?: ReturnType<typeof transitionOf>[]; BACK?: ReturnType<typeof transitionOf>[] };

/** Each step: its entry records it, NEXT and BACK follow the chart. */
function stepStates() {
  return Object.fromEntries(
    stepIds.map((step) => {
      const on: StepMoves = {};
      if (NEXT_MOVES[step].length > 0) on.NEXT = NEXT_MOVES[step].map(transitionOf);
      if (BACK_MOVES[step].length > 0) on.BACK = BACK_MOVES[step].map(transitionOf);
      return [step, { entry: enter(step), on }];
    }),
  ) as Record<StepId, { entry: ReturnType<typeof enter>; on: StepMoves }>;
}

/**
 * The interview at the vehicle. Each state is one step; NEXT and BACK follow the route the answers
 * call for (lib/interview/route.ts describes the same route for the progress strip), as the chart in
 * interview-chart.ts sets them out. The phone runs the same chart without xstate (interview-runner.ts).
 */
export const interviewMachine = setup({
  types: {} as { context: InterviewContext; events: InterviewEvent; input: InterviewInput | undefined },
  guards: {
    groupReady: ({ context }, params: { group: GroupId }) => guards.groupReady(context, params.group),
    systemLooksEmpty: ({ context }) => guards.systemLooksEmpty(context),
    pressureLeft: ({ context }) => guards.pressureLeft(context),
    refrigerantContaminated: ({ context }) => guards.refrigerantContaminated(context),
    currentStepOptional: ({ context }) => guards.currentStepOptional(context),
    mayOpen: ({ context, event }, params: { step: StepId }) =>
      event.type === "GOTO" && event.step === params.step && guards.mayOpen(context, params.step),
    resumesAt: ({ context }, params: { step: StepId }) => guards.resumesAt(context, params.step),
    mustFallBackTo: ({ context }, params: { step: StepId }) => guards.mustFallBackTo(context, params.step),
  },
  actions: {
    enterStep: assign(({ context }, params: { step: StepId }) => applyEnterStep(context, params.step)),
    storeAnswer: assign(({ context, event }) =>
      event.type === "ANSWER" ? applyAnswer(context, event.group, event.values) : {},
    ),
    storeTyping: assign(({ context, event }) =>
      event.type === "TYPE" ? applyTyping(context, event.group, event.values) : {},
    ),
    skipGroup: assign(({ context }) => applySkip(context)),
    moveOn: raise({ type: "NEXT" }),
  },
}).createMachine({
  id: "interview",
  context: ({ input }) => createInterviewContext(input),
  initial: "resuming",
  always: stepIds.map((step) => ({
    guard: { type: "mustFallBackTo", params: { step } } as const,
    target: `.${step}`,
  })),
  on: {
    ANSWER: { actions: "storeAnswer" },
    TYPE: { actions: "storeTyping" },
    SKIP: { guard: "currentStepOptional", actions: ["skipGroup", "moveOn"] },
    GOTO: stepIds.map((step) => ({
      guard: { type: "mayOpen", params: { step } } as const,
      target: `.${step}`,
    })),
  },
  states: {
    resuming: {
      always: stepIds.map((step) => ({
        guard: { type: "resumesAt", params: { step } } as const,
        target: step,
      })),
    },
    ...stepStates(),
  },
});
