import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";

// Every way into the app, read from the file tree: each exported method of each app/**/route.ts,
// each app/**/page.tsx, and each exported function of a "use server" module. The authorisation
// table (tests/e2e/access.spec.ts) must have a row for every one of them.

export const HTTP_METHODS = ["GET", "HEAD", "POST", "PUT", "PATCH", "DELETE", "OPTIONS"] as const;

const repoRoot = path.resolve(__dirname, "../..");
const appDir = path.join(repoRoot, "app");

function walk(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const full = path.join(dir, entry.name);
    return entry.isDirectory() ? walk(full) : [full];
  });
}

/** app/(shop)/cases/[id]/route.ts → /cases/:id (route groups dropped, dynamic segments as :name). */
export function urlPathOf(file: string): string {
  const segments = path
    .relative(appDir, path.dirname(file))
    .split(path.sep)
    .filter((s) => s !== "" && !/^\(.*\)$/.test(s))
    .map((s) => s.replace(/^\[\[?\.{0,3}(.+?)\]?\]$/, ":$1"));
  return `/${segments.join("/")}`;
}

/** The HTTP methods a route module exports, as `export const GET` or `export (async) function GET`. */
export function exportedMethods(source: string): string[] {
  const found = new Set<string>();
  const pattern = /export\s+(?:const|let|async\s+function|function)\s+([A-Z]+)\b/g;
  for (const match of source.matchAll(pattern)) {
    const name = match[1]!;
    if ((HTTP_METHODS as readonly string[]).includes(name)) found.add(name);
  }
  for (const match of source.matchAll(/export\s*\{([^}]*)\}/g)) {
    for (const part of match[1]!.split(",")) {
      const name = part
        .trim()
        .split(/\s+as\s+/)
        .pop()!
        .trim();
      if ((HTTP_METHODS as readonly string[]).includes(name)) found.add(name);
    }
  }
  return [...found].sort();
}

/** The exported functions of a module that starts with "use server". */
export function serverActionsOf(source: string): string[] {
  if (!/^\s*(?:\/\/[^\n]*\n\s*|\/\*[\s\S]*?\*\/\s*)*["']use server["']/.test(source)) return [];
  return [...source.matchAll(/export\s+(?:async\s+)?function\s+(\w+)/g)].map((m) => m[1]!);
}

export interface Entry {
  kind: "route" | "page" | "action";
  /** What a row of the table names: "GET /api/cases", "PAGE /cases/:id", "ACTION app/x.ts#save". */
  key: string;
  file: string;
}

export function routeInventory(): Entry[] {
  const files = walk(appDir);
  const entries: Entry[] = [];
  for (const file of files) {
    const rel = path.relative(repoRoot, file);
    const base = path.basename(file);
    if (/^route\.(ts|tsx|js)$/.test(base)) {
      for (const method of exportedMethods(readFileSync(file, "utf8")))
        entries.push({ kind: "route", key: `${method} ${urlPathOf(file)}`, file: rel });
    } else if (/^page\.(tsx|ts|jsx|js)$/.test(base)) {
      entries.push({ kind: "page", key: `PAGE ${urlPathOf(file)}`, file: rel });
    }
  }
  for (const dir of ["app", "lib", "components"]) {
    for (const file of walk(path.join(repoRoot, dir))) {
      if (!/\.(ts|tsx)$/.test(file)) continue;
      for (const name of serverActionsOf(readFileSync(file, "utf8")))
        entries.push({ kind: "action", key: `ACTION ${path.relative(repoRoot, file)}#${name}`, file });
    }
  }
  return entries.sort((a, b) => a.key.localeCompare(b.key));
}

/**
 * The route, page and action keys a row name covers: a name reads "GET /api/cases/:id (a case)" —
 * method and path first, then anything — with concrete ids written as :name.
 */
export function keyOfRowName(name: string): string | null {
  const match = /^(GET|HEAD|POST|PUT|PATCH|DELETE|OPTIONS|PAGE|ACTION) (\S+)/.exec(name);
  if (!match) return null;
  const pathOnly = match[2]!.split("?")[0]!;
  return `${match[1]} ${pathOnly}`;
}

/** The row names of the access table, read from its source so no browser is needed to check coverage. */
export function accessTableRowNames(): string[] {
  const source = readFileSync(path.join(repoRoot, "tests/e2e/access.spec.ts"), "utf8");
  return [...source.matchAll(/\bname:\s*"([^"]+)"/g)].map((m) => m[1]!);
}
