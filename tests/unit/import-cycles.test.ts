import path from "node:path";
import { describe, expect, it } from "vitest";
import { importCycles, importGraph } from "../support/import-graph";

const root = path.resolve(__dirname, "../..");

describe("import cycles", () => {
  it("finds a loop, a self-import and no false loop in a made-up graph", () => {
    const graph = new Map([
      ["a.ts", ["b.ts"]],
      ["b.ts", ["c.ts"]],
      ["c.ts", ["a.ts", "d.ts"]],
      ["d.ts", []],
      ["e.ts", ["e.ts"]],
      ["f.ts", ["d.ts"]],
    ]);
    expect(importCycles(graph)).toEqual(expect.arrayContaining([["a.ts", "b.ts", "c.ts"], ["e.ts"]]));
    expect(importCycles(graph)).toHaveLength(2);
  });

  it("reads the project's imports, type-only ones included", () => {
    const graph = importGraph(root);
    // A type-only import that import/no-cycle would skip.
    expect(graph.get("lib/interview/cross-checks.ts")).toContain("lib/interview/answers.ts");
    expect(graph.get("app/api/cases/route.ts")).toContain("lib/contracts/cases.ts");
  });

  it("has no import cycle anywhere in the project, type-only imports included", () => {
    expect(importCycles(importGraph(root))).toEqual([]);
  }, 60_000);
});
