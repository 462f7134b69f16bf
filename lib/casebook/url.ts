import {
  casebookSearchQuerySchema,
  type CasebookSearchQuery,
  type CasebookSort,
} from "@/lib/contracts/casebook";

/** What the casebook screen keeps in the address bar: filters, sort and page, as plain strings. */
export type CasebookParams = Partial<Record<string, string>>;

export const CASEBOOK_PARAM_KEYS = [
  "q",
  "symptoms",
  "refrigerant",
  "device",
  "compressor",
  "suspect",
  "cause",
  "make",
  "model",
  "yearFrom",
  "yearTo",
  "technician",
  "status",
  "from",
  "to",
  "comeback",
  "sort",
  "dir",
  "page",
  "pageSize",
] as const;

/** Reads the address; a value the schema refuses is dropped (and reported), the rest still applies. */
export function readCasebookParams(params: CasebookParams): {
  query: CasebookSearchQuery;
  params: CasebookParams;
  refused: { key: string; message: string }[];
} {
  const kept: CasebookParams = {};
  for (const key of CASEBOOK_PARAM_KEYS) {
    const value = params[key];
    if (typeof value === "string" && value.length > 0) kept[key] = value;
  }
  const refused: { key: string; message: string }[] = [];
  for (let attempt = 0; attempt < CASEBOOK_PARAM_KEYS.length; attempt++) {
    const parsed = casebookSearchQuerySchema.safeParse(kept);
    if (parsed.success) return { query: parsed.data, params: kept, refused };
    const issue = parsed.error.issues[0];
    const key = String(issue?.path[0] ?? "");
    refused.push({ key, message: issue?.message ?? "Not understood." });
    if (!(key in kept)) break;
    delete kept[key];
  }
  return { query: casebookSearchQuerySchema.parse({}), params: {}, refused };
}

/** The address for a search: only the keys that are set, in a stable order, so links compare equal. */
export function casebookSearchString(params: CasebookParams): string {
  const out = new URLSearchParams();
  for (const key of CASEBOOK_PARAM_KEYS) {
    const value = params[key];
    if (value) out.set(key, value);
  }
  const s = out.toString();
  return s ? `?${s}` : "";
}

/** The same search with some keys changed; any change but a page turn goes back to page 1. */
export function withParams(params: CasebookParams, changes: CasebookParams): CasebookParams {
  const next: CasebookParams = { ...params, ...changes };
  if (!("page" in changes)) delete next.page;
  for (const [key, value] of Object.entries(next)) if (!value) delete next[key];
  return next;
}

export function sortParams(
  params: CasebookParams,
  sort: CasebookSort,
  currentSort: CasebookSort,
  dir: "asc" | "desc",
) {
  const nextDir =
    sort === currentSort
      ? dir === "asc"
        ? "desc"
        : "asc"
      : sort === "vehicle" || sort === "status"
        ? "asc"
        : "desc";
  return withParams(params, { sort, dir: nextDir });
}
