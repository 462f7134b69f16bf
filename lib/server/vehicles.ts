import type { CompressorType } from "@/lib/vehicles/compressor-types";
import "server-only";
import { Op } from "sequelize";
import { getModels } from "@/models";
import type { ExpansionDevice } from "@/lib/vehicles/expansion-devices";
import type { VehicleChoiceListResponse } from "@/lib/contracts/vehicles";
import { pageOf } from "./paging";

/** The shop's vehicles, most recently seen first, optionally filtered by customer, make, model or VIN. */
export async function listVehicleChoices({
  shopId,
  search,
  limit = 30,
  offset = 0,
}: {
  shopId: number;
  search?: string;
  limit?: number;
  offset?: number;
}): Promise<VehicleChoiceListResponse> {
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
    order: [
      ["updatedAt", "DESC"],
      ["id", "DESC"],
    ],
    limit: limit + 1,
    offset,
  });
  const page = pageOf(rows, { limit, offset });
  const vehicles = page.items.map((row) => {
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
  return { vehicles, nextOffset: page.nextOffset };
}
