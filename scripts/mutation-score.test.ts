import { describe, expect, it } from "vitest";
import { belowGoal, formatScores, scoreAreas } from "./mutation-score";

const mutants = (...statuses: string[]) => ({ mutants: statuses.map((status) => ({ status })) });

describe("mutation score per area", () => {
  const report = {
    files: {
      "lib/diagnosis/scoring.ts": mutants("Killed", "Killed", "Survived", "Timeout", "Ignored"),
      "lib/units/convert.ts": mutants("Killed", "NoCoverage"),
      "lib/unitsextra/other.ts": mutants("Survived"),
    },
  } as Parameters<typeof scoreAreas>[0];

  it("counts killed and timed-out mutants over every valid one, ignored ones aside, per area and overall", () => {
    const scores = scoreAreas(report, ["lib/diagnosis", "lib/units"]);
    expect(scores.map((s) => [s.area, s.scorePct])).toEqual([
      ["lib/diagnosis", 75],
      ["lib/units", 50],
      ["overall", (100 * 4) / 7],
    ]);
    expect(scores[0]).toMatchObject({
      files: 1,
      killed: 2,
      timeout: 1,
      survived: 1,
      noCoverage: 0,
      ignored: 1,
    });
    expect(scores[2]?.files).toBe(3);
  });

  it("gives no score to an area without mutants, and holds the whole and lib/diagnosis to 90 %", () => {
    const scores = scoreAreas(report, ["lib/diagnosis", "machines"]);
    expect(scores[1]?.scorePct).toBeNull();
    expect(belowGoal(scores).map((s) => s.area)).toEqual(["lib/diagnosis", "overall"]);
    expect(formatScores(scores)).toMatch(/^machines +– +0 +0 +0 +0 +0 +0$/m);
    expect(formatScores(scores)).toMatch(/^lib\/diagnosis +75\.0 +1 +2 +1 +1 +0 +1$/m);
  });
});
