import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { diagnose } from "./diagnose";
import {
  apportion,
  firstScreenRanking,
  LEADING_RULE,
  leadingCount,
  REASONS_RULE,
  strongestReasons,
} from "./first-screen";
import { formatMessage } from "./messages";
import { candidateInput } from "./test-inputs";
import { diagnosisInputSchema } from "./schema";

const sum = (values: readonly number[]) => values.reduce((a, b) => a + b, 0);

describe("apportion: whole percents that add up to exactly the total (largest remainder)", () => {
  it("gives the points left after the floors to the largest remainders", () => {
    // quotas 33.3…, 33.3…, 33.3…: floors 33 each, one point left, the tie goes to the earliest
    expect(apportion([1, 1, 1])).toEqual([34, 33, 33]);
    // quotas 62.4, 21.4, 10.6, 5.6: floors 62, 21, 10, 5 (98), the two largest remainders are .6 and .6
    expect(apportion([0.624, 0.214, 0.106, 0.056])).toEqual([62, 21, 11, 6]);
    // independent rounding would show 67 + 17 + 17 = 101
    expect(apportion([0.665, 0.1675, 0.1675])).toEqual([66, 17, 17]);
  });

  it("breaks a tie between equal remainders by the larger share, then by the earlier part", () => {
    // quotas 10.5 and 89.5: both remainders .5, the larger share takes the point
    expect(apportion([0.105, 0.895])).toEqual([10, 90]);
    expect(apportion([0.25, 0.25, 0.25, 0.25], 2)).toEqual([1, 1, 0, 0]);
  });

  it("normalises shares that do not sum to one, and apportions any total", () => {
    expect(apportion([2, 6])).toEqual([25, 75]);
    expect(apportion([0.5, 0.25, 0.25], 6)).toEqual([3, 2, 1]);
    expect(apportion([0.3, 0.3, 0.4], 7)).toEqual([2, 2, 3]);
  });

  it("never shows a part with a share as 0 nor the largest as the whole, while the total allows", () => {
    // 99.6 and 0.4 would round to 100 and 0: the trailing part takes a point from the largest
    expect(apportion([0.996, 0.004])).toEqual([99, 1]);
    expect(apportion([0.97, 0.004, 0.004, 0.022])).toEqual([96, 1, 1, 2]);
    // more parts with a share than points: some must stay at 0, and the sum still holds
    const many = apportion([0.5, 0.1, 0.1, 0.1, 0.1, 0.1], 3);
    expect(sum(many)).toBe(3);
    expect(many[0]).toBeGreaterThan(0);
  });

  it("gives 0 to parts without a share, and all zeros when nothing has one", () => {
    expect(apportion([1, 0, 0])).toEqual([100, 0, 0]);
    expect(apportion([0, 0])).toEqual([0, 0]);
    expect(apportion([])).toEqual([]);
    expect(apportion([-1, Number.NaN, 1])).toEqual([0, 0, 100]);
    expect(apportion([0.5, 0.5], 0)).toEqual([0, 0]);
  });

  it("adds up to the total for any shares, and every part stays within one point of its quota unless floored to 1", () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 1, maxLength: 14 }),
        fc.integer({ min: 1, max: 200 }),
        (shares, total) => {
          const shown = apportion(shares, total);
          const all = sum(shares);
          if (all === 0) {
            // No share at all: every part 0. (Not `return expect(…)`: fast-check reads a returned value.)
            expect(shown.every((v) => v === 0)).toBe(true);
            return;
          }
          expect(sum(shown)).toBe(total);
          expect(shown.every((v) => Number.isInteger(v) && v >= 0)).toBe(true);
          const positive = shares.filter((s) => s > 0).length;
          shares.forEach((s, i) => {
            const quota = (s / all) * total;
            const value = shown[i] ?? 0;
            if (s === 0) expect(value).toBe(0);
            else if (positive <= total) expect(value).toBeGreaterThanOrEqual(1);
            // the floor of one moves a point off the largest part at most once per floored part
            expect(value).toBeLessThanOrEqual(Math.ceil(quota) + (quota < 1 ? 1 : 0));
            expect(value).toBeGreaterThanOrEqual(Math.floor(quota) - positive);
          });
        },
      ),
      // Shares of nothing but zeros, drawn only now and then at random, always among the cases.
      {
        examples: [
          [[0], 1],
          [[0, 0, 0], 100],
        ],
      },
    );
  });
});

describe("leadingCount: the leading causes by LEADING_RULE", () => {
  it("stops once the causes so far cover 80 % of the likelihood", () => {
    expect(LEADING_RULE).toEqual({ coverShare: 0.8, minShare: 0.1, maxCauses: 3 });
    expect(leadingCount([0.85, 0.1, 0.05])).toBe(1);
    expect(leadingCount([0.8, 0.15, 0.05])).toBe(1);
    expect(leadingCount([0.62, 0.21, 0.11, 0.06])).toBe(2);
    expect(leadingCount([0.79, 0.15, 0.06])).toBe(2);
  });

  it("takes a next cause only when it holds at least 10 % itself", () => {
    expect(leadingCount([0.5, 0.09, 0.09, 0.09])).toBe(1);
    expect(leadingCount([0.5, 0.1, 0.09])).toBe(2);
    expect(leadingCount([0.4, 0.3, 0.09, 0.09])).toBe(2);
  });

  it("never leads with more than three, nor with more causes than there are", () => {
    expect(leadingCount([0.25, 0.25, 0.25, 0.25])).toBe(3);
    expect(leadingCount([0.4, 0.3, 0.2, 0.1])).toBe(3);
    expect(leadingCount([0.5, 0.5])).toBe(2);
    expect(leadingCount([1])).toBe(1);
    expect(leadingCount([])).toBe(0);
  });

  it("always leads with the first cause, whatever its share", () => {
    expect(leadingCount([0.05, 0.05])).toBe(1);
    expect(leadingCount([0])).toBe(1);
  });

  it("follows a rule given to it", () => {
    expect(leadingCount([0.4, 0.3, 0.2, 0.1], { coverShare: 0.95, minShare: 0.05, maxCauses: 4 })).toBe(4);
    expect(leadingCount([0.4, 0.3, 0.2], { coverShare: 0.5, minShare: 0.05, maxCauses: 3 })).toBe(2);
  });
});

describe("firstScreenRanking: leading causes and the rest", () => {
  const ranked = (...shares: number[]) => shares.map((share, i) => ({ id: i, share, assessed: true }));

  it("shows leading percents and the rest adding up to exactly 100, and the others adding up to the rest", () => {
    const screen = firstScreenRanking(ranked(0.624, 0.214, 0.106, 0.03, 0.016, 0.01));
    expect(screen.leading.map((l) => [l.suspect.id, l.percent])).toEqual([
      // 62.4, 21.4 and 16.2: the one point left goes to the tied remainder of the larger share
      [0, 63],
      [1, 21],
    ]);
    expect(screen.restPercent).toBe(16);
    // 16 points over 10.47, 2.96, 1.58 and 0.99
    expect(screen.others.map((o) => o.percent)).toEqual([10, 3, 2, 1]);
    expect(sum(screen.others.map((o) => o.percent))).toBe(screen.restPercent);
    expect(screen.othersAssessed).toBe(true);
  });

  it("gives a trailing rest at least 1 % and never shows the leader as 100 % while others hold a share", () => {
    const screen = firstScreenRanking(ranked(0.996, 0.002, 0.002));
    expect(screen.leading.map((l) => l.percent)).toEqual([99]);
    expect(screen.restPercent).toBe(1);
    // two others share one point: one shows 1, the other 0 (the screen says "under 1 %")
    expect(screen.others.map((o) => o.percent)).toEqual([1, 0]);
  });

  it("takes stored findings that carry an independent score instead of a share", () => {
    const screen = firstScreenRanking([{ score: 0.9 }, { score: 0.3 }, { score: 0.3 }]);
    expect(screen.leading.map((l) => l.percent)).toEqual([60]);
    expect(screen.restPercent).toBe(40);
  });

  it("leaves no rest when every cause leads", () => {
    const screen = firstScreenRanking(ranked(0.5, 0.5));
    expect(screen.leading.map((l) => l.percent)).toEqual([50, 50]);
    expect(screen.others).toEqual([]);
    expect(screen.restPercent).toBe(0);
  });

  it("says the others were not assessed after a failed identification (the engine's own ranking)", () => {
    const findings = diagnose({
      refrigerant: "R-134a",
      expansionDevice: "orifice_tube",
      ambientC: 30,
      identifierPurityPct: 90,
      highKpaGauge: 2000,
      lowKpaGauge: 300,
    });
    const screen = firstScreenRanking(findings.suspects);
    expect(screen.leading.map((l) => [l.suspect.cause, l.percent])).toEqual([
      ["contaminated_refrigerant", 100],
    ]);
    expect(screen.restPercent).toBe(0);
    expect(screen.others).toHaveLength(12);
    expect(screen.othersAssessed).toBe(false);
  });

  it("adds up to 100 with one to three leading causes for any engine input", () => {
    fc.assert(
      fc.property(candidateInput, (raw) => {
        const parsed = diagnosisInputSchema.safeParse(raw);
        if (!parsed.success) return;
        const screen = firstScreenRanking(diagnose(parsed.data).suspects);
        expect(screen.leading.length).toBeGreaterThanOrEqual(1);
        expect(screen.leading.length).toBeLessThanOrEqual(3);
        expect(sum(screen.leading.map((l) => l.percent)) + screen.restPercent).toBe(100);
        expect(sum(screen.others.map((o) => o.percent))).toBe(screen.restPercent);
        expect(screen.leading.length + screen.others.length).toBe(13);
      }),
      { numRuns: 200 },
    );
  });
});

describe("strongestReasons: the two or three strongest reasons each way", () => {
  const item = (message: string, weight: number) => ({ message, weight });

  it("orders each side by the weight it carried, strongest first", () => {
    const reasons = strongestReasons({
      evidenceFor: [],
      evidenceAgainst: [],
      evidence: [item("a", 0.5), item("b", -0.4), item("c", 2), item("d", -1.5), item("e", 1)],
    });
    expect(reasons.for).toEqual(["c", "e", "a"]);
    expect(reasons.against).toEqual(["d", "b"]);
    expect(reasons.moreFor).toEqual([]);
    expect(reasons.moreAgainst).toEqual([]);
  });

  it("shows a third reason only when it carries at least a quarter of the strongest one's weight", () => {
    expect(REASONS_RULE).toEqual({ always: 2, most: 3, thirdFromFraction: 0.25 });
    const weak = strongestReasons({
      evidenceFor: [],
      evidenceAgainst: [],
      evidence: [
        item("a", 2),
        item("b", 0.1),
        item("c", 0.49),
        item("d", -2),
        item("e", -1),
        item("f", -0.5),
      ],
    });
    expect(weak.for).toEqual(["a", "c"]);
    expect(weak.moreFor).toEqual(["b"]);
    // 0.5 is exactly a quarter of 2: shown
    expect(weak.against).toEqual(["d", "e", "f"]);
    expect(weak.moreAgainst).toEqual([]);
    const four = strongestReasons({
      evidenceFor: [],
      evidenceAgainst: [],
      evidence: [item("a", 1), item("b", 0.9), item("c", 0.8), item("d", 0.7)],
    });
    expect(four.for).toEqual(["a", "b", "c"]);
    expect(four.moreFor).toEqual(["d"]);
  });

  it("keeps the second reason however weak, and shows none on a side without any", () => {
    const reasons = strongestReasons({
      evidenceFor: [],
      evidenceAgainst: [],
      evidence: [item("a", 3), item("b", 0.01)],
    });
    expect(reasons.for).toEqual(["a", "b"]);
    expect(reasons.against).toEqual([]);
    expect(reasons.moreAgainst).toEqual([]);
  });

  it("skips items that moved nothing", () => {
    const reasons = strongestReasons({ evidenceFor: [], evidenceAgainst: [], evidence: [item("z", 0)] });
    expect(reasons).toEqual({ for: [], against: [], moreFor: [], moreAgainst: [] });
  });

  it("keeps the stored order and two a side for findings stored without weights", () => {
    const reasons = strongestReasons({ evidenceFor: ["a", "b", "c"], evidenceAgainst: ["x"] });
    expect(reasons).toEqual({ for: ["a", "b"], against: ["x"], moreFor: ["c"], moreAgainst: [] });
  });

  it("picks the recovered mass over the label as the strongest reason for an overcharge (common practice signature)", () => {
    const findings = diagnose({
      refrigerant: "R-134a",
      expansionDevice: "orifice_tube",
      ambientC: 30,
      labelChargeG: 800,
      recoveredChargeG: 1000,
      highKpaGauge: 2200,
      lowKpaGauge: 330,
      symptoms: ["high_pressure_cutout"],
    });
    const overcharge = findings.suspects[0]!;
    expect(overcharge.cause).toBe("overcharge");
    const reasons = strongestReasons(overcharge);
    expect(reasons.for.length).toBeGreaterThanOrEqual(2);
    expect(reasons.for.length).toBeLessThanOrEqual(3);
    const weights = overcharge.evidence.filter((e) => e.weight > 0).map((e) => e.weight);
    const shown = reasons.for.map((m) => overcharge.evidence.find((e) => e.message === m)!.weight);
    expect(shown[0]).toBe(Math.max(...weights));
    expect(formatMessage(reasons.for[0]!)).toMatch(/200 g \(25 %\) over/);
    expect(reasons.for.length + reasons.moreFor.length).toBe(overcharge.evidenceFor.length);
    expect(reasons.against.length + reasons.moreAgainst.length).toBe(overcharge.evidenceAgainst.length);
  });
});

describe("first screen: the limits of each rule", () => {
  it("lifts trailing parts to 1 only while there are points enough for every part with a share", () => {
    // quotas 1.5 and five of 0.3 over 3 points: the largest remainders alone give 2, 1 and four 0s
    expect(apportion([0.5, 0.1, 0.1, 0.1, 0.1, 0.1], 3)).toEqual([2, 1, 0, 0, 0, 0]);
    // two parts with a share over 2 points (parts without one do not count): 1.8 and 0.2 show 1 and 1
    expect(apportion([0.9, 0.1, 0, 0], 2)).toEqual([1, 1, 0, 0]);
  });

  it("gives zeros for a total below zero", () => {
    expect(apportion([0.5, 0.5], -3)).toEqual([0, 0]);
  });

  it("says the others were assessed when any of them was", () => {
    const screen = firstScreenRanking([
      { share: 0.9, assessed: true },
      { share: 0.05, assessed: false },
      { share: 0.05, assessed: true },
    ]);
    expect(screen.othersAssessed).toBe(true);
  });

  it("keeps two reasons against as well for findings stored without weights", () => {
    const reasons = strongestReasons({ evidenceFor: ["a"], evidenceAgainst: ["x", "y", "z"] });
    expect(reasons).toEqual({ for: ["a"], against: ["x", "y"], moreFor: [], moreAgainst: ["z"] });
  });
});
