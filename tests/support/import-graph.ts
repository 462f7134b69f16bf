import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import ts from "typescript";

// The project's own import graph, type-only imports included (import/no-cycle skips those).

const SKIP_DIRS = new Set(["node_modules", ".next", ".data", ".git", "test-results", "playwright-report"]);
const SOURCE = /\.(ts|tsx|mts)$/;

function sourceFiles(root: string, dir = ""): string[] {
  const out: string[] = [];
  for (const entry of readdirSync(path.join(root, dir), { withFileTypes: true })) {
    const rel = dir ? `${dir}/${entry.name}` : entry.name;
    if (entry.isDirectory()) {
      // tmp-layering-*: the layering test's scratch files, which hold a cycle on purpose.
      if (!SKIP_DIRS.has(entry.name) && !entry.name.startsWith("tmp-layering-"))
        out.push(...sourceFiles(root, rel));
    } else if (SOURCE.test(entry.name) && !entry.name.endsWith(".d.ts")) {
      out.push(rel);
    }
  }
  return out;
}

function resolveImport(from: string, specifier: string, known: Set<string>): string | undefined {
  let base: string;
  if (specifier.startsWith("@/")) base = specifier.slice(2);
  else if (specifier.startsWith("."))
    base = path.posix.normalize(path.posix.join(path.posix.dirname(from), specifier));
  else return undefined;
  return [base, `${base}.ts`, `${base}.tsx`, `${base}.mts`, `${base}/index.ts`, `${base}/index.tsx`].find(
    (c) => known.has(c),
  );
}

/** file → the project files it imports, by path relative to the root. */
export function importGraph(root: string): Map<string, string[]> {
  const files = sourceFiles(root);
  const known = new Set(files);
  const graph = new Map<string, string[]>();
  for (const file of files) {
    const { importedFiles } = ts.preProcessFile(readFileSync(path.join(root, file), "utf8"), true, true);
    const targets = importedFiles
      .map((i) => resolveImport(file, i.fileName, known))
      .filter((t): t is string => t !== undefined);
    graph.set(file, [...new Set(targets)]);
  }
  return graph;
}

/** Every group of files that import each other in a loop (strongly connected components, Tarjan). */
export function importCycles(graph: Map<string, string[]>): string[][] {
  let next = 0;
  const index = new Map<string, number>();
  const low = new Map<string, number>();
  const stack: string[] = [];
  const onStack = new Set<string>();
  const cycles: string[][] = [];

  function visit(v: string) {
    index.set(v, next);
    low.set(v, next);
    next += 1;
    stack.push(v);
    onStack.add(v);
    for (const w of graph.get(v) ?? []) {
      if (!index.has(w)) {
        visit(w);
        low.set(v, Math.min(low.get(v)!, low.get(w)!));
      } else if (onStack.has(w)) {
        low.set(v, Math.min(low.get(v)!, index.get(w)!));
      }
    }
    if (low.get(v) !== index.get(v)) return;
    const component: string[] = [];
    let w: string;
    do {
      w = stack.pop()!;
      onStack.delete(w);
      component.push(w);
    } while (w !== v);
    if (component.length > 1 || (graph.get(v) ?? []).includes(v)) cycles.push(component.sort());
  }

  for (const v of graph.keys()) if (!index.has(v)) visit(v);
  return cycles;
}
