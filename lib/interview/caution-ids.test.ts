import { describe, expect, it } from "vitest";
import { CAUTION_IDS } from "@/lib/cautions/catalog";
import { INTERVIEW_CAUTION_IDS, cautionIdsFor } from "./caution-ids";
import { contaminatedAnswers, emptySystemAnswers, exampleAnswers } from "./example-answers";

describe("the interview's caution ids", () => {
  it("lists each catalogue caution the steps can show once", () => {
    expect(new Set(INTERVIEW_CAUTION_IDS).size).toBe(INTERVIEW_CAUTION_IDS.length);
    for (const id of INTERVIEW_CAUTION_IDS) expect(CAUTION_IDS).toContain(id);
  });

  it("only ever names a caution the server drew for the screen", () => {
    const steps = ["complaint", "running", "chargeAudit", "recoveryHeld"] as const;
    const electric = {
      ...exampleAnswers,
      system: { ...exampleAnswers.system!, compressorType: "electric" as const },
    };
    for (const answers of [{}, exampleAnswers, emptySystemAnswers, contaminatedAnswers, electric])
      for (const step of steps)
        for (const id of cautionIdsFor(answers, { step })) expect(INTERVIEW_CAUTION_IDS).toContain(id);
  });
});
