import { queryOptions } from "@tanstack/react-query";
import type { SpecListResponse } from "@/lib/contracts/specs";
import { apiFetch } from "./api-fetch";

export const specKeys = {
  all: ["specs"] as const,
  list: (q: string) => [...specKeys.all, "list", q] as const,
  allowances: () => [...specKeys.all, "oil-allowances"] as const,
};

export const specsQuery = (q: string) =>
  queryOptions({
    queryKey: specKeys.list(q),
    queryFn: ({ signal }) =>
      apiFetch<SpecListResponse>(`/api/specs${q ? `?q=${encodeURIComponent(q)}` : ""}`, {
        signal,
      }).then((r) => r.specs),
    placeholderData: (previous) => previous,
  });
