import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { searchRepository, searchText, VOCABULARY_RULES, type VocabularyHit } from "./vocabulary-rules";

const ROOT = fileURLToPath(new URL("../..", import.meta.url));

const report = (hits: VocabularyHit[]) =>
  hits.map((h) => `${h.file}:${h.line}  ${h.rule}: ${h.text}`).join("\n");
const rulesFound = (file: string, text: string) => [...new Set(searchText(file, text).map((h) => h.rule))];

describe("the vocabulary rules", () => {
  it("find a second refrigerant list as an array, a union, a record, an || chain or a sentence", () => {
    for (const text of [
      'const LIST = ["R-134a", "R-1234yf", "R-744"] as const;',
      'type R = "R-134a" | "R-1234yf";',
      'const MAX = { "R-134a": 4500, "R-1234yf": 4500 };',
      'if (r === "R-134a" || r === "R-1234yf") warn();',
      'error: "refrigerant must be R-134a, R-1234yf or R-744"',
    ])
      expect(rulesFound("lib/x.ts", text), text).toEqual(["refrigerant-list"]);
    expect(rulesFound("lib/x.ts", 'refrigerant: "R-134a",\n  labelChargeG: 570,')).toEqual([]);
  });

  it("find another wording of a device, a status or step label table, and a threshold restated", () => {
    expect(rulesFound("components/x.tsx", '{ value: "txv", label: "TXV + receiver-drier" }')).toEqual([
      "expansion-device-list",
    ]);
    expect(
      rulesFound("lib/x.ts", 'const L = { awaiting_signoff: "Waiting", draft: "In progress" };'),
    ).toEqual(["case-status-list"]);
    expect(rulesFound("lib/x.ts", 'chargeAudit: "Charge by weight",')).toEqual(["step-labels"]);
    expect(rulesFound("lib/x.ts", 'z.enum(["cycling_clutch", "variable_displacement"])')).toEqual([
      "compressor-type-list",
    ]);
    expect(rulesFound("lib/x.ts", 'const L = { electric: "Hybrid" };')).toEqual(["compressor-type-list"]);
    expect(rulesFound("lib/x.ts", 'chargeAudit: "If you recovered the charge, say what came out.",')).toEqual(
      [],
    );
    expect(rulesFound("lib/x.ts", "export const PURITY_MIN_PCT = 98;")).toEqual(["purity-limit"]);
    expect(rulesFound("lib/x.ts", "export const EMPTY_STATIC_MAX_KPA_GAUGE = 7;")).toEqual(["empty-system"]);
    expect(rulesFound("lib/x.ts", "const EMPTY = { name: '' };")).toEqual([]);
    expect(rulesFound("lib/x.ts", "const SEA_LEVEL_KPA = 101.325;")).toEqual(["gauge-limits"]);
  });

  it("find a caution defined, spelled or levelled outside the catalogue", () => {
    expect(rulesFound("lib/x.ts", '{ id: "x", severity: "danger", text: "…" }')).toEqual([
      "caution-catalogue",
    ]);
    expect(rulesFound("lib/x.ts", 'const T = { eye_and_skin: "Wear glasses." };')).toEqual([
      "caution-catalogue",
    ]);
    expect(rulesFound("lib/x.ts", 'ids.push("eye-and-skin");')).toEqual(["caution-catalogue"]);
    expect(rulesFound("components/x.tsx", "<strong>{'Caution:'}</strong>")).toEqual(["caution-catalogue"]);
    expect(rulesFound("lib/x.ts", "const mixed = purityFailed;")).toEqual(["contaminated"]);
  });

  it("leave each list in its home, and a match the rule excepts", () => {
    const list = 'const LIST = ["R-134a", "R-1234yf"];';
    expect(rulesFound("lib/refrigerants/catalog.ts", list)).toEqual([]);
    expect(rulesFound("lib/refrigerants/other.ts", list)).toEqual(["refrigerant-list"]);
    expect(rulesFound("lib/cautions/catalog.ts", '{ level: "danger", title: "x" }')).toEqual([]);
    expect(rulesFound("lib/service/oil-type.ts", '{ level: "danger", text: "x" }')).toEqual([]);
    expect(VOCABULARY_RULES.every((r) => r.homes.length > 0 && r.patterns.length > 0)).toBe(true);
  });
});

describe("a search of the tree", () => {
  const { files, hits } = searchRepository(ROOT);

  it("reads the code it is meant to read, not the tests", () => {
    for (const sample of [
      "lib/refrigerants/catalog.ts",
      "components/interview/labels.ts",
      "models/vehicle.ts",
    ])
      expect(files).toContain(sample);
    expect(files.some((f) => f.endsWith(".test.ts"))).toBe(false);
    expect(files.some((f) => f.startsWith("migrations/"))).toBe(false);
  });

  it("finds each shared list and threshold defined once, in its home", () => {
    expect(report(hits)).toBe("");
  });
});
