import { queryOptions } from "@tanstack/react-query";
import type { CylinderListResponse } from "@/lib/contracts/cylinders";
import type { LedgerReportResponse, MovementListResponse } from "@/lib/contracts/ledger";
import { apiFetch } from "./api-fetch";

export const ledgerKeys = {
  all: ["ledger"] as const,
  cylinders: () => [...ledgerKeys.all, "cylinders"] as const,
  movements: () => [...ledgerKeys.all, "movements"] as const,
  report: () => [...ledgerKeys.all, "report"] as const,
};

export const cylindersQuery = () =>
  queryOptions({
    queryKey: ledgerKeys.cylinders(),
    queryFn: ({ signal }) =>
      apiFetch<CylinderListResponse>("/api/cylinders", { signal }).then((r) => r.cylinders),
  });

export const movementsQuery = () =>
  queryOptions({
    queryKey: ledgerKeys.movements(),
    queryFn: ({ signal }) =>
      apiFetch<MovementListResponse>("/api/ledger/movements", { signal }).then((r) => r.movements),
  });

export const ledgerReportQuery = () =>
  queryOptions({
    queryKey: ledgerKeys.report(),
    queryFn: ({ signal }) => apiFetch<LedgerReportResponse>("/api/ledger/report", { signal }),
  });
