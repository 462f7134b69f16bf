import { afterAll, describe, expect, it } from "vitest";
import { closeSequelize } from "@/lib/db/sequelize";
import { getModels } from "@/models";
import { postManualMovement } from "@/lib/server/ledger-post";
import { createShopWithCylinders } from "./service-fixtures";
import "./helpers";

afterAll(() => closeSequelize());

describe("a backdated ledger movement", () => {
  it("is answered with the movement it saved, even behind more than 500 newer ones", async () => {
    const models = getModels();
    const { shop, recovery, technician } = await createShopWithCylinders(models);
    const now = Date.now();
    // 520 newer lines: recycling leaves the contents as they are, so only the count matters.
    await models.RefrigerantMovement.bulkCreate(
      Array.from({ length: 520 }, (_, i) => ({
        shopId: shop.id,
        cylinderId: recovery.id,
        technicianId: technician.id,
        type: "recycled" as const,
        refrigerant: "R-134a" as const,
        massG: 100,
        occurredAt: new Date(now - i * 60_000),
      })),
    );
    const occurredAt = new Date(now - 400 * 86_400_000).toISOString();
    const posted = await postManualMovement({
      shopId: shop.id,
      technicianId: technician.id,
      input: { cylinderId: recovery.id, type: "recycled", massG: 250, occurredAt },
    });
    expect(posted).toMatchObject({ cylinderId: recovery.id, type: "recycled", massG: 250 });
    expect(new Date(posted.occurredAt).toISOString()).toBe(occurredAt);
    expect(await models.RefrigerantMovement.count({ where: { shopId: shop.id } })).toBe(521);
  });
});
