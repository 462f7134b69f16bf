import { describe, expect, it } from "vitest";
import { CAUSE_IDS } from "./causes";
import type { Observation } from "./evidence-types";
import { CAUSE_PRIORS, LIKELIHOOD_TABLE, type RankingGate } from "./likelihood-table";
import { causeIndex, outcomeVector, scoreCauses, weightOf } from "./scoring";

// The scoring rule as the engine's README states it: log-odds = prior + Σ strength × weight, read straight
// from the likelihood table; a ranking gate puts its leader exactly its margin ahead of the best other cause
// when one of its observations is present, and only then; the first gate in the list ends on top.
const observation = (id: Observation["id"], strength?: number): Observation => ({
  id,
  message: { key: id as never },
  ...(strength === undefined ? {} : { strength }),
});
const score = (observations: Observation[], gates: readonly RankingGate[] = []) =>
  Object.fromEntries(scoreCauses(observations, gates).map((s) => [s.cause, s]));
const row = LIKELIHOOD_TABLE.find((r) => r.observation === "lift:close")!;

describe("weights from the table", () => {
  it("reads each weight of a row, and zero for a cause the row leaves out or an unknown observation", () => {
    for (const cause of CAUSE_IDS) expect(weightOf("lift:close", cause)).toBe(row.weights[cause] ?? 0);
    expect(weightOf("lift:close", "evaporator_icing")).toBe(0);
    expect(weightOf("no_such_observation" as never, "overcharge")).toBe(0);
    expect(weightOf("lift:close", "no_such_cause" as never)).toBe(0);
  });

  it("indexes causes in their fixed order", () => {
    CAUSE_IDS.forEach((cause, i) => expect(causeIndex(cause)).toBe(i));
    expect(causeIndex("no_such_cause" as never)).toBe(-1);
  });

  it("sums an outcome's rows per cause, with their exponentials, the same array each time", () => {
    const outcome = ["lift:close", "purity:pass"] as const;
    const vector = outcomeVector(outcome);
    expect(outcomeVector(outcome)).toBe(vector);
    CAUSE_IDS.forEach((cause, i) => {
      const sum = weightOf("lift:close", cause) + weightOf("purity:pass", cause);
      expect(vector.weights[i]).toBeCloseTo(sum, 12);
      expect(vector.expWeights[i]).toBeCloseTo(Math.exp(sum), 12);
    });
    expect(outcomeVector(["no_such_observation" as never]).weights.every((w) => w === 0)).toBe(true);
  });
});

describe("log-odds", () => {
  it("starts each cause at its prior and adds each weight times the reading's strength", () => {
    const none = score([]);
    for (const cause of CAUSE_IDS) {
      expect(none[cause]!.logOdds).toBe(CAUSE_PRIORS[cause].logOdds);
      expect(none[cause]!.items).toEqual([]);
    }
    const full = score([observation("lift:close")]);
    const half = score([observation("lift:close", 0.5)]);
    for (const cause of CAUSE_IDS) {
      const w = row.weights[cause] ?? 0;
      expect(full[cause]!.logOdds).toBeCloseTo(CAUSE_PRIORS[cause].logOdds + w, 12);
      expect(half[cause]!.logOdds).toBeCloseTo(CAUSE_PRIORS[cause].logOdds + w / 2, 12);
      expect(full[cause]!.items.map((i) => i.weight)).toEqual(w === 0 ? [] : [w]);
      expect(half[cause]!.items.map((i) => i.weight)).toEqual(w === 0 ? [] : [w / 2]);
    }
    expect(full.weak_compressor!.items[0]).toEqual({
      observation: "lift:close",
      message: { key: "lift:close" },
      weight: row.weights.weak_compressor,
    });
  });

  it("lets a reading of strength 0 move nothing and list nothing", () => {
    const zero = score([observation("lift:close", 0)]);
    for (const cause of CAUSE_IDS) {
      expect(zero[cause]!.logOdds).toBe(CAUSE_PRIORS[cause].logOdds);
      expect(zero[cause]!.items).toEqual([]);
    }
  });

  it("skips an observation the table does not know", () => {
    expect(score([observation("no_such_observation" as never)])).toEqual(score([]));
  });
});

describe("ranking gates", () => {
  const gate = (
    leader: RankingGate["leader"],
    marginLogOdds: number,
    ...when: RankingGate["when"]
  ): RankingGate => ({
    when,
    leader,
    marginLogOdds,
    message: "gate:empty",
    source: "test",
  });

  it("puts the leader exactly its margin over the best other cause, and says so first", () => {
    const observations = [observation("lift:close")];
    const plain = score(observations);
    const gated = score(observations, [gate("moisture", 0.5, "lift:close")]);
    const bestOther = Math.max(...CAUSE_IDS.filter((c) => c !== "moisture").map((c) => plain[c]!.logOdds));
    expect(gated.moisture!.logOdds).toBe(bestOther + 0.5);
    expect(gated.moisture!.items[0]).toEqual({
      observation: "ranking_gate",
      message: { key: "gate:empty" },
      weight: bestOther + 0.5 - plain.moisture!.logOdds,
    });
    for (const cause of CAUSE_IDS.filter((c) => c !== "moisture"))
      expect(gated[cause]!.logOdds).toBe(plain[cause]!.logOdds);
  });

  it("acts only when one of its observations is present, and never pulls a leader down", () => {
    const observations = [observation("lift:close")];
    expect(score(observations, [gate("moisture", 0.5, "purity:fail")])).toEqual(score(observations));
    expect(
      score(observations, [gate("moisture", 0.5, "purity:fail", "lift:close")]).moisture!.logOdds,
    ).toBeGreaterThan(score(observations).moisture!.logOdds);
    // A cause already leading by more than the gate's margin stays where it is.
    const plain = score(observations);
    const [first, second] = CAUSE_IDS.map((c) => plain[c]!).sort((a, b) => b.logOdds - a.logOdds);
    expect(first!.logOdds - second!.logOdds).toBeGreaterThan(0.1);
    const leaderAlready = score(observations, [gate(first!.cause, 0.1, "lift:close")]);
    expect(leaderAlready[first!.cause]!.logOdds).toBe(first!.logOdds);
    expect(leaderAlready[first!.cause]!.items.some((i) => i.observation === "ranking_gate")).toBe(false);
  });

  it("applies the gates last to first, so the first gate in the list ends on top", () => {
    const observations = [observation("lift:close")];
    const gated = score(observations, [gate("moisture", 1, "lift:close"), gate("oil_loss", 1, "lift:close")]);
    expect(gated.moisture!.logOdds).toBe(gated.oil_loss!.logOdds + 1);
    const reversed = score(observations, [
      gate("oil_loss", 1, "lift:close"),
      gate("moisture", 1, "lift:close"),
    ]);
    expect(reversed.oil_loss!.logOdds).toBe(reversed.moisture!.logOdds + 1);
  });
});
