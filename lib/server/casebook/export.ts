import "server-only";
import { QueryTypes } from "sequelize";
import { getModels } from "@/models";
import { CASEBOOK_EXPORT_MAX_ROWS, type CasebookSearchQuery } from "@/lib/contracts/casebook";
import { casebookCsv } from "@/lib/casebook/csv";
import { casebookWhere } from "./filters";
import { countSql, pageSql, resolveSort, toCasebookRow } from "./search";

const CHUNK_ROWS = 500;
const COMPLAINT_CHARS = 2000;

/**
 * A search's results as CSV, streamed a chunk of rows at a time: the same shop scope and filters as the
 * screen, at most CASEBOOK_EXPORT_MAX_ROWS rows. `total` says how many matched, `rows` how many the file has.
 */
export async function casebookCsvExport({
  shopId,
  query,
}: {
  shopId: number;
  query: Omit<CasebookSearchQuery, "page" | "pageSize">;
}): Promise<{ stream: ReadableStream<Uint8Array>; total: number; rows: number }> {
  const { sequelize } = getModels();
  const where = await casebookWhere(shopId, query);
  const { sort, dir } = resolveSort(query, where);
  const sql = pageSql(where, sort, dir, { complaintChars: COMPLAINT_CHARS });
  const [count] = await sequelize.query<{ total: number }>(countSql(where), {
    replacements: where.replacements,
    type: QueryTypes.SELECT,
  });
  const total = Number(count?.total ?? 0);
  const rows = Math.min(total, CASEBOOK_EXPORT_MAX_ROWS);
  const encoder = new TextEncoder();
  let offset = 0;
  let first = true;
  const stream = new ReadableStream<Uint8Array>({
    async pull(controller) {
      try {
        if (first) {
          first = false;
          // A byte-order mark so spreadsheet programs read the file as UTF-8, then the header line.
          controller.enqueue(encoder.encode(`\uFEFF${casebookCsv([], { header: true })}`));
        }
        const limit = Math.min(CHUNK_ROWS, rows - offset);
        if (limit <= 0) {
          controller.close();
          return;
        }
        const chunk = await sequelize.query<Parameters<typeof toCasebookRow>[0]>(sql, {
          replacements: { ...where.replacements, limit, offset },
          type: QueryTypes.SELECT,
        });
        offset += limit;
        controller.enqueue(
          encoder.encode(
            casebookCsv(
              chunk.map((r) => toCasebookRow(r, COMPLAINT_CHARS)),
              { header: false },
            ),
          ),
        );
        if (chunk.length < limit) controller.close();
      } catch (error) {
        controller.error(error);
      }
    },
  });
  return { stream, total, rows };
}
