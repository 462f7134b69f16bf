import "server-only";
import { QueryTypes } from "sequelize";
import { getModels } from "@/models";
import {
  CASEBOOK_FACETS,
  type CasebookFacet,
  type CasebookFacetsResponse,
  type CasebookFilters,
  type FacetCount,
} from "@/lib/contracts/casebook";
import { casebookWhere, type Replacements } from "./filters";

const LIMIT_PER_FACET = 40;

// Each facet counts the cases that match every other filter, so the values beside a chosen one stay in
// view. Symptoms are ticked together (a case must have all of them), so they count within the results.
const COLUMN_FACETS: { facet: CasebookFacet; column: string; omit: keyof CasebookFilters }[] = [
  { facet: "refrigerant", column: "e.refrigerant", omit: "refrigerant" },
  { facet: "device", column: "e.metering_device", omit: "device" },
  { facet: "compressor", column: "e.compressor_type", omit: "compressor" },
  { facet: "suspect", column: "e.leading_suspect", omit: "suspect" },
  { facet: "make", column: "e.make", omit: "make" },
  { facet: "model", column: "e.model", omit: "model" },
  { facet: "technician", column: "e.technician_id", omit: "technician" },
  { facet: "status", column: "e.status", omit: "status" },
];

/** How many of the search's cases carry each facet value, in one round trip to the database. */
export async function casebookFacets({
  shopId,
  filters,
}: {
  shopId: number;
  filters: CasebookFilters;
}): Promise<CasebookFacetsResponse> {
  const { sequelize } = getModels();
  const all = await casebookWhere(shopId, filters);
  const replacements: Replacements = { ...all.replacements };
  const parts: string[] = [];
  const part = (sql: string) => parts.push(`(${sql} ORDER BY n DESC, v LIMIT ${LIMIT_PER_FACET})`);

  for (const { facet, column, omit } of COLUMN_FACETS) {
    const where = await casebookWhere(shopId, filters, omit);
    part(
      `SELECT '${facet}' AS f, ${column} AS v, COUNT(*) AS n FROM casebook_entry e WHERE ${where.sql} AND ${column} IS NOT NULL GROUP BY ${column}`,
    );
  }
  part(
    `SELECT 'symptoms' AS f, s.symptom AS v, COUNT(*) AS n FROM casebook_symptom s JOIN casebook_entry e ON e.case_id = s.case_id WHERE s.shop_id = :shopId AND ${all.sql} GROUP BY s.symptom`,
  );
  const withoutCause = await casebookWhere(shopId, filters, "cause");
  part(
    `SELECT 'cause' AS f, k.cause AS v, COUNT(*) AS n FROM case_confirmed_cause k JOIN casebook_entry e ON e.case_id = k.case_id WHERE k.shop_id = :shopId AND ${withoutCause.sql} GROUP BY k.cause`,
  );
  const withoutComeback = await casebookWhere(shopId, filters, "comeback");
  part(
    `SELECT 'comeback' AS f, '1' AS v, COUNT(*) AS n FROM casebook_entry e WHERE ${withoutComeback.sql} AND e.comeback = 1 HAVING n > 0`,
  );
  part(`SELECT 'total' AS f, '' AS v, COUNT(*) AS n FROM casebook_entry e WHERE ${all.sql}`);

  const rows = await sequelize.query<{ f: string; v: string; n: number }>(parts.join("\nUNION ALL\n"), {
    replacements,
    type: QueryTypes.SELECT,
  });
  const facets = Object.fromEntries(CASEBOOK_FACETS.map((f) => [f, [] as FacetCount[]])) as Record<
    CasebookFacet,
    FacetCount[]
  >;
  let total = 0;
  for (const r of rows) {
    if (r.f === "total") total = Number(r.n);
    else facets[r.f as CasebookFacet]?.push({ value: String(r.v), count: Number(r.n) });
  }
  const technicianIds = facets.technician.map((t) => t.value);
  if (technicianIds.length > 0) {
    const names = await getModels().User.findAll({
      where: { shopId, id: technicianIds },
      attributes: ["id", "name"],
      raw: true,
    });
    const byId = new Map(names.map((u) => [u.id, u.name]));
    for (const t of facets.technician) t.label = byId.get(t.value) ?? "Former technician";
  }
  return { total, facets };
}
