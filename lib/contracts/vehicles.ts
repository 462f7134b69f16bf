import { z } from "zod";
import { singleLineText } from "./text";
import type { ExpansionDevice } from "@/lib/vehicles/expansion-devices";
import type { CompressorType } from "@/lib/vehicles/compressor-types";
import { pageQuery, type PageInfo } from "./paging";

export const vehicleListQuerySchema = z
  .object({ q: singleLineText().max(80, "Search with fewer than 80 characters.").optional() })
  .and(pageQuery({ defaultLimit: 30, maxLimit: 50 }));

/** A vehicle the shop has seen, offered when a new case is opened. */
export interface VehicleChoice {
  vehicleId: number;
  customerId: number;
  customer: string;
  customerPhone: string | null;
  plate: string | null;
  description: string;
  refrigerant: string;
  expansionDevice: ExpansionDevice;
  electricCompressor: boolean;
  compressorType: CompressorType | null;
  labelChargeG: number | null;
}

/** GET /api/vehicles. */
export interface VehicleChoiceListResponse extends PageInfo {
  vehicles: VehicleChoice[];
}
