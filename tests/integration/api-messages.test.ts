import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { GET as listCylindersRoute, POST as createCylinderRoute } from "@/app/api/cylinders/route";
import type { CylinderListResponse } from "@/lib/contracts/cylinders";
import { closeMysqlPool } from "@/lib/db/pool";
import { closeSequelize } from "@/lib/db/sequelize";
import { getModels } from "@/models";
import { callRoute, fieldErrorsOf, signedInUser } from "./api-client";
import { uniqueName } from "./helpers";
import { createShopWithCylinders } from "./service-fixtures";

// Limits and fill sentences are written once with quantity markers; an API caller reads them as
// sentences in the product's own units, and our screens get the marked wording beside them.

afterAll(async () => {
  await closeMysqlPool();
  await closeSequelize();
});

let fixture: Awaited<ReturnType<typeof createShopWithCylinders>>;
let owner: { sessionId: string };

beforeAll(async () => {
  const models = getModels();
  fixture = await createShopWithCylinders(models);
  owner = await signedInUser(models, fixture.shop.id, "owner");
});

const MARKER = /\{\{[qr]:/;

describe("a cylinder's limit messages in an API answer", () => {
  it("say the limit in grams, with the marked wording beside it for the screen", async () => {
    const res = await callRoute(createCylinderRoute, "/api/cylinders", {
      method: "POST",
      sessionId: owner.sessionId,
      body: {
        label: uniqueName("CYL"),
        refrigerant: "R-134a",
        kind: "virgin",
        tareG: 100,
        capacityG: 300,
        initialNetG: 0,
      },
    });
    expect(res.status).toBe(400);
    expect(fieldErrorsOf(res.json)).toEqual({
      tareG: ["A tare under 500 g is not a refrigerant cylinder."],
      capacityG: ["A capacity under 500 g is not a refrigerant cylinder: check the unit."],
    });
    const marked = (res.json as { error: { marked?: { fieldErrors?: Record<string, string[]> } } }).error
      .marked;
    expect(marked?.fieldErrors?.tareG).toEqual([
      "A tare under {{q:mass:500}} is not a refrigerant cylinder.",
    ]);
    // Only the readable answer outside `marked`.
    const readable = { ...(res.json as { error: Record<string, unknown> }).error, marked: undefined };
    expect(JSON.stringify(readable)).not.toMatch(MARKER);
  });

  it("an error without quantities has no marked part", async () => {
    const res = await callRoute(createCylinderRoute, "/api/cylinders", {
      method: "POST",
      sessionId: owner.sessionId,
      body: {
        label: "",
        refrigerant: "R-134a",
        kind: "virgin",
        tareG: 6000,
        capacityG: 13_600,
        initialNetG: 0,
      },
    });
    expect(res.status).toBe(400);
    expect((res.json as { error: Record<string, unknown> }).error).not.toHaveProperty("marked");
  });
});

describe("a cylinder's fill sentence in an API answer", () => {
  it("is said in grams, also where the cylinder is past its limit", async () => {
    const label = uniqueName("FULL");
    // 80 % of 22,000 g is 17,600 g: 18,000 g is 400 g past it.
    await getModels().Cylinder.create({
      shopId: fixture.shop.id,
      label,
      refrigerant: "R-134a",
      kind: "recovery",
      tareG: 7000,
      capacityG: 22_000,
      initialNetG: 18_000,
    });
    const res = await callRoute(listCylindersRoute, "/api/cylinders", { sessionId: owner.sessionId });
    expect(res.status).toBe(200);
    expect(res.text).not.toMatch(MARKER);
    const full = (res.json as CylinderListResponse).cylinders.find((c) => c.label === label)!;
    expect(full.fillMessage).toBe(
      "81.8 % full: 400 g past the 80 % limit. Stop filling this cylinder and change to an empty one.",
    );
    expect(full.problems).toContain(full.fillMessage);
    const room = (res.json as CylinderListResponse).cylinders.find(
      (c) => c.label === fixture.recovery.label,
    )!;
    expect(room.fillMessage).toBe("4.5 % full; 16,600 g of room before the 80 % limit.");
  });
});
