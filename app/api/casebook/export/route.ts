import { handler } from "@/lib/server/handler";
import { casebookCsvExport } from "@/lib/server/casebook/export";
import { casebookSearchQuerySchema } from "@/lib/contracts/casebook";

/** The search's results as CSV, streamed; the same filters and sort as the screen, capped. */
export const GET = handler(
  { permission: "casebook:search", query: casebookSearchQuerySchema },
  async ({ user, query }) => {
    const { stream, total, rows } = await casebookCsvExport({ shopId: user.shopId, query });
    const day = new Date().toISOString().slice(0, 10);
    return new Response(stream, {
      headers: {
        "content-type": "text/csv; charset=utf-8",
        "content-disposition": `attachment; filename="casebook-${day}.csv"`,
        "cache-control": "no-store",
        "x-casebook-total": String(total),
        "x-casebook-rows": String(rows),
      },
    });
  },
);
