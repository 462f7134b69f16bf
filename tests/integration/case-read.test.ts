import { afterAll, describe, expect, it } from "vitest";
import { closeSequelize } from "@/lib/db/sequelize";
import { getModels } from "@/models";
import { getCase, listCases } from "@/lib/server/cases";
import { newUserId } from "@/scripts/demo/seed-demo";
import { createShopWithCase } from "./fixtures";
import { uniqueName } from "./helpers";

afterAll(() => closeSequelize());

describe("reading a case", () => {
  it("gives its own sign-offs, oldest first with the reviewer's name, and none of another case's", async () => {
    const models = getModels();
    const { shop, serviceCase, technician, customer, vehicle } = await createShopWithCase(models);
    const senior = await models.User.create({
      id: newUserId(),
      shopId: shop.id,
      email: `${uniqueName("senior")}@fixture.test`,
      name: "Fixture Senior",
      passwordHash: "not-a-real-hash",
      role: "senior",
    });
    const other = await models.Case.create({
      shopId: shop.id,
      customerId: customer.id,
      vehicleId: vehicle.id,
      technicianId: technician.id,
      complaint: "Warm air at idle",
    });
    const at = (minute: number) => new Date(Date.UTC(2026, 10, 20, 9, minute));
    await models.SignOff.bulkCreate([
      {
        shopId: shop.id,
        caseId: serviceCase.id,
        reviewerId: senior.id,
        verdict: "signed_off",
        createdAt: at(30),
      },
      {
        shopId: shop.id,
        caseId: serviceCase.id,
        reviewerId: senior.id,
        verdict: "sent_back",
        comment: "Check the fan",
        createdAt: at(10),
      },
      { shopId: shop.id, caseId: other.id, reviewerId: senior.id, verdict: "signed_off", createdAt: at(20) },
    ]);

    const read = await getCase({ shopId: shop.id, caseId: serviceCase.id });
    expect(read.signOffs).toEqual([
      {
        verdict: "sent_back",
        comment: "Check the fan",
        reviewer: "Fixture Senior",
        createdAt: at(10).toISOString(),
      },
      { verdict: "signed_off", comment: null, reviewer: "Fixture Senior", createdAt: at(30).toISOString() },
    ]);
    expect(read.complaint).toBe("No cold air at the centre vents");

    const fresh = await createShopWithCase(models);
    expect((await getCase({ shopId: fresh.shop.id, caseId: fresh.serviceCase.id })).signOffs).toEqual([]);
  });

  it("lists a case's line from the columns it shows", async () => {
    const models = getModels();
    const { shop, serviceCase } = await createShopWithCase(models);
    const { cases } = await listCases({ shopId: shop.id });
    expect(cases).toEqual([
      {
        id: serviceCase.id,
        status: "draft",
        complaint: "No cold air at the centre vents",
        vehicle: "2015 Mazda 3",
        customer: "Fixture Customer",
        technician: "Fixture Technician",
        updatedAt: serviceCase.updatedAt.toISOString(),
      },
    ]);
  });
});
