import fc from "fast-check";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { textProblem } from "@/lib/contracts/text";
import { closeMysqlPool } from "@/lib/db/pool";
import { closeSequelize } from "@/lib/db/sequelize";
import { ENGINE_VERSION } from "@/lib/diagnosis";
import { REPAIR_IDS } from "@/lib/repairs/catalog";
import { createShareLink } from "@/lib/server/share-links";
import { getModels } from "@/models";
import { routeInventory } from "@/tests/support/route-inventory";
import { callRoute, signedInUser } from "./api-client";
import { repoRoot, uniqueName } from "./helpers";
import { HOSTILE_CLASSES, HOSTILE_IDS, hostileQuery, RAW_BODIES } from "./hostile-values";
import { createShopWithCylinders } from "./service-fixtures";

// Hostile input as a test: fast-check sends every route handler of app/api (found in the file tree,
// so a route added later is fuzzed too) generated bodies, query strings and ids, signed in as the
// owner of a shop of its own. No answer may be a 5xx or carry a stack trace or driver text, and
// nothing refused may be stored: afterwards every text the shop holds is checked again.

const RUNS_PER_ROUTE = Number(process.env.FUZZ_RUNS ?? 100);
const SEED = 20261204;

afterAll(async () => {
  await closeMysqlPool();
  await closeSequelize();
});

type Fixture = Awaited<ReturnType<typeof createShopWithCylinders>>;
let f: Fixture;
let ownerSession = "";
let shareToken = "";
let specId = 0;

beforeAll(async () => {
  const models = getModels();
  f = await createShopWithCylinders(models);
  const owner = await signedInUser(models, f.shop.id, "owner");
  ownerSession = owner.sessionId;
  const ownerUser = { ...f.user, id: owner.user.id, role: "owner" as const };
  shareToken = (await createShareLink({ user: ownerUser, caseId: f.serviceCase.id, expiresInDays: 7 })).token;
  specId = (
    await models.SpecEntry.create({
      shopId: f.shop.id,
      yearFrom: 2014,
      yearTo: 2018,
      make: "Mazda",
      model: "3",
      variant: "",
      matchKey: uniqueName("mazda 3"),
      rearAc: false,
      refrigerant: "R-134a",
      labelChargeG: 450,
      oilType: "PAG 46",
      totalOilMl: 120,
    } as never)
  ).id;
}, 60_000);

/** A body each route accepts (or nearly), to mutate one field at a time. */
function template(key: string): Record<string, unknown> {
  const spec = {
    yearFrom: 2015,
    yearTo: 2017,
    make: "Kia",
    model: "Rio",
    variant: "",
    rearAc: false,
    refrigerant: "R-134a",
    labelChargeG: 400,
    oilType: "PAG 46",
    totalOilMl: 110,
  };
  const templates: Record<string, Record<string, unknown>> = {
    "POST /api/session": { email: "nobody@fixture.test", password: "not-the-password" },
    "POST /api/cases": { vehicleId: f.vehicle.id, complaint: "Warm air at idle." },
    "PUT /api/cases/:id/interview": {
      baseVersion: 1,
      step: "complaint",
      answers: { complaint: { ownerWords: "Warm at idle." } },
      drafts: {},
    },
    "POST /api/cases/:id/submit": {
      baseVersion: 1,
      engineVersion: ENGINE_VERSION,
      conclusionCause: "undercharge",
      conclusionNotes: "Low on both sides.",
    },
    "POST /api/cases/:id/signoff": { verdict: "sent_back", comment: "Check the static pressure again." },
    "POST /api/cases/:id/outcome": {
      causes: ["undercharge"],
      repairIds: ["leak_repair", "recover_evacuate_recharge"],
      note: "Replaced the O-ring at the condenser inlet.",
    },
    "POST /api/cases/:id/reopen": { reason: "Warm again within a week: the leak was not the only one." },
    "PUT /api/cases/:id/service": {
      baseVersion: 0,
      step: "recovery",
      recoveredChargeG: 300,
      recoveryCylinderId: f.recovery.id,
      notes: "Recovered slowly.",
    },
    "POST /api/cylinders": {
      label: "Bench cylinder",
      refrigerant: "R-134a",
      kind: "virgin",
      tareG: 6000,
      capacityG: 13600,
      initialNetG: 1000,
    },
    "PATCH /api/cylinders/:id": { retired: false },
    "POST /api/ledger/movements": {
      cylinderId: f.supply.id,
      type: "adjustment",
      massG: -3,
      note: "Weighed on the bench scale.",
    },
    "POST /api/invitations": { email: "new.person@fixture.test", name: "New Person", role: "apprentice" },
    "POST /api/invitations/accept": {
      token: "A".repeat(43),
      name: "New Person",
      password: "long-enough-password",
    },
    "PATCH /api/users/:id": { role: "technician" },
    "POST /api/specs": spec,
    "PUT /api/specs/:id": spec,
    "POST /api/specs/import": { csv: "year,make,model\n2016,Kia,Rio\n" },
    "PUT /api/specs/oil-allowances": { allowancesMl: {} },
    "POST /api/cases/:id/share-links": { expiresInDays: 7 },
    "POST /api/cases/:id/proposal": {
      repairIds: [REPAIR_IDS[0]],
      priceMinor: 12000,
      currency: "USD",
      note: "",
    },
    "POST /api/cases/:id/emails": { to: "owner@fixture.test", expiresInDays: 7 },
    "PATCH /api/cases/:id/attachments/:attachmentId": { caption: "Gauges at idle" },
    "POST /api/s/:token/answer": { proposalId: 1, answer: "approved", note: "" },
  };
  return templates[key] ?? {};
}

/** The real id for a path parameter, so a valid-looking request reaches the shop's own rows. */
function realParam(routePath: string, name: string): string {
  if (name === "token") return shareToken;
  if (name === "id") {
    if (routePath.startsWith("/api/cylinders")) return String(f.supply.id);
    if (routePath.startsWith("/api/specs")) return String(specId);
    if (routePath.startsWith("/api/users")) return f.technician.id;
    if (routePath.startsWith("/api/invitations")) return "1";
    return String(f.serviceCase.id);
  }
  return "1";
}

interface Generated {
  className: string;
  body: string | undefined;
  query: string;
  params: Record<string, string>;
  pathText: string;
}

function requestArbitrary(method: string, routePath: string, key: string): fc.Arbitrary<Generated> {
  const names = [...routePath.matchAll(/:(\w+)/g)].map((m) => m[1]!);
  const idArb = (name: string) =>
    fc.oneof(
      { weight: 3, arbitrary: fc.constant(realParam(routePath, name)) },
      { weight: 1, arbitrary: fc.constantFrom(...HOSTILE_IDS) },
    );
  const paramsArb = fc
    .tuple(...names.map((n) => idArb(n).map((v) => [n, v] as const)))
    .map((pairs) => Object.fromEntries(pairs));
  const base = template(key);
  const fields = Object.keys(base);
  const classIndex = fc.integer({ min: 0, max: HOSTILE_CLASSES.length - 1 });
  const bodyArb: fc.Arbitrary<{ className: string; body: string | undefined }> =
    method === "GET" || method === "HEAD"
      ? fc.constant({ className: "query and ids", body: undefined })
      : fc.oneof(
          // One field of a good body replaced by a hostile value.
          fc.tuple(classIndex, fc.nat()).chain(([c, i]) =>
            HOSTILE_CLASSES[c]!.value.map((value) => {
              const field = fields.length ? fields[i % fields.length]! : "value";
              return {
                className: HOSTILE_CLASSES[c]!.name,
                body: JSON.stringify({ ...base, [field]: value }),
              };
            }),
          ),
          // A field nobody reads, next to a good body.
          fc.tuple(classIndex).chain(([c]) =>
            HOSTILE_CLASSES[c]!.value.map((value) => ({
              className: `${HOSTILE_CLASSES[c]!.name} (unknown field)`,
              body: JSON.stringify({ ...base, shopId: 1, id: 1, role: "owner", extra: value }),
            })),
          ),
          // The whole body hostile.
          fc.tuple(classIndex).chain(([c]) =>
            HOSTILE_CLASSES[c]!.value.map((value) => ({
              className: `${HOSTILE_CLASSES[c]!.name} (whole body)`,
              body: JSON.stringify(value) ?? "null",
            })),
          ),
          fc.constantFrom(...RAW_BODIES).map((body) => ({ className: "raw malformed JSON", body })),
        );
  return fc.record({ b: bodyArb, query: hostileQuery, params: paramsArb }).map(({ b, query, params }) => {
    const pathText = routePath.replace(/:(\w+)/g, (_, n: string) => encodeURIComponent(params[n] ?? ""));
    return { className: b.className, body: b.body, query, params, pathText };
  });
}

const STACK_OR_DRIVER =
  /\bat [\w.$<>]+ \(|node_modules|Sequelize|SqlError|\bsql:|\bER_[A-Z_]{3,}|ECONN|mysql|mariadb/i;

type Tally = Map<string, Map<number, number>>;
const tally: Tally = new Map();
function count(className: string, status: number) {
  const row = tally.get(className) ?? new Map<number, number>();
  row.set(status, (row.get(status) ?? 0) + 1);
  tally.set(className, row);
}

describe("hostile input against every JSON API", () => {
  const routes = routeInventory().filter((e) => e.kind === "route" && e.key.includes(" /api/"));

  it("finds the API routes to fuzz", () => {
    expect(routes.length).toBeGreaterThan(30);
  });

  for (const [index, route] of routes.entries()) {
    const [method, routePath] = route.key.split(" ") as [string, string];
    it(`${route.key}: no 5xx, no stack trace`, async () => {
      const mod = (await import(path.join(repoRoot, route.file))) as Record<
        string,
        Parameters<typeof callRoute>[0]
      >;
      const fn = mod[method]!;
      await fc.assert(
        fc.asyncProperty(requestArbitrary(method, routePath, route.key), async (g) => {
          // Signing out would end the session every other request uses: it gets one of its own.
          const sessionId =
            route.key === "DELETE /api/session"
              ? (await signedInUser(getModels(), f.shop.id, "technician")).sessionId
              : ownerSession;
          const res = await callRoute(fn, `${g.pathText}${g.query ? `?${g.query}` : ""}`, {
            method,
            sessionId,
            body: g.body,
            params: Object.fromEntries(
              Object.entries(g.params).map(([k, v]) => {
                try {
                  return [k, decodeURIComponent(v)];
                } catch {
                  return [k, v];
                }
              }),
            ),
          });
          count(g.className, res.status);
          expect(res.status, `${route.key} ${g.className}: ${res.text.slice(0, 300)}`).toBeLessThan(500);
          const contentType = res.headers.get("content-type") ?? "";
          if (contentType.includes("json") || contentType.includes("text")) {
            expect(res.text).not.toMatch(STACK_OR_DRIVER);
          }
        }),
        {
          numRuns: route.key.startsWith("POST /api/session") ? 30 : RUNS_PER_ROUTE,
          seed: SEED + index,
          endOnFailure: true,
        },
      );
    }, 300_000);
  }

  it("stored nothing that should have been refused", async () => {
    const { sequelize } = getModels();
    const checks: [string, string, "single" | "multi"][] = [
      ["customer", "name", "single"],
      ["customer", "phone", "single"],
      ["vehicle", "make", "single"],
      ["vehicle", "model", "single"],
      ["vehicle", "engine", "single"],
      ["service_case", "complaint", "multi"],
      ["service_case", "conclusion_notes", "multi"],
      ["cylinder", "label", "single"],
      ["cylinder", "serial", "single"],
      ["refrigerant_movement", "destination", "single"],
      ["refrigerant_movement", "note", "single"],
      ["spec_entry", "make", "single"],
      ["spec_entry", "model", "single"],
      ["spec_entry", "variant", "single"],
      ["spec_entry", "oil_type", "single"],
      ["user_invitation", "name", "single"],
      ["attachment", "caption", "single"],
      ["service_record", "notes", "multi"],
    ];
    let rows = 0;
    for (const [table, column, lines] of checks) {
      const [found] = (await sequelize.query(
        `SELECT ${column} AS text FROM ${table} WHERE shop_id = ? AND ${column} IS NOT NULL`,
        { replacements: [f.shop.id] },
      )) as [{ text: string }[], unknown];
      for (const { text } of found) {
        rows += 1;
        expect(
          textProblem(text, lines),
          `${table}.${column}: ${JSON.stringify(text).slice(0, 80)}`,
        ).toBeNull();
      }
    }
    console.log(`checked ${rows} stored texts of the fuzzed shop`);
  });

  it("prints every class tried with its answers", () => {
    const lines = [...tally.entries()]
      .sort(([a], [b]) => a.localeCompare(b))
      .map(([name, statuses]) => {
        const total = [...statuses.values()].reduce((a, b) => a + b, 0);
        const byStatus = [...statuses.entries()]
          .sort(([a], [b]) => a - b)
          .map(([s, n]) => `${s}×${n}`)
          .join(" ");
        return `${name.padEnd(44)} ${String(total).padStart(5)}  ${byStatus}`;
      });
    console.log(`hostile input (seed ${SEED}, ${RUNS_PER_ROUTE} runs per route):\n${lines.join("\n")}`);
    expect(tally.size).toBeGreaterThan(0);
  });
});
