import { describe, expect, it } from "vitest";
import type { InterviewAnswers } from "@/lib/interview/answers";
import { exampleAnswers } from "@/lib/interview/example-answers";
import { applyAnswer, applyEnterStep, applySkip, applyTyping } from "./interview-actions";
import { interviewMachine } from "./interview";
import { createActor } from "xstate";
import { createInterviewContext, type InterviewContext } from "./interview-context";

function context(answers: InterviewAnswers, more: Partial<InterviewContext> = {}): InterviewContext {
  return { ...createInterviewContext({ answers }), ...more };
}

describe("applyAnswer", () => {
  it("stores a valid answer and clears the group's draft, messages and skip", () => {
    const before = context(
      {},
      {
        skipped: ["static"],
        drafts: { static: { staticKpaGauge: "7o0" } },
        errors: { static: [{ field: "staticKpaGauge", message: "x" }] },
      },
    );
    const changes = applyAnswer(before, "static", { staticKpaGauge: 700 });
    expect(changes.answers?.static).toEqual({ staticKpaGauge: 700 });
    expect(changes.drafts).toEqual({});
    expect(changes.errors).toEqual({});
    expect(changes.skipped).toEqual([]);
  });

  it("keeps invalid values as the draft with their messages and leaves the answers alone", () => {
    const changes = applyAnswer(context(exampleAnswers), "conditions", { ambientC: 90 });
    expect(changes.answers).toBeUndefined();
    expect(changes.drafts?.conditions).toEqual({ ambientC: 90 });
    expect(changes.errors?.conditions?.[0]?.field).toBe("ambientC");
  });

  it("does not change the context it was given", () => {
    const before = context(exampleAnswers);
    const copy = structuredClone(before);
    applyAnswer(before, "static", { staticKpaGauge: 0 });
    applySkip({ ...before, step: "running" });
    expect(before).toEqual(copy);
  });

  it("moves another group's answer to the drafts when the new answer makes it impossible", () => {
    const changes = applyAnswer(
      context({ ...exampleAnswers, chargeAudit: { recovered: true, recoveredChargeG: 1500 } }),
      "system",
      {
        ...exampleAnswers.system,
        labelChargeG: 450,
      },
    );
    expect(changes.answers?.chargeAudit).toBeUndefined();
    expect(changes.drafts?.chargeAudit).toEqual({ recovered: true, recoveredChargeG: 1500 });
    expect(changes.errors?.chargeAudit?.[0]?.field).toBe("recoveredChargeG");
  });

  it("ignores an unknown group", () => {
    expect(applyAnswer(context({}), "vehicle", {})).toEqual({});
  });
});

describe("applyTyping", () => {
  it("keeps a valid value being typed as the draft and leaves the saved answer alone", () => {
    // "9" on the way to "95": valid on its own, but not what the technician meant.
    const changes = applyTyping(context(exampleAnswers), "conditions", {
      ...exampleAnswers.conditions,
      ambientC: 9,
    });
    expect(changes.answers).toBeUndefined();
    expect(changes.drafts?.conditions).toEqual({ ...exampleAnswers.conditions, ambientC: 9 });
    expect(changes.errors?.conditions).toBeUndefined();
  });

  it("keeps an out-of-range value as the draft with its message", () => {
    const changes = applyTyping(context(exampleAnswers), "conditions", { ambientC: 95 });
    expect(changes.answers).toBeUndefined();
    expect(changes.errors?.conditions?.[0]?.field).toBe("ambientC");
  });

  it("never lets typing replace the answer; only ANSWER does, and only with a valid value", () => {
    const actor = createActor(interviewMachine, { input: { answers: exampleAnswers } }).start();
    for (const ambientC of [9, 95]) actor.send({ type: "TYPE", group: "conditions", values: { ambientC } });
    expect(actor.getSnapshot().context.answers.conditions?.ambientC).toBe(32);
    actor.send({ type: "ANSWER", group: "conditions", values: { ambientC: 95 } });
    expect(actor.getSnapshot().context.answers.conditions?.ambientC).toBe(32);
    expect(actor.getSnapshot().context.drafts.conditions).toEqual({ ambientC: 95 });
    actor.send({ type: "ANSWER", group: "conditions", values: { ambientC: 35 } });
    expect(actor.getSnapshot().context.answers.conditions?.ambientC).toBe(35);
    expect(actor.getSnapshot().context.drafts.conditions).toBeUndefined();
  });
});

describe("applySkip", () => {
  it("records the skip of an optional step and keeps its typed values as a draft", () => {
    const changes = applySkip(context(exampleAnswers, { step: "identification" }));
    expect(changes.skipped).toEqual(["identification"]);
    expect(changes.answers?.identification).toBeUndefined();
    expect(changes.drafts?.identification).toEqual(exampleAnswers.identification);
  });

  it("records the charge audit as skipped from the held-recovery step", () => {
    expect(applySkip(context({}, { step: "recoveryHeld" })).skipped).toEqual(["chargeAudit"]);
  });

  it("changes nothing on a required step", () => {
    expect(applySkip(context(exampleAnswers, { step: "conditions" }))).toEqual({});
    expect(applySkip(context(exampleAnswers, { step: "findings" }))).toEqual({});
  });
});

describe("applyEnterStep", () => {
  it("sets the step on screen and adds it to the visited steps once", () => {
    const first = applyEnterStep(context({}, { visited: ["complaint"] }), "system");
    expect(first).toEqual({ step: "system", visited: ["complaint", "system"] });
    expect(applyEnterStep(context({}, { visited: ["complaint", "system"] }), "system").visited).toEqual([
      "complaint",
      "system",
    ]);
  });
});
