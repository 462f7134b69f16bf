import { queryOptions } from "@tanstack/react-query";
import type { SpecMatchesResponse } from "@/lib/contracts/specs";
import { apiFetch } from "./api-fetch";
import { specKeys } from "./specs";

export const specMatchesQuery = (vehicleId: number) =>
  queryOptions({
    queryKey: [...specKeys.all, "matches", vehicleId] as const,
    queryFn: ({ signal }) =>
      apiFetch<SpecMatchesResponse>(`/api/specs/matches?vehicleId=${vehicleId}`, { signal }).then(
        (r) => r.matches,
      ),
  });
