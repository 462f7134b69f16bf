import "server-only";
import { QueryTypes } from "sequelize";
import { getModels } from "@/models";
import type {
  CasebookRow,
  CasebookSearchQuery,
  CasebookSearchResponse,
  CasebookSort,
  ConfirmedCauseId,
} from "@/lib/contracts/casebook";
import type { CaseStatus } from "@/lib/contracts/cases";
import { casebookWhere, type CasebookWhere, type Replacements } from "./filters";

/** ORDER BY for each sort; the case id last keeps pages stable when values tie. */
function orderBy(sort: CasebookSort, dir: "asc" | "desc", prefix = "e."): string {
  const d = dir === "asc" ? "ASC" : "DESC";
  switch (sort) {
    case "relevance":
      return `relevance DESC, ${prefix}opened_at DESC, ${prefix}case_id DESC`;
    case "closed_at":
      return `${prefix}closed_at ${d}, ${prefix}case_id ${d}`;
    case "vehicle":
      return `${prefix}make ${d}, ${prefix}model ${d}, ${prefix}year ${d}, ${prefix}case_id ${d}`;
    case "status":
      return `${prefix}status ${d}, ${prefix}opened_at DESC, ${prefix}case_id DESC`;
    default:
      return `${prefix}opened_at ${d}, ${prefix}case_id ${d}`;
  }
}

export function resolveSort(query: Pick<CasebookSearchQuery, "sort" | "dir">, where: CasebookWhere) {
  const sort: CasebookSort =
    query.sort === "relevance" && !where.relevanceSql
      ? "opened_at"
      : (query.sort ?? (where.relevanceSql ? "relevance" : "opened_at"));
  const dir = query.dir ?? (sort === "vehicle" || sort === "status" ? "asc" : "desc");
  return { sort, dir } as const;
}

/** The SQL of one page of a search, for the EXPLAIN test and the benchmark as much as for the route. */
export function pageSql(
  where: CasebookWhere,
  sort: CasebookSort,
  dir: "asc" | "desc",
  { complaintChars = 240 }: { complaintChars?: number } = {},
): string {
  const relevance = where.relevanceSql ? `${where.relevanceSql} AS relevance` : "0 AS relevance";
  return `SELECT p.case_id, p.opened_at, p.closed_at, p.status, p.make, p.model, p.year, p.refrigerant,
       p.metering_device, p.leading_suspect, p.comeback_of_case_id, p.came_back_case_id, p.relevance, p.total,
       LEFT(c.complaint, ${Math.trunc(complaintChars)}) AS complaint, u.name AS technician,
       (SELECT GROUP_CONCAT(cc.cause ORDER BY cc.id SEPARATOR ',') FROM case_confirmed_cause cc
         WHERE cc.shop_id = :shopId AND cc.case_id = p.case_id) AS causes
  FROM (SELECT e.case_id, e.opened_at, e.closed_at, e.status, e.make, e.model, e.year, e.refrigerant,
               e.metering_device, e.leading_suspect, e.comeback_of_case_id, e.came_back_case_id,
               e.technician_id, ${relevance}, COUNT(*) OVER () AS total
          FROM casebook_entry e
         WHERE ${where.sql}
         ORDER BY ${orderBy(sort, dir)}
         LIMIT :limit OFFSET :offset) p
  JOIN service_case c ON c.shop_id = :shopId AND c.id = p.case_id
  JOIN user u ON u.shop_id = :shopId AND u.id = p.technician_id
 ORDER BY ${orderBy(sort, dir, "p.")}`;
}

export function countSql(where: CasebookWhere): string {
  return `SELECT COUNT(*) AS total FROM casebook_entry e WHERE ${where.sql}`;
}

type PageRow = {
  case_id: number;
  /** How many rows match in all (the same on every row of the page). */
  total?: number;
  opened_at: Date;
  closed_at: Date | null;
  status: CaseStatus;
  make: string | null;
  model: string | null;
  year: number | null;
  refrigerant: string | null;
  metering_device: string | null;
  leading_suspect: string | null;
  comeback_of_case_id: number | null;
  came_back_case_id: number | null;
  complaint: string;
  technician: string;
  causes: string | null;
};

export function vehicleLabel(r: { year: number | null; make: string | null; model: string | null }) {
  return r.make ? [r.year, r.make, r.model].filter((v) => v !== null && v !== "").join(" ") : null;
}

export function toCasebookRow(r: PageRow, complaintChars = 240): CasebookRow {
  return {
    caseId: r.case_id,
    openedAt: new Date(r.opened_at).toISOString(),
    closedAt: r.closed_at ? new Date(r.closed_at).toISOString() : null,
    status: r.status,
    vehicle: vehicleLabel(r),
    refrigerant: r.refrigerant,
    meteringDevice: r.metering_device,
    complaint:
      r.complaint.length >= complaintChars ? `${r.complaint.slice(0, complaintChars - 1)}…` : r.complaint,
    leadingSuspect: r.leading_suspect,
    confirmedCauses: (r.causes ? r.causes.split(",") : []) as ConfirmedCauseId[],
    technician: r.technician,
    comebackOfCaseId: r.comeback_of_case_id,
    cameBackCaseId: r.came_back_case_id,
  };
}

/** One page of the shop's cases that match the search, with how many match in all. */
export async function searchCasebook({
  shopId,
  query,
}: {
  shopId: number;
  query: CasebookSearchQuery;
}): Promise<CasebookSearchResponse> {
  const { sequelize } = getModels();
  const where = await casebookWhere(shopId, query);
  const { sort, dir } = resolveSort(query, where);
  const offset = (query.page - 1) * query.pageSize;
  const replacements: Replacements = { ...where.replacements, limit: query.pageSize, offset };
  const rows = await sequelize.query<PageRow>(pageSql(where, sort, dir), {
    replacements,
    type: QueryTypes.SELECT,
  });
  // The page carries the total; a page past the end has no rows to carry it, so count on its own then.
  const total =
    rows.length > 0
      ? Number(rows[0]?.total ?? 0)
      : offset === 0
        ? 0
        : Number(
            (
              await sequelize.query<{ total: number }>(countSql(where), {
                replacements: where.replacements,
                type: QueryTypes.SELECT,
              })
            )[0]?.total ?? 0,
          );
  return {
    rows: rows.map((r) => toCasebookRow(r)),
    total,
    page: query.page,
    pageSize: query.pageSize,
    sort,
    dir,
    textMode: where.textMode,
  };
}
