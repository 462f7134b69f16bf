import { queryOptions } from "@tanstack/react-query";
import { apiFetch } from "./api-fetch";

export interface VehicleChoiceDto {
  vehicleId: number;
  customerId: number;
  customer: string;
  description: string;
  refrigerant: string;
  expansionDevice: "orifice_tube" | "txv";
  electricCompressor: boolean;
  labelChargeG: number | null;
}

export const vehicleKeys = {
  all: ["vehicles"] as const,
  choices: (search: string) => [...vehicleKeys.all, "choices", search] as const,
};

export const vehicleChoicesQuery = (search: string) =>
  queryOptions({
    queryKey: vehicleKeys.choices(search),
    queryFn: ({ signal }) =>
      apiFetch<{ vehicles: VehicleChoiceDto[] }>(
        `/api/vehicles${search ? `?q=${encodeURIComponent(search)}` : ""}`,
        { signal },
      ).then((r) => r.vehicles),
    placeholderData: (previous) => previous,
  });
