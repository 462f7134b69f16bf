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

const ready = (group: GroupId) => ({ type: "groupReady", params: { group } }) as const;
const enter = (step: StepId) => ({ type: "enterStep", params: { step } }) as const;

/**
 * The interview at the vehicle. Each state is one step; NEXT and BACK follow the route the answers
 * call for (lib/interview/route.ts describes the same route for the progress strip).
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
    complaint: {
      entry: enter("complaint"),
      on: { NEXT: { guard: ready("complaint"), target: "system" } },
    },
    system: {
      entry: enter("system"),
      on: { NEXT: { guard: ready("system"), target: "conditions" }, BACK: "complaint" },
    },
    conditions: {
      entry: enter("conditions"),
      on: { NEXT: { guard: ready("conditions"), target: "static" }, BACK: "system" },
    },
    static: {
      entry: enter("static"),
      on: {
        NEXT: [
          { guard: and([ready("static"), "systemLooksEmpty"]), target: "leakFinding" },
          { guard: ready("static"), target: "running" },
        ],
        BACK: "conditions",
      },
    },
    running: {
      entry: enter("running"),
      on: { NEXT: { guard: ready("running"), target: "behaviour" }, BACK: "static" },
    },
    behaviour: {
      entry: enter("behaviour"),
      on: { NEXT: { guard: ready("behaviour"), target: "identification" }, BACK: "running" },
    },
    leakFinding: {
      entry: enter("leakFinding"),
      on: {
        NEXT: [
          { guard: and([ready("leakFinding"), "pressureLeft"]), target: "identification" },
          { guard: ready("leakFinding"), target: "findings" },
        ],
        BACK: "static",
      },
    },
    identification: {
      entry: enter("identification"),
      on: {
        NEXT: [
          { guard: and([ready("identification"), "refrigerantContaminated"]), target: "recoveryHeld" },
          { guard: ready("identification"), target: "chargeAudit" },
        ],
        BACK: [{ guard: "systemLooksEmpty", target: "leakFinding" }, { target: "behaviour" }],
      },
    },
    chargeAudit: {
      entry: enter("chargeAudit"),
      on: { NEXT: { guard: ready("chargeAudit"), target: "findings" }, BACK: "identification" },
    },
    recoveryHeld: {
      entry: enter("recoveryHeld"),
      on: { NEXT: { guard: ready("chargeAudit"), target: "findings" }, BACK: "identification" },
    },
    findings: {
      entry: enter("findings"),
      on: {
        BACK: [
          { guard: and(["systemLooksEmpty", not("pressureLeft")]), target: "leakFinding" },
          { guard: "refrigerantContaminated", target: "recoveryHeld" },
          { target: "chargeAudit" },
        ],
      },
    },
  },
});
