import { describe, expect, it } from "vitest";
import {
  accessTableRowNames,
  exportedMethods,
  keyOfRowName,
  routeInventory,
  serverActionsOf,
  urlPathOf,
} from "@/tests/support/route-inventory";

// The authorisation table must name every way into the app: a route handler, page or server action
// added without a row (every role, no session, another shop's user) fails here.

describe("the role × route table covers every route, page and server action", () => {
  const inventory = routeInventory();
  const covered = new Set(accessTableRowNames().map(keyOfRowName));

  it("finds the app's routes and pages in the file tree", () => {
    const kinds = new Set(inventory.map((e) => e.kind));
    expect(kinds.has("route")).toBe(true);
    expect(kinds.has("page")).toBe(true);
    console.log(
      `${inventory.length} entries: ${inventory.filter((e) => e.kind === "route").length} route/method pairs, ` +
        `${inventory.filter((e) => e.kind === "page").length} pages, ` +
        `${inventory.filter((e) => e.kind === "action").length} server actions`,
    );
  });

  it("has a row for each one", () => {
    const missing = inventory.filter((e) => !covered.has(e.key)).map((e) => `${e.key}  (${e.file})`);
    expect(missing, "add a row to tests/e2e/access.spec.ts for each").toEqual([]);
  });

  it("has no row for a route that no longer exists", () => {
    // A row may try a method the path does not have (it answers 405), so rows are matched by path.
    const pathOf = (key: string) => key.slice(key.indexOf(" ") + 1);
    const known = new Set(inventory.map((e) => pathOf(e.key)));
    // Files Next.js serves from app/ by convention (icons, manifest) are not route modules.
    const stale = [...covered].filter(
      (key): key is string =>
        key !== null && !known.has(pathOf(key)) && !/\.(ico|png|svg|webmanifest)$/.test(key),
    );
    expect(stale).toEqual([]);
  });
});

describe("reading the file tree", () => {
  it("turns folders into URL paths", () => {
    expect(urlPathOf("/x/app/(shop)/cases/[id]/page.tsx".replace("/x/app", `${process.cwd()}/app`))).toBe(
      "/cases/:id",
    );
    expect(urlPathOf(`${process.cwd()}/app/page.tsx`)).toBe("/");
    expect(urlPathOf(`${process.cwd()}/app/api/s/[token]/photos/[photoId]/route.ts`)).toBe(
      "/api/s/:token/photos/:photoId",
    );
  });

  it("finds exported methods however they are written", () => {
    expect(
      exportedMethods(
        "export const GET = handler();\nexport async function POST() {}\nconst PUT = 1;\nexport { PUT, x as DELETE };\nexport const dynamic = 1;",
      ),
    ).toEqual(["DELETE", "GET", "POST", "PUT"]);
  });

  it("finds server actions in a 'use server' module only", () => {
    expect(
      serverActionsOf('"use server";\nexport async function save() {}\nexport function undo() {}'),
    ).toEqual(["save", "undo"]);
    expect(serverActionsOf("export async function save() {}")).toEqual([]);
  });

  it("reads a row name's key", () => {
    expect(keyOfRowName("GET /api/specs/matches?vehicleId=x (not a number)")).toBe("GET /api/specs/matches");
    expect(keyOfRowName("PAGE /cases/:id (a Harbourline case)")).toBe("PAGE /cases/:id");
    expect(keyOfRowName("role table")).toBeNull();
  });
});
