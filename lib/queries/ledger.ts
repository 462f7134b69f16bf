import { queryOptions } from "@tanstack/react-query";
import type { CylinderDto, LedgerReportRow, MovementDto } from "@/lib/server/ledger";
import { apiFetch } from "./api-fetch";

export type { CylinderDto, LedgerReportRow, MovementDto };

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
      apiFetch<{ cylinders: CylinderDto[] }>("/api/cylinders", { signal }).then((r) => r.cylinders),
  });

export const movementsQuery = () =>
  queryOptions({
    queryKey: ledgerKeys.movements(),
    queryFn: ({ signal }) =>
      apiFetch<{ movements: MovementDto[] }>("/api/ledger/movements", { signal }).then((r) => r.movements),
  });

export const ledgerReportQuery = () =>
  queryOptions({
    queryKey: ledgerKeys.report(),
    queryFn: ({ signal }) =>
      apiFetch<{ rows: LedgerReportRow[]; timeZone: string }>("/api/ledger/report", { signal }),
  });
