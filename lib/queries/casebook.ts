import { keepPreviousData, queryOptions } from "@tanstack/react-query";
import type {
  CasebookFacetsResponse,
  CasebookSearchResponse,
  SimilarCasesResponse,
} from "@/lib/contracts/casebook";
import { casebookSearchString, type CasebookParams } from "@/lib/casebook/url";
import { apiFetch } from "./api-fetch";

const FILTER_ONLY = new Set(["sort", "dir", "page", "pageSize"]);
const filtersOf = (params: CasebookParams): CasebookParams =>
  Object.fromEntries(Object.entries(params).filter(([key]) => !FILTER_ONLY.has(key)));

export const casebookKeys = {
  all: ["casebook"] as const,
  search: (params: CasebookParams) => [...casebookKeys.all, "search", casebookSearchString(params)] as const,
  facets: (params: CasebookParams) =>
    [...casebookKeys.all, "facets", casebookSearchString(filtersOf(params))] as const,
  similar: (caseId: number) => [...casebookKeys.all, "similar", caseId] as const,
};

export const casebookSearchQuery = (params: CasebookParams) =>
  queryOptions({
    queryKey: casebookKeys.search(params),
    queryFn: ({ signal }) =>
      apiFetch<CasebookSearchResponse>(`/api/casebook${casebookSearchString(params)}`, { signal }),
    placeholderData: keepPreviousData,
    staleTime: 30_000,
  });

export const casebookFacetsQuery = (params: CasebookParams) =>
  queryOptions({
    queryKey: casebookKeys.facets(params),
    queryFn: ({ signal }) =>
      apiFetch<CasebookFacetsResponse>(`/api/casebook/facets${casebookSearchString(filtersOf(params))}`, {
        signal,
      }),
    placeholderData: keepPreviousData,
    staleTime: 60_000,
  });

export const similarCasesQuery = (caseId: number) =>
  queryOptions({
    queryKey: casebookKeys.similar(caseId),
    queryFn: ({ signal }) => apiFetch<SimilarCasesResponse>(`/api/cases/${caseId}/similar`, { signal }),
    staleTime: 60_000,
  });

/** Where the CSV of the current search downloads from (every filter and the sort, no page). */
export function casebookExportHref(params: CasebookParams): string {
  const rest = Object.fromEntries(
    Object.entries(params).filter(([key]) => key !== "page" && key !== "pageSize"),
  );
  return `/api/casebook/export${casebookSearchString(rest)}`;
}
