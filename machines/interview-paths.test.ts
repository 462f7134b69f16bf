import { describe, expect, it } from "vitest";
import type { InterviewAnswers } from "@/lib/interview/answers";
import { contaminatedAnswers, emptySystemAnswers, exampleAnswers } from "@/lib/interview/example-answers";
import { routeFor } from "@/lib/interview/route";
import { viewOf } from "./interview-view";
import { answer, startInterview, stepOf, walk } from "./interview-test-kit";

const cautionIds = (actor: ReturnType<typeof startInterview>) =>
  viewOf(actor.getSnapshot()).cautions.map((c) => c.id);

describe("interview paths", () => {
  it("walks a charged system from the complaint to findings", () => {
    const actor = startInterview();
    expect(walk(actor, exampleAnswers)).toEqual([
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
    const view = viewOf(actor.getSnapshot());
    expect(view.canComputeFindings).toBe(true);
    expect(view.diagnosisInput?.highKpaGauge).toBe(1550);
  });

  it("sends an empty system (0 kPa gauge) to leak finding, skipping running tests, then to findings", () => {
    const actor = startInterview();
    expect(walk(actor, emptySystemAnswers)).toEqual([
      "complaint",
      "system",
      "conditions",
      "static",
      "leakFinding",
      "findings",
    ]);
    expect(viewOf(actor.getSnapshot()).diagnosisInput).not.toHaveProperty("highKpaGauge");
  });

  it("shows the do-not-run caution as soon as the static pressure says empty", () => {
    const actor = startInterview();
    walk(actor, { ...emptySystemAnswers, leakFinding: undefined }, 4);
    expect(stepOf(actor)).toBe("leakFinding");
    expect(cautionIds(actor)).toContain("empty_system");
  });

  it("identifies and audits what is left in a near-empty system (R-134a at 32 °C, far below 815 kPa abs saturation, Tillner-Roth & Baehr 1994)", () => {
    const actor = startInterview();
    const answers: InterviewAnswers = { ...emptySystemAnswers, static: { staticKpaGauge: 150 } };
    expect(walk(actor, answers)).toEqual([
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

  it("holds recovery when purity is below 98 % (SAE J2099) and warns to keep the charge out of the shop's machine", () => {
    const actor = startInterview();
    expect(walk(actor, contaminatedAnswers)).toEqual([
      "complaint",
      "system",
      "conditions",
      "static",
      "running",
      "behaviour",
      "identification",
      "recoveryHeld",
      "findings",
    ]);
    actor.send({ type: "BACK" });
    expect(stepOf(actor)).toBe("recoveryHeld");
    expect(cautionIds(actor)).toContain("contaminated_do_not_recover");
  });

  it("goes to the ordinary charge audit at exactly 98 % purity", () => {
    const actor = startInterview();
    const answers: InterviewAnswers = { ...exampleAnswers, identification: { purityPct: 98 } };
    expect(walk(actor, answers)).toContain("chargeAudit");
  });

  it("adds R-1234yf's flammability cautions", () => {
    const actor = startInterview();
    walk(actor, { ...exampleAnswers, system: { ...exampleAnswers.system, refrigerant: "R-1234yf" } }, 2);
    expect(cautionIds(actor)).toContain("flammable_r1234yf");
  });

  it("adds high-voltage and dielectric-oil cautions for an electric compressor", () => {
    const actor = startInterview();
    walk(
      actor,
      {
        ...exampleAnswers,
        system: { ...exampleAnswers.system, compressorType: "electric", expansionDevice: "txv" },
      },
      2,
    );
    expect(cautionIds(actor)).toEqual(expect.arrayContaining(["high_voltage_compressor", "dielectric_oil"]));
    expect(cautionIds(actor)).not.toContain("recover_slowly_accumulator");
  });

  it("reminds an orifice-tube system to recover slowly", () => {
    const actor = startInterview();
    walk(actor, exampleAnswers, 2);
    expect(cautionIds(actor)).toContain("recover_slowly_accumulator");
    expect(cautionIds(actor)).not.toContain("high_voltage_compressor");
  });

  it("agrees with routeFor on every path above", () => {
    for (const answers of [exampleAnswers, emptySystemAnswers, contaminatedAnswers]) {
      expect(walk(startInterview(), answers)).toEqual(routeFor(answers));
    }
  });
});

describe("answers and NEXT", () => {
  it("does not advance past a required step without a valid answer", () => {
    const actor = startInterview();
    actor.send({ type: "NEXT" });
    expect(stepOf(actor)).toBe("complaint");
    answer(actor, "complaint", { ownerWords: "" });
    actor.send({ type: "NEXT" });
    expect(stepOf(actor)).toBe("complaint");
    expect(viewOf(actor.getSnapshot()).canGoNext).toBe(false);
  });

  it("keeps invalid values as the draft with a plain message and does not advance", () => {
    const actor = startInterview({ answers: { ...exampleAnswers, running: undefined }, step: "running" });
    const typed = { highKpaGauge: 300, lowKpaGauge: 900 };
    answer(actor, "running", typed);
    actor.send({ type: "NEXT" });
    const { context } = actor.getSnapshot();
    expect(stepOf(actor)).toBe("running");
    expect(context.drafts.running).toEqual(typed);
    expect(context.errors.running?.[0]?.message).toBe(
      "The low side reads above the high side — check the hose connections",
    );
    answer(actor, "running", { highKpaGauge: 1300, lowKpaGauge: 200 });
    expect(actor.getSnapshot().context.drafts.running).toBeUndefined();
    actor.send({ type: "NEXT" });
    expect(stepOf(actor)).toBe("behaviour");
  });

  it("keeps the last valid answer while a draft is wrong, and blocks NEXT until it is fixed", () => {
    const actor = startInterview({ answers: exampleAnswers, step: "running" });
    answer(actor, "running", { highKpaGauge: "abc" });
    expect(actor.getSnapshot().context.answers.running).toEqual(exampleAnswers.running);
    actor.send({ type: "NEXT" });
    expect(stepOf(actor)).toBe("running");
  });

  it("ignores an answer for a group that does not exist", () => {
    const actor = startInterview();
    const before = actor.getSnapshot().context;
    actor.send({ type: "ANSWER", group: "vehicle" as never, values: {} });
    expect(actor.getSnapshot().context.answers).toEqual(before.answers);
    expect(actor.getSnapshot().context.drafts).toEqual(before.drafts);
  });

  it("can compute findings once refrigerant, device and ambient are known", () => {
    const actor = startInterview();
    walk(actor, exampleAnswers, 2);
    expect(viewOf(actor.getSnapshot()).canComputeFindings).toBe(false);
    answer(actor, "conditions", exampleAnswers.conditions);
    expect(viewOf(actor.getSnapshot()).canComputeFindings).toBe(true);
  });
});
