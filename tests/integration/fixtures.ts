import type { Models } from "@/models";
import { newUserId } from "@/scripts/demo/seed-demo";
import { uniqueName } from "./helpers";

/** A shop of its own with one technician, one customer, one vehicle and one draft case. */
export async function createShopWithCase(models: Models, complaint = "No cold air at the centre vents") {
  const shop = await models.Shop.create({ name: uniqueName("Test shop") });
  const technician = await models.User.create({
    id: newUserId(),
    shopId: shop.id,
    email: `${uniqueName("tech")}@fixture.test`,
    name: "Fixture Technician",
    passwordHash: "not-a-real-hash",
    role: "technician",
  });
  const customer = await models.Customer.create({ shopId: shop.id, name: "Fixture Customer" });
  const vehicle = await models.Vehicle.create({
    shopId: shop.id,
    customerId: customer.id,
    year: 2015,
    make: "Mazda",
    model: "3",
    refrigerant: "R-134a",
    expansionDevice: "txv",
  });
  const serviceCase = await models.Case.create({
    shopId: shop.id,
    customerId: customer.id,
    vehicleId: vehicle.id,
    technicianId: technician.id,
    complaint,
  });
  return { shop, technician, customer, vehicle, serviceCase };
}
