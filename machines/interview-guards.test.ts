import { describe, expect, it } from "vitest";
import type { InterviewAnswers } from "@/lib/interview/answers";
import { contaminatedAnswers, emptySystemAnswers, exampleAnswers } from "@/lib/interview/example-answers";
import { createInterviewContext, type InterviewContext } from "./interview-context";
import {
  currentStepOptional,
  groupReady,
  mayOpen,
  mustFallBackTo,
  pressureLeft,
  refrigerantContaminated,
  resumesAt,
  systemLooksEmpty,
} from "./interview-guards";

const SEA_LEVEL_KPA = 101.325; // ISO 2533 standard atmosphere

function context(answers: InterviewAnswers, more: Partial<InterviewContext> = {}): InterviewContext {
  return { ...createInterviewContext({ answers }), ...more };
}

describe("interview guards, each on both sides", () => {
  it("groupReady: an answer or a skip passes; nothing, or an invalid draft waiting, does not", () => {
    expect(groupReady(context(exampleAnswers), "static")).toBe(true);
    expect(groupReady(context({}, { skipped: ["static"] }), "static")).toBe(true);
    expect(groupReady(context({}), "static")).toBe(false);
    expect(
      groupReady(
        context(exampleAnswers, { errors: { static: [{ field: "staticKpaGauge", message: "x" }] } }),
        "static",
      ),
    ).toBe(false);
  });

  it("systemLooksEmpty: a static gauge of 0 kPa is empty; R-134a at saturation for 32 °C (about 815 kPa abs, Tillner-Roth & Baehr 1994) is not", () => {
    expect(systemLooksEmpty(context(emptySystemAnswers))).toBe(true);
    expect(
      systemLooksEmpty(context({ ...exampleAnswers, static: { staticKpaGauge: 815 - SEA_LEVEL_KPA } })),
    ).toBe(false);
  });

  it("systemLooksEmpty: uses the shop's altitude when the conditions give none", () => {
    // 480 kPa gauge at 25 °C: above the no-liquid line at sea level, below it at 1600 m (R-134a, Tillner-Roth & Baehr 1994).
    const answers: InterviewAnswers = {
      ...exampleAnswers,
      conditions: { ambientC: 25 },
      static: { staticKpaGauge: 480 },
    };
    expect(systemLooksEmpty(context(answers))).toBe(false);
    expect(systemLooksEmpty(context(answers, { shop: { altitudeM: 1600 } }))).toBe(true);
  });

  it("pressureLeft: vapour above about 0 kPa gauge is left; 0 kPa is not", () => {
    expect(pressureLeft(context({ ...emptySystemAnswers, static: { staticKpaGauge: 150 } }))).toBe(true);
    expect(pressureLeft(context(emptySystemAnswers))).toBe(false);
  });

  it("refrigerantContaminated: purity below 98 % (SAE J2099) is; 99.6 % is not", () => {
    expect(refrigerantContaminated(context(contaminatedAnswers))).toBe(true);
    expect(refrigerantContaminated(context(exampleAnswers))).toBe(false);
  });

  it("currentStepOptional: static readings may be skipped; the complaint and the findings step may not", () => {
    expect(currentStepOptional(context({}, { step: "static" }))).toBe(true);
    expect(currentStepOptional(context({}, { step: "recoveryHeld" }))).toBe(true);
    expect(currentStepOptional(context({}, { step: "complaint" }))).toBe(false);
    expect(currentStepOptional(context({}, { step: "findings" }))).toBe(false);
  });

  it("mayOpen: an answered step or the first open one, not a later one or one off the route", () => {
    const { complaint, system } = exampleAnswers;
    expect(mayOpen(context({ complaint, system }), "system")).toBe(true);
    expect(mayOpen(context({ complaint, system }), "conditions")).toBe(true);
    expect(mayOpen(context({ complaint, system }), "static")).toBe(false);
    expect(mayOpen(context(exampleAnswers), "leakFinding")).toBe(false);
  });

  it("resumesAt: true only for the step the interview resumes at", () => {
    const resumed = createInterviewContext({ answers: exampleAnswers, step: "running" });
    expect(resumesAt(resumed, "running")).toBe(true);
    expect(resumesAt(resumed, "static")).toBe(false);
  });

  it("mustFallBackTo: only when the step on screen left the route, and only to the furthest open step", () => {
    const offRoute = context(emptySystemAnswers, { step: "behaviour" });
    expect(mustFallBackTo(offRoute, "findings")).toBe(true);
    expect(mustFallBackTo(offRoute, "leakFinding")).toBe(false);
    expect(mustFallBackTo(context(exampleAnswers, { step: "behaviour" }), "findings")).toBe(false);
  });
});
