import { z } from "zod";
import type { ExpansionDevice } from "@/lib/vehicles/expansion-devices";
import type { CompressorType } from "@/lib/vehicles/compressor-types";

export const vehicleListQuerySchema = z.object({
  q: z.string().max(80, "Search with fewer than 80 characters.").optional(),
});

/** A vehicle the shop has seen, offered when a new case is opened. */
export interface VehicleChoice {
  vehicleId: number;
  customerId: number;
  customer: string;
  description: string;
  refrigerant: string;
  expansionDevice: ExpansionDevice;
  electricCompressor: boolean;
  compressorType: CompressorType | null;
  labelChargeG: number | null;
}

/** GET /api/vehicles. */
export interface VehicleChoiceListResponse {
  vehicles: VehicleChoice[];
}
