import type { CompressorType } from "@/lib/vehicles/compressor-types";
import "server-only";
import { Op } from "sequelize";
import { getModels } from "@/models";
import type { VehicleChoice } from "@/lib/contracts/vehicles";
import type { ExpansionDevice } from "@/lib/vehicles/expansion-devices";

/** The shop's vehicles, most recently seen first, optionally filtered by customer, make, model or VIN. */
export async function listVehicleChoices({
  shopId,
  search,
  limit = 30,
}: {
  shopId: number;
  search?: string;
  limit?: number;
}): Promise<VehicleChoice[]> {
  const { Vehicle, Customer } = getModels();
  const term = search?.trim();
  const like = term ? `%${term.replace(/[%_\\]/g, (c) => `\\${c}`)}%` : undefined;
  const rows = await Vehicle.findAll({
    where: {
      shopId,
      ...(like
        ? {
            [Op.or]: [
              { make: { [Op.like]: like } },
              { model: { [Op.like]: like } },
              { vin: { [Op.like]: like } },
              { "$Customer.name$": { [Op.like]: like } },
            ],
          }
        : {}),
    },
    include: [{ model: Customer, attributes: ["id", "name"] }],
    order: [["updatedAt", "DESC"]],
    limit,
  });
  return rows.map((row) => {
    const v = row.get({ plain: true }) as unknown as {
      id: number;
      customerId: number;
      year: number;
      make: string;
      model: string;
      engine: string | null;
      refrigerant: string;
      expansionDevice: ExpansionDevice;
      electricCompressor: boolean | number;
      compressorType: CompressorType | null;
      labelChargeG: number | null;
      Customer: { name: string };
    };
    return {
      vehicleId: v.id,
      customerId: v.customerId,
      customer: v.Customer.name,
      description: `${v.year} ${v.make} ${v.model}${v.engine ? ` ${v.engine}` : ""}`,
      refrigerant: v.refrigerant,
      expansionDevice: v.expansionDevice,
      electricCompressor: Boolean(v.electricCompressor),
      compressorType: v.compressorType ?? (v.electricCompressor ? "electric" : null),
      labelChargeG: v.labelChargeG,
    };
  });
}
