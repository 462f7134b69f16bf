import { NextRequest } from "next/server";
import { afterAll, describe, expect, it } from "vitest";
import { GET as getMovements } from "@/app/api/ledger/movements/route";
import { GET as getCylinders } from "@/app/api/cylinders/route";
import { getLucia } from "@/lib/auth/lucia";
import { closeMysqlPool } from "@/lib/db/pool";
import { closeSequelize } from "@/lib/db/sequelize";
import type { MovementListResponse } from "@/lib/contracts/ledger";
import type { CylinderListResponse } from "@/lib/contracts/cylinders";
import { getModels } from "@/models";
import { createShopWithCylinders } from "./service-fixtures";
import { uniqueName } from "./helpers";

afterAll(async () => {
  await closeMysqlPool();
  await closeSequelize();
});

const ORIGIN = "http://127.0.0.1:3000";

function get(path: string, sessionId: string) {
  return new NextRequest(`${ORIGIN}${path}`, {
    method: "GET",
    headers: { host: "127.0.0.1:3000", cookie: `cw_session=${sessionId}` },
  });
}

const noParams = { params: Promise.resolve({}) };

async function shopWithSession() {
  const fixture = await createShopWithCylinders(getModels());
  const session = await getLucia().createSession(fixture.technician.id, {});
  return { ...fixture, sessionId: session.id };
}

describe("the ledger's lists are paged", () => {
  it("walks every line once, newest first, also where several share the same time", async () => {
    const models = getModels();
    const { shop, recovery, technician, sessionId } = await shopWithSession();
    const base = Date.UTC(2026, 10, 2, 9, 0, 0);
    // Thirteen lines: five share one instant (the cursor must break the tie by id), the rest are a minute apart.
    const times = [0, 1, 2, 3, 3, 3, 3, 3, 4, 5, 6, 7, 8].map((m) => new Date(base + m * 60_000));
    const created = await models.RefrigerantMovement.bulkCreate(
      times.map((occurredAt) => ({
        shopId: shop.id,
        cylinderId: recovery.id,
        technicianId: technician.id,
        type: "recycled" as const,
        refrigerant: "R-134a" as const,
        massG: 100,
        occurredAt,
      })),
    );
    const expected = created
      .map((m) => ({ id: m.id, at: m.occurredAt.getTime() }))
      .sort((a, b) => b.at - a.at || b.id - a.id)
      .map((m) => m.id);

    const seen: number[] = [];
    const pageSizes: number[] = [];
    let cursor: string | null = null;
    do {
      const path: string = `/api/ledger/movements?limit=4${cursor ? `&before=${encodeURIComponent(cursor)}` : ""}`;
      const response = await getMovements(get(path, sessionId), noParams);
      expect(response.status).toBe(200);
      const page = (await response.json()) as MovementListResponse;
      pageSizes.push(page.movements.length);
      seen.push(...page.movements.map((m) => m.id));
      cursor = page.nextCursor;
    } while (cursor && pageSizes.length < 10);

    expect(pageSizes).toEqual([4, 4, 4, 1]);
    expect(seen).toEqual(expected);
  });

  it("refuses a page past the largest and a cursor it did not give, with 400", async () => {
    const { sessionId } = await shopWithSession();
    expect((await getMovements(get("/api/ledger/movements?limit=201", sessionId), noParams)).status).toBe(
      400,
    );
    expect(
      (await getMovements(get("/api/ledger/movements?before=yesterday", sessionId), noParams)).status,
    ).toBe(400);
    expect((await getCylinders(get("/api/cylinders?limit=0", sessionId), noParams)).status).toBe(400);
  });

  it("walks every cylinder once, by label, and leaves retired ones out when asked", async () => {
    const models = getModels();
    const { shop, recovery, supply, sessionId } = await shopWithSession();
    const more = await Promise.all(
      ["A", "B", "C"].map((prefix) =>
        models.Cylinder.create({
          shopId: shop.id,
          label: uniqueName(`${prefix}-CYL`),
          refrigerant: "R-1234yf",
          kind: "virgin",
          tareG: 6000,
          capacityG: 4_500,
          initialNetG: 4_500,
        }),
      ),
    );
    await more[1]!.update({ retiredAt: new Date() });
    const all = [recovery, supply, ...more].map((c) => c.label).sort((a, b) => a.localeCompare(b));

    async function walk(extra: string) {
      const labels: string[] = [];
      let cursor: string | null = null;
      let pages = 0;
      do {
        const path: string = `/api/cylinders?limit=2${extra}${cursor ? `&after=${encodeURIComponent(cursor)}` : ""}`;
        const response = await getCylinders(get(path, sessionId), noParams);
        expect(response.status).toBe(200);
        const page = (await response.json()) as CylinderListResponse;
        expect(page.cylinders.length).toBeLessThanOrEqual(2);
        labels.push(...page.cylinders.map((c) => c.label));
        cursor = page.nextCursor;
        pages += 1;
      } while (cursor && pages < 10);
      return labels;
    }

    expect(await walk("")).toEqual(all);
    expect(await walk("&retired=exclude")).toEqual(all.filter((l) => l !== more[1]!.label));
  });
});
