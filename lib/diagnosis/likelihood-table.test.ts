import { describe, expect, it } from "vitest";
import { CAUSE_IDS } from "./causes";
import { CAUSE_PRIORS, LIKELIHOOD_TABLE, RANKING_GATES } from "./likelihood-table";
import { READING_GRADES } from "./observations";
import { SYMPTOM_IDS } from "./symptoms";

const validObservations = new Set<string>([
  ...Object.entries(READING_GRADES).flatMap(([group, grades]) => grades.map((grade) => `${group}:${grade}`)),
  ...SYMPTOM_IDS.map((id) => `symptom:${id}`),
]);

describe("likelihood table", () => {
  it("gives every cause a prior between 1 % and 50 % with a source", () => {
    for (const cause of CAUSE_IDS) {
      const prior = CAUSE_PRIORS[cause];
      expect(1 / (1 + Math.exp(-prior.logOdds))).toBeGreaterThan(0.01);
      expect(1 / (1 + Math.exp(-prior.logOdds))).toBeLessThan(0.5);
      expect(prior.source.length).toBeGreaterThan(5);
    }
  });

  it("has one row per known observation, each with finite weights on known causes and a source", () => {
    const seen = new Set<string>();
    for (const row of LIKELIHOOD_TABLE) {
      expect(validObservations.has(row.observation), row.observation).toBe(true);
      expect(seen.has(row.observation), `duplicate ${row.observation}`).toBe(false);
      seen.add(row.observation);
      expect(row.source.trim().length, row.observation).toBeGreaterThan(5);
      for (const [cause, weight] of Object.entries(row.weights)) {
        expect(CAUSE_IDS as readonly string[], row.observation).toContain(cause);
        expect(Number.isFinite(weight) && Math.abs(weight) <= 5, `${row.observation}/${cause}`).toBe(true);
      }
    }
  });

  it("covers every symptom and every reading grade, so no reported fact is silently ignored", () => {
    const rows = new Set(LIKELIHOOD_TABLE.map((r) => r.observation as string));
    for (const id of validObservations) expect(rows.has(id), id).toBe(true);
  });

  it("never lowers non-condensables as the static excess rises (Dalton's law: air adds its partial pressure)", () => {
    const order = READING_GRADES.static.map(
      (grade) =>
        LIKELIHOOD_TABLE.find((r) => r.observation === `static:${grade}`)?.weights.non_condensables ?? 0,
    );
    for (let i = 1; i < order.length; i++) expect(order[i]).toBeGreaterThanOrEqual(order[i - 1] ?? -Infinity);
  });

  it("orders the charge rows as weight demands: overcharge rises and undercharge falls with the recovered mass (TM 5-3805-291-23-1)", () => {
    const column = (cause: "overcharge" | "undercharge") =>
      READING_GRADES.charge.map(
        (grade) => LIKELIHOOD_TABLE.find((r) => r.observation === `charge:${grade}`)?.weights[cause] ?? 0,
      );
    const over = column("overcharge");
    const under = column("undercharge");
    for (let i = 1; i < over.length; i++) {
      expect(over[i]).toBeGreaterThanOrEqual(over[i - 1] ?? -Infinity);
      expect(under[i]).toBeLessThanOrEqual(under[i - 1] ?? Infinity);
    }
  });

  it("keeps the signs the physics gives (each would survive a flipped weight otherwise)", () => {
    const w = (observation: string, cause: string) =>
      LIKELIHOOD_TABLE.find((r) => r.observation === observation)?.weights[
        cause as keyof typeof CAUSE_PRIORS
      ] ?? 0;
    // SAE J2099 / J2912: a failed identifier is evidence for contamination.
    expect(w("purity:fail", "contaminated_refrigerant")).toBeGreaterThan(0);
    expect(w("purity:pass", "contaminated_refrigerant")).toBeLessThan(0);
    // Pressures close together point to a compressor that is not pumping (common practice).
    expect(w("lift:close", "weak_compressor")).toBeGreaterThan(0);
    expect(w("lift:normal", "weak_compressor")).toBeLessThan(0);
    // Dalton's law: a static above saturation is air, never against it.
    expect(w("static:very_high", "non_condensables")).toBeGreaterThan(0);
  });

  it("makes every gate's trigger a known observation with a source", () => {
    for (const gate of RANKING_GATES) {
      for (const id of gate.when) expect(validObservations.has(id), id).toBe(true);
      expect(gate.source.length).toBeGreaterThan(5);
      expect(gate.marginLogOdds).toBeGreaterThan(0);
    }
  });
});
