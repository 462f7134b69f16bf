import { describe, expect, it } from "vitest";
import { exampleAnswers } from "@/lib/interview/example-answers";
import { applySkip } from "./interview-actions";
import { createInterviewContext } from "./interview-context";
import { currentStepOptional } from "./interview-guards";
import { viewOf } from "./interview-view";
import { answer, startInterview } from "./interview-test-kit";

/** The example case with its static reading not yet taken. */
const withoutStatic = Object.fromEntries(
  Object.entries(exampleAnswers).filter(([group]) => group !== "static"),
);

// Reopening a saved interview: what autosave stored is trusted only as far as the interview's own rules allow.
describe("createInterviewContext from a saved interview", () => {
  it("keeps a skip only for a known group that has no answer", () => {
    const context = createInterviewContext({
      answers: withoutStatic,
      skipped: ["static", "vehicle", "running"],
    });
    expect(context.skipped).toEqual(["static"]);
  });

  it("restores drafts of known groups only, and never over a saved answer that had to become a draft", () => {
    const context = createInterviewContext({
      answers: { ...exampleAnswers, conditions: { ambientC: 90 } },
      drafts: { vehicle: { vin: "x" }, conditions: { ambientC: 31 } },
    });
    expect(context.drafts).not.toHaveProperty("vehicle");
    // the saved, now impossible answer is what the technician last chose: it stays the draft to fix
    expect(context.drafts.conditions).toEqual({ ambientC: 90 });
    expect(context.errors.conditions?.[0]?.field).toBe("ambientC");
  });

  it("flags an invalid draft, but neither a valid draft nor the typed values of a skipped step", () => {
    const invalid = createInterviewContext({
      answers: withoutStatic,
      drafts: { static: { staticKpaGauge: "7o0" } },
    });
    expect(invalid.errors.static?.length).toBeGreaterThan(0);

    const valid = createInterviewContext({
      answers: withoutStatic,
      drafts: { static: { staticKpaGauge: 700 } },
    });
    expect(valid.drafts.static).toEqual({ staticKpaGauge: 700 });
    expect(Object.keys(valid.errors)).toEqual([]);

    const skipped = createInterviewContext({
      answers: withoutStatic,
      skipped: ["static"],
      drafts: { static: { staticKpaGauge: "7o0" } },
    });
    expect(skipped.drafts.static).toEqual({ staticKpaGauge: "7o0" });
    expect(Object.keys(skipped.errors)).toEqual([]);
  });

  it("resumes at the saved step only when it may still be opened, else at the furthest open step", () => {
    expect(createInterviewContext({ step: "findings" }).resumeStep).toBe("complaint");
    expect(createInterviewContext({ step: "findings" }).step).toBe("complaint");
    expect(createInterviewContext({ answers: exampleAnswers, step: "conditions" }).resumeStep).toBe(
      "conditions",
    );
  });

  it("keeps the saved visited steps (known ones only), or counts the steps before the one it resumes at", () => {
    const saved = createInterviewContext({
      answers: { complaint: exampleAnswers.complaint, system: exampleAnswers.system },
      visited: ["complaint", "nowhere"],
      step: "conditions",
    });
    expect(saved.visited).toEqual(["complaint"]);
    const fresh = createInterviewContext({
      answers: { complaint: exampleAnswers.complaint, system: exampleAnswers.system },
      step: "conditions",
    });
    expect(fresh.visited).toEqual(["complaint", "system"]);
  });
});

describe("skipping", () => {
  it("is offered on optional steps only, and does nothing where nothing may be skipped", () => {
    const context = createInterviewContext({ answers: exampleAnswers });
    expect(currentStepOptional({ ...context, step: "static" })).toBe(true);
    expect(currentStepOptional({ ...context, step: "system" })).toBe(false);
    expect(currentStepOptional({ ...context, step: "findings" })).toBe(false);
    expect(applySkip({ ...context, step: "findings" })).toEqual({});
  });

  it("records a group once however often its step is skipped", () => {
    const context = createInterviewContext({ answers: withoutStatic, skipped: ["static"] });
    expect(applySkip({ ...context, step: "static" }).skipped).toEqual(["static"]);
  });
});

describe("what the screen may offer", () => {
  it("offers NEXT once the step is answered and BACK after the first step", () => {
    const actor = startInterview();
    expect(viewOf(actor.getSnapshot())).toMatchObject({ canGoNext: false, canGoBack: false });
    answer(actor, "complaint", exampleAnswers.complaint);
    expect(viewOf(actor.getSnapshot())).toMatchObject({ canGoNext: true, canGoBack: false });
    actor.send({ type: "NEXT" });
    expect(viewOf(actor.getSnapshot())).toMatchObject({ step: "system", canGoNext: false, canGoBack: true });
    actor.stop();
  });
});
