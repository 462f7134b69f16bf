import { describe, expect, it } from "vitest";
import type { InterviewAnswers } from "./answers";
import { contaminatedAnswers, emptySystemAnswers, exampleAnswers } from "./example-answers";
import { progressFor } from "./progress";
import {
  answersOnRoute,
  availableSteps,
  furthestStep,
  groupSettled,
  routeFor,
  type InterviewRecord,
} from "./route";

const record = (answers: InterviewAnswers, more: Partial<InterviewRecord> = {}): InterviewRecord => ({
  answers,
  skipped: [],
  errors: {},
  shop: {},
  ...more,
});

describe("routeFor", () => {
  it("takes a charged system through running readings, behaviour, identification and the charge audit", () => {
    expect(routeFor(exampleAnswers)).toEqual([
      "complaint",
      "system",
      "conditions",
      "static",
      "running",
      "behaviour",
      "identification",
      "chargeAudit",
      "findings",
    ]);
  });

  it("sends an empty system to leak finding and straight on to findings when nothing is left to recover", () => {
    expect(routeFor(emptySystemAnswers)).toEqual([
      "complaint",
      "system",
      "conditions",
      "static",
      "leakFinding",
      "findings",
    ]);
  });

  it("still identifies and audits what is left in a near-empty system (vapour only)", () => {
    const answers = { ...emptySystemAnswers, static: { staticKpaGauge: 150 } };
    expect(routeFor(answers)).toEqual([
      "complaint",
      "system",
      "conditions",
      "static",
      "leakFinding",
      "identification",
      "chargeAudit",
      "findings",
    ]);
  });

  it("holds recovery when the identifier fails the charge", () => {
    expect(routeFor(contaminatedAnswers)).toContain("recoveryHeld");
    expect(routeFor(contaminatedAnswers)).not.toContain("chargeAudit");
  });

  it("goes to running readings while the static pressure is unknown", () => {
    expect(routeFor({})).toEqual(routeFor(exampleAnswers));
  });
});

describe("availableSteps", () => {
  it("opens only the first step of a new interview", () => {
    expect(availableSteps(record({}))).toEqual(["complaint"]);
    expect(furthestStep(record({}))).toBe("complaint");
  });

  it("opens up to and including the first unanswered step", () => {
    const { complaint, system } = exampleAnswers;
    expect(availableSteps(record({ complaint, system }))).toEqual(["complaint", "system", "conditions"]);
  });

  it("counts a skipped step as passed", () => {
    const { complaint, system, conditions } = exampleAnswers;
    expect(furthestStep(record({ complaint, system, conditions }, { skipped: ["static"] }))).toBe("running");
  });

  it("opens findings once every step on the route is settled", () => {
    expect(furthestStep(record(exampleAnswers))).toBe("findings");
    expect(furthestStep(record(emptySystemAnswers))).toBe("findings");
  });
});

describe("groupSettled", () => {
  it("is true for an answer or a skip, false for nothing or an answer with an invalid draft waiting", () => {
    const issue = { field: "lowKpaGauge", message: "x" };
    expect(groupSettled(record(exampleAnswers), "running")).toBe(true);
    expect(groupSettled(record({}, { skipped: ["running"] }), "running")).toBe(true);
    expect(groupSettled(record({}), "running")).toBe(false);
    expect(groupSettled(record(exampleAnswers, { errors: { running: [issue] } }), "running")).toBe(false);
  });
});

describe("answersOnRoute", () => {
  it("drops running readings and behaviour once the system turns out to be empty", () => {
    const answers = { ...exampleAnswers, static: { staticKpaGauge: 0 } };
    const onRoute = answersOnRoute(answers);
    expect(onRoute.running).toBeUndefined();
    expect(onRoute.behaviour).toBeUndefined();
    expect(onRoute.identification).toBeUndefined();
    expect(onRoute.static).toEqual({ staticKpaGauge: 0 });
  });

  it("keeps the charge audit under a held recovery, which records the same group", () => {
    expect(answersOnRoute(contaminatedAnswers).chargeAudit).toEqual(contaminatedAnswers.chargeAudit);
  });
});

describe("progressFor", () => {
  it("marks the current, answered, skipped, open and later steps", () => {
    const { complaint, system, conditions } = exampleAnswers;
    const progress = progressFor(
      record({ complaint, system, conditions }, { skipped: ["static"] }),
      "system",
      ["complaint", "system"],
    );
    const status = Object.fromEntries(progress.map((p) => [p.step, p.status]));
    expect(status).toMatchObject({
      complaint: "answered",
      system: "current",
      conditions: "answered",
      static: "skipped",
      running: "open",
      behaviour: "ahead",
    });
    expect(progress.find((p) => p.step === "running")?.canOpen).toBe(true);
    expect(progress.find((p) => p.step === "behaviour")?.canOpen).toBe(false);
    expect(progress.filter((p) => p.visited).map((p) => p.step)).toEqual(["complaint", "system"]);
  });

  it("marks a step whose draft needs fixing", () => {
    const progress = progressFor(
      record(exampleAnswers, { errors: { running: [{ field: "", message: "x" }] } }),
      "findings",
      [],
    );
    expect(progress.find((p) => p.step === "running")?.status).toBe("needs_fixing");
  });
});
