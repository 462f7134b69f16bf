import { infiniteQueryOptions, queryOptions } from "@tanstack/react-query";
import type { CylinderListResponse } from "@/lib/contracts/cylinders";
import type { LedgerReportResponse, MovementListResponse } from "@/lib/contracts/ledger";
import { apiFetch } from "./api-fetch";

export const ledgerKeys = {
  all: ["ledger"] as const,
  cylinders: () => [...ledgerKeys.all, "cylinders"] as const,
  movements: () => [...ledgerKeys.all, "movements"] as const,
  /** `months`: the latest this many months only; none for the whole report. */
  report: (months?: number) => [...ledgerKeys.all, "report", months ?? "all"] as const,
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

/** The monthly report: the latest `months` months only, or every month. */
export const ledgerReportQuery = (months?: number) =>
  queryOptions({
    queryKey: ledgerKeys.report(months),
    queryFn: ({ signal }) =>
      apiFetch<LedgerReportResponse>(`/api/ledger/report${months ? `?months=${months}` : ""}`, { signal }),
  });
