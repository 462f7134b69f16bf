import { queryOptions } from "@tanstack/react-query";
import type { VehicleChoiceListResponse } from "@/lib/contracts/vehicles";
import { apiFetch } from "./api-fetch";

export const vehicleKeys = {
  all: ["vehicles"] as const,
  choices: (search: string) => [...vehicleKeys.all, "choices", search] as const,
};

export const vehicleChoicesQuery = (search: string) =>
  queryOptions({
    queryKey: vehicleKeys.choices(search),
    queryFn: ({ signal }) =>
      apiFetch<VehicleChoiceListResponse>(
        `/api/vehicles${search ? `?q=${encodeURIComponent(search)}` : ""}`,
        {
          signal,
        },
      ).then((r) => r.vehicles),
    placeholderData: (previous) => previous,
  });
