import { describe, expect, it } from "vitest";
import type { InterviewAnswers } from "@/lib/interview/answers";
import { contaminatedAnswers, emptySystemAnswers, exampleAnswers } from "@/lib/interview/example-answers";
import { routeFor } from "@/lib/interview/route";
import { savedInterviewSchema } from "@/lib/interview/saved";
import { savedInterviewOf, viewOf } from "./interview-view";
import { answer, isFallBack, startInterview, stepOf, walk } from "./interview-test-kit";

describe("BACK", () => {
  it("follows the route backwards", () => {
    const actor = startInterview({ answers: exampleAnswers, step: "findings" });
    const back: string[] = [stepOf(actor)];
    for (let i = 0; i < 10; i += 1) {
      actor.send({ type: "BACK" });
      back.push(stepOf(actor));
    }
    expect(back).toEqual([
      "findings",
      "chargeAudit",
      "identification",
      "behaviour",
      "running",
      "static",
      "conditions",
      "system",
      "complaint",
      "complaint",
      "complaint",
    ]);
  });

  it("returns from findings to leak finding on an empty system, and to the held recovery on a contaminated one", () => {
    const empty = startInterview({ answers: emptySystemAnswers, step: "findings" });
    empty.send({ type: "BACK" });
    expect(stepOf(empty)).toBe("leakFinding");
    const held = startInterview({ answers: contaminatedAnswers, step: "findings" });
    held.send({ type: "BACK" });
    expect(stepOf(held)).toBe("recoveryHeld");
    held.send({ type: "BACK" });
    expect(stepOf(held)).toBe("identification");
  });

  it("returns from identification to leak finding on a near-empty system, to behaviour otherwise", () => {
    const nearEmpty = startInterview({
      answers: { ...emptySystemAnswers, static: { staticKpaGauge: 150 } },
      step: "identification",
    });
    nearEmpty.send({ type: "BACK" });
    expect(stepOf(nearEmpty)).toBe("leakFinding");
    nearEmpty.send({ type: "BACK" });
    expect(stepOf(nearEmpty)).toBe("static");
    const charged = startInterview({ answers: exampleAnswers, step: "identification" });
    charged.send({ type: "BACK" });
    expect(stepOf(charged)).toBe("behaviour");
  });
});

describe("GOTO", () => {
  it("opens any answered step and the first unanswered one, nothing beyond", () => {
    const { complaint, system, conditions } = exampleAnswers;
    const actor = startInterview({ answers: { complaint, system, conditions }, step: "conditions" });
    actor.send({ type: "GOTO", step: "complaint" });
    expect(stepOf(actor)).toBe("complaint");
    actor.send({ type: "GOTO", step: "running" });
    expect(stepOf(actor)).toBe("complaint");
    actor.send({ type: "GOTO", step: "static" });
    expect(stepOf(actor)).toBe("static");
    actor.send({ type: "GOTO", step: "findings" });
    expect(stepOf(actor)).toBe("static");
  });

  it("does not open a step off the route", () => {
    const actor = startInterview({ answers: exampleAnswers, step: "findings" });
    actor.send({ type: "GOTO", step: "leakFinding" });
    expect(stepOf(actor)).toBe("findings");
    actor.send({ type: "GOTO", step: "recoveryHeld" });
    expect(stepOf(actor)).toBe("findings");
  });
});

describe("changing an earlier answer re-routes", () => {
  it("leaves leak finding once a corrected static pressure shows a charged system", () => {
    const actor = startInterview();
    walk(actor, { ...emptySystemAnswers, leakFinding: undefined }, 4);
    expect(stepOf(actor)).toBe("leakFinding");
    actor.send({ type: "BACK" });
    answer(actor, "static", exampleAnswers.static);
    actor.send({ type: "NEXT" });
    expect(stepOf(actor)).toBe("running");
    const steps = viewOf(actor.getSnapshot()).progress.map((p) => p.step);
    expect(steps).not.toContain("leakFinding");
    expect(steps).toContain("behaviour");
  });

  it("updates the findings' input when a reading is changed from the findings step", () => {
    const actor = startInterview({ answers: exampleAnswers, step: "findings" });
    actor.send({ type: "GOTO", step: "running" });
    answer(actor, "running", { ...exampleAnswers.running, highKpaGauge: 2100 });
    actor.send({ type: "GOTO", step: "findings" });
    expect(stepOf(actor)).toBe("findings");
    expect(viewOf(actor.getSnapshot()).diagnosisInput?.highKpaGauge).toBe(2100);
  });

  it("turns to leak finding when a static pressure changed from findings now says empty", () => {
    const actor = startInterview({ answers: exampleAnswers, step: "findings" });
    actor.send({ type: "GOTO", step: "static" });
    answer(actor, "static", { staticKpaGauge: 0 });
    actor.send({ type: "GOTO", step: "findings" });
    expect(stepOf(actor)).toBe("static");
    actor.send({ type: "NEXT" });
    expect(stepOf(actor)).toBe("leakFinding");
    expect(viewOf(actor.getSnapshot()).diagnosisInput).not.toHaveProperty("lowKpaGauge");
  });

  it("falls back to the furthest open step when an answer takes the step on screen off the route", () => {
    let fallBacks = 0;
    const actor = startInterview({ answers: exampleAnswers, step: "behaviour" }, (event) => {
      if (isFallBack(event)) fallBacks += 1;
    });
    answer(actor, "static", { staticKpaGauge: 0 });
    expect(stepOf(actor)).toBe("leakFinding");
    expect(fallBacks).toBe(1);
  });

  it("stays put when an answer elsewhere leaves the step on screen on the route", () => {
    const actor = startInterview({ answers: exampleAnswers, step: "behaviour" });
    answer(actor, "static", { staticKpaGauge: 700 });
    expect(stepOf(actor)).toBe("behaviour");
  });

  it("turns a stored reading into a draft to fix when a changed refrigerant makes it impossible", () => {
    const co2: InterviewAnswers = {
      ...exampleAnswers,
      system: { ...exampleAnswers.system, refrigerant: "R-744" },
      conditions: { ambientC: 20 },
      static: { staticKpaGauge: 5600 },
    };
    const actor = startInterview({ answers: co2, step: "running" });
    expect(stepOf(actor)).toBe("running");
    answer(actor, "system", exampleAnswers.system);
    const { context } = actor.getSnapshot();
    expect(context.answers.static).toBeUndefined();
    expect(context.drafts.static).toEqual({ staticKpaGauge: 5600 });
    expect(context.errors.static?.[0]?.field).toBe("staticKpaGauge");
    expect(stepOf(actor)).toBe("static");
  });
});

describe("SKIP", () => {
  it("skips an optional step, records it and moves on", () => {
    const { complaint, system, conditions } = exampleAnswers;
    const actor = startInterview({ answers: { complaint, system, conditions }, step: "static" });
    actor.send({ type: "SKIP" });
    expect(stepOf(actor)).toBe("running");
    expect(viewOf(actor.getSnapshot()).skipped).toEqual(["static"]);
    expect(viewOf(actor.getSnapshot()).diagnosisInput).not.toHaveProperty("staticKpaGauge");
  });

  it("is refused on a required step", () => {
    const actor = startInterview();
    actor.send({ type: "SKIP" });
    expect(stepOf(actor)).toBe("complaint");
    expect(actor.getSnapshot().context.skipped).toEqual([]);
    expect(viewOf(actor.getSnapshot()).canSkip).toBe(false);
  });

  it("keeps what was typed as a draft, and a later answer clears the skip", () => {
    const actor = startInterview({ answers: exampleAnswers, step: "running" });
    actor.send({ type: "SKIP" });
    let context = actor.getSnapshot().context;
    expect(context.answers.running).toBeUndefined();
    expect(context.drafts.running).toEqual(exampleAnswers.running);
    answer(actor, "running", exampleAnswers.running);
    context = actor.getSnapshot().context;
    expect(context.skipped).not.toContain("running");
    expect(context.answers.running).toEqual(exampleAnswers.running);
  });

  it("skipping an empty static reading routes to the running tests", () => {
    const actor = startInterview({
      answers: { ...emptySystemAnswers, leakFinding: undefined },
      step: "static",
    });
    actor.send({ type: "SKIP" });
    expect(stepOf(actor)).toBe("running");
  });

  it("skips the whole interview's optional steps to reach findings", () => {
    const { complaint, system, conditions } = exampleAnswers;
    const actor = startInterview();
    expect(walk(actor, { complaint, system, conditions })).toEqual(routeFor({}));
    expect(actor.getSnapshot().context.skipped).toEqual([
      "static",
      "running",
      "behaviour",
      "identification",
      "chargeAudit",
    ]);
  });
});

describe("resuming a saved interview", () => {
  it("opens at the saved step with the saved answers", () => {
    const actor = startInterview({ answers: exampleAnswers, step: "behaviour", shop: { altitudeM: 300 } });
    expect(stepOf(actor)).toBe("behaviour");
    expect(actor.getSnapshot().context.answers.running).toEqual(exampleAnswers.running);
    expect(viewOf(actor.getSnapshot()).diagnosisInput?.altitudeM).toBe(300);
  });

  it("opens at the furthest open step when the saved step can no longer be opened", () => {
    const { complaint, system } = exampleAnswers;
    expect(stepOf(startInterview({ answers: { complaint, system }, step: "findings" }))).toBe("conditions");
    expect(stepOf(startInterview({ answers: emptySystemAnswers, step: "running" }))).toBe("findings");
    expect(stepOf(startInterview({ answers: exampleAnswers, step: "not-a-step" }))).toBe("findings");
  });

  it("restores skipped groups, drafts and the steps visited", () => {
    const { complaint, system, conditions } = exampleAnswers;
    const actor = startInterview({
      answers: { complaint, system, conditions },
      skipped: ["static"],
      drafts: { running: { highKpaGauge: 300, lowKpaGauge: 900 } },
      visited: ["complaint", "system", "conditions", "static", "running"],
      step: "running",
    });
    const { context } = actor.getSnapshot();
    expect(stepOf(actor)).toBe("running");
    expect(context.skipped).toEqual(["static"]);
    expect(context.errors.running?.[0]?.field).toBe("lowKpaGauge");
    expect(context.visited).toEqual(["complaint", "system", "conditions", "static", "running"]);
  });

  it("resumes from what autosave stored, through JSON and the saved-interview schema, at the same step with the same view", () => {
    const actor = startInterview({ shop: { altitudeM: 400 } });
    walk(actor, { ...exampleAnswers, behaviour: undefined }, 4);
    answer(actor, "running", { highKpaGauge: 300, lowKpaGauge: 900 });
    const stored = JSON.parse(JSON.stringify(savedInterviewOf(actor.getSnapshot().context)));
    const saved = savedInterviewSchema.parse(stored);
    const resumed = startInterview({ ...saved, shop: { altitudeM: 400 } });
    expect(stepOf(resumed)).toBe(stepOf(actor));
    expect(viewOf(resumed.getSnapshot())).toEqual(viewOf(actor.getSnapshot()));
  });

  it("counts the steps before the resumed one as visited when none were saved", () => {
    const actor = startInterview({ answers: exampleAnswers, step: "static" });
    expect(actor.getSnapshot().context.visited).toEqual(["complaint", "system", "conditions", "static"]);
  });
});
