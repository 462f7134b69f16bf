import { describe, expect, it } from "vitest";
import { CAUSE_IDS } from "@/lib/diagnosis/causes";
import { demoCases } from "@/scripts/demo/cases";
import { interviewColumns } from "@/scripts/demo/seed-demo";
import { REPAIRS } from "@/lib/repairs/catalog";
import { fleschKincaidGrade } from "@/tests/support/reading-grade";
import { OWNER_CAUSES } from "./causes";
import { OWNER_CHECKS } from "./checks";
import { ownerFactsFromCase } from "./case-facts";
import type { OwnerFacts } from "./facts";
import { GLOSSARY } from "./glossary";
import { buildOwnerSummary, ownerSummaryWords, safetyLines } from "./summary";
import type { OwnerUnits } from "./units";

// Every owner template, filled with every demo case in both unit systems, must read at US grade 8
// or below on the Flesch–Kincaid scale (common practice for consumer text; US plain-language guidance).
const MAX_GRADE = 8;

const demoFacts: {
  name: string;
  facts: OwnerFacts;
  summaryInput: Parameters<typeof buildOwnerSummary>[0];
}[] = demoCases.flatMap((d) =>
  (["metric", "imperial"] as OwnerUnits[]).map((units) => {
    const columns = interviewColumns(d, d.shopKey === "ridgeback" ? 1500 : 12);
    const facts = ownerFactsFromCase({ units, answersRecord: columns.answers, serviceRecord: null });
    return {
      name: `${d.key} (${units})`,
      facts,
      summaryInput: {
        shopName: "Demo shop",
        vehicle: null,
        complaint: d.complaint,
        status: d.status,
        conclusionCause: d.conclusionCause,
        findings: columns.findings,
        facts,
        repairsDone: [],
        proposal: null,
      },
    };
  }),
);

const grades: { template: string; grade: number }[] = [];
function expectReadable(template: string, text: string) {
  const grade = fleschKincaidGrade(text);
  grades.push({ template, grade });
  expect(grade, `${template}: grade ${grade.toFixed(1)}\n${text}`).toBeLessThanOrEqual(MAX_GRADE);
}

describe("owner wording reads at grade 8 or below (Flesch–Kincaid)", () => {
  it("every cause template, filled with every demo case", () => {
    for (const cause of CAUSE_IDS) {
      const t = OWNER_CAUSES[cause];
      for (const { name, facts } of demoFacts) {
        const text = [
          t.title,
          t.headline,
          t.what(facts),
          t.comfort,
          t.compressor(facts),
          t.safety(facts),
          t.repair(facts),
          t.watch,
        ].join("\n");
        expectReadable(`cause ${cause} × ${name}`, text);
      }
    }
  });

  it("every next-check template", () => {
    for (const [check, t] of Object.entries(OWNER_CHECKS))
      expectReadable(`check ${check}`, `${t.title}\n${t.text}`);
  });

  it("every repair template, filled with every demo case", () => {
    for (const repair of REPAIRS)
      for (const { name, facts } of demoFacts)
        expectReadable(
          `repair ${repair.id} × ${name}`,
          `${repair.ownerTitle}\n${repair.ownerInvolves(facts)}`,
        );
  });

  it("the safety lines and the glossary", () => {
    for (const { name, facts } of demoFacts)
      expectReadable(`safety × ${name}`, safetyLines(facts).join("\n"));
    for (const entry of GLOSSARY)
      expectReadable(`glossary ${entry.id}`, `${entry.term}\n${entry.explanation}`);
  });

  it("the whole summary of every demo case that reached findings", () => {
    for (const { name, summaryInput } of demoFacts) {
      if (!summaryInput.findings) continue;
      const summary = buildOwnerSummary(summaryInput);
      expectReadable(`summary × ${name}`, ownerSummaryWords(summary));
    }
  });

  it("prints every grade and the highest", () => {
    expect(grades.length).toBeGreaterThan(CAUSE_IDS.length * demoFacts.length);
    const lines = grades.map((g) => `${g.grade.toFixed(2).padStart(6)}  ${g.template}`);
    const highest = grades.reduce((a, b) => (b.grade > a.grade ? b : a));
    console.log(
      `${lines.join("\n")}\nhighest Flesch–Kincaid grade: ${highest.grade.toFixed(2)} (${highest.template})`,
    );
  });
});
