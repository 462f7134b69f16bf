import { describe, expect, it } from "vitest";
import { conclusionNotesFrom, conclusionProblem } from "./conclusion";

describe("the conclusion's why", () => {
  it("is optional for a conclusion nobody checks, and needs a reason or words from an apprentice", () => {
    expect(conclusionProblem({ needsReason: false, reasons: [], words: "  " })).toBeNull();
    expect(conclusionProblem({ needsReason: true, reasons: [], words: " " })).toMatch(/at least one reason/);
    expect(conclusionProblem({ needsReason: true, reasons: ["pressures"], words: "" })).toBeNull();
    expect(conclusionProblem({ needsReason: true, reasons: [], words: "Oily condenser." })).toBeNull();
  });

  it("stores the reasons in the list's order, then the words", () => {
    expect(conclusionNotesFrom(["charge_weight", "pressures"], " Topped up last month. ")).toBe(
      "The pressures point to it; the recovered charge against the label. Topped up last month.",
    );
    expect(conclusionNotesFrom([], "Only words.")).toBe("Only words.");
    expect(conclusionNotesFrom(["leak_found"], "")).toBe("A leak was found.");
  });
});
