import type { User } from "lucia";
import type { Models } from "@/models";
import type { ServiceRecordInput } from "@/lib/contracts/service-records";
import { createShopWithCase } from "./fixtures";
import { uniqueName } from "./helpers";

/** A shop with a case (R-134a vehicle), a recovery cylinder and a virgin supply cylinder. */
export async function createShopWithCylinders(models: Models) {
  const base = await createShopWithCase(models);
  const recovery = await models.Cylinder.create({
    shopId: base.shop.id,
    label: uniqueName("REC"),
    refrigerant: "R-134a",
    kind: "recovery",
    tareG: 7000,
    capacityG: 22_000,
    initialNetG: 1000,
  });
  const supply = await models.Cylinder.create({
    shopId: base.shop.id,
    label: uniqueName("SUP"),
    refrigerant: "R-134a",
    kind: "virgin",
    tareG: 6000,
    capacityG: 13_600,
    initialNetG: 13_600,
  });
  const user: User = {
    id: base.technician.id,
    email: base.technician.email,
    name: base.technician.name,
    role: "technician",
    shopId: base.shop.id,
    active: true,
  };
  return { ...base, recovery, supply, user };
}

export async function addCase(
  models: Models,
  shopId: number,
  vehicleId: number,
  customerId: number,
  technicianId: string,
) {
  return models.Case.create({
    shopId,
    vehicleId,
    customerId,
    technicianId,
    complaint: "Warm air after a few minutes",
  });
}

export function recordInput(overrides: Partial<ServiceRecordInput> = {}): ServiceRecordInput {
  return { baseVersion: 0, step: "recharge", oilPulled: false, partsReplaced: [], ...overrides };
}
