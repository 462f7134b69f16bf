import fc from "fast-check";
import { createActor } from "xstate";
import { describe, expect, it } from "vitest";
import { contaminatedAnswers, emptySystemAnswers, exampleAnswers } from "@/lib/interview/example-answers";
import { groupIds, stepIds, type GroupId } from "@/lib/interview/steps";
import { interviewMachine } from "./interview";
import type { InterviewEvent, InterviewInput } from "./interview-context";
import { createInterviewRunner } from "./interview-runner";

// The phone's runner against the xstate machine, both built from interview-chart.ts: the same saved
// interviews, the same generated events, and after every event the same step, the same context and
// the same moves on offer, or this fails.

const answerSets = [exampleAnswers, emptySystemAnswers, contaminatedAnswers] as Record<string, unknown>[];

/** Values a group can be sent: each example's, and some that change the route or fail a check. */
const valuesFor: Record<GroupId, unknown[]> = {
  complaint: [exampleAnswers.complaint, { ownerWords: "  " }],
  system: [
    exampleAnswers.system,
    { ...exampleAnswers.system, refrigerant: "R-1234yf", compressorType: "electric" },
    { ...exampleAnswers.system, labelChargeG: 150 },
    { refrigerant: "R-134a" },
  ],
  conditions: [exampleAnswers.conditions, { ambientC: 5, altitudeM: 1600 }, { ambientC: 99 }],
  static: [
    { staticKpaGauge: 715 },
    { staticKpaGauge: 0 },
    { staticKpaGauge: 40 },
    { staticKpaGauge: -120 },
    {},
  ],
  running: [exampleAnswers.running, { highKpaGauge: 900, lowKpaGauge: 1200 }, {}],
  behaviour: [exampleAnswers.behaviour, { symptoms: ["sealant_found"] }, { symptoms: ["nope"] }],
  identification: [
    exampleAnswers.identification,
    contaminatedAnswers.identification,
    { hydrocarbonFlagged: true },
    { purityPct: 120 },
  ],
  chargeAudit: [
    exampleAnswers.chargeAudit,
    { recovered: true, recoveredChargeG: 2000 },
    { recovered: false, chargedG: 570 },
    { recovered: false, recoveredChargeG: 300 },
  ],
  leakFinding: [
    emptySystemAnswers.leakFinding,
    { method: "uv_dye", whereFound: "not_found_yet" },
    { method: "?" },
  ],
};

const groupEvent = (type: "ANSWER" | "TYPE") =>
  fc
    .constantFrom(...groupIds)
    .chain((group) =>
      fc.constantFrom(...valuesFor[group]).map((values) => ({ type, group, values }) as InterviewEvent),
    );

const events: fc.Arbitrary<InterviewEvent> = fc.oneof(
  { weight: 5, arbitrary: fc.constant<InterviewEvent>({ type: "NEXT" }) },
  { weight: 2, arbitrary: fc.constant<InterviewEvent>({ type: "BACK" }) },
  { weight: 2, arbitrary: fc.constant<InterviewEvent>({ type: "SKIP" }) },
  {
    weight: 2,
    arbitrary: fc.constantFrom(...stepIds).map((step): InterviewEvent => ({ type: "GOTO", step })),
  },
  { weight: 5, arbitrary: groupEvent("ANSWER") },
  { weight: 2, arbitrary: groupEvent("TYPE") },
);

/** A new interview, or one saved part-way: some answers, drafts, skips and the step it was left at. */
const inputs: fc.Arbitrary<InterviewInput | undefined> = fc.oneof(
  fc.constant(undefined),
  // Whole saved cases, left at any step: the held recovery and the leak search are one NEXT away.
  fc.record({
    answers: fc.constantFrom(...answerSets),
    step: fc.constantFrom(...stepIds),
  }),
  fc.record(
    {
      answers: fc
        .tuple(fc.constantFrom(...answerSets), fc.subarray([...groupIds]))
        .map(([set, groups]) =>
          Object.fromEntries(groups.map((g) => [g, set[g]]).filter(([, v]) => v !== undefined)),
        ),
      drafts: fc.constantFrom({}, { running: { highKpaGauge: "12" } }, { static: { staticKpaGauge: 0 } }),
      skipped: fc.subarray(["static", "running", "behaviour", "identification"]),
      visited: fc.subarray([...stepIds]),
      step: fc.constantFrom(...stepIds, "nowhere"),
      shop: fc.constantFrom({}, { altitudeM: 0 }, { altitudeM: 1600 }),
    },
    { requiredKeys: [] },
  ),
);

const moves: InterviewEvent[] = [{ type: "NEXT" }, { type: "BACK" }, { type: "SKIP" }];

describe("the phone's interview runner and the xstate machine", () => {
  it("take every generated interview through the same steps, context and offered moves", () => {
    const reached = new Set<string>();
    fc.assert(
      fc.property(inputs, fc.array(events, { maxLength: 30 }), (input, sent) => {
        const machine = createActor(interviewMachine, { input }).start();
        const runner = createInterviewRunner(input);
        const same = (after: string) => {
          const m = machine.getSnapshot();
          const r = runner.getSnapshot();
          expect(r.value, after).toBe(m.value);
          expect(r.context, after).toEqual(m.context);
          for (const move of moves) expect(r.can(move), `${after}, can ${move.type}`).toBe(m.can(move));
          reached.add(String(r.value));
        };
        same("at the start");
        for (const [i, event] of sent.entries()) {
          machine.send(event);
          runner.send(event);
          same(`after event ${i}: ${JSON.stringify(event)}`);
        }
        machine.stop();
      }),
      { numRuns: 400, seed: 20261203 },
    );
    // The generated runs reach every step, the branches to the leak search and the held recovery included.
    expect([...reached].sort()).toEqual([...stepIds].sort());
  });

  it("tells its listeners after every event, as an xstate actor tells its observers", () => {
    const runner = createInterviewRunner({ answers: exampleAnswers });
    const told: string[] = [];
    const subscription = runner.subscribe((run) => told.push(run.value));
    runner.send({ type: "BACK" });
    const afterBack = runner.getSnapshot().value;
    runner.send({ type: "GOTO", step: "nowhere" as never });
    subscription.unsubscribe();
    runner.send({ type: "NEXT" });
    // Told of the move, then of an event that moved nothing, and not after unsubscribing.
    expect(told).toEqual([afterBack, afterBack]);
  });
});
