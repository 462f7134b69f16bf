import { QueryTypes } from "sequelize";
import { afterAll, describe, expect, it } from "vitest";
import { closeSequelize } from "@/lib/db/sequelize";
import { getModels } from "@/models";
import { listCases } from "@/lib/server/cases";
import { listUsers } from "@/lib/server/users";
import { listVehicleChoices } from "@/lib/server/vehicles";
import { listSpecPage } from "@/lib/server/specs";
import { caseListQuerySchema } from "@/lib/contracts/cases";
import { userListQuerySchema } from "@/lib/contracts/users";
import { createShopWithCase } from "./fixtures";
import "./helpers";

afterAll(() => closeSequelize());

describe("every list answers one page", () => {
  it("pages the case list, newest change first, and says where the next page starts", async () => {
    const models = getModels();
    const { shop, serviceCase } = await createShopWithCase(models, "First");
    for (const complaint of ["Second", "Third"])
      await models.Case.create({
        shopId: shop.id,
        technicianId: serviceCase.technicianId,
        vehicleId: serviceCase.vehicleId,
        customerId: serviceCase.customerId,
        complaint,
      });
    const first = await listCases({ shopId: shop.id, limit: 2, offset: 0 });
    expect(first.cases.map((c) => c.complaint)).toEqual(["Third", "Second"]);
    expect(first.nextOffset).toBe(2);
    const last = await listCases({ shopId: shop.id, limit: 2, offset: 2 });
    expect(last.cases.map((c) => c.complaint)).toEqual(["First"]);
    expect(last.nextOffset).toBeNull();
  });

  it("refuses a page larger than the route's maximum", () => {
    expect(caseListQuerySchema.safeParse({ limit: "101" }).success).toBe(false);
    expect(caseListQuerySchema.safeParse({ offset: "-1" }).success).toBe(false);
    expect(caseListQuerySchema.parse({})).toMatchObject({ limit: 50, offset: 0 });
    expect(userListQuerySchema.safeParse({ limit: "500" }).success).toBe(false);
  });

  it("pages people, vehicles and the spec table", async () => {
    const models = getModels();
    const { shop, customer } = await createShopWithCase(models);
    await models.Vehicle.create({
      shopId: shop.id,
      customerId: customer.id,
      year: 2019,
      make: "Kia",
      model: "Soul",
      refrigerant: "R-1234yf",
      expansionDevice: "txv",
    });
    const vehicles = await listVehicleChoices({ shopId: shop.id, limit: 1 });
    expect(vehicles.vehicles).toHaveLength(1);
    expect(vehicles.nextOffset).toBe(1);
    expect((await listVehicleChoices({ shopId: shop.id, limit: 1, offset: 1 })).nextOffset).toBeNull();
    const users = await listUsers({ shopId: shop.id, limit: 1 });
    expect(users.users).toHaveLength(1);
    expect(users.nextOffset).toBeNull();
    const specs = await listSpecPage({ shopId: shop.id, limit: 10, offset: 0 });
    expect(specs).toEqual({ specs: [], nextOffset: null });
  });

  it("sorts a shop's cases through an index, never a filesort of the whole shop", async () => {
    const shop = await getModels().Shop.findOne({ where: { name: "Harbourline Auto Climate" }, raw: true });
    const plan = await getModels().sequelize.query<{ key: string | null; Extra: string; type: string }>(
      "EXPLAIN SELECT id FROM service_case WHERE shop_id = :shopId ORDER BY updated_at DESC, id DESC LIMIT 51",
      { replacements: { shopId: shop?.id }, type: QueryTypes.SELECT },
    );
    expect(plan[0]?.key, JSON.stringify(plan)).toBe("service_case_shop_updated");
    expect(plan[0]?.Extra ?? "", JSON.stringify(plan)).not.toContain("filesort");
  });

  it("lists a shop's vehicles most recently seen first through an index", async () => {
    const shop = await getModels().Shop.findOne({ where: { name: "Harbourline Auto Climate" }, raw: true });
    const plan = await getModels().sequelize.query<{ key: string | null; Extra: string; type: string }>(
      "EXPLAIN SELECT id FROM vehicle WHERE shop_id = :shopId ORDER BY updated_at DESC, id DESC LIMIT 31",
      { replacements: { shopId: shop?.id }, type: QueryTypes.SELECT },
    );
    expect(plan[0]?.key, JSON.stringify(plan)).toBe("vehicle_shop_updated");
    expect(plan[0]?.Extra ?? "", JSON.stringify(plan)).not.toContain("filesort");
  });
});
