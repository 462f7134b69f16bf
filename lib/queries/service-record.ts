import { queryOptions } from "@tanstack/react-query";
import type {
  ServiceRecordInput,
  ServiceRecordResponse,
  ServiceRecordSaveResponse,
} from "@/lib/contracts/service-records";
import { apiFetch } from "./api-fetch";

export const serviceRecordKeys = {
  all: ["service-record"] as const,
  forCase: (caseId: number) => [...serviceRecordKeys.all, caseId] as const,
};

export const serviceRecordQuery = (caseId: number) =>
  queryOptions({
    queryKey: serviceRecordKeys.forCase(caseId),
    queryFn: ({ signal }) => apiFetch<ServiceRecordResponse>(`/api/cases/${caseId}/service`, { signal }),
  });

export function saveServiceRecord(caseId: number, body: ServiceRecordInput) {
  return apiFetch<ServiceRecordSaveResponse>(`/api/cases/${caseId}/service`, { method: "PUT", body });
}
