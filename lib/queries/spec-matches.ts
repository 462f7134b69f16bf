import { queryOptions } from "@tanstack/react-query";
import type { SpecRow } from "@/lib/specs";
import { apiFetch } from "./api-fetch";
import { specKeys } from "./specs";

export interface SpecMatchDto {
  row: SpecRow & { id: number };
  score: number;
  reasons: string[];
}

export const specMatchesQuery = (vehicleId: number) =>
  queryOptions({
    queryKey: [...specKeys.all, "matches", vehicleId] as const,
    queryFn: ({ signal }) =>
      apiFetch<{ matches: SpecMatchDto[] }>(`/api/specs/matches?vehicleId=${vehicleId}`, { signal }).then(
        (r) => r.matches,
      ),
  });
