import fc from "fast-check";
import { describe, expect, it } from "vitest";
import type { InterviewAnswers } from "@/lib/interview/answers";
import { exampleAnswers } from "@/lib/interview/example-answers";
import { routeFor } from "@/lib/interview/route";
import { optionalGroups } from "@/lib/interview/steps";
import { viewOf } from "./interview-view";
import { isFallBack, startInterview, stepOf, walk } from "./interview-test-kit";
import { propertyRuns } from "@/tests/support/property-runs";

/*
 * The machine's own NEXT/BACK transitions and routeFor (which draws the progress strip) are written
 * separately; this property checks they never disagree.
 */
const answersArb: fc.Arbitrary<InterviewAnswers> = fc
  .record({
    refrigerant: fc.constantFrom("R-134a" as const, "R-1234yf" as const, "R-744" as const),
    expansionDevice: fc.constantFrom("orifice_tube" as const, "txv" as const),
    ambientC: fc.integer({ min: -5, max: 45 }),
    altitudeM: fc.option(fc.integer({ min: 0, max: 3000 }), { nil: undefined }),
    staticKpaGauge: fc.oneof(
      fc.constant(0),
      // Above a full vacuum at any altitude generated here: about −70 kPa at 3000 m (ISO 2533).
      fc.integer({ min: -60, max: 900 }),
      fc.integer({ min: 3000, max: 7000 }),
    ),
    purityPct: fc.oneof(fc.constant(98), fc.integer({ min: 85, max: 100 })),
    skip: fc.subarray([...optionalGroups]),
  })
  .map(({ refrigerant, expansionDevice, ambientC, altitudeM, staticKpaGauge, purityPct, skip }) => {
    const answers: InterviewAnswers = {
      ...exampleAnswers,
      system: { refrigerant, expansionDevice, compressorType: "variable_displacement" },
      conditions: { ambientC, altitudeM },
      static: { staticKpaGauge: refrigerant === "R-744" ? staticKpaGauge : Math.min(staticKpaGauge, 4000) },
      identification: { purityPct },
      leakFinding: { method: "nitrogen_pressure_hold" },
    };
    for (const group of skip) delete answers[group];
    return answers;
  });

// Each walk asks the do-not-run rule at every branch: seconds on a shared machine, so a generous limit.
describe("machine and routeFor agree", { timeout: 30_000 }, () => {
  it("NEXT (or SKIP) walks exactly the route routeFor gives, and BACK walks it in reverse", () => {
    fc.assert(
      fc.property(answersArb, (answers) => {
        let fallBacks = 0;
        const actor = startInterview(undefined, (event) => {
          if (isFallBack(event)) fallBacks += 1;
        });
        const forward = walk(actor, answers);
        const route = routeFor(actor.getSnapshot().context.answers);
        expect(forward).toEqual(route);
        expect(viewOf(actor.getSnapshot()).progress.map((p) => p.step)).toEqual(route);
        const backward = [stepOf(actor)];
        for (let i = 1; i < route.length; i += 1) {
          actor.send({ type: "BACK" });
          backward.push(stepOf(actor));
        }
        expect(backward).toEqual([...route].reverse());
        // The explicit transitions got there on their own, without the fall-back move.
        expect(fallBacks).toBe(0);
      }),
      { numRuns: propertyRuns(300) },
    );
  });
});
