import type { CompressorType } from "@/lib/vehicles/compressor-types";
import "server-only";
import { Op, col, fn, where } from "sequelize";
import { getModels } from "@/models";
import type { ExpansionDevice } from "@/lib/vehicles/expansion-devices";
import type { VehicleChoiceListResponse } from "@/lib/contracts/vehicles";
import { pageOf } from "./paging";
import { normalisePlate, phoneDigits } from "@/lib/vehicles/plate";

/**
 * The shop's vehicles, most recently seen first, optionally found by plate, VIN, the customer's phone
 * number or name, or make and model. Plates and VINs compare without spaces or dashes, phone numbers
 * by their digits (customer.phone_digits), so the way a number was typed never hides a vehicle.
 */
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
  const escape = (text: string) => text.replace(/[%_\\]/g, (c) => `\\${c}`);
  const like = term ? `%${escape(term)}%` : undefined;
  const compact = term ? normalisePlate(term) : "";
  const digits = term ? phoneDigits(term) : "";
  const rows = await Vehicle.findAll({
    where: {
      shopId,
      ...(like
        ? {
            [Op.or]: [
              where(fn("CONCAT", col("Vehicle.make"), " ", col("Vehicle.model")), Op.like, like),
              { "$Customer.name$": { [Op.like]: like } },
              ...(compact
                ? [
                    { plate: { [Op.like]: `%${escape(compact)}%` } },
                    { vin: { [Op.like]: `%${escape(compact)}%` } },
                  ]
                : []),
              // Three digits or more, so a year or a model number does not match every phone.
              ...(digits.length >= 3 ? [{ "$Customer.phone_digits$": { [Op.like]: `%${digits}%` } }] : []),
            ],
          }
        : {}),
    },
    include: [{ model: Customer, attributes: ["id", "name", "phone"] }],
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
      plate: string | null;
      Customer: { name: string; phone: string | null };
    };
    return {
      vehicleId: v.id,
      customerId: v.customerId,
      customer: v.Customer.name,
      customerPhone: v.Customer.phone,
      plate: v.plate,
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
