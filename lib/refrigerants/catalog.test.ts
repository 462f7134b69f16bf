import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { REFRIGERANT_IDS, SATURATION_TABLES } from "./catalog";

const FILES: Record<(typeof REFRIGERANT_IDS)[number], string> = {
  "R-134a": "r-134a.json",
  "R-1234yf": "r-1234yf.json",
  "R-744": "r-744.json",
  "R-12": "r-12.json",
};

describe("saturation tables built at load", () => {
  it.each(REFRIGERANT_IDS)("%s holds the committed table's grid and values, number for number", (id) => {
    const committed = JSON.parse(
      readFileSync(join(process.cwd(), "data", "refrigerants", FILES[id]), "utf8"),
    ) as Record<string, unknown>;
    expect(SATURATION_TABLES[id]).toEqual(committed);
    expect(SATURATION_TABLES[id].pressureKpaAbs.length).toBeGreaterThan(100);
  });
});
