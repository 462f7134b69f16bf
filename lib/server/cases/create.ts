import "server-only";
import { getModels, type JsonObject, type Vehicle as VehicleModel } from "@/models";
import type { InferAttributes } from "sequelize";
import { AppError } from "@/lib/errors";
import type { CreateCaseInput } from "@/lib/contracts/cases";
import { recordAudit } from "../audit";
import { refreshCasebookEntry } from "../casebook/refresh";

/**
 * Opens a case for a picked or new customer and vehicle. The interview's system answers are
 * prefilled from the vehicle's last case when it has one (the technician confirmed them then),
 * otherwise from the vehicle record.
 */
export async function createCase({
  shopId,
  technicianId,
  input,
}: {
  shopId: number;
  technicianId: string;
  input: CreateCaseInput;
}): Promise<{ id: number }> {
  const { sequelize, Customer, Vehicle, Case } = getModels();
  return sequelize.transaction(async (transaction) => {
    let customerId = input.customerId;
    let vehicle: InferAttributes<VehicleModel> | null = input.vehicleId
      ? await Vehicle.findOne({ where: { id: input.vehicleId, shopId }, transaction, raw: true })
      : null;
    if (input.vehicleId && !vehicle)
      throw new AppError("not_found:vehicle", "That vehicle is not in this shop's records.");
    if (vehicle) {
      if (customerId && customerId !== vehicle.customerId)
        throw new AppError("bad_request:vehicle", "That vehicle belongs to another customer.");
      customerId = vehicle.customerId;
    } else if (customerId) {
      const customer = await Customer.findOne({
        where: { id: customerId, shopId },
        attributes: ["id"],
        transaction,
        raw: true,
      });
      if (!customer) throw new AppError("not_found:customer", "That customer is not in this shop's records.");
    } else if (input.newCustomer) {
      const customer = await Customer.create(
        {
          shopId,
          name: input.newCustomer.name,
          phone: input.newCustomer.phone ?? null,
          email: input.newCustomer.email ?? null,
        },
        { transaction },
      );
      customerId = customer.id;
    }
    if (!customerId) throw new AppError("bad_request:customer", "Pick the customer or add one.");
    if (!vehicle && input.newVehicle) {
      const v = input.newVehicle;
      const row = await Vehicle.create(
        {
          shopId,
          customerId,
          year: v.year,
          make: v.make,
          model: v.model,
          engine: v.engine ?? null,
          vin: v.vin ?? null,
          plate: v.plate ?? null,
          refrigerant: v.refrigerant,
          expansionDevice: v.expansionDevice,
          electricCompressor: v.compressorType ? v.compressorType === "electric" : v.electricCompressor,
          compressorType: v.compressorType ?? (v.electricCompressor ? "electric" : null),
          labelChargeG: v.labelChargeG ?? null,
        },
        { transaction },
      );
      vehicle = row.get({ plain: true });
    }
    if (!vehicle) throw new AppError("bad_request:vehicle", "Pick a vehicle or add one.");

    const lastCase = await Case.findOne({
      where: { shopId, vehicleId: vehicle.id },
      order: [["createdAt", "DESC"]],
      attributes: ["answers"],
      transaction,
      raw: true,
    });
    const lastSystem = (lastCase?.answers as { answers?: { system?: JsonObject } } | undefined)?.answers
      ?.system;
    const system: JsonObject = lastSystem ?? {
      refrigerant: vehicle.refrigerant,
      expansionDevice: vehicle.expansionDevice,
      compressorType: vehicle.compressorType ?? (vehicle.electricCompressor ? "electric" : "unknown"),
      ...(vehicle.labelChargeG ? { labelChargeG: vehicle.labelChargeG } : {}),
    };
    const created = await Case.create(
      {
        shopId,
        customerId,
        vehicleId: vehicle.id,
        technicianId,
        complaint: input.complaint,
        interviewStep: "system",
        answers: { answers: { complaint: { ownerWords: input.complaint }, system }, skipped: [], drafts: {} },
      },
      { transaction },
    );
    await recordAudit({
      shopId,
      actorId: technicianId,
      entity: "case",
      entityId: created.id,
      action: "create",
      transaction,
    });
    // The casebook finds the case by its complaint from the start, and flags a comeback at once.
    await refreshCasebookEntry({ shopId, caseId: created.id, transaction });
    return { id: created.id };
  });
}
