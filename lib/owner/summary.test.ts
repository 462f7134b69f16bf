import { describe, expect, it } from "vitest";
import { buildOwnerSummary, ownerCause } from "./summary";
import { ownerFactsFromCase, repairsDoneFromRecord } from "./case-facts";
import { chargeComparison, ownerMass, ownerTemperature } from "./units";

const base = {
  shopName: "Test shop",
  vehicle: "2015 Mazda 3",
  complaint: "Warm air at idle",
  status: "signed_off",
  conclusionCause: null,
  findings: null,
  repairsDone: [],
  proposal: null,
} as const;

describe("owner summary", () => {
  it("says how far the charge was off the label in words, with the numbers in the shop's units", () => {
    // 565 g against a 450 g label is 25.6 % over: "about a quarter more".
    const facts = { units: "metric" as const, labelChargeG: 450, foundChargeG: 565 };
    const summary = buildOwnerSummary({ ...base, conclusionCause: "overcharge", facts });
    expect(summary.keySentence).toBe(
      "The system held about a quarter more refrigerant than the maker specifies.",
    );
    expect(summary.facts[0]?.fact).toContain("565 g");
    const imperial = buildOwnerSummary({
      ...base,
      conclusionCause: "overcharge",
      facts: { ...facts, units: "imperial" },
    });
    // 565 g = 19.93 oz = 1 lb 4 oz; 450 g = 15.87 oz (NIST SP 811: 1 oz = 28.349523125 g).
    expect(imperial.facts[0]?.fact).toContain("1 lb 4 oz");
    expect(imperial.facts[0]?.fact).toContain("15.9 oz");
  });

  it("puts the article a number is spoken with before the day's temperature", () => {
    const vent = (ambientC: number) =>
      buildOwnerSummary({ ...base, facts: { units: "metric", ventC: 8, ambientC } }).facts.find((f) =>
        f.fact.startsWith("During our test"),
      )?.fact;
    expect(vent(18)).toMatch(/ on an 18 °C day\.$/);
    expect(vent(30)).toMatch(/ on a 30 °C day\.$/);
  });

  it("reads only the cause order and the next check from a findings snapshot, whatever else it carries", () => {
    const findings = {
      suspects: [
        { cause: "moisture", share: 0.7 },
        { cause: "undercharge", share: 0.2 },
      ],
      nextCheck: { check: "recover_and_weigh", somethingNew: true },
    };
    expect(ownerCause(null, findings)).toBe("moisture");
    expect(ownerCause("not_a_cause", findings)).toBe("moisture");
    expect(ownerCause(null, { suspects: "garbage" })).toBeNull();
    const summary = buildOwnerSummary({ ...base, findings, facts: { units: "metric" } });
    expect(summary.found?.title).toBe("Water inside the system");
    expect(summary.nextCheck?.title).toBe("Take out and weigh the refrigerant");
    expect(buildOwnerSummary({ ...base, findings: 42, facts: { units: "metric" } }).found).toBeNull();
  });

  it("lists the trade words the page uses, each with an explanation", () => {
    const summary = buildOwnerSummary({
      ...base,
      conclusionCause: "moisture",
      facts: { units: "metric", expansionDevice: "txv" },
    });
    const terms = summary.glossary.map((g) => g.term);
    expect(terms).toEqual(
      expect.arrayContaining(["Refrigerant", "Compressor", "Drier", "Expansion valve", "Vacuum"]),
    );
    expect(terms).not.toContain("Orifice tube");
  });

  it("keeps what the shop typed as plain text", () => {
    const summary = buildOwnerSummary({
      ...base,
      complaint: "<b>hot</b><script>alert(1)</script>",
      facts: { units: "metric" },
    });
    expect(summary.reported).toBe("<b>hot</b><script>alert(1)</script>");
  });

  it("adds the R-1234yf and high-voltage cautions only where they apply", () => {
    const yf = buildOwnerSummary({
      ...base,
      facts: { units: "metric", refrigerant: "R-1234yf", electricCompressor: true },
    });
    expect(yf.safety.join(" ")).toMatch(/R-1234yf.*catch fire/);
    expect(yf.safety.join(" ")).toMatch(/high voltage/);
    const plain = buildOwnerSummary({ ...base, facts: { units: "metric", refrigerant: "R-134a" } });
    expect(plain.safety.join(" ")).not.toMatch(/catch fire|high voltage/);
    expect(plain.safety.join(" ")).toMatch(/store can/);
  });

  it("turns a service record into facts and done repairs", () => {
    const record = {
      labelChargeG: 570,
      recoveredChargeG: 430,
      chargedG: 572,
      holdMinutes: 10,
      holdPassed: true,
      oilAddedMl: 42,
      partsReplaced: [{ part: "condenser" }],
    };
    const facts = ownerFactsFromCase({
      units: "metric",
      answersRecord: { answers: {} },
      serviceRecord: record,
    });
    expect(facts).toMatchObject({ labelChargeG: 570, foundChargeG: 430, chargedG: 572, holdPassed: true });
    expect(repairsDoneFromRecord(record)).toEqual(["replace_condenser", "recover_evacuate_recharge"]);
    const summary = buildOwnerSummary({
      ...base,
      status: "closed",
      conclusionCause: "undercharge",
      facts,
      repairsDone: repairsDoneFromRecord(record),
    });
    // 430 g against 570 g is 24.6 % short: "about a quarter less".
    expect(summary.keySentence).toBe(
      "The system held about a quarter less refrigerant than the maker specifies.",
    );
    expect(summary.facts.map((f) => f.meaning)).toContain("That is the amount on the maker's label.");
    expect(summary.nextCheck).toBeNull();
    expect(ownerFactsFromCase({ units: "metric", answersRecord: "nonsense", serviceRecord: null })).toEqual({
      units: "metric",
      electricCompressor: false,
    });
  });
});

describe("owner units", () => {
  it("formats masses and temperatures for an owner", () => {
    expect(ownerMass(570, "metric")).toBe("570 g");
    expect(ownerMass(1130, "metric")).toBe("1.13 kg");
    expect(ownerMass(1130, "imperial")).toBe("2 lb 8 oz"); // 39.86 oz (NIST SP 811)
    expect(ownerTemperature(29, "imperial")).toBe("84 °F");
    expect(ownerTemperature(-0.2, "metric")).toBe("0 °C");
  });
  it("words a deviation from the label", () => {
    expect(chargeComparison(3)).toBeNull();
    expect(chargeComparison(-24.6)).toBe("about a quarter less refrigerant than the maker specifies");
    expect(chargeComparison(35)).toBe("about a third more refrigerant than the maker specifies");
    expect(chargeComparison(-95)).toBe("almost none of the refrigerant the maker specifies");
  });
});
