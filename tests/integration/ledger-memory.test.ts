import { afterAll, describe, expect, it } from "vitest";
import { QueryTypes } from "sequelize";
import { closeSequelize } from "@/lib/db/sequelize";
import { getModels } from "@/models";
import {
  ledgerPageParts,
  ledgerReport,
  ledgerReportRows,
  listCylinderPage,
  listCylinders,
} from "@/lib/server/ledger";
import { forgetLedgers } from "@/lib/server/ledger-memory";
import { createShopWithCylinders } from "./service-fixtures";
import "./helpers";

afterAll(() => closeSequelize());

// The shop's lines are kept in the process between reads (lib/server/ledger-memory.ts); every read
// must still show what the database holds now, whoever wrote it.
describe("the kept ledger", () => {
  it("shows a line written straight into the database (as another app instance would) on the next read", async () => {
    const models = getModels();
    const { shop, recovery, supply, technician } = await createShopWithCylinders(models);
    const net = async (id: number) =>
      (await listCylinders({ shopId: shop.id })).find((c) => c.id === id)!.netG;
    const charged = async () =>
      (await ledgerReportRows({ shopId: shop.id })).rows.reduce((sum, r) => sum + r.chargedG, 0);

    expect(await net(supply.id)).toBe(13_600);
    expect(await charged()).toBe(0);

    // Not through lib/server: a plain INSERT, the way a second instance's post reaches this one.
    await models.sequelize.query(
      `INSERT INTO refrigerant_movement (shop_id, cylinder_id, technician_id, type, refrigerant, mass_g, occurred_at)
       VALUES (?, ?, ?, 'charged_from', 'R-134a', 450, ?)`,
      { replacements: [shop.id, supply.id, technician.id, new Date(Date.UTC(2026, 10, 14, 10))] },
    );
    expect(await net(supply.id)).toBe(13_600 - 450);
    expect(await charged()).toBe(450);
    expect(await net(recovery.id)).toBe(1000);

    // A correction cancels it: the kept figures follow again, the report and its CSV alike.
    const [line] = await models.sequelize.query<{ id: number }>(
      "SELECT id FROM refrigerant_movement WHERE shop_id = ? ORDER BY id DESC LIMIT 1",
      { replacements: [shop.id], type: QueryTypes.SELECT },
    );
    await models.RefrigerantMovement.create({
      shopId: shop.id,
      cylinderId: supply.id,
      technicianId: technician.id,
      type: "charged_from",
      refrigerant: "R-134a",
      massG: 450,
      occurredAt: new Date(Date.UTC(2026, 10, 14, 11)),
      reversesId: line!.id,
    });
    expect(await net(supply.id)).toBe(13_600);
    const report = await ledgerReport({ shopId: shop.id });
    expect(report.rows.reduce((sum, r) => sum + r.chargedG, 0)).toBe(0);
    expect(report.rows.reduce((sum, r) => sum + r.corrections, 0)).toBe(1);
    expect(report.csv).toContain("2026-11");
  });

  it("gives the same figures kept as read afresh, and keeps one shop's lines from another's", async () => {
    const models = getModels();
    const a = await createShopWithCylinders(models);
    const b = await createShopWithCylinders(models);
    await models.RefrigerantMovement.bulkCreate(
      [300, 250, 125].map((massG, i) => ({
        shopId: a.shop.id,
        cylinderId: a.recovery.id,
        technicianId: a.technician.id,
        type: "recovered_into" as const,
        refrigerant: "R-134a" as const,
        massG,
        occurredAt: new Date(Date.UTC(2026, 9, 30 + i, 23, 30)),
      })),
    );
    const kept = {
      cylinders: await listCylinders({ shopId: a.shop.id }),
      report: await ledgerReportRows({ shopId: a.shop.id }),
    };
    forgetLedgers();
    const fresh = {
      cylinders: await listCylinders({ shopId: a.shop.id }),
      report: await ledgerReportRows({ shopId: a.shop.id }),
    };
    expect(kept).toEqual(fresh);
    expect(fresh.cylinders.find((c) => c.id === a.recovery.id)!.netG).toBe(1000 + 675);

    const other = await listCylinders({ shopId: b.shop.id });
    expect(other.find((c) => c.id === b.recovery.id)!.netG).toBe(1000);
    expect((await ledgerReportRows({ shopId: b.shop.id })).rows).toEqual([]);
  });
});

describe("the report's latest months", () => {
  it("gives only the latest months asked for, with the count of every month the report holds", async () => {
    const models = getModels();
    const { shop, supply, technician } = await createShopWithCylinders(models);
    // One charge in each of three months, the oldest first.
    for (const [month, massG] of [
      [8, 100],
      [9, 200],
      [10, 300],
    ] as const)
      await models.sequelize.query(
        `INSERT INTO refrigerant_movement (shop_id, cylinder_id, technician_id, type, refrigerant, mass_g, occurred_at)
         VALUES (?, ?, ?, 'charged_from', 'R-134a', ?, ?)`,
        { replacements: [shop.id, supply.id, technician.id, massG, new Date(Date.UTC(2026, month, 14, 10))] },
      );
    const latest = await ledgerReportRows({ shopId: shop.id, months: 2 });
    expect(latest.monthCount).toBe(3);
    expect(latest.rows.map((r) => [r.month, r.chargedG])).toEqual([
      ["2026-10", 200],
      ["2026-11", 300],
    ]);
    const every = await ledgerReportRows({ shopId: shop.id });
    expect(every.monthCount).toBe(3);
    expect(every.rows.map((r) => r.month)).toEqual(["2026-09", "2026-10", "2026-11"]);
    expect((await ledgerReport({ shopId: shop.id })).monthCount).toBe(3);

    // The ledger page's parts, read from one check of the lines, are what each read gives alone.
    expect(await ledgerPageParts({ shopId: shop.id, months: 2 })).toEqual({
      cylinders: await listCylinderPage({ shopId: shop.id, query: {} }),
      report: latest,
    });
  });
});
