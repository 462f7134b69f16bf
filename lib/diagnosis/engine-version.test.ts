import { describe, expect, it } from "vitest";
import { canonicalJson, ENGINE_SEMVER, ENGINE_VERSION, fnv1a32, scoringTableHash } from "./engine-version";
import { GRADING } from "./grading";
import { CAUSE_PRIORS, LIKELIHOOD_TABLE, RANKING_GATES } from "./likelihood-table";

const current = { priors: CAUSE_PRIORS, rows: LIKELIHOOD_TABLE, gates: RANKING_GATES, grading: GRADING };

/**
 * The version stored with every case's findings, pinned. Any change to a prior, a weight, a gate or a
 * grading threshold changes the hash and fails this test on purpose, so the change shows in review.
 * To update it: confirm the change to the model is intended, note it in lib/diagnosis/README.md, bump
 * ENGINE_SEMVER if the code now reads evidence differently, and paste the new version printed by
 * `npx tsx -e 'import { ENGINE_VERSION } from "./lib/diagnosis"; console.log(ENGINE_VERSION)'`.
 */
const PINNED_ENGINE_VERSION = "2.0.0+a1e3280e";

describe("ENGINE_VERSION", () => {
  it("is pinned: a change to the scoring model must update this literal in review", () => {
    expect(ENGINE_VERSION).toBe(PINNED_ENGINE_VERSION);
  });

  it("hashes only numbers written as short decimals, so every JavaScript engine gets the same version", () => {
    // Math.log(3) is 1.0986122886681096 in Node 20 and 1.0986122886681098 in Chromium: a computed value in the
    // table would give the browser and the server different engine versions.
    const numbers: number[] = [];
    const walk = (value: unknown): void => {
      if (typeof value === "number") numbers.push(value);
      else if (Array.isArray(value)) value.forEach(walk);
      else if (value && typeof value === "object") Object.values(value).forEach(walk);
    };
    walk(current);
    expect(numbers.length).toBeGreaterThan(100);
    for (const n of numbers) expect(Number(n.toPrecision(8)), String(n)).toBe(n);
  });

  it("is the semver plus the hash of the scoring table", () => {
    expect(ENGINE_VERSION).toBe(`${ENGINE_SEMVER}+${scoringTableHash(current)}`);
    expect(ENGINE_VERSION).toMatch(/^\d+\.\d+\.\d+\+[0-9a-f]{8}$/);
  });

  it("matches the published FNV-1a 32-bit test vectors (Fowler/Noll/Vo reference: '' → 811c9dc5, 'a' → e40c292c, 'foobar' → bf9cf968)", () => {
    expect(fnv1a32("")).toBe("811c9dc5");
    expect(fnv1a32("a")).toBe("e40c292c");
    expect(fnv1a32("foobar")).toBe("bf9cf968");
  });

  it("changes when any single weight in the table changes", () => {
    const base = scoringTableHash(current);
    LIKELIHOOD_TABLE.forEach((row, index) => {
      const [cause, weight] = Object.entries(row.weights)[0] ?? [];
      if (cause === undefined || weight === undefined) return;
      const rows = LIKELIHOOD_TABLE.map((r, i) =>
        i === index ? { ...r, weights: { ...r.weights, [cause]: weight + 0.1 } } : r,
      );
      expect(scoringTableHash({ ...current, rows }), row.observation).not.toBe(base);
    });
  });

  it("changes when a prior or a gate changes, but not when keys are merely reordered", () => {
    const base = scoringTableHash(current);
    expect(
      scoringTableHash({
        ...current,
        priors: { ...CAUSE_PRIORS, oil_loss: { ...CAUSE_PRIORS.oil_loss, logOdds: -3.1 } },
      }),
    ).not.toBe(base);
    expect(scoringTableHash({ ...current, gates: RANKING_GATES.slice(1) })).not.toBe(base);
    expect(scoringTableHash({ ...current, grading: { ...GRADING, PURITY_PASS_PCT: 97 } })).not.toBe(base);
    expect(
      scoringTableHash({
        ...current,
        grading: { ...GRADING, STATIC_CHECK: { ...GRADING.STATIC_CHECK, normalUpToK: 2.5 } },
      }),
    ).not.toBe(base);
    expect(
      scoringTableHash({
        ...current,
        grading: {
          ...GRADING,
          CHARGE: { ...GRADING.CHARGE, limits: { ...GRADING.CHARGE.limits, possibleSlowLeakPct: 10 } },
        },
      }),
    ).not.toBe(base);
    expect(canonicalJson({ b: 1, a: [2, { d: 3, c: 4 }] })).toBe(
      canonicalJson({ a: [2, { c: 4, d: 3 }], b: 1 }),
    );
  });
});
