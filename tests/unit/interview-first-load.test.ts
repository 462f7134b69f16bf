import { readFileSync, statSync } from "node:fs";
import path from "node:path";
import ts from "typescript";
import { describe, expect, it } from "vitest";

// What the interview screen loads before the technician reaches a lazy part (the findings, the spec
// matches): every module its entry reaches through imports that stay in the script, so type-only
// imports and import() calls are left out. The phone checks answers with the same zod/mini schemas
// the server runs (lib/interview/answers.ts, one home for each limit and message); the full zod build,
// the server-only schemas and the service record's sentences and sources stay off it. `npm run bench:interview` prints what the route weighs.

const root = path.resolve(__dirname, "../..");
const ENTRY = "components/interview/interview-boot.tsx";

function resolveLocal(from: string, specifier: string): string | undefined {
  const base = specifier.startsWith("@/")
    ? specifier.slice(2)
    : path.posix.normalize(path.posix.join(path.posix.dirname(from), specifier));
  return [base, `${base}.ts`, `${base}.tsx`, `${base}/index.ts`, `${base}/index.tsx`].find((c) =>
    statSync(path.join(root, c), { throwIfNoEntry: false })?.isFile(),
  );
}

/** The specifiers a file imports for its running code: no `import type`, no all-type named lists, no import(). */
function runtimeImports(file: string): string[] {
  const source = ts.createSourceFile(
    file,
    readFileSync(path.join(root, file), "utf8"),
    ts.ScriptTarget.Latest,
  );
  const out: string[] = [];
  for (const statement of source.statements) {
    if (ts.isImportDeclaration(statement)) {
      const clause = statement.importClause;
      if (clause?.isTypeOnly) continue;
      const named = clause?.namedBindings;
      const onlyTypes =
        clause !== undefined &&
        clause.name === undefined &&
        named !== undefined &&
        ts.isNamedImports(named) &&
        named.elements.length > 0 &&
        named.elements.every((e) => e.isTypeOnly);
      if (!onlyTypes) out.push((statement.moduleSpecifier as ts.StringLiteral).text);
    } else if (ts.isExportDeclaration(statement) && statement.moduleSpecifier) {
      if (statement.isTypeOnly) continue;
      const named = statement.exportClause;
      if (named && ts.isNamedExports(named) && named.elements.every((e) => e.isTypeOnly)) continue;
      out.push((statement.moduleSpecifier as ts.StringLiteral).text);
    }
  }
  return out;
}

/** Every project file and every package the entry reaches. */
function firstLoad(entry: string): { files: Set<string>; packages: Set<string> } {
  const files = new Set<string>();
  const packages = new Set<string>();
  const queue = [entry];
  while (queue.length > 0) {
    const file = queue.pop()!;
    if (files.has(file)) continue;
    files.add(file);
    for (const specifier of runtimeImports(file)) {
      if (specifier.startsWith("@/") || specifier.startsWith(".")) {
        const target = resolveLocal(file, specifier);
        if (target === undefined) throw new Error(`${file}: cannot resolve ${specifier}`);
        queue.push(target);
      } else {
        packages.add(specifier);
      }
    }
  }
  return { files, packages };
}

describe("the interview's first load", () => {
  const { files, packages } = firstLoad(ENTRY);

  it("reaches the screen, the machine and the answer schemas", () => {
    expect(files).toContain("components/interview/interview.tsx");
    expect(files).toContain("machines/interview.ts");
    expect(files).toContain("lib/interview/answers.ts");
  });

  it("carries zod's mini build only, never its full build", () => {
    // zod/mini stands on zod's core and its English messages; the full build is the package root.
    expect(packages).toContain("zod/mini");
    expect([...packages].filter((p) => p === "zod" || p === "zod/v4" || p === "zod/v4/classic")).toEqual([]);
  });

  it("carries no service-record sentences, sources or findings screen", () => {
    expect(files).not.toContain("lib/service/charge.ts");
    expect(files).not.toContain("lib/service/sources.ts");
    expect(files).not.toContain("components/interview/findings-step.tsx");
  });
});
