import { infiniteQueryOptions, queryOptions } from "@tanstack/react-query";
import type { CylinderListResponse } from "@/lib/contracts/cylinders";
import type { LedgerReportResponse, MovementListResponse } from "@/lib/contracts/ledger";
import { apiFetch } from "./api-fetch";

export const ledgerKeys = {
  all: ["ledger"] as const,
  cylinders: () => [...ledgerKeys.all, "cylinders"] as const,
  movements: () => [...ledgerKeys.all, "movements"] as const,
  report: () => [...ledgerKeys.all, "report"] as const,
};

/** Pages of cylinders by label; the next page starts after the last label of the one before. */
export const cylindersQuery = () =>
  infiniteQueryOptions({
    queryKey: ledgerKeys.cylinders(),
    queryFn: ({ signal, pageParam }) =>
      apiFetch<CylinderListResponse>(
        `/api/cylinders${pageParam ? `?after=${encodeURIComponent(pageParam)}` : ""}`,
        { signal },
      ),
    initialPageParam: null as string | null,
    getNextPageParam: (last) => last.nextCursor,
  });

/** Pages of ledger lines, newest first. */
export const movementsQuery = () =>
  infiniteQueryOptions({
    queryKey: ledgerKeys.movements(),
    queryFn: ({ signal, pageParam }) =>
      apiFetch<MovementListResponse>(
        `/api/ledger/movements${pageParam ? `?before=${encodeURIComponent(pageParam)}` : ""}`,
        { signal },
      ),
    initialPageParam: null as string | null,
    getNextPageParam: (last) => last.nextCursor,
  });

export const ledgerReportQuery = () =>
  queryOptions({
    queryKey: ledgerKeys.report(),
    queryFn: ({ signal }) => apiFetch<LedgerReportResponse>("/api/ledger/report", { signal }),
  });
