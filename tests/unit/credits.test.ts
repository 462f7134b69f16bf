import { readFileSync } from "node:fs";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { CREDITS } from "@/lib/credits/packages";
import { authorName, buildCredits } from "@/scripts/credits-list";

const ROOT = fileURLToPath(new URL("../..", import.meta.url));
const readJson = (path: string) => JSON.parse(readFileSync(join(ROOT, path), "utf8"));

describe("credits (data/credits.json)", () => {
  const dependencies: Record<string, string> = readJson("package.json").dependencies;

  it("lists every runtime dependency of package.json with the licence its own package.json gives", () => {
    const listed = new Map(CREDITS.direct.map((p) => [p.name, p]));
    const missing = Object.keys(dependencies).filter((name) => !listed.has(name));
    expect(missing, "run `npm run data:credits`").toEqual([]);
    for (const name of Object.keys(dependencies)) {
      const own = readJson(`node_modules/${name}/package.json`);
      expect(listed.get(name)?.licence, name).toBe(own.license);
      expect(listed.get(name)?.version, name).toBe(own.version);
    }
  });

  it("lists no package that package.json no longer depends on", () => {
    expect(CREDITS.direct.map((p) => p.name).filter((name) => !(name in dependencies))).toEqual([]);
  });

  it("gives every package, direct or brought along, a licence", () => {
    const unlicensed = [...CREDITS.direct, ...CREDITS.included].filter((p) => !p.licence).map((p) => p.name);
    expect(unlicensed).toEqual([]);
  });

  it("matches a fresh generation from package.json, the lock file and node_modules", () => {
    expect(buildCredits(ROOT)).toEqual(CREDITS);
  });

  it("keeps no development-only package (test runners, linters) in the list", () => {
    const names = new Set([...CREDITS.direct, ...CREDITS.included].map((p) => p.name));
    for (const dev of ["vitest", "eslint", "prettier", "@playwright/test", "typescript"])
      expect(names.has(dev), dev).toBe(false);
  });
});

describe("authorName", () => {
  it("keeps the name and drops e-mail and web addresses", () => {
    expect(authorName("Jane Doe <jane@example.com> (https://example.com/jane)")).toBe("Jane Doe");
    expect(authorName({ name: "Ren Ito" })).toBe("Ren Ito");
    expect(authorName("https://example.org/someone")).toBeUndefined();
    expect(authorName(undefined)).toBeUndefined();
  });
});
