import { queryOptions } from "@tanstack/react-query";
import type { ServiceRecordInput } from "@/app/api/cases/[id]/service/schema";
import type { ServiceCaseContext, ServiceRecordDto } from "@/lib/server/service-records";
import { apiFetch } from "./api-fetch";

export type { ServiceCaseContext, ServiceRecordDto };

export const serviceRecordKeys = {
  all: ["service-record"] as const,
  forCase: (caseId: number) => [...serviceRecordKeys.all, caseId] as const,
};

export const serviceRecordQuery = (caseId: number) =>
  queryOptions({
    queryKey: serviceRecordKeys.forCase(caseId),
    queryFn: ({ signal }) =>
      apiFetch<{ case: ServiceCaseContext; record: ServiceRecordDto | null }>(
        `/api/cases/${caseId}/service`,
        { signal },
      ),
  });

export function saveServiceRecord(caseId: number, body: ServiceRecordInput) {
  return apiFetch<{ record: ServiceRecordDto; posted: number; warnings: string[] }>(
    `/api/cases/${caseId}/service`,
    { method: "PUT", body },
  );
}
