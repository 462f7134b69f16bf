import { describe, expect, it } from "vitest";
import { answersWithFigures, answersWithoutFigures, figuresInAnswers, roundFigure } from "./figures";
import type { InterviewAnswers } from "./answers";

// Invented answers for an invented car; the figures only travel, nothing here is physics.
const answers: InterviewAnswers = {
  system: { refrigerant: "R-134a", expansionDevice: "txv", compressorType: "unknown", labelChargeG: 601.02 },
  identification: { purityPct: 98.456, airPct: 1.2 },
  chargeAudit: { recovered: true, recoveredChargeG: 430.9, oilRemovedMl: 25 },
};

describe("figures typed once: the interview's side", () => {
  it("reads each figure its answered groups give, rounded as its home keeps it", () => {
    expect(figuresInAnswers(answers)).toEqual({
      labelChargeG: 601,
      recoveredChargeG: 431,
      oilRemovedMl: 25,
      purityPct: 98.46,
      airPct: 1.2,
      chargedG: null,
    });
  });

  it("says nothing about a figure whose group was not answered, and null when the charge was not recovered", () => {
    const said = figuresInAnswers({ chargeAudit: { recovered: false, oilRemovedMl: 10 } });
    expect(said).toEqual({ recoveredChargeG: null, oilRemovedMl: 10, chargedG: null });
    expect("labelChargeG" in said).toBe(false);
    expect("purityPct" in said).toBe(false);
  });

  it("rounds grams and millilitres to whole units and percentages to 0.01", () => {
    expect(roundFigure("chargedG", 566.99)).toBe(567);
    expect(roundFigure("oilRemovedMl", 12.4)).toBe(12);
    expect(roundFigure("airPct", 0.125)).toBe(0.13);
  });

  it("writes the kept figures into the answers, and a recovered mass marks the charge recovered", () => {
    const shown = answersWithFigures(
      { system: { refrigerant: "R-134a" }, chargeAudit: { recovered: false } },
      { labelChargeG: 640, recoveredChargeG: 450, chargedG: 610 },
    );
    expect(shown).toEqual({
      system: { refrigerant: "R-134a", labelChargeG: 640 },
      chargeAudit: { recovered: true, recoveredChargeG: 450, chargedG: 610 },
    });
  });

  it("starts only the groups a figure makes whole", () => {
    expect(
      answersWithFigures({}, { labelChargeG: 500, purityPct: 97, recoveredChargeG: 300, chargedG: 280 }),
    ).toEqual({
      identification: { purityPct: 97 },
      chargeAudit: { recovered: true, recoveredChargeG: 300, chargedG: 280 },
    });
    expect(answersWithFigures({}, { oilRemovedMl: 20 })).toEqual({});
  });

  it("shows a copy not yet moved where the home holds none, and the home's value over it", () => {
    const legacy = { identification: { airPct: 3 }, system: { refrigerant: "R-134a", labelChargeG: 450 } };
    expect(answersWithFigures(legacy, { airPct: null, labelChargeG: null })).toEqual(legacy);
    expect(answersWithFigures(legacy, { airPct: 2, labelChargeG: 480 })).toEqual({
      identification: { airPct: 2 },
      system: { refrigerant: "R-134a", labelChargeG: 480 },
    });
  });

  it("takes out the figures kept elsewhere and leaves every other answer", () => {
    const stored = answersWithoutFigures(answers, ["labelChargeG", "recoveredChargeG"]);
    expect(stored.system).toEqual({
      refrigerant: "R-134a",
      expansionDevice: "txv",
      compressorType: "unknown",
    });
    expect(stored.chargeAudit).toEqual({ recovered: true, oilRemovedMl: 25 });
    expect(stored.identification).toBe(answers.identification);
    expect(answers.system?.labelChargeG).toBe(601.02); // the input is not changed
  });
});
