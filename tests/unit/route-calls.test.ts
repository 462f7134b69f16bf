import { readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import ts from "typescript";
import { describe, expect, it } from "vitest";

// DEVELOPERS.md: a route handler makes one call into the data-access layer (lib/server). This reads
// every app/api route and counts, on each path through a handler, the calls to functions it imports
// from lib/server, and any use of the models or the database connection.

const ROOT = fileURLToPath(new URL("../..", import.meta.url));
/** lib/server modules a route may call freely: they build the handler or read the request, not the data. */
const NOT_DATA_ACCESS = new Set(["@/lib/server/handler", "@/lib/server/public-token"]);
const DATABASE = ["@/models", "@/lib/db/"];

function routeFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    if (statSync(full).isDirectory()) return routeFiles(full);
    return name === "route.ts" ? [full] : [];
  });
}

/** Server calls on the costliest path through a node: branches count once, the larger side. */
function callsOnOnePath(node: ts.Node, server: Set<string>): number {
  if (ts.isConditionalExpression(node))
    return (
      callsOnOnePath(node.condition, server) +
      Math.max(callsOnOnePath(node.whenTrue, server), callsOnOnePath(node.whenFalse, server))
    );
  if (ts.isIfStatement(node))
    return (
      callsOnOnePath(node.expression, server) +
      Math.max(
        callsOnOnePath(node.thenStatement, server),
        node.elseStatement ? callsOnOnePath(node.elseStatement, server) : 0,
      )
    );
  let own = 0;
  if (ts.isCallExpression(node) && ts.isIdentifier(node.expression) && server.has(node.expression.text))
    own = 1;
  let children = 0;
  node.forEachChild((child) => {
    children += callsOnOnePath(child, server);
  });
  return own + children;
}

interface RouteReport {
  file: string;
  databaseImports: string[];
  /** exported handler name → server calls on its costliest path */
  calls: Record<string, number>;
}

export function inspectRoute(file: string, text: string): RouteReport {
  const source = ts.createSourceFile(file, text, ts.ScriptTarget.Latest, true);
  const server = new Set<string>();
  const databaseImports: string[] = [];
  const calls: Record<string, number> = {};
  for (const statement of source.statements) {
    if (ts.isImportDeclaration(statement) && ts.isStringLiteral(statement.moduleSpecifier)) {
      const from = statement.moduleSpecifier.text;
      if (DATABASE.some((d) => from === d || from.startsWith(d))) databaseImports.push(from);
      const named = statement.importClause?.namedBindings;
      if (from.startsWith("@/lib/server/") && !NOT_DATA_ACCESS.has(from) && named && ts.isNamedImports(named))
        for (const element of named.elements) server.add(element.name.text);
    }
    if (ts.isVariableStatement(statement))
      for (const d of statement.declarationList.declarations)
        if (ts.isIdentifier(d.name) && d.initializer)
          calls[d.name.text] = callsOnOnePath(d.initializer, server);
    if (ts.isFunctionDeclaration(statement) && statement.name && statement.body)
      calls[statement.name.text] = callsOnOnePath(statement.body, server);
  }
  return { file: path.relative(ROOT, file), databaseImports, calls };
}

describe("route handlers", () => {
  it("count server calls per path: a ternary or an if is one path at a time", () => {
    const text = [
      'import { handler } from "@/lib/server/handler";',
      'import { a, b } from "@/lib/server/things";',
      "export const ONE = handler({}, async ({ q }) => (q ? a() : b()));",
      "export const TWO = handler({}, async () => { await a(); return b(); });",
    ].join("\n");
    expect(inspectRoute("x/route.ts", text).calls).toEqual({ ONE: 1, TWO: 2 });
  });

  it("each make at most one call into lib/server and never touch the models or the database", () => {
    const reports = routeFiles(path.join(ROOT, "app/api")).map((f) =>
      inspectRoute(f, readFileSync(f, "utf8")),
    );
    expect(reports.length).toBeGreaterThan(30);
    const offenders = reports.flatMap((r) => [
      ...r.databaseImports.map((d) => `${r.file}: imports ${d}`),
      ...Object.entries(r.calls)
        .filter(([, n]) => n > 1)
        .map(([name, n]) => `${r.file} ${name}: ${n} server calls`),
    ]);
    expect(offenders).toEqual([]);
  });
});
