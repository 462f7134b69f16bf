import { getShortestPaths, getSimplePaths } from "@xstate/graph";
import { createActor } from "xstate";
import { describe, expect, it } from "vitest";
import { contaminatedAnswers, exampleAnswers } from "@/lib/interview/example-answers";
import { availableSteps, routeFor } from "@/lib/interview/route";
import { stepIds, type GroupId } from "@/lib/interview/steps";
import { interviewMachine } from "./interview";
import type { InterviewEvent } from "./interview-context";
import { viewOf, type InterviewSnapshot } from "./interview-view";

/*
 * Model-based walk: from a new interview, try a small vocabulary of events in every state and
 * collect the states reached. Snapshots are grouped by what decides routing (step, route, steps
 * open, groups needing a fix), which keeps the graph finite without hiding a branch.
 */
const answerChoices: Record<GroupId, unknown[]> = {
  complaint: [exampleAnswers.complaint],
  system: [exampleAnswers.system],
  conditions: [exampleAnswers.conditions],
  static: [exampleAnswers.static, { staticKpaGauge: 150 }, { staticKpaGauge: 0 }],
  running: [exampleAnswers.running, { highKpaGauge: 300, lowKpaGauge: 900 }],
  behaviour: [{ symptoms: [] }],
  identification: [exampleAnswers.identification, contaminatedAnswers.identification],
  chargeAudit: [exampleAnswers.chargeAudit],
  leakFinding: [{ method: "electronic_detector", whereFound: "condenser" }],
};

function eventsFor(snapshot: InterviewSnapshot): InterviewEvent[] {
  const group = viewOf(snapshot).group;
  const answers: InterviewEvent[] =
    group === null ? [] : (answerChoices[group] ?? []).map((values) => ({ type: "ANSWER", group, values }));
  return [
    ...answers,
    { type: "NEXT" },
    { type: "BACK" },
    { type: "SKIP" },
    ...stepIds.map((step) => ({ type: "GOTO", step }) as const),
  ];
}

function serialize(snapshot: InterviewSnapshot): string {
  const { context } = snapshot;
  return JSON.stringify([
    snapshot.value,
    routeFor(context.answers, context.shop),
    availableSteps(context),
    Object.keys(context.errors),
  ]);
}

/** Every state a run of these events passes through, resting or transient. */
function statesPassed(events: readonly InterviewEvent[]): Set<string> {
  const seen = new Set<string>();
  const actor = createActor(interviewMachine, {
    input: {},
    inspect: (inspection) => {
      if (inspection.type !== "@xstate.microstep") return;
      seen.add(String((inspection.snapshot as InterviewSnapshot).value));
      for (const transition of inspection._transitions)
        if (transition.source.key !== "interview") seen.add(transition.source.key);
    },
  }).start();
  for (const event of events) actor.send(event);
  seen.add(String(actor.getSnapshot().value));
  return seen;
}

const allStates = new Set(Object.keys(interviewMachine.root.states));

describe("model-based walk of the interview machine", () => {
  const paths = getShortestPaths(interviewMachine, { events: eventsFor, serializeState: serialize });

  it("reaches every state of the machine", () => {
    const reached = new Set<string>();
    for (const path of paths)
      for (const state of statesPassed(path.steps.map((step) => step.event))) reached.add(state);
    expect([...reached].sort()).toEqual([...allStates].sort());
    expect(allStates.size).toBe(stepIds.length + 1); // every step plus the resuming state
  });

  it("never rests on a step that may not be opened, in any reached state", () => {
    expect(paths.length).toBeGreaterThan(stepIds.length);
    for (const path of paths) {
      const { context } = path.state;
      expect(availableSteps(context)).toContain(path.state.value);
      expect(context.step).toBe(path.state.value);
    }
  });

  it("reaches findings only with an engine input ready", () => {
    const atFindings = paths.filter((path) => path.state.value === "findings");
    expect(atFindings.length).toBeGreaterThan(2);
    for (const path of atFindings) expect(viewOf(path.state).canComputeFindings).toBe(true);
  });

  it("finds simple paths from a new interview to findings through each branch", () => {
    const simple = getSimplePaths(interviewMachine, {
      events: (snapshot) =>
        eventsFor(snapshot).filter((event) => event.type === "ANSWER" || event.type === "NEXT"),
      serializeState: serialize,
      toState: (snapshot) => snapshot.value === "findings",
    });
    const passedThrough = new Set(
      simple.flatMap((path) => path.steps.map((step) => String(step.state.value))),
    );
    for (const step of ["leakFinding", "running", "recoveryHeld", "chargeAudit"])
      expect(passedThrough).toContain(step);
  });
});
