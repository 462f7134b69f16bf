import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import path from "node:path";
import { ESLint } from "eslint";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

// Lints throwaway file contents with the project's own eslint.config.mjs, so a layering rule that is
// switched off, mistyped or pointed at the wrong folder fails here. The contents are linted in place
// of real files (the import rules read the file system, so the path must exist); the cycle needs two
// real files, written to a scratch folder that git ignores and removed afterwards.

const root = path.resolve(__dirname, "../..");
let eslint: ESLint;
let scratch: string;

beforeAll(() => {
  eslint = new ESLint({ cwd: root });
  scratch = mkdtempSync(path.join(root, "tests/unit/tmp-layering-"));
});

afterAll(() => {
  rmSync(scratch, { recursive: true, force: true });
});

async function ruleHits(
  filePath: string,
  code: string,
): Promise<{ ruleId: string | null; message: string }[]> {
  const [result] = await eslint.lintText(code, { filePath: path.join(root, filePath) });
  return (result?.messages ?? []).map(({ ruleId, message }) => ({ ruleId, message }));
}

const PATHS = "import/no-restricted-paths";

describe("layering rules in eslint.config.mjs", { timeout: 300_000 }, () => {
  it("refuses an import from app/ outside app/", async () => {
    const hits = await ruleHits(
      "components/cases/case-list.tsx",
      'import { GET } from "@/app/api/health/route";\nexport const handler = GET;\n',
    );
    expect(hits).toContainEqual({
      ruleId: PATHS,
      message: expect.stringContaining("Nothing imports from app/"),
    });
    const fromLib = await ruleHits(
      "lib/server/shops.ts",
      'import { GET } from "@/app/api/health/route";\nexport const handler = GET;\n',
    );
    expect(fromLib.map((h) => h.ruleId)).toContain(PATHS);
    const fromHelper = await ruleHits(
      "tests/support/import-graph.ts",
      'import { GET } from "@/app/api/health/route";\nexport const handler = GET;\n',
    );
    expect(fromHelper.map((h) => h.ruleId)).toContain(PATHS);
  });

  it("refuses components and machines in lib/", async () => {
    for (const line of [
      'import type { SavedInterview } from "@/machines/interview-view";',
      'import { StatusBadge } from "@/components/cases/status-badge";',
    ]) {
      const hits = await ruleHits("lib/queries/interview-outbox.ts", `${line}\nexport {};\n`);
      expect(hits, line).toContainEqual({
        ruleId: PATHS,
        message: expect.stringContaining("lib/ sits below"),
      });
    }
  });

  it("refuses server-only modules in client code, type-only imports included", async () => {
    const cases: [string, string][] = [
      ["components/cases/case-list.tsx", 'import type { CaseStatus } from "@/models";'],
      ["lib/queries/users.ts", 'import type { Models } from "@/models";'],
      ["lib/queries/users.ts", 'import { listCases } from "@/lib/server/cases";'],
      ["machines/interview.ts", 'import { getSequelize } from "@/lib/db/sequelize";'],
      ["lib/contracts/cases.ts", 'import type { ShopSummary } from "@/lib/server/shops";'],
      ["lib/units/convert.ts", 'import { env } from "@/lib/env";'],
      ["components/cases/case-list.tsx", 'import type * as s3 from "@/lib/storage/s3";'],
      ["lib/owner/summary.ts", 'import type * as transport from "@/lib/mail/transport";'],
      ["components/cases/case-list.tsx", 'import { validateRequest } from "@/lib/auth/session";'],
      ["lib/interview/steps.ts", 'import type { User } from "@/lib/auth/lucia";'],
    ];
    for (const [file, line] of cases) {
      const hits = await ruleHits(file, `${line}\nexport {};\n`);
      expect(
        hits.some((h) => h.ruleId === PATHS),
        `${file}: ${line}`,
      ).toBe(true);
    }
  });

  it("lets client code take contracts and the pure parts of lib/auth", async () => {
    const hits = await ruleHits(
      "components/cases/case-list.tsx",
      [
        'import type { CaseStatus } from "@/lib/contracts/cases";',
        'import { ROLES } from "@/lib/auth/roles";',
        'import { caseAbilities } from "@/lib/cases/rules";',
        "export const seen: [CaseStatus[], typeof ROLES, typeof caseAbilities] = [[], ROLES, caseAbilities];",
        "",
      ].join("\n"),
    );
    expect(hits.filter((h) => h.ruleId === PATHS)).toEqual([]);
  });

  it("refuses React and Next in the pure lib folders", async () => {
    for (const [file, line] of [
      ["lib/units/convert.ts", 'import { useState } from "react";'],
      ["lib/contracts/cases.ts", 'import { NextResponse } from "next/server";'],
      ["lib/diagnosis/scoring.ts", 'import type { ReactNode } from "react";'],
    ]) {
      const hits = await ruleHits(file!, `${line}\nexport {};\n`);
      expect(
        hits.some((h) => h.ruleId === "no-restricted-imports" && h.message.includes("Pure lib/")),
        `${file}: ${line}`,
      ).toBe(true);
    }
    // The same import is fine in a component.
    const component = await ruleHits(
      "components/cases/case-list.tsx",
      'import { useState } from "react";\nexport const hook = useState;\n',
    );
    expect(component.filter((h) => h.ruleId === "no-restricted-imports")).toEqual([]);
  });

  it("refuses an import cycle", async () => {
    writeFileSync(
      path.join(scratch, "first.ts"),
      'import { second } from "./second";\nexport const first = () => second;\n',
    );
    writeFileSync(
      path.join(scratch, "second.ts"),
      'import { first } from "./first";\nexport const second = () => first;\n',
    );
    const [result] = await eslint.lintFiles([path.join(scratch, "first.ts")]);
    expect(result?.messages.map((m) => m.ruleId)).toContain("import/no-cycle");
  });
});
